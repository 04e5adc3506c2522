#!/bin/sh
# End-to-end check of the text UI in a real terminal (tmux, 80x24, NO_COLOR): type a solvent,
# read the vacuum setpoint off the screen, compare it with the CLI's JSON for the same input,
# quit with Ctrl+Q and require exit code 0. Exits non-zero with a message on any failure.
#   tests/e2e/tui-tmux.sh [SOLVENT [PROGRAM]]
# PROGRAM is a built distillplan executable (the native binary); without it the JIT build of
# src/DistillPlan.Cli runs with the repository's solvents.yaml. A PROGRAM uses its own library
# (built in, or a solvents.yaml beside it) unless DISTILLPLAN_SHIPPED_LIBRARY is set.
set -eu
ROOT=$(cd "$(dirname "$0")/../.." && pwd)
SOLVENT=${1:-ethanol}
PROGRAM=${2:-}
SESSION="dp-e2e-$$"
WORK=$(mktemp -d)
trap 'tmux kill-session -t "$SESSION" 2>/dev/null || true; rm -rf "$WORK"' EXIT
fail() { echo "tui-tmux: FAIL: $*" >&2; [ -f "$WORK/screen" ] && cat "$WORK/screen" >&2; exit 1; }

for tool in tmux jq; do command -v "$tool" >/dev/null || fail "$tool is not installed"; done
if [ -n "$PROGRAM" ]; then
  [ -x "$PROGRAM" ] || fail "$PROGRAM is not an executable"
  RUN=$(cd "$(dirname "$PROGRAM")" && pwd)/$(basename "$PROGRAM")
else
  command -v dotnet >/dev/null || fail "dotnet is not installed"
  dotnet build "$ROOT/src/DistillPlan.Cli" -v q -nologo >/dev/null || fail "build failed"
  DLL=$(ls "$ROOT"/src/DistillPlan.Cli/bin/*/net10.0/distillplan.dll 2>/dev/null | head -1)
  [ -n "$DLL" ] || fail "distillplan.dll not found under src/DistillPlan.Cli/bin"
  RUN="dotnet $DLL"
  # The shipped library at the repository root wins; otherwise the caller's DISTILLPLAN_SHIPPED_LIBRARY.
  [ -f "$ROOT/solvents.yaml" ] && DISTILLPLAN_SHIPPED_LIBRARY="$ROOT/solvents.yaml"
  [ -n "${DISTILLPLAN_SHIPPED_LIBRARY:-}" ] || fail "no solvents.yaml at the repository root and DISTILLPLAN_SHIPPED_LIBRARY is not set"
fi
export DISTILLPLAN_SHIPPED_LIBRARY="${DISTILLPLAN_SHIPPED_LIBRARY:-}"

screen() { tmux capture-pane -p -t "$SESSION" > "$WORK/screen"; }
wait_for() {  # wait_for TEXT SECONDS
  i=0; while [ $i -lt $(( $2 * 4 )) ]; do screen; grep -qF -- "$1" "$WORK/screen" && return 0; sleep 0.25; i=$((i + 1)); done
  return 1
}

tmux new-session -d -s "$SESSION" -x 80 -y 24 \
  "env NO_COLOR=1 TERM=xterm-256color DISTILLPLAN_SHIPPED_LIBRARY='$DISTILLPLAN_SHIPPED_LIBRARY' sh -c '$RUN; echo \$? > \"$WORK/rc\"'"
wait_for "Vacuum" 30 || fail "the planner did not show a vacuum setpoint within 30 s"

tmux send-keys -t "$SESSION" -l "$SOLVENT"
tmux send-keys -t "$SESSION" Enter
wait_for "| $SOLVENT" 10 || fail "the readout did not switch to $SOLVENT"
SHOWN=$(sed -n 's/.*Vacuum \([0-9.]*\) mbar.*/\1/p' "$WORK/screen" | head -1)
[ -n "$SHOWN" ] || fail "no 'Vacuum N mbar' on screen"

JSON=$($RUN setpoints "$SOLVENT" --json) || fail "distillplan setpoints $SOLVENT --json failed"
EXPECTED=$(printf '%s' "$JSON" | jq -r .vacuum_setpoint_mbar)
DECIMALS=$(printf '%s' "$SHOWN" | awk -F. '{ print (NF > 1) ? length($2) : 0 }')
ROUNDED=$(printf "%.${DECIMALS}f" "$EXPECTED")
[ "$SHOWN" = "$ROUNDED" ] || fail "screen shows $SHOWN mbar, CLI says $EXPECTED mbar ($ROUNDED at the screen's precision)"

tmux send-keys -t "$SESSION" C-q
# The plan was edited, so the planner asks before discarding it; "Quit without saving" is the default button.
if wait_for "not saved" 5; then tmux send-keys -t "$SESSION" Enter; fi
i=0; while [ ! -f "$WORK/rc" ] && [ $i -lt 40 ]; do sleep 0.25; i=$((i + 1)); done
[ -f "$WORK/rc" ] || { screen; fail "the planner did not exit after Ctrl+Q"; }
RC=$(cat "$WORK/rc")
[ "$RC" = 0 ] || fail "exit code $RC after Ctrl+Q, expected 0"
echo "tui-tmux: ok ($RUN): $SOLVENT vacuum setpoint $SHOWN mbar on screen = CLI $EXPECTED mbar; Ctrl+Q exit 0"

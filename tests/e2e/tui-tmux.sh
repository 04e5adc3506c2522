#!/bin/sh
# End-to-end check of the text UI in a real terminal (tmux, 80x24, NO_COLOR): a working session.
# Open a plan file through the Open dialog (typing the path straight after Ctrl+O), edit the
# charge, read the vacuum setpoint off the screen and compare it with the CLI's JSON, press Esc
# (nothing may be lost), export the report and the plot, try to save over the file (the default
# answer keeps it), save to a new file, and quit with exit code 0. Exits non-zero with a message
# and the last screen on any failure.
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
# The user's own config folder stays out of the test: recent files and libraries go to $WORK.
mkdir "$WORK/config"

screen() { tmux capture-pane -p -t "$SESSION" > "$WORK/screen"; }
wait_for() {  # wait_for TEXT SECONDS
  i=0; while [ $i -lt $(( $2 * 4 )) ]; do screen; grep -qF -- "$1" "$WORK/screen" && return 0; sleep 0.25; i=$((i + 1)); done
  return 1
}
wait_gone() {  # wait_gone TEXT SECONDS
  i=0; while [ $i -lt $(( $2 * 4 )) ]; do screen; grep -qF -- "$1" "$WORK/screen" || return 0; sleep 0.25; i=$((i + 1)); done
  return 1
}
keys() { tmux send-keys -t "$SESSION" "$@"; }
text() { tmux send-keys -t "$SESSION" -l "$1"; }

# A plan file of the session (demo input): ethyl acetate, coolant at 5 °C, shown in mbar.
cat > "$WORK/plan.yaml" <<'YAML'
format: distillplan-plan/1
title: "e2e session"
charge:
  solvents: "ethyl-acetate"
settings:
  coolant-temp: "5"
display:
  pressure-unit: "mbar"
YAML
cp "$WORK/plan.yaml" "$WORK/plan.orig"

tmux new-session -d -s "$SESSION" -x 80 -y 24 -c "$WORK" \
  "env NO_COLOR=1 TERM=xterm-256color XDG_CONFIG_HOME='$WORK/config' DISTILLPLAN_SHIPPED_LIBRARY='$DISTILLPLAN_SHIPPED_LIBRARY' sh -c '$RUN; echo \$? > \"$WORK/rc\"'"
wait_for "Vacuum" 30 || fail "the planner did not show a vacuum setpoint within 30 s"

# Open: the path typed at once after Ctrl+O must reach the dialog, and opening is not an edit.
keys C-o; text "$WORK/plan.yaml"; keys Enter
wait_for "Setpoints - plan.yaml" 15 || fail "Ctrl+O did not open plan.yaml"
grep -qF "(unsaved)" "$WORK/screen" && fail "a file just opened is marked unsaved"

# Edit: the charge, planned off the UI thread; read the setpoint once computing is over.
text "$SOLVENT"; keys Enter
wait_for "| $SOLVENT" 15 || fail "the readout did not switch to $SOLVENT"
wait_gone "computing" 15 || fail "the planner kept computing"
SHOWN=$(sed -n 's/.*Vacuum \([0-9.]*\) mbar.*/\1/p' "$WORK/screen" | head -1)
[ -n "$SHOWN" ] || fail "no 'Vacuum N mbar' on screen"
JSON=$($RUN setpoints "$SOLVENT" --coolant-temp 5 --json) || fail "distillplan setpoints $SOLVENT --json failed"
EXPECTED=$(printf '%s' "$JSON" | jq -r .vacuum_setpoint_mbar)
DECIMALS=$(printf '%s' "$SHOWN" | awk -F. '{ print (NF > 1) ? length($2) : 0 }')
ROUNDED=$(printf "%.${DECIMALS}f" "$EXPECTED")
[ "$SHOWN" = "$ROUNDED" ] || fail "screen shows $SHOWN mbar, CLI says $EXPECTED mbar ($ROUNDED at the screen's precision)"

# Esc never discards work: the planner is still there, the edit still unsaved.
keys F4; keys Escape; sleep 1
wait_for "(unsaved)" 5 || fail "Esc lost the unsaved edit"
wait_for ">Find solvent:" 5 || fail "Esc did not return to the solvent search"
[ -f "$WORK/rc" ] && fail "Esc quit the planner"

# Export: the report as Markdown (the CLI's renderer) and the plot as SVG.
keys F4; keys C-e; sleep 0.5; text "$WORK/report.md"; keys Enter
wait_for "Exported the plan report" 15 || fail "Ctrl+E did not export the report"
grep -q "Vacuum setpoint" "$WORK/report.md" || fail "report.md has no vacuum setpoint"
$RUN setpoints "$SOLVENT" --coolant-temp 5 --format markdown > "$WORK/cli.md" || fail "the CLI's markdown failed"
[ "$(grep "Vacuum setpoint" "$WORK/report.md")" = "$(grep "Vacuum setpoint" "$WORK/cli.md")" ] \
  || fail "the exported setpoint row differs from the CLI's: $(grep "Vacuum setpoint" "$WORK/report.md") / $(grep "Vacuum setpoint" "$WORK/cli.md")"
keys C-e; sleep 0.5; text "$WORK/curve.svg"; keys Enter
wait_for "Exported the plan report to $WORK/curve.svg" 30 || fail "Ctrl+E did not export the plot"
grep -q "<svg" "$WORK/curve.svg" || fail "curve.svg is not an SVG file"

# Save over the opened file: asked, and Enter (the default) keeps the file.
keys C-s; sleep 0.5; text "$WORK/plan.yaml"; keys Enter
wait_for "Replace file?" 10 || fail "saving over plan.yaml did not ask first"
keys Enter
wait_for "Not saved: the existing file was kept." 10 || fail "the default answer did not keep plan.yaml"
cmp -s "$WORK/plan.yaml" "$WORK/plan.orig" || fail "plan.yaml was changed although the answer was the default"

# Save to a new file.
keys C-s; sleep 0.5; text "$WORK/saved.yaml"; keys Enter
wait_for "Saved $WORK/saved.yaml" 10 || fail "Ctrl+S did not save saved.yaml"
grep -q "solvents: \"$SOLVENT\"" "$WORK/saved.yaml" || fail "saved.yaml does not hold the edited charge"
grep -qF "(unsaved)" "$WORK/screen" && fail "still marked unsaved after saving"

# Quit: nothing unsaved, so no question; exit code 0.
keys C-q
i=0; while [ ! -f "$WORK/rc" ] && [ $i -lt 40 ]; do sleep 0.25; i=$((i + 1)); done
[ -f "$WORK/rc" ] || { screen; fail "the planner did not exit after Ctrl+Q"; }
RC=$(cat "$WORK/rc")
[ "$RC" = 0 ] || fail "exit code $RC after Ctrl+Q, expected 0"
echo "tui-tmux: ok ($RUN): opened, $SOLVENT vacuum $SHOWN mbar on screen = CLI $EXPECTED mbar, Esc kept the edit, exported report.md and curve.svg, the default kept plan.yaml, saved saved.yaml, Ctrl+Q exit 0"

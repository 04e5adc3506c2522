#!/usr/bin/env bash
# Start-up of whole processes, measured with hyperfine in one run on one machine (the targets
# in docs/performance.md are ratios between these rows). Builds, outside the checkout:
#   native       the native binary (README, "Install")
#   jit          the framework-dependent distillplan (dotnet publish, PublishAot=false)
#   hello        a trivial console app published the same way as `jit`
# Set STARTUP_DIR to keep the builds elsewhere; delete a folder there to rebuild it.
# Usage: bench/startup.sh [RUNS]   (needs hyperfine, clang and zlib1g-dev; about 10 minutes)
set -euo pipefail
cd "$(dirname "$0")/.."
RUNS=${1:-30}
OUT=${STARTUP_DIR:-/tmp/distillplan-startup}
mkdir -p "$OUT"
[ -x "$OUT/native/distillplan" ] || dotnet publish src/DistillPlan.Cli -c Release -r linux-x64 -o "$OUT/native" -nologo -v q
[ -x "$OUT/jit/distillplan" ] || dotnet publish src/DistillPlan.Cli -c Release -r linux-x64 --self-contained false -p:PublishAot=false -o "$OUT/jit" -nologo -v q
if [ ! -x "$OUT/hello/hello" ]; then
  mkdir -p "$OUT/hello-src"
  cat > "$OUT/hello-src/hello.csproj" <<'XML'
<Project Sdk="Microsoft.NET.Sdk">
  <PropertyGroup><OutputType>Exe</OutputType><TargetFramework>net10.0</TargetFramework><InvariantGlobalization>true</InvariantGlobalization></PropertyGroup>
</Project>
XML
  echo 'System.Console.WriteLine("hello world");' > "$OUT/hello-src/Program.cs"
  dotnet publish "$OUT/hello-src" -c Release -r linux-x64 --self-contained false -o "$OUT/hello" -nologo -v q
fi
# Run from an empty folder so no solvents.yaml above it is picked up; the built-in library answers.
rm -f "$OUT/native/solvents.yaml" "$OUT/jit/solvents.yaml"
mkdir -p "$OUT/empty"; cd "$OUT/empty"
unset DISTILLPLAN_SHIPPED_LIBRARY
# A mixture's setpoints include its pressure ramp (the Rayleigh strip), as in the text UI.
TERNARY="setpoints acetone=50,ethanol=30,toluene=20"
hyperfine -N --warmup 3 --runs "$RUNS" --export-markdown "$OUT/startup.md" \
  -n "hello (framework-dependent)" "$OUT/hello/hello" \
  -n "native setpoints ethyl-acetate" "$OUT/native/distillplan setpoints ethyl-acetate" \
  -n "jit setpoints ethyl-acetate" "$OUT/jit/distillplan setpoints ethyl-acetate" \
  -n "native ternary plan with ramp" "$OUT/native/distillplan $TERNARY" \
  -n "jit ternary plan with ramp" "$OUT/jit/distillplan $TERNARY" \
  -n "native ternary strip (csv)" "$OUT/native/distillplan strip acetone=50,ethanol=30,toluene=20 --format csv" \
  -n "native wet ternary plan with ramp" "$OUT/native/distillplan setpoints ethyl-acetate=60,ethanol=25,water=15" \
  -n "native chlorinated ternary plan with ramp" "$OUT/native/distillplan setpoints methanol=40,dichloromethane=40,toluene=20" \
  -n "native setpoints --json" "$OUT/native/distillplan setpoints ethyl-acetate --json"
cat "$OUT/startup.md"

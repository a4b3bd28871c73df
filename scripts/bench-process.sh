#!/usr/bin/env bash
# Whole-process benchmark of issue 2: `partforge build r2.yaml --parts rotor --formats stl` as a separate
# process, N times (default 20) after one warm-up run (file cache), for the published executable
# (scripts/publish.sh) and for the framework-dependent build. Prints min, median and max wall time.
# Usage: scripts/bench-process.sh [N]
set -euo pipefail
cd "$(dirname "$0")/.."
n="${1:-20}"
design="$PWD/src/PartForge.Bench/Designs/r2.yaml"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
[ -x dist/partforge/partforge ] || scripts/publish.sh >/dev/null
dotnet build src/PartForge.Cli -c Release -nologo -v quiet >/dev/null
time_runs() {
  local exe="$1" label="$2"
  "$exe" build "$design" -o "$work/out" --parts rotor --formats stl --quiet
  for i in $(seq "$n"); do
    local t0 t1
    t0=$(date +%s%N)
    "$exe" build "$design" -o "$work/out" --parts rotor --formats stl --quiet
    t1=$(date +%s%N)
    echo $(( (t1 - t0) / 1000000 ))
  done | sort -n | awk -v label="$label" '{ a[NR] = $1 } END { printf "%-34s min %4d ms  median %4d ms  max %4d ms  (%d runs)\n", label, a[1], a[int((NR + 1) / 2)], a[NR], NR }'
}
time_runs dist/partforge/partforge "published (self-contained, R2R)"
time_runs src/PartForge.Cli/bin/Release/net10.0/partforge "framework-dependent build"
echo "rotor triangles: $(( ($(stat -c %s "$work/out/r2-rotor.stl") - 84) / 50 ))"

#!/usr/bin/env bash
# Whole-process benchmark: `partforge build r2.yaml --parts rotor --formats stl` (the reference rotor R2) as a
# separate process, N times (default 20) after one warm-up run each (file cache), for the native executable
# (scripts/publish.sh) and for the framework-dependent build, interleaved in one loop so that both see the
# same load; then `partforge presets` (start-up time) the same way. Prints min, median and max wall time.
#
# --pair CMD...  also times CMD (everything after --pair, run as given, not through a shell) in the same
#                loop, after ours in each round, and prints the ratio of its median to ours. Use it for a
#                yardstick that builds the same rotor at the same chordal tolerance (mesh.chordal_tolerance
#                in r2.yaml); the script knows nothing else about it.
# --publish      publish the native executable again first (otherwise an existing dist/partforge is used).
# Usage: scripts/bench-process.sh [N] [--publish] [--pair CMD...]
set -euo pipefail
cd "$(dirname "$0")/.."
n=20
publish=0
pair=()
while [ $# -gt 0 ]; do
  case "$1" in
    --pair) shift; pair=("$@"); [ ${#pair[@]} -gt 0 ] || { echo "bench-process.sh: --pair needs a command" >&2; exit 2; }; break ;;
    --publish) publish=1; shift ;;
    ''|*[!0-9]*) echo "usage: scripts/bench-process.sh [N] [--publish] [--pair CMD...]" >&2; exit 2 ;;
    *) n="$1"; shift ;;
  esac
done
[ "$n" -ge 1 ] || { echo "bench-process.sh: N must be at least 1" >&2; exit 2; }

design="$PWD/src/PartForge.Bench/Designs/r2.yaml"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
native="$PWD/dist/partforge/partforge"
if [ "$publish" = 1 ] || [ ! -x "$native" ]; then scripts/publish.sh >/dev/null; fi
fd_dir=$(dotnet build src/PartForge.Cli -c Release -nologo -v quiet -getProperty:TargetDir)
fd="${fd_dir%/}/partforge"
[ -x "$fd" ] || { echo "bench-process.sh: no framework-dependent build at $fd" >&2; exit 1; }

# One timed run in milliseconds (bash's own clock, no process started to read it); fails loudly.
elapsed_ms() {
  local t0 t1 rc=0
  t0=$EPOCHREALTIME
  "$@" >/dev/null 2>"$work/stderr" || rc=$?
  t1=$EPOCHREALTIME
  if [ "$rc" != 0 ]; then
    echo "bench-process.sh: '$*' exited $rc:" >&2
    cat "$work/stderr" >&2
    exit 1
  fi
  awk -v a="$t0" -v b="$t1" 'BEGIN { printf "%.2f\n", (b - a) * 1000 }'
}

# min / median / max of a file of numbers.
stats() {
  sort -g "$1" | awk '{ a[NR] = $1 } END { m = (NR % 2) ? a[(NR + 1) / 2] : (a[NR / 2] + a[NR / 2 + 1]) / 2; printf "%.1f %.1f %.1f %d\n", a[1], m, a[NR], NR }'
}
report() {
  local label="$1" file="$2"
  read -r lo med hi count < <(stats "$file")
  printf "  %-30s min %7.1f ms  median %7.1f ms  max %7.1f ms  (%d runs)\n" "$label" "$lo" "$med" "$hi" "$count"
}
median() { stats "$1" | awk '{ print $2 }'; }

build_args=(build "$design" -o "$work/out" --parts rotor --formats stl --quiet)
: > "$work/r2-native"; : > "$work/r2-fd"; : > "$work/r2-pair"
elapsed_ms "$native" "${build_args[@]}" >/dev/null
elapsed_ms "$fd" "${build_args[@]}" >/dev/null
[ ${#pair[@]} -eq 0 ] || elapsed_ms "${pair[@]}" >/dev/null
for _ in $(seq "$n"); do
  elapsed_ms "$native" "${build_args[@]}" >> "$work/r2-native"
  elapsed_ms "$fd" "${build_args[@]}" >> "$work/r2-fd"
  [ ${#pair[@]} -eq 0 ] || elapsed_ms "${pair[@]}" >> "$work/r2-pair"
done
echo "R2 rotor, whole process (build r2.yaml --parts rotor --formats stl):"
report "native (ahead of time)" "$work/r2-native"
report "framework-dependent build" "$work/r2-fd"
[ ${#pair[@]} -eq 0 ] || report "paired command" "$work/r2-pair"
echo "  rotor triangles: $(( ($(stat -c %s "$work/out/r2-rotor.stl") - 84) / 50 ))"
echo "  framework-dependent / native median: $(awk -v a="$(median "$work/r2-fd")" -v b="$(median "$work/r2-native")" 'BEGIN { printf "%.2f", a / b }')"
if [ ${#pair[@]} -gt 0 ]; then
  echo "  paired / native median: $(awk -v a="$(median "$work/r2-pair")" -v b="$(median "$work/r2-native")" 'BEGIN { printf "%.2f", a / b }')" \
       "(paired / framework-dependent: $(awk -v a="$(median "$work/r2-pair")" -v b="$(median "$work/r2-fd")" 'BEGIN { printf "%.2f", a / b }'))"
fi

: > "$work/p-native"; : > "$work/p-fd"
elapsed_ms "$native" presets >/dev/null
elapsed_ms "$fd" presets >/dev/null
for _ in $(seq "$n"); do
  elapsed_ms "$native" presets >> "$work/p-native"
  elapsed_ms "$fd" presets >> "$work/p-fd"
done
echo "Start-up (partforge presets):"
report "native (ahead of time)" "$work/p-native"
report "framework-dependent build" "$work/p-fd"

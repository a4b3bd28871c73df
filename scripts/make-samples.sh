#!/usr/bin/env bash
# Regenerates out-samples/: every bundled preset (presets/*.yaml) built by the partforge CLI into
# out-samples/<preset>/ (STL, 3MF, DXF, SVG, results JSON, HTML report, BOM CSV, PNG previews), plus one
# small sweep table per preset (out-samples/<preset>/<preset>-sweep.csv). The outputs are deterministic:
# running this twice gives byte-identical files.
#
# Usage (from anywhere in the repository):  scripts/make-samples.sh
set -euo pipefail
cd "$(dirname "$0")/.."

dotnet build src/PartForge.Cli -c Release --nologo -v q
pf() { dotnet run --project src/PartForge.Cli -c Release --no-build -- "$@"; }

mkdir -p out-samples
failed=()
for f in presets/*.yaml; do
  name=$(basename "$f" .yaml)
  dir="out-samples/$name"
  rm -rf "$dir"
  if ! pf build "$f" -o "$dir" --quiet; then
    echo "make-samples: building $f failed" >&2
    failed+=("$name")
    continue
  fi
  # A small what-if table: turns and air gap around the preset's own values (9 variants).
  turns=$(sed -n 's/^  turns: *\([0-9]*\).*/\1/p' "$f" | head -n 1)
  gap=$(sed -n 's/^  air_gap: *\([0-9.]*\).*/\1/p' "$f" | head -n 1)
  if [ -n "$turns" ] && [ -n "$gap" ]; then
    step=$(( turns / 10 > 0 ? turns / 10 : 1 ))
    lo=$(( turns - step )); hi=$(( turns + step ))
    glo=$(awk -v g="$gap" 'BEGIN { printf "%.2f", (g > 0.35 ? g - 0.25 : g) }')
    ghi=$(awk -v g="$gap" 'BEGIN { printf "%.2f", g + 0.25 }')
    pf sweep "$f" --vary "coils.turns=$lo..$hi:$step" --vary "gap.air_gap=$glo..$ghi:0.25" \
       --csv "$dir/$name-sweep.csv" --quiet > /dev/null
  fi
done
if [ ${#failed[@]} -gt 0 ]; then
  echo "make-samples: these presets did not build: ${failed[*]}" >&2
  exit 1
fi
echo "make-samples: wrote $(find out-samples -type f | wc -l) files, $(du -sh out-samples | cut -f1) in out-samples/"

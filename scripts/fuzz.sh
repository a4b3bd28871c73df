#!/usr/bin/env bash
# Long seeded fuzz run of partforge check/build over mutated presets; prints the summary.
# Usage: scripts/fuzz.sh [CASES] [SEED] [extra partforge-fuzz options, e.g. --build-fraction 0.5 or --exe]
# Exit 0 when every case kept every promise; failing case folders are kept and their path printed.
set -euo pipefail
cd "$(dirname "$0")/.."
cases="${1:-10000}"
seed="${2:-1}"
if [ $# -ge 2 ]; then shift 2; elif [ $# -eq 1 ]; then shift 1; fi
exec dotnet run --project src/PartForge.Fuzz -c Release -- --cases "$cases" --seed "$seed" "$@"

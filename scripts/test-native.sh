#!/usr/bin/env bash
# Publishes the native executable (scripts/publish.sh, which fails on any trim or native-code warning) and runs
# the CLI and hardening test suites against it: every test that starts partforge as a process starts the
# native one (PARTFORGE_EXE). Not part of scripts/test.sh (.ci/run runs both); about 2.5 minutes on 2 cores
# from a clean tree, 1 minute of it the publish.
# Usage: scripts/test-native.sh [dotnet test options...]
set -euo pipefail
cd "$(dirname "$0")/.."
exe="$PWD/$(scripts/publish.sh)"
export PARTFORGE_EXE="$exe"
log=$(mktemp)
trap 'rm -f "$log"' EXIT
rc=0
for t in tests/PartForge.Cli.Tests tests/PartForge.Hardening.Tests; do
  dotnet build "$t" -c Release -nologo -v quiet
  set +e
  dotnet test "$t" -c Release --no-build -nologo "$@" 2>&1 | tee -a "$log"
  r=${PIPESTATUS[0]}
  set -e
  [ "$r" = 0 ] || rc=$r
done
# One closing line for the native run, "native: N passed, N failed, N skipped".
awk '/(Passed|Failed)! +- +Failed: /{ gsub(",", ""); for (i = 1; i <= NF; i++) { if ($i == "Failed:") f += $(i+1); if ($i == "Passed:") p += $(i+1); if ($i == "Skipped:") s += $(i+1) } }
     END { printf "native: %d passed, %d failed, %d skipped\n", p, f, s }' "$log"
exit "$rc"

#!/usr/bin/env bash
# Publishes the native partforge executable: app, libraries and runtime compiled ahead of time into one
# trimmed file (no .NET needed to run it). Fails if the publish reports any trim or native-code warning
# (IL2xxx, IL3xxx): such a warning marks code that could behave differently in the native executable.
# Usage: scripts/publish.sh [RID] [DIR]   (defaults: this machine's runtime identifier, dist/partforge)
# Needs a C toolchain for the final link (clang, or gcc as on Debian's build-essential).
# Prints the executable's path on stdout; the publish log is DIR.publish.log.
set -euo pipefail
cd "$(dirname "$0")/.."
rid="${1:-$(dotnet --info | awk '/^ *RID:/ { print $2; exit }')}"
dir="${2:-dist/partforge}"
mkdir -p "$(dirname "$dir")"
log="$dir.publish.log"
t0=$(date +%s%N)
set +e
dotnet publish src/PartForge.Cli -c Release -r "$rid" -o "$dir" -nologo -v minimal -clp:NoSummary > "$log" 2>&1
rc=$?
set -e
t1=$(date +%s%N)
warnings=$(grep -E -o "(warning|error) IL[23][0-9]{3}" "$log" | sort | uniq -c || true)
if [ "$rc" != 0 ]; then
  grep -E "error|warning" "$log" >&2 || tail -20 "$log" >&2
  echo "publish.sh: dotnet publish failed (exit $rc); the log is $log" >&2
  exit "$rc"
fi
if [ -n "$warnings" ]; then
  grep -E "(warning|error) IL[23][0-9]{3}" "$log" | sort -u >&2
  echo "publish.sh: the publish reported trim or native-code warnings (counts above: $(echo "$warnings" | awk '{ s += $1 } END { print s }')); the log is $log" >&2
  exit 1
fi
exe="$dir/partforge"
[ -x "$exe" ] || { echo "publish.sh: no executable at $exe" >&2; exit 1; }
echo "publish.sh: $(stat -c %s "$exe" | awk '{ printf "%.1f MB", $1 / 1e6 }'), $(( (t1 - t0) / 1000000 )) ms, 0 trim or native-code warnings" >&2
echo "$exe"

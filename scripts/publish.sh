#!/usr/bin/env bash
# Publishes the fast, self-contained partforge executable (app and runtime precompiled together).
# Usage: scripts/publish.sh [RID] [DIR]   (defaults: this machine's runtime identifier, dist/partforge)
# Then run dist/partforge/partforge ... (no dotnet needed on the path).
set -euo pipefail
cd "$(dirname "$0")/.."
rid="${1:-$(dotnet --info | awk '/^ *RID:/ { print $2; exit }')}"
dir="${2:-dist/partforge}"
dotnet publish src/PartForge.Cli -c Release -r "$rid" -o "$dir" -nologo -v quiet
echo "$dir/partforge"

#!/usr/bin/env bash
# Runs every test on a fresh machine: installs the reference readers the tests use (Debian packages),
# restores the .NET packages, builds in Release and runs the whole test suite.
set -euo pipefail
cd "$(dirname "$0")/.."

need=()
command -v admesh >/dev/null 2>&1 || need+=(admesh)
command -v assimp >/dev/null 2>&1 || need+=(assimp-utils)
/usr/bin/python3 -c "import stl" >/dev/null 2>&1 || need+=(python3-stl python3-numpy)
/usr/bin/python3 -c "import ezdxf" >/dev/null 2>&1 || need+=(python3-ezdxf)
command -v chromium >/dev/null 2>&1 || need+=(chromium)
[ -f /usr/share/fonts/truetype/dejavu/DejaVuSans.ttf ] || need+=(fonts-dejavu-core)
if [ ${#need[@]} -gt 0 ]; then
  if [ "$(id -u)" = 0 ]; then
    apt-get update -qq
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${need[@]}"
  else
    sudo apt-get update -qq
    sudo DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${need[@]}"
  fi
fi

dotnet restore PartForge.sln
dotnet build PartForge.sln -c Release --no-restore
log=$(mktemp)
trap 'rm -f "$log"' EXIT
set +e
dotnet test PartForge.sln -c Release --no-build "$@" 2>&1 | tee "$log"
rc=${PIPESTATUS[0]}
set -e
# One plain closing line over every test project: "N passed, N failed, N skipped".
awk '/(Passed|Failed)! +- +Failed: /{ gsub(",", ""); for (i = 1; i <= NF; i++) { if ($i == "Failed:") f += $(i+1); if ($i == "Passed:") p += $(i+1); if ($i == "Skipped:") s += $(i+1) } }
     END { printf "%d passed, %d failed, %d skipped\n", p, f, s }' "$log"
exit "$rc"

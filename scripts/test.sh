#!/usr/bin/env bash
# npm test: installs what is missing (npm dependencies; Debian's mariadb-server and chromium),
# builds the web app when its sources changed, then runs every Jest project. The tests start
# their own throwaway MariaDB on a free loopback port and remove it after.
# Extra arguments go to Jest (and skip the type check): npm test -- tests/analysis
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/ensure-deps.sh
bash scripts/lib/ensure-system.sh
node --import tsx scripts/build-web.ts
if [ $# -eq 0 ]; then
  echo "Type check (tsc --noEmit)…"
  npx tsc --noEmit
fi
exec npx jest --ci "$@"

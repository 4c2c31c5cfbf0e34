#!/usr/bin/env bash
# npm start: installs what is missing, starts the private MariaDB, builds the web app when its
# sources changed, migrates, loads the demo into an empty database and serves everything on
# one port. Ctrl-C stops what it started.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/ensure-deps.sh
exec node --import tsx scripts/start.ts "$@"

#!/usr/bin/env bash
# Installs the npm dependencies when they are missing or older than the lock file.
# Sourced by scripts/start.sh and scripts/test.sh.
set -euo pipefail
if ! command -v node >/dev/null 2>&1; then
  echo "Node.js 20 or newer is needed: install it first (Debian: apt-get install nodejs npm)." >&2
  exit 1
fi
stamp=node_modules/.package-lock.json
if [ ! -f "$stamp" ] || [ package-lock.json -nt "$stamp" ]; then
  echo "Installing npm dependencies (npm ci)…"
  npm ci --no-audit --no-fund --loglevel=error
fi

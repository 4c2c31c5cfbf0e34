#!/usr/bin/env bash
# Installs Debian's packages the tests need when missing: mariadb-server and chromium.
# As root it installs them; otherwise it says what to install and stops.
set -euo pipefail
need=()
[ -x /usr/sbin/mariadbd ] || command -v mariadbd >/dev/null 2>&1 || need+=(mariadb-server)
command -v chromium >/dev/null 2>&1 || need+=(chromium)
if [ ${#need[@]} -gt 0 ]; then
  if [ "$(id -u)" -ne 0 ] || ! command -v apt-get >/dev/null 2>&1; then
    echo "Missing system packages: ${need[*]}. Install them: sudo apt-get install -y ${need[*]}" >&2
    exit 1
  fi
  echo "Installing Debian packages: ${need[*]}…"
  export DEBIAN_FRONTEND=noninteractive
  if ! ls /var/lib/apt/lists/*Packages* >/dev/null 2>&1; then apt-get update -qq; fi
  apt-get install -y -qq "${need[@]}" >/dev/null || { apt-get update -qq && apt-get install -y -qq "${need[@]}" >/dev/null; }
fi

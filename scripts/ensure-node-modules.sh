#!/usr/bin/env bash
# Installs npm packages from the lock file when node_modules is missing or older than the lock.
set -euo pipefail
if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "installing npm packages (npm ci)"
  npm ci --no-audit --no-fund --loglevel=error
fi

#!/usr/bin/env bash
# npm test — the whole suite from a fresh clone: installs what is missing (npm packages,
# MariaDB, R with boot, Chromium), starts the test database on its own port and data
# directory, runs unit, reference and integration tests, builds the app and runs the
# browser tests, then stops what it started.
set -euo pipefail
cd "$(dirname "$0")/.."
export NEXT_TELEMETRY_DISABLED=1

bash scripts/ensure-node-modules.sh
bash scripts/ensure-system.sh mariadb r chromium

started_db=0
if ! node --import tsx scripts/db.ts status test | grep -q running; then
  node --import tsx scripts/db.ts start test
  started_db=1
fi
cleanup() { if [ "$started_db" = 1 ]; then node --import tsx scripts/db.ts stop test || true; fi; }
trap cleanup EXIT

echo "== type check"
npx tsc --noEmit -p tsconfig.json

echo "== unit, reference and integration tests"
rm -f test-results/vitest-*.json; mkdir -p test-results
npx vitest run --reporter=default --reporter=json --outputFile.json=test-results/vitest-main.json

echo "== browser tests (production build in .next-test)"
mkdir -p .locks test-results
flock .locks/next-build-test env NEXT_DIST_DIR=.next-test npx next build >test-results/next-build.log 2>&1 \
  || { tail -60 test-results/next-build.log; echo "next build failed (test-results/next-build.log)" >&2; exit 1; }
NEXT_DIST_DIR=.next-test npx vitest run --config vitest.e2e.config.ts --reporter=default --reporter=json --outputFile.json=test-results/vitest-e2e.json

node --import tsx scripts/test-summary.ts test-results/vitest-main.json test-results/vitest-e2e.json

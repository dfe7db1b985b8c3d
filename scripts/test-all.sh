#!/usr/bin/env bash
# Runs the whole test suite the way CI does: its own throw-away PostgreSQL and Redis on other
# ports with data in a temporary folder, then type check, unit, API and browser tests.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/packages.sh
source scripts/lib/services.sh

ensure_server_packages
ensure_browser_packages
ensure_node_modules

# /tmp is reachable by the postgres user wherever the checkout lives.
export RINGDOWN_DATA_DIR="$(mktemp -d /tmp/ringdown-test.XXXXXX)"
chmod 755 "$RINGDOWN_DATA_DIR"
export PG_PORT="${TEST_PG_PORT:-55433}" REDIS_PORT="${TEST_REDIS_PORT:-56380}" REDIS_PERSIST=no
export STORAGE_DIR="$RINGDOWN_DATA_DIR/files" MAIL_DIR="$RINGDOWN_DATA_DIR/mail" NODE_ENV=test SESSION_SECRET="test-secret-$RANDOM$RANDOM"
export S3_PORT="${TEST_S3_PORT:-56391}"
unset DATABASE_URL REDIS_URL S3_ENDPOINT
cleanup() { stop_s3; stop_services; rm -rf "$RINGDOWN_DATA_DIR"; }
trap cleanup EXIT
start_postgres
start_redis
start_s3

echo "ringdown: type check"
npm run --silent typecheck
echo "ringdown: unit tests"
npx vitest run --project unit --reporter=default --reporter=json --outputFile.json="$RINGDOWN_DATA_DIR/results-unit.json"
echo "ringdown: API tests (PostgreSQL + Redis)"
npx vitest run --project api --reporter=default --reporter=json --outputFile.json="$RINGDOWN_DATA_DIR/results-api.json"
echo "ringdown: building the client for the browser tests"
npm run --silent build >/dev/null
echo "ringdown: browser tests (Chromium)"
npx vitest run --project browser --reporter=default --reporter=json --outputFile.json="$RINGDOWN_DATA_DIR/results-browser.json"
echo "ringdown: the start command from a fresh clone"
npx vitest run --project start --reporter=default --reporter=json --outputFile.json="$RINGDOWN_DATA_DIR/results-start.json"
echo "ringdown: all suites passed"
node scripts/sumTestResults.mjs "$RINGDOWN_DATA_DIR"/results-*.json

#!/usr/bin/env bash
# `npm run bench`: the engine figures, then the pipeline figures on throw-away services.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/packages.sh
source scripts/lib/services.sh
ensure_node_modules
echo "== engine (shared/acoustics) =="
npx tsx bench/index.ts
ensure_server_packages
export RINGDOWN_DATA_DIR="$(mktemp -d /tmp/ringdown-bench.XXXXXX)"
chmod 755 "$RINGDOWN_DATA_DIR"
export PG_PORT="${BENCH_PG_PORT:-55434}" REDIS_PORT="${BENCH_REDIS_PORT:-56381}" REDIS_PERSIST=no NODE_ENV=test
export S3_PORT="${BENCH_S3_PORT:-56392}"
unset DATABASE_URL REDIS_URL S3_ENDPOINT
cleanup() { stop_s3; stop_services; rm -rf "$RINGDOWN_DATA_DIR"; }
trap cleanup EXIT
start_postgres >/dev/null
start_redis >/dev/null
start_s3 >/dev/null
echo "== pipeline: one server, 1/2/4 worker processes (upload → queue → worker → PostgreSQL) =="
npx tsx bench/pipeline.ts
echo "== uploads (streamed into object storage) =="
npx tsx bench/uploadMemory.ts

#!/usr/bin/env bash
# Starts Ringdown with its embedded defaults: PostgreSQL and Redis on loopback with data in .data/,
# migrations, demo data, a production build, the server and the worker. Ctrl-C stops everything.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/packages.sh
source scripts/lib/services.sh

export RINGDOWN_DATA_DIR="${RINGDOWN_DATA_DIR:-$PWD/.data}"
export PG_PORT="${PG_PORT:-55432}" REDIS_PORT="${REDIS_PORT:-56379}" PORT="${PORT:-3000}"
export REDIS_PERSIST=yes
# Install and build with every package (a production NODE_ENV would skip the build tools); only
# the server and the worker run with NODE_ENV=production.
unset NODE_ENV
export STORAGE_DIR="${STORAGE_DIR:-$RINGDOWN_DATA_DIR/files}" MAIL_DIR="${MAIL_DIR:-$RINGDOWN_DATA_DIR/mail}"
mkdir -p "$RINGDOWN_DATA_DIR"
if [ ! -s "$RINGDOWN_DATA_DIR/session-secret" ]; then
  (umask 077; head -c 32 /dev/urandom | base64 > "$RINGDOWN_DATA_DIR/session-secret")
fi
export SESSION_SECRET="${SESSION_SECRET:-$(cat "$RINGDOWN_DATA_DIR/session-secret")}"

SUPERVISOR=""
shutdown() {
  trap - INT TERM EXIT
  echo; echo "ringdown: stopping"
  # The supervisor stops the server (and its mail inbox), then the worker; then the services.
  if [ -n "$SUPERVISOR" ]; then kill -TERM "$SUPERVISOR" 2>/dev/null || true; wait "$SUPERVISOR" 2>/dev/null || true; fi
  stop_s3
  stop_services
  exit 0
}
trap shutdown INT TERM EXIT

ensure_server_packages
ensure_node_modules
start_postgres
start_redis
start_s3
npm run --silent migrate
npm run --silent seed
echo "ringdown: building the client"
npm run --silent build >/dev/null

export RINGDOWN_READY_BANNER="$(cat <<MSG

  Ringdown is running at http://127.0.0.1:${PORT}/
  Demo sign-ins (password ringdown-demo):
    owner@ringdown.test     owner of the demo consultancy
    engineer@ringdown.test  engineer
    client@ringdown.test    client (sees the shared demo room)
    viewer@ringdown.test    viewer, read-only (a student)
  Press Ctrl-C to stop. Data stays in ${RINGDOWN_DATA_DIR}.
MSG
)"
NODE_ENV=production node scripts/supervise.mjs & SUPERVISOR=$!
# wait returns when a trapped signal arrives; the trap then stops everything in order.
wait "$SUPERVISOR" || true

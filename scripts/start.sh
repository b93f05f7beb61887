#!/usr/bin/env bash
# npm start: database on loopback, migrations, demo data, client build, then the server.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/pg.sh
source scripts/deps.sh

PG_PORT="${TACKLINE_PG_PORT:-54717}"
PG_BASE="${TACKLINE_PG_DIR:-$PWD/.data/postgres}"
export TACKLINE_PORT="${TACKLINE_PORT:-4717}"
export PORT="$TACKLINE_PORT"
export DATABASE_URL="${DATABASE_URL:-postgres://postgres@127.0.0.1:$PG_PORT/tackline}"
export NODE_ENV="${NODE_ENV:-production}"
# A production server needs a session secret: keep one per installation beside the data.
if [ -z "${SESSION_SECRET:-}" ]; then
  mkdir -p .data
  [ -s .data/session-secret ] || node -e "process.stdout.write(require('crypto').randomBytes(32).toString('hex'))" > .data/session-secret
  chmod 600 .data/session-secret
  SESSION_SECRET="$(cat .data/session-secret)"
  export SESSION_SECRET
fi

ensure_node_modules
pg_start "$PG_BASE" "$PG_PORT"
server_pid=""
shutdown() {
  trap - INT TERM EXIT
  if [ -n "$server_pid" ] && kill -0 "$server_pid" 2>/dev/null; then
    kill -TERM "$server_pid" 2>/dev/null || true
    wait "$server_pid" 2>/dev/null || true
  fi
  pg_log "stopping PostgreSQL"
  pg_stop "$PG_BASE"
}
trap shutdown INT TERM EXIT

pg_ensure_db "$PG_PORT" tackline
pg_log "running migrations"
npx tsx server/db/run-migrations.ts
pg_log "loading demo data (idempotent)"
npx tsx server/db/seed/run-seed.ts
pg_log "building the client"
npx vite build --logLevel warn

node_modules/.bin/tsx server/index.ts &
server_pid=$!
wait "$server_pid" || true

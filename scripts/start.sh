#!/usr/bin/env bash
# npm start: database on loopback, migrations, demo data, client build, then the server.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/pg.sh
source scripts/deps.sh

source scripts/app-env.sh
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

prepare_database
pg_log "building the client"
npx vite build --logLevel warn

node_modules/.bin/tsx server/index.ts &
server_pid=$!
# Say where to go once the server answers (the demo sign-ins were printed by the seed above).
for _ in $(seq 1 60); do
  if node -e "fetch('http://127.0.0.1:$TACKLINE_PORT/api/health').then(r=>process.exit(r.ok?0:1),()=>process.exit(1))" 2>/dev/null; then
    pg_log "Tackline is up: http://127.0.0.1:$TACKLINE_PORT  (e.g. detailer@kestrel.example / tackline-demo; Ctrl-C stops it)"
    break
  fi
  kill -0 "$server_pid" 2>/dev/null || break
  sleep 0.5
done
wait "$server_pid" || true

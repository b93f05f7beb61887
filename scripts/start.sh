#!/usr/bin/env bash
# npm start: database on loopback, migrations, demo data, client build, then the server,
# restarted with back-off when it crashes while the database stays up. Ctrl-C or SIGTERM
# stops the server, then the database.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/pg.sh
source scripts/deps.sh

# Before NODE_ENV=production: the client build and the migrations need devDependencies.
ensure_node_modules

source scripts/app-env.sh
resolve_pg_base
export NODE_ENV="${NODE_ENV:-production}"
# A production server needs a session secret: keep one per installation beside the data.
if [ -z "${SESSION_SECRET:-}" ]; then
  mkdir -p .data
  [ -s .data/session-secret ] || node -e "process.stdout.write(require('crypto').randomBytes(32).toString('hex'))" > .data/session-secret
  chmod 600 .data/session-secret
  SESSION_SECRET="$(cat .data/session-secret)"
  export SESSION_SECRET
fi

# Back-off between restarts after a crash: doubles from 1 s up to 30 s, back to 1 s once the
# server has run for a minute.
RESTART_MIN_S=1
RESTART_MAX_S=30
RESTART_RESET_AFTER_S=60

server_pid=""
pause_pid=""
stop_all() {
  # A second Ctrl-C must not cut the database's shutdown short.
  trap '' INT TERM
  trap - EXIT
  if [ -n "$pause_pid" ]; then kill "$pause_pid" 2>/dev/null || true; fi
  if [ -n "$server_pid" ] && kill -0 "$server_pid" 2>/dev/null; then
    kill -TERM "$server_pid" 2>/dev/null || true
    wait "$server_pid" 2>/dev/null || true
  fi
  pg_log "stopping PostgreSQL"
  pg_stop "$PG_BASE"
}
trap stop_all EXIT
# A stop asked for is a clean stop: exit 0 (the EXIT trap stops server and database).
trap 'exit 0' INT TERM

pg_start "$PG_BASE" "$PG_PORT"
pg_log "database cluster: $PG_BASE/data (port $PG_PORT)"
prepare_database
pg_log "building the client"
node_modules/.bin/vite build --logLevel warn

# wait_until_up PID: polls /api/health until it answers (0) or PID exits (1); 2 after 2 minutes.
wait_until_up() {
  local i
  for i in $(seq 1 240); do
    if app_healthy; then return 0; fi
    kill -0 "$1" 2>/dev/null || return 1
    sleep 0.5
  done
  return 2
}

# "exit code 1" or "signal KILL" for a status from `wait`.
describe_status() {
  if [ "$1" -gt 128 ]; then printf 'signal %s' "$(kill -l "$1" 2>/dev/null || echo "$(($1 - 128))")"; else printf 'exit code %s' "$1"; fi
}

ever_up=0
delay=$RESTART_MIN_S
while :; do
  # One process (no tsx wrapper): its pid is the server's, so a kill of it is seen here.
  node --import tsx server/index.ts &
  server_pid=$!
  started_at=$SECONDS
  up=0
  wait_until_up "$server_pid" && up=1 || true
  if [ "$up" -eq 1 ] && [ "$ever_up" -eq 0 ]; then
    ever_up=1
    pg_log "Tackline is up: $(app_probe_url)  (e.g. detailer@kestrel.example / tackline-demo; Ctrl-C stops it)"
    public_url_hint
  elif [ "$up" -eq 1 ]; then
    pg_log "the server answers again: $(app_probe_url)"
  fi

  status=0
  wait "$server_pid" || status=$?
  server_pid=""
  if [ "$status" -eq 0 ]; then
    pg_log "the server stopped by itself (exit code 0)"
    exit 0
  fi
  if [ "$ever_up" -eq 0 ]; then
    # Never answered: a setting or the port is wrong, and restarting would not help.
    pg_log "the server did not start ($(describe_status "$status")): see the messages above"
    exit 1
  fi
  if [ $((SECONDS - started_at)) -ge "$RESTART_RESET_AFTER_S" ]; then delay=$RESTART_MIN_S; fi
  pg_log "the server stopped unexpectedly ($(describe_status "$status")); restarting in ${delay}s, the database stays up"
  # In the background, so that a SIGTERM during the pause is handled at once.
  sleep "$delay" &
  pause_pid=$!
  wait "$pause_pid" || true
  pause_pid=""
  delay=$((delay * 2 > RESTART_MAX_S ? RESTART_MAX_S : delay * 2))
done

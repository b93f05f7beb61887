#!/usr/bin/env bash
# npm run dev: database + API server (restarts on change) + Vite dev server with /api proxied.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/pg.sh
source scripts/deps.sh

ensure_node_modules
source scripts/app-env.sh
resolve_pg_base
export NODE_ENV=development

pg_start "$PG_BASE" "$PG_PORT"
pids=()
shutdown() {
  trap '' INT TERM
  trap - EXIT
  for p in "${pids[@]}"; do kill -TERM "$p" 2>/dev/null || true; done
  wait 2>/dev/null || true
  pg_log "stopping PostgreSQL"
  pg_stop "$PG_BASE"
}
trap shutdown EXIT
trap 'exit 0' INT TERM
prepare_database
node_modules/.bin/tsx watch server/index.ts & pids+=($!)
node_modules/.bin/vite & pids+=($!)
wait -n "${pids[@]}" || true

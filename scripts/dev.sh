#!/usr/bin/env bash
# npm run dev: database + API server (restarts on change) + Vite dev server with /api proxied.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/pg.sh
source scripts/deps.sh

source scripts/app-env.sh
export NODE_ENV=development

ensure_node_modules
pg_start "$PG_BASE" "$PG_PORT"
pids=()
shutdown() {
  trap - INT TERM EXIT
  for p in "${pids[@]}"; do kill -TERM "$p" 2>/dev/null || true; done
  wait 2>/dev/null || true
  pg_stop "$PG_BASE"
}
trap shutdown INT TERM EXIT
prepare_database
node_modules/.bin/tsx watch server/index.ts & pids+=($!)
node_modules/.bin/vite & pids+=($!)
wait -n "${pids[@]}" || true

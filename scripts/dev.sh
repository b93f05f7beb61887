#!/usr/bin/env bash
# npm run dev: database + API server (restarts on change) + Vite dev server with /api proxied.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/pg.sh
source scripts/deps.sh

PG_PORT="${TACKLINE_PG_PORT:-54717}"
PG_BASE="${TACKLINE_PG_DIR:-$PWD/.data/postgres}"
export TACKLINE_PORT="${TACKLINE_PORT:-4717}"
export PORT="$TACKLINE_PORT"
export DATABASE_URL="${DATABASE_URL:-postgres://postgres@127.0.0.1:$PG_PORT/tackline}"
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
pg_ensure_db "$PG_PORT" tackline
npx tsx server/db/run-migrations.ts
npx tsx server/db/seed/run-seed.ts
node_modules/.bin/tsx watch server/index.ts & pids+=($!)
node_modules/.bin/vite & pids+=($!)
wait -n "${pids[@]}" || true

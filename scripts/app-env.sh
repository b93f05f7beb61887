#!/usr/bin/env bash
# Settings shared by `npm start` and `npm run dev`: where the database lives and which ports.
# Source it from the repo root after pg.sh; every value can be overridden from the environment.
PG_PORT="${TACKLINE_PG_PORT:-54717}"
PG_BASE="${TACKLINE_PG_DIR:-$PWD/.data/postgres}"
export TACKLINE_PORT="${TACKLINE_PORT:-4717}"
export PORT="$TACKLINE_PORT"
export DATABASE_URL="${DATABASE_URL:-postgres://postgres@127.0.0.1:$PG_PORT/tackline}"

# Creates the database when missing, then brings its schema and the demo data up to date.
prepare_database() {
  pg_ensure_db "$PG_PORT" tackline
  pg_log "running migrations"
  node_modules/.bin/tsx server/db/run-migrations.ts
  pg_log "loading demo data (idempotent)"
  node_modules/.bin/tsx server/db/seed/run-seed.ts
}

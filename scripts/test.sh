#!/usr/bin/env bash
# npm test: a throwaway PostgreSQL cluster (never the start command's data), Chromium for the
# browser tests, then type-checking, lint, the client build and every vitest suite.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/pg.sh
source scripts/deps.sh

PG_PORT="${TACKLINE_TEST_PG_PORT:-54718}"
PG_BASE="$PWD/.tmp/pg-test-$PG_PORT"

ensure_node_modules
# Debian packages the browser and PDF tests need: Chromium, and pdftoppm (poppler-utils).
need=()
[ -x /usr/bin/chromium ] || need+=(chromium)
command -v pdftoppm >/dev/null || need+=(poppler-utils)
if [ ${#need[@]} -gt 0 ]; then
  if [ "$(id -u)" -eq 0 ]; then
    pg_log "installing Debian packages for the tests (first run only): ${need[*]}"
    export DEBIAN_FRONTEND=noninteractive
    apt-get install -y -q "${need[@]}" >/dev/null 2>&1 || { apt-get update -q >/dev/null && apt-get install -y -q "${need[@]}" >/dev/null; }
  else
    pg_log "missing Debian packages: sudo apt-get install -y ${need[*]}"; exit 1
  fi
fi

pg_stop "$PG_BASE" 2>/dev/null || true
rm -rf "$PG_BASE"
mkdir -p "$PG_BASE"
cleanup() { pg_stop "$PG_BASE"; rm -rf "$PG_BASE"; }
trap cleanup EXIT
pg_start "$PG_BASE" "$PG_PORT" throwaway
export TEST_DATABASE_ADMIN_URL="postgres://postgres@127.0.0.1:$PG_PORT/postgres"
export NODE_ENV=test

pg_log "type-checking"
npm run -s typecheck
pg_log "linting"
npm run -s lint
pg_log "building the client for the browser tests"
npx vite build --logLevel warn
pg_log "running the tests"
npx vitest run "$@"

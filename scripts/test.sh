#!/usr/bin/env bash
# npm test: a throwaway PostgreSQL cluster (never the start command's data), Chromium for the
# browser tests, then type-checking, lint, the client build and every vitest suite.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/pg.sh
source scripts/deps.sh

PG_PORT="${TACKLINE_TEST_PG_PORT:-54718}"

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

# The throwaway cluster: in .tmp/ when the database's OS user can enter the checkout, else (as
# root in a checkout under a mode-700 folder) in /tmp/tackline-pg-test-<port>, owned by postgres.
PG_BIN=$(pg_find_bin)
for candidate in "$PWD/.tmp/pg-test-$PG_PORT" "/tmp/tackline-pg-test-$PG_PORT"; do
  PG_BASE="$candidate"
  # A cluster left by an interrupted run on this port: stop it, start afresh.
  pg_stop "$PG_BASE" 2>/dev/null || true
  rm -rf "$PG_BASE"
  if pg_dir_usable "$PG_BASE"; then break; fi
  rm -rf "$PG_BASE"
done
pg_dir_usable "$PG_BASE" || { pg_log "no folder the postgres user can enter for the test cluster"; exit 1; }
cleanup() {
  trap '' INT TERM
  pg_stop "$PG_BASE"
  rm -rf "$PG_BASE"
}
trap cleanup EXIT
trap 'exit 130' INT
trap 'exit 143' TERM
pg_start "$PG_BASE" "$PG_PORT" throwaway
export TEST_DATABASE_ADMIN_URL="postgres://postgres@127.0.0.1:$PG_PORT/postgres"
export NODE_ENV=test

pg_log "type-checking"
npm run -s typecheck
pg_log "linting"
npm run -s lint
pg_log "building the client for the browser tests"
node_modules/.bin/vite build --logLevel warn
pg_log "running the tests"
node_modules/.bin/vitest run "$@"

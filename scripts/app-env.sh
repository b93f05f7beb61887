#!/usr/bin/env bash
# Settings shared by `npm start` and `npm run dev`: where the database lives and which ports.
# Source it from the repo root after pg.sh, then call resolve_pg_base; every value can be
# overridden from the environment.
PG_PORT="${TACKLINE_PG_PORT:-54717}"
export TACKLINE_PORT="${TACKLINE_PORT:-4717}"
export PORT="$TACKLINE_PORT"
export DATABASE_URL="${DATABASE_URL:-postgres://postgres@127.0.0.1:$PG_PORT/tackline}"

# The cluster folder recorded for this checkout when it cannot live inside it.
PG_LOCATION_FILE=.data/postgres-location
# Parent of those outside folders (one per checkout).
PG_OUTSIDE_ROOT="${TACKLINE_PG_OUTSIDE_ROOT:-/var/lib/tackline}"

# Sets PG_BASE, the start command's cluster folder: TACKLINE_PG_DIR when set; else the folder
# recorded in .data/postgres-location; else .data/postgres in the checkout when the postgres
# user can enter it; else a new postgres-owned folder under /var/lib/tackline, recorded in
# .data/postgres-location so that every later start finds the same data.
resolve_pg_base() {
  # As root the check below needs the postgres user, which Debian's package creates.
  PG_BIN=$(pg_find_bin) || return 1
  if [ -n "${TACKLINE_PG_DIR:-}" ]; then
    case "$TACKLINE_PG_DIR" in /*) PG_BASE="$TACKLINE_PG_DIR" ;; *) PG_BASE="$PWD/$TACKLINE_PG_DIR" ;; esac
    return 0
  fi
  if [ -s "$PG_LOCATION_FILE" ]; then
    PG_BASE="$(cat "$PG_LOCATION_FILE")"
    return 0
  fi
  PG_BASE="$PWD/.data/postgres"
  if pg_dir_usable "$PG_BASE"; then return 0; fi
  rmdir "$PG_BASE" 2>/dev/null || true
  local name
  name=$(basename "$PWD" | tr -c 'A-Za-z0-9._\n-' '_')
  mkdir -p "$PG_OUTSIDE_ROOT"
  chmod 755 "$PG_OUTSIDE_ROOT"
  PG_BASE=$(mktemp -d "$PG_OUTSIDE_ROOT/$name-XXXXXXXX")
  chown postgres:postgres "$PG_BASE"
  # Says which checkout a folder belongs to, for whoever tidies /var/lib/tackline.
  printf '%s\n' "$PWD" >"$PG_BASE/checkout"
  pg_dir_usable "$PG_BASE" || { pg_log "the postgres user cannot enter $PG_BASE either"; return 1; }
  mkdir -p .data
  printf '%s\n' "$PG_BASE" >"$PG_LOCATION_FILE"
  pg_log "the postgres user cannot enter this checkout's folders, so the database lives in $PG_BASE (recorded in $PG_LOCATION_FILE)"
}

# The address the scripts probe: the server's HOST, or loopback when it listens on every address.
app_probe_url() {
  local host="${HOST:-127.0.0.1}"
  case "$host" in 0.0.0.0 | :: | '[::]') host=127.0.0.1 ;; esac
  case "$host" in *:*) host="[${host#[}" && host="${host%]}]" ;; esac
  printf 'http://%s:%s' "$host" "$TACKLINE_PORT"
}

# Succeeds when the server answers GET /api/health with 200.
app_healthy() {
  node -e "fetch('$(app_probe_url)/api/health').then(r=>process.exit(r.ok?0:1),()=>process.exit(1))" 2>/dev/null
}

# When the address printed in the sheets' QR codes is a loopback one (PUBLIC_URL unset, or set to
# 127.x, localhost or ::1), a phone in the bay cannot open it: say how to give it the LAN address.
public_url_hint() {
  node -e '
    const os = require("node:os");
    const port = process.env.TACKLINE_PORT;
    const url = process.env.PUBLIC_URL || `http://${process.env.HOST || "127.0.0.1"}:${port}`;
    let host;
    try { host = new URL(url).hostname.replace(/^\[|\]$/g, ""); } catch { process.exit(0); }
    if (!(host === "localhost" || host === "::1" || /^127\./.test(host))) process.exit(0);
    const lan = Object.values(os.networkInterfaces()).flat()
      .find((a) => a && a.family === "IPv4" && !a.internal)?.address;
    const ip = lan ?? "<LAN address of this machine>";
    const lines = [
      `QR codes on the sheets point at ${url}, which a phone in the bay cannot open.`,
      `To make them work, start with the LAN address of this machine (and listen on it), e.g.:`,
      `    PUBLIC_URL=http://${ip}:${port} HOST=${ip} npm start`,
      "(or serve Tackline through a reverse proxy and set PUBLIC_URL to its https address)",
    ];
    for (const l of lines) process.stderr.write(`\x1b[33m[tackline]\x1b[0m ${l}\n`);
  '
}

# Creates the database when missing, then brings its schema and the demo data up to date.
prepare_database() {
  pg_ensure_db "$PG_PORT" tackline
  pg_log "running migrations"
  node_modules/.bin/tsx server/db/run-migrations.ts
  pg_log "loading demo data (idempotent)"
  node_modules/.bin/tsx server/db/seed/run-seed.ts
}

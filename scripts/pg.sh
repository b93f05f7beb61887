#!/usr/bin/env bash
# PostgreSQL on loopback for `npm start` and `npm test`: finds (or installs) Debian's
# server binaries, creates a cluster in a given folder and starts/stops it.
# The server refuses to run as root, so as root every command runs as `postgres`, and the
# cluster folder must be one that `postgres` can reach (see pg_dir_usable).
# Source this file; it defines functions only.

pg_log() { printf '\033[36m[tackline]\033[0m %s\n' "$*" >&2; }

# Prints the bin folder of the newest installed PostgreSQL, installing Debian's package if none.
pg_find_bin() {
  local dir
  dir=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1)
  if [ -z "$dir" ] || [ ! -x "$dir/initdb" ]; then
    if [ "$(id -u)" -ne 0 ]; then
      pg_log "PostgreSQL server binaries not found; install Debian's 'postgresql' package (sudo apt-get install -y postgresql)"
      return 1
    fi
    pg_log "installing Debian's postgresql package (first run only)…"
    export DEBIAN_FRONTEND=noninteractive
    apt-get install -y -q postgresql >/dev/null 2>&1 || { apt-get update -q >/dev/null && apt-get install -y -q postgresql >/dev/null; } || return 1
    dir=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1)
  fi
  printf '%s\n' "$dir"
}

# Runs a command as the database OS user (postgres when we are root, else ourselves). As root
# it runs from / because postgres may not be able to enter the current folder (paths are absolute).
pg_as_owner() {
  if [ "$(id -u)" -eq 0 ]; then (cd / && runuser -u postgres -- "$@"); else "$@"; fi
}

# pg_dir_usable DIR: creates DIR and succeeds when the database's OS user can enter it. As root
# that user is `postgres`, which cannot pass a parent folder of mode 700 (a checkout under /root
# or in a `mktemp -d` folder): then the cluster has to live somewhere else.
pg_dir_usable() {
  mkdir -p "$1" || return 1
  [ "$(id -u)" -ne 0 ] || pg_as_owner test -x "$1" 2>/dev/null
}

# pg_start BASE PORT [throwaway]: create the cluster in BASE/data when missing, start it on
# 127.0.0.1:PORT (socket in BASE/sock) unless it already runs. "throwaway" turns fsync off.
pg_start() {
  local base="$1" port="$2" mode="${3:-}" bin
  bin=$(pg_find_bin) || return 1
  PG_BIN="$bin"
  mkdir -p "$base/sock"
  if [ "$(id -u)" -eq 0 ]; then chown -R postgres:postgres "$base"; fi
  chmod 700 "$base"
  if [ ! -f "$base/data/PG_VERSION" ]; then
    pg_log "creating database cluster in $base/data"
    pg_as_owner "$bin/initdb" -D "$base/data" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >"$base/initdb.log" 2>&1 \
      || { cat "$base/initdb.log" >&2; return 1; }
  fi
  if pg_as_owner "$bin/pg_ctl" -D "$base/data" status >/dev/null 2>&1; then
    pg_log "PostgreSQL already running in $base/data"
  else
    local opts="-c listen_addresses=127.0.0.1 -p $port -k $base/sock"
    if [ "$mode" = "throwaway" ]; then opts="$opts -c fsync=off -c synchronous_commit=off -c full_page_writes=off"; fi
    pg_as_owner "$bin/pg_ctl" -D "$base/data" -l "$base/server.log" -w -t 30 -o "$opts" start >/dev/null \
      || { tail -20 "$base/server.log" >&2; return 1; }
  fi
  "$bin/pg_isready" -q -h 127.0.0.1 -p "$port" -U postgres -t 15 || { pg_log "PostgreSQL did not answer on port $port"; return 1; }
}

# pg_stop BASE: fast shutdown, quiet when not running.
pg_stop() {
  local base="$1" bin="${PG_BIN:-$(pg_find_bin)}"
  if [ -f "$base/data/postmaster.pid" ]; then
    pg_as_owner "$bin/pg_ctl" -D "$base/data" -m fast -w -t 30 stop >/dev/null 2>&1 || true
  fi
}

# pg_ensure_db PORT NAME: create the database when missing.
pg_ensure_db() {
  local port="$1" name="$2"
  if ! "$PG_BIN/psql" -h 127.0.0.1 -p "$port" -U postgres -d postgres -tAc "select 1 from pg_database where datname='$name'" | grep -q 1; then
    "$PG_BIN/psql" -q -h 127.0.0.1 -p "$port" -U postgres -d postgres -c "create database \"$name\"" >/dev/null
  fi
}

#!/usr/bin/env bash
# Installs npm dependencies from the lockfile when node_modules is missing or older than it.
ensure_node_modules() {
  if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    printf '\033[36m[tackline]\033[0m installing npm dependencies (npm ci)…\n' >&2
    npm ci --no-audit --no-fund --loglevel=error
  fi
}

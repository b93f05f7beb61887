#!/usr/bin/env bash
# npm dependencies for start, dev and test. Source it; it defines functions only.

# Succeeds when node_modules holds every package of package-lock.json at its locked version,
# devDependencies included (they build the client and run the tests). npm's own record of what
# it installed (node_modules/.package-lock.json) says which; optional packages are skipped
# (most are other platforms' binaries). An install made with --omit=dev or NODE_ENV=production,
# an older lockfile or a deleted package folder all fail this check.
node_modules_complete() {
  node -e '
    const fs = require("node:fs");
    let locked, installed;
    try {
      locked = JSON.parse(fs.readFileSync("package-lock.json", "utf8")).packages;
      installed = JSON.parse(fs.readFileSync("node_modules/.package-lock.json", "utf8")).packages;
    } catch {
      process.exit(1);
    }
    for (const [dir, entry] of Object.entries(locked)) {
      if (dir === "" || entry.optional || entry.link) continue;
      const got = installed[dir];
      if (!got || got.version !== entry.version || !fs.existsSync(dir + "/package.json")) {
        console.error(`[tackline] node_modules lacks ${dir.slice("node_modules/".length)}@${entry.version}`);
        process.exit(1);
      }
    }
  '
}

# Installs the lockfile's packages (devDependencies always included, whatever NODE_ENV says)
# when node_modules is missing, incomplete or older than the lockfile.
ensure_node_modules() {
  if node_modules_complete; then return 0; fi
  printf '\033[36m[tackline]\033[0m installing npm dependencies (npm ci)…\n' >&2
  npm ci --include=dev --prefer-offline --no-audit --no-fund --loglevel=error
  node_modules_complete
}

#!/usr/bin/env bash
# Shared preparation for scripts/start.sh and scripts/test.sh. Safe to run again: each step checks first.
#   1. Debian packages: postgresql redis-server chromium poppler-utils (only the missing ones).
#   2. npm dependencies: `npm ci` only when node_modules does not match package-lock.json.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$ROOT"

say() { printf '[setup] %s\n' "$*"; }

# ---------------------------------------------------------------- Debian packages

PACKAGES=(postgresql redis-server chromium poppler-utils)
missing=()
for pkg in "${PACKAGES[@]}"; do
  if ! dpkg-query -W -f='${Status}' "$pkg" 2>/dev/null | grep -q 'install ok installed'; then
    missing+=("$pkg")
  fi
done

if [ "${#missing[@]}" -eq 0 ]; then
  say "Debian packages: all present (${PACKAGES[*]})"
else
  say "Debian packages: installing missing ${missing[*]}"
  if [ "$(id -u)" -eq 0 ]; then
    SUDO=()
  elif command -v sudo >/dev/null 2>&1 && sudo -n true 2>/dev/null; then
    SUDO=(sudo)
  else
    say "ERROR: installing packages needs root. Run this, then start again:"
    say "  sudo apt-get update && sudo DEBIAN_FRONTEND=noninteractive apt-get install -y --no-install-recommends ${missing[*]}"
    exit 1
  fi
  say "  apt-get update"
  "${SUDO[@]}" apt-get update -qq
  say "  apt-get install ${missing[*]}"
  "${SUDO[@]}" env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null
  # Debian starts a cluster of its own on port 5432; we run our own under .data/, so that one is not needed,
  # and it does no harm either: it never touches our port.
fi

# ---------------------------------------------------------------- npm dependencies

lock_hash="$(sha256sum package-lock.json | cut -d' ' -f1)"
stamp="node_modules/.tw-lock-hash"

# Whether node_modules already holds exactly what package-lock.json names (npm's own record of what it
# installed, node_modules/.package-lock.json, is compared entry by entry). Spares a full reinstall when
# someone ran `npm install` by hand and the tree is already right.
installed_matches_lock() {
  [ -f node_modules/.package-lock.json ] || return 1
  node -e '
    const fs = require("node:fs");
    const wanted = JSON.parse(fs.readFileSync("package-lock.json", "utf8")).packages ?? {};
    const have = JSON.parse(fs.readFileSync("node_modules/.package-lock.json", "utf8")).packages ?? {};
    for (const [path, entry] of Object.entries(wanted)) {
      if (path === "") continue;
      const installed = have[path];
      if (!installed) {
        if (entry.optional) continue; // built for another platform
        process.exit(1);
      }
      if (installed.version !== entry.version) process.exit(1);
    }
  ' 2>/dev/null
}

if [ -f "$stamp" ] && [ "$(cat "$stamp")" = "$lock_hash" ]; then
  say "npm dependencies: up to date (package-lock.json unchanged since the last install)"
elif [ -d node_modules ] && installed_matches_lock; then
  say "npm dependencies: node_modules already matches package-lock.json; recording that"
  printf '%s\n' "$lock_hash" >"$stamp"
else
  say "npm dependencies: running npm ci (node_modules missing or out of date)"
  npm ci --no-audit --no-fund
  printf '%s\n' "$lock_hash" >"$stamp"
fi

#!/usr/bin/env bash
# Shared set-up for `npm start` and `npm test`: node modules, PostgreSQL on loopback, migrations, demo seed.
# Idempotent: a second run keeps all data and skips what is already done.
set -euo pipefail
cd "$(dirname "$0")/.."

node_major=$(node -p 'process.versions.node.split(".")[0]')
if [ "$node_major" -lt 20 ]; then echo "Tubeloom needs Node.js 20.19 or newer (found $(node -v))." >&2; exit 1; fi

# Install node modules when missing or when package-lock.json changed since the last install.
lock_hash=$(sha1sum package-lock.json package.json | sha1sum | cut -c1-40)
stamp=node_modules/.tubeloom-install-stamp
if [ ! -f "$stamp" ] || [ "$(cat "$stamp")" != "$lock_hash" ]; then
  echo "== installing node modules (npm ci)"
  npm ci --no-audit --no-fund --loglevel=error
  echo "$lock_hash" > "$stamp"
fi

echo "== PostgreSQL"
bash scripts/pg.sh start

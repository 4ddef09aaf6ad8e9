#!/usr/bin/env bash
# `npm start`: the team server and everything it needs, in the foreground.
#   1. scripts/ensure.sh: the Debian packages (mariadb-server, chromium) and node_modules (npm ci)
#      when they are missing or stale.
#   2. The private MariaDB (scripts/db.sh) on 127.0.0.1:3407, its data in .data/mariadb.
#   3. The web app built with vite into dist/web, when its sources are newer than the build.
#   4. server/main.ts: migrations; the fake S3 (s3rver, data in .data/s3) and the SMTP sink, both on
#      loopback and started by the server itself; the demo seeded on first start (accounts printed
#      and kept in .data/demo-users.txt); /api and the web app on http://127.0.0.1:8080/.
#   5. On first start, scripts/push-demo.mjs sweeps the demo studies (a depot roof of 4,800 variants, a
#      sized variant of it, a sized footbridge study) and pushes them as the demo engineer.
# Ctrl-C stops the server, then MariaDB. A second `npm start` reuses everything in .data/ (git-ignored).
# Settings: PORT, DB_PORT, PANELPOINT_DATA (default .data), LOG_LEVEL (warn; info logs each request);
# S3_* and SMTP_* use real services instead of the fake S3 and the sink.
set -euo pipefail
cd "$(dirname "$0")/.."
DATA=${PANELPOINT_DATA:-.data}
export PORT=${PORT:-8080}
DB_PORT=${DB_PORT:-3407}

bash scripts/ensure.sh
mkdir -p "$DATA"
bash scripts/db.sh start "$DATA/mariadb" "$DB_PORT" panelpoint
stop_db() { bash scripts/db.sh stop "$DATA/mariadb" >/dev/null 2>&1 || true; echo "panelpoint: MariaDB stopped" >&2; }
trap stop_db EXIT

newer=$(find src shared index.html vite.config.ts tsconfig.web.json package-lock.json -newer dist/web/index.html -type f -print -quit 2>/dev/null || true)
if [ ! -f dist/web/index.html ] || [ -n "$newer" ]; then
  echo "panelpoint: building the web app (vite build → dist/web)" >&2
  npx vite build --logLevel error
fi

# A session secret kept across restarts, so that signing in survives them.
if [ -z "${JWT_SECRET:-}" ]; then
  [ -f "$DATA/jwt-secret" ] || (umask 077; head -c 48 /dev/urandom | base64 | tr -d '\n/+=' > "$DATA/jwt-secret")
  JWT_SECRET=$(cat "$DATA/jwt-secret")
fi
set -a
# shellcheck disable=SC1091
. "$DATA/mariadb/run/env"
set +a
export JWT_SECRET DATA_DIR="$DATA" DEMO_USERS_FILE="$DATA/demo-users.txt" WEB_DIR=dist/web LOG_LEVEL=${LOG_LEVEL:-warn}

# The server runs as a child so that Ctrl-C (or a TERM to this script) reaches it and it stops
# cleanly before MariaDB does.
node --import tsx server/main.ts &
pid=$!
# First start: sweep the demo studies and push them as the demo engineer (skipped once done).
node scripts/push-demo.mjs "$DATA" "$PORT" || true
trap 'kill -INT "$pid" 2>/dev/null || true' INT TERM
while kill -0 "$pid" 2>/dev/null; do
  wait "$pid" || true
done
status=0
wait "$pid" 2>/dev/null || status=$?
exit "$status"

#!/usr/bin/env bash
# `npm start`: everything needed to use Tunnelwright locally, in demo mode, on http://localhost:3000.
#   setup → services → migrate → seed → build the client (when its sources changed) → API and worker in the
#   background (pid files and logs in .data/) → wait for /api/health → print the URL and demo sign-ins.
# Running it again restarts the API and the worker. `npm stop` stops everything it started.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$ROOT"
DATA="$ROOT/.data"
mkdir -p "$DATA"

say() { printf '[start] %s\n' "$*"; }

export PORT="${PORT:-3000}"
export DATABASE_URL="${DATABASE_URL:-postgres://postgres@127.0.0.1:54329/tunnelwright}"
export REDIS_URL="${REDIS_URL:-redis://127.0.0.1:63790}"
export SMTP_URL="${SMTP_URL:-smtp://127.0.0.1:2525}"
export PUBLIC_URL="${PUBLIC_URL:-http://localhost:$PORT}"
export MAIL_DIR="${MAIL_DIR:-$DATA/mail}"
export WEB_DIST="${WEB_DIST:-$ROOT/dist/web/browser}"
export DEMO_MODE=true

say "1/7 setup"
bash scripts/setup.sh

say "2/7 services"
bash scripts/services.sh start pg redis smtp

say "3/7 database migrations"
node --import tsx scripts/migrate.ts

say "4/7 demo data (safe to repeat)"
node --import tsx scripts/seed.ts

say "5/7 client"
index="$WEB_DIST/index.html"
if [ -f "$index" ] && [ -z "$(find apps/web/src apps/web/public angular.json apps/web/tsconfig.app.json package-lock.json -newer "$index" -print -quit 2>/dev/null)" ]; then
  say "  build is newer than the client sources: skipping the build"
else
  say "  building the client (npx ng build --configuration production)"
  npx ng build --configuration production --no-progress
fi

say "6/7 API and worker"
bash scripts/stop.sh apps
if ss -Hltn "sport = :$PORT" 2>/dev/null | grep -q .; then
  printf '[start] ERROR: port %s is taken by another program, so the API cannot start.\n' "$PORT" >&2
  ss -Hltnp "sport = :$PORT" 2>/dev/null | sed 's/^/[start]   /' >&2 || true
  printf '[start]   Free it with: fuser -k %s/tcp   (or start on another port: PORT=3001 npm start)\n' "$PORT" >&2
  exit 1
fi
nohup node --import tsx apps/api/src/server.ts >>"$DATA/api.log" 2>&1 </dev/null &
echo $! >"$DATA/api.pid"
say "  API started (pid $(cat "$DATA/api.pid"), log .data/api.log)"
nohup node --import tsx apps/worker/src/main.ts >>"$DATA/worker.log" 2>&1 </dev/null &
echo $! >"$DATA/worker.pid"
say "  worker started (pid $(cat "$DATA/worker.pid"), log .data/worker.log)"

say "7/7 waiting for http://127.0.0.1:$PORT/api/health"
healthy=0
for _ in $(seq 1 120); do
  if curl -fsS "http://127.0.0.1:$PORT/api/health" >/dev/null 2>&1; then healthy=1; break; fi
  if ! kill -0 "$(cat "$DATA/api.pid")" 2>/dev/null; then break; fi
  sleep 0.5
done
if [ "$healthy" -ne 1 ]; then
  say "ERROR: the API did not become healthy. Last lines of .data/api.log:"
  tail -25 "$DATA/api.log" >&2 || true
  exit 1
fi

cat <<BANNER

  Tunnelwright is running: $PUBLIC_URL
  Demo mode is on: e-mail goes to the local SMTP fake and shows in the dev mailbox (.data/mail).

  Demo sign-ins (a customer of each of the two firms):
BANNER
node --import tsx -e "
  const { demoUsers, demoPassword } = await import('./scripts/seed/demo-users.ts');
  for (const user of demoUsers) console.log('    ' + user.role.padEnd(12) + user.email.padEnd(34) + demoPassword);
"
cat <<'BANNER'

  Results shown by Tunnelwright are test data, not design values: design loads are for a licensed
  engineer to determine under the local code.

  Stop everything with: npm stop
BANNER

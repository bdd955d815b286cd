#!/usr/bin/env bash
# `npm stop`: stops what `npm start` started: the API, the worker, then the SMTP fake, Redis and PostgreSQL.
#   scripts/stop.sh        everything
#   scripts/stop.sh apps   only the API and the worker (start.sh uses this to restart them)
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$ROOT"
DATA="$ROOT/.data"

say() { printf '[stop] %s\n' "$*"; }

# stop_process LABEL PID_FILE COMMAND_TEXT: SIGTERM, up to 15 s for a clean close, then SIGKILL.
stop_process() {
  local label="$1" pid_file="$2" needle="$3" pid
  pid="$( [ -f "$pid_file" ] && cat "$pid_file" || true )"
  if [ -n "$pid" ] && [ -r "/proc/$pid/cmdline" ] && tr '\0' ' ' <"/proc/$pid/cmdline" | grep -q -- "$needle"; then
    say "$label: stopping (pid $pid)"
    kill -TERM "$pid" 2>/dev/null || true
    for _ in $(seq 1 150); do
      kill -0 "$pid" 2>/dev/null || break
      sleep 0.1
    done
    if kill -0 "$pid" 2>/dev/null; then
      say "$label: still running after 15 s, killing it"
      kill -KILL "$pid" 2>/dev/null || true
    fi
  elif [ -f "$pid_file" ]; then
    say "$label: not running (removing stale pid file)"
  else
    say "$label: not running"
  fi
  rm -f "$pid_file"
}

stop_process "API" "$DATA/api.pid" "apps/api/src/server.ts"
stop_process "worker" "$DATA/worker.pid" "apps/worker/src/main.ts"

if [ "${1:-}" != "apps" ]; then
  bash scripts/services.sh stop
fi

#!/usr/bin/env bash
# `npm test`: the whole suite against real services, in this order, going on after a failure:
#   typecheck, lint, unit tests (vitest `unit` project, then the Angular specs), client build,
#   API and worker integration tests, browser tests.
# Tests use their own database (tunnelwright_test, recreated here), Redis database 1 (flushed here) and a
# second SMTP fake on 127.0.0.1:2526 that writes to .data/test-mail, so the demo data stays untouched.
# Ends with `Summary: N passed, N failed` and exits non-zero when anything failed or nothing ran.
set -uo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$ROOT"

RESULTS="$ROOT/.data/test-results"
LEDGER="$RESULTS/ledger.jsonl"
TEST_DB=tunnelwright_test
PSQL=(psql -h 127.0.0.1 -p 54329 -U postgres -v ON_ERROR_STOP=1 -q)

header() { printf '\n==================== %s ====================\n' "$*"; }
summary_tool() { node --import tsx scripts/test-summary.ts "$@"; }

export CI="${CI:-}"
export DATABASE_URL="postgres://postgres@127.0.0.1:54329/$TEST_DB"
export REDIS_URL="redis://127.0.0.1:63790/1"
export SMTP_URL="smtp://127.0.0.1:2526"
export MAIL_DIR="$ROOT/.data/test-mail"
export DEMO_MODE=true
export PUBLIC_URL="http://localhost:3000"
export WEB_DIST="$ROOT/dist/web/browser"
export LOG_LEVEL="${LOG_LEVEL:-warn}"

started_at=$(date +%s)

header "setup"
if ! bash scripts/setup.sh; then
  echo "[test] setup failed: nothing can run"
  echo "Summary: 0 passed, 1 failed"
  exit 1
fi

mkdir -p "$RESULTS"
rm -f "$RESULTS"/*.json "$LEDGER"

header "services"
if ! bash scripts/services.sh start pg redis test-mail; then
  summary_tool record "$LEDGER" services 1
  summary_tool report "$LEDGER"
  exit 1
fi
# The test SMTP fake is ours for this run only.
trap 'bash scripts/services.sh stop test-mail >/dev/null 2>&1 || true' EXIT

header "test database and Redis"
prepared=0
echo "[test] recreating database $TEST_DB"
if "${PSQL[@]}" -d postgres -c "DROP DATABASE IF EXISTS $TEST_DB WITH (FORCE)" -c "CREATE DATABASE $TEST_DB"; then
  echo "[test] migrating $TEST_DB"
  if node --import tsx scripts/migrate.ts; then
    echo "[test] flushing Redis database 1"
    redis-cli -p 63790 -n 1 flushdb >/dev/null && prepared=1
  fi
fi
rm -rf "$MAIL_DIR" && mkdir -p "$MAIL_DIR"
if [ "$prepared" -ne 1 ]; then
  summary_tool record "$LEDGER" "prepare test database" 1
else
  summary_tool record "$LEDGER" "prepare test database" 0
fi

# Each step has a time limit so that a hanging test cannot hold the whole run (exit code 124 then).
limited() {
  local seconds="$1"; shift
  timeout --kill-after=20 "$seconds" "$@"
  local code=$?
  [ "$code" -eq 124 ] && echo "[test] stopped after ${seconds} s: time limit of this step"
  return "$code"
}

# run_check NAME SECONDS COMMAND...: a step that counts as one check.
run_check() {
  local name="$1" seconds="$2"; shift 2
  header "$name"
  limited "$seconds" "$@"
  summary_tool record "$LEDGER" "$name" "$?"
}

# run_vitest NAME SECONDS JSON COMMAND...: a step whose tests are counted from vitest's JSON report.
run_vitest() {
  local name="$1" seconds="$2" json="$3"; shift 3
  header "$name"
  limited "$seconds" "$@"
  summary_tool record "$LEDGER" "$name" "$?" "$json"
}

run_check "typecheck" 300 npm run --silent typecheck
run_check "lint" 300 npm run --silent lint

run_vitest "unit (vitest)" 600 "$RESULTS/unit.json" \
  node_modules/.bin/vitest run --project unit --passWithNoTests --reporter=default --reporter=json --outputFile.json="$RESULTS/unit.json"

if find apps/web/src -name '*.spec.ts' -print -quit 2>/dev/null | grep -q .; then
  run_vitest "unit (Angular)" 600 "$RESULTS/web-unit.json" \
    node_modules/.bin/ng test --no-watch --no-progress --reporters=json --reporters=default --output-file="$RESULTS/web-unit.json"
else
  header "unit (Angular)"
  echo "[test] no Angular specs yet (apps/web/src/**/*.spec.ts): skipped"
fi

run_check "build client" 600 node_modules/.bin/ng build --configuration production --no-progress

run_vitest "integration" 900 "$RESULTS/integration.json" \
  node_modules/.bin/vitest run --project integration --passWithNoTests --reporter=default --reporter=json --outputFile.json="$RESULTS/integration.json"

run_vitest "browser" 600 "$RESULTS/browser.json" \
  node_modules/.bin/vitest run --project browser --passWithNoTests --reporter=default --reporter=json --outputFile.json="$RESULTS/browser.json"

header "summary"
echo "[test] took $(( $(date +%s) - started_at )) s"
summary_tool report "$LEDGER"

#!/usr/bin/env bash
# npm test: the same set-up as npm start on a separate data folder and ports, then every
# suite (type checks, unit, integration, contract and browser tests), then one summary line.
set -uo pipefail
source "$(dirname "$0")/lib/common.sh"
export DATA_DIR="${TEST_DATA_DIR:-$ROOT/.data/test}"
export RUN_DIR="$DATA_DIR/run"
export NODE_ENV=test
export PORT="${TEST_PORT:-3010}" DB_PORT="${TEST_DB_PORT:-3317}" DB_NAME=endgrain_test
export SEARCH_PORT="${TEST_SEARCH_PORT:-7710}" SMTP_PORT="${TEST_SMTP_PORT:-1035}" MAIL_VIEWER_PORT="${TEST_MAIL_VIEWER_PORT:-1090}"
export SEARCH_URL="http://127.0.0.1:$SEARCH_PORT" SMTP_URL="smtp://127.0.0.1:$SMTP_PORT"
export MAIL_VIEWER_URL="http://127.0.0.1:$MAIL_VIEWER_PORT"
export PUBLIC_URL="http://127.0.0.1:$PORT"
# Browser tests all sign in from 127.0.0.1; the throttle tests read this limit.
export SIGN_IN_LIMIT_PER_IP="${SIGN_IN_LIMIT_PER_IP:-60}"
export E2E_SHOT_DIR="${E2E_SHOT_DIR:-$DATA_DIR/screenshots}"
source "$ROOT/scripts/env.sh"
source "$ROOT/scripts/lib/mariadb.sh"
REPORTS="$DATA_DIR/reports"
# `npm test -- browser server` runs only the named suites and checks (for contributors); CI runs all.
ONLY=" $* "
wanted() { [[ "$ONLY" == "  " || "$ONLY" == *" $1 "* ]]; }

set -e
ensure_node_modules
ensure_chromium
build_all
stop_all_in "$RUN_DIR"   # leftovers of an interrupted run
rm -rf "$REPORTS" "$MAIL_DATA_DIR" "$SEARCH_DATA_DIR" "$UPLOAD_DIR" "$E2E_SHOT_DIR"
mkdir -p "$REPORTS" "$E2E_SHOT_DIR"
start_mariadb
trap 'stop_all_in "$RUN_DIR"' EXIT
db_root -e "DROP DATABASE IF EXISTS \`$DB_NAME\`; CREATE DATABASE \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci; GRANT ALL PRIVILEGES ON \`$DB_NAME\`.* TO '$DB_USER'@'127.0.0.1';"
(cd "$ROOT/server" && node dist/database/migrate.cli.js >/dev/null && node dist/database/seed.cli.js >/dev/null)
start_service search-fake node "$ROOT/search-fake/dist/main.js"
start_service mail-sink node "$ROOT/scripts/mail-sink.mjs"
wait_port "$SEARCH_PORT" "search fake"
wait_port "$MAIL_VIEWER_PORT" "mail sink"
start_service server node "$ROOT/server/dist/main.js"
wait_port "$PORT" "server" 60
set +e

# Each step writes a Jest JSON report, or a one-line pass/fail for the checks.
check() {
  local name=$1; shift
  wanted "$name" || return 0
  say "check: $name"
  if (cd "$ROOT" && "$@") >"$REPORTS/$name.log" 2>&1; then echo pass >"$REPORTS/$name.check"
  else echo fail >"$REPORTS/$name.check"; cat "$REPORTS/$name.log"; fi
}
suite() {
  local name=$1 dir=$2; shift 2
  wanted "$name" || return 0
  say "suite: $name"
  (cd "$ROOT/$dir" && "$@" --json --outputFile="$REPORTS/$name.json") 2>&1 | grep -v '^\s*$' | tail -n 60
}
JEST="node --experimental-vm-modules $ROOT/node_modules/jest/bin/jest.js"

check typecheck npm run -s typecheck
check lint npm run -s lint
check graphql-schema-is-current bash scripts/check-schema.sh
suite shared shared $JEST
suite search-fake search-fake $JEST --runInBand
suite server server $JEST --runInBand --forceExit
suite client client npx jest --config jest.config.cjs
suite browser client npx jest --config e2e/jest.config.cjs --runInBand

node "$ROOT/scripts/summarise-tests.mjs" "$REPORTS" "$@"

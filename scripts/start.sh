#!/usr/bin/env bash
# npm start: set everything up (idempotent) and run Endgrain with the demo scenario.
set -euo pipefail
source "$(dirname "$0")/lib/common.sh"
source "$ROOT/scripts/env.sh"
source "$ROOT/scripts/lib/mariadb.sh"

ensure_node_modules
build_all
start_mariadb

say "migrating the database"
(cd "$ROOT/server" && node dist/database/migrate.cli.js) || die "migrations failed"
say "seeding the demo scenario (only into an empty database)"
(cd "$ROOT/server" && node dist/database/seed.cli.js) || die "seeding failed"

cleanup() { say "stopping"; stop_all_in "$RUN_DIR"; }
trap cleanup EXIT
trap 'exit 130' INT TERM

if [ "$SEARCH_URL" = "http://127.0.0.1:$SEARCH_PORT" ]; then
  start_service search-fake node "$ROOT/search-fake/dist/main.js"
  wait_port "$SEARCH_PORT" "search fake"
fi
if [ "$SMTP_URL" = "smtp://127.0.0.1:$SMTP_PORT" ]; then
  start_service mail-sink node "$ROOT/scripts/mail-sink.mjs"
  wait_port "$MAIL_VIEWER_PORT" "mail sink"
fi
start_service server node "$ROOT/server/dist/main.js"
wait_port "$PORT" "server" 60

cat <<TXT

  Endgrain is running:   $PUBLIC_URL
  Health:                $PUBLIC_URL/health
  Mail viewer (dev):     http://127.0.0.1:$MAIL_VIEWER_PORT

  Demo sign-ins (password: $DEMO_PASSWORD)
    admin@example.org       league administrator
    organiser@example.org   meet organiser
    coach@example.org       club coach
    athlete@example.org     athlete

  Logs in ${RUN_DIR#"$ROOT"/}/. Press Ctrl-C here, or run 'npm stop' elsewhere, to stop.
TXT

# Stay in the foreground until the server exits (or npm stop ends it).
while kill -0 "$(cat "$RUN_DIR/server.pid" 2>/dev/null)" 2>/dev/null; do sleep 1; done
warn "the server stopped; see ${RUN_DIR#"$ROOT"/}/server.log"

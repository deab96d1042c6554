#!/usr/bin/env bash
# npm stop: stop every service that npm start (or an interrupted npm test) started. Data stay.
set -uo pipefail
source "$(dirname "$0")/lib/common.sh"
source "$ROOT/scripts/env.sh"
for dir in "$RUN_DIR" "$ROOT/.data/test/run"; do stop_all_in "$dir"; done
say "stopped; data kept in ${DATA_DIR#"$ROOT"/}/"

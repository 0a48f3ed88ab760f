#!/usr/bin/env bash
# Stops what start.sh started, then PostgreSQL.
set -uo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
load_env_file "$ROOT/.env"
stop_bg web
stop_bg worker
stop_bg mail-catcher
bash scripts/pg.sh stop

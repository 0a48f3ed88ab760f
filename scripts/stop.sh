#!/usr/bin/env bash
# Stops what start.sh and start-cluster.sh started, then PostgreSQL.
set -uo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
load_env_file "$ROOT/.env"
stop_bg nginx
stop_bg web-a
stop_bg web-b
stop_bg web
stop_worker
stop_bg mail-catcher
stop_bg payments
stop_bg uploads
bash scripts/pg.sh stop

#!/usr/bin/env bash
# Starts everything the app needs (idempotent): PostgreSQL, the local fakes, the mail worker, the app.
set -euo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
load_env_file "$ROOT/.env"
PORT=${PORT:-3000}

bash scripts/pg.sh start
if [ "${SERVICES_MODE:-local}" = "local" ]; then
  start_bg mail-catcher "${TSX[@]}" scripts/fakes/mail-catcher.ts
fi
"${TSX[@]}" db/migrate.ts
start_bg worker "${TSX[@]}" scripts/worker.ts
# exec keeps the server's own pid (killing `npx next start` would leave the server running).
start_bg web bash -c "exec node_modules/.bin/next start -H 127.0.0.1 -p $PORT"
wait_http "http://127.0.0.1:$PORT/api/health" web
echo "[web] serving on http://127.0.0.1:$PORT"

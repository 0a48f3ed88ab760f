#!/usr/bin/env bash
# Starts everything the app needs (idempotent): PostgreSQL, the local fakes, the worker, the app.
# The app is one process serving the build directly (no proxy: TRUST_PROXY_HOPS=0). For the
# production shape behind nginx, see scripts/start-cluster.sh (npm run start:cluster).
set -euo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
load_env_file "$ROOT/.env"
PORT=${PORT:-3000}

bash scripts/pg.sh start
if [ "${SERVICES_MODE:-local}" = "local" ]; then
  start_bg mail-catcher "${TSX[@]}" scripts/fakes/mail-catcher.ts
  # The payment stand-in on STRIPE_API_URL (default 127.0.0.1:2610), webhooks to this app, state kept in .data/.
  export STRIPE_FAKE_WEBHOOK_URL=${STRIPE_FAKE_WEBHOOK_URL:-http://127.0.0.1:$PORT/api/payments/webhook}
  export STRIPE_FAKE_DATA_FILE=${STRIPE_FAKE_DATA_FILE:-$ROOT/.data/payments-fake.json}
  start_bg payments "${TSX[@]}" scripts/fakes/payments.ts
  wait_http "${STRIPE_API_URL:-http://127.0.0.1:2610}/health" payments 100
  # The upload stand-in on UPLOADTHING_INGEST_URL (default 127.0.0.1:2620), files in .data/uploads-fake/.
  start_bg uploads "${TSX[@]}" scripts/fakes/uploads.ts
  wait_http "${UPLOADTHING_INGEST_URL:-http://127.0.0.1:2620}/health" uploads 100
fi
"${TSX[@]}" db/migrate.ts
start_worker
start_app web "$PORT"
wait_http "http://127.0.0.1:$PORT/api/health" web
echo "[web] serving on http://127.0.0.1:$PORT"

#!/usr/bin/env bash
# `npm run start:cluster`: the production shape on one machine. nginx on 127.0.0.1:8080 (gzip and
# brotli, a cache for statically generated pages, failover) in front of two app processes on
# 127.0.0.1:3001 and :3002 (scripts/serve.ts, TRUST_PROXY_HOPS=1, COMPRESSION_BY_PROXY=true),
# plus PostgreSQL, the local mail catcher, the payment stand-in and the worker as `npm start` runs them. Idempotent;
# `npm stop` stops it all. Builds first when the build is missing or older than the sources.
# Settings: NGINX_PORT (8080), CLUSTER_PORT_A (3001), CLUSTER_PORT_B (3002), NGINX_DIR (.data/nginx).
set -euo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
started=$(date +%s)

NGINX_PORT=${NGINX_PORT:-8080}
PORT_A=${CLUSTER_PORT_A:-3001}
PORT_B=${CLUSTER_PORT_B:-3002}
NGINX_DIR=${NGINX_DIR:-$ROOT/.data/nginx}
DIST=${NEXT_DIST_DIR:-.next}

ensure_apt curl curl
ensure_apt openssl openssl
ensure_node_modules
ensure_nginx
if [ ! -f .env ]; then
  sed "s/^NEXTAUTH_SECRET=.*/NEXTAUTH_SECRET=$(openssl rand -hex 32)/" .env.example > .env
  echo "[setup] wrote .env from .env.example with a fresh NEXTAUTH_SECRET"
fi
# The public address is the proxy's: links in mail and the same-origin check use it.
export NEXTAUTH_URL=${CLUSTER_PUBLIC_URL:-http://127.0.0.1:$NGINX_PORT}
load_env_file "$ROOT/.env"
# Behind exactly one proxy that overwrites X-Forwarded-For, and that compresses.
APP_ENV=(TRUST_PROXY_HOPS=1 COMPRESSION_BY_PROXY=true)

bash scripts/pg.sh start
if [ "${SERVICES_MODE:-local}" = "local" ]; then
  start_bg mail-catcher "${TSX[@]}" scripts/fakes/mail-catcher.ts
  # Webhooks reach the app through nginx, as the hosted service's would.
  export STRIPE_FAKE_WEBHOOK_URL=${STRIPE_FAKE_WEBHOOK_URL:-http://127.0.0.1:$NGINX_PORT/api/payments/webhook}
  export STRIPE_FAKE_DATA_FILE=${STRIPE_FAKE_DATA_FILE:-$ROOT/.data/payments-fake.json}
  start_bg payments "${TSX[@]}" scripts/fakes/payments.ts
  wait_http "${STRIPE_API_URL:-http://127.0.0.1:2610}/health" payments 100
  # The upload stand-in; its callbacks reach the app through nginx (NEXTAUTH_URL), as the service's would.
  start_bg uploads "${TSX[@]}" scripts/fakes/uploads.ts
  wait_http "${UPLOADTHING_INGEST_URL:-http://127.0.0.1:2620}/health" uploads 100
fi
"${TSX[@]}" db/migrate.ts
"${TSX[@]}" db/seed.ts
if [ ! -f "$DIST/BUILD_ID" ] || [ -n "$(find app components lib content db fonts -newer "$DIST/BUILD_ID" -type f -print -quit 2>/dev/null)" ]; then
  echo "[build] next build into $DIST"
  stop_bg nginx; stop_bg web-a; stop_bg web-b; stop_bg web # never rebuild under a running server
  node_modules/.bin/next build > "$LOG_DIR/build.log" 2>&1 || { tail -n 40 "$LOG_DIR/build.log"; exit 1; }
fi
start_worker
start_app web-a "$PORT_A" "${APP_ENV[@]}"
start_app web-b "$PORT_B" "${APP_ENV[@]}"
wait_http "http://127.0.0.1:$PORT_A/api/health" web-a
wait_http "http://127.0.0.1:$PORT_B/api/health" web-b
start_proxy nginx "$NGINX_PORT" "$NGINX_DIR" "127.0.0.1:$PORT_A" "127.0.0.1:$PORT_B"
wait_http "http://127.0.0.1:$NGINX_PORT/api/health" nginx
"${TSX[@]}" db/seed.ts --print-accounts
echo
echo "Axisline runs behind nginx on http://127.0.0.1:$NGINX_PORT (app instances on 127.0.0.1:$PORT_A and :$PORT_B; ready in $(( $(date +%s) - started )) s). Stop it with: npm stop"

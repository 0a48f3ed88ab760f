#!/usr/bin/env bash
# The README's first command: installs what is missing, starts PostgreSQL and the local fakes,
# migrates, seeds the invented demo scenario, builds and serves http://127.0.0.1:3000.
set -euo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
started=$(date +%s)

ensure_apt curl curl
ensure_apt openssl openssl
ensure_node_modules
if [ ! -f .env ]; then
  sed "s/^NEXTAUTH_SECRET=.*/NEXTAUTH_SECRET=$(openssl rand -hex 32)/" .env.example > .env
  echo "[setup] wrote .env from .env.example with a fresh NEXTAUTH_SECRET"
fi
if ! grep -q '^CREDENTIAL_SIGNING_KEYS=.' .env; then
  # The key that signs certificates' credentials: made here, kept only in .env (never committed).
  sed -i '/^CREDENTIAL_SIGNING_KEYS=/d' .env
  echo "CREDENTIAL_SIGNING_KEYS=$("${TSX[@]}" scripts/credential-key.ts)" >> .env
  echo "[setup] added a fresh CREDENTIAL_SIGNING_KEYS to .env"
fi
load_env_file "$ROOT/.env"

bash scripts/pg.sh start
"${TSX[@]}" db/migrate.ts
"${TSX[@]}" db/seed.ts
if [ ! -f .next/BUILD_ID ] || [ -n "$(find app components lib content db fonts -newer .next/BUILD_ID -type f -print -quit 2>/dev/null)" ]; then
  echo "[build] next build"
  stop_bg nginx; stop_bg web-a; stop_bg web-b; stop_bg web # never rebuild under a running server (the demo or the cluster)
  node_modules/.bin/next build > "$LOG_DIR/build.log" 2>&1 || { tail -n 40 "$LOG_DIR/build.log"; exit 1; }
fi
bash scripts/start.sh
"${TSX[@]}" db/seed.ts --print-accounts
echo
echo "Axisline is running on http://127.0.0.1:${PORT:-3000} (ready in $(( $(date +%s) - started )) s). Stop it with: npm stop"

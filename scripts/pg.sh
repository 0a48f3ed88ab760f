#!/usr/bin/env bash
# Lifecycle of a private PostgreSQL cluster from Debian's packages.
#   scripts/pg.sh start   install if missing, initdb once, start, wait, create the database (idempotent)
#   scripts/pg.sh stop    fast, clean shutdown
#   scripts/pg.sh status
# Settings (environment): PG_DATA_DIR (default .data/pg), PGPORT (54329), PG_DB (axisline),
# PG_USER / PG_PASSWORD (axisline / axisline-local), PG_FAST=1 turns durability off (test clusters only).
# PostgreSQL refuses to run as root, so the server runs as the `postgres` system user.
set -euo pipefail
cd "$(dirname "$0")/.."
ROOT=$(pwd)
DATA=${PG_DATA_DIR:-$ROOT/.data/pg}
PORT=${PGPORT:-54329}
DB=${PG_DB:-axisline}
USER_NAME=${PG_USER:-axisline}
PASSWORD=${PG_PASSWORD:-axisline-local}
RUN_AS=postgres

log() { echo "[pg] $*"; }

find_bindir() {
  local dir
  dir=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
  [ -n "$dir" ] && [ -x "$dir/initdb" ] && echo "$dir"
}

ensure_installed() {
  if [ -z "$(find_bindir)" ]; then
    log "PostgreSQL server binaries missing: installing Debian's postgresql package"
    if [ "$(id -u)" -ne 0 ]; then echo "[pg] need root (or sudo) to apt-get install postgresql" >&2; exit 1; fi
    mkdir -p /etc/postgresql-common/createcluster.d
    # Keep the package from creating and starting its own cluster on 5432.
    echo "create_main_cluster = false" > /etc/postgresql-common/createcluster.d/axisline.conf
    DEBIAN_FRONTEND=noninteractive apt-get update -qq
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
  fi
}

as_pg() {
  if [ "$(id -u)" -eq 0 ]; then
    (cd / && runuser -u "$RUN_AS" -- "$@")
  else
    (cd / && "$@")
  fi
}

running() { [ -f "$DATA/postmaster.pid" ] && as_pg "$BIN/pg_ctl" -D "$DATA" status >/dev/null 2>&1; }

wait_ready() {
  for _ in $(seq 1 100); do
    if "$BIN/pg_isready" -h 127.0.0.1 -p "$PORT" -q; then return 0; fi
    sleep 0.1
  done
  echo "[pg] the server did not accept connections on 127.0.0.1:$PORT; see $DATA/server.log" >&2
  exit 1
}

init_cluster() {
  log "initdb into $DATA"
  mkdir -p "$DATA"
  if [ "$(id -u)" -eq 0 ]; then
    id "$RUN_AS" >/dev/null 2>&1 || useradd --system --home /var/lib/postgresql --shell /usr/sbin/nologin "$RUN_AS"
    chown "$RUN_AS" "$DATA"
    # Every parent must be traversable by the server's user.
    local p="$DATA"; while [ "$p" != "/" ]; do p=$(dirname "$p"); chmod o+x "$p" 2>/dev/null || true; done
  fi
  chmod 700 "$DATA"
  local pwfile; pwfile=$(mktemp); echo "$PASSWORD" > "$pwfile"; chmod 644 "$pwfile"
  as_pg "$BIN/initdb" -D "$DATA" -U "$USER_NAME" --pwfile="$pwfile" --auth-host=scram-sha-256 --auth-local=peer -E UTF8 --locale=C.UTF-8 >/dev/null
  rm -f "$pwfile"
  {
    echo "listen_addresses = '127.0.0.1'"
    echo "port = $PORT"
    echo "unix_socket_directories = ''"
    echo "max_connections = 100"
    if [ "${PG_FAST:-0}" = "1" ]; then
      echo "# throw-away test cluster: durability off for speed"
      echo "fsync = off"; echo "synchronous_commit = off"; echo "full_page_writes = off"
    else
      echo "fsync = on"; echo "synchronous_commit = on"; echo "full_page_writes = on"
    fi
  } > "$DATA/postgresql.auto.conf.axisline"
  cat "$DATA/postgresql.auto.conf.axisline" >> "$DATA/postgresql.conf"
  rm "$DATA/postgresql.auto.conf.axisline"
}

start() {
  ensure_installed
  BIN=$(find_bindir)
  [ -f "$DATA/PG_VERSION" ] || init_cluster
  if running; then
    log "already running on 127.0.0.1:$PORT ($DATA)"
  else
    as_pg "$BIN/pg_ctl" -D "$DATA" -l "$DATA/server.log" -w -t 30 start >/dev/null
    log "started on 127.0.0.1:$PORT ($DATA)"
  fi
  wait_ready
  if ! PGPASSWORD=$PASSWORD "$BIN/psql" -h 127.0.0.1 -p "$PORT" -U "$USER_NAME" -d postgres -tAc "select 1 from pg_database where datname = '$DB'" | grep -q 1; then
    PGPASSWORD=$PASSWORD "$BIN/createdb" -h 127.0.0.1 -p "$PORT" -U "$USER_NAME" "$DB"
    log "created database $DB"
  fi
}

stop() {
  BIN=$(find_bindir || true)
  if [ -n "${BIN:-}" ] && [ -f "$DATA/PG_VERSION" ] && running; then
    as_pg "$BIN/pg_ctl" -D "$DATA" -m fast -w stop >/dev/null
    log "stopped ($DATA)"
  else
    log "not running ($DATA)"
  fi
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  status) BIN=$(find_bindir); if running; then log "running on 127.0.0.1:$PORT"; else log "stopped"; exit 3; fi ;;
  *) echo "usage: scripts/pg.sh start|stop|status" >&2; exit 2 ;;
esac

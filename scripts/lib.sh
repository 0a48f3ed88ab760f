# Shared by the scripts: paths, env loading, background services with pid files.
ROOT=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
RUN_DIR=${RUN_DIR:-$ROOT/.data/run}
LOG_DIR=${LOG_DIR:-$ROOT/.data/logs}
mkdir -p "$RUN_DIR" "$LOG_DIR"
TSX=("$ROOT/node_modules/.bin/tsx" --conditions=react-server --tsconfig "$ROOT/tsconfig.json")

load_env_file() {
  # Variables already set in the environment win over the file (as in Next.js).
  local file=$1 line key
  [ -f "$file" ] || return 0
  while IFS= read -r line || [ -n "$line" ]; do
    [[ "$line" =~ ^[[:space:]]*(#|$) ]] && continue
    key=${line%%=*}
    local value=${line#*=}
    value=${value%\"}; value=${value#\"}
    # An if, not `[ ] && export`: a false test as the loop's last command would fail the
    # function, and with it any caller under `set -e` that already has the variable set.
    if [ -z "${!key+x}" ]; then export "$key=$value"; fi
  done < "$file"
  return 0
}

# start_bg NAME COMMAND... : starts once; a second call finds it running and leaves it.
start_bg() {
  local name=$1; shift
  local pidfile="$RUN_DIR/$name.pid"
  if [ -f "$pidfile" ] && kill -0 "$(cat "$pidfile")" 2>/dev/null; then
    echo "[$name] already running (pid $(cat "$pidfile"))"
    return 0
  fi
  setsid "$@" >"$LOG_DIR/$name.log" 2>&1 < /dev/null &
  echo $! > "$pidfile"
  echo "[$name] started (pid $!, log ${LOG_DIR#"$ROOT/"}/$name.log)"
}

running_bg() { local pidfile="$RUN_DIR/$1.pid"; [ -f "$pidfile" ] && kill -0 "$(cat "$pidfile")" 2>/dev/null; }

stop_bg() {
  local name=$1 pidfile="$RUN_DIR/$1.pid" pid
  [ -f "$pidfile" ] || return 0
  pid=$(cat "$pidfile")
  if kill -0 "$pid" 2>/dev/null; then
    kill -TERM -- "-$pid" 2>/dev/null || kill -TERM "$pid" 2>/dev/null || true
    for _ in $(seq 1 50); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
    kill -KILL -- "-$pid" 2>/dev/null || true
    echo "[$name] stopped"
  fi
  rm -f "$pidfile"
}

wait_http() {
  local url=$1 name=$2 tries=${3:-300}
  for _ in $(seq 1 "$tries"); do
    if curl -fsS -o /dev/null "$url" 2>/dev/null; then return 0; fi
    sleep 0.2
  done
  echo "[$name] did not answer at $url; see $LOG_DIR/$name.log" >&2
  tail -n 30 "$LOG_DIR/$name.log" >&2 || true
  return 1
}

ensure_node_modules() {
  if [ ! -x "$ROOT/node_modules/.bin/next" ] || [ "$ROOT/package-lock.json" -nt "$ROOT/node_modules/.package-lock.json" ]; then
    echo "[setup] installing npm dependencies (npm ci)"
    (cd "$ROOT" && PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD=1 npm ci --no-audit --no-fund)
  fi
}

ensure_apt() {
  # ensure_apt BINARY PACKAGE...
  local bin=$1; shift
  command -v "$bin" >/dev/null 2>&1 && return 0
  echo "[setup] installing Debian packages: $*"
  if [ "$(id -u)" -ne 0 ]; then SUDO=sudo; else SUDO=; fi
  DEBIAN_FRONTEND=noninteractive $SUDO apt-get update -qq
  DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq "$@" >/dev/null
}

# The background job worker: whichever exists (the one line to change if it moves again).
WORKER_SCRIPT=scripts/mail-worker.ts; [ -f "$ROOT/scripts/worker.ts" ] && WORKER_SCRIPT=scripts/worker.ts
start_worker() { start_bg worker "${TSX[@]}" "$WORKER_SCRIPT"; }
stop_worker() { stop_bg worker; stop_bg mail-worker; } # mail-worker: the pid file's older name

# start_app NAME PORT [VAR=value...] : one app process (scripts/serve.ts, Next.js's custom-server
# API) on 127.0.0.1:PORT from the build in NEXT_DIST_DIR. `env` and `node` exec in turn, so the
# pid in the pid file is the server's own (killing a wrapper would leave the server running).
# No --conditions=react-server here: Next.js sets its own conditions for the code it loads.
start_app() {
  local name=$1 port=$2; shift 2
  start_bg "$name" env NODE_ENV=production HOST=127.0.0.1 PORT="$port" "$@" node --import tsx "$ROOT/scripts/serve.ts"
}

NGINX_BIN=$(command -v nginx || echo /usr/sbin/nginx)
BROTLI_PACKAGE=libnginx-mod-http-brotli-filter

# Debian's nginx (and its brotli filter when the archive has it), installed only when missing.
# While apt-get runs, a policy-rc.d answering 101 (Debian's invoke-rc.d convention) keeps the
# package from starting its own nginx on port 80 of every interface.
ensure_nginx() {
  local need=()
  [ -x "$NGINX_BIN" ] || need+=(nginx)
  if [ ! -f /usr/lib/nginx/modules/ngx_http_brotli_filter_module.so ] && [ ! -f "$ROOT/.data/.no-brotli" ]; then need+=("$BROTLI_PACKAGE"); fi
  [ ${#need[@]} -eq 0 ] && return 0
  local sudo=; [ "$(id -u)" -ne 0 ] && sudo=sudo
  local guard=/usr/sbin/policy-rc.d made_guard=0
  if [ ! -e "$guard" ]; then printf '#!/bin/sh\nexit 101\n' | $sudo tee "$guard" >/dev/null && $sudo chmod 755 "$guard" && made_guard=1; fi
  echo "[setup] installing Debian packages: ${need[*]}"
  DEBIAN_FRONTEND=noninteractive $sudo apt-get update -qq || true
  if [[ " ${need[*]} " == *" nginx "* ]]; then DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq nginx >/dev/null; fi
  if [[ " ${need[*]} " == *" $BROTLI_PACKAGE "* ]] && ! DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq "$BROTLI_PACKAGE" >/dev/null 2>&1; then
    echo "[setup] $BROTLI_PACKAGE is not available here: nginx compresses with gzip only"
    mkdir -p "$ROOT/.data" && touch "$ROOT/.data/.no-brotli"
  fi
  [ "$made_guard" = 1 ] && $sudo rm -f "$guard"
  NGINX_BIN=$(command -v nginx || echo /usr/sbin/nginx)
  [ -x "$NGINX_BIN" ]
}

# start_proxy NAME PORT DIR UPSTREAM... : nginx on 127.0.0.1:PORT in front of the app instances,
# its config rendered from scripts/nginx/axisline.conf.template into DIR (pid, logs, temp, cache).
# A fresh start empties the cache; the build id in the cache key keeps builds apart as well.
start_proxy() {
  local name=$1 port=$2 dir=$3; shift 3
  if running_bg "$name"; then echo "[$name] already running (pid $(cat "$RUN_DIR/$name.pid"))"; return 0; fi
  local args=() u build_id
  for u in "$@"; do args+=(--upstream "$u"); done
  build_id=$(cat "$ROOT/${NEXT_DIST_DIR:-.next}/BUILD_ID" 2>/dev/null || echo no-build)
  rm -rf "$dir/cache"
  node --import tsx "$ROOT/scripts/nginx/render-config.ts" --dir "$dir" --listen "127.0.0.1:$port" "${args[@]}" --build-id "$build_id" >/dev/null || return 1
  "$NGINX_BIN" -t -q -c "$dir/nginx.conf" -p "$dir" -e "$dir/logs/error.log" || return 1
  start_bg "$name" "$NGINX_BIN" -c "$dir/nginx.conf" -p "$dir" -e "$dir/logs/error.log"
}

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
  echo "[$name] started (pid $!, log .data/logs/$name.log)"
}

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

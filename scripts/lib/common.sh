# Shared shell helpers for start.sh, test.sh and stop.sh. Sourced, not run.
# Every service runs on loopback, with its data under the project's own .data/ folder.

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
export ROOT

say() { printf '\033[1;32m[endgrain]\033[0m %s\n' "$*"; }
warn() { printf '\033[1;33m[endgrain]\033[0m %s\n' "$*" >&2; }
die() { printf '\033[1;31m[endgrain]\033[0m %s\n' "$*" >&2; exit 1; }

as_root() {
  if [ "$(id -u)" = 0 ]; then "$@"
  elif command -v sudo >/dev/null 2>&1; then sudo "$@"
  else die "need root or sudo to run: $*"; fi
}

apt_install() {
  say "installing Debian packages: $* (one-time set-up)"
  as_root env DEBIAN_FRONTEND=noninteractive apt-get update -qq || die "apt-get update failed"
  as_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "$@" >/dev/null \
    || die "could not install $*"
}

find_mariadbd() {
  for c in mariadbd /usr/sbin/mariadbd /usr/sbin/mysqld; do
    if command -v "$c" >/dev/null 2>&1; then command -v "$c"; return 0; fi
  done
  return 1
}

ensure_mariadb() {
  if ! find_mariadbd >/dev/null; then
    say "MariaDB server not found: installing Debian's mariadb-server"
    apt_install mariadb-server mariadb-client
    # Debian may start a system-wide instance; ours is private, so leave theirs alone.
  fi
  MARIADBD="$(find_mariadbd)" || die "mariadbd still missing after install"
  export MARIADBD
}

ensure_chromium() {
  if [ ! -x /usr/bin/chromium ]; then
    say "Chromium not found: installing Debian's chromium for the browser tests"
    apt_install chromium fonts-dejavu-core
  fi
}

ensure_node_modules() {
  if [ ! -d "$ROOT/node_modules" ] || [ "$ROOT/package-lock.json" -nt "$ROOT/node_modules/.package-lock.json" ]; then
    say "installing npm packages (npm ci)"
    (cd "$ROOT" && npm ci --no-audit --no-fund) || die "npm ci failed"
  fi
}

build_all() {
  say "building shared, seeds, search-fake, server and client"
  (cd "$ROOT" && npm run -s build) || die "build failed"
}

# Waits until a TCP port on 127.0.0.1 accepts connections. $1 port, $2 name, $3 seconds.
wait_port() {
  local port=$1 name=$2 secs=${3:-30} i=0
  while ! (exec 3<>"/dev/tcp/127.0.0.1/$port") 2>/dev/null; do
    i=$((i + 1)); [ "$i" -gt $((secs * 5)) ] && die "$name did not start on port $port"
    sleep 0.2
  done
}

# Starts a Node service in the background, recording its pid under $RUN_DIR.
start_service() {
  local name=$1; shift
  mkdir -p "$RUN_DIR"
  "$@" >"$RUN_DIR/$name.log" 2>&1 &
  echo $! >"$RUN_DIR/$name.pid"
}

stop_pidfile() {
  local f=$1 pid
  [ -f "$f" ] || return 0
  pid=$(cat "$f")
  if kill -0 "$pid" 2>/dev/null; then
    kill "$pid" 2>/dev/null
    for _ in $(seq 1 50); do kill -0 "$pid" 2>/dev/null || break; sleep 0.2; done
    kill -9 "$pid" 2>/dev/null || true
  fi
  rm -f "$f"
}

stop_all_in() {
  local dir=$1
  [ -d "$dir" ] || return 0
  for f in "$dir"/*.pid; do [ -e "$f" ] && [ "$(basename "$f")" != mariadb.pid ] && stop_pidfile "$f"; done
  stop_pidfile "$dir/mariadb.pid"
}

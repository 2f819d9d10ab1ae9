# Shared shell helpers for scripts/start.sh and scripts/test.sh. Plain bash: these run
# before node_modules exists.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
cd "$ROOT"
PGBIN="${PGBIN:-/usr/lib/postgresql/15/bin}"

log() { printf '\033[1m[treadcast]\033[0m %s\n' "$*"; }
fail() { printf '\033[31m[treadcast] %s\033[0m\n' "$*" >&2; exit 1; }

as_root() { [ "$(id -u)" = "0" ]; }

# Installs Debian packages when a command is missing (as root; otherwise asks for sudo).
apt_install() {
  local SUDO=""
  as_root || SUDO="sudo"
  log "installing Debian packages: $*"
  $SUDO apt-get update -qq >/dev/null
  DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq "$@" >/dev/null
}

ensure_node_modules() {
  # Re-install when the lockfile changed since the last install.
  if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    log "installing npm dependencies (npm ci)"
    npm ci --no-audit --no-fund --loglevel=error
  fi
}

ensure_postgres() {
  [ -x "$PGBIN/initdb" ] || apt_install postgresql
  [ -x "$PGBIN/initdb" ] || fail "PostgreSQL 15 binaries not found in $PGBIN after install"
}

ensure_chromium() {
  command -v chromium >/dev/null 2>&1 || apt_install chromium
}

# pdftotext and pdftoppm read the quote-report PDFs back in the integration tests.
ensure_poppler() {
  command -v pdftotext >/dev/null 2>&1 || apt_install poppler-utils
}

# Runs a PostgreSQL binary as an unprivileged user: PostgreSQL refuses to run as root.
pg_as() {
  if as_root; then runuser -u postgres -- "$@"; else "$@"; fi
}

# Chooses a data folder the postgres user can reach: project-local when every parent is
# traversable, else a stable folder under /tmp keyed by the project path.
pg_data_dir() {
  local name="$1"
  local dir="$ROOT/$name"
  if as_root && ! runuser -u postgres -- test -x "$ROOT" 2>/dev/null; then
    dir="/tmp/treadcast-$(printf '%s' "$ROOT" | md5sum | cut -c1-8)-$name"
  fi
  printf '%s' "$dir"
}

# pg_up NAME PORT DBNAME: starts (initialising when needed) a cluster on 127.0.0.1:PORT, TCP only.
pg_up() {
  local name="$1" port="$2" db="$3"
  local data; data="$(pg_data_dir "$name")"
  if "$PGBIN/pg_isready" -q -h 127.0.0.1 -p "$port"; then
    if [ -f "$data/postmaster.pid" ] && pg_as "$PGBIN/pg_ctl" -D "$data" status >/dev/null 2>&1; then
      log "PostgreSQL already running on 127.0.0.1:$port ($data)"
    else
      fail "port $port is busy with another server; stop it or set ${4:-PGPORT} to a free port"
    fi
  else
    if [ ! -f "$data/PG_VERSION" ]; then
      log "initialising PostgreSQL cluster in $data"
      rm -rf "$data"
      mkdir -p "$data"
      as_root && chown postgres:postgres "$data"
      chmod 700 "$data"
      pg_as "$PGBIN/initdb" -D "$data" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 -N >/dev/null
    fi
    pg_as "$PGBIN/pg_ctl" -D "$data" -l "$data/server.log" -w -t 30 -s \
      -o "-c listen_addresses=127.0.0.1 -p $port -c unix_socket_directories='' -c fsync=off -c synchronous_commit=off -c full_page_writes=off -c max_connections=200" \
      start || fail "PostgreSQL did not start; see $data/server.log"
  fi
  "$PGBIN/psql" -h 127.0.0.1 -p "$port" -U postgres -tAc "select 1 from pg_database where datname='$db'" | grep -q 1 \
    || "$PGBIN/createdb" -h 127.0.0.1 -p "$port" -U postgres "$db"
}

pg_down() {
  local name="$1"
  local data; data="$(pg_data_dir "$name")"
  [ -f "$data/postmaster.pid" ] && pg_as "$PGBIN/pg_ctl" -D "$data" -m fast -w -s stop >/dev/null 2>&1 || true
}

port_busy() {
  (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null
}

# True when there is no production build in DIR (default .next) or a source file is newer than it.
build_is_stale() {
  local dir="${1:-.next}"
  [ ! -f "$dir/BUILD_ID" ] && return 0
  [ -n "$(find app features lib db public mocks next.config.mjs tailwind.config.ts postcss.config.mjs package-lock.json -newer "$dir/BUILD_ID" -type f -print -quit 2>/dev/null)" ]
}

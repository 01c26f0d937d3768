#!/usr/bin/env bash
# Shared set-up steps for start.sh and test.sh. Every step is idempotent: run it twice, nothing changes.
# Source this file after setting the environment defaults (see env_defaults).
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$ROOT"

log() { printf '\033[1;36m[bundlesmith]\033[0m %s\n' "$*"; }
die() { printf '\033[1;31m[bundlesmith] %s\033[0m\n' "$*" >&2; exit 1; }

# Defaults for the local run; every one can be overridden from the environment.
env_defaults() {
  export HOST="${HOST:-127.0.0.1}"
  export PORT="${PORT:-3000}"
  export DATA_DIR="$(realpath -m "${DATA_DIR:-$ROOT/.data}")"
  export PGHOST="${PGHOST:-127.0.0.1}"
  export PGPORT="${PGPORT:-54329}"
  export PGUSER="${PGUSER:-bundlesmith}"
  export PGPASSWORD="${PGPASSWORD:-bundlesmith-local}"
  export PGDATABASE="${PGDATABASE:-bundlesmith}"
  export SMTP_SINK_PORT="${SMTP_SINK_PORT:-2525}"
  export SMTP_SINK_HTTP_PORT="${SMTP_SINK_HTTP_PORT:-2526}"
  export SMTP_URL="${SMTP_URL:-smtp://127.0.0.1:${SMTP_SINK_PORT}}"
  export OUTBOX_URL="${OUTBOX_URL:-http://127.0.0.1:${SMTP_SINK_HTTP_PORT}}"
  export APP_URL="${APP_URL:-http://${HOST}:${PORT}}"
  export STRIPE_FAKE_PORT="${STRIPE_FAKE_PORT:-12111}"
  export STRIPE_API_URL="${STRIPE_API_URL:-http://127.0.0.1:${STRIPE_FAKE_PORT}}"
  export STRIPE_PAY_URL="${STRIPE_PAY_URL:-http://127.0.0.1:${STRIPE_FAKE_PORT}}"
  export STRIPE_WEBHOOK_URL="${STRIPE_WEBHOOK_URL:-${APP_URL}/api/payments/webhook}"
  export DATABASE_URL="${DATABASE_URL:-postgres://${PGUSER}:${PGPASSWORD}@${PGHOST}:${PGPORT}/${PGDATABASE}}"
  export RUN_DIR="$DATA_DIR/run"
  mkdir -p "$DATA_DIR" "$RUN_DIR" "$DATA_DIR/logs"
}

# 1. npm dependencies, when node_modules is missing or older than the lockfile.
ensure_node_modules() {
  if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    log "installing npm dependencies (npm ci)"
    npm ci --no-audit --no-fund
  fi
}

apt_install() {
  [ "$(id -u)" = 0 ] || die "need root to apt-get install $*; install them yourself: sudo apt-get install -y $*"
  log "installing Debian packages: $*"
  if ! DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@" >/dev/null; then
    apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@" >/dev/null
  fi
}

# 2. Debian's PostgreSQL server, wherever its version puts the binaries.
pg_bindir() {
  local d
  d=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
  if [ -n "$d" ] && [ -x "$d/initdb" ]; then echo "$d"; return; fi
  if command -v initdb >/dev/null 2>&1; then dirname "$(command -v initdb)"; return; fi
  return 1
}

ensure_postgres_installed() {
  if ! pg_bindir >/dev/null; then apt_install postgresql; fi
  PG_BIN="$(pg_bindir)" || die "PostgreSQL binaries not found after install"
  export PG_BIN
}

# Run a command as the postgres system user (PostgreSQL refuses to run as root).
as_pg() {
  # from / : the postgres user may not be allowed into the checkout (a private home folder)
  if [ "$(id -u)" = 0 ]; then (cd / && runuser -u postgres -- "$@"); else "$@"; fi
}

# 3. The cluster: $DATA_DIR/pg, unless the postgres user cannot reach that folder (a private home
#    folder): then a folder under /var/tmp named after this checkout, linked from $DATA_DIR/pg.
pg_data_dir() {
  local want="$DATA_DIR/pg"
  if [ -L "$want" ]; then readlink -f "$want"; return; fi
  if [ "$(id -u)" != 0 ] || runuser -u postgres -- test -x "$DATA_DIR" 2>/dev/null; then
    echo "$want"; return
  fi
  local alt="/var/tmp/bundlesmith-pg-$(printf '%s' "$DATA_DIR" | sha1sum | cut -c1-12)"
  ln -sfn "$alt" "$want"
  echo "$alt"
}

ensure_cluster() {
  PGDATA_DIR="$(pg_data_dir)"
  export PGDATA_DIR
  if [ ! -f "$PGDATA_DIR/PG_VERSION" ]; then
    log "creating PostgreSQL cluster in $PGDATA_DIR"
    mkdir -p "$PGDATA_DIR"
    local pwfile; pwfile="$(mktemp)"
    printf '%s\n' "$PGPASSWORD" > "$pwfile"
    if [ "$(id -u)" = 0 ]; then chown postgres: "$PGDATA_DIR" "$pwfile"; fi
    chmod 700 "$PGDATA_DIR"
    as_pg "$PG_BIN/initdb" -D "$PGDATA_DIR" -U "$PGUSER" --pwfile="$pwfile" \
      --auth-local=scram-sha-256 --auth-host=scram-sha-256 -E UTF8 --locale=C.UTF-8 >/dev/null
    rm -f "$pwfile"
  fi
}

pg_is_up() { "$PG_BIN/pg_isready" -q -h "$PGHOST" -p "$PGPORT" >/dev/null 2>&1; }

start_cluster() {
  if pg_is_up; then log "PostgreSQL already listening on $PGHOST:$PGPORT"; return; fi
  log "starting PostgreSQL on $PGHOST:$PGPORT"
  local logfile="$PGDATA_DIR/server.log"
  as_pg "$PG_BIN/pg_ctl" -D "$PGDATA_DIR" -l "$logfile" -w -t 60 \
    -o "-c listen_addresses=$PGHOST -p $PGPORT -c unix_socket_directories= -c max_connections=60" start >/dev/null \
    || { tail -n 20 "$logfile" >&2 || true; die "PostgreSQL did not start (log: $logfile)"; }
}

stop_cluster() {
  PGDATA_DIR="$(pg_data_dir)"
  if [ -f "$PGDATA_DIR/postmaster.pid" ]; then
    log "stopping PostgreSQL ($PGDATA_DIR)"
    as_pg "$(pg_bindir)/pg_ctl" -D "$PGDATA_DIR" -m fast -w stop >/dev/null || true
  fi
}

ensure_database() {
  local db="$1"
  if ! psql -h "$PGHOST" -p "$PGPORT" -U "$PGUSER" -d postgres -tAc "select 1 from pg_database where datname='$db'" | grep -q 1; then
    log "creating database $db"
    psql -h "$PGHOST" -p "$PGPORT" -U "$PGUSER" -d postgres -qc "create database \"$db\"" >/dev/null
  fi
}

# 4. Migrations (committed SQL) and the idempotent demo seed.
migrate_db() { log "running migrations"; npx tsx db/migrate.ts; }
seed_db() { log "seeding demo data"; npx tsx db/seed.ts; }

# Background processes are recorded by PID in $RUN_DIR/<name>.pid and stopped by that PID only.
start_bg() {
  local name="$1"; shift
  local pidfile="$RUN_DIR/$name.pid"
  if [ -f "$pidfile" ] && kill -0 "$(cat "$pidfile")" 2>/dev/null; then
    log "$name already running (pid $(cat "$pidfile"))"; return
  fi
  nohup "$@" >"$DATA_DIR/logs/$name.log" 2>&1 &
  echo $! > "$pidfile"
  log "$name started (pid $!, log $DATA_DIR/logs/$name.log)"
}

stop_bg() {
  local name="$1" pidfile="$RUN_DIR/$1.pid"
  [ -f "$pidfile" ] || return 0
  local pid; pid="$(cat "$pidfile")"
  if kill -0 "$pid" 2>/dev/null; then
    kill "$pid" 2>/dev/null || true
    # up to 15 s: the app drains its requests and jobs (a supervised service stops its child first)
    for _ in $(seq 1 150); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
    if kill -0 "$pid" 2>/dev/null; then pkill -9 -P "$pid" 2>/dev/null || true; kill -9 "$pid" 2>/dev/null || true; fi
    log "$name stopped (pid $pid)"
  fi
  rm -f "$pidfile"
}

# Wait until an HTTP URL answers (any status), or fail after $2 seconds.
wait_http() {
  local url="$1" secs="${2:-30}"
  for _ in $(seq 1 $((secs * 10))); do
    if node -e "fetch(process.argv[1]).then(()=>process.exit(0),()=>process.exit(1))" "$url" 2>/dev/null; then return 0; fi
    sleep 0.1
  done
  return 1
}

# Wait until a TCP port accepts connections.
wait_port() {
  local port="$1" secs="${2:-30}"
  for _ in $(seq 1 $((secs * 10))); do
    if node -e "require('net').connect(+process.argv[1],'127.0.0.1').on('connect',()=>process.exit(0)).on('error',()=>process.exit(1))" "$port" 2>/dev/null; then return 0; fi
    sleep 0.1
  done
  return 1
}

ensure_chromium() {
  if [ ! -x /usr/bin/chromium ]; then apt_install chromium; fi
}

# Test tools from Debian: pdftotext (poppler-utils) reads the offer PDFs back in the tests.
ensure_test_tools() {
  if ! command -v pdftotext >/dev/null 2>&1; then apt_install poppler-utils; fi
}

setup_database() {
  ensure_postgres_installed
  ensure_cluster
  start_cluster
  ensure_database "$PGDATABASE"
  migrate_db
}

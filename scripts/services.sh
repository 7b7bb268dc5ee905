#!/usr/bin/env bash
# Starts and stops the servers Potlife needs on this machine: the project's own PostgreSQL
# cluster and Redis under $POTLIFE_DATA_DIR, both on 127.0.0.1 only. Sourced by start.sh,
# dev.sh and test.sh; nothing here is clever on purpose.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
export POTLIFE_DATA_DIR="${POTLIFE_DATA_DIR:-$ROOT/.data}"
case "$POTLIFE_DATA_DIR" in /*) ;; *) POTLIFE_DATA_DIR="$ROOT/$POTLIFE_DATA_DIR" ;; esac
export PGPORT="${PGPORT:-54329}"
export REDIS_PORT="${REDIS_PORT:-6390}"
export SMTP_PORT="${SMTP_PORT:-2525}"
export PORT="${PORT:-3000}"
PGUSER_NAME="potlife"
export DATABASE_URL="${DATABASE_URL:-postgres://$PGUSER_NAME@127.0.0.1:$PGPORT/potlife}"
export REDIS_URL="${REDIS_URL:-redis://127.0.0.1:$REDIS_PORT}"
export SMTP_URL="${SMTP_URL:-smtp://127.0.0.1:$SMTP_PORT}"

PG_DATA="$POTLIFE_DATA_DIR/postgres"
RUN_DIR="$POTLIFE_DATA_DIR/run"
REDIS_DIR="$POTLIFE_DATA_DIR/redis"
STARTED_PIDS=()

log() { printf '\033[1;33m[potlife]\033[0m %s\n' "$*"; }
die() { printf '\033[1;31m[potlife]\033[0m %s\n' "$*" >&2; exit 1; }
is_root() { [[ $(id -u) -eq 0 ]]; }

# Run a PostgreSQL binary as the postgres OS user when we are root (initdb refuses root).
as_pg() { if is_root; then runuser -u postgres -- "$@"; else "$@"; fi; }

pg_bindir() {
  if command -v pg_config >/dev/null 2>&1 && [[ -x "$(pg_config --bindir)/initdb" ]]; then
    pg_config --bindir; return
  fi
  local d
  d=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
  [[ -n $d && -x $d/initdb ]] && echo "$d"
}

ensure_npm_deps() {
  local stamp="$ROOT/node_modules/.potlife-lock-hash" want
  want=$(sha1sum "$ROOT/package-lock.json" | cut -d' ' -f1)
  if [[ ! -d $ROOT/node_modules || ! -f $stamp || $(cat "$stamp") != "$want" ]]; then
    log "installing npm dependencies (npm ci)…"
    (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
    echo "$want" >"$stamp"
  fi
}

apt_install() {
  if is_root; then
    log "installing Debian packages: $*"
    DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@" >/dev/null
  else
    die "missing Debian packages; run: sudo apt-get install -y $*"
  fi
}

ensure_debian_servers() {
  local missing=()
  [[ -n $(pg_bindir) ]] || missing+=(postgresql)
  command -v redis-server >/dev/null 2>&1 || missing+=(redis-server)
  ((${#missing[@]} == 0)) || apt_install "${missing[@]}"
}

ensure_chromium() {
  command -v /usr/bin/chromium >/dev/null 2>&1 || apt_install chromium
}

start_postgres() {
  local bin; bin=$(pg_bindir)
  PG_BIN=$bin
  mkdir -p "$POTLIFE_DATA_DIR"
  chmod 755 "$POTLIFE_DATA_DIR"
  if is_root; then
    install -d -o postgres -g postgres -m 700 "$PG_DATA" "$RUN_DIR"
  else
    install -d -m 700 "$PG_DATA" "$RUN_DIR"
  fi
  if [[ ! -f $PG_DATA/PG_VERSION ]]; then
    log "creating the PostgreSQL cluster in $PG_DATA"
    as_pg "$bin/initdb" -D "$PG_DATA" -U "$PGUSER_NAME" --auth=trust -E UTF8 --locale=C.UTF-8 >"$RUN_DIR/initdb.log" 2>&1 \
      || { cat "$RUN_DIR/initdb.log" >&2; die "initdb failed"; }
  fi
  if as_pg "$bin/pg_ctl" -D "$PG_DATA" status >/dev/null 2>&1; then
    log "PostgreSQL already running in $PG_DATA"
  else
    as_pg "$bin/pg_ctl" -D "$PG_DATA" -l "$RUN_DIR/postgres.log" -w -t 60 \
      -o "-p $PGPORT -c listen_addresses=127.0.0.1 -k $RUN_DIR -c max_connections=200" start >/dev/null \
      || { tail -n 20 "$RUN_DIR/postgres.log" >&2; die "PostgreSQL did not start (port $PGPORT)"; }
    PG_STARTED=1
  fi
  "$bin/psql" -h 127.0.0.1 -p "$PGPORT" -U "$PGUSER_NAME" -d postgres -tAc "SELECT 1 FROM pg_database WHERE datname='potlife'" | grep -q 1 \
    || "$bin/createdb" -h 127.0.0.1 -p "$PGPORT" -U "$PGUSER_NAME" potlife
}

stop_postgres() {
  if [[ ${PG_STARTED:-0} == 1 ]]; then
    as_pg "$PG_BIN/pg_ctl" -D "$PG_DATA" -m fast -w stop >/dev/null 2>&1 || true
  fi
}

start_redis() {
  mkdir -p "$REDIS_DIR"
  if redis-cli -h 127.0.0.1 -p "$REDIS_PORT" ping >/dev/null 2>&1; then
    log "Redis already answering on $REDIS_PORT"; return
  fi
  redis-server --port "$REDIS_PORT" --bind 127.0.0.1 --daemonize yes --dir "$REDIS_DIR" \
    --pidfile "$REDIS_DIR/redis.pid" --logfile "$REDIS_DIR/redis.log" \
    --save 60 1 --appendonly yes --appendfsync everysec >/dev/null
  for _ in $(seq 1 50); do redis-cli -h 127.0.0.1 -p "$REDIS_PORT" ping >/dev/null 2>&1 && break; sleep 0.1; done
  redis-cli -h 127.0.0.1 -p "$REDIS_PORT" ping >/dev/null 2>&1 || die "Redis did not start (port $REDIS_PORT)"
  REDIS_STARTED=1
}

stop_redis() {
  if [[ ${REDIS_STARTED:-0} == 1 ]]; then
    redis-cli -h 127.0.0.1 -p "$REDIS_PORT" shutdown >/dev/null 2>&1 || true
  fi
}

# Start a background process and remember its PID for stop_all.
spawn() {
  local name=$1; shift
  "$@" &
  local pid=$!
  STARTED_PIDS+=("$pid")
  log "$name started (pid $pid)"
}

wait_for_port() {
  local port=$1 what=$2
  for _ in $(seq 1 150); do
    (exec 3<>"/dev/tcp/127.0.0.1/$port") 2>/dev/null && return 0
    sleep 0.2
  done
  die "$what did not open port $port"
}

stop_all() {
  # Cleanup never stops half-way: no errexit here, and each server is stopped on its own.
  set +e
  trap - INT TERM
  local pid
  for pid in "${STARTED_PIDS[@]:-}"; do
    [[ -n $pid ]] && kill "$pid" 2>/dev/null || true
  done
  for pid in "${STARTED_PIDS[@]:-}"; do
    [[ -n $pid ]] && wait "$pid" 2>/dev/null || true
  done
  stop_redis
  stop_postgres
}

jwt_secret() {
  local f="$POTLIFE_DATA_DIR/jwt-secret"
  if [[ -z ${JWT_SECRET:-} ]]; then
    [[ -f $f ]] || (umask 077; head -c 48 /dev/urandom | base64 | tr -d '\n=/+' >"$f")
    JWT_SECRET=$(cat "$f")
  fi
  export JWT_SECRET
}

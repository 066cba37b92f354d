# Shared set-up for ./scripts/start, ./scripts/test and ./scripts/dev. Source it; don't run it.
# Installs what is missing, then runs a private PostgreSQL cluster on loopback.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
cd "$ROOT"

export PGPORT="${PGPORT:-5487}"
export PGHOST_ADDR="127.0.0.1"
DATA_DIR="$ROOT/.data"
PG_STARTED_BY_US=0

log() { printf '\033[1;36m[shoalwise]\033[0m %s\n' "$*"; }
die() { printf '\033[1;31m[shoalwise] %s\033[0m\n' "$*" >&2; exit 1; }

is_root() { [[ $(id -u) -eq 0 ]]; }

as_root() {
  if is_root; then "$@"
  elif command -v sudo >/dev/null 2>&1; then sudo "$@"
  else die "need root to run: $* (install it yourself or run as root)"; fi
}

APT_UPDATED=0
apt_install() {
  if [[ $APT_UPDATED -eq 0 ]]; then
    log "apt-get update"
    as_root apt-get update -qq
    APT_UPDATED=1
  fi
  log "apt-get install $*"
  as_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@" >/dev/null
}

pg_bindir() {
  local d
  d=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
  [[ -n $d && -x $d/initdb ]] && { echo "$d"; return; }
  command -v initdb >/dev/null 2>&1 && dirname "$(readlink -f "$(command -v initdb)")"
}

ensure_postgres_installed() {
  if [[ -z $(pg_bindir) ]]; then apt_install postgresql; fi
  PG_BIN="$(pg_bindir)"
  [[ -x $PG_BIN/initdb ]] || die "PostgreSQL's initdb not found even after installing postgresql"
}

ensure_node_modules() {
  if [[ ! -d node_modules || ! -f node_modules/.package-lock.json || package-lock.json -nt node_modules/.package-lock.json ]]; then
    log "npm ci"
    npm ci --no-audit --no-fund --loglevel=error
  fi
}

ensure_chromium() {
  [[ -x /usr/bin/chromium ]] || apt_install chromium
}

ensure_gsw() {
  /usr/bin/python3 -c 'import gsw' >/dev/null 2>&1 || apt_install python3-gsw
}

# The cluster runs as the invoking user, or as 'postgres' when we are root (PostgreSQL refuses root).
pg_user_run() {
  if is_root; then (cd / && runuser -u postgres -- "$@"); else "$@"; fi
}

# Where the cluster's files live. Under .data/ unless the postgres OS user cannot reach it
# (a checkout inside a 0700 folder, as mktemp -d makes); then a folder it can reach, linked from .data/pg.
resolve_pg_dir() {
  mkdir -p "$DATA_DIR"
  if [[ -L $DATA_DIR/pg ]]; then PG_DIR="$(readlink -f "$DATA_DIR/pg")"; mkdir -p "$PG_DIR"; fi
  if [[ -z ${PG_DIR:-} ]]; then
    PG_DIR="$DATA_DIR/pg"
    if is_root && ! runuser -u postgres -- test -x "$DATA_DIR"; then
      PG_DIR="/var/tmp/shoalwise-pg-$(printf '%s' "$ROOT" | sha1sum | cut -c1-12)"
      mkdir -p "$PG_DIR"
      ln -sfn "$PG_DIR" "$DATA_DIR/pg"
    fi
  fi
  mkdir -p "$PG_DIR"
  is_root && chown postgres:postgres "$PG_DIR"
  chmod 700 "$PG_DIR"
  PGDATA_DIR="$PG_DIR/cluster"
  PG_SOCKET_DIR="$PG_DIR"
}

pg_is_up() {
  "$PG_BIN/pg_isready" -q -h "$PGHOST_ADDR" -p "$PGPORT" >/dev/null 2>&1
}

start_postgres() {
  ensure_postgres_installed
  resolve_pg_dir
  if [[ ! -f $PGDATA_DIR/PG_VERSION ]]; then
    log "creating a private PostgreSQL cluster in $PGDATA_DIR"
    pg_user_run "$PG_BIN/initdb" -D "$PGDATA_DIR" -U shoalwise --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null
  fi
  if pg_is_up; then
    log "PostgreSQL already running on 127.0.0.1:$PGPORT"
    return
  fi
  log "starting PostgreSQL on 127.0.0.1:$PGPORT"
  pg_user_run "$PG_BIN/pg_ctl" -D "$PGDATA_DIR" -l "$PG_DIR/postgres.log" -w -t 30 \
    -o "-c listen_addresses=$PGHOST_ADDR -p $PGPORT -k $PG_SOCKET_DIR ${PG_EXTRA_OPTS:-}" start >/dev/null \
    || { tail -n 20 "$PG_DIR/postgres.log" >&2; die "PostgreSQL did not start (port $PGPORT busy? set PGPORT)"; }
  PG_STARTED_BY_US=1
}

stop_postgres_if_ours() {
  if [[ $PG_STARTED_BY_US -eq 1 ]]; then
    log "stopping PostgreSQL"
    pg_user_run "$PG_BIN/pg_ctl" -D "$PGDATA_DIR" -m fast -w stop >/dev/null 2>&1 || true
    PG_STARTED_BY_US=0
  fi
}

database_url() { echo "postgres://shoalwise@$PGHOST_ADDR:$PGPORT/$1"; }

create_database() {
  local name=$1
  if ! "$PG_BIN/psql" -h "$PGHOST_ADDR" -p "$PGPORT" -U shoalwise -d postgres -tAc \
      "select 1 from pg_database where datname = '$name'" | grep -q 1; then
    log "creating database $name"
    "$PG_BIN/createdb" -h "$PGHOST_ADDR" -p "$PGPORT" -U shoalwise "$name"
  fi
}

recreate_database() {
  local name=$1
  PGOPTIONS="-c client_min_messages=warning" "$PG_BIN/dropdb" -h "$PGHOST_ADDR" -p "$PGPORT" -U shoalwise --if-exists --force "$name"
  "$PG_BIN/createdb" -h "$PGHOST_ADDR" -p "$PGPORT" -U shoalwise "$name"
}

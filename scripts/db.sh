#!/usr/bin/env bash
# The project's own PostgreSQL: installs Debian's server when missing, keeps a cluster in .data/pg
# (gitignored), runs it on 127.0.0.1:$PGPORT as the postgres system user (never as root).
# Usage: scripts/db.sh start | stop | status
set -euo pipefail
ROOT=$(cd "$(dirname "$0")/.." && pwd)
PGPORT=${PGPORT:-54329}
DATA=${KEYOFF_PGDATA:-$ROOT/.data/pg}
DATABASES=${KEYOFF_DATABASES:-keyoff keyoff_test keyoff_bench}

log() { echo "[db] $*"; }

find_bin() { ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1; }

ensure_installed() {
  PGBIN=$(find_bin)
  if [ -z "$PGBIN" ] || [ ! -x "$PGBIN/initdb" ]; then
    log "PostgreSQL is not installed; installing Debian's package (needs root)"
    if [ "$(id -u)" != 0 ]; then echo "[db] error: run as root once, or: sudo apt-get install -y postgresql" >&2; exit 1; fi
    DEBIAN_FRONTEND=noninteractive apt-get update -qq
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
    PGBIN=$(find_bin)
  fi
}

# As root we hand the cluster to the postgres system user; otherwise it belongs to whoever runs this.
as_pg() {
  if [ "$(id -u)" = 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

port_in_use() { (exec 3<>"/dev/tcp/127.0.0.1/$PGPORT") 2>/dev/null; }

running() { [ -f "$DATA/PG_VERSION" ] && as_pg "$PGBIN/pg_ctl" -D "$DATA" status >/dev/null 2>&1; }

make_traversable() {
  # The postgres user must be able to reach the data folder: give "search" (x) on each parent that lacks it.
  local dir=$DATA
  while [ "$dir" != "/" ]; do
    dir=$(dirname "$dir")
    if [ "$(id -u)" = 0 ] && ! runuser -u postgres -- test -x "$dir"; then
      chmod o+x "$dir"; log "gave others search permission on $dir so postgres can reach its data"
    fi
  done
}

init_cluster() {
  [ -f "$DATA/PG_VERSION" ] && return
  log "creating a cluster in $DATA"
  mkdir -p "$DATA"
  if [ "$(id -u)" = 0 ]; then
    id postgres >/dev/null 2>&1 || useradd --system --home-dir /var/lib/postgresql --shell /bin/false postgres
    chown postgres: "$DATA"
  fi
  chmod 700 "$DATA"
  make_traversable
  as_pg "$PGBIN/initdb" -D "$DATA" -U postgres --auth=trust --encoding=UTF8 --no-locale >/dev/null
  cat >>"$DATA/postgresql.conf" <<CONF
# Keyoff: loopback only, a port of its own, the socket inside the data folder.
listen_addresses = '127.0.0.1'
port = $PGPORT
unix_socket_directories = '$DATA'
max_connections = 100
CONF
}

create_databases() {
  local psql=("$PGBIN/psql" -h 127.0.0.1 -p "$PGPORT" -U postgres -d postgres -qtA -v ON_ERROR_STOP=1)
  if [ "$("${psql[@]}" -c "select 1 from pg_roles where rolname = 'keyoff'")" != 1 ]; then
    "${psql[@]}" -c "create role keyoff login createdb"
  fi
  for name in $DATABASES; do
    if [ "$("${psql[@]}" -c "select 1 from pg_database where datname = '$name'")" != 1 ]; then
      "${psql[@]}" -c "create database $name owner keyoff"; log "created database $name"
    fi
  done
}

start() {
  ensure_installed
  init_cluster
  make_traversable
  if running; then
    log "already running on 127.0.0.1:$PGPORT"
  else
    if [ -f "$DATA/postmaster.pid" ]; then log "removing a stale pid file"; rm -f "$DATA/postmaster.pid"; fi
    if port_in_use; then
      echo "[db] error: another program listens on 127.0.0.1:$PGPORT; stop it or set PGPORT" >&2; exit 1
    fi
    as_pg "$PGBIN/pg_ctl" -D "$DATA" -l "$DATA/server.log" -w -t 30 start >/dev/null
    log "started on 127.0.0.1:$PGPORT"
  fi
  create_databases
}

stop() {
  PGBIN=$(find_bin)
  if [ -n "$PGBIN" ] && running; then
    as_pg "$PGBIN/pg_ctl" -D "$DATA" -m fast -w stop >/dev/null
    log "stopped"
  else
    log "not running"
  fi
}

status() {
  PGBIN=$(find_bin)
  if [ -n "$PGBIN" ] && running; then log "running on 127.0.0.1:$PGPORT ($DATA)"; else log "not running"; exit 3; fi
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  status) status ;;
  *) echo "usage: $0 start|stop|status" >&2; exit 2 ;;
esac

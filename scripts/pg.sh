#!/usr/bin/env bash
# Project-local PostgreSQL for dev and tests: loopback only, non-default port, data under ./.pg (git-ignored).
# Usage: scripts/pg.sh start|stop|status|psql [args]|destroy
set -euo pipefail
ROOT="$(cd "$(dirname "$0")/.." && pwd)"
PGHOME="${PGHOME:-$ROOT/.pg}"
PGDATA="$PGHOME/data"
PGPORT="${PGPORT:-54329}"
PGSUPERPASS="${PGSUPERPASS:-postgres}"
APP_USER="${APP_DB_USER:-tubeloom}"
APP_PASS="${APP_DB_PASSWORD:-tubeloom}"
DBS="${APP_DATABASES:-tubeloom tubeloom_test tubeloom_e2e}"

find_pgbin() { ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1; }
PGBIN="${PGBIN:-$(find_pgbin)}"
if [ ! -x "${PGBIN:-/nonexistent}/initdb" ]; then
  if [ "$(id -u)" = 0 ] && command -v apt-get >/dev/null; then
    echo "PostgreSQL server not found: installing Debian's postgresql (apt-get)"
    DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
    # Debian starts its own cluster on 5432; we use our own, so stop the package's one.
    (service postgresql stop >/dev/null 2>&1 || pg_ctlcluster --help >/dev/null 2>&1) || true
    PGBIN="$(find_pgbin)"
  else
    echo "PostgreSQL server not found. Install it with: sudo apt-get install postgresql" >&2
    exit 1
  fi
fi

# initdb/postgres refuse to run as root: run them as an unprivileged OS user.
if [ "$(id -u)" = 0 ]; then
  PGOSUSER="${PGOSUSER:-postgres}"
  id "$PGOSUSER" >/dev/null 2>&1 || useradd --system --no-create-home --shell /usr/sbin/nologin "$PGOSUSER"
  as_pg() { (cd / && runuser -u "$PGOSUSER" -- "$@"); }
else
  PGOSUSER="$(id -un)"
  as_pg() { "$@"; }
fi

psql_super() { PGPASSWORD="$PGSUPERPASS" "$PGBIN/psql" -v ON_ERROR_STOP=1 -X -q -h 127.0.0.1 -p "$PGPORT" -U postgres "$@"; }

init() {
  [ -f "$PGDATA/PG_VERSION" ] && return 0
  mkdir -p "$PGHOME"
  chmod 700 "$PGHOME"
  if [ "$(id -u)" = 0 ]; then
    chown "$PGOSUSER" "$PGHOME"
    # The server runs as $PGOSUSER, which must be able to pass through every parent folder (a checkout under a
    # mode-700 temporary folder is not). Grant traverse-only permission (o+x: no listing) where it is missing.
    local d; d="$(dirname "$PGHOME")"
    while [ "$d" != / ]; do
      if ! as_pg test -x "$d"; then chmod o+x "$d" && echo "granted traverse permission (o+x) on $d for the database server"; fi
      d="$(dirname "$d")"
    done
  fi
  if ! as_pg test -w "$PGHOME"; then
    echo "user $PGOSUSER cannot write $PGHOME (a parent folder is not traversable?); set PGHOME" >&2; exit 1
  fi
  local pw; pw="$(mktemp)"; printf '%s\n' "$PGSUPERPASS" > "$pw"; chmod 644 "$pw"
  as_pg "$PGBIN/initdb" -D "$PGDATA" -U postgres --pwfile="$pw" --auth=scram-sha-256 -E UTF8 --locale=C.UTF-8 >/dev/null
  rm -f "$pw"
  cat >> "$PGDATA/postgresql.conf" <<CONF
# project-local settings
listen_addresses = '127.0.0.1'
port = $PGPORT
unix_socket_directories = ''
max_connections = 200
CONF
}

start() {
  init
  if as_pg "$PGBIN/pg_ctl" -D "$PGDATA" status >/dev/null 2>&1; then echo "postgres already running on 127.0.0.1:$PGPORT"; else
    as_pg "$PGBIN/pg_ctl" -D "$PGDATA" -l "$PGHOME/server.log" -w -t 60 start >/dev/null
    echo "postgres started on 127.0.0.1:$PGPORT"
  fi
  if [ -z "$(psql_super -tAc "select 1 from pg_roles where rolname='$APP_USER'")" ]; then
    psql_super -c "create role $APP_USER login password '$APP_PASS'"
  fi
  for db in $DBS; do
    if [ -z "$(psql_super -tAc "select 1 from pg_database where datname='$db'")" ]; then
      psql_super -c "create database $db owner $APP_USER"
    fi
  done
}

case "${1:-start}" in
  start) start ;;
  stop) as_pg "$PGBIN/pg_ctl" -D "$PGDATA" -m fast -w stop || true ;;
  status) as_pg "$PGBIN/pg_ctl" -D "$PGDATA" status ;;
  psql) shift; psql_super "$@" ;;
  destroy) as_pg "$PGBIN/pg_ctl" -D "$PGDATA" -m fast -w stop >/dev/null 2>&1 || true; rm -rf "$PGHOME" ;;
  *) echo "usage: $0 start|stop|status|psql|destroy" >&2; exit 2 ;;
esac

#!/usr/bin/env bash
# Project-local PostgreSQL from Debian's packages, on 127.0.0.1 only.
#
#   scripts/db.sh start            install if missing, create the cluster once, start, create the app role and database
#   scripts/db.sh stop | status
#   scripts/db.sh url [DBNAME]     print the connection URL for the app role
#   scripts/db.sh fresh-db NAME    drop and recreate database NAME owned by the app role (tests)
#
# Environment: LAMPLIGHT_PG_PORT (default 54329), LAMPLIGHT_PG_DATA (default .data/pg).
set -euo pipefail

root=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
port=${LAMPLIGHT_PG_PORT:-54329}
app_role=lamplight
app_password=lamplight # local cluster on loopback only; production sets DATABASE_URL itself
app_db=lamplight

say() { printf 'db: %s\n' "$*" >&2; }
die() { printf 'db: %s\n' "$*" >&2; exit 1; }

find_bin() {
  local dir
  dir=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
  [ -n "$dir" ] && [ -x "$dir/pg_ctl" ] && printf '%s' "$dir"
}

ensure_installed() {
  bin=$(find_bin || true)
  [ -n "$bin" ] && return
  if [ "$(id -u)" -ne 0 ]; then
    die "PostgreSQL server binaries not found under /usr/lib/postgresql/*/bin. Install them with: sudo apt-get install -y postgresql"
  fi
  say "installing Debian's postgresql package (apt-get)…"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
  bin=$(find_bin || true)
  [ -n "$bin" ] || die "apt-get finished but no pg_ctl was found under /usr/lib/postgresql/*/bin"
}

# PostgreSQL refuses to run as root, so as root the cluster belongs to the `postgres` OS user.
if [ "$(id -u)" -eq 0 ]; then
  pg_user=postgres
  as_pg() { (cd / && runuser -u postgres -- "$@"); }
else
  pg_user=$(id -un)
  as_pg() { "$@"; }
fi

# Choose where the cluster and its socket live. The server's OS user must be able to traverse
# every parent folder (a checkout under /root usually is not), and a unix socket path may not be
# longer than 107 bytes; either problem moves that part to a fixed place under /var/tmp.
choose_paths() {
  local fallback
  fallback="/var/tmp/lamplight-$(printf '%s' "$root" | sha256sum | cut -c1-10)"
  data=${LAMPLIGHT_PG_DATA:-$root/.data/pg}
  socket_dir=$root/.data/pg-socket
  mkdir -p "$(dirname "$data")"
  if ! as_pg test -x "$(dirname "$data")" 2>/dev/null; then
    [ -z "${LAMPLIGHT_PG_DATA:-}" ] || die "the $pg_user user cannot reach $(dirname "$data")"
    data=$fallback/pg
    socket_dir=$fallback/pg-socket
    mkdir -p "$fallback"
    chmod 755 "$fallback"
  fi
  if [ ${#socket_dir} -gt 90 ]; then
    socket_dir=$fallback-socket
  fi
  log_file=$(dirname "$data")/pg.log
}

prepare_dirs() {
  mkdir -p "$data" "$socket_dir"
  if [ "$(id -u)" -eq 0 ]; then
    chown postgres:postgres "$data" "$socket_dir"
    touch "$log_file" && chown postgres:postgres "$log_file"
  fi
  chmod 700 "$data" "$socket_dir"
}

is_running() { as_pg "$bin/pg_ctl" -D "$data" status >/dev/null 2>&1; }

psql_admin() { PGOPTIONS="-c client_min_messages=warning" as_pg "$bin/psql" -X -q -v ON_ERROR_STOP=1 -h "$socket_dir" -p "$port" -U postgres -d postgres "$@"; }

start() {
  ensure_installed
  choose_paths
  prepare_dirs
  if [ ! -f "$data/PG_VERSION" ]; then
    say "creating a new cluster in $data"
    # The socket is only reachable through its 0700 folder, so trust there is the server user's own.
    as_pg "$bin/initdb" -D "$data" -U postgres -E UTF8 --locale=C.UTF-8 \
      --auth-local=trust --auth-host=scram-sha-256 >/dev/null
  fi
  if is_running; then
    say "already running on 127.0.0.1:$port"
  else
    as_pg "$bin/pg_ctl" -D "$data" -l "$log_file" -w -t 60 \
      -o "-p $port -k $socket_dir -c listen_addresses=127.0.0.1" start >/dev/null \
      || { tail -n 20 "$log_file" >&2; die "PostgreSQL did not start (is port $port taken? set LAMPLIGHT_PG_PORT)"; }
  fi
  for _ in $(seq 1 60); do
    "$bin/pg_isready" -q -h 127.0.0.1 -p "$port" && break
    sleep 0.5
  done
  "$bin/pg_isready" -q -h 127.0.0.1 -p "$port" || die "PostgreSQL is not accepting connections on 127.0.0.1:$port"
  psql_admin <<SQL
DO \$\$ BEGIN
  IF NOT EXISTS (SELECT FROM pg_roles WHERE rolname = '$app_role') THEN
    CREATE ROLE $app_role LOGIN PASSWORD '$app_password';
  END IF;
END \$\$;
SQL
  ensure_db "$app_db"
  say "ready on 127.0.0.1:$port (data in $data)"
}

ensure_db() {
  local name=$1
  if [ -z "$(psql_admin -tA -c "SELECT 1 FROM pg_database WHERE datname = '$name'")" ]; then
    psql_admin -c "CREATE DATABASE \"$name\" OWNER $app_role"
  fi
}

fresh_db() {
  local name=${1:?database name}
  [[ $name =~ ^[a-z_][a-z0-9_]*$ ]] || die "bad database name: $name"
  ensure_installed
  choose_paths
  is_running || start
  psql_admin -c "DROP DATABASE IF EXISTS \"$name\" WITH (FORCE)"
  psql_admin -c "CREATE DATABASE \"$name\" OWNER $app_role"
  # A twin whose default collation is not C (ICU en-US), for specs that check SQL does not depend on it.
  psql_admin -c "DROP DATABASE IF EXISTS \"${name}_icu\" WITH (FORCE)" >/dev/null
  psql_admin -c "CREATE DATABASE \"${name}_icu\" OWNER $app_role TEMPLATE template0 LOCALE_PROVIDER icu ICU_LOCALE 'en-US' LOCALE 'C.UTF-8'" >/dev/null 2>&1 ||
    say "no ICU here: ${name}_icu not made (its spec stays pending)"
}

case "${1:-}" in
  start) start ;;
  stop)
    ensure_installed; choose_paths
    if is_running; then as_pg "$bin/pg_ctl" -D "$data" -m fast -w stop >/dev/null; say "stopped"; else say "not running"; fi ;;
  status)
    ensure_installed; choose_paths
    if is_running; then say "running on 127.0.0.1:$port (data in $data)"; else say "not running"; exit 3; fi ;;
  url) printf 'postgres://%s:%s@127.0.0.1:%s/%s\n' "$app_role" "$app_password" "$port" "${2:-$app_db}" ;;
  fresh-db) fresh_db "${2:-}" ;;
  *) die "usage: scripts/db.sh start|stop|status|url [db]|fresh-db NAME" ;;
esac

#!/usr/bin/env bash
# The project's own PostgreSQL cluster on 127.0.0.1 (Debian's packages; installed if missing).
#   scripts/db.sh start|stop|status [--test]
#   scripts/db.sh halt|resume|freeze|thaw --test   outages for the tests: stop and start again keeping
#     the data, or stop every server process with SIGSTOP and let it go on (a database that hangs)
# Without --test: the demo cluster in .data/pg on port 54329 (kept between runs).
# With --test: a throwaway cluster in .data/pg-test on port 54339 (fsync off, wiped on start).
set -euo pipefail
cd "$(dirname "$0")/.."
root_dir=$(pwd)

cmd=${1:-status}
mode=demo
[ "${2:-}" = "--test" ] && mode=test

# PG_TEST_PORT / PG_TEST_NAME give the benchmark a throwaway cluster of its own beside the tests'.
if [ "$mode" = test ]; then port=${PG_TEST_PORT:-54339}; name=${PG_TEST_NAME:-pg-test}; else port=${PG_PORT:-54329}; name=pg; fi
data="$root_dir/.data/$name"

ensure_postgres() {
  if ! ls /usr/lib/postgresql/*/bin/pg_ctl >/dev/null 2>&1; then
    echo "PostgreSQL is not installed: installing Debian's package…"
    if [ "$(id -u)" != 0 ]; then echo "error: run as root once, or: sudo apt-get install -y postgresql" >&2; exit 1; fi
    DEBIAN_FRONTEND=noninteractive apt-get update -qq
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
  fi
  bin=$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -n 1)
}

# As root the server runs as the postgres system user (initdb refuses root). That user must be able to
# reach the data folder; a checkout below a private folder (e.g. /root) cannot, so fall back to /tmp.
as_owner() { if [ "$(id -u)" = 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi; }
resolve_data_dir() {
  if [ "$(id -u)" = 0 ]; then
    id postgres >/dev/null 2>&1 || useradd --system --home-dir /var/lib/postgresql --shell /bin/false postgres
    mkdir -p "$root_dir/.data"
    if ! runuser -u postgres -- test -x "$root_dir/.data"; then
      data="/tmp/stopwright-$(echo "$root_dir" | md5sum | cut -c1-8)/$name"
    fi
  fi
}

running() { [ -f "$data/postmaster.pid" ] && as_owner "$bin/pg_ctl" -D "$data" status >/dev/null 2>&1; }

start_server() {
  local opts="-c listen_addresses=127.0.0.1 -p $port -c unix_socket_directories=''"
  [ "$mode" = test ] && opts="$opts -c fsync=off -c synchronous_commit=off -c full_page_writes=off"
  as_owner "$bin/pg_ctl" -D "$data" -w -l "$data/server.log" -o "$opts" start >/dev/null
}

# The postmaster and its children (backends and background workers).
server_pids() {
  local main
  main=$(head -n 1 "$data/postmaster.pid")
  echo "$main"
  ps -o pid= --ppid "$main"
}

outage() {
  [ "$mode" = test ] || { echo "error: $cmd is only for the test cluster (--test)" >&2; exit 2; }
  ensure_postgres
  resolve_data_dir
  case "$cmd" in
    # Fast, not immediate: the test cluster commits asynchronously (synchronous_commit=off), so an
    # immediate stop loses the last ~0.6 s of commits (3 × wal_writer_delay) and "data kept" would not hold.
    halt) as_owner "$bin/pg_ctl" -D "$data" -w -m fast stop >/dev/null; echo "database halted (data kept)" ;;
    resume) running || start_server; echo "database running on 127.0.0.1:$port" ;;
    freeze) running && kill -STOP $(server_pids); echo "database frozen" ;;
    thaw) if [ -f "$data/postmaster.pid" ]; then kill -CONT $(server_pids) 2>/dev/null || true; fi; echo "database thawed" ;;
  esac
}

start() {
  ensure_postgres
  resolve_data_dir
  if running; then echo "database already running on 127.0.0.1:$port"; return 0; fi
  if [ "$mode" = test ]; then rm -rf "$data"; fi
  if [ ! -f "$data/PG_VERSION" ]; then
    mkdir -p "$data"
    [ "$(id -u)" = 0 ] && chown -R postgres:postgres "$(dirname "$data")"
    chmod 700 "$data"
    as_owner "$bin/initdb" -D "$data" -U stopwright --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null
  fi
  start_server
  if ! "$bin/psql" -h 127.0.0.1 -p "$port" -U stopwright -d postgres -tAc "select 1 from pg_database where datname='stopwright'" | grep -q 1; then
    "$bin/createdb" -h 127.0.0.1 -p "$port" -U stopwright stopwright
  fi
  echo "database running on 127.0.0.1:$port ($data)"
}

stop() {
  ensure_postgres
  resolve_data_dir
  if running; then as_owner "$bin/pg_ctl" -D "$data" -w -m fast stop >/dev/null; echo "database stopped"; else echo "database not running"; fi
  if [ "$mode" = test ]; then rm -rf "$data"; fi
}

status() {
  ensure_postgres
  resolve_data_dir
  if running; then echo "database running on 127.0.0.1:$port ($data)"; else echo "database not running ($data)"; exit 3; fi
}

case "$cmd" in
  start) start ;;
  stop) stop ;;
  status) status ;;
  halt|resume|freeze|thaw) outage ;;
  url) echo "postgres://stopwright@127.0.0.1:$port/stopwright" ;;
  *) echo "usage: scripts/db.sh start|stop|status|url [--test] | halt|resume|freeze|thaw --test" >&2; exit 2 ;;
esac

#!/usr/bin/env bash
# `npm run test:pg`: runs tests/pg/ against a throwaway PostgreSQL cluster on 127.0.0.1, on a free
# port, in a temporary folder, and stops it by its PID afterwards. Installs Debian's postgresql only
# when no PostgreSQL binaries are found.
set -euo pipefail
cd "$(dirname "$0")/../.."

find_bin() {
  local dir
  for dir in /usr/lib/postgresql/*/bin; do
    if [ -x "$dir/postgres" ]; then echo "$dir"; return 0; fi
  done
  return 1
}

bin=$(find_bin) || {
  echo "test:pg: no PostgreSQL binaries found; installing Debian's postgresql"
  apt-cache show postgresql >/dev/null 2>&1 || apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
  bin=$(find_bin)
}

# PostgreSQL refuses to run as root: as root, run the cluster as the postgres user.
as_owner() {
  if [ "$(id -u)" = 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

work=$(mktemp -d /tmp/borewright-pg.XXXXXX)
[ "$(id -u)" = 0 ] && chown postgres "$work"
port=$(node -e "const s = require('node:net').createServer().listen(0, '127.0.0.1', () => { console.log(s.address().port); s.close(); })")
pid=""

stop() {
  if [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null; then
    kill -INT "$pid" # fast shutdown: end sessions, write a checkpoint
    for _ in $(seq 100); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
  fi
  rm -rf "$work"
}
trap stop EXIT

as_owner "$bin/initdb" -D "$work/data" -U postgres -A trust -E UTF8 --no-sync >"$work/initdb.log"
# fsync off: the cluster lives for one test run.
as_owner "$bin/pg_ctl" -D "$work/data" -l "$work/server.log" -w -o "-h 127.0.0.1 -p $port -k $work -c fsync=off" start >/dev/null
pid=$(head -n 1 "$work/data/postmaster.pid")
echo "test:pg: PostgreSQL $("$bin/postgres" --version | awk '{print $3}') on 127.0.0.1:$port (PID $pid)"
as_owner "$bin/psql" -h 127.0.0.1 -p "$port" -U postgres -q -c 'create database borewright_test' -c 'create database borewright_restore'

PG_TEST_URL="postgres://postgres@127.0.0.1:$port/borewright_test" \
PG_TEST_RESTORE_URL="postgres://postgres@127.0.0.1:$port/borewright_restore" \
  npx vitest run --config tests/pg/vitest.config.ts

#!/usr/bin/env bash
# Starts a throwaway PostgreSQL server for the DATABASE_URL (node-postgres)
# tests and prints the URL to use. Stop it with: scripts/start-test-postgres.sh stop
# initdb refuses to run as root, so the cluster belongs to the postgres user.
set -euo pipefail

DIR="${TEST_PG_DIR:-/tmp/castline-test-pg}"
PORT="${TEST_PG_PORT:-55432}"
BIN="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1 || true)"

if [[ "${1:-}" == "stop" ]]; then
  [[ -n "$BIN" && -d "$DIR" ]] && runuser -u postgres -- "$BIN/pg_ctl" -D "$DIR" -m fast stop >/dev/null 2>&1 || true
  rm -rf "$DIR"
  exit 0
fi

if [[ -z "$BIN" ]]; then
  apt-get update -qq >&2 && apt-get install -y -qq postgresql >&2
  BIN="$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -1)"
fi

rm -rf "$DIR" && mkdir -p "$DIR" && chown postgres "$DIR"
run() { if [[ "$(id -u)" == 0 ]]; then runuser -u postgres -- "$@"; else "$@"; fi; }
run "$BIN/initdb" -D "$DIR" -U postgres --auth=trust >/dev/null
run "$BIN/pg_ctl" -D "$DIR" -l "$DIR/server.log" -w \
  -o "-p $PORT -k $DIR -c listen_addresses=127.0.0.1 -c fsync=off" start >/dev/null
echo "postgres://postgres@127.0.0.1:$PORT/postgres"

#!/usr/bin/env bash
# Starts (or stops) a throwaway PostgreSQL cluster for the tests on a loopback port, from Debian's postgresql package.
# Usage: scripts/postgres-cluster.sh start DIR PORT   ->  prints postgres://hexloom@127.0.0.1:PORT/postgres
#        scripts/postgres-cluster.sh stop DIR
set -euo pipefail
action=$1 dir=$2
bin=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1)
[ -x "$bin/initdb" ] || { echo "postgres-cluster: Debian's postgresql is not installed (apt-get install postgresql)" >&2; exit 1; }
# PostgreSQL refuses to run as root: run it as the package's postgres user then.
as_owner() { if [ "$(id -u)" -eq 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi; }
case "$action" in
  start)
    port=$3
    mkdir -p "$dir"
    [ "$(id -u)" -eq 0 ] && chown postgres "$dir"
    as_owner "$bin/initdb" -D "$dir/data" -U hexloom --auth=trust -E UTF8 --no-locale >/dev/null
    as_owner "$bin/pg_ctl" -D "$dir/data" -l "$dir/log" -o "-p $port -k $dir -c listen_addresses=127.0.0.1 -c max_connections=300 -c fsync=off" -w start >/dev/null
    echo "postgres://hexloom@127.0.0.1:$port/postgres"
    ;;
  stop)
    as_owner "$bin/pg_ctl" -D "$dir/data" -m immediate stop >/dev/null 2>&1 || true
    rm -rf "$dir"
    ;;
esac

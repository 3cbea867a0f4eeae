#!/usr/bin/env bash
# A private Redis instance on loopback for Platload's job queue (BullMQ): installs redis-server
# when missing, keeps its data inside the project (.data/redis-<instance>, git-ignored), starts
# redis-server bound to 127.0.0.1 on a fixed port with an append-only file (queued jobs survive a
# restart of Redis itself), and stops it by its pid file.
#
#   scripts/redis.sh start|stop|status|port|url [demo|test]
#
# Running start twice is harmless: an instance that already answers is left as it is.
set -euo pipefail

action="${1:-start}"
instance="${2:-demo}"
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
source "$root/scripts/lib.sh"

case "$instance" in
  demo) port="${PLATLOAD_REDIS_PORT:-3714}" ;;
  test) port="${PLATLOAD_TEST_REDIS_PORT:-3724}" ;;
  *) echo "redis.sh: unknown instance '$instance' (demo or test)" >&2; exit 2 ;;
esac
dir="$root/.data/redis-$instance"
pidfile="$dir/redis.pid"

is_up() { command -v redis-cli >/dev/null 2>&1 && [ "$(redis-cli -h 127.0.0.1 -p "$port" ping 2>/dev/null)" = "PONG" ]; }

start() {
  ensure_apt redis-server redis-server redis-cli redis-tools
  if is_up; then echo "Redis ($instance) already running on 127.0.0.1:$port"; return; fi
  mkdir -p "$dir"
  redis-server --port "$port" --bind 127.0.0.1 --dir "$dir" --daemonize yes --pidfile "$dir/redis.pid" \
    --logfile "$dir/redis.log" --save "" --appendonly yes
  for _ in $(seq 1 100); do
    if is_up; then echo "Redis ($instance) running on 127.0.0.1:$port"; return; fi
    sleep 0.1
  done
  echo "Redis ($instance) did not start; see $dir/redis.log" >&2; tail -20 "$dir/redis.log" >&2 || true; exit 1
}

stop() {
  if [ -f "$pidfile" ]; then
    local pid; pid="$(cat "$pidfile")"
    if kill -0 "$pid" 2>/dev/null; then
      kill "$pid"
      for _ in $(seq 1 100); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
    fi
    rm -f "$pidfile"
    echo "Redis ($instance) stopped"
  else
    echo "Redis ($instance) not running"
  fi
}

case "$action" in
  start) start ;;
  stop) stop ;;
  status) if is_up; then echo "running on 127.0.0.1:$port"; else echo "stopped"; exit 1; fi ;;
  port) echo "$port" ;;
  url) echo "redis://127.0.0.1:$port" ;;
  *) echo "usage: scripts/redis.sh start|stop|status|port|url [demo|test]" >&2; exit 2 ;;
esac

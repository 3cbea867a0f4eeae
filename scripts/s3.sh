#!/usr/bin/env bash
# Start or stop the local S3-compatible fake (scripts/s3-server.ts, s3rver) on loopback.
#   scripts/s3.sh start|stop|port [demo|test]
set -euo pipefail
action="${1:-start}"
instance="${2:-demo}"
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
case "$instance" in
  demo) port="${S3_FAKE_PORT:-3713}" ;;
  test) port="${PLATLOAD_TEST_S3_PORT:-3723}" ;;
  *) echo "s3.sh: unknown instance '$instance'" >&2; exit 2 ;;
esac
dir="$root/.data/s3-$instance"
pidfile="$dir.pid"
mkdir -p "$dir"

listening() { (exec 3<>"/dev/tcp/127.0.0.1/$port") 2>/dev/null; }

case "$action" in
  start)
    if [ -f "$pidfile" ] && kill -0 "$(cat "$pidfile")" 2>/dev/null && listening; then echo "s3 fake ($instance) already running on 127.0.0.1:$port"; exit 0; fi
    cd "$root"
    S3_FAKE_PORT="$port" S3_FAKE_DIR="$dir" setsid node_modules/.bin/tsx scripts/s3-server.ts >"$dir.log" 2>&1 < /dev/null &
    echo $! >"$pidfile"
    for _ in $(seq 1 100); do
      if listening; then echo "s3 fake ($instance) on 127.0.0.1:$port"; exit 0; fi
      sleep 0.2
    done
    echo "s3 fake did not start; see $dir.log" >&2; cat "$dir.log" >&2; exit 1 ;;
  stop)
    if [ -f "$pidfile" ]; then kill -- "-$(cat "$pidfile")" 2>/dev/null || kill "$(cat "$pidfile")" 2>/dev/null || true; rm -f "$pidfile"; fi
    echo "s3 fake ($instance) stopped" ;;
  port) echo "$port" ;;
  *) echo "usage: scripts/s3.sh start|stop|port [demo|test]" >&2; exit 2 ;;
esac

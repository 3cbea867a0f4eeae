#!/usr/bin/env bash
# Start or stop the local fake SMTP server (scripts/mail-server.ts) on loopback.
#   scripts/mail.sh start|stop [demo|test]
set -euo pipefail
action="${1:-start}"
instance="${2:-demo}"
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
case "$instance" in
  demo) port="${SMTP_PORT:-3712}" ;;
  test) port="${PLATLOAD_TEST_SMTP_PORT:-3722}" ;;
  *) echo "mail.sh: unknown instance '$instance'" >&2; exit 2 ;;
esac
dir="$root/.data/mail-$instance"
pidfile="$dir/mail.pid"
mkdir -p "$dir/mailbox"

running() { [ -f "$pidfile" ] && kill -0 "$(cat "$pidfile")" 2>/dev/null && (exec 3<>"/dev/tcp/127.0.0.1/$port") 2>/dev/null; }

case "$action" in
  start)
    if running; then echo "mail fake ($instance) already running on 127.0.0.1:$port"; exit 0; fi
    cd "$root"
    SMTP_PORT="$port" PLATLOAD_MAILBOX_DIR="$dir/mailbox" setsid node_modules/.bin/tsx scripts/mail-server.ts >"$dir/mail.log" 2>&1 < /dev/null &
    echo $! >"$pidfile"
    for _ in $(seq 1 100); do
      if (exec 3<>"/dev/tcp/127.0.0.1/$port") 2>/dev/null; then echo "mail fake ($instance) on 127.0.0.1:$port, mailbox $dir/mailbox"; exit 0; fi
      sleep 0.2
    done
    echo "mail fake did not start; see $dir/mail.log" >&2; cat "$dir/mail.log" >&2; exit 1 ;;
  stop)
    if [ -f "$pidfile" ]; then kill -- "-$(cat "$pidfile")" 2>/dev/null || kill "$(cat "$pidfile")" 2>/dev/null || true; rm -f "$pidfile"; fi
    echo "mail fake ($instance) stopped" ;;
  dir) echo "$dir/mailbox" ;;
  *) echo "usage: scripts/mail.sh start|stop|dir [demo|test]" >&2; exit 2 ;;
esac

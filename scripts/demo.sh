#!/usr/bin/env bash
# Starts Platload with the demo data on http://127.0.0.1:3710 — the README's first command.
# Installs what is missing, starts MariaDB, Redis, the mail fake and the S3 fake on loopback,
# migrates, seeds when empty, builds, starts a job worker and serves. Ctrl-C stops the app, the
# worker and the services.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
source scripts/lib.sh
export NEXT_TELEMETRY_DISABLED=1

PORT="${PORT:-3710}"
ensure_apt mariadbd mariadb-server redis-server redis-server
ensure_node_modules
bash scripts/db.sh start demo
bash scripts/redis.sh start demo
bash scripts/mail.sh start demo
bash scripts/s3.sh start demo

export DATABASE_URL="$(bash scripts/db.sh url demo)"
export NEXTAUTH_SECRET="$(ensure_secret)"
export NEXTAUTH_URL="http://127.0.0.1:$PORT"
export SMTP_HOST=127.0.0.1 SMTP_PORT=3712
export PLATLOAD_MAILBOX_DIR="$(bash scripts/mail.sh dir demo)"
export S3_ENDPOINT="http://127.0.0.1:$(bash scripts/s3.sh port demo)"
export REDIS_URL="$(bash scripts/redis.sh url demo)"

npx tsx scripts/migrate.ts
npx tsx db/seed.ts
# A demo build: it contains the development mailbox (lib/mail/mailbox.ts); `npm run build` does not.
PLATLOAD_DEMO_BUILD=1 npx next build

worker_pid=""
stop_all() {
  if [ -n "$worker_pid" ]; then kill "$worker_pid" 2>/dev/null || true; wait "$worker_pid" 2>/dev/null || true; fi
  bash scripts/s3.sh stop demo || true; bash scripts/mail.sh stop demo || true; bash scripts/redis.sh stop demo || true; bash scripts/db.sh stop demo || true
}
trap stop_all EXIT

# The job worker: imports, permit packets and e-mail run here, not in the web process.
mkdir -p .data
node_modules/.bin/tsx --conditions=react-server scripts/worker.ts >>.data/worker-demo.log 2>&1 &
worker_pid=$!

cat <<MSG

Platload is starting on $NEXTAUTH_URL  (development mailbox: $NEXTAUTH_URL/dev/mailbox)
Job worker: pid $worker_pid, log .data/worker-demo.log
Demo sign-ins (password for all: platload-demo-1):
  admin@marrowfinch.test       Admin      (Marrow & Finch Homes)
  designer@marrowfinch.test    Designer
  reviewer@marrowfinch.test    Reviewer
  purchasing@marrowfinch.test  Purchasing
  viewer@marrowfinch.test      Viewer
  consultant@loadworks.test    Reviewer at Marrow & Finch, Designer at Bramblewood (picks the account)
  admin@bramblewood.test       Admin      (Bramblewood Residential, the second account)
Press Ctrl-C to stop.

MSG
# Platload's own server (scripts/serve.ts): it reads the client address for the sign-in limits.
npx tsx scripts/serve.ts -H 127.0.0.1 -p "$PORT"

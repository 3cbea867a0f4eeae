#!/usr/bin/env bash
# Starts Platload with the demo data on http://127.0.0.1:3710 — the README's first command.
# Installs what is missing, starts MariaDB and the mail fake on loopback, migrates, seeds when
# empty, builds and serves. Ctrl-C stops the app, the database and the mail fake.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
source scripts/lib.sh
export NEXT_TELEMETRY_DISABLED=1

PORT="${PORT:-3710}"
ensure_apt mariadbd mariadb-server
ensure_node_modules
bash scripts/db.sh start demo
bash scripts/mail.sh start demo
bash scripts/s3.sh start demo

export DATABASE_URL="$(bash scripts/db.sh url demo)"
export NEXTAUTH_SECRET="$(ensure_secret)"
export NEXTAUTH_URL="http://127.0.0.1:$PORT"
export SMTP_HOST=127.0.0.1 SMTP_PORT=3712
export PLATLOAD_MAILBOX_DIR="$(bash scripts/mail.sh dir demo)"
export S3_ENDPOINT="http://127.0.0.1:$(bash scripts/s3.sh port demo)"

npx tsx scripts/migrate.ts
npx tsx db/seed.ts
# A demo build: it contains the development mailbox (lib/mail/mailbox.ts); `npm run build` does not.
PLATLOAD_DEMO_BUILD=1 npx next build

stop_all() { bash scripts/s3.sh stop demo || true; bash scripts/mail.sh stop demo || true; bash scripts/db.sh stop demo || true; }
trap stop_all EXIT

cat <<MSG

Platload is starting on $NEXTAUTH_URL  (development mailbox: $NEXTAUTH_URL/dev/mailbox)
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

#!/usr/bin/env bash
# Runs every Platload test — the README's second command. Installs what is missing, starts its
# own MariaDB, Redis, mail fake and S3 fake on loopback, runs Vitest (unit, then integration
# against the real database, with a job worker the integration setup starts), builds, runs
# Playwright in Debian's Chromium (its web server setup starts the app and a worker), and stops
# everything it started.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
source scripts/lib.sh
export NEXT_TELEMETRY_DISABLED=1 VITE_CONFIG_NATIVE_IGNORE_WARNING=true

ensure_apt mariadbd mariadb-server redis-server redis-server chromium chromium
ensure_node_modules

stop_all() { bash scripts/s3.sh stop test >/dev/null || true; bash scripts/mail.sh stop test >/dev/null || true; bash scripts/redis.sh stop test >/dev/null || true; bash scripts/db.sh stop test >/dev/null || true; }
trap stop_all EXIT
bash scripts/db.sh start test
bash scripts/redis.sh start test
bash scripts/mail.sh start test
bash scripts/s3.sh start test

started=$(date +%s)
echo "== format check (Prettier)"
npx prettier --check . >/dev/null || { npx prettier --list-different .; echo "Run npm run format to fix."; exit 1; }
echo "== type check"
npx tsc --noEmit -p .
echo "== unit and integration tests (Vitest)"
npx vitest run --config tests/vitest.config.mts
echo "== build"
export NEXTAUTH_SECRET="platload-e2e-secret"
# A test build: it contains the development mailbox (lib/mail/mailbox.ts); `npm run build` does not.
PLATLOAD_DEMO_BUILD=1 npx next build >.data/e2e-build.log 2>&1 || { cat .data/e2e-build.log; exit 1; }
echo "== end-to-end tests (Playwright, Chromium)"
npx tsx tests/e2e/prepare-database.ts
npx playwright test --config tests/playwright.config.ts
echo "== all tests passed in $(( $(date +%s) - started )) s"

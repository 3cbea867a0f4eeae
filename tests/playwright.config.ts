import { defineConfig } from "@playwright/test";
import { E2E_DATABASE, TEST_APP_PORT, TEST_MAILBOX_DIR, TEST_NEXTAUTH_SECRET, TEST_S3_PORT, TEST_SMTP_PORT, testDatabaseUrl } from "./support/test-env";

const baseURL = `http://127.0.0.1:${TEST_APP_PORT}`;

// Debian's Chromium (apt package chromium); Playwright never downloads a browser here.
export default defineConfig({
  // This file lives in tests/: paths below are relative to it.
  testDir: "e2e",
  outputDir: "../test-results",
  workers: 1,
  fullyParallel: false,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [["list"]],
  use: {
    baseURL,
    screenshot: "only-on-failure",
    trace: "off",
    launchOptions: {
      executablePath: "/usr/bin/chromium",
      args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
    },
  },
  webServer: {
    // Platload's own server, as in production (it reads the client address for the sign-in limits).
    command: `npx tsx scripts/serve.ts -H 127.0.0.1 -p ${TEST_APP_PORT}`,
    url: `${baseURL}/sign-in`,
    cwd: "..",
    reuseExistingServer: false,
    timeout: 120_000,
    env: {
      DATABASE_URL: testDatabaseUrl(E2E_DATABASE),
      NEXTAUTH_URL: baseURL,
      NEXTAUTH_SECRET: TEST_NEXTAUTH_SECRET,
      SMTP_HOST: "127.0.0.1",
      SMTP_PORT: String(TEST_SMTP_PORT),
      PLATLOAD_MAILBOX_DIR: TEST_MAILBOX_DIR,
      S3_ENDPOINT: `http://127.0.0.1:${TEST_S3_PORT}`,
      NEXT_TELEMETRY_DISABLED: "1",
    },
  },
});

import { defineConfig } from "@playwright/test";
import { E2E_DATABASE, E2E_QUEUE_PREFIX, serviceEnv, TEST_APP_PORT } from "./support/test-env";

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
      args: [
        "--headless",
        "--no-sandbox",
        "--disable-gpu",
        "--disable-quic",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
        "--no-first-run",
      ],
    },
  },
  // The app and one job worker (imports, packets and e-mail run there), on the e2e database.
  webServer: [
    {
      // Platload's own server, as in production (it reads the client address for the sign-in limits).
      command: `npx tsx scripts/serve.ts -H 127.0.0.1 -p ${TEST_APP_PORT}`,
      url: `${baseURL}/sign-in`,
      cwd: "..",
      reuseExistingServer: false,
      timeout: 120_000,
      env: {
        ...serviceEnv(E2E_DATABASE, E2E_QUEUE_PREFIX),
        NEXTAUTH_URL: baseURL,
        NEXT_TELEMETRY_DISABLED: "1",
      },
    },
    {
      command: "node_modules/.bin/tsx --conditions=react-server scripts/worker.ts",
      wait: { stdout: /platload worker \d+ on queue/ },
      cwd: "..",
      reuseExistingServer: false,
      timeout: 60_000,
      stdout: "pipe",
      env: serviceEnv(E2E_DATABASE, E2E_QUEUE_PREFIX),
    },
  ],
});

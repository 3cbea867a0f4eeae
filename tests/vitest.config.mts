import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";
import { INTEGRATION_DATABASE, TEST_MAILBOX_DIR, TEST_NEXTAUTH_SECRET, TEST_S3_PORT, TEST_SMTP_PORT, testDatabaseUrl } from "./support/test-env";

// This file lives in tests/; the project root is one folder up.
const root = fileURLToPath(new URL("../", import.meta.url));

export default defineConfig({
  root,
  resolve: { alias: { "@": root, "server-only": `${root}tests/support/server-only-stub.ts` } },
  test: {
    projects: [
      {
        extends: true,
        test: { name: "unit", include: ["tests/unit/**/*.test.ts", "lib/**/*.test.ts"], environment: "node" },
      },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          globalSetup: [`${root}tests/support/integration-setup.ts`],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 120_000,
          env: {
            DATABASE_URL: testDatabaseUrl(INTEGRATION_DATABASE),
            NEXTAUTH_SECRET: TEST_NEXTAUTH_SECRET,
            NEXTAUTH_URL: "http://127.0.0.1:3720",
            SMTP_HOST: "127.0.0.1",
            SMTP_PORT: String(TEST_SMTP_PORT),
            PLATLOAD_MAILBOX_DIR: TEST_MAILBOX_DIR,
            S3_ENDPOINT: `http://127.0.0.1:${TEST_S3_PORT}`,
          },
        },
      },
    ],
  },
});

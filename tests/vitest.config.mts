import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";
import { INTEGRATION_DATABASE, INTEGRATION_QUEUE_PREFIX, serviceEnv } from "./support/test-env";

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
          // A small upload limit (2 MB), so the limit tests send little.
          env: {
            ...serviceEnv(INTEGRATION_DATABASE, INTEGRATION_QUEUE_PREFIX),
            NEXTAUTH_URL: "http://127.0.0.1:3720",
            PLATLOAD_MAX_UPLOAD_BYTES: String(2 * 1024 * 1024),
          },
        },
      },
    ],
  },
});

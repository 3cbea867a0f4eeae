// Vitest global setup for the integration project: the test MariaDB, Redis, mail and S3 fakes are
// started (harmless when already up), the integration database is created fresh and migrated,
// its job queue emptied, and one job worker started on it (stopped when the run ends).
import { execFileSync } from "node:child_process";
import path from "node:path";
import { freshDatabase } from "./database";
import { emptyQueue, startWorkerProcess, stopWorkerProcess } from "./queue";
import { INTEGRATION_DATABASE, INTEGRATION_QUEUE_PREFIX, serviceEnv } from "./test-env";

export default async function setup() {
  const root = path.resolve(__dirname, "../..");
  execFileSync("bash", [path.join(root, "scripts/db.sh"), "start", "test"], { stdio: "inherit" });
  execFileSync("bash", [path.join(root, "scripts/redis.sh"), "start", "test"], { stdio: "inherit" });
  execFileSync("bash", [path.join(root, "scripts/mail.sh"), "start", "test"], { stdio: "inherit" });
  execFileSync("bash", [path.join(root, "scripts/s3.sh"), "start", "test"], { stdio: "inherit" });
  await freshDatabase(INTEGRATION_DATABASE);
  await emptyQueue(INTEGRATION_QUEUE_PREFIX);
  const worker = await startWorkerProcess(serviceEnv(INTEGRATION_DATABASE, INTEGRATION_QUEUE_PREFIX), {
    label: "integration worker",
    quiet: true,
  });
  return async () => {
    await stopWorkerProcess(worker);
  };
}

// Vitest global setup for the integration project: the test MariaDB and mail fake are started
// (harmless when already up) and the integration database is created fresh and migrated.
import { execFileSync } from "node:child_process";
import path from "node:path";
import { freshDatabase } from "./database";
import { INTEGRATION_DATABASE } from "./test-env";

export default async function setup() {
  const root = path.resolve(__dirname, "../..");
  execFileSync("bash", [path.join(root, "scripts/db.sh"), "start", "test"], { stdio: "inherit" });
  execFileSync("bash", [path.join(root, "scripts/mail.sh"), "start", "test"], { stdio: "inherit" });
  execFileSync("bash", [path.join(root, "scripts/s3.sh"), "start", "test"], { stdio: "inherit" });
  await freshDatabase(INTEGRATION_DATABASE);
}

// Before the end-to-end run: a fresh, migrated and seeded database for the app under test, and
// an empty job queue for it (a recreated database restarts its ids).
import { seedDatabase } from "@/db/seed";
import { connect, freshDatabase } from "../support/database";
import { emptyQueue } from "../support/queue";
import { E2E_DATABASE, E2E_QUEUE_PREFIX } from "../support/test-env";

async function main() {
  await freshDatabase(E2E_DATABASE);
  await emptyQueue(E2E_QUEUE_PREFIX);
  const { db, close } = connect(E2E_DATABASE);
  try {
    await seedDatabase(db);
  } finally {
    await close();
  }
  console.log(`e2e database ${E2E_DATABASE} ready`);
}

main().catch((error: Error) => {
  console.error(error);
  process.exit(1);
});

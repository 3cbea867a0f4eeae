// Applies db/migrations to DATABASE_URL, printing the failing statement (drizzle-kit migrate can
// fail silently on MariaDB).
import { createPool, databaseFor } from "@/db";
import { applyMigrations } from "@/db/migrate";

async function main() {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set");
  const pool = createPool(url);
  try {
    await applyMigrations(databaseFor(pool));
    console.log("migrations applied");
  } finally {
    await pool.end();
  }
}

main().catch((error: unknown) => {
  const e = error as { message?: string; cause?: { sqlMessage?: string; sql?: string } };
  console.error("migration failed:", e.cause?.sqlMessage ?? e.message);
  if (e.cause?.sql) console.error("statement:", e.cause.sql);
  process.exit(1);
});

import { migrate } from "drizzle-orm/mysql2/migrator";
import path from "node:path";
import type { Database } from "./index";

export const MIGRATIONS_FOLDER = path.resolve(__dirname, "migrations");

/** Applies every pending migration; the failing statement is named in the error. */
export async function applyMigrations(db: Database): Promise<void> {
  await migrate(db, { migrationsFolder: MIGRATIONS_FOLDER });
}

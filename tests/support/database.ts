import mysql from "mysql2/promise";
import { createPool, databaseFor, type Database } from "@/db";
import { applyMigrations } from "@/db/migrate";
import { testDatabaseUrl } from "./test-env";

/** Drops and creates a database on the test instance and applies every migration to it. */
export async function freshDatabase(name: string): Promise<void> {
  if (!/^platload_test[a-z0-9_]*$/.test(name))
    throw new Error(`refusing to recreate ${name}: test databases are named platload_test*`);
  const admin = await mysql.createConnection({ uri: testDatabaseUrl("mysql").replace(/\/mysql$/, "/") });
  try {
    await admin.query(`DROP DATABASE IF EXISTS \`${name}\``);
    await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  } finally {
    await admin.end();
  }
  const pool = createPool(testDatabaseUrl(name));
  try {
    await applyMigrations(databaseFor(pool));
  } finally {
    await pool.end();
  }
}

export function connect(name: string): { db: Database; close: () => Promise<void> } {
  const pool = createPool(testDatabaseUrl(name));
  return { db: databaseFor(pool), close: () => pool.end() };
}

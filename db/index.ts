import { drizzle, type MySql2Database } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import { env } from "@/lib/env";
import * as schema from "./schema";

export type Database = MySql2Database<typeof schema>;

// One pool per process, cached on globalThis outside production so hot reload does not leak connections.
const globalForDb = globalThis as unknown as { platloadPool?: mysql.Pool; platloadDb?: Database };

export function createPool(url: string): mysql.Pool {
  return mysql.createPool({
    uri: url,
    connectionLimit: 10,
    dateStrings: false,
    timezone: "Z",
    supportBigNumbers: true,
  });
}

export function getDb(): Database {
  if (!globalForDb.platloadDb) {
    globalForDb.platloadPool = createPool(env().DATABASE_URL);
    globalForDb.platloadDb = drizzle(globalForDb.platloadPool, { schema, mode: "default" });
  }
  return globalForDb.platloadDb;
}

/** The app's connection pool itself (the sign-in limiter's store shares it). */
export function getPool(): mysql.Pool {
  getDb();
  return globalForDb.platloadPool!;
}

export function databaseFor(pool: mysql.Pool): Database {
  return drizzle(pool, { schema, mode: "default" });
}

export { schema };

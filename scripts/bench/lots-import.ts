/**
 * Lots import benchmark: a 2,000- and a 10,000-lot XLSX imported end to end (read, validate,
 * compute, one-transaction upsert, recompute) on the test MariaDB, beside the floor — exceljs
 * alone reading the same file plus one bulk insert of its rows. Printed, never asserted.
 * Run through `npm run bench` (tsx with the react-server condition, so server-only modules load).
 */
import { eq, sql } from "drizzle-orm";
import ExcelJS from "exceljs";
import { execFileSync } from "node:child_process";
import path from "node:path";
import { databaseFor, createPool } from "../../db";
import { applyMigrations } from "../../db/migrate";
import { runImportJob } from "../../db/queries/import-jobs";
import { seedDatabase } from "../../db/seed";
import { accounts, communities, imports, lots, plans, users } from "../../db/schema";
import { LOT_HEADERS } from "../../lib/workbook/lot-columns";
import { writeXlsx } from "../../lib/workbook/table-io";
import { testDatabaseUrl } from "../../tests/support/test-env";

const DATABASE = "platload_test_bench";
const COMPASS = ["N", "NE", "E", "SE", "S", "SW", "W", "NW"];

async function freshDatabase() {
  const mysql = await import("mysql2/promise");
  const admin = await mysql.createConnection({ uri: testDatabaseUrl("mysql").replace(/\/mysql$/, "/") });
  await admin.query(`DROP DATABASE IF EXISTS \`${DATABASE}\``);
  await admin.query(`CREATE DATABASE \`${DATABASE}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  await admin.end();
}

const ms = (start: number) => performance.now() - start;

export async function runLotsImportBenchmark(): Promise<{ lines: string[] }> {
  const root = path.resolve(__dirname, "../..");
  execFileSync("bash", [path.join(root, "scripts/db.sh"), "start", "test"], { stdio: "ignore" });
  await freshDatabase();
  process.env.DATABASE_URL = testDatabaseUrl(DATABASE);
  const pool = createPool(testDatabaseUrl(DATABASE));
  const db = databaseFor(pool);
  await applyMigrations(db);
  await seedDatabase(db);
  const [account] = await db.select().from(accounts).where(eq(accounts.slug, "marrow-finch"));
  const [user] = await db.select().from(users).where(eq(users.email, "designer@marrowfinch.test"));
  const codes = (
    await db.select({ code: plans.planCode }).from(plans).where(eq(plans.accountId, account.id))
  ).map((p) => p.code);
  const lines = [
    "",
    "Lots import (XLSX, end to end on the test MariaDB) vs floor (exceljs read + one bulk insert):",
  ];

  for (const count of [2000, 10000]) {
    const rows = Array.from({ length: count }, (_, i) => [
      `L${i + 1}`,
      `${i + 1} Bench Street`,
      codes[i % codes.length],
      COMPASS[i % 8],
      "",
      "planned",
      "",
    ]);
    const xlsx = await writeXlsx(LOT_HEADERS, rows);

    // Floor: exceljs reads the file, then one bulk insert of its rows into a fresh community.
    const [{ id: floorCommunity }] = await db
      .insert(communities)
      .values({
        accountId: account.id,
        name: `Floor ${count}`,
        conditions: (await db.select().from(communities).limit(1))[0].conditions,
      })
      .$returningId();
    const f0 = performance.now();
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(Buffer.from(xlsx) as unknown as ExcelJS.Buffer);
    const sheet = workbook.worksheets[0];
    const values: (typeof lots.$inferInsert)[] = [];
    sheet.eachRow((row, n) => {
      if (n === 1) return;
      values.push({
        accountId: account.id,
        communityId: floorCommunity,
        lotNumber: String(row.getCell(1).value),
        address: String(row.getCell(2).value),
        facingDeg: "0",
      });
    });
    const fRead = ms(f0);
    await db.transaction(async (tx) => {
      for (let i = 0; i < values.length; i += 1000) await tx.insert(lots).values(values.slice(i, i + 1000));
    });
    const floorMs = ms(f0);

    // End to end.
    const [{ id: communityId }] = await db
      .insert(communities)
      .values({
        accountId: account.id,
        name: `Bench ${count}`,
        conditions: (await db.select().from(communities).limit(1))[0].conditions,
      })
      .$returningId();
    const [{ id: importId }] = await db
      .insert(imports)
      .values({
        accountId: account.id,
        userId: user.id,
        kind: "lots",
        communityId,
        fileName: `bench-${count}.xlsx`,
        fileSizeBytes: xlsx.byteLength,
        state: "received",
      })
      .$returningId();
    global.gc?.();
    const rssBefore = process.memoryUsage().rss;
    let peak = rssBefore;
    const sampler = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 20);
    const e0 = performance.now();
    const result = await runImportJob({ db, importId, data: xlsx });
    if (result.state !== "succeeded")
      throw new Error(`the benchmark import did not succeed: ${JSON.stringify(result)}`);
    const endMs = ms(e0);
    clearInterval(sampler);
    peak = Math.max(peak, process.memoryUsage().rss);
    const t = result.timings;
    lines.push(
      `  ${count.toLocaleString()} lots: end to end ${Math.round(endMs)} ms (read ${Math.round(t.readMs)}, validate ${Math.round(t.checkMs)}, compute ${Math.round(t.computeMs)}, save ${Math.round(t.saveMs)}); ` +
        `floor ${Math.round(floorMs)} ms (exceljs read ${Math.round(fRead)}); ratio ${(endMs / floorMs).toFixed(2)}× (goal ≤ 2×); extra memory ${Math.round((peak - rssBefore) / 1048576)} MB (goal < 300 MB)`,
    );
  }
  await db.execute(sql`SELECT 1`);
  await pool.end();
  return { lines };
}

import "server-only";
import { eq } from "drizzle-orm";
import type { Database } from "@/db";
import { imports, planRevisions, plans } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { AppError } from "@/lib/errors";
import { readTable, type TableCellError } from "@/lib/workbook/columns";
import { PLAN_COLUMNS, validatePlanTable } from "@/lib/workbook/plan-columns";
import { readTableFile, TableFileError } from "@/lib/workbook/table-io";
import { recomputeLots } from "./lots";
import { revisionCells, writePlanRevision, type PlanCells } from "./plans";

export const PLAN_IMPORT_MAX_BYTES = 5 * 1024 * 1024;

function tableErrorsToFields(errors: TableCellError[]) {
  return errors.map((e) => ({ field: `row ${e.row}, ${e.column}`, row: e.row, column: e.column, message: e.reason }));
}

/**
 * Imports a plan library file (CSV or XLSX in the template layout): validated as a whole, every bad
 * cell reported, nothing written unless every row is good; then plans are created or updated by plan
 * code in one transaction. The import is recorded either way, with its errors.
 */
export async function importPlanLibrary({ db, accountId, userId, fileName, data }: { db: Database; accountId: number; userId: number; fileName: string; data: Uint8Array }) {
  const [{ id: importId }] = await db.insert(imports).values({ accountId, userId, kind: "plans", fileName: fileName.slice(0, 255), fileSizeBytes: data.byteLength, state: "validating" }).$returningId();
  const fail = async (errors: TableCellError[], message: string) => {
    await db.update(imports).set({ state: "failed", errors, progressPct: 100, finishedAt: new Date() }).where(eq(imports.id, importId));
    throw new AppError("invalid_input", message, tableErrorsToFields(errors));
  };
  if (data.byteLength > PLAN_IMPORT_MAX_BYTES) {
    return fail([{ row: 1, column: "(file)", reason: `the file is ${(data.byteLength / 1048576).toFixed(1)} MB; the limit is ${PLAN_IMPORT_MAX_BYTES / 1048576} MB` }], "The file is too large; nothing was imported.");
  }
  let table;
  try {
    table = await readTableFile(fileName, data);
  } catch (error) {
    if (error instanceof TableFileError) return fail([{ row: 1, column: "(file)", reason: error.message }], `The file could not be read: ${error.message}. Nothing was imported.`);
    throw error;
  }
  const result = validatePlanTable(table);
  if (!result.ok) return fail(result.errors, `${result.errors.length} problem(s) in the file; nothing was imported.`);
  const entered = new Map(readTable(table, PLAN_COLUMNS).rows.map((r) => [r.rowNumber, r.entered]));

  const counts = await db.transaction(async (tx) => {
    const existing = await tx.select({ plan: plans, revision: planRevisions }).from(plans).innerJoin(planRevisions, eq(planRevisions.id, plans.currentRevisionId)).where(eq(plans.accountId, accountId)).for("update");
    const byCode = new Map(existing.map((e) => [e.plan.planCode.toLowerCase(), e]));
    let created = 0;
    let updated = 0;
    const after: { planId: number; planCode: string; cells: PlanCells }[] = [];
    for (const row of result.plans) {
      const cells: PlanCells = {};
      for (const column of PLAN_COLUMNS) cells[column.key] = entered.get(row.rowNumber)?.[column.key] ?? "";
      const found = byCode.get(row.planCode.toLowerCase());
      if (found) {
        const old = revisionCells(found.revision, found.plan.planCode, found.plan.name);
        const same = PLAN_COLUMNS.every((c) => String(old[c.key] ?? "") === String(cells[c.key] ?? ""));
        if (same) continue;
        await writePlanRevision(tx, { accountId, userId, plan: found.plan, revision: found.revision, cells, input: row.input, planCode: found.plan.planCode, planName: row.planName });
        updated++;
        after.push({ planId: found.plan.id, planCode: found.plan.planCode, cells });
      } else {
        const [{ id: planId }] = await tx.insert(plans).values({ accountId, planCode: row.planCode, name: row.planName }).$returningId();
        const [{ id: revisionId }] = await tx.insert(planRevisions).values({ accountId, planId, number: 1, cells, input: row.input, createdByUserId: userId }).$returningId();
        await tx.update(plans).set({ currentRevisionId: revisionId }).where(eq(plans.id, planId));
        created++;
        after.push({ planId, planCode: row.planCode, cells });
      }
    }
    await recomputeLots(tx, { accountId, planIds: after.map((a) => a.planId) });
    await recordAudit(tx, { accountId, userId, action: "plan_import", entityType: "plan", entityId: null, summary: `Imported ${fileName}: ${created} created, ${updated} updated`, after });
    await tx.update(imports).set({ state: "succeeded", createdCount: created, updatedCount: updated, errors: [], progressPct: 100, finishedAt: new Date() }).where(eq(imports.id, importId));
    return { created, updated };
  });
  return { importId, ...counts };
}

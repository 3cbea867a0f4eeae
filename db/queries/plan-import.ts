import "server-only";
import { eq } from "drizzle-orm";
import type { Database } from "@/db";
import { imports, planRevisions, plans } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { readTable } from "@/lib/workbook/columns";
import { PLAN_COLUMNS, validatePlanTable } from "@/lib/workbook/plan-columns";
import { recomputeLots } from "./lots";
import { openTableImport } from "./import-file";
import { revisionCells, writePlanRevision, type PlanCells } from "./plans";

export const PLAN_IMPORT_MAX_BYTES = 5 * 1024 * 1024;

/**
 * Imports a plan library file (CSV or XLSX in the template layout): validated as a whole, every bad
 * cell reported, nothing written unless every row is good; then plans are created or updated by plan
 * code in one transaction. The import is recorded either way, with its errors.
 */
export async function importPlanLibrary({ db, accountId, userId, fileName, data }: { db: Database; accountId: number; userId: number; fileName: string; data: Uint8Array }) {
  const { importId, table, fail } = await openTableImport({ db, accountId, userId, kind: "plans", fileName, data, maxBytes: PLAN_IMPORT_MAX_BYTES });
  const result = validatePlanTable(table);
  if (!result.ok) return fail(result.errors);
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

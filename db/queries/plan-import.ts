import "server-only";
import { eq } from "drizzle-orm";
import { planRevisions, plans } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { checkPlanImport } from "@/lib/imports/kinds";
import { PLAN_COLUMNS, type ValidPlanRow } from "@/lib/workbook/plan-columns";
import type { ImportSteps } from "./imports";
import { recomputeLots } from "./lots";
import { revisionCells, writePlanRevision, type PlanCells } from "./plans";

/**
 * The plan library importer (CSV or XLSX in the template layout): every row checked, then plans
 * created or updated by plan code in the save transaction, reading the current plans under lock
 * there (so an edit made while the file was checked is seen, never overwritten unseen). A row
 * equal to the plan as it is changes nothing.
 */
export const planImportSteps: ImportSteps<undefined, ValidPlanRow[], ValidPlanRow[]> = {
  loadContext: async () => undefined,
  check: (table) => checkPlanImport(table),
  compute: async (checked) => checked,
  async save(tx, record, rows) {
    const { accountId, userId } = record;
    const existing = await tx
      .select({ plan: plans, revision: planRevisions })
      .from(plans)
      .innerJoin(planRevisions, eq(planRevisions.id, plans.currentRevisionId))
      .where(eq(plans.accountId, accountId))
      .for("update");
    const byCode = new Map(existing.map((e) => [e.plan.planCode.toLowerCase(), e]));
    let created = 0;
    let updated = 0;
    const after: { planId: number; planCode: string; cells: PlanCells }[] = [];
    for (const row of rows) {
      const cells: PlanCells = {};
      for (const column of PLAN_COLUMNS) cells[column.key] = row.entered[column.key] ?? "";
      const found = byCode.get(row.planCode.toLowerCase());
      if (found) {
        const old = revisionCells(found.revision, found.plan.planCode, found.plan.name);
        const same = PLAN_COLUMNS.every((c) => String(old[c.key] ?? "") === String(cells[c.key] ?? ""));
        if (same) continue;
        await writePlanRevision(tx, {
          accountId,
          userId,
          plan: found.plan,
          revision: found.revision,
          cells,
          input: row.input,
          planCode: found.plan.planCode,
          planName: row.planName,
        });
        updated++;
        after.push({ planId: found.plan.id, planCode: found.plan.planCode, cells });
      } else {
        const [{ id: planId }] = await tx
          .insert(plans)
          .values({ accountId, planCode: row.planCode, name: row.planName })
          .$returningId();
        const [{ id: revisionId }] = await tx
          .insert(planRevisions)
          .values({ accountId, planId, number: 1, cells, input: row.input, createdByUserId: userId })
          .$returningId();
        await tx.update(plans).set({ currentRevisionId: revisionId }).where(eq(plans.id, planId));
        created++;
        after.push({ planId, planCode: row.planCode, cells });
      }
    }
    await recomputeLots(tx, { accountId, planIds: after.map((a) => a.planId) });
    await recordAudit(tx, {
      accountId,
      userId,
      action: "plan_import",
      entityType: "plan",
      entityId: null,
      summary: `Imported ${record.fileName}: ${created} created, ${updated} updated`,
      after,
    });
    return { created, updated };
  },
};

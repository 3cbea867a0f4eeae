import "server-only";
import { and, eq, inArray, sql } from "drizzle-orm";
import type { Database } from "@/db";
import { communities, lots, planRevisions, plans } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { checkLotImport, type ExistingLot, type LotImportContext } from "@/lib/imports/kinds";
import type { PlanInput } from "@/lib/load";
import type { ValidLotRow } from "@/lib/workbook/lot-columns";
import { LotEquipmentSelector, type LotSelection } from "../equipment";
import { loadProcedureOf } from "../load-procedure";
import { isFrozen, LotCalculator, recomputeLots, type LotResults } from "../recompute";
import { ImportConflict, type ImportSteps } from "./imports";

interface PlanRow {
  id: number;
  planCode: string;
  version: number;
  revisionId: number;
  revisionNumber: number;
  input: unknown;
}

type LotRow = Pick<
  typeof lots.$inferSelect,
  | "id"
  | "lotNumber"
  | "status"
  | "planId"
  | "facingDeg"
  | "results"
  | "equipmentSystemId"
  | "equipmentOverride"
  | "selection"
  | "version"
>;

/** What the lots import reads before it computes; the save checks that none of it changed. */
export interface LotImportData extends LotImportContext {
  communityId: number;
  community: typeof communities.$inferSelect;
  planByCode: Map<string, PlanRow>;
  lotByNumber: Map<string, LotRow>;
  selector: LotEquipmentSelector;
  /** By the account's load procedure, as it was when the file was read. */
  calculator: LotCalculator;
}

interface ComputedLot {
  row: ValidLotRow;
  plan: PlanRow;
  summary: LotResults;
  selection: { selection: LotSelection; systemId: number | null } | null;
  existingLot: LotRow | undefined;
}

/** Lots computed between two looks at the event loop: lets the worker renew its claim on the job. */
const COMPUTE_CHUNK = 250;

/**
 * The lots importer: validates the whole file, computes every lot, then in the save transaction
 * upserts by lot number and recomputes the community's other lots. The lots, plans and community
 * it computed from are read again under lock there, and any change since (a lot edited, a plan or
 * the conditions saved) refuses the save — the job then runs again from the start with what is
 * current, so no edit made meanwhile is overwritten.
 */
export const lotImportSteps: ImportSteps<LotImportData, ValidLotRow[], ComputedLot[]> = {
  async loadContext(db: Database, record) {
    const communityId = record.communityId!;
    const [community] = await db
      .select()
      .from(communities)
      .where(and(eq(communities.id, communityId), eq(communities.accountId, record.accountId)));
    const planRows = await db
      .select({
        id: plans.id,
        planCode: plans.planCode,
        version: plans.version,
        revisionId: planRevisions.id,
        revisionNumber: planRevisions.number,
        input: planRevisions.input,
      })
      .from(plans)
      .innerJoin(planRevisions, eq(planRevisions.id, plans.currentRevisionId))
      .where(eq(plans.accountId, record.accountId));
    const existing = await db
      .select({
        id: lots.id,
        lotNumber: lots.lotNumber,
        status: lots.status,
        planId: lots.planId,
        facingDeg: lots.facingDeg,
        results: lots.results,
        equipmentSystemId: lots.equipmentSystemId,
        equipmentOverride: lots.equipmentOverride,
        selection: lots.selection,
        version: lots.version,
      })
      .from(lots)
      .where(eq(lots.communityId, communityId));
    const lotByNumber = new Map(existing.map((l) => [l.lotNumber.toLowerCase(), l]));
    return {
      communityId,
      community,
      planByCode: new Map(planRows.map((p) => [p.planCode, p])),
      lotByNumber,
      selector: await LotEquipmentSelector.forAccount(db, record.accountId),
      calculator: await LotCalculator.forAccount(
        db,
        record.accountId,
        new Map([[communityId, community.conditions]]),
      ),
      planIds: new Map(planRows.map((p) => [p.planCode, p.id])),
      existing: new Map<string, ExistingLot>(
        existing.map((l) => [
          l.lotNumber.toLowerCase(),
          { status: l.status, planId: l.planId, facingDeg: Number(l.facingDeg) },
        ]),
      ),
    };
  },

  check: (table, context) => checkLotImport(table, context),

  async compute(rows, context, progress) {
    const { communityId } = context;
    const { selector, calculator } = context;
    const computed: ComputedLot[] = [];
    for (let i = 0; i < rows.length; i += COMPUTE_CHUNK) {
      for (const row of rows.slice(i, i + COMPUTE_CHUNK)) {
        const plan = context.planByCode.get(row.planCode)!;
        const existingLot = context.lotByNumber.get(row.lotNumber.toLowerCase());
        const previous = (existingLot?.results as LotResults | null) ?? null;
        const { summary } = calculator.compute(
          { communityId, facingDeg: row.facingDeg, previous },
          { id: plan.revisionId, number: plan.revisionNumber, input: plan.input as PlanInput },
        );
        const frozen = existingLot ? isFrozen(existingLot.status) : false;
        const selection = frozen
          ? null
          : calculator.select(
              selector,
              communityId,
              summary,
              existingLot?.equipmentOverride ? existingLot.equipmentSystemId : null,
            );
        computed.push({ row, plan, summary, selection, existingLot });
      }
      await progress((100 * Math.min(rows.length, i + COMPUTE_CHUNK)) / rows.length);
    }
    return computed;
  },

  async save(tx, record, computed, context) {
    const { accountId, userId } = record;
    const { communityId } = context;
    const [community] = await tx
      .select({ version: communities.version, name: communities.name })
      .from(communities)
      .where(eq(communities.id, communityId))
      .for("update");
    if (!community || community.version !== context.community.version)
      throw new ImportConflict(
        "the community's design conditions were saved while the file was being computed",
      );
    const usedPlanIds = [...new Set(computed.map((c) => c.plan.id))];
    const planVersions = await tx
      .select({ id: plans.id, version: plans.version })
      .from(plans)
      .where(inArray(plans.id, usedPlanIds))
      .for("update");
    const changedPlan = usedPlanIds.find(
      (id) =>
        planVersions.find((p) => p.id === id)?.version !==
        computed.find((c) => c.plan.id === id)!.plan.version,
    );
    if (changedPlan !== undefined)
      throw new ImportConflict("a plan model of the file was edited while the file was being computed");
    const current = await tx
      .select({ id: lots.id, lotNumber: lots.lotNumber, version: lots.version })
      .from(lots)
      .where(eq(lots.communityId, communityId))
      .for("update");
    if ((await loadProcedureOf(tx, accountId)) !== context.calculator.procedure)
      throw new ImportConflict("the account's load procedure was changed while the file was being computed");
    const moved =
      current.length !== context.lotByNumber.size ||
      current.some((l) => context.lotByNumber.get(l.lotNumber.toLowerCase())?.version !== l.version);
    if (moved)
      throw new ImportConflict("lots of the community were changed while the file was being computed");

    const now = new Date();
    let created = 0;
    for (let i = 0; i < computed.length; i += 1000) {
      const chunk = computed.slice(i, i + 1000);
      created += chunk.filter((c) => !c.existingLot).length;
      await tx
        .insert(lots)
        .values(
          chunk.map(({ row, plan, summary, selection, existingLot }) => ({
            accountId,
            communityId,
            lotNumber: row.lotNumber,
            address: row.address,
            planId: plan.id,
            facingDeg: String(row.facingDeg),
            optionsNote: row.optionsNote,
            status: row.status,
            plannedStart: row.plannedStart,
            results: summary,
            resultsRevisionId: plan.revisionId,
            resultsComputedAt: now,
            selection: selection ? selection.selection : (existingLot?.selection ?? null),
            equipmentSystemId: selection ? selection.systemId : (existingLot?.equipmentSystemId ?? null),
          })),
        )
        .onDuplicateKeyUpdate({
          set: {
            address: sql`VALUES(${lots.address})`,
            planId: sql`VALUES(${lots.planId})`,
            facingDeg: sql`VALUES(${lots.facingDeg})`,
            optionsNote: sql`VALUES(${lots.optionsNote})`,
            plannedStart: sql`VALUES(${lots.plannedStart})`,
            results: sql`VALUES(${lots.results})`,
            resultsRevisionId: sql`VALUES(${lots.resultsRevisionId})`,
            resultsComputedAt: sql`VALUES(${lots.resultsComputedAt})`,
            selection: sql`VALUES(${lots.selection})`,
            equipmentSystemId: sql`VALUES(${lots.equipmentSystemId})`,
            version: sql`${lots.version} + 1`,
          },
        });
    }
    const updated = computed.length - created;
    // Every other lot of the community is recomputed too, from the current plans and conditions.
    const inFile = new Set(computed.map((c) => c.row.lotNumber.toLowerCase()));
    const others = [...context.lotByNumber.values()]
      .filter((l) => !inFile.has(l.lotNumber.toLowerCase()))
      .map((l) => l.id);
    if (others.length > 0) await recomputeLots(tx, { accountId, lotIds: others });
    await recordAudit(tx, {
      accountId,
      userId,
      action: "lot_import",
      entityType: "community",
      entityId: communityId,
      summary: `Imported ${record.fileName} into ${community.name}: ${created} lots created, ${updated} updated`,
      after: { importId: record.id, created, updated },
    });
    return { created, updated };
  },
};

import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import type { Database } from "@/db";
import {
  communities,
  equipmentSystems,
  lots,
  planRevisions,
  plans,
  users,
  type LotStatus,
} from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { AppError, notFound } from "@/lib/errors";
import { ENGINE_VERSION, LOAD_PROCEDURE_LABELS, type PlanInput } from "@/lib/load";
import { loadProcedureOf } from "../load-procedure";
import type { LotSelection } from "../equipment";
import {
  isFrozen,
  LotCalculator,
  procedureOfStored,
  recomputeLots,
  type LotResults,
  type PermitSnapshot,
} from "../recompute";

export {
  FROZEN_STATUSES,
  isFrozen,
  procedureOfStored,
  recomputeLots,
  type LotResults,
  type PermitSnapshot,
} from "../recompute";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

/** The lots grid of a community: displayed loads are the permit snapshot's for frozen lots. */
export async function listLotsForGrid({
  db,
  accountId,
  communityId,
}: {
  db: Database;
  accountId: number;
  communityId: number;
}) {
  const [community] = await db
    .select()
    .from(communities)
    .where(and(eq(communities.id, communityId), eq(communities.accountId, accountId)));
  if (!community) throw notFound("That community");
  const rows = await db
    .select({
      id: lots.id,
      lotNumber: lots.lotNumber,
      address: lots.address,
      planId: lots.planId,
      planCode: plans.planCode,
      planName: plans.name,
      facingDeg: lots.facingDeg,
      optionsNote: lots.optionsNote,
      status: lots.status,
      plannedStart: lots.plannedStart,
      results: lots.results,
      permitSnapshot: lots.permitSnapshot,
      permitSnapshotAt: lots.permitSnapshotAt,
      equipmentSystemId: lots.equipmentSystemId,
      equipmentOverride: lots.equipmentOverride,
      selection: lots.selection,
      version: lots.version,
    })
    .from(lots)
    .leftJoin(plans, eq(plans.id, lots.planId))
    .where(and(eq(lots.accountId, accountId), eq(lots.communityId, communityId)))
    .orderBy(asc(lots.lotNumber));
  const systems = await db
    .select({ id: equipmentSystems.id, code: equipmentSystems.systemCode })
    .from(equipmentSystems)
    .where(eq(equipmentSystems.accountId, accountId));
  const codeOf = new Map(systems.map((x) => [x.id, x.code]));
  const accountProcedure = await loadProcedureOf(db, accountId);
  return {
    community,
    /** The account's procedure: the one live loads are computed by. */
    accountProcedure,
    lots: rows.map(({ permitSnapshot, results, selection: liveSelection, ...r }) => {
      const live = results as LotResults | null;
      const snapshot = permitSnapshot as PermitSnapshot | null;
      const shown = snapshot ? snapshot.summary : live;
      const selection = (snapshot ? snapshot.selection : (liveSelection as LotSelection | null)) ?? null;
      const systemId = snapshot ? snapshot.equipmentSystemId : r.equipmentSystemId;
      return {
        ...r,
        equipmentSystemId: systemId,
        systemCode: systemId ? (codeOf.get(systemId) ?? null) : null,
        systemFits: selection?.chosen?.fits ?? null,
        systemReasons: selection?.chosen && !selection.chosen.fits ? selection.chosen.reasons : [],
        noFitReason: selection && !selection.bestFit ? selection.noFitReason : null,
        bestFitCode: selection?.bestFit?.systemCode ?? null,
        coolingPctOfLoad: selection?.chosen?.coolingPctOfLoad ?? null,
        facingDeg: Number(r.facingDeg),
        loads: shown,
        frozen: !!snapshot,
        snapshotRevisionNumber: snapshot?.revisionNumber ?? null,
        snapshotEngineVersion: snapshot?.engineVersion ?? null,
        /** The procedure of the loads shown: the snapshot's for a frozen lot, else the live results'. */
        procedure: snapshot ? procedureOfStored(snapshot) : live ? procedureOfStored(live) : null,
        liveProcedure: live ? procedureOfStored(live) : null,
        /** The current plan and conditions would give a different result than the frozen one. */
        currentDiffers:
          !!snapshot &&
          !!live &&
          (Math.round(live.coolingTotalBtuh) !== Math.round(snapshot.summary.coolingTotalBtuh) ||
            Math.round(live.heatingBtuh) !== Math.round(snapshot.summary.heatingBtuh) ||
            live.revisionId !== snapshot.revisionId ||
            procedureOfStored(live) !== procedureOfStored(snapshot)),
        liveLoads: snapshot ? live : null,
      };
    }),
  };
}

export type LotChange = {
  lotId: number;
  version: number;
  planId?: number;
  facingDeg?: number;
  address?: string;
  optionsNote?: string;
  plannedStart?: string | null;
};

/**
 * Edits lots in place (plan, facing, address, note, planned start), one or many in one
 * transaction and one history entry, then recomputes them. A frozen lot's plan and facing cannot
 * change; a stale version refuses the whole edit.
 */
export async function editLots({
  db,
  accountId,
  userId,
  communityId,
  changes,
}: {
  db: Database;
  accountId: number;
  userId: number;
  communityId: number;
  changes: LotChange[];
}) {
  if (changes.length === 0) throw new AppError("invalid_input", "There is nothing to save.");
  return db.transaction(async (tx) => {
    const ids = changes.map((c) => c.lotId);
    const current = await tx
      .select()
      .from(lots)
      .where(and(eq(lots.accountId, accountId), eq(lots.communityId, communityId), inArray(lots.id, ids)))
      .for("update");
    const byId = new Map(current.map((l) => [l.id, l]));
    const planIds = [...new Set(changes.map((c) => c.planId).filter((p): p is number => p !== undefined))];
    if (planIds.length > 0) {
      const found = await tx
        .select({ id: plans.id })
        .from(plans)
        .where(and(eq(plans.accountId, accountId), inArray(plans.id, planIds)));
      if (found.length !== planIds.length) throw notFound("That plan model");
    }
    const before: unknown[] = [];
    const after: unknown[] = [];
    for (const change of changes) {
      const lot = byId.get(change.lotId);
      if (!lot) throw notFound("That lot");
      if (lot.version !== change.version)
        throw new AppError(
          "conflict",
          `Lot ${lot.lotNumber} was changed by someone else since you loaded it. Nothing was saved; reload to see the current values.`,
        );
      const planOrFacing =
        (change.planId !== undefined && change.planId !== lot.planId) ||
        (change.facingDeg !== undefined && change.facingDeg !== Number(lot.facingDeg));
      if (planOrFacing && isFrozen(lot.status)) {
        throw new AppError(
          "conflict",
          `Lot ${lot.lotNumber} is frozen for permit (${lot.status.replace("_", " ")}); its plan and facing cannot change. Move it back to planned first.`,
        );
      }
      const set = {
        ...(change.planId !== undefined ? { planId: change.planId } : {}),
        ...(change.facingDeg !== undefined ? { facingDeg: String(change.facingDeg) } : {}),
        ...(change.address !== undefined ? { address: change.address } : {}),
        ...(change.optionsNote !== undefined ? { optionsNote: change.optionsNote } : {}),
        ...(change.plannedStart !== undefined ? { plannedStart: change.plannedStart } : {}),
      };
      before.push({
        lotId: lot.id,
        lotNumber: lot.lotNumber,
        planId: lot.planId,
        facingDeg: Number(lot.facingDeg),
        address: lot.address,
        optionsNote: lot.optionsNote,
        plannedStart: lot.plannedStart,
      });
      after.push({
        lotId: lot.id,
        lotNumber: lot.lotNumber,
        ...set,
        ...(change.facingDeg !== undefined ? { facingDeg: change.facingDeg } : {}),
      });
      await tx
        .update(lots)
        .set({ ...set, version: lot.version + 1 })
        .where(eq(lots.id, lot.id));
    }
    const recomputed = await recomputeLots(tx, { accountId, lotIds: ids });
    await recordAudit(tx, {
      accountId,
      userId,
      action: changes.length > 1 ? "lot_bulk_edit" : "lot_edit",
      entityType: "lot",
      entityId: changes.length === 1 ? changes[0].lotId : null,
      summary:
        changes.length > 1
          ? `Edited ${changes.length} lots`
          : `Edited lot ${(after[0] as { lotNumber: string }).lotNumber}`,
      before,
      after,
    });
    return { edited: changes.length, recomputed: recomputed.recomputed, loadsChanged: recomputed.changed };
  });
}

/**
 * Moves a lot to a new status. Submitting for permit freezes a copy of its inputs, results and
 * engine version; moving back to planned releases it. `refresh` takes a new snapshot explicitly.
 */
export async function setLotStatus({
  db,
  accountId,
  userId,
  lotId,
  version,
  status,
  refresh = false,
}: {
  db: Database;
  accountId: number;
  userId: number;
  lotId: number;
  version: number;
  status: LotStatus;
  refresh?: boolean;
}) {
  return db.transaction(async (tx) => {
    const [lot] = await tx
      .select()
      .from(lots)
      .where(and(eq(lots.id, lotId), eq(lots.accountId, accountId)))
      .for("update");
    if (!lot) throw notFound("That lot");
    if (lot.version !== version)
      throw new AppError(
        "conflict",
        `Lot ${lot.lotNumber} was changed by someone else since you loaded it. Nothing was saved; reload to see it.`,
      );
    const freezing = isFrozen(status) && (!lot.permitSnapshot || refresh);
    let snapshot = lot.permitSnapshot as PermitSnapshot | null;
    if (freezing) snapshot = await takeSnapshot(tx, { accountId, userId, lot });
    if (!isFrozen(status)) snapshot = null;
    await tx
      .update(lots)
      .set({
        status,
        permitSnapshot: snapshot,
        permitSnapshotAt: snapshot ? (freezing ? new Date() : lot.permitSnapshotAt) : null,
        version: lot.version + 1,
      })
      .where(eq(lots.id, lot.id));
    // A released lot takes the current plan's loads and a new equipment selection again.
    if (!snapshot && lot.permitSnapshot) await recomputeLots(tx, { accountId, lotIds: [lot.id] });
    await recordAudit(tx, {
      accountId,
      userId,
      action: freezing ? (refresh ? "lot_snapshot_refresh" : "lot_permit_snapshot") : "lot_status",
      entityType: "lot",
      entityId: lot.id,
      summary: freezing
        ? `Lot ${lot.lotNumber}: ${refresh ? "new permit snapshot taken" : `status ${status.replace("_", " ")}, inputs and results frozen`} (plan ${snapshot!.planCode} rev. ${snapshot!.revisionNumber}, engine ${snapshot!.engineVersion}, ${LOAD_PROCEDURE_LABELS[snapshot!.procedure]})`
        : `Lot ${lot.lotNumber}: status ${lot.status.replace("_", " ")} → ${status.replace("_", " ")}${lot.permitSnapshot && !snapshot ? " (permit snapshot released)" : ""}`,
      before: { status: lot.status, snapshotAt: lot.permitSnapshotAt },
      after: { status, snapshotAt: snapshot?.frozenAt ?? null },
    });
    return { status, frozen: !!snapshot };
  });
}

async function takeSnapshot(
  tx: Tx,
  { accountId, userId, lot }: { accountId: number; userId: number; lot: typeof lots.$inferSelect },
): Promise<PermitSnapshot> {
  if (!lot.planId)
    throw new AppError(
      "conflict",
      `Lot ${lot.lotNumber} has no plan model; choose one before submitting for permit.`,
    );
  const [row] = await tx
    .select({ plan: plans, revision: planRevisions, community: communities, approver: users.name })
    .from(plans)
    .innerJoin(planRevisions, eq(planRevisions.id, plans.currentRevisionId))
    .innerJoin(communities, eq(communities.id, lot.communityId))
    .leftJoin(users, eq(users.id, planRevisions.approvedByUserId))
    .where(and(eq(plans.id, lot.planId), eq(plans.accountId, accountId)));
  const input = row.revision.input as PlanInput;
  const calculator = await LotCalculator.forAccount(
    tx,
    accountId,
    new Map([[row.community.id, row.community.conditions]]),
  );
  const { full, summary } = calculator.compute(
    { communityId: row.community.id, facingDeg: Number(lot.facingDeg), previous: null },
    { id: row.revision.id, number: row.revision.number, input },
  );
  return {
    frozenAt: new Date().toISOString(),
    frozenByUserId: userId,
    planId: row.plan.id,
    planCode: row.plan.planCode,
    planName: row.plan.name,
    revisionId: row.revision.id,
    revisionNumber: row.revision.number,
    revisionStatus: row.revision.status,
    approval: {
      name: row.revision.approverName,
      credential: row.revision.approverCredential,
      date: row.revision.approvedOn,
    },
    communityName: row.community.name,
    site: calculator.site(row.community.id),
    facingDeg: Number(lot.facingDeg),
    input,
    result: full,
    summary,
    selection: (lot.selection as LotSelection | null) ?? null,
    equipmentSystemId: lot.equipmentSystemId,
    engineVersion: ENGINE_VERSION,
    procedure: full.procedure,
  };
}

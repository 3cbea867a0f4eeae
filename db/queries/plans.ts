import "server-only";
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import type { Database } from "@/db";
import { auditLog, communities, planRevisions, plans, users } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { AppError, notFound, type FieldError } from "@/lib/errors";
import {
  computePlanFacings,
  LOAD_PROCEDURE_LABELS,
  LOAD_PROCEDURES,
  parseSiteConditions,
  type LoadProcedure,
  type PlanFacings,
  type PlanInput,
  type SiteConditions,
} from "@/lib/load";
import { loadProcedureOf } from "../load-procedure";
import { recomputeLots } from "./lots";
import {
  PLAN_COLUMN_BY_KEY,
  planInputToRow,
  rowToPlanInput,
  type PlanRowCells,
} from "@/lib/workbook/plan-columns";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];
export type PlanCells = Record<string, string | number | boolean | null>;

/** A change to some cells of one plan, made against the version the editor loaded. */
export interface PlanCellChange {
  planId: number;
  version: number;
  cells: PlanCells;
}

/** The cells of a revision; revisions made before cells were kept are read from their input. */
export function revisionCells(
  revision: { cells: unknown; input: unknown },
  planCode: string,
  planName: string,
): PlanCells {
  if (revision.cells && typeof revision.cells === "object") return revision.cells as PlanCells;
  return planInputToRow(revision.input as PlanInput, planCode, planName) as PlanCells;
}

/** The design conditions the plan library computes with: the chosen community, or the account's first. */
export async function referenceSite({
  db,
  accountId,
  communityId,
}: {
  db: Database;
  accountId: number;
  communityId?: number | null;
}) {
  const rows = await db
    .select()
    .from(communities)
    .where(eq(communities.accountId, accountId))
    .orderBy(asc(communities.name));
  const community = (communityId ? rows.find((c) => c.id === communityId) : undefined) ?? rows[0];
  if (communityId && !rows.some((c) => c.id === communityId)) throw notFound("That community");
  return {
    communities: rows.map((c) => ({ id: c.id, name: c.name })),
    community: community ? { id: community.id, name: community.name } : null,
    site: community ? parseSiteConditions(community.conditions) : null,
  };
}

/** What the grid shows of a plan's four facings. */
export function facingSummary(result: PlanFacings) {
  return {
    engineVersion: result.engineVersion,
    procedure: result.procedure,
    facings: result.facings.map((f) => ({
      label: f.label,
      heatingBtuh: f.heating.totalBtuh,
      coolingSensibleBtuh: f.cooling.sensibleBtuh,
      coolingLatentBtuh: f.cooling.latentBtuh,
      coolingTotalBtuh: f.cooling.totalBtuh,
      tons: f.cooling.tons,
      floorAreaPerTonFt2: f.cooling.floorAreaPerTonFt2,
    })),
    worst: result.worst,
    coolingSpreadBtuh: result.coolingSpreadBtuh,
  };
}
export type FacingSummary = ReturnType<typeof facingSummary>;

const NO_SITE = "Add a community to compute loads: the plan library uses its design conditions.";

function computeFacings(
  input: unknown,
  site: SiteConditions | null,
  procedure: LoadProcedure,
): { result: PlanFacings | null; error: string | null } {
  if (!site) return { result: null, error: NO_SITE };
  try {
    return { result: computePlanFacings(input, site, { validated: true, procedure }), error: null };
  } catch (error) {
    return { result: null, error: `${LOAD_PROCEDURE_LABELS[procedure]}: ${(error as Error).message}` };
  }
}

/** The plan library: every plan's current cells, revision state and four-facing loads. */
export async function listPlanLibrary({
  db,
  accountId,
  communityId,
  full = false,
}: {
  db: Database;
  accountId: number;
  communityId?: number | null;
  full?: boolean;
}) {
  const reference = await referenceSite({ db, accountId, communityId });
  const procedure = await loadProcedureOf(db, accountId);
  const rows = await db
    .select({ plan: plans, revision: planRevisions })
    .from(plans)
    .innerJoin(planRevisions, eq(planRevisions.id, plans.currentRevisionId))
    .where(eq(plans.accountId, accountId))
    .orderBy(asc(plans.planCode));
  return {
    reference: { communities: reference.communities, community: reference.community },
    /** The account's procedure: the one the computed columns use. */
    procedure,
    procedureLabel: LOAD_PROCEDURE_LABELS[procedure],
    plans: rows.map(({ plan, revision }) => {
      const { result, error } = computeFacings(revision.input, reference.site, procedure);
      return {
        id: plan.id,
        planCode: plan.planCode,
        name: plan.name,
        version: plan.version,
        updatedAt: plan.updatedAt,
        revisionId: revision.id,
        revisionNumber: revision.number,
        revisionStatus: revision.status,
        cells: revisionCells(revision, plan.planCode, plan.name),
        loads: result ? facingSummary(result) : null,
        loadsError: error,
        /** The full engine result, only when asked for (exports). */
        results: full ? result : undefined,
      };
    }),
  };
}

/** One plan in detail: revisions, history, and the full four-facing result. */
export async function getPlanSheet({
  db,
  accountId,
  planId,
  communityId,
}: {
  db: Database;
  accountId: number;
  planId: number;
  communityId?: number | null;
}) {
  const [plan] = await db
    .select()
    .from(plans)
    .where(and(eq(plans.id, planId), eq(plans.accountId, accountId)));
  if (!plan) throw notFound("That plan model");
  const reference = await referenceSite({ db, accountId, communityId });
  const revisions = await db
    .select({ revision: planRevisions, createdBy: users.name })
    .from(planRevisions)
    .leftJoin(users, eq(users.id, planRevisions.createdByUserId))
    .where(and(eq(planRevisions.planId, planId), eq(planRevisions.accountId, accountId)))
    .orderBy(desc(planRevisions.number));
  const current =
    revisions.find((r) => r.revision.id === plan.currentRevisionId)?.revision ?? revisions[0].revision;
  const history = await db
    .select({
      id: auditLog.id,
      action: auditLog.action,
      summary: auditLog.summary,
      before: auditLog.before,
      after: auditLog.after,
      createdAt: auditLog.createdAt,
      userName: users.name,
    })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.userId))
    .where(and(eq(auditLog.accountId, accountId), eq(auditLog.entityType, "plan")))
    .orderBy(desc(auditLog.createdAt), desc(auditLog.id))
    .limit(500);
  // Both procedures side by side; the account's is the one that sizes equipment.
  const accountProcedure = await loadProcedureOf(db, accountId);
  const procedures = LOAD_PROCEDURES.map((procedure) => ({
    procedure,
    label: LOAD_PROCEDURE_LABELS[procedure],
    sizesEquipment: procedure === accountProcedure,
    ...computeFacings(current.input, reference.site, procedure),
  }));
  const { result, error: loadsError } = procedures.find((p) => p.sizesEquipment)!;
  return {
    plan: {
      id: plan.id,
      planCode: plan.planCode,
      name: plan.name,
      version: plan.version,
      updatedAt: plan.updatedAt,
    },
    reference: { communities: reference.communities, community: reference.community },
    current: {
      id: current.id,
      number: current.number,
      status: current.status,
      cells: revisionCells(current, plan.planCode, plan.name),
      input: current.input as PlanInput,
    },
    revisions: revisions.map(({ revision, createdBy }) => ({
      id: revision.id,
      number: revision.number,
      status: revision.status,
      createdAt: revision.createdAt,
      createdBy,
      approverName: revision.approverName,
      approverCredential: revision.approverCredential,
      approvedOn: revision.approvedOn,
    })),
    history: history.filter((h) => touchesPlan(h.after, planId) || touchesPlan(h.before, planId)),
    accountProcedure,
    /** The account's procedure's result (the one that sizes equipment). */
    result,
    loadsError,
    /** Each procedure's four facings, or why it could not be computed. */
    procedures,
  };
}

function touchesPlan(payload: unknown, planId: number): boolean {
  return Array.isArray(payload) && payload.some((p) => (p as { planId?: number }).planId === planId);
}

interface EditEntry {
  planId: number;
  planCode: string;
  cells: PlanCells;
}

/**
 * Applies cell changes to one or many plans in one transaction and one history entry: a single
 * edit, a bulk "set this value on the selected models", or a pasted block. Every change carries
 * the version its editor loaded; a stale one refuses the whole edit. Every bad cell of every
 * plan is reported and nothing is written. An approved revision is never changed: the edit
 * starts a new draft revision.
 */
export async function applyPlanEdits({
  db,
  accountId,
  userId,
  changes,
  action = "edit",
  description,
}: {
  db: Database;
  accountId: number;
  userId: number;
  changes: PlanCellChange[];
  action?: "edit" | "bulk_edit" | "paste" | "undo";
  description?: string;
}) {
  if (changes.length === 0) throw new AppError("invalid_input", "There is nothing to save.");
  const ids = [...new Set(changes.map((c) => c.planId))];
  if (ids.length !== changes.length)
    throw new AppError("invalid_input", "Each plan may appear once in an edit.");
  for (const change of changes) {
    for (const key of Object.keys(change.cells)) {
      if (!PLAN_COLUMN_BY_KEY.has(key))
        throw new AppError("invalid_input", `"${key}" is not a plan library column.`, [
          { field: key, message: "Unknown column" },
        ]);
    }
  }

  return db.transaction(async (tx) => {
    const rows = await tx
      .select({ plan: plans, revision: planRevisions })
      .from(plans)
      .innerJoin(planRevisions, eq(planRevisions.id, plans.currentRevisionId))
      .where(and(eq(plans.accountId, accountId), inArray(plans.id, ids)))
      .for("update");
    const byId = new Map(rows.map((r) => [r.plan.id, r]));
    const fieldErrors: FieldError[] = [];
    const before: EditEntry[] = [];
    const after: EditEntry[] = [];
    const writes: {
      row: (typeof rows)[number];
      cells: PlanCells;
      input: PlanInput;
      planCode: string;
      planName: string;
    }[] = [];

    for (const change of changes) {
      const row = byId.get(change.planId);
      if (!row) throw notFound("That plan model");
      if (row.plan.version !== change.version) {
        throw new AppError(
          "conflict",
          `Plan ${row.plan.planCode} was changed by someone else since you loaded it (version ${row.plan.version}, yours ${change.version}). Nothing was saved; reload to see the current values.`,
        );
      }
      const oldCells = revisionCells(row.revision, row.plan.planCode, row.plan.name);
      const newCells: PlanCells = { ...oldCells, ...change.cells };
      const result = rowToPlanInput(newCells as PlanRowCells);
      if (!result.ok) {
        for (const e of result.errors)
          fieldErrors.push({
            field: `${row.plan.planCode}.${e.key || "plan"}`,
            row: row.plan.id,
            column: e.header,
            message: e.reason,
          });
        continue;
      }
      const changedKeys = Object.keys(change.cells).filter(
        (k) => String(oldCells[k] ?? "") !== String(newCells[k] ?? ""),
      );
      if (changedKeys.length === 0) continue;
      before.push({
        planId: row.plan.id,
        planCode: row.plan.planCode,
        cells: Object.fromEntries(changedKeys.map((k) => [k, oldCells[k] ?? null])),
      });
      after.push({
        planId: row.plan.id,
        planCode: result.planCode,
        cells: Object.fromEntries(changedKeys.map((k) => [k, newCells[k] ?? null])),
      });
      writes.push({
        row,
        cells: newCells,
        input: result.input,
        planCode: result.planCode,
        planName: result.planName,
      });
    }
    if (fieldErrors.length > 0)
      throw new AppError(
        "invalid_input",
        `${fieldErrors.length} cell(s) are not valid; nothing was saved.`,
        fieldErrors,
      );
    if (writes.length === 0)
      return { changed: 0, entryId: null as number | null, lotsRecomputed: 0, lotsChanged: 0 };

    const codes = writes.filter((w) => w.planCode !== w.row.plan.planCode).map((w) => w.planCode);
    if (codes.length > 0) {
      const taken = await tx
        .select({ planCode: plans.planCode, id: plans.id })
        .from(plans)
        .where(and(eq(plans.accountId, accountId), inArray(plans.planCode, codes)));
      const clash = taken.find((t) => !writes.some((w) => w.row.plan.id === t.id));
      if (clash)
        throw new AppError("conflict", `Plan code ${clash.planCode} is already used by another plan model.`, [
          { field: "plan_code", message: "Already used" },
        ]);
    }

    for (const w of writes)
      await writePlanRevision(tx, {
        accountId,
        userId,
        plan: w.row.plan,
        revision: w.row.revision,
        cells: w.cells,
        input: w.input,
        planCode: w.planCode,
        planName: w.planName,
      });
    // Every lot built on these plans is recomputed (frozen lots keep their permit snapshot).
    const lotsRecomputed = await recomputeLots(tx, { accountId, planIds: writes.map((w) => w.row.plan.id) });

    const summary =
      description ??
      (writes.length === 1
        ? `${action === "undo" ? "Undid a change to" : "Edited"} ${after[0].planCode}: ${Object.keys(
            after[0].cells,
          )
            .map((k) => PLAN_COLUMN_BY_KEY.get(k)?.header ?? k)
            .join(", ")}`
        : `${action === "paste" ? "Pasted into" : action === "undo" ? "Undid a change to" : "Edited"} ${writes.length} plan models`);
    const entryId = await recordAudit(tx, {
      accountId,
      userId,
      action: `plan_${action}`,
      entityType: "plan",
      entityId: writes.length === 1 ? writes[0].row.plan.id : null,
      summary,
      before,
      after,
    });
    return {
      changed: writes.length,
      entryId: entryId as number | null,
      lotsRecomputed: lotsRecomputed.recomputed,
      lotsChanged: lotsRecomputed.changed,
    };
  });
}

export async function writePlanRevision(
  tx: Tx,
  w: {
    accountId: number;
    userId: number;
    plan: typeof plans.$inferSelect;
    revision: typeof planRevisions.$inferSelect;
    cells: PlanCells;
    input: PlanInput;
    planCode: string;
    planName: string;
  },
) {
  let revisionId = w.revision.id;
  if (w.revision.status === "approved") {
    // An approved revision is locked: the edit starts a new draft.
    [{ id: revisionId }] = await tx
      .insert(planRevisions)
      .values({
        accountId: w.accountId,
        planId: w.plan.id,
        number: w.revision.number + 1,
        cells: w.cells,
        input: w.input,
        createdByUserId: w.userId,
      })
      .$returningId();
  } else {
    await tx
      .update(planRevisions)
      .set({ cells: w.cells, input: w.input })
      .where(eq(planRevisions.id, revisionId));
  }
  await tx
    .update(plans)
    .set({
      planCode: w.planCode,
      name: w.planName,
      currentRevisionId: revisionId,
      version: w.plan.version + 1,
      updatedAt: new Date(),
    })
    .where(eq(plans.id, w.plan.id));
}

/** History actions whose entries hold the cells before and after the change. */
const UNDOABLE_PLAN_ACTIONS = new Set(["plan_edit", "plan_bulk_edit", "plan_paste", "plan_undo"]);

/**
 * Undoes a plan edit from the history: the cells it changed go back to their values before it,
 * provided nobody changed those cells since (else nothing is written and the conflict is named).
 */
export async function undoPlanEdit({
  db,
  accountId,
  userId,
  entryId,
}: {
  db: Database;
  accountId: number;
  userId: number;
  entryId: number;
}) {
  const [entry] = await db
    .select()
    .from(auditLog)
    .where(and(eq(auditLog.id, entryId), eq(auditLog.accountId, accountId), eq(auditLog.entityType, "plan")));
  if (!entry) throw notFound("That change");
  // Only cell edits keep the cells before and after; an approval, an import or a copy does not,
  // and an approved revision is never changed (an edit starts a new draft instead).
  if (
    !UNDOABLE_PLAN_ACTIONS.has(entry.action) ||
    !Array.isArray(entry.before) ||
    !Array.isArray(entry.after)
  ) {
    throw new AppError(
      "conflict",
      `That history entry (${entry.summary}) is not a cell edit; only cell edits can be undone. Nothing was changed.`,
      [{ field: "entryId", message: "Not a cell edit" }],
    );
  }
  const before = entry.before as EditEntry[];
  const after = entry.after as EditEntry[];
  const current = await db
    .select({ plan: plans, revision: planRevisions })
    .from(plans)
    .innerJoin(planRevisions, eq(planRevisions.id, plans.currentRevisionId))
    .where(
      and(
        eq(plans.accountId, accountId),
        inArray(
          plans.id,
          before.map((b) => b.planId),
        ),
      ),
    );
  const byId = new Map(current.map((c) => [c.plan.id, c]));
  const changes: PlanCellChange[] = [];
  for (const a of after) {
    const row = byId.get(a.planId);
    if (!row)
      throw new AppError("conflict", `Plan ${a.planCode} no longer exists; the change cannot be undone.`);
    const cells = revisionCells(row.revision, row.plan.planCode, row.plan.name);
    for (const [key, value] of Object.entries(a.cells)) {
      if (String(cells[key] ?? "") !== String(value ?? "")) {
        throw new AppError(
          "conflict",
          `${row.plan.planCode}: ${PLAN_COLUMN_BY_KEY.get(key)?.header ?? key} was changed again since; undo that first. Nothing was undone.`,
        );
      }
    }
    changes.push({
      planId: a.planId,
      version: row.plan.version,
      cells: before.find((b) => b.planId === a.planId)!.cells,
    });
  }
  return applyPlanEdits({
    db,
    accountId,
    userId,
    changes,
    action: "undo",
    description: `Undid: ${entry.summary}`,
  });
}

/** A reviewer approves the current revision: name, credential and date; it is locked from then on. */
export async function approveRevision({
  db,
  accountId,
  userId,
  planId,
  revisionId,
  approverName,
  approverCredential,
  approvedOn,
}: {
  db: Database;
  accountId: number;
  userId: number;
  planId: number;
  revisionId: number;
  approverName: string;
  approverCredential: string;
  approvedOn: string;
}) {
  await db.transaction(async (tx) => {
    const [plan] = await tx
      .select()
      .from(plans)
      .where(and(eq(plans.id, planId), eq(plans.accountId, accountId)))
      .for("update");
    if (!plan) throw notFound("That plan model");
    if (plan.currentRevisionId !== revisionId)
      throw new AppError("conflict", "Only the current revision can be approved; reload to see it.");
    const [revision] = await tx.select().from(planRevisions).where(eq(planRevisions.id, revisionId));
    if (revision.status === "approved")
      throw new AppError("conflict", `Revision ${revision.number} is approved already.`);
    await tx
      .update(planRevisions)
      .set({ status: "approved", approvedByUserId: userId, approverName, approverCredential, approvedOn })
      .where(eq(planRevisions.id, revisionId));
    await tx
      .update(plans)
      .set({ version: plan.version + 1, updatedAt: new Date() })
      .where(eq(plans.id, planId));
    await recordAudit(tx, {
      accountId,
      userId,
      action: "plan_approve",
      entityType: "plan",
      entityId: planId,
      summary: `Approved ${plan.planCode} revision ${revision.number} (${approverName}, ${approverCredential}, ${approvedOn})`,
      before: [{ planId, planCode: plan.planCode, status: "draft" }],
      after: [{ planId, planCode: plan.planCode, status: "approved", revision: revision.number }],
    });
  });
}

/** A new plan model copied from another (a new code and name; the copy starts as revision 1, a draft). */
export async function copyPlan({
  db,
  accountId,
  userId,
  fromPlanId,
  planCode,
  name,
}: {
  db: Database;
  accountId: number;
  userId: number;
  fromPlanId: number;
  planCode: string;
  name: string;
}) {
  return db.transaction(async (tx) => {
    const [source] = await tx
      .select({ plan: plans, revision: planRevisions })
      .from(plans)
      .innerJoin(planRevisions, eq(planRevisions.id, plans.currentRevisionId))
      .where(and(eq(plans.id, fromPlanId), eq(plans.accountId, accountId)));
    if (!source) throw notFound("That plan model");
    const cells: PlanCells = {
      ...revisionCells(source.revision, source.plan.planCode, source.plan.name),
      plan_code: planCode,
      plan_name: name,
    };
    const result = rowToPlanInput(cells as PlanRowCells);
    if (!result.ok)
      throw new AppError(
        "invalid_input",
        "The new model's code or name is not valid; nothing was created.",
        result.errors.map((e) => ({ field: e.key || "plan", column: e.header, message: e.reason })),
      );
    const [clash] = await tx
      .select({ id: plans.id })
      .from(plans)
      .where(and(eq(plans.accountId, accountId), eq(plans.planCode, result.planCode)));
    if (clash)
      throw new AppError("conflict", `Plan code ${result.planCode} is already used by another plan model.`, [
        { field: "planCode", message: "Already used" },
      ]);
    const [{ id: planId }] = await tx
      .insert(plans)
      .values({ accountId, planCode: result.planCode, name: result.planName })
      .$returningId();
    const [{ id: revisionId }] = await tx
      .insert(planRevisions)
      .values({ accountId, planId, number: 1, cells, input: result.input, createdByUserId: userId })
      .$returningId();
    await tx.update(plans).set({ currentRevisionId: revisionId }).where(eq(plans.id, planId));
    await recordAudit(tx, {
      accountId,
      userId,
      action: "plan_copy",
      entityType: "plan",
      entityId: planId,
      summary: `Created ${result.planCode} as a copy of ${source.plan.planCode}`,
      after: [{ planId, planCode: result.planCode, cells }],
    });
    return { planId };
  });
}

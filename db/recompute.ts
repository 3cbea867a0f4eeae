// Lot loads: computed from the current plan revision and the community's design conditions, and
// written back in a few statements. No "server-only" guard: the seed and the benchmark use it too.
import { and, eq, inArray, sql, type SQL } from "drizzle-orm";
import {
  computeFacingLoads,
  LOAD_PROCEDURE_LABELS,
  LoadInputError,
  parseSiteConditions,
  type FacingLoads,
  type LoadProcedure,
  type PlanInput,
  type SiteConditions,
} from "@/lib/load";
import { AppError } from "@/lib/errors";
import { LotEquipmentSelector, type LotSelection } from "./equipment";
import type { Database } from "./index";
import { loadProcedureOf, procedureOfStored } from "./load-procedure";
import { communities, lots, planRevisions, plans, type LotStatus } from "./schema";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];
type Db = Database | Tx;

/** What a lot keeps of its computed loads (the full result is recomputed on demand for reports). */
export interface LotResults {
  engineVersion: string;
  /** The procedure these loads come from (absent in results stored before procedures were named: hourly). */
  procedure: LoadProcedure;
  revisionId: number;
  revisionNumber: number;
  computedAt: string;
  heatingBtuh: number;
  coolingSensibleBtuh: number;
  coolingLatentBtuh: number;
  coolingTotalBtuh: number;
  tons: number;
  floorAreaPerTonFt2: number;
  airflowCfm: number;
  /** 1–4: where this lot's cooling total falls among its plan's four cardinal facings (1 = highest). */
  facingRank: number;
  /** True when the last recompute changed the loads. */
  changed: boolean;
  previous: { heatingBtuh: number; coolingTotalBtuh: number; procedure?: LoadProcedure } | null;
}

/** The frozen copy taken when a lot's permit is submitted: inputs, results and engine version. */
export interface PermitSnapshot {
  frozenAt: string;
  frozenByUserId: number;
  planId: number;
  planCode: string;
  planName: string;
  revisionId: number;
  revisionNumber: number;
  revisionStatus: string;
  approval: { name: string | null; credential: string | null; date: string | null };
  communityName: string;
  site: SiteConditions;
  facingDeg: number;
  input: PlanInput;
  result: FacingLoads;
  summary: LotResults;
  /** The equipment chosen when the permit was submitted (kept with the frozen loads). */
  selection: LotSelection | null;
  equipmentSystemId: number | null;
  engineVersion: string;
  /** The procedure of the frozen loads (the account's when frozen); absent in snapshots taken before procedures were named (hourly). */
  procedure: LoadProcedure;
}

export { procedureOfStored } from "./load-procedure";

export const FROZEN_STATUSES: readonly LotStatus[] = ["permit_submitted", "permitted", "built"];
export const isFrozen = (status: LotStatus) => FROZEN_STATUSES.includes(status);

function summarize(
  result: FacingLoads,
  cardinalTotals: number[],
  revision: { id: number; number: number },
  previous: LotResults | null,
): LotResults {
  const c = result.cooling;
  const rank = 1 + cardinalTotals.filter((t) => t > c.totalBtuh + 0.5).length;
  const changed =
    !!previous &&
    (Math.round(previous.coolingTotalBtuh) !== Math.round(c.totalBtuh) ||
      Math.round(previous.heatingBtuh) !== Math.round(result.heating.totalBtuh));
  return {
    engineVersion: result.engineVersion,
    procedure: result.procedure,
    revisionId: revision.id,
    revisionNumber: revision.number,
    computedAt: new Date().toISOString(),
    heatingBtuh: result.heating.totalBtuh,
    coolingSensibleBtuh: c.sensibleBtuh,
    coolingLatentBtuh: c.latentBtuh,
    coolingTotalBtuh: c.totalBtuh,
    tons: c.tons,
    floorAreaPerTonFt2: c.floorAreaPerTonFt2,
    airflowCfm: c.airflowCfm,
    facingRank: Math.min(4, rank),
    changed,
    previous: previous
      ? {
          heatingBtuh: previous.heatingBtuh,
          coolingTotalBtuh: previous.coolingTotalBtuh,
          procedure: procedureOfStored(previous),
        }
      : null,
  };
}

/**
 * Computes lots in memory by one procedure (the account's): one prepared plan per revision and
 * one prepared site per community (the engine caches both by identity), four cardinal facings
 * per (revision, community) for the rank.
 */
export class LotCalculator {
  private sites = new Map<number, SiteConditions>();
  private cardinal = new Map<string, number[]>();

  constructor(
    private readonly conditionsByCommunity: Map<number, unknown>,
    readonly procedure: LoadProcedure,
  ) {}

  /** The calculator for an account: its chosen procedure, read once. */
  static async forAccount(
    db: Db,
    accountId: number,
    conditionsByCommunity: Map<number, unknown>,
  ): Promise<LotCalculator> {
    return new LotCalculator(conditionsByCommunity, await loadProcedureOf(db, accountId));
  }

  site(communityId: number): SiteConditions {
    let site = this.sites.get(communityId);
    if (!site) {
      site = parseSiteConditions(this.conditionsByCommunity.get(communityId));
      this.sites.set(communityId, site);
    }
    return site;
  }

  compute(
    lot: { communityId: number; facingDeg: number; previous: LotResults | null },
    revision: { id: number; number: number; input: PlanInput },
  ): { full: FacingLoads; summary: LotResults } {
    const site = this.site(lot.communityId);
    const key = `${revision.id}:${lot.communityId}`;
    let totals = this.cardinal.get(key);
    if (!totals) {
      totals = [0, 90, 180, 270].map((deg) => this.facing(revision.input, site, deg).cooling.totalBtuh);
      this.cardinal.set(key, totals);
    }
    const full = this.facing(revision.input, site, lot.facingDeg);
    return { full, summary: summarize(full, totals, revision, lot.previous) };
  }

  /** An engine refusal (a procedure the engine does not run, an input it refuses) becomes the one error shape, naming the procedure; nothing is written. */
  private facing(input: PlanInput, site: SiteConditions, facingDeg: number): FacingLoads {
    try {
      return computeFacingLoads(input, site, facingDeg, { validated: true, procedure: this.procedure });
    } catch (error) {
      if (error instanceof LoadInputError) {
        throw new AppError(
          "conflict",
          `Lot loads cannot be computed by ${LOAD_PROCEDURE_LABELS[this.procedure]}: ${error.message}. Nothing was saved.`,
          error.issues.map((issue) => ({ field: issue.field, message: issue.message })),
        );
      }
      throw error;
    }
  }

  /** Equipment for a lot's loads from the account's catalog, at the community's heating design temperature. */
  select(
    selector: LotEquipmentSelector,
    communityId: number,
    summary: LotResults,
    overrideSystemId: number | null,
  ) {
    return selector.select(
      { communityId, heatingOutdoorDbF: this.site(communityId).heatingOutdoorDbF },
      summary,
      overrideSystemId,
    );
  }
}

/** Writes many lots' results in a few statements (CASE per id, 500 ids a statement). */
export async function writeResults(
  tx: Db,
  rows: {
    id: number;
    results: LotResults;
    selection?: { selection: LotSelection; systemId: number | null };
  }[],
) {
  const now = new Date();
  for (let i = 0; i < rows.length; i += 500) {
    const chunk = rows.slice(i, i + 500);
    const cases: SQL[] = chunk.map((r) => sql`WHEN ${r.id} THEN ${JSON.stringify(r.results)}`);
    const revisionCases: SQL[] = chunk.map((r) => sql`WHEN ${r.id} THEN ${r.results.revisionId}`);
    await tx
      .update(lots)
      .set({
        results: sql`CASE ${lots.id} ${sql.join(cases, sql` `)} END`,
        resultsRevisionId: sql`CASE ${lots.id} ${sql.join(revisionCases, sql` `)} END`,
        resultsComputedAt: now,
      })
      .where(
        inArray(
          lots.id,
          chunk.map((r) => r.id),
        ),
      );
    // Frozen lots keep the selection of their permit snapshot; the others get a new one.
    const selected = chunk.filter((r) => r.selection);
    if (selected.length > 0) {
      await tx
        .update(lots)
        .set({
          selection: sql`CASE ${lots.id} ${sql.join(
            selected.map((r) => sql`WHEN ${r.id} THEN ${JSON.stringify(r.selection!.selection)}`),
            sql` `,
          )} END`,
          equipmentSystemId: sql`CASE ${lots.id} ${sql.join(
            selected.map((r) => sql`WHEN ${r.id} THEN ${r.selection!.systemId}`),
            sql` `,
          )} END`,
        })
        .where(
          inArray(
            lots.id,
            selected.map((r) => r.id),
          ),
        );
    }
  }
}

/**
 * Recomputes lots from the current plan revisions and community conditions: all lots of the
 * account matching the filter. Frozen lots are recomputed too (so the grid can show that the
 * current plan differs) but their permit snapshot is never touched.
 */
export async function recomputeLots(
  tx: Db,
  {
    accountId,
    communityId,
    planIds,
    lotIds,
  }: { accountId: number; communityId?: number; planIds?: number[]; lotIds?: number[] },
) {
  const filters = [eq(lots.accountId, accountId)];
  if (communityId) filters.push(eq(lots.communityId, communityId));
  if (planIds) {
    if (planIds.length === 0) return { recomputed: 0, changed: 0 };
    filters.push(inArray(lots.planId, planIds));
  }
  if (lotIds) {
    if (lotIds.length === 0) return { recomputed: 0, changed: 0 };
    filters.push(inArray(lots.id, lotIds));
  }
  const rows = await tx
    .select({
      id: lots.id,
      communityId: lots.communityId,
      facingDeg: lots.facingDeg,
      results: lots.results,
      status: lots.status,
      equipmentSystemId: lots.equipmentSystemId,
      equipmentOverride: lots.equipmentOverride,
      revisionId: planRevisions.id,
      revisionNumber: planRevisions.number,
      input: planRevisions.input,
    })
    .from(lots)
    .innerJoin(plans, eq(plans.id, lots.planId))
    .innerJoin(planRevisions, eq(planRevisions.id, plans.currentRevisionId))
    .where(and(...filters));
  if (rows.length === 0) return { recomputed: 0, changed: 0 };
  const communityIds = [...new Set(rows.map((r) => r.communityId))];
  const conditions = await tx
    .select({ id: communities.id, conditions: communities.conditions })
    .from(communities)
    .where(inArray(communities.id, communityIds));
  const calculator = await LotCalculator.forAccount(
    tx,
    accountId,
    new Map(conditions.map((c) => [c.id, c.conditions])),
  );
  const selector = await LotEquipmentSelector.forAccount(tx, accountId);
  const inputs = new Map<number, PlanInput>();
  const out: Parameters<typeof writeResults>[1] = [];
  for (const r of rows) {
    let input = inputs.get(r.revisionId);
    if (!input) {
      input = r.input as PlanInput;
      inputs.set(r.revisionId, input);
    }
    const { summary } = calculator.compute(
      {
        communityId: r.communityId,
        facingDeg: Number(r.facingDeg),
        previous: (r.results as LotResults | null) ?? null,
      },
      { id: r.revisionId, number: r.revisionNumber, input },
    );
    const selection = isFrozen(r.status)
      ? undefined
      : calculator.select(selector, r.communityId, summary, r.equipmentOverride ? r.equipmentSystemId : null);
    out.push({ id: r.id, results: summary, selection });
  }
  await writeResults(tx, out);
  return { recomputed: out.length, changed: out.filter((o) => o.results.changed).length };
}

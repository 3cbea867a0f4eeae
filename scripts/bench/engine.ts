/**
 * Load-engine benchmark: plan-facing calculations per second on one core, and the time to
 * recompute 10,000 lots. Figures are printed, never asserted.
 */
import { computeFacingLoads, computePlanFacings, parsePlanInput, parseSiteConditions, type PlanInput } from "../../lib/load";
import { CEDAR_BEND_SITE, EXAMPLE_PLANS } from "../../tests/fixtures/engine/example-plans";

export interface EngineBenchResult {
  warmCalcsPerSecond: number;
  coldCalcsPerSecond: number;
  libraryCalcsPerSecond: number;
  tenThousandLotsMs: number;
  lines: string[];
}

function timeIt(fn: () => void): number {
  const start = process.hrtime.bigint();
  fn();
  return Number(process.hrtime.bigint() - start) / 1e6;
}

export function runEngineBenchmark(): EngineBenchResult {
  const site = parseSiteConditions(CEDAR_BEND_SITE);
  const plans: PlanInput[] = EXAMPLE_PLANS.map((p) => parsePlanInput(p));
  let sink = 0;

  // Warm-up (JIT), not timed.
  for (let i = 0; i < 2000; i++) sink += computeFacingLoads(plans[i % 3], site, (i * 7) % 360, { validated: true }).cooling.totalBtuh;

  // 1. Warm: plan and site prepared once (the bulk-recompute case); each call is one plan-facing.
  const warmN = 60_000;
  const warmMs = timeIt(() => {
    for (let i = 0; i < warmN; i++) {
      sink += computeFacingLoads(plans[i % 3], site, (i * 15) % 360, { validated: true }).cooling.totalBtuh;
    }
  });

  // 2. Cold: a fresh plan object each call, so the plan's U-factors, leakage and heating are redone too.
  const coldN = 20_000;
  const coldMs = timeIt(() => {
    for (let i = 0; i < coldN; i++) {
      const fresh = { ...plans[i % 3] };
      sink += computeFacingLoads(fresh, site, (i * 15) % 360, { validated: true }).cooling.totalBtuh;
    }
  });

  // 3. Plan library: a fresh plan each time, all four facings (front to N, E, S, W) = 4 plan-facings.
  const libraryN = 10_000;
  const libraryMs = timeIt(() => {
    for (let i = 0; i < libraryN; i++) {
      sink += computePlanFacings({ ...plans[i % 3] }, site, { validated: true }).worst.coolingTotalBtuh;
    }
  });

  // 4. 10,000 lots: three models spread over lots at 8 compass facings plus odd angles.
  const lots = Array.from({ length: 10_000 }, (_, i) => ({ plan: plans[i % 3], facingDeg: (i * 37) % 360 }));
  const lotsMs = timeIt(() => {
    for (const lot of lots) sink += computeFacingLoads(lot.plan, site, lot.facingDeg, { validated: true }).cooling.totalBtuh;
  });

  const warmCalcsPerSecond = (warmN / warmMs) * 1000;
  const coldCalcsPerSecond = (coldN / coldMs) * 1000;
  const libraryCalcsPerSecond = ((4 * libraryN) / libraryMs) * 1000;
  const fmt = (n: number) => Math.round(n).toLocaleString("en-US");
  const lines = [
    `load engine (one core, Node ${process.version})`,
    `  plan-facing calcs/s, plan prepared once : ${fmt(warmCalcsPerSecond)}  (${fmt(warmN)} calcs in ${warmMs.toFixed(0)} ms)`,
    `  plan-facing calcs/s, plan redone each   : ${fmt(coldCalcsPerSecond)}  (${fmt(coldN)} calcs in ${coldMs.toFixed(0)} ms)`,
    `  plan-facing calcs/s, plan library (4 facings per plan, plan redone): ${fmt(libraryCalcsPerSecond)}`,
    `  recompute 10,000 lots (3 models, any facing): ${lotsMs.toFixed(0)} ms`,
    `  target                                  : ≥ 20,000 plan-facing calcs/s`,
    `  (checksum ${Math.round(sink) % 100000})`,
  ];
  return { warmCalcsPerSecond, coldCalcsPerSecond, libraryCalcsPerSecond, tenThousandLotsMs: lotsMs, lines };
}

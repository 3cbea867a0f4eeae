/**
 * Load-engine benchmark: plan-facing calculations per second on one core, and the time to
 * recompute 10,000 lots, for each load procedure. Figures are printed, never asserted. A
 * procedure the engine refuses is reported as such (its figures are not faked).
 */
import {
  computeFacingLoads,
  computePlanFacings,
  LOAD_PROCEDURE_LABELS,
  LOAD_PROCEDURES,
  LoadInputError,
  parsePlanInput,
  parseSiteConditions,
  type LoadProcedure,
  type PlanInput,
  type SiteConditions,
} from "../../lib/load";
import { CEDAR_BEND_SITE, EXAMPLE_PLANS } from "../../tests/fixtures/engine/example-plans";

export interface ProcedureBenchResult {
  procedure: LoadProcedure;
  warmCalcsPerSecond: number;
  coldCalcsPerSecond: number;
  libraryCalcsPerSecond: number;
  tenThousandLotsMs: number;
}

export interface EngineBenchResult {
  procedures: ProcedureBenchResult[];
  /** Procedures the engine refused, with its message. */
  refused: { procedure: LoadProcedure; message: string }[];
  lines: string[];
}

function timeIt(fn: () => void): number {
  const start = process.hrtime.bigint();
  fn();
  return Number(process.hrtime.bigint() - start) / 1e6;
}

function benchProcedure(
  procedure: LoadProcedure,
  plans: PlanInput[],
  site: SiteConditions,
): ProcedureBenchResult & { sink: number } {
  const options = { validated: true, procedure } as const;
  let sink = 0;

  // Warm-up (JIT), not timed.
  for (let i = 0; i < 2000; i++)
    sink += computeFacingLoads(plans[i % 3], site, (i * 7) % 360, options).cooling.totalBtuh;

  // 1. Warm: plan and site prepared once (the bulk-recompute case); each call is one plan-facing.
  const warmN = 60_000;
  const warmMs = timeIt(() => {
    for (let i = 0; i < warmN; i++)
      sink += computeFacingLoads(plans[i % 3], site, (i * 15) % 360, options).cooling.totalBtuh;
  });

  // 2. Cold: a fresh plan object each call, so the plan's U-factors, leakage and heating are redone too.
  const coldN = 20_000;
  const coldMs = timeIt(() => {
    for (let i = 0; i < coldN; i++)
      sink += computeFacingLoads({ ...plans[i % 3] }, site, (i * 15) % 360, options).cooling.totalBtuh;
  });

  // 3. Plan library: a fresh plan each time, all four facings (front to N, E, S, W) = 4 plan-facings.
  const libraryN = 10_000;
  const libraryMs = timeIt(() => {
    for (let i = 0; i < libraryN; i++)
      sink += computePlanFacings({ ...plans[i % 3] }, site, options).worst.coolingTotalBtuh;
  });

  // 4. 10,000 lots: three models spread over lots at 8 compass facings plus odd angles.
  const lots = Array.from({ length: 10_000 }, (_, i) => ({ plan: plans[i % 3], facingDeg: (i * 37) % 360 }));
  const lotsMs = timeIt(() => {
    for (const lot of lots)
      sink += computeFacingLoads(lot.plan, site, lot.facingDeg, options).cooling.totalBtuh;
  });

  return {
    procedure,
    warmCalcsPerSecond: (warmN / warmMs) * 1000,
    coldCalcsPerSecond: (coldN / coldMs) * 1000,
    libraryCalcsPerSecond: ((4 * libraryN) / libraryMs) * 1000,
    tenThousandLotsMs: lotsMs,
    sink,
  };
}

export function runEngineBenchmark(): EngineBenchResult {
  const site = parseSiteConditions(CEDAR_BEND_SITE);
  const plans: PlanInput[] = EXAMPLE_PLANS.map((p) => parsePlanInput(p));
  const fmt = (n: number) => Math.round(n).toLocaleString("en-US");
  const procedures: ProcedureBenchResult[] = [];
  const refused: { procedure: LoadProcedure; message: string }[] = [];
  let sink = 0;
  const lines = [`load engine (one core, Node ${process.version})`];
  for (const procedure of LOAD_PROCEDURES) {
    lines.push(`  ${procedure} — ${LOAD_PROCEDURE_LABELS[procedure]}`);
    try {
      const r = benchProcedure(procedure, plans, site);
      sink += r.sink;
      procedures.push({
        procedure: r.procedure,
        warmCalcsPerSecond: r.warmCalcsPerSecond,
        coldCalcsPerSecond: r.coldCalcsPerSecond,
        libraryCalcsPerSecond: r.libraryCalcsPerSecond,
        tenThousandLotsMs: r.tenThousandLotsMs,
      });
      lines.push(
        `    plan-facing calcs/s, plan prepared once : ${fmt(r.warmCalcsPerSecond)}`,
        `    plan-facing calcs/s, plan redone each   : ${fmt(r.coldCalcsPerSecond)}`,
        `    plan-facing calcs/s, plan library (4 facings per plan, plan redone): ${fmt(r.libraryCalcsPerSecond)}`,
        `    recompute 10,000 lots (3 models, any facing): ${r.tenThousandLotsMs.toFixed(0)} ms`,
      );
    } catch (error) {
      if (!(error instanceof LoadInputError)) throw error;
      refused.push({ procedure, message: error.message });
      lines.push(`    not run: the engine refuses it (${error.message})`);
    }
  }
  lines.push(
    `  target: ≥ 20,000 plan-facing calcs/s (hourly method); 10,000 lots in < 500 ms`,
    `  (checksum ${Math.round(sink) % 100000})`,
  );
  return { procedures, refused, lines };
}

/**
 * RLF benchmark (HoF 2021 ch. 17 residential load factor method, lib/load/residential-load-factor):
 * plan-facings per second and the time for 10,000 lots. Figures are printed, never asserted.
 * Run alone with `npx tsx scripts/bench/rlf.ts`, or list `runRlfBenchmark` in scripts/bench.ts.
 */
import { parsePlanInput, parseSiteConditions, type PlanInput } from "../../lib/load";
import { computeResidentialLoadFactorFacing } from "../../lib/load/residential-load-factor/from-plan";
import { CEDAR_BEND_SITE, EXAMPLE_PLANS } from "../../tests/fixtures/engine/example-plans";

function timeIt(fn: () => void): number {
  const start = process.hrtime.bigint();
  fn();
  return Number(process.hrtime.bigint() - start) / 1e6;
}

export function runRlfBenchmark(): { lines: string[] } {
  const site = parseSiteConditions(CEDAR_BEND_SITE);
  const plans: PlanInput[] = EXAMPLE_PLANS.map((p) => parsePlanInput(p));
  let sink = 0;
  for (let i = 0; i < 2000; i++)
    sink += computeResidentialLoadFactorFacing(plans[i % 3], site, (i * 7) % 360).cooling.totalBtuh;

  const warmN = 60_000;
  const warmMs = timeIt(() => {
    for (let i = 0; i < warmN; i++)
      sink += computeResidentialLoadFactorFacing(plans[i % 3], site, (i * 15) % 360).cooling.totalBtuh;
  });
  const coldN = 20_000;
  const coldMs = timeIt(() => {
    for (let i = 0; i < coldN; i++)
      sink += computeResidentialLoadFactorFacing({ ...plans[i % 3] }, site, (i * 15) % 360).cooling.totalBtuh;
  });
  const lots = Array.from({ length: 10_000 }, (_, i) => ({ plan: plans[i % 3], facingDeg: (i * 37) % 360 }));
  const lotsMs = timeIt(() => {
    for (const lot of lots)
      sink += computeResidentialLoadFactorFacing(lot.plan, site, lot.facingDeg).cooling.totalBtuh;
  });
  if (!Number.isFinite(sink)) throw new Error("benchmark produced a non-finite load");
  return {
    lines: [
      `rlf: ${Math.round((warmN / warmMs) * 1000).toLocaleString("en-US")} plan-facings/s warm (plan mapped once)`,
      `rlf: ${Math.round((coldN / coldMs) * 1000).toLocaleString("en-US")} plan-facings/s cold (a fresh plan object each call)`,
      `rlf: 10,000 lots in ${Math.round(lotsMs)} ms`,
    ],
  };
}

if (process.argv[1] && /bench[\\/]rlf\.ts$/.test(process.argv[1])) {
  for (const line of runRlfBenchmark().lines) console.log(line);
}

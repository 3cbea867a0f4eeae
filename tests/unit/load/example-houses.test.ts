/**
 * The invented example houses (tests/fixtures/engine/example-plans.ts) at the four facings.
 * Bounds are broad plausibility checks for new, code-level houses in a warm-humid climate (not
 * exact expected values): 600–2,000 ft² per ton (the upper end: HoF 2021 ch. 17's own example
 * house, 195.3 m² = 2,102 ft² with 4,096 W sensible + 752 W latent = 1.38 tons, is about 1,520 ft²
 * per ton; the lower end, common practice for the old rule of thumb), SHR 0.7–0.9 (common
 * practice), heating 10–30 Btu/h per ft² at a 24 °F design (common practice).
 */
import { describe, expect, it } from "vitest";
import { computePlanFacings, LOAD_PROCEDURES } from "../../../lib/load";
import { CEDAR_BEND_SITE, EXAMPLE_PLANS } from "../../fixtures/engine/example-plans";

describe.each(
  EXAMPLE_PLANS.flatMap((p) => LOAD_PROCEDURES.map((procedure) => [p.name ?? "plan", procedure, p] as const)),
)("example house %s, %s", (_name, procedure, plan) => {
  const result = computePlanFacings(plan, CEDAR_BEND_SITE, { procedure });
  it("gives plausible loads at every facing (common practice bounds)", () => {
    for (const f of result.facings) {
      expect(f.cooling.floorAreaPerTonFt2).toBeGreaterThan(600);
      expect(f.cooling.floorAreaPerTonFt2).toBeLessThan(2000);
      expect(f.cooling.sensibleHeatRatio).toBeGreaterThan(0.7);
      expect(f.cooling.sensibleHeatRatio).toBeLessThan(0.9);
      const heatPerFt2 = f.heating.totalBtuh / plan.conditionedFloorAreaFt2;
      expect(heatPerFt2).toBeGreaterThan(10);
      expect(heatPerFt2).toBeLessThan(30);
      if (procedure === "hourly") {
        expect(f.cooling.peakHour).toBeGreaterThanOrEqual(12);
        expect(f.cooling.peakHour).toBeLessThanOrEqual(19);
      } else {
        expect(f.cooling.peakHour).toBeNull(); // the load-factor procedure gives the peak load only
      }
    }
  });
});

/**
 * The invented example houses (tests/fixtures/engine/example-plans.ts) at the four facings.
 * Bounds are broad plausibility checks from common practice for new, code-level houses in a
 * warm-humid climate (not exact expected values): 600–1,400 ft² per ton, SHR 0.7–0.9, heating
 * 10–30 Btu/h per ft² at a 24 °F design.
 */
import { describe, expect, it } from "vitest";
import { computePlanFacings } from "../../../lib/load";
import { CEDAR_BEND_SITE, EXAMPLE_PLANS } from "../../fixtures/engine/example-plans";

describe.each(EXAMPLE_PLANS.map((p) => [p.name ?? "plan", p] as const))("example house %s", (_name, plan) => {
  const result = computePlanFacings(plan, CEDAR_BEND_SITE);
  it("gives plausible loads at every facing (common practice bounds)", () => {
    for (const f of result.facings) {
      expect(f.cooling.floorAreaPerTonFt2).toBeGreaterThan(600);
      expect(f.cooling.floorAreaPerTonFt2).toBeLessThan(1400);
      expect(f.cooling.sensibleHeatRatio).toBeGreaterThan(0.7);
      expect(f.cooling.sensibleHeatRatio).toBeLessThan(0.9);
      const heatPerFt2 = f.heating.totalBtuh / plan.conditionedFloorAreaFt2;
      expect(heatPerFt2).toBeGreaterThan(10);
      expect(heatPerFt2).toBeLessThan(30);
      expect(f.cooling.peakHour).toBeGreaterThanOrEqual(12);
      expect(f.cooling.peakHour).toBeLessThanOrEqual(19);
    }
  });
});

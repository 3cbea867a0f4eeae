/** The plan sheet's side-by-side comparison of the two procedures (lib/reports/procedure-compare.ts). */
import { describe, expect, it } from "vitest";
import { computePlanFacings } from "@/lib/load";
import { compareProcedures, loadDifference } from "@/lib/reports/procedure-compare";
import { ASPEN_1, CEDAR_BEND_SITE } from "../../fixtures/engine/example-plans";

describe("loadDifference", () => {
  it("is the other procedure minus the sizing one, in Btu/h and in % of the sizing one (by hand)", () => {
    expect(loadDifference(20_000, 23_000)).toEqual({
      sizingBtuh: 20_000,
      otherBtuh: 23_000,
      differenceBtuh: 3_000,
      differencePct: 15,
    });
    expect(loadDifference(24_000, 18_000)).toEqual({
      sizingBtuh: 24_000,
      otherBtuh: 18_000,
      differenceBtuh: -6_000,
      differencePct: -25,
    });
    // A credit (a slab's negative cooling load): % of its size, so a larger credit reads as a negative change.
    expect(loadDifference(-1_000, -1_500)).toEqual({
      sizingBtuh: -1_000,
      otherBtuh: -1_500,
      differenceBtuh: -500,
      differencePct: -50,
    });
    // No % of nothing.
    expect(loadDifference(0, 250).differencePct).toBeNull();
  });
});

describe("compareProcedures", () => {
  it("pairs the two procedures' facings and components, differences taken from the engine's own numbers", () => {
    const sizing = computePlanFacings(ASPEN_1, CEDAR_BEND_SITE, { procedure: "residential-load-factor" });
    const other = computePlanFacings(ASPEN_1, CEDAR_BEND_SITE, { procedure: "hourly" });
    const comparison = compareProcedures(sizing, other);
    expect(comparison.sizing).toBe("residential-load-factor");
    expect(comparison.other).toBe("hourly");
    expect(comparison.facings.map((f) => f.label)).toEqual(["N", "E", "S", "W"]);
    comparison.facings.forEach((f, i) => {
      const a = sizing.facings[i];
      const b = other.facings[i];
      expect(f.coolingTotal).toEqual(loadDifference(a.cooling.totalBtuh, b.cooling.totalBtuh));
      expect(f.heating).toEqual(loadDifference(a.heating.totalBtuh, b.heating.totalBtuh));
      for (const row of f.coolingSensibleByComponent) {
        const key = row.component as keyof typeof a.cooling.sensibleByComponent;
        expect(row.sizingBtuh).toBe(a.cooling.sensibleByComponent[key]);
        expect(row.otherBtuh).toBe(b.cooling.sensibleByComponent[key]);
      }
      // A component left out is zero in both.
      for (const [key, value] of Object.entries(a.cooling.sensibleByComponent)) {
        if (!f.coolingSensibleByComponent.some((row) => row.component === key))
          expect([
            value,
            b.cooling.sensibleByComponent[key as keyof typeof a.cooling.sensibleByComponent],
          ]).toEqual([0, 0]);
      }
    });
  });

  it("refuses results that do not hold the same facings", () => {
    const hourly = computePlanFacings(ASPEN_1, CEDAR_BEND_SITE, { procedure: "hourly" });
    expect(() => compareProcedures(hourly, { ...hourly, facings: hourly.facings.slice(0, 3) })).toThrow(
      /has no facing W/,
    );
  });
});

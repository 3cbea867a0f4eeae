/**
 * The HoF 2021 ch. 17 example house (Atlanta; tests/fixtures/engine/handbook-example-house.ts, read in
 * the stored SI chapter) through the HOURLY method with heat storage, given the same inputs as the
 * chapter (direct U-factors, F_p, leakage area, screens, drapes, balanced ventilation, Table 6 ducts).
 * The hourly method is ours, so it is held to the chapter's totals within stated tolerances, not row by
 * row: heating within 5 %, total cooling within 10 %.
 *
 * Printed (Table 23 and the text): heating 7807 W; sensible cooling 4096 W; latent 903 + 111 = 1014 W
 * by its parts (the text prints "752 W" as their total; the sum of the parts is compared, as in
 * rlf-example-house.test.ts, because 752 cannot be rebuilt from the example's own data), so total
 * cooling 5110 W. With the printed 752 the total would be 4848 W; that is checked too, within 10 %.
 */
import { describe, expect, it } from "vitest";
import { computeFacingLoads } from "../../../lib/load";
import { BTUH_PER_W } from "../../../lib/load/units";
import { EXAMPLE_PLAN, EXAMPLE_SITE, PRINTED_TOTALS } from "../../fixtures/engine/handbook-example-house";

/** The fixture's front faces west (its reconstruction of the chapter's Figure 1). */
const FRONT_WEST = 270;
const result = computeFacingLoads(EXAMPLE_PLAN, EXAMPLE_SITE, FRONT_WEST, { procedure: "hourly" });
const w = (btuh: number) => btuh / BTUH_PER_W;

describe("HoF 2021 ch. 17 example house through the hourly method with heat storage", () => {
  it("heating within 5 % of the printed 7807 W (Table 23)", () => {
    const heatingW = w(result.heating.totalBtuh);
    expect(Math.abs(heatingW - PRINTED_TOTALS.totalHeatingW) / PRINTED_TOTALS.totalHeatingW).toBeLessThan(
      0.05,
    );
  });

  it("total cooling within 10 % of the printed 4096 W sensible + 1014 W latent (Table 23 and text)", () => {
    const printed =
      PRINTED_TOTALS.totalSensibleCoolingW +
      PRINTED_TOTALS.latentInfiltrationVentilationW +
      PRINTED_TOTALS.latentInternalW;
    const totalW = w(result.cooling.totalBtuh);
    expect(Math.abs(totalW - printed) / printed).toBeLessThan(0.1);
    // Against the printed latent total instead (4096 + 752 W): also within 10 %.
    const printedAsTotal = PRINTED_TOTALS.totalSensibleCoolingW + PRINTED_TOTALS.latentTotalPrintedW;
    expect(Math.abs(totalW - printedAsTotal) / printedAsTotal).toBeLessThan(0.1);
  });

  it("sensible cooling within 10 % of the printed 4096 W, after storage and the 1.7 K swing", () => {
    const sensibleW = w(result.cooling.sensibleBtuh);
    expect(
      Math.abs(sensibleW - PRINTED_TOTALS.totalSensibleCoolingW) / PRINTED_TOTALS.totalSensibleCoolingW,
    ).toBeLessThan(0.1);
    // The swing credit is what separates a fixed-set-point load from the chapter's residential one.
    expect(result.cooling.sensibleByComponent.temperatureSwing).toBeLessThan(0);
  });

  it("components rank as printed where the methods agree: windows largest, then ducts and walls above the internal gain; doors above the garage wall; the slab a credit", () => {
    const c = result.cooling.sensibleByComponent;
    // Table 22/23 cooling, W: windows 955, ducts 871, walls 772, internal 654, ceiling 405, doors 122,
    // garage wall 103, slab −457. Our ceiling under the vented attic reads higher than the chapter's
    // (about 750 W against 405 W: our one-node attic runs hotter than the chapter's factors imply), so it
    // is not ranked here; the closing notes of the work say so.
    const positive = (["windows", "ducts", "walls", "internal", "doors", "garageWall"] as const).map(
      (k) => c[k],
    );
    expect(Math.max(...positive)).toBe(c.windows);
    expect(Math.min(c.ducts, c.walls)).toBeGreaterThan(c.internal);
    expect(c.internal).toBeGreaterThan(c.doors);
    expect(c.doors).toBeGreaterThan(c.garageWall);
    expect(w(c.slab)).toBeCloseTo(-457, -1); // eq. 22–23 with the example's carpet: the same credit as printed (±5 W)
  });

  it("the peak falls in the afternoon and the storage is named in the notes", () => {
    expect(result.cooling.peakHour).toBeGreaterThanOrEqual(14);
    expect(result.cooling.peakHour).toBeLessThanOrEqual(18);
    expect(result.notes.join(" ")).toMatch(/radiant time series|RTS/i);
  });
});

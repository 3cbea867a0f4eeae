/**
 * Duct losses and gains by HoF 2021 ch. 17 eq. 19 (q_d = F_dl × q_bl) with the Table 6 "Typical duct
 * loss/gain factors" (2021 ASHRAE Handbook—Fundamentals, SI edition, p. 17.8). Expected table cells
 * are typed here from the printed table, independently of lib/load/ducts.ts. Interpolated values
 * are our own interpolation (worked by hand below), not the handbook's. Trade expectations are
 * marked "common practice".
 */
import { describe, expect, it } from "vitest";
import {
  computeFacingLoads,
  computePlanFacings,
  LoadInputError,
  parsePlanInput,
  safeParsePlanInput,
  type PlanInputRaw,
} from "../../../lib/load";
import { ductLossFactor, type DuctTableLocation, type DuctTableMode } from "../../../lib/load/ducts";
import { ASPEN_1, BIRCH_2, CEDAR_BEND_SITE } from "../../fixtures/engine/example-plans";
import { SEA_LEVEL_SITE, symmetricPlan } from "./helpers";

const factor = (
  location: DuctTableLocation,
  mode: DuctTableMode,
  stories: number,
  insulationR: number,
  leakagePct: number,
  returnLeakagePct = leakagePct,
) => ductLossFactor({ location, mode, stories, insulationR, supplyLeakagePct: leakagePct, returnLeakagePct });

describe("HoF 2021 ch. 17 Table 6 cells (read from the printed table)", () => {
  // [location, row, stories, R (IP), leakage % per side, printed F_dl]
  const cells: Array<[DuctTableLocation, DuctTableMode, number, number, number, number]> = [
    ["attic", "cooling", 1, 0, 11, 1.26],
    ["attic", "cooling", 1, 8, 5, 0.27],
    ["attic", "heating-furnace", 1, 8, 5, 0.13],
    ["attic", "heating-heat-pump", 2, 4, 5, 0.17],
    ["attic", "cooling", 2, 8, 11, 0.6],
    ["basement", "heating-furnace", 1, 8, 5, 0.08],
    ["basement", "cooling", 2, 0, 11, 0.11],
    ["crawlspace", "cooling", 2, 8, 11, 0.11],
    ["crawlspace", "heating-heat-pump", 1, 0, 5, 0.34],
  ];
  it.each(cells)(
    "%s %s, %i story, R-%i, %i %%/%i %% → printed value",
    (location, mode, stories, r, leak, expected) => {
      expect(factor(location, mode, stories, r, leak).factor).toBeCloseTo(expected, 10);
    },
  );

  it("the SI columns R-0.7 and R-1.4 m²·K/W are the R-4 and R-8 wraps (1 m²·K/W = 5.678 h·ft²·°F/Btu, unit conversion)", () => {
    expect(0.7 * 5.678).toBeCloseTo(4, 0);
    expect(1.4 * 5.678).toBeCloseTo(8, 0);
  });

  it("the example house's factors: 0.27 cooling, 0.13 heating (HoF 2021 ch. 17 example, attic ducts, R-8 wrap, well sealed, one story)", () => {
    expect(factor("attic", "cooling", 1, 8, 5).factor).toBeCloseTo(0.27, 10);
    expect(factor("attic", "heating-furnace", 1, 8, 5).factor).toBeCloseTo(0.13, 10);
  });
});

describe("between and beyond the printed columns (our interpolation)", () => {
  it("R-6 at 8 %/8 %, attic, one story, cooling: 0.485, worked by hand", () => {
    // 5 %/5 %: R-4 0.33, R-8 0.27 → R-6 0.30.  11 %/11 %: R-4 0.71, R-8 0.63 → R-6 0.67.
    // 8 % is halfway from 5 % to 11 %: 0.30 + 0.5 × (0.67 − 0.30) = 0.485.
    const f = factor("attic", "cooling", 1, 6, 8);
    expect(f.factor).toBeCloseTo(0.485, 10);
    expect(f.notes).toEqual([]);
  });

  it("unequal leakage uses the mean of supply and return", () => {
    expect(factor("attic", "cooling", 1, 8, 3, 13).factor).toBeCloseTo(
      factor("attic", "cooling", 1, 8, 8).factor,
      10,
    );
  });

  it("insulation above R-8 takes the R-8 column, with a note", () => {
    const f = factor("attic", "cooling", 1, 12, 5);
    expect(f.factor).toBeCloseTo(0.27, 10);
    expect(f.notes.join(" ")).toMatch(/above the handbook table's R-8 column/);
  });

  it("leakage below 5 % per side takes the 5 % column, with a note", () => {
    const f = factor("attic", "heating-furnace", 1, 8, 3);
    expect(f.factor).toBeCloseTo(0.13, 10);
    expect(f.notes.join(" ")).toMatch(/below the handbook table's 5 %\/5 % column/);
  });

  it("leakage above 11 % is extrapolated (15 %: 0.63 + 4/6 × 0.36 = 0.87), with a note", () => {
    const f = factor("attic", "cooling", 1, 8, 15);
    expect(f.factor).toBeCloseTo(0.63 + (4 / 6) * (0.63 - 0.27), 10);
    expect(f.notes.join(" ")).toMatch(/extrapolated/);
  });

  it("leakage beyond 20 % per side is refused by the table method, naming the field and range", () => {
    const plan = symmetricPlan({
      ducts: { location: "vented-attic", supplyLeakagePct: 25, returnLeakagePct: 25 },
    });
    const result = safeParsePlanInput(plan);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.issues[0].field).toBe("ducts.supplyLeakagePct");
      expect(result.issues[0].range).toMatchObject({ min: 0, max: 20 });
      expect(result.issues[0].message).toMatch(/conduction-leakage/);
    }
    expect(() => parsePlanInput(plan)).toThrow(LoadInputError);
    // The same leakage is accepted for the other method, and for ducts in conditioned space.
    expect(safeParsePlanInput({ ...plan, ducts: { ...plan.ducts, method: "conduction-leakage" } }).ok).toBe(
      true,
    );
    expect(
      safeParsePlanInput({
        ...plan,
        ducts: { location: "conditioned-space", supplyLeakagePct: 25, returnLeakagePct: 25 },
      }).ok,
    ).toBe(true);
  });
});

describe("duct loads in the engine (eq. 19 on the building load)", () => {
  const attic = (ducts: Record<string, unknown>, extra: Partial<PlanInputRaw> = {}) =>
    computeFacingLoads(
      symmetricPlan({ ...extra, ducts: { location: "vented-attic", ...ducts } }),
      SEA_LEVEL_SITE,
      0,
      { procedure: "hourly" },
    );

  it("cooling: the duct gain at the peak hour is F_dl × the rest of the sensible load (1 story 0.27, 2 stories 0.25)", () => {
    for (const [stories, f] of [
      [1, 0.27],
      [2, 0.25],
    ] as const) {
      const c = attic({ insulationR: 8, supplyLeakagePct: 5, returnLeakagePct: 5 }, { stories }).cooling;
      const rooms = c.sensibleBtuh - c.sensibleByComponent.ducts;
      expect(c.sensibleByComponent.ducts).toBeCloseTo(f * rooms, 6);
    }
  });

  it("heating: furnace 0.13, heat pump 0.16 of the rest of the heating load (1 story, R-8, 5 %/5 %)", () => {
    const furnace = attic({ insulationR: 8, heatingSystem: "furnace" }).heating;
    const heatPump = attic({ insulationR: 8, heatingSystem: "heat-pump" }).heating;
    expect(furnace.byComponent.ducts).toBeCloseTo(0.13 * (furnace.totalBtuh - furnace.byComponent.ducts), 6);
    expect(heatPump.byComponent.ducts).toBeCloseTo(
      0.16 * (heatPump.totalBtuh - heatPump.byComponent.ducts),
      6,
    );
  });

  it("ducts in a vented crawlspace: cooling 0.05, heating 0.13 (Table 6 crawlspace row, 1 story, R-8, 5 %/5 %)", () => {
    const plan = symmetricPlan({
      foundation: {
        kind: "vented-crawlspace",
        floor: { baseId: "floor-joists-2x10-16in-oc", cavityR: 19 },
        floorAreaFt2: 1600,
      },
      ducts: { location: "vented-crawlspace", insulationR: 8 },
    });
    const r = computeFacingLoads(plan, SEA_LEVEL_SITE, 0, { procedure: "hourly" });
    expect(r.cooling.sensibleByComponent.ducts).toBeCloseTo(
      0.05 * (r.cooling.sensibleBtuh - r.cooling.sensibleByComponent.ducts),
      6,
    );
    expect(r.heating.byComponent.ducts).toBeCloseTo(
      0.13 * (r.heating.totalBtuh - r.heating.byComponent.ducts),
      6,
    );
  });

  it("the result says which duct method was used", () => {
    expect(attic({}).notes.join(" ")).toMatch(/Table 6 duct loss\/gain factors/);
    expect(attic({ method: "conduction-leakage" }).notes.join(" ")).toMatch(/conduction-and-leakage model/);
    const birch = computeFacingLoads(BIRCH_2, CEDAR_BEND_SITE, 0, { procedure: "hourly" });
    expect(birch.notes.join(" ")).toMatch(
      /encapsulated-attic: the handbook duct-factor table has no such location/,
    );
  });

  it("the conduction-leakage model stays selectable and still adds to both loads", () => {
    const r = attic({ method: "conduction-leakage" });
    expect(r.cooling.sensibleByComponent.ducts).toBeGreaterThan(0);
    expect(r.heating.byComponent.ducts).toBeGreaterThan(0);
  });

  it("unknown duct method or heating system: a clear error naming the field", () => {
    const bad = (ducts: Record<string, unknown>) =>
      safeParsePlanInput(symmetricPlan({ ducts: { location: "vented-attic", ...ducts } }));
    const m = bad({ method: "rule-of-thumb" });
    expect(m.ok).toBe(false);
    if (!m.ok) expect(m.issues[0]).toMatchObject({ field: "ducts.method" });
    const h = bad({ heatingSystem: "boiler" });
    expect(h.ok).toBe(false);
    if (!h.ok) expect(h.issues[0]).toMatchObject({ field: "ducts.heatingSystem" });
  });
});

describe("against what the trade expects (common practice)", () => {
  // Common practice: ducts in a vented attic add roughly 10–30 % to the sensible cooling load of a
  // current-code house, less in an encapsulated attic, about nothing in conditioned space.
  it("vented attic, R-8, 5 %/5 %: the one-story example adds 10–30 % to sensible cooling at every facing", () => {
    for (const f of computePlanFacings(ASPEN_1, CEDAR_BEND_SITE, { procedure: "hourly" }).facings) {
      const ducts = f.cooling.sensibleByComponent.ducts;
      const share = ducts / (f.cooling.sensibleBtuh - ducts);
      expect(share).toBeGreaterThanOrEqual(0.1);
      expect(share).toBeLessThanOrEqual(0.3);
    }
  });

  it("encapsulated attic adds less than a vented attic; conditioned space adds nothing", () => {
    for (const f of computePlanFacings(BIRCH_2, CEDAR_BEND_SITE, { procedure: "hourly" }).facings) {
      const ducts = f.cooling.sensibleByComponent.ducts;
      expect(ducts / (f.cooling.sensibleBtuh - ducts)).toBeLessThan(0.1);
    }
    const inside = computeFacingLoads(
      { ...ASPEN_1, ducts: { location: "conditioned-space" } },
      CEDAR_BEND_SITE,
      0,
      { procedure: "hourly" },
    );
    expect(inside.cooling.sensibleByComponent.ducts).toBe(0);
    expect(inside.heating.byComponent.ducts).toBe(0);
  });
});

/** Equipment selection against invented catalog data (no real products). */
import { describe, expect, it } from "vitest";
import { DEFAULT_SIZING_LIMITS, loadsFromFacing, selectEquipment } from "../../../lib/equipment";
import { computeFacingLoads, LoadInputError } from "../../../lib/load";
import { ASPEN_1, CEDAR_BEND_SITE } from "../../fixtures/engine/example-plans";

// Invented systems "LK-…" of the fictional builder's catalog.
const CATALOG = [
  {
    id: "ac20",
    modelNumber: "LK-AC24/F60",
    type: "ac-furnace",
    nominalTons: 2,
    coolingTotalBtuh: 24_000,
    coolingSensibleBtuh: 18_000,
    heatingOutputBtuh: 44_000,
  },
  {
    id: "ac25",
    modelNumber: "LK-AC30/F60",
    type: "ac-furnace",
    nominalTons: 2.5,
    coolingTotalBtuh: 29_500,
    coolingSensibleBtuh: 22_500,
    heatingOutputBtuh: 44_000,
  },
  {
    id: "ac30",
    modelNumber: "LK-AC36/F80",
    type: "ac-furnace",
    nominalTons: 3,
    coolingTotalBtuh: 35_500,
    coolingSensibleBtuh: 26_500,
    heatingOutputBtuh: 62_000,
  },
  {
    id: "dry25",
    modelNumber: "LK-AC30X/F60",
    type: "ac-furnace",
    nominalTons: 2.5,
    coolingTotalBtuh: 29_000,
    coolingSensibleBtuh: 26_000,
    heatingOutputBtuh: 44_000,
  },
  {
    id: "hp25",
    modelNumber: "LK-HP30",
    type: "heat-pump",
    nominalTons: 2.5,
    coolingTotalBtuh: 30_000,
    coolingSensibleBtuh: 22_800,
    heatingOutputBtuh: 26_000,
  },
  {
    id: "hp25b",
    modelNumber: "LK-HP30/B10",
    type: "heat-pump-backup",
    nominalTons: 2.5,
    coolingTotalBtuh: 30_000,
    coolingSensibleBtuh: 22_800,
    heatingOutputBtuh: 26_000,
    backupHeatBtuh: 34_000,
  },
  { id: "f60", modelNumber: "LK-F60", type: "furnace", heatingOutputBtuh: 44_000 },
];

const LOADS = {
  heatingBtuh: 40_000,
  coolingSensibleBtuh: 21_000,
  coolingLatentBtuh: 5_000,
  coolingTotalBtuh: 26_000,
};

describe("equipment selection", () => {
  it("default limits are the documented defaults (from memory and common practice)", () => {
    expect(DEFAULT_SIZING_LIMITS).toEqual({
      coolingMinPct: 95,
      coolingMaxPct: 115,
      heatPumpCoolingMaxPct: 125,
      heatingMinPct: 100,
      heatingMaxPct: 140,
    });
  });

  it("picks the smallest fitting system, and lists the others that fit", () => {
    const s = selectEquipment({ loads: LOADS, catalog: CATALOG });
    expect(s.bestFit?.system.id).toBe("ac25");
    expect(s.fitting.map((e) => e.system.id)).toEqual(["ac25", "hp25b"]);
    expect(s.limitsUsed).toEqual(DEFAULT_SIZING_LIMITS);
  });

  it("refuses oversized and undersized systems, with the reason and the limit", () => {
    const s = selectEquipment({ loads: LOADS, catalog: CATALOG });
    const why = (id: string) => s.notFitting.find((e) => e.system.id === id)?.reasons.map((r) => r.reason);
    expect(why("ac30")).toContain("cooling-too-big"); // 35,500 > 115 % × 26,000 = 29,900
    expect(s.notFitting.find((e) => e.system.id === "ac30")?.reasons[0].message).toMatch(/above 115 %/);
    expect(why("ac20")).toContain("cooling-too-small"); // 24,000 < 95 % × 26,000 = 24,700
    expect(why("ac20")).toContain("sensible-short");
  });

  it("explains a latent shortfall", () => {
    const s = selectEquipment({ loads: LOADS, catalog: CATALOG });
    const dry = s.notFitting.find((e) => e.system.id === "dry25");
    expect(dry?.reasons.map((r) => r.reason)).toEqual(["latent-short"]); // 29,000 − 26,000 = 3,000 < 5,000
    expect(dry?.reasons[0].message).toMatch(/latent capacity 3,000 Btu\/h is short of the 5,000 Btu\/h/);
  });

  it("heat pump without backup is short on heat; with backup it fits; a furnace alone cannot cool", () => {
    const s = selectEquipment({ loads: LOADS, catalog: CATALOG });
    expect(s.notFitting.find((e) => e.system.id === "hp25")?.reasons.map((r) => r.reason)).toEqual([
      "heating-short",
    ]);
    expect(s.fitting.some((e) => e.system.id === "hp25b")).toBe(true);
    expect(s.notFitting.find((e) => e.system.id === "f60")?.reasons.map((r) => r.reason)).toEqual([
      "no-cooling",
    ]);
  });

  it("an oversized furnace is refused (above 140 % of the heating load)", () => {
    const s = selectEquipment({ loads: { ...LOADS, heatingBtuh: 30_000 }, catalog: CATALOG });
    expect(s.notFitting.find((e) => e.system.id === "ac30")?.reasons.map((r) => r.reason)).toContain(
      "heating-over",
    );
  });

  it("heat pumps may go to 125 % where the heating load exceeds the cooling load", () => {
    const hp = {
      id: "hp27",
      modelNumber: "LK-HP32",
      type: "heat-pump-backup",
      coolingTotalBtuh: 32_000,
      coolingSensibleBtuh: 24_000,
      heatingOutputBtuh: 28_000,
      backupHeatBtuh: 20_000,
    };
    const ac = {
      id: "ac27",
      modelNumber: "LK-AC32/F60",
      type: "ac-furnace",
      coolingTotalBtuh: 32_000,
      coolingSensibleBtuh: 24_000,
      heatingOutputBtuh: 44_000,
    };
    const s = selectEquipment({ loads: LOADS, catalog: [hp, ac] }); // 32,000 = 123 % of 26,000
    expect(s.bestFit?.system.id).toBe("hp27");
    expect(s.notFitting[0].reasons.map((r) => r.reason)).toEqual(["cooling-too-big"]);
  });

  it("uses the account's limits when given", () => {
    const s = selectEquipment({
      loads: LOADS,
      catalog: CATALOG,
      limits: { coolingMaxPct: 140, heatingMaxPct: 160 },
    });
    expect(s.fitting.map((e) => e.system.id)).toContain("ac30");
    expect(s.bestFit?.system.id).toBe("ac25"); // still the smallest that fits
    expect(s.limitsUsed.coolingMaxPct).toBe(140);
    expect(s.limitsUsed.coolingMinPct).toBe(95);
  });

  it("no system fits: best fit is null and every system says why", () => {
    const s = selectEquipment({
      loads: { ...LOADS, coolingTotalBtuh: 60_000, coolingSensibleBtuh: 50_000 },
      catalog: CATALOG,
    });
    expect(s.bestFit).toBeNull();
    expect(s.notFitting).toHaveLength(CATALOG.length);
    for (const e of s.notFitting) expect(e.reasons.length).toBeGreaterThan(0);
  });

  it("a bad catalog row is refused naming the row and field", () => {
    expect(() =>
      selectEquipment({ loads: LOADS, catalog: [{ ...CATALOG[0], coolingSensibleBtuh: 30_000 }] }),
    ).toThrow(LoadInputError);
    let caught: unknown;
    try {
      selectEquipment({ loads: LOADS, catalog: [CATALOG[0], { ...CATALOG[1], type: "swamp-cooler" }] });
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(LoadInputError);
    expect((caught as LoadInputError).field).toBe("catalog.1.type");
  });

  it("works on the load engine's result for an example house", () => {
    const loads = loadsFromFacing(computeFacingLoads(ASPEN_1, CEDAR_BEND_SITE, 270));
    const s = selectEquipment({ loads, catalog: CATALOG });
    expect(s.fitting.length + s.notFitting.length).toBe(CATALOG.length);
  });
});

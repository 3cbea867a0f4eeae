/**
 * A hand calculation of a simple box house's heating load, written out with its arithmetic:
 * Σ area × U × ΔT for each surface, the slab's F × P × ΔT, plus infiltration 1.10 × cfm × ΔT.
 * The U-factors are worked by the parallel-path method from the handbook resistances
 * (HoF 2021 ch. 26 Tables 1 and 10); the infiltration by HoF 2021 ch. 16 eq. 41–43 and 48; the
 * duct loss by HoF 2021 ch. 17 eq. 19 with the Table 6 factor.
 */
import { describe, expect, it } from "vitest";
import { computeFacingLoads } from "../../../lib/load";

// The box: 50 ft × 40 ft, one story, 9 ft walls, sea level, 70 °F inside, 20 °F outside.
const site = {
  latitudeDeg: 40,
  longitudeDeg: -90,
  elevationFt: 0,
  heatingOutdoorDbF: 20,
  coolingOutdoorDbF: 90,
  coolingOutdoorWbF: 72,
  dailyRangeF: 20,
  tauBeam: 0.5,
  tauDiffuse: 2.0,
};
const window40 = { areaFt2: 40, uFactor: 0.3, shgc: 0.3 };
const box = {
  conditionedFloorAreaFt2: 2000,
  stories: 1,
  bedrooms: 3,
  ceilingHeightFt: 9,
  wall: { baseId: "wood-2x4-16in-oc", cavityR: 13, continuousR: 0 },
  facades: {
    front: { grossWallAreaFt2: 450, window: window40, doorAreaFt2: 20, doorUFactor: 0.3 },
    left: { grossWallAreaFt2: 360, window: window40 },
    back: { grossWallAreaFt2: 450, window: window40 },
    right: { grossWallAreaFt2: 360, window: window40 },
  },
  attic: { kind: "vented", ceiling: { baseId: "attic-joists-24in-oc", cavityR: 38 } },
  foundation: { kind: "slab-on-grade", slabPerimeterFt: 180, slabEdgeInsulationR: 0 },
  infiltration: { ach50: 5, shelterClass: 4, flowExponent: 0.65 },
  ventilation: { kind: "none" },
  ducts: { location: "conditioned-space" },
};

describe("hand calculation: box house heating load", () => {
  const dT = 70 - 20; // °F

  // Wall, 2x4 at 16 in o.c., R-13 (films 0.17 + 0.68, vinyl siding 0.62, gypsum 0.45, stud 3.5 in × 1.25/in):
  const cavityPathR = 0.17 + 0.62 + 13 + 0.45 + 0.68; //  = 14.92
  const studPathR = 0.17 + 0.62 + 3.5 * 1.25 + 0.45 + 0.68; // = 6.295
  const wallU = 0.75 / cavityPathR + 0.25 / studPathR; //     = 0.050268 + 0.039714 = 0.089982
  const netWallFt2 = 450 + 360 + 450 + 360 - 4 * 40 - 20; //  = 1440 ft²
  const walls = netWallFt2 * wallU * dT; //                   = 1440 × 0.089982 × 50 = 6478.7

  const windows = 4 * 40 * 0.3 * dT; //                        = 160 × 0.30 × 50 = 2400
  const doors = 20 * 0.3 * dT; //                              = 20 × 0.30 × 50 = 300

  // Ceiling R-38 (films up 0.61 + 0.61, gypsum 0.45): 85 % full depth, 5 % half depth, 10 % over the
  // 3.5 in chord with the loose fill above it (38/3.1 = 12.26 in deep; 8.76 in × 3.1 = 27.15 over the chord).
  const fullR = 0.61 + 0.61 + 0.45 + 38; //                    = 39.67
  const halfR = 0.61 + 0.61 + 0.45 + 19; //                    = 20.67
  const chordR = 0.61 + 0.61 + 0.45 + 3.5 * 1.25 + (38 / 3.1 - 3.5) * 3.1; // = 33.195
  const ceilingU = 0.85 / fullR + 0.05 / halfR + 0.1 / chordR; // = 0.021427 + 0.002419 + 0.003012 = 0.026858
  const ceilings = 2000 * ceilingU * dT; //                    = 2000 × 0.026858 × 50 = 2685.8

  // Slab edge, uninsulated, 8 in block with brick facing (the default): HoF 2021 ch. 18 Table 24
  // F_p 1.17 W/(m·K) ÷ 1.730735 = 0.6760 Btu/h·ft·°F.
  const slab = (1.17 / 1.730735) * 180 * dT; //                 = 0.6760 × 180 ft × 50 = 6084

  // Infiltration: CFM50 = 5 × 18,000 ft³ / 60 = 1500 cfm; Q4 = 1500 × (4/50)^0.65 = 290.3 cfm = 0.13700 m³/s;
  // A_L = Q4 × √(1.2 / (2 × 4)) = 0.13700 × 0.38730 = 0.053061 m² = 530.6 cm².
  const cfm50 = (5 * 2000 * 9) / 60;
  const q4M3s = (cfm50 * Math.pow(4 / 50, 0.65) * 0.471947) / 1000;
  const elaCm2 = q4M3s * Math.sqrt(1.2 / 8) * 1e4;
  // LBL, one story, shelter class 4: Cs 0.000145, Cw 0.000104; ΔT = 50/1.8 = 27.78 K; U = 15 mph = 6.7056 m/s:
  // Q = 530.6 × √(0.000145 × 27.78 + 0.000104 × 6.7056²) = 530.6 × √(0.004028 + 0.004676) = 49.51 L/s = 104.9 cfm.
  const infLps = elaCm2 * Math.sqrt(0.000145 * (dT / 1.8) + 0.000104 * (15 * 0.44704) ** 2);
  const infCfm = infLps / 0.471947;
  const infiltration = 1.1 * infCfm * dT; //                   = 1.10 × 104.9 × 50 ≈ 5770

  const total = walls + windows + doors + ceilings + slab + infiltration; // ≈ 23,718 Btu/h

  it("the arithmetic above gives the numbers written beside it", () => {
    expect(wallU).toBeCloseTo(0.089982, 5);
    expect(ceilingU).toBeCloseTo(0.026858, 5);
    expect(elaCm2).toBeCloseTo(530.6, 0);
    expect(infCfm).toBeCloseTo(104.9, 0);
    expect(total).toBeGreaterThan(23_500);
    expect(total).toBeLessThan(23_900);
  });

  it("the engine agrees with the hand calculation, component by component (±0.5 %)", () => {
    const result = computeFacingLoads(box, site, 0, { procedure: "hourly" }).heating;
    const c = result.byComponent;
    const near = (actual: number, expected: number) =>
      expect(Math.abs(actual - expected)).toBeLessThanOrEqual(0.005 * expected);
    near(c.walls, walls);
    near(c.windows, windows);
    near(c.doors, doors);
    near(c.ceilings, ceilings);
    near(c.slab, slab);
    near(c.infiltration, infiltration);
    expect(c.ventilation).toBe(0);
    expect(c.ducts).toBe(0);
    near(result.totalBtuh, total);
  });

  it("with the ducts in the vented attic the duct loss is 0.13 of that total (HoF 2021 ch. 17 eq. 19 and Table 6)", () => {
    // Table 6, attic, 1 story, 5 %/5 % leakage, R-8 (R-1.4 m²·K/W), heating with a furnace: F_dl = 0.13.
    const ducts = 0.13 * total; //                               ≈ 0.13 × 23,718 ≈ 3083 Btu/h
    const attic = {
      ...box,
      ducts: { location: "vented-attic", insulationR: 8, supplyLeakagePct: 5, returnLeakagePct: 5 },
    };
    const result = computeFacingLoads(attic, site, 0, { procedure: "hourly" }).heating;
    expect(Math.abs(result.byComponent.ducts - ducts)).toBeLessThanOrEqual(0.005 * ducts);
    expect(Math.abs(result.totalBtuh - (total + ducts))).toBeLessThanOrEqual(0.005 * (total + ducts));
  });
});

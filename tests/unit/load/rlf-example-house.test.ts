/**
 * The load calculation example of HoF 2021 SI ch. 17 (section 9, Atlanta house), read in a stored copy
 * of the chapter, through residentialLoadFactorLoads, component by component against the printed
 * Tables 20–23 and the text. The house data and printed values, with their table citations and what
 * was unclear in the stored copy, are in tests/fixtures/engine/handbook-example-house.ts.
 *
 * Tolerances: the chapter prints rounded values (loads to 1 W, factors to 3–4 digits, areas to 0.1 m²,
 * F_shd to 0.01 before PXI is formed); each row states its own tolerance. A row passes when within
 * either its relative or its absolute tolerance.
 */
import { describe, expect, it } from "vitest";
import { parsePlanInput, parseSiteConditions } from "../../../lib/load";
import { checkRlfApplicability } from "../../../lib/load/residential-load-factor/applicability";
import { computeResidentialLoadFactorFacing } from "../../../lib/load/residential-load-factor/from-plan";
import {
  residentialLoadFactorLoads,
  type RlfComponentRow,
} from "../../../lib/load/residential-load-factor/procedure";
import { BTUH_FT2_PER_W_M2, BTUH_PER_W, LPS_PER_CFM } from "../../../lib/load/units";
import { M_PER_FT } from "../../../lib/load/residential-load-factor/tables";
import {
  EXAMPLE_HOUSE,
  EXAMPLE_HOUSE_SI,
  EXAMPLE_PLAN,
  EXAMPLE_SITE,
  PRINTED_ENVELOPE_ROWS,
  PRINTED_TOTALS,
  PRINTED_WINDOW_FACTORS,
} from "../../fixtures/engine/handbook-example-house";

const W = (btuh: number) => btuh / BTUH_PER_W;
/** Btu/h·ft² → W/m². */
const perM2 = (btuhFt2: number) => btuhFt2 / BTUH_FT2_PER_W_M2;
/** Btu/h per ft → W per m. */
const perM = (btuhFt: number) => btuhFt / BTUH_PER_W / M_PER_FT;
const lps = (cfm: number) => cfm * LPS_PER_CFM;

function near(actual: number, expected: number, tol: { relative?: number; absolute?: number }): boolean {
  const d = Math.abs(actual - expected);
  return (
    (tol.relative !== undefined && d <= tol.relative * Math.abs(expected)) ||
    (tol.absolute !== undefined && d <= tol.absolute + 1e-9)
  );
}

function expectNear(
  actual: number,
  expected: number,
  tol: { relative?: number; absolute?: number },
  what: string,
) {
  expect(
    near(actual, expected, tol),
    `${what}: ours ${actual.toFixed(3)}, printed ${expected} (tolerance ${JSON.stringify(tol)})`,
  ).toBe(true);
}

const result = residentialLoadFactorLoads(EXAMPLE_HOUSE);
const rowOf = (label: string): RlfComponentRow => {
  const row = result.rows.find((r) => r.label === label);
  if (!row) throw new Error(`no row ${label}`);
  return row;
};
// The fixture labels the slab "Floor", so its rows are "Floor perimeter" and "Floor area", as Table 22 names them.

describe("HoF 2021 ch. 17 example house: envelope loads, Table 22 (W)", () => {
  // Loads: ±2 % or ±1 W (printed to the watt; window areas printed to 0.1 m²).
  const LOAD_TOL = { relative: 0.02, absolute: 1 };
  it.each(PRINTED_ENVELOPE_ROWS.map((r) => [r.id, r] as const))("%s", (id, printed) => {
    const row = rowOf(id);
    expectNear(W(row.heatingBtuh), printed.heatingW, LOAD_TOL, `${id} heating`);
    expectNear(W(row.coolingBtuh), printed.coolingW, LOAD_TOL, `${id} cooling`);
  });

  it("envelope totals 4674 W heating, 1900 W cooling (Table 22; ±0.5 %: sums of rounded rows)", () => {
    expectNear(
      W(result.heating.envelopeBtuh),
      PRINTED_TOTALS.envelopeHeatingW,
      { relative: 0.005 },
      "envelope heating",
    );
    expectNear(
      W(result.cooling.envelopeBtuh),
      PRINTED_TOTALS.envelopeCoolingW,
      { relative: 0.005 },
      "envelope cooling",
    );
  });

  it("the printed rows add up to the printed envelope totals (a check of the transcription, ±2 W)", () => {
    const h = PRINTED_ENVELOPE_ROWS.reduce((s, r) => s + r.heatingW, 0);
    const c = PRINTED_ENVELOPE_ROWS.reduce((s, r) => s + r.coolingW, 0);
    expect(Math.abs(h - PRINTED_TOTALS.envelopeHeatingW)).toBeLessThanOrEqual(2); // 4675 vs 4674 (rounding)
    expect(Math.abs(c - PRINTED_TOTALS.envelopeCoolingW)).toBeLessThanOrEqual(2);
  });
});

describe("HoF 2021 ch. 17 example house: factors, Tables 20 and 21", () => {
  it.each(PRINTED_ENVELOPE_ROWS.map((r) => [r.id, r] as const))(
    "%s HF and CF (Table 20/22, ±0.5 %)",
    (id, printed) => {
      const row = rowOf(id);
      const toSi = row.quantityUnit === "ft" ? perM : perM2;
      // Floor perimeter HF: Table 20 prints 19.55 W/(m·K)·K, Table 22 rounds it to 19.6 (±0.5 % covers both).
      if (printed.hf !== null)
        expectNear(toSi(row.heatingFactorBtuhPerUnit), printed.hf, { relative: 0.005 }, `${id} HF`);
      if (printed.cf !== null)
        expectNear(
          toSi(row.coolingFactorBtuhPerUnit),
          printed.cf,
          { relative: 0.005, absolute: 0.02 },
          `${id} CF`,
        );
    },
  );

  it.each(Object.entries(PRINTED_WINDOW_FACTORS))(
    "%s: T_x, F_shd, PXI, IAC, FF_s, CF (Table 21)",
    (id, printed) => {
      const f = rowOf(id).fenestration!;
      expect(f.exteriorTransmission).toBe(printed.tx); // Table 11, exact
      expectNear(f.shadedFraction, printed.fshd, { absolute: 0.005 }, `${id} F_shd (printed to 0.01)`);
      // PXI: printed from F_shd rounded to 0.01 (e.g. 0.28 for 0.275): ±1 %.
      expectNear(f.pxiWm2, printed.pxi, { relative: 0.01 }, `${id} PXI`);
      expectNear(f.interiorAttenuation, printed.iac, { absolute: 0.005 }, `${id} IAC`); // eq. 29: 0.84 exact
      expect(f.solarLoadFactor).toBe(printed.ffs); // Table 13, exact
      expectNear(perM2(rowOf(id).coolingFactorBtuhPerUnit), printed.cf, { relative: 0.01 }, `${id} CF`);
    },
  );

  it("the west 0.9 m operable window worked in the text: SLF 1.1, E_D 570, E_d 164, PXI 203, CF 40.3", () => {
    const f = rowOf("W-Operable-0.9").fenestration!;
    expect(f.shadeLineFactor).toBe(1.1); // Table 12, west, latitude 34° → 35° column
    expect(f.peakDirectWm2).toBe(570); // Table 10 at 35°N (see tables.ts on the stored copy's columns)
    expect(f.peakDiffuseWm2).toBe(164);
    expectNear(f.pxiWm2, 203, { absolute: 1 }, "PXI");
    expectNear(perM2(rowOf("W-Operable-0.9").coolingFactorBtuhPerUnit), 40.3, { relative: 0.01 }, "CF");
  });
});

describe("HoF 2021 ch. 17 example house: infiltration, ventilation, internal gain (text after Table 22)", () => {
  it("A_L = 356.5 × 1.4 = 499 cm² (eq. 9; ±0.5 %)", () => {
    expectNear(
      result.air.effectiveLeakageAreaIn2 * 6.4516,
      PRINTED_TOTALS.leakageAreaCm2,
      { relative: 0.005 },
      "A_L",
    );
  });

  it("Q_i 36 L/s heating and 17 L/s cooling (eq. 8; printed to the L/s: ±0.5 L/s), 0.28 and 0.13 ach", () => {
    expectNear(
      lps(result.air.infiltrationHeatingCfm),
      PRINTED_TOTALS.infiltrationHeatingLps,
      { absolute: 0.5 },
      "Q_i,h",
    );
    expectNear(
      lps(result.air.infiltrationCoolingCfm),
      PRINTED_TOTALS.infiltrationCoolingLps,
      { absolute: 0.5 },
      "Q_i,c",
    );
    // Eq. 7, ACH = 3.6·Q_i/V, V = 195.3 × 2.4 = 468.7 m³ (see the fixture on Table 19's volume).
    const volumeM3 = EXAMPLE_HOUSE_SI.floorAreaM2 * EXAMPLE_HOUSE_SI.wallHeightM;
    expectNear(
      (3.6 * lps(result.air.infiltrationHeatingCfm)) / volumeM3,
      PRINTED_TOTALS.infiltrationHeatingAch,
      { absolute: 0.005 },
      "ach heating",
    );
    expectNear(
      (3.6 * lps(result.air.infiltrationCoolingCfm)) / volumeM3,
      PRINTED_TOTALS.infiltrationCoolingAch,
      { absolute: 0.005 },
      "ach cooling",
    );
  });

  it("ventilation Q_v = 43 L/s (eq. 11 with A_cf 195.3 m², N_br 3; ±0.5 L/s)", () => {
    expectNear(
      lps(result.air.requiredVentilationCfm),
      PRINTED_TOTALS.ventilationLps,
      { absolute: 0.5 },
      "Q_v",
    );
  });

  it("combined flows 79 L/s heating, 60 L/s cooling (eq. 14 plus the balanced 43 L/s; ±0.5 L/s)", () => {
    expectNear(
      lps(result.air.combinedHeatingCfm + result.air.balancedCfm),
      PRINTED_TOTALS.combinedHeatingLps,
      { absolute: 0.5 },
      "Q_vi,h",
    );
    expectNear(
      lps(result.air.combinedCoolingCfm + result.air.balancedCfm),
      PRINTED_TOTALS.combinedCoolingLps,
      { absolute: 0.5 },
      "Q_vi,c",
    );
  });

  it("sensible infiltration/ventilation 2235 W heating, 672 W cooling (eq. 15; ±1 %: the text rounds Q_i to 36 and 17 L/s)", () => {
    expectNear(
      W(result.heating.infiltrationBtuh + result.heating.ventilationBtuh),
      PRINTED_TOTALS.infiltrationVentilationHeatingW,
      { relative: 0.01 },
      "q_vi,s,h",
    );
    expectNear(
      W(result.cooling.infiltrationBtuh + result.cooling.ventilationBtuh),
      PRINTED_TOTALS.infiltrationVentilationCoolingW,
      { relative: 0.01 },
      "q_vi,s,c",
    );
  });

  it("internal sensible gain 654 W (eq. 30; ±0.5 %)", () => {
    expectNear(
      W(result.cooling.internalBtuh),
      PRINTED_TOTALS.internalSensibleW,
      { relative: 0.005 },
      "q_ig,s",
    );
  });
});

describe("HoF 2021 ch. 17 example house: totals, Table 23", () => {
  it("duct factors 0.13 heating, 0.27 cooling (Table 6, as the text estimates)", () => {
    expect(result.heating.ductFactor).toBeCloseTo(EXAMPLE_HOUSE_SI.ductFactors.heating, 10);
    expect(result.cooling.ductFactor).toBeCloseTo(EXAMPLE_HOUSE_SI.ductFactors.cooling, 10);
  });

  // Subtotals and totals ±0.5 % (they carry the rounding of every row); distribution ±1 %.
  const cases: Array<[string, () => number, number, number]> = [
    ["heating subtotal 6909 W", () => result.heating.subtotalBtuh, PRINTED_TOTALS.subtotalHeatingW, 0.005],
    [
      "heating distribution loss 898 W",
      () => result.heating.ductBtuh,
      PRINTED_TOTALS.distributionHeatingW,
      0.01,
    ],
    ["total heating load 7807 W", () => result.heating.totalBtuh, PRINTED_TOTALS.totalHeatingW, 0.005],
    ["cooling subtotal 3225 W", () => result.cooling.subtotalBtuh, PRINTED_TOTALS.subtotalCoolingW, 0.005],
    [
      "cooling distribution gain 871 W",
      () => result.cooling.ductBtuh,
      PRINTED_TOTALS.distributionCoolingW,
      0.01,
    ],
    [
      "total sensible cooling load 4096 W",
      () => result.cooling.sensibleBtuh,
      PRINTED_TOTALS.totalSensibleCoolingW,
      0.005,
    ],
  ];
  it.each(cases)("%s", (what, actual, printed, relative) => {
    expectNear(W(actual()), printed, { relative }, what);
  });
});

describe("HoF 2021 ch. 17 example house: latent load (text after Table 23)", () => {
  it("infiltration/ventilation latent 903 W (eq. 16: 3010 × 60 × 0.0050; ±1 %) and internal latent 111 W (eq. 31; ±1 %)", () => {
    expectNear(
      W(result.cooling.latent.infiltrationBtuh + result.cooling.latent.ventilationBtuh),
      PRINTED_TOTALS.latentInfiltrationVentilationW,
      { relative: 0.01 },
      "q_vi,l",
    );
    expectNear(
      W(result.cooling.latent.internalBtuh),
      PRINTED_TOTALS.latentInternalW,
      { relative: 0.01 },
      "q_ig,l",
    );
  });

  /*
   * The text prints "the total latent cooling load is 752 W", but its own parts are 903 W and 111 W and
   * eq. 32 defines the total as their sum, q_l = q_vi,l + q_ig,l = 1014 W. The sum governs: both parts are
   * reproduced from the example's data by the chapter's equations, while 752 W cannot be reproduced from
   * those data (it would need q_vi,l = 641 W, i.e. about 43 L/s at ΔW 0.0050 instead of the 60 L/s the
   * example derives); it may be a figure left from an earlier version of the example (our guess, not read).
   */
  it("total latent: the sum of the printed parts, 903 + 111 = 1014 W, governs (±1 %); the printed 752 W is not reproduced", () => {
    const sumOfPrintedParts = PRINTED_TOTALS.latentInfiltrationVentilationW + PRINTED_TOTALS.latentInternalW;
    expect(sumOfPrintedParts).toBe(1014);
    expect(sumOfPrintedParts).not.toBe(PRINTED_TOTALS.latentTotalPrintedW); // the inconsistency in the printed text
    const ours = W(result.cooling.latent.totalBtuh);
    expectNear(ours, sumOfPrintedParts, { relative: 0.01 }, "q_l against the sum of its printed parts");
    expect(
      Math.abs(ours - PRINTED_TOTALS.latentTotalPrintedW) / PRINTED_TOTALS.latentTotalPrintedW,
    ).toBeGreaterThan(0.25);
  });

  it("the total cooling load is the sensible total plus the latent total (eq. 32 with Table 23)", () => {
    expect(result.cooling.totalBtuh).toBeCloseTo(
      result.cooling.sensibleBtuh + result.cooling.latent.totalBtuh,
      9,
    );
  });
});

describe("HoF 2021 ch. 17 example house: applicability (Table 1)", () => {
  it("lies inside every Table 1 range: only the method's own assumptions and the sea-level factor caution are listed", () => {
    const findings = checkRlfApplicability(EXAMPLE_HOUSE);
    expect(findings.filter((f) => f.severity === "outside")).toEqual([]);
    // 315 m with sea-level air factors (as the example does) draws the one caution.
    expect(findings.filter((f) => f.severity === "caution").map((f) => f.limit)).toEqual(["elevation"]);
    // West facade fenestration 7.3 m² of 195.3 m² = 3.7 % (< 15 %); total 13.9 m² = 7.1 % (< 30 %).
  });
});

describe("the example as the engine's plan input (EXAMPLE_PLAN / EXAMPLE_SITE), through computeResidentialLoadFactorFacing", () => {
  const plan = parsePlanInput(EXAMPLE_PLAN);
  const site = parseSiteConditions(EXAMPLE_SITE);
  // The plan's front faces west (our reconstruction of Figure 1). The example's own table use is given as
  // options of the mapping; its carpet is the plan's "carpet" (lib/load/slab.ts: 0.21 m²·K/W, Table 17).
  const loads = computeResidentialLoadFactorFacing(plan, site, 270, {
    rlf: { tableLookup: "nearest", airFactorElevationCorrection: false },
  });

  /*
   * What still differs from the printed example (expected values are the printed ones):
   * - the site carries Table 18's printed Δt, 23.5 K heating and 9 K cooling, where the printed arithmetic used
   *   23 K and 9.1 K: each heating U·A·Δt row is the printed row × 23.5/23 (±0.6 %: rows printed to the watt,
   *   door area 3.78 m² against the printed 3.8); cooling rows move by the 0.1 K (±2.5 %);
   * - IDF by eq. 10 (0.0707 heating, 0.0332 cooling at H = 2.4 m) instead of the example's 0.073 / 0.035 read
   *   from Table 5; ΔW 0.00488 by psychrolib at 315 m from the wet bulb instead of 0.0050 from a chart.
   */
  const HEAT_RATIO = 23.5 / 23;
  const heatingRows: Array<[string, number, number]> = [
    ["walls", W(loads.heating.byComponent.walls), 1273],
    ["windows (the 11 window rows of Table 22)", W(loads.heating.byComponent.windows), 664],
    ["doors", W(loads.heating.byComponent.doors), 201],
    ["ceiling", W(loads.heating.byComponent.ceilings), 809],
    ["garage wall", W(loads.heating.byComponent.garageWall), 411],
    ["slab perimeter", W(loads.heating.byComponent.slab), 1317],
  ];
  it.each(heatingRows)("heating, %s: printed %s W × 23.5/23 (±0.6 %)", (what, ours, printed) => {
    expectNear(ours, printed * HEAT_RATIO, { relative: 0.006 }, what);
  });

  const coolingRows: Array<[string, number, number, number]> = [
    ["walls", W(loads.cooling.sensibleByComponent.walls), 772, 0.025],
    ["windows", W(loads.cooling.sensibleByComponent.windows), 955, 0.025],
    ["doors", W(loads.cooling.sensibleByComponent.doors), 122, 0.025],
    ["ceiling", W(loads.cooling.sensibleByComponent.ceilings), 405, 0.025],
    ["garage wall", W(loads.cooling.sensibleByComponent.garageWall), 103, 0.025],
    ["slab area (the example's carpet)", W(loads.cooling.sensibleByComponent.slab), -457, 0.005],
    ["internal sensible", W(loads.cooling.sensibleByComponent.internal), 654, 0.005],
  ];
  it.each(coolingRows)("cooling, %s: printed %s W (±%s)", (what, ours, printed, relative) => {
    expectNear(ours, printed, { relative }, what);
  });

  it("air: sensible 2235 W × 23.5/23 heating and 672 W × 9/9.1 cooling (±2 %: eq. 10 IDF); latent 903 W (±5 %: eq. 10, psychrolib ΔW)", () => {
    expectNear(
      W(loads.heating.byComponent.infiltration + loads.heating.byComponent.ventilation),
      2235 * HEAT_RATIO,
      { relative: 0.02 },
      "heating",
    );
    expectNear(
      W(loads.cooling.sensibleByComponent.infiltration + loads.cooling.sensibleByComponent.ventilation),
      (672 * 9) / 9.1,
      { relative: 0.02 },
      "cooling",
    );
    expectNear(
      W(loads.cooling.latentByComponent.infiltration + loads.cooling.latentByComponent.ventilation),
      903,
      { relative: 0.05 },
      "latent",
    );
  });

  it("totals: heating 7807 W × 23.5/23 (±1.5 %), sensible cooling 4096 W (±2 %), latent 1014 W (±5 %)", () => {
    expectNear(W(loads.heating.totalBtuh), 7807 * HEAT_RATIO, { relative: 0.015 }, "heating");
    expectNear(W(loads.cooling.sensibleBtuh), 4096, { relative: 0.02 }, "sensible cooling");
    expectNear(W(loads.cooling.latentBtuh), 1014, { relative: 0.05 }, "latent");
  });

  it("fills the engine's result shapes honestly: no hourly profile, no peak hour, the caution, the notes", () => {
    expect(loads.procedure).toBe("residential-load-factor");
    expect(loads.cooling.hourlySensibleBtuh).toEqual([]);
    expect(loads.cooling.hourlyOutdoorF).toEqual([]);
    expect(loads.cooling.peakHour).toBeNull();
    expect(loads.notes.join(" ")).toMatch(/no 24-hour profile, peak hour or cooling attic temperature/i);
    expect(loads.caution).toMatch(/licensed professional/);
    expect(loads.caution).not.toMatch(/complian/i);
    // Components add up to the totals.
    const heat = Object.values(loads.heating.byComponent).reduce((a, b) => a + b, 0);
    const coolS = Object.values(loads.cooling.sensibleByComponent).reduce((a, b) => a + b, 0);
    const coolL = Object.values(loads.cooling.latentByComponent).reduce((a, b) => a + b, 0);
    expect(heat).toBeCloseTo(loads.heating.totalBtuh, 6);
    expect(coolS).toBeCloseTo(loads.cooling.sensibleBtuh, 6);
    expect(coolL).toBeCloseTo(loads.cooling.latentBtuh, 6);
    // Windows by facade: the front (west) carries the 2.4 m picture window; the left (north) has none.
    expect(loads.cooling.windowsByFacadeBtuh.left).toBe(0);
    expect(loads.cooling.windowsByFacadeBtuh.front).toBeGreaterThan(loads.cooling.windowsByFacadeBtuh.back);
    expect(loads.facadeAzimuthsDeg).toEqual({ front: 270, left: 0, back: 90, right: 180 });
    expect(loads.cooling.sensibleByComponent.temperatureSwing).toBe(0); // the swing is inside the RLF factors
  });
});

/**
 * Every row of the engine's check table, with its source beside it (rows and tolerances in
 * tests/fixtures/engine/reference-checks.ts), plus the solar-altitude check against suncalc.
 */
import SunCalc from "suncalc";
import { describe, expect, it } from "vitest";
import { ceilingU, wallU } from "../../../lib/load/assemblies";
import { solAirTemperatureF } from "../../../lib/load/attic";
import { computeFacingLoads } from "../../../lib/load";
import { ductLossFactor } from "../../../lib/load/ducts";
import { ashrae622VentilationCfm, lblInfiltrationLps } from "../../../lib/load/infiltration";
import {
  defaultInternalGains,
  defaultInternalSensibleW,
  occupantsOf,
} from "../../../lib/load/internal-gains";
import {
  humidityRatioGrFromRelHum,
  humidityRatioGrFromWetBulb,
  SEA_LEVEL_PRESSURE_PSIA,
} from "../../../lib/load/psychrometrics";
import {
  apparentSolarTimeHours,
  clearSkyIrradiance,
  designDayOfYear,
  sunPosition,
  surfaceIrradiance,
} from "../../../lib/load/solar";
import { BTUH_PER_TON, BTUH_PER_W, M2_PER_FT2 } from "../../../lib/load/units";
import { REFERENCE_CHECKS } from "../../fixtures/engine/reference-checks";
import { symmetricPlan, withinTolerance } from "./helpers";

// Atlanta example of HoF 2021 ch. 14: 33.64° N, 84.43° W, Eastern time (meridian 75° W), July 21.
const ATLANTA = {
  latitudeDeg: 33.64,
  longitudeDeg: -84.43,
  standardMeridianDeg: -75,
  tauBeam: 0.515,
  tauDiffuse: 2.066,
};
const JULY_21 = designDayOfYear(7);

function atlantaNoon() {
  const sun = sunPosition(ATLANTA.latitudeDeg, JULY_21, 12);
  return clearSkyIrradiance(JULY_21, sun.altitudeDeg, ATLANTA.tauBeam, ATLANTA.tauDiffuse);
}

function atlanta3pmVertical60WofS() {
  // 3:00 pm daylight time = 2:00 pm standard time → apparent solar time (HoF ch. 14 eq. 7).
  const ast = apparentSolarTimeHours(14, ATLANTA.longitudeDeg, ATLANTA.standardMeridianDeg, JULY_21);
  const sun = sunPosition(ATLANTA.latitudeDeg, JULY_21, ast);
  const sky = clearSkyIrradiance(JULY_21, sun.altitudeDeg, ATLANTA.tauBeam, ATLANTA.tauDiffuse);
  // 60° west of south = azimuth 240° clockwise from north.
  return surfaceIrradiance(sky, sun, 240, 90, 0.2);
}

function exampleDuctFactor(mode: "cooling" | "heating-furnace"): number {
  return ductLossFactor({
    location: "attic",
    mode,
    stories: 1,
    insulationR: 8,
    supplyLeakagePct: 5,
    returnLeakagePct: 5,
  }).factor;
}

/** The engine's value for each reference row. */
const ACTUAL: Record<string, () => number> = {
  "humidity-ratio-95-75": () => humidityRatioGrFromWetBulb(95, 75, SEA_LEVEL_PRESSURE_PSIA),
  "humidity-ratio-75-50": () => humidityRatioGrFromRelHum(75, 50, SEA_LEVEL_PRESSURE_PSIA),
  "beam-normal-atlanta-noon": () => atlantaNoon().beamNormalWm2,
  "diffuse-atlanta-noon": () => atlantaNoon().diffuseHorizontalWm2,
  "vertical-beam-60w-3pm": () => atlanta3pmVertical60WofS().beamWm2,
  "vertical-diffuse-60w-3pm": () => atlanta3pmVertical60WofS().diffuseWm2,
  "vertical-reflected-60w-3pm": () => atlanta3pmVertical60WofS().reflectedWm2,
  "wall-u-r11": () => wallU({ baseId: "wood-2x4-16in-oc", cavityR: 11, continuousR: 0 }),
  "wall-u-r13": () => wallU({ baseId: "wood-2x4-16in-oc", cavityR: 13, continuousR: 0 }),
  "wall-u-r15": () => wallU({ baseId: "wood-2x4-16in-oc", cavityR: 15, continuousR: 0 }),
  // SI inputs of the example converted to IP (1 m²·K/W = 5.678263 h·ft²·°F/Btu), the result back to SI.
  "wall-u-hof27-example-3": () =>
    wallU({ baseId: "wood-2x4-16in-oc", cavityR: 2.3 * 5.678263, continuousR: 0.7 * 5.678263 }, "heating") *
    5.678263,
  "ceiling-u-r38": () => ceilingU({ baseId: "attic-joists-24in-oc", cavityR: 38, continuousR: 0 }),
  "ceiling-u-r49": () => ceilingU({ baseId: "attic-joists-24in-oc", cavityR: 49, continuousR: 0 }),
  // HoF 2021 ch. 16 eq. 48 in SI with Cs (Table 4, 2 stories) 0.000290 and Cw (Table 6, 2 stories, class 3) 0.000231: L/s → m³/s.
  "lbl-example-2": () => lblInfiltrationLps(500, 0.00029, 39, 0.000231, 6.7) / 1000,
  "ventilation-622": () => ashrae622VentilationCfm(2000, 3),
  "internal-sensible-example": () => defaultInternalSensibleW(195.3, 4),
  "vented-attic-peak": () => {
    const site = {
      latitudeDeg: 33.6,
      longitudeDeg: -84.4,
      elevationFt: 0,
      heatingOutdoorDbF: 25,
      coolingOutdoorDbF: 95,
      coolingOutdoorWbF: 75,
      dailyRangeF: 20,
      tauBeam: 0.515,
      tauDiffuse: 2.066,
    };
    const plan = symmetricPlan({
      attic: { kind: "vented", roofSolarAbsorptance: 0.92, ceiling: { cavityR: 38 } },
    });
    const atticF = computeFacingLoads(plan, site, 180, { procedure: "hourly" }).cooling.atticF;
    if (atticF === null) throw new Error("no attic temperature");
    return atticF;
  },
  // The example's ducts: attic, R-8 wrap, "well-sealed" (the table's 5 %/5 % column), one story, furnace.
  "duct-loss-example-heating": () => 6909 * exampleDuctFactor("heating-furnace"),
  "duct-gain-example-cooling": () => 3225 * exampleDuctFactor("cooling"),
  ton: () => BTUH_PER_TON,
  "occupants-default": () => occupantsOf({ bedrooms: 3 }),
};

describe("reference checks (outside references)", () => {
  it.each(REFERENCE_CHECKS.map((row) => [row.id, row] as const))("%s", (_id, row) => {
    const actual = ACTUAL[row.id]();
    const tol =
      row.tolerance.relative !== undefined
        ? `±${row.tolerance.relative * 100} %`
        : `±${row.tolerance.absolute} ${row.unit}`;
    expect(
      withinTolerance(actual, row.expected, row.tolerance),
      `${row.check}: engine ${actual.toPrecision(6)} ${row.unit}, expected ${row.expected} ${tol} (${row.source})`,
    ).toBe(true);
  });

  it("covers every row of the table", () => {
    for (const row of REFERENCE_CHECKS) expect(ACTUAL[row.id], row.id).toBeTypeOf("function");
  });
});

describe("solar altitude against suncalc (npm), July 21, 30° N", () => {
  // suncalc: solar noon and the sun's altitude (no refraction) at a longitude of 0°.
  const date = new Date(Date.UTC(2026, 6, 21, 12));
  const times = SunCalc.getTimes(date, 30, 0);
  const toDeg = (rad: number) => (rad * 180) / Math.PI;
  it("solar noon, within 0.3°", () => {
    const reference = toDeg(SunCalc.getPosition(times.solarNoon, 30, 0).altitude);
    expect(Math.abs(sunPosition(30, JULY_21, 12).altitudeDeg - reference)).toBeLessThan(0.3);
  });
  it("3 h after solar noon, within 0.3°, sun in the west", () => {
    const threeHoursLater = new Date(times.solarNoon.getTime() + 3 * 3600 * 1000);
    const reference = SunCalc.getPosition(threeHoursLater, 30, 0);
    const ours = sunPosition(30, JULY_21, 15);
    expect(Math.abs(ours.altitudeDeg - toDeg(reference.altitude))).toBeLessThan(0.3);
    // suncalc azimuth is measured from south, positive west; ours clockwise from north.
    expect(Math.abs(ours.azimuthDeg - (180 + toDeg(reference.azimuth)))).toBeLessThan(1);
  });
});

describe("internal gains of the HoF 2021 SI ch. 17 example house in the engine's IP form (read in a stored copy, p. 17.14)", () => {
  // 195.3 m² conditioned floor, 3 bedrooms → 4 occupants: eq. 30 gives 654 W sensible, eq. 31 111 W latent.
  // Our IP coefficients are rounded, hence ±1 %.
  const areaFt2 = 195.3 / M2_PER_FT2;
  const gains = defaultInternalGains(areaFt2, occupantsOf({ bedrooms: 3 }));
  it("sensible 654 W (±1 %)", () => {
    expect(Math.abs(gains.sensibleBtuh / BTUH_PER_W - 654)).toBeLessThanOrEqual(6.54);
  });
  it("latent 111 W (±1 %)", () => {
    expect(Math.abs(gains.latentBtuh / BTUH_PER_W - 111)).toBeLessThanOrEqual(1.11);
  });
});

describe("sol-air long-wave correction (HoF 2021 SI ch. 18 eq. 29, read in a stored copy, p. 18.24)", () => {
  // ε·ΔR/h_o = 4 K for horizontal surfaces, 0 for vertical ones; with no sun the sol-air
  // temperature is the outdoor temperature less that correction.
  it("horizontal: 4 K = 7.2 °F below the outdoor air", () => {
    expect(solAirTemperatureF(95, 0.9, 0, 0)).toBeCloseTo(95 - 4 * 1.8, 9);
  });
  it("vertical: no correction", () => {
    expect(solAirTemperatureF(95, 0.9, 0, 90)).toBeCloseTo(95, 9);
  });
});

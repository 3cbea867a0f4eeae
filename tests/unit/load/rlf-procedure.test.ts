/**
 * The RLF procedure (lib/load/residential-load-factor) piece by piece: the chapter's tables against
 * each other, latitude and exposure lookups, exterior attenuation, overhang shading, the slab floor
 * covering, ventilation, applicability findings (Table 1) and bad input. Sources: HoF 2021 SI ch. 17,
 * read in a stored copy; each expected value says where it comes from. Hand calculations are worked
 * in the comments from the printed table cells. The test houses are invented.
 */
import { describe, expect, it } from "vitest";
import { LoadInputError, parsePlanInput, parseSiteConditions, type PlanInputRaw } from "../../../lib/load";
import { checkRlfApplicability } from "../../../lib/load/residential-load-factor/applicability";
import {
  computeResidentialLoadFactorFacing,
  rlfHouseFromPlan,
} from "../../../lib/load/residential-load-factor/from-plan";
import {
  residentialLoadFactorLoads,
  type RlfFenestrationGroup,
  type RlfHouse,
} from "../../../lib/load/residential-load-factor/procedure";
import {
  FOLDED_EXPOSURES,
  TABLE_10_AS_READ_25_TO_60,
  TABLE_5_IDF,
  table9HorizontalPeakIrradianceWm2,
  table9VerticalPeakIrradianceWm2,
  W_M2K_PER_BTUH_FT2F,
} from "../../../lib/load/residential-load-factor/tables";
import { BTUH_FT2_PER_W_M2 } from "../../../lib/load/units";
import { errorOf, SEA_LEVEL_SITE, symmetricPlan } from "./helpers";

const perM2 = (btuhFt2: number) => btuhFt2 / BTUH_FT2_PER_W_M2;

/** An invented one-story house: one wall, no glass; tests add what they look at. */
function house(overrides: Partial<RlfHouse> = {}, site: Partial<RlfHouse["site"]> = {}): RlfHouse {
  return {
    site: {
      latitudeDeg: 35,
      elevationFt: 0,
      heatingOutdoorDbF: 25,
      coolingOutdoorDbF: 95,
      dailyRangeF: 20,
      humidityRatioDifference: 0.005,
      indoorHeatingF: 70,
      indoorCoolingF: 75,
      ...site,
    },
    conditionedFloorAreaFt2: 2000,
    stories: 1,
    bedrooms: 3,
    opaque: [{ label: "Wall", kind: "wall", areaFt2: 1200, uBtuPerHrFt2F: 0.09 }],
    fenestration: [],
    infiltration: { leakage: { method: "effective-leakage-area", elaIn2: 80 } },
    ducts: { method: "none" },
    ...overrides,
  };
}

function window(overrides: Partial<RlfFenestrationGroup> = {}): RlfFenestrationGroup {
  return {
    label: "Glass",
    orientation: { kind: "vertical", azimuthDeg: 270 },
    areaFt2: 40,
    uBtuPerHrFt2F: 0.3,
    shgc: 0.3,
    ...overrides,
  };
}

const glassDetail = (h: RlfHouse) =>
  residentialLoadFactorLoads(h).rows.find((r) => r.kind === "fenestration")!.fenestration!;

describe("HoF 2021 ch. 17 Tables 9 and 10 against each other", () => {
  // Table 10 as read (25°–60°; see tables.ts on the stored copy's shifted columns) against the Table 9
  // equations: every cell within 0.6 W/m² (the table prints whole W/m²).
  const latitudes = [25, 30, 35, 40, 45, 50, 55, 60];
  it.each(FOLDED_EXPOSURES.map((e, i) => [e, i] as const))("%s: E_t and E_d at 25–60°", (exposure, i) => {
    const row = TABLE_10_AS_READ_25_TO_60[exposure];
    latitudes.forEach((L, k) => {
      const e = table9VerticalPeakIrradianceWm2(i / 4, L);
      expect(Math.abs(e.totalWm2 - row.totalWm2[k]), `${exposure} ${L}° E_t`).toBeLessThanOrEqual(0.6);
      expect(Math.abs(e.diffuseWm2 - row.diffuseWm2[k]), `${exposure} ${L}° E_d`).toBeLessThanOrEqual(0.6);
      expect(
        Math.abs(row.directWm2[k] + row.diffuseWm2[k] - row.totalWm2[k]),
        `${exposure} ${L}° E_D + E_d = E_t`,
      ).toBeLessThanOrEqual(1);
    });
  });

  it("horizontal: E_t = 816.2 + 10.20L − 0.1806L², E_d = 170, at 25–60°", () => {
    const row = TABLE_10_AS_READ_25_TO_60.horizontal;
    latitudes.forEach((L, k) => {
      const e = table9HorizontalPeakIrradianceWm2(L);
      expect(Math.abs(e.totalWm2 - row.totalWm2[k]), `${L}°`).toBeLessThanOrEqual(0.6);
      expect(e.diffuseWm2).toBe(170);
    });
  });

  it("read one column later, the copy's values would not fit the equations (why the columns are read as 25–60°)", () => {
    // Horizontal E_t printed first, 958: Table 9 gives 948 at 20° and 958 at 25°.
    expect(Math.abs(table9HorizontalPeakIrradianceWm2(20).totalWm2 - 958)).toBeGreaterThan(9);
    expect(Math.abs(table9HorizontalPeakIrradianceWm2(25).totalWm2 - 958)).toBeLessThan(0.5);
  });
});

describe("HoF 2021 ch. 17 eq. 10 against Table 5 (IDF)", () => {
  // Table 5 is derived with eq. 10 (A_L,flue = 0) at indoor 20 °C heating, 24 °C cooling. One cell is
  // unclear in the stored copy: H = 7 m, 35 °C, printed 0.051 (eq. 10: 0.054), left out and checked apart.
  const F = (c: number) => c * 1.8 + 32;
  const idfs = (H: number, heatC: number, coolC: number) => {
    const r = residentialLoadFactorLoads(
      house(
        {
          infiltration: {
            leakage: { method: "effective-leakage-area", elaIn2: 80 },
            stackHeightFt: H / 0.3048,
          },
        },
        {
          heatingOutdoorDbF: F(heatC),
          coolingOutdoorDbF: F(coolC),
          indoorHeatingF: F(20),
          indoorCoolingF: F(24),
        },
      ),
    );
    return { heating: r.air.idfHeatingLpsPerCm2, cooling: r.air.idfCoolingLpsPerCm2 };
  };
  const cells: Array<[number, string, number, number]> = [];
  TABLE_5_IDF.stackHeightsM.forEach((H, i) => {
    TABLE_5_IDF.heatingOutdoorC.forEach((t, j) => cells.push([H, "heating", t, TABLE_5_IDF.values[i][j]]));
    TABLE_5_IDF.coolingOutdoorC.forEach((t, j) =>
      cells.push([H, "cooling", t, TABLE_5_IDF.values[i][6 + j]]),
    );
  });
  it.each(cells.filter(([H, mode, t]) => !(H === 7 && mode === "cooling" && t === 35)))(
    "H %s m, %s at %s °C: printed %s (±4 % or ±0.0015, the table's rounding)",
    (H, mode, t, printed) => {
      const v = mode === "heating" ? idfs(H, t, 35).heating : idfs(H, -10, t).cooling;
      expect(Math.abs(v - printed) <= Math.max(0.04 * printed, 0.0015), `ours ${v.toFixed(4)}`).toBe(true);
    },
  );
  it("the unclear cell (H 7 m, 35 °C, printed 0.051): eq. 10 gives 0.054, between 0.050 at 6 m and 0.058 at 8 m", () => {
    expect(idfs(7, -10, 35).cooling).toBeCloseTo(0.0543, 4);
  });
});

describe("latitude and exposure lookups", () => {
  it("latitude is interpolated linearly between Table 10 columns: west, 32.5°N, E_t (719 + 734)/2 = 726.5 W/m²", () => {
    const d = glassDetail(house({ fenestration: [window()] }, { latitudeDeg: 32.5 }));
    expect(d.pxiWm2).toBeCloseTo(726.5, 9);
    expect(d.peakDirectWm2).toBeCloseTo((548 + 570) / 2, 9);
  });

  it("nearest-column lookup takes the 35° column at 33.64°, as the chapter's example does (west E_t 734)", () => {
    const d = glassDetail(
      house({ fenestration: [window()], options: { tableLookup: "nearest" } }, { latitudeDeg: 33.64 }),
    );
    expect(d.pxiWm2).toBe(734);
  });

  it("the Table 9 equations give within 1 % of interpolated Table 10 at 33.64°, for all eight exposures", () => {
    for (let az = 0; az < 360; az += 45) {
      const g = [window({ orientation: { kind: "vertical", azimuthDeg: az } })];
      const t10 = glassDetail(house({ fenestration: g }, { latitudeDeg: 33.64 })).pxiWm2;
      const t9 = glassDetail(
        house({ fenestration: g, options: { peakIrradiance: "table-9-equations" } }, { latitudeDeg: 33.64 }),
      ).pxiWm2;
      expect(Math.abs(t9 - t10) / t10, `azimuth ${az}`).toBeLessThan(0.01);
    }
  });

  it("between exposures, Table 13 and Table 10 are interpolated in azimuth: 247.5° is halfway between SW and W", () => {
    const d = glassDetail(
      house({ fenestration: [window({ orientation: { kind: "vertical", azimuthDeg: 247.5 } })] }),
    );
    expect(d.solarLoadFactor).toBeCloseTo((0.58 + 0.56) / 2, 9); // Table 13 SW 0.58, W 0.56
    expect(d.pxiWm2).toBeCloseTo((589 + 734) / 2, 9); // Table 10 at 35°: SE/SW E_t 589, E/W 734
  });

  it("southern hemisphere: a north-facing window at 35°S takes the south row (Table 1, N and S reversed)", () => {
    const south = glassDetail(
      house(
        { fenestration: [window({ orientation: { kind: "vertical", azimuthDeg: 180 } })] },
        { latitudeDeg: 35 },
      ),
    );
    const north = glassDetail(
      house(
        { fenestration: [window({ orientation: { kind: "vertical", azimuthDeg: 0 } })] },
        { latitudeDeg: -35 },
      ),
    );
    expect(north.pxiWm2).toBe(south.pxiWm2);
    expect(north.solarLoadFactor).toBe(0.47); // Table 13 "South"
  });

  it("latitudes beyond the tables use the edge column, with a note", () => {
    const r = residentialLoadFactorLoads(house({ fenestration: [window()] }, { latitudeDeg: 12 }));
    expect(r.conditions.tableLatitudeDeg).toBe(20);
    expect(r.notes.join(" ")).toMatch(/outside the tables' 20–60°/);
  });
});

describe("exterior attenuation (Table 11, eq. 26–27)", () => {
  const base = glassDetail(house({ fenestration: [window()] }));
  it("an insect screen multiplies PXI by 0.64", () => {
    const d = glassDetail(
      house({ fenestration: [window({ exteriorAttachment: { kind: "insect-screen" } })] }),
    );
    expect(d.exteriorTransmission).toBe(0.64);
    expect(d.pxiWm2).toBeCloseTo(0.64 * base.pxiWm2, 9);
  });
  it("a shade screen uses its shading coefficient (0.5 → half the PXI)", () => {
    const d = glassDetail(
      house({ fenestration: [window({ exteriorAttachment: { kind: "shade-screen", transmission: 0.5 } })] }),
    );
    expect(d.pxiWm2).toBeCloseTo(0.5 * base.pxiWm2, 9);
  });
  it("the solar part of CF scales with T_x; the conduction part U(Δt − 0.46·DR) does not", () => {
    const row = (tx?: RlfFenestrationGroup["exteriorAttachment"]) =>
      residentialLoadFactorLoads(house({ fenestration: [window({ exteriorAttachment: tx })] })).rows.find(
        (r) => r.kind === "fenestration",
      )!;
    const conduction = 0.3 * (95 - 75 - 0.46 * 20); // eq. 25, Btu/h·ft²
    const solar1 = row().coolingFactorBtuhPerUnit - conduction;
    const solarScreen = row({ kind: "insect-screen" }).coolingFactorBtuhPerUnit - conduction;
    expect(solarScreen / solar1).toBeCloseTo(0.64, 9);
  });
});

describe("overhang shading, eq. 28 with Table 12", () => {
  // West at 35°N: SLF 1.1 (Table 12), E_D 570, E_d 164 (Table 10).
  const shaded = (depthFt: number, aboveFt: number, heightFt: number) =>
    glassDetail(
      house({ fenestration: [window({ overhangDepthFt: depthFt, overhangAboveHeadFt: aboveFt, heightFt })] }),
    );
  it("2 ft overhang 0.5 ft above a 4 ft window: F_shd = (1.1 × 2 − 0.5)/4 = 0.425; PXI = 164 + 0.575 × 570", () => {
    const d = shaded(2, 0.5, 4);
    expect(d.shadeLineFactor).toBe(1.1);
    expect(d.shadedFraction).toBeCloseTo(0.425, 12);
    expect(d.pxiWm2).toBeCloseTo(164 + 0.575 * 570, 9);
  });
  it("a deep overhang shades it fully (F_shd 1, PXI = E_d); one high above shades none (F_shd 0)", () => {
    expect(shaded(10, 0, 4).shadedFraction).toBe(1);
    expect(shaded(10, 0, 4).pxiWm2).toBeCloseTo(164, 9);
    expect(shaded(2, 5, 4).shadedFraction).toBe(0);
    expect(shaded(2, 5, 4).pxiWm2).toBeCloseTo(734, 9);
  });
  it("south glass at 22.5°N interpolates SLF (20.0 + 14.0)/2 = 17 between the 20° and 25° columns", () => {
    const d = glassDetail(
      house(
        {
          fenestration: [
            window({ orientation: { kind: "vertical", azimuthDeg: 180 }, overhangDepthFt: 0.1, heightFt: 5 }),
          ],
        },
        { latitudeDeg: 22.5 },
      ),
    );
    expect(d.shadeLineFactor).toBeCloseTo(17, 12);
    expect(d.shadedFraction).toBeCloseTo((17 * 0.1) / 5, 12);
  });
  it("a given shaded fraction (e.g. 1 for glass shaded by a neighbouring building) replaces eq. 28", () => {
    const d = glassDetail(
      house({ fenestration: [window({ overhangDepthFt: 2, heightFt: 4, shadedFraction: 1 })] }),
    );
    expect(d.shadedFraction).toBe(1);
    expect(d.shadeLineFactor).toBeNull();
  });
});

describe("slab floor covering (eq. 22–23)", () => {
  const slabCf = (floorCoveringR: number) =>
    perM2(
      residentialLoadFactorLoads(
        house({ slab: { perimeterFt: 180, fFactorBtuhPerFtF: 0.5, areaFt2: 2000, floorCoveringR } }),
      ).rows.find((r) => r.kind === "slab-area")!.coolingFactorBtuhPerUnit,
    );
  it("bare slab: CF = 1.9 − 1.4/0.12 = −9.77 W/m²; carpet and pad (R 0.21 m²·K/W): −2.34 W/m² (the example's)", () => {
    expect(slabCf(0)).toBeCloseTo(1.9 - 1.4 / 0.12, 9);
    expect(slabCf(0.21 * W_M2K_PER_BTUH_FT2F)).toBeCloseTo(1.9 - 1.4 / 0.33, 9);
  });
  it("a bare slab gives a larger cooling credit than a carpeted one", () => {
    expect(slabCf(0)).toBeLessThan(slabCf(0.21 * W_M2K_PER_BTUH_FT2F));
    expect(slabCf(0.21 * W_M2K_PER_BTUH_FT2F)).toBeLessThan(0);
  });
  it("the slab's heating loss is F_p × perimeter × Δt (ch. 17 Table 16)", () => {
    const r = residentialLoadFactorLoads(
      house({ slab: { perimeterFt: 180, fFactorBtuhPerFtF: 0.5, areaFt2: 2000, floorCoveringR: 1 } }),
    );
    expect(r.rows.find((x) => x.kind === "slab-perimeter")!.heatingBtuh).toBeCloseTo(0.5 * 180 * 45, 9);
  });
});

describe("opaque surfaces (Table 7, eq. 21)", () => {
  it("ceiling under a vented attic: CF = U(0.62Δt + 14.3α − 4.5 K + (−0.19)DR); dark shingles gain more than white", () => {
    const cf = (alpha: number) =>
      residentialLoadFactorLoads(
        house({
          opaque: [
            {
              label: "Ceiling",
              kind: "attic-ceiling",
              areaFt2: 2000,
              uBtuPerHrFt2F: 0.03,
              roofSolarAbsorptance: alpha,
            },
          ],
        }),
      ).rows[0].coolingFactorBtuhPerUnit;
    // 0.03 × (0.62 × 20 + (14.3 × 0.92 − 4.5) × 1.8 − 0.19 × 20) Btu/h·ft² (OF_b converted K → °F).
    expect(cf(0.92)).toBeCloseTo(0.03 * (0.62 * 20 + (14.3 * 0.92 - 4.5) * 1.8 - 0.19 * 20), 12);
    expect(cf(0.92)).toBeGreaterThan(cf(0.75)); // Table 8 dark 0.92, white 0.75
  });
  it("heating of every above-grade surface is U·A·Δt (eq. 33–34)", () => {
    const r = residentialLoadFactorLoads(house());
    expect(r.rows[0].heatingBtuh).toBeCloseTo(0.09 * 1200 * 45, 9);
  });
  it("a shaded wall has no solar term: CF = U(Δt − 0.36·DR)", () => {
    const r = residentialLoadFactorLoads(
      house({ opaque: [{ label: "W", kind: "wall", shaded: true, areaFt2: 100, uBtuPerHrFt2F: 0.1 }] }),
    );
    expect(r.rows[0].coolingFactorBtuhPerUnit).toBeCloseTo(0.1 * (20 - 0.36 * 20), 12);
  });
});

describe("infiltration and ventilation (eq. 8–18)", () => {
  it("unbalanced exhaust larger than twice the infiltration governs: Q_vi = Q_unbal (eq. 14)", () => {
    const r = residentialLoadFactorLoads(house({ ventilation: { supplyCfm: 0, exhaustCfm: 500 } }));
    expect(r.air.combinedCoolingCfm).toBe(500);
    expect(r.air.unbalancedCfm).toBe(500);
  });
  it("small unbalanced exhaust adds half its flow to infiltration (eq. 14)", () => {
    const r = residentialLoadFactorLoads(house({ ventilation: { supplyCfm: 0, exhaustCfm: 10 } }));
    expect(r.air.combinedHeatingCfm).toBeCloseTo(r.air.infiltrationHeatingCfm + 5, 9);
  });
  it("an HRV of sensible effectiveness 0.7 leaves 30 % of the balanced flow's sensible load (eq. 15)", () => {
    const plain = residentialLoadFactorLoads(house({ ventilation: { supplyCfm: 100, exhaustCfm: 100 } }));
    const hrv = residentialLoadFactorLoads(
      house({
        ventilation: {
          supplyCfm: 100,
          exhaustCfm: 100,
          heatRecoveryCfm: 100,
          sensibleRecoveryEffectiveness: 0.7,
        },
      }),
    );
    expect(hrv.heating.ventilationBtuh).toBeCloseTo(0.3 * plain.heating.ventilationBtuh, 9);
    expect(hrv.cooling.latent.ventilationBtuh).toBeCloseTo(plain.cooling.latent.ventilationBtuh, 9); // no latent recovery given
  });
  it("blower-door ACH50 and the equivalent CFM50 give the same leakage area (ch. 16 eq. 40–41 via lib/load/infiltration.ts)", () => {
    const a = residentialLoadFactorLoads(
      house({ infiltration: { leakage: { method: "blower-door-ach50", ach50: 5, volumeFt3: 18_000 } } }),
    );
    const b = residentialLoadFactorLoads(
      house({ infiltration: { leakage: { method: "blower-door", cfm50: 1500 } } }),
    );
    expect(a.air.effectiveLeakageAreaIn2).toBeCloseTo(b.air.effectiveLeakageAreaIn2, 9);
  });
  it("outdoor air drier than indoor gives no latent credit, with a note", () => {
    const r = residentialLoadFactorLoads(house({}, { humidityRatioDifference: -0.002 }));
    expect(r.cooling.latent.infiltrationBtuh).toBe(0);
    expect(r.notes.join(" ")).toMatch(/no latent credit/);
  });
  it("with the wet bulb, ΔW comes from psychrolib at the site pressure (95 °F / 75 °F outdoor, 75 °F 50 % indoor: 98.46 − 64.65 gr/lb, tests/fixtures/engine/reference-checks.ts)", () => {
    const r = residentialLoadFactorLoads(
      house({}, { humidityRatioDifference: undefined, coolingOutdoorWbF: 75, indoorCoolingRhPct: 50 }),
    );
    expect(r.conditions.humidityRatioDifference * 7000).toBeCloseTo(98.46 - 64.65, 1);
  });
});

describe("applicability findings (ch. 17 Table 1)", () => {
  it("a facade with more than 15 % of floor area in glass is named in plain words", () => {
    const h = house({ fenestration: [window({ areaFt2: 360, facade: "back" })] }); // 360/2000 = 18 %
    const f = checkRlfApplicability(h).find((x) => x.limit === "fenestration-area")!;
    expect(f.severity).toBe("outside");
    expect(f.value).toBe(18);
    expect(f.exceedsBy).toBe(3);
    expect(f.message).toBe(
      "Fenestration on the back (west) facade is 18 % of floor area; the procedure is derived for at most 15 %.",
    );
  });
  it("total fenestration above 30 % of floor area", () => {
    const g = [0, 90, 180, 270].map((az) =>
      window({ orientation: { kind: "vertical", azimuthDeg: az }, areaFt2: 160 }),
    );
    const f = checkRlfApplicability(house({ fenestration: g })).filter(
      (x) => x.limit === "fenestration-area",
    );
    expect(f.map((x) => x.message)).toEqual([
      "Fenestration in total is 32 % of floor area; the procedure is derived for at most 30 %.",
    ]);
  });
  it("latitude, elevation, climate and construction outside Table 1", () => {
    const h = house(
      { construction: "structural-masonry" },
      { latitudeDeg: 15, elevationFt: 8000, coolingOutdoorDbF: 80, dailyRangeF: 20 },
    );
    const byLimit = Object.fromEntries(
      checkRlfApplicability(h)
        .filter((x) => x.severity === "outside")
        .map((x) => [x.limit, x]),
    );
    expect(byLimit.latitude.exceedsBy).toBe(5);
    expect(byLimit.elevation.exceedsBy).toBe(Math.round(8000 * 0.3048 - 2000)); // 438 m above 2000 m
    // Design-day mean 80 − 0.536 × 20 = 69.3 °F (ch. 14 Table 6 mean fraction), below the indoor 75 °F.
    expect(byLimit.climate.value).toBeCloseTo(69.3, 1);
    expect(byLimit.construction.message).toMatch(/structural masonry/);
  });
  it("a mild climate with south glass draws the July 21 caution; a hot one does not", () => {
    const g = [window({ orientation: { kind: "vertical", azimuthDeg: 180 } })];
    expect(
      checkRlfApplicability(house({ fenestration: g }, { coolingOutdoorDbF: 80 })).some(
        (x) => x.limit === "date",
      ),
    ).toBe(true);
    expect(checkRlfApplicability(house({ fenestration: g })).some((x) => x.limit === "date")).toBe(false);
  });
  it("sloped glazing tilted 30° or more is outside; under 30° it counts as horizontal", () => {
    const sky = (tiltDeg: number) =>
      window({ label: "Skylight", orientation: { kind: "horizontal", tiltDeg } });
    expect(
      checkRlfApplicability(house({ fenestration: [sky(45)] })).find((x) => x.limit === "fenestration-tilt")
        ?.exceedsBy,
    ).toBe(15);
    expect(
      checkRlfApplicability(house({ fenestration: [sky(26.6)] })).some(
        (x) => x.limit === "fenestration-tilt",
      ),
    ).toBe(false);
  });
  it("more occupants than bedrooms + 1 and leaky ducts draw cautions; the method's assumptions are always listed", () => {
    const h = house({
      occupants: 8,
      ducts: {
        method: "table-6",
        location: "attic",
        insulationR: 8,
        supplyLeakagePct: 15,
        returnLeakagePct: 15,
        heatingSystem: "furnace",
      },
    });
    const f = checkRlfApplicability(h);
    expect(f.find((x) => x.limit === "occupancy")?.exceedsBy).toBe(4);
    expect(f.find((x) => x.limit === "distribution-losses" && x.severity === "caution")?.exceedsBy).toBe(4);
    expect(f.filter((x) => x.severity === "assumption").map((x) => x.limit)).toEqual([
      "temperature-swing",
      "distribution-losses",
    ]);
  });
});

describe("bad input: LoadInputError names the field and the valid range", () => {
  it.each<[string, () => RlfHouse, string, RegExp]>([
    [
      "negative opaque area",
      () => house({ opaque: [{ label: "W", kind: "wall", areaFt2: -1, uBtuPerHrFt2F: 0.1 }] }),
      "opaque.0.areaFt2",
      /out of range/,
    ],
    [
      "SHGC above 1",
      () => house({ fenestration: [window({ shgc: 1.2 })] }),
      "fenestration.0.shgc",
      /valid range 0 to 1/,
    ],
    [
      "attic ceiling without roof absorptance",
      () => house({ opaque: [{ label: "C", kind: "attic-ceiling", areaFt2: 100, uBtuPerHrFt2F: 0.03 }] }),
      "opaque.0.roofSolarAbsorptance",
      /required/,
    ],
    [
      "neither wet bulb nor humidity difference",
      () => house({}, { humidityRatioDifference: undefined }),
      "site.coolingOutdoorWbF",
      /required/,
    ],
    [
      "both wet bulb and humidity difference",
      () => house({}, { coolingOutdoorWbF: 75 }),
      "site.humidityRatioDifference",
      /not both/,
    ],
    [
      "heating outdoor above indoor",
      () => house({}, { heatingOutdoorDbF: 72 }),
      "site.heatingOutdoorDbF",
      /out of range/,
    ],
    ["fractional stories", () => house({ stories: 1.5 }), "stories", /whole number/],
    [
      "unknown opaque kind",
      () => house({ opaque: [{ label: "X", kind: "roof" as never, areaFt2: 1, uBtuPerHrFt2F: 0.1 }] }),
      "opaque.0.kind",
      /unknown opaque kind/,
    ],
    [
      "buffer partition without temperatures",
      () => house({ opaque: [{ label: "P", kind: "buffer-partition", areaFt2: 1, uBtuPerHrFt2F: 0.1 }] }),
      "opaque.0.bufferHeatingF",
      /required/,
    ],
    [
      "heat recovery flow above the balanced flow",
      () => house({ ventilation: { supplyCfm: 50, exhaustCfm: 100, heatRecoveryCfm: 80 } }),
      "ventilation.heatRecoveryCfm",
      /at most the balanced flow/,
    ],
    [
      "overhang without window height",
      () => house({ fenestration: [window({ overhangDepthFt: 2 })] }),
      "fenestration.0.heightFt",
      /required/,
    ],
    [
      "duct leakage beyond what Table 6 can be stretched to",
      () =>
        house({
          ducts: {
            method: "table-6",
            location: "attic",
            insulationR: 8,
            supplyLeakagePct: 30,
            returnLeakagePct: 30,
            heatingSystem: "furnace",
          },
        }),
      "ducts.supplyLeakagePct",
      /duct-factor table/,
    ],
  ])("%s", (_what, make, field, message) => {
    const e = errorOf(() => residentialLoadFactorLoads(make()));
    expect(e.field).toBe(field);
    expect(e.message).toMatch(message);
  });

  it("the range travels with the error", () => {
    const e = errorOf(() => residentialLoadFactorLoads(house({ fenestration: [window({ shgc: 1.2 })] })));
    expect(e.range).toEqual({ min: 0, max: 1, unit: undefined });
  });

  it("a facing that is not a number is refused by the plan mapping", () => {
    const plan = parsePlanInput(symmetricPlan());
    const site = parseSiteConditions(SEA_LEVEL_SITE);
    expect(errorOf(() => rlfHouseFromPlan(plan, site, Number.NaN)).field).toBe("facingAzimuthDeg");
  });
});

describe("from the engine's plan input", () => {
  const site = parseSiteConditions(SEA_LEVEL_SITE);
  const frontGlassOnly = (): PlanInputRaw => {
    const p = symmetricPlan();
    const blank = { grossWallAreaFt2: 400 };
    return {
      ...p,
      facades: {
        front: { grossWallAreaFt2: 400, window: { areaFt2: 60, uFactor: 0.3, shgc: 0.3 } },
        left: blank,
        back: blank,
        right: blank,
      },
    };
  };

  it("facade azimuths: left = facing + 90°, back + 180°, right + 270°", () => {
    const p = symmetricPlan();
    const plan = parsePlanInput({
      ...p,
      facades: { ...p.facades, left: { grossWallAreaFt2: 400, window: { areaFt2: 30 } } },
    });
    const h = rlfHouseFromPlan(plan, site, 0);
    const left = h.fenestration.find((g) => g.facade === "left")!;
    expect(left.orientation).toEqual({ kind: "vertical", azimuthDeg: 90 });
  });

  it("all glass on the front: facing west loads more than twice facing north (Table 10 at 32°N: W E_t 725, N 179 W/m²; Table 13: 0.56 vs 0.44)", () => {
    const plan = parsePlanInput(frontGlassOnly());
    const west = computeResidentialLoadFactorFacing(plan, site, 270).cooling.sensibleByComponent.windows;
    const north = computeResidentialLoadFactorFacing(plan, site, 0).cooling.sensibleByComponent.windows;
    expect(west).toBeGreaterThan(2 * north);
  });

  it("heating does not depend on the facing (ch. 17 section 8: no solar gains in heating)", () => {
    const plan = parsePlanInput(frontGlassOnly());
    const h0 = computeResidentialLoadFactorFacing(plan, site, 0).heating.totalBtuh;
    const h1 = computeResidentialLoadFactorFacing(plan, site, 135).heating.totalBtuh;
    expect(h1).toBeCloseTo(h0, 9);
  });

  it("maps a vented crawlspace, a garage with entered temperatures and ducts in a garage, with notes", () => {
    const plan = parsePlanInput(
      symmetricPlan({
        foundation: { kind: "vented-crawlspace", floorAreaFt2: 1600 },
        garage: { wallAreaFt2: 200, heatingTemperatureF: 40, coolingTemperatureF: 100 },
        ducts: { location: "garage" },
      }),
    );
    const r = computeResidentialLoadFactorFacing(plan, site, 0);
    const kinds = r.house.opaque.map((c) => c.kind);
    expect(kinds).toContain("floor-over-crawlspace");
    expect(r.house.opaque.find((c) => c.tag === "garageWall")?.kind).toBe("buffer-partition");
    expect(r.house.ducts).toMatchObject({ method: "table-6", location: "attic" });
    expect(r.notes.join(" ")).toMatch(/Ducts in the garage/);
    expect(r.heating.garageF).toBe(40);
    // Buffer partition, eq. 35: U(t_i − t_b) with the entered garage temperature.
    const wallToGarage = r.rlf.rows.find((x) => x.label === "Wall to garage")!;
    expect(wallToGarage.heatingFactorBtuhPerUnit).toBeCloseTo(
      r.house.opaque.find((c) => c.label === "Wall to garage")!.uBtuPerHrFt2F * (70 - 40),
      9,
    );
  });

  it("the plan's slab covering, exterior attenuation and entered leakage area reach the RLF house", () => {
    const p = symmetricPlan();
    const withInputs = (covering: "carpet" | "bare") =>
      parsePlanInput({
        ...p,
        foundation: { kind: "slab-on-grade", slabPerimeterFt: 160, slabFloorCovering: covering },
        facades: {
          ...p.facades,
          front: { grossWallAreaFt2: 400, window: { areaFt2: 40, exteriorAttenuation: 0.64 } },
        },
        infiltration: { effectiveLeakageAreaIn2: 75 },
      });
    const carpet = computeResidentialLoadFactorFacing(withInputs("carpet"), site, 0);
    const bare = computeResidentialLoadFactorFacing(withInputs("bare"), site, 0);
    // Bare slab: a larger cooling credit (eq. 23) than carpet (lib/load/slab.ts: 0.21 m²·K/W, the ch. 17 example's).
    expect(bare.cooling.sensibleByComponent.slab).toBeLessThan(carpet.cooling.sensibleByComponent.slab);
    expect(
      carpet.rlf.rows.find((r) => r.fenestration?.facade === "front")!.fenestration!.exteriorTransmission,
    ).toBe(0.64);
    expect(carpet.effectiveLeakageAreaIn2).toBeCloseTo(75, 9);
  });

  it("the slab floor covering can be given; a bare slab lowers the cooling load", () => {
    const plan = parsePlanInput(symmetricPlan());
    const carpet = computeResidentialLoadFactorFacing(plan, site, 0).cooling.sensibleBtuh;
    const bare = computeResidentialLoadFactorFacing(plan, site, 0, { slabFloorCoveringR: 0 }).cooling
      .sensibleBtuh;
    expect(bare).toBeLessThan(carpet);
  });

  it("the heating envelope scales with Δt (eq. 34 and Table 16: a UA·Δt sum)", () => {
    const at = (heatingOutdoorDbF: number) =>
      residentialLoadFactorLoads(
        house(
          { slab: { perimeterFt: 100, fFactorBtuhPerFtF: 0.5, areaFt2: 1000, floorCoveringR: 1 } },
          { heatingOutdoorDbF },
        ),
      ).heating.envelopeBtuh;
    expect(at(20) / at(45)).toBeCloseTo(50 / 25, 9);
  });

  it("per-facing output agrees with the procedure run on the mapped house (no hidden state between facings)", () => {
    const plan = parsePlanInput(frontGlassOnly());
    const a = computeResidentialLoadFactorFacing(plan, site, 200);
    computeResidentialLoadFactorFacing(plan, site, 20);
    const again = residentialLoadFactorLoads(rlfHouseFromPlan(plan, site, 200));
    expect(again.cooling.totalBtuh).toBe(a.cooling.totalBtuh);
  });
});

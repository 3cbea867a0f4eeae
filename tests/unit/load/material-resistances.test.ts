/**
 * Film and material resistances of lib/load/assemblies.ts against HoF 2021 SI ch. 26, read in a
 * stored Markdown copy of the 2021 SI chapter: Table 1 "Building and Insulating Materials: Design
 * Values" (pp. 26.8–26.12) and Table 10 "Surface Film Coefficients/Resistances" (p. 26.21,
 * nonreflective surfaces, ε = 0.90), Table 3 "Thermal Resistances of Plane Air Spaces" (pp. 26.14–26.15) and
 * Table 8 soil conductivities (p. 26.21).
 * The SI values are converted here with
 * 1 m²·K/W = 5.678263 h·ft²·°F/Btu (NIST SP 811); the tolerance ±0.01 h·ft²·°F/Btu is the
 * rounding of our two-decimal IP constants.
 */
import { describe, expect, it } from "vitest";
import { belowGradeWallU, FILM_R, MATERIAL_R, slabFFactor } from "../../../lib/load/assemblies";

const IP_R_PER_SI_R = 5.678263;
const ROUNDING = 0.01;

describe("surface films against HoF 2021 SI ch. 26 Table 10 (ε 0.90; R = 1/h)", () => {
  const rows: ReadonlyArray<[keyof typeof FILM_R, number, string]> = [
    ["insideHeatFlowUp", 9.26, "indoor, horizontal, heat flow upward, h 9.26 W/(m²·K)"],
    ["insideSlopedUp", 9.09, "indoor, sloping 45°, upward, h 9.09"],
    ["insideVertical", 8.29, "indoor, vertical, horizontal heat flow, h 8.29"],
    ["insideSlopedDown", 7.5, "indoor, sloping 45°, downward, h 7.50"],
    ["insideHeatFlowDown", 6.13, "indoor, horizontal, heat flow downward, h 6.13"],
    ["outsideWinter", 34.0, "outdoor, any position, wind 6.7 m/s (15 mph, winter), h 34.0"],
    ["outsideSummer", 22.7, "outdoor, any position, wind 3.4 m/s (7.5 mph, summer), h 22.7"],
  ];
  it.each(rows)("%s: %f W/(m²·K) (%s)", (name, hSi) => {
    expect(Math.abs(FILM_R[name] - IP_R_PER_SI_R / hSi)).toBeLessThanOrEqual(ROUNDING);
  });
});

describe("materials against HoF 2021 SI ch. 26 Table 1", () => {
  const rows: ReadonlyArray<[keyof typeof MATERIAL_R, number, string]> = [
    // Gypsum or plaster board, 640 kg/m³, k 0.16 W/(m·K), ½ in = 12.7 mm.
    ["gypsumHalfInch", 0.0127 / 0.16, "gypsum or plaster board, k 0.16, 12.7 mm"],
    // Oriented strand board, 9 to 11 mm, R 0.11 m²·K/W (7/16 in = 11.1 mm).
    ["osbSevenSixteenthsInch", 0.11, "OSB 9 to 11 mm, R 0.11"],
    // Plywood/wood panels, 19.0 mm, R 0.19.
    ["plywoodThreeQuarterInch", 0.19, "plywood/wood panels 19.0 mm, R 0.19"],
    // Siding: aluminum, steel or vinyl over sheathing, hollow-backed, R 0.11.
    ["vinylSiding", 0.11, "aluminum, steel or vinyl siding, hollow-backed, R 0.11"],
    // Roofing: asphalt shingles, R 0.078.
    ["asphaltShingles", 0.078, "asphalt shingles, R 0.078"],
    // Plastering: cement plaster, sand aggregate, k 0.72, ⅞ in = 22.2 mm.
    ["stuccoSevenEighthsInch", 0.0222 / 0.72, "cement plaster, sand aggregate, k 0.72, 22.2 mm"],
    // Concrete blocks, normal-weight aggregate, ~200 mm, with perlite-filled cores, R 0.35.
    ["cmu8inCoreFilled", 0.35, "normal-weight block ~200 mm, perlite-filled cores, R 0.35"],
  ];
  it.each(rows)("%s: %f m²·K/W (%s)", (name, rSi) => {
    expect(Math.abs(MATERIAL_R[name] - rSi * IP_R_PER_SI_R)).toBeLessThanOrEqual(ROUNDING);
  });

  it("8 in hollow normal-weight block lies in the printed range (~200 mm, 2 or 3 cores, R 0.17 to 0.20)", () => {
    expect(MATERIAL_R.cmu8inHollow).toBeGreaterThanOrEqual(0.17 * IP_R_PER_SI_R);
    expect(MATERIAL_R.cmu8inHollow).toBeLessThanOrEqual(0.2 * IP_R_PER_SI_R);
  });

  it("softwood per inch is HoF 2021 ch. 27 Example 3's stud, R 0.77 m²·K/W for 3.5 in (read)", () => {
    expect(Math.abs(MATERIAL_R.softwoodPerInch * 3.5 - 0.77 * IP_R_PER_SI_R)).toBeLessThanOrEqual(ROUNDING);
  });

  it("softwood per inch lies in the printed range of hem/fir and spruce/pine/fir (k 0.11 to 0.13 W/(m·K))", () => {
    // R per inch = 0.0254 m / k, in SI, then converted; 1.25 itself is the stud of HoF 2021 ch. 27 Example 3 (0.77 m²·K/W for 90 mm).
    expect(MATERIAL_R.softwoodPerInch).toBeGreaterThanOrEqual((0.0254 / 0.13) * IP_R_PER_SI_R);
    expect(MATERIAL_R.softwoodPerInch).toBeLessThanOrEqual((0.0254 / 0.11) * IP_R_PER_SI_R);
  });

  it("blown loose fill per inch lies between attic glass fiber (k 0.052 to 0.055) and attic cellulose (k 0.039 to 0.040)", () => {
    expect(MATERIAL_R.looseFillPerInch).toBeGreaterThanOrEqual((0.0254 / 0.055) * IP_R_PER_SI_R);
    expect(MATERIAL_R.looseFillPerInch).toBeLessThanOrEqual((0.0254 / 0.039) * IP_R_PER_SI_R);
  });
});

describe("plane air space against HoF 2021 SI ch. 26 Table 3", () => {
  it("the unventilated vertical air space (1.0) lies within the printed 20 to 90 mm, ε 0.82, vertical rows (0.13 to 0.27 m²·K/W)", () => {
    expect(MATERIAL_R.airSpaceVertical).toBeGreaterThanOrEqual(0.13 * IP_R_PER_SI_R);
    expect(MATERIAL_R.airSpaceVertical).toBeLessThanOrEqual(0.27 * IP_R_PER_SI_R);
  });
});

describe("soil under a basement wall against HoF 2021 SI ch. 26 Table 8", () => {
  it("the soil conductivity implied by two depths is the 'high' design value for sands, silts and loams, 2.25 W/(m·K)", () => {
    // Our soil path adds 0.5·depth/k in series, so 1/U(4 ft) − 1/U(2 ft) = 1 ft / k.
    const kBtuhFtF = 1 / (1 / belowGradeWallU(0, 4) - 1 / belowGradeWallU(0, 2));
    const W_PER_M_K_PER_BTUH_FT_F = 1.730735; // NIST SP 811
    expect(Math.abs(kBtuhFtF * W_PER_M_K_PER_BTUH_FT_F - 2.25)).toBeLessThanOrEqual(0.01);
  });
});

describe("below-grade wall U against HoF 2021 SI ch. 18 eq. 38 (read in a stored copy, p. 18.39), same soil conductivity", () => {
  // Eq. 38: U_avg = 2k/(π(z2 − z1))·[ln(z2 + 2kR/π) − ln(z1 + 2kR/π)], grade to depth z2 (z1 = 0),
  // R_other = 0.259 m²·K/W for an uninsulated concrete wall with its indoor film (the chapter's value)
  // plus the insulation. Our one-line soil path (half the depth over k in series) is checked to ±10 %,
  // at k = 2.25 W/(m·K) as the engine uses (ch. 26 Table 8).
  const K_SOIL = 2.25;
  const eq38 = (depthM: number, rOther: number) => {
    const a = (2 * K_SOIL * rOther) / Math.PI;
    return ((2 * K_SOIL) / (Math.PI * depthM)) * (Math.log(depthM + a) - Math.log(a));
  };
  const cases = [1, 2, 4, 6, 8].flatMap((depthFt) =>
    [0, 10].map((insulationR) => [depthFt, insulationR] as const),
  );
  it.each(cases)("%i ft below grade, insulation R-%i", (depthFt, insulationR) => {
    const ours = belowGradeWallU(insulationR, depthFt) * IP_R_PER_SI_R;
    const handbook = eq38(depthFt * 0.3048, 0.259 + insulationR / IP_R_PER_SI_R);
    expect(Math.abs(ours / handbook - 1)).toBeLessThanOrEqual(0.1);
  });
});

describe("slab edge F-factors: HoF 2021 SI ch. 18 Table 24 as read (W/(m·K), converted by NIST 1.730735)", () => {
  const rows = [
    // construction, uninsulated F_p, F_p with m²·K/W from edge to footer (printed)
    ["block-8in-brick-facing", 1.17, 0.86],
    ["block-4in-brick-facing", 1.45, 0.85],
    ["metal-stud-stucco", 2.07, 0.92],
    ["poured-concrete-perimeter-duct", 3.67, 1.24],
  ] as const;
  it.each(rows)("%s: %f uninsulated, %f with R-5.4 (±0.1 %)", (construction, bare, insulated) => {
    expect(slabFFactor(0, construction)).toBeCloseTo(bare / 1.730735, 4);
    expect(slabFFactor(0.95 * 5.678, construction)).toBeCloseTo(insulated / 1.730735, 4);
    // More insulation than the table's case keeps the insulated value (conservative), never lower.
    expect(slabFFactor(15, construction)).toBeCloseTo(insulated / 1.730735, 4);
  });
});

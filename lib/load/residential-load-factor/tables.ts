/**
 * Tables and coefficients of the residential load factor (RLF) method, ASHRAE Handbook—Fundamentals
 * 2021, SI edition, chapter 17 "Residential Cooling and Heating Load Calculations", read in a stored
 * Markdown copy of the SI chapter (pp. 17.1–17.16 of the printed chapter).
 *
 * Units: every value here is kept in the chapter's own SI units, as printed (W, m², K, L/s, cm²).
 * procedure.ts converts at use (coefficients to IP, with the factors named below), so each number in
 * this file can be compared with the printed page directly.
 *
 * Where the Markdown copy garbled a table, the comment says what was unclear and how it was resolved
 * (always by a check against another printed value, never by memory).
 */
import { BTUH_PER_W, M2_PER_FT2 } from "../units";

// ---------------------------------------------------------------------------------------------
// Unit conversions used with these tables (exact by definition or from lib/load/units.ts).

/** 1 ft = 0.3048 m (exact, by definition of the international foot). */
export const M_PER_FT = 0.3048;
/** 1 Btu/h·ft²·°F = 1.8 / (3.412142 × 0.09290304) = 5.678263 W/(m²·K) (derived from NIST SP 811 factors in units.ts). */
export const W_M2K_PER_BTUH_FT2F = 1.8 / (BTUH_PER_W * M2_PER_FT2);
/** 1 Btu/h·ft·°F = 1.8 / (3.412142 × 0.3048) = 1.730735 W/(m·K). */
export const W_MK_PER_BTUH_FTF = 1.8 / (BTUH_PER_W * M_PER_FT);
/** Kelvin per °F of temperature difference (exact). */
export const K_PER_F = 1 / 1.8;

// ---------------------------------------------------------------------------------------------
// Air heat factors, ch. 17 "Basic Relationships" eq. 1–2 (sea level; "appropriate for elevations up to
// about 300 m"). The stored copy prints the Symbols list and the example's text as "C_s = 23 W/(L·s·K)";
// the arithmetic beside it (q = 1.23 × 79 × 23) and the Basic Relationships list give 1.23.

/** C_s, W/(L/s·K), sea level (ch. 17 eq. 1). */
export const SENSIBLE_AIR_FACTOR_W_PER_LPS_K = 1.23;
/** C_l, W/(L/s) per kg_w/kg_da, sea level (ch. 17 eq. 2). */
export const LATENT_AIR_FACTOR_W_PER_LPS = 3010;
/** Elevation below which the chapter says the sea-level air factors are appropriate, m (ch. 17, Basic Relationships). */
export const SEA_LEVEL_FACTORS_MAX_ELEVATION_M = 300;

// ---------------------------------------------------------------------------------------------
// Table 1 "RLF Limitations" (p. 17.3), as read. The check of each limit is in applicability.ts. "RHB" in the
// quotes is the chapter's residential heat balance method (its hourly, computer-only method).

export const TABLE_1_LIMITS = {
  /** "20 to 60°N. Also approximately valid for 20 to 60°S with N and S orientations reversed." */
  latitudeDeg: { min: 20, max: 60 },
  /** "July 21. Application must be summer peaking." (SE/S/SW glazing in mild climates may peak in fall or winter.) */
  date: "July 21",
  /** "Less than 2000 m. RLF factors assume 50 m elevation. With elevation-corrected C_s, method is acceptably accurate except at very high elevations." */
  elevationMaxM: 2000,
  /** RLF factors were derived at this elevation, m. */
  derivationElevationM: 50,
  /** "Warm/hot. Design-day average outdoor temperature assumed to be above indoor design temperature." */
  climate: "design-day average outdoor temperature above the indoor design temperature",
  /** "Lightweight residential construction (wood or metal framing, wood or stucco siding). May be applied to masonry veneer over frame construction; results are conservative. Use RHB for structural masonry or unconventional construction." */
  construction: "lightweight frame",
  /** "0 to 15% of floor area on any façade, 0 to 30% of floor area total." */
  fenestrationFractionOfFloorAreaMaxPerFacade: 0.15,
  fenestrationFractionOfFloorAreaMaxTotal: 0.3,
  /** "Vertical or horizontal. Skylights with tilt less than 30° can be treated as horizontal." */
  skylightMaxTiltForHorizontalDeg: 30,
  /** "Residential. Applications with high internal gains and/or high occupant density should be analyzed with RHB or nonresidential procedures." */
  occupancy: "residential",
  /** "Temperature swing 1.7 K" (the row is printed without notes). */
  temperatureSwingK: 1.7,
  /** "Typical. Applications with extensive duct runs in unconditioned spaces should be analyzed with RHB." */
  distributionLosses: "typical",
} as const;

// ---------------------------------------------------------------------------------------------
// Infiltration: Table 3, eq. 9–10, Table 5; ventilation eq. 11.

/** Table 3 "Unit Leakage Areas" A_ul, cm² per m² of exposed surface (p. 17.5). */
export const UNIT_LEAKAGE_AREA_CM2_PER_M2 = {
  /** Construction supervised by air-sealing specialist. */
  tight: 0.7,
  /** Carefully sealed construction by knowledgeable builder. */
  good: 1.4,
  /** Typical current production housing. */
  average: 2.8,
  /** Typical pre-1970 houses. */
  leaky: 5.6,
  /** Old houses in original condition. */
  "very-leaky": 10.4,
} as const;
export type ConstructionQuality = keyof typeof UNIT_LEAKAGE_AREA_CM2_PER_M2;

/**
 * Eq. 10 coefficients (p. 17.5): IDF = [I0·(1 + I2·A_L,flue/A_L) + I1·H·Δt] / 1000, L/(s·cm²), H in m,
 * Δt in K; cooling at 3.4 m/s wind, heating at 6.7 m/s. The stored copy garbles the equation's layout
 * ("([I + I2(A_L,flue/A_L)] I0 + H Δt 1)/1000"); with A_L,flue = 0 the form I0 + I1·H·Δt reproduces
 * every Table 5 cell but one (below). Where the flue term multiplies only I0 is our reading of the
 * garbled bracket. Valid "for typical suburban residential wind sheltering, A_L,flue < A_L/2, and at
 * any elevation".
 */
export const IDF_COEFFICIENTS = {
  cooling: { i0: 25, i1: 0.38, i2: 0.12 },
  heating: { i0: 51, i1: 0.35, i2: 0.23 },
} as const;

/** Typical stack height per story, m (ch. 17 eq. 10: "H = building average stack height, m (typically 2.5 m per story)"). */
export const STACK_HEIGHT_PER_STORY_M = 2.5;

/**
 * Table 5 "Typical IDF Values, L/(s·cm²)" (p. 17.5), derived by the chapter with eq. 10 and A_L,flue = 0
 * (indoor 20 °C heating, 24 °C cooling). Kept for checking eq. 10; the procedure uses eq. 10 itself.
 * Unclear cell: H = 7 m at 35 °C is printed 0.051, where eq. 10 gives 0.054 and the neighbours
 * (0.050 at 6 m, 0.058 at 8 m) suggest 0.054.
 */
export const TABLE_5_IDF = {
  stackHeightsM: [2.5, 3, 4, 5, 6, 7, 8],
  heatingOutdoorC: [-40, -30, -20, -10, 0, 10],
  coolingOutdoorC: [30, 35, 40],
  /** Rows by stack height; heating columns then cooling columns. */
  values: [
    [0.1, 0.095, 0.086, 0.077, 0.069, 0.06, 0.031, 0.035, 0.04],
    [0.11, 0.1, 0.093, 0.083, 0.072, 0.061, 0.032, 0.038, 0.043],
    [0.14, 0.12, 0.11, 0.093, 0.079, 0.065, 0.034, 0.042, 0.049],
    [0.16, 0.14, 0.12, 0.1, 0.086, 0.069, 0.036, 0.046, 0.055],
    [0.18, 0.16, 0.14, 0.11, 0.093, 0.072, 0.039, 0.05, 0.061],
    [0.2, 0.17, 0.15, 0.12, 0.1, 0.075, 0.041, 0.051, 0.068],
    [0.22, 0.19, 0.16, 0.14, 0.11, 0.079, 0.043, 0.058, 0.074],
  ],
} as const;

/** Eq. 11 (ASHRAE 62.2 as quoted in ch. 17): Q_v = 0.15·A_cf + 3.5·(N_br + 1), L/s, A_cf in m², N_br not less than 1. */
export const VENTILATION_EQ_11 = { lpsPerM2: 0.15, lpsPerBedroomPlusOne: 3.5 } as const;

// ---------------------------------------------------------------------------------------------
// Opaque surfaces: Table 7 (eq. 21), Table 8.

export type OpaqueFactorRow =
  | "ceiling-or-wall-adjacent-to-vented-attic"
  | "ceiling-roof-assembly"
  | "wall-or-door-sunlit"
  | "wall-or-door-shaded"
  | "floor-over-ambient"
  | "floor-over-crawlspace";

/**
 * Table 7 "Opaque Surface Cooling Factor Coefficients" (p. 17.8), for CF = U·(OF_t·Δt + OF_b + OF_r·DR)
 * (eq. 21). OF_b, K, is `ofbK + ofbPerRoofAbsorptanceK × α_roof`. The stored copy splits the attic rows'
 * OF_b over two columns ("14.3α_roof | – 4.5"); read as 14.3·α_roof − 4.5, which gives the example's 7.66
 * at α_roof = 0.85 (Table 20).
 */
export const TABLE_7_OPAQUE_FACTORS: Readonly<
  Record<OpaqueFactorRow, { oft: number; ofbPerRoofAbsorptanceK: number; ofbK: number; ofr: number }>
> = {
  "ceiling-or-wall-adjacent-to-vented-attic": {
    oft: 0.62,
    ofbPerRoofAbsorptanceK: 14.3,
    ofbK: -4.5,
    ofr: -0.19,
  },
  "ceiling-roof-assembly": { oft: 1, ofbPerRoofAbsorptanceK: 38.3, ofbK: -7.0, ofr: -0.36 },
  "wall-or-door-sunlit": { oft: 1, ofbPerRoofAbsorptanceK: 0, ofbK: 8.2, ofr: -0.36 },
  "wall-or-door-shaded": { oft: 1, ofbPerRoofAbsorptanceK: 0, ofbK: 0, ofr: -0.36 },
  "floor-over-ambient": { oft: 1, ofbPerRoofAbsorptanceK: 0, ofbK: 0, ofr: -0.06 },
  "floor-over-crawlspace": { oft: 0.33, ofbPerRoofAbsorptanceK: 0, ofbK: 0, ofr: -0.28 },
};

/** Table 8 "Roof Solar Absorptance α_roof" (p. 17.8; from Parker et al. 2000). Elastomeric coating: white only. */
export const TABLE_8_ROOF_ABSORPTANCE = {
  "asphalt-shingles": { white: 0.75, light: 0.75, medium: 0.85, dark: 0.92 },
  tile: { white: 0.3, light: 0.4, medium: 0.8, dark: 0.8 },
  metal: { white: 0.35, light: 0.5, medium: 0.7, dark: 0.9 },
  "elastomeric-coating": { white: 0.3 },
} as const;

// Slab floors, eq. 22–23 (CF_slab = 1.9 − 1.4/(R_cvr + 0.12) W/m²) and the floor-covering resistances: lib/load/slab.ts,
// shared with the hourly method.

// ---------------------------------------------------------------------------------------------
// Fenestration: eq. 25, Tables 9–14.

/** Eq. 25 (p. 17.8): CF_fen = U·(Δt − 0.46·DR) + PXI·SHGC·IAC·FF_s. */
export const FENESTRATION_DAILY_RANGE_FACTOR = 0.46;

/** Latitude columns of Tables 10 and 12, °N. */
export const TABLE_LATITUDES_DEG = [20, 25, 30, 35, 40, 45, 50, 55, 60] as const;

/** Folded vertical exposures of Tables 10 and 12: N, NE/NW, E/W, SE/SW, S (index = folded azimuth from north / 45°). */
export const FOLDED_EXPOSURES = [
  "north",
  "northeast-northwest",
  "east-west",
  "southeast-southwest",
  "south",
] as const;
export type FoldedExposure = (typeof FOLDED_EXPOSURES)[number];

/**
 * Table 9 "Peak Irradiance Equations" (p. 17.9), vertical surfaces, W/m²:
 *   E_t = 423.5 + 1240φ − 5143φ³ + 3191φ⁴ + 35.25φL + 0.1427φL² − 12.89L − 0.6172L² + 0.7802L²/(φ + 1)
 *   E_d = min(E_t, 356.3 − 37.73φ² + 0.3022φL − 115.9·L^¼/(φ + 1)),  E_D = E_t − E_d
 * with L the latitude, °N. Reading notes (the stored copy garbles the layout of both equations):
 * - φ, "normalized exposure, 0–1", is printed as ψ/180 with "ψ = exposure (surface azimuth), ° from south
 *   (–180 to +180)". The equations reproduce Table 10 only with φ = 0 for north and φ = 1 for south, i.e.
 *   φ = (angle of the exposure from north, 0–180°)/180 = 1 − |ψ|/180; that is what is used.
 * - In E_d the exponent of φ in the 37.73 term (²) and the fourth root of L in the 115.9 term are
 *   our reading of scattered characters ("2", "4"); with them, and only with them among the readings
 *   tried, every Table 10 cell for 25–60° is reproduced within 0.6 W/m² (tests/unit/load/rlf-procedure.test.ts).
 */
export function table9VerticalPeakIrradianceWm2(
  phi: number,
  latitudeDeg: number,
): { totalWm2: number; diffuseWm2: number } {
  const L = latitudeDeg;
  const L2 = L * L;
  const phi3 = phi * phi * phi;
  const totalWm2 =
    423.5 +
    1240 * phi -
    5143 * phi3 +
    3191 * phi3 * phi +
    35.25 * phi * L +
    0.1427 * phi * L2 -
    12.89 * L -
    0.6172 * L2 +
    (0.7802 * L2) / (phi + 1);
  const diffuse =
    356.3 - 37.73 * phi * phi + 0.3022 * phi * L - (115.9 * Math.sqrt(Math.sqrt(L))) / (phi + 1);
  return { totalWm2, diffuseWm2: Math.min(totalWm2, diffuse) };
}

/** Table 9, horizontal surfaces (p. 17.9): E_t = 816.2 + 10.20L − 0.1806L², E_d = min(E_t, 170), W/m². */
export function table9HorizontalPeakIrradianceWm2(latitudeDeg: number): {
  totalWm2: number;
  diffuseWm2: number;
} {
  const L = latitudeDeg;
  const totalWm2 = 816.2 + 10.2 * L - 0.1806 * L * L;
  return { totalWm2, diffuseWm2: Math.min(totalWm2, 170) };
}

export interface PeakIrradianceRow {
  /** E_D, direct, W/m², one value per TABLE_LATITUDES_DEG column. */
  directWm2: readonly number[];
  /** E_d, diffuse, W/m². */
  diffuseWm2: readonly number[];
  /** E_t, total, W/m². */
  totalWm2: readonly number[];
}

/**
 * Table 10 "Peak Irradiance, W/m²" (p. 17.9), latitudes 25° to 60° as read.
 *
 * Unclear in the stored copy: its header reads 20° … 60° (nine columns) and each row has nine values,
 * but the ninth repeats the first, and the values sit one column to the left: the Table 9 equations
 * (above) reproduce each value at the next latitude up (e.g. horizontal E_t 958 at 25°, not 20°;
 * 948 at 20°), and the chapter's example, "approximating site latitude as 35°N, Table 10 shows
 * E_D = 570 and E_d = 164 W/m² for west exposure", finds under 35° what the copy prints under 30°.
 * The values are therefore read as the 25° to 60° columns and the repeated ninth is dropped; the 20°
 * column, lost in the copy, is computed from Table 9 and rounded to whole W/m² as the table prints
 * (`TABLE_10_PEAK_IRRADIANCE` below).
 */
export const TABLE_10_AS_READ_25_TO_60: Readonly<Record<FoldedExposure | "horizontal", PeakIrradianceRow>> = {
  north: {
    directWm2: [106, 98, 98, 104, 117, 138, 167, 203],
    diffuseWm2: [97, 85, 74, 65, 56, 48, 41, 34],
    totalWm2: [203, 183, 172, 169, 174, 187, 208, 237],
  },
  "northeast-northwest": {
    directWm2: [442, 442, 444, 447, 451, 457, 465, 474],
    diffuseWm2: [149, 139, 131, 124, 117, 111, 106, 100],
    totalWm2: [590, 582, 575, 571, 568, 568, 570, 574],
  },
  "east-west": {
    directWm2: [524, 548, 570, 590, 608, 624, 638, 651],
    diffuseWm2: [178, 171, 164, 159, 154, 149, 145, 141],
    totalWm2: [702, 719, 734, 748, 761, 773, 783, 792],
  },
  "southeast-southwest": {
    directWm2: [299, 355, 407, 455, 499, 540, 577, 610],
    diffuseWm2: [193, 187, 182, 178, 174, 170, 167, 164],
    totalWm2: [492, 542, 589, 632, 673, 710, 744, 775],
  },
  south: {
    directWm2: [21, 114, 203, 286, 365, 439, 509, 574],
    diffuseWm2: [197, 192, 188, 185, 182, 180, 177, 175],
    totalWm2: [218, 306, 391, 471, 547, 619, 686, 749],
  },
  horizontal: {
    directWm2: [788, 790, 782, 765, 739, 705, 661, 608],
    diffuseWm2: [170, 170, 170, 170, 170, 170, 170, 170],
    totalWm2: [958, 960, 952, 935, 909, 875, 831, 778],
  },
};

/** The 20° column, computed from Table 9 (the stored copy lost it), rounded to whole W/m² as Table 10 prints. */
function column20(exposure: FoldedExposure | "horizontal"): {
  direct: number;
  diffuse: number;
  total: number;
} {
  const e =
    exposure === "horizontal"
      ? table9HorizontalPeakIrradianceWm2(20)
      : table9VerticalPeakIrradianceWm2(FOLDED_EXPOSURES.indexOf(exposure) / 4, 20);
  const total = Math.round(e.totalWm2);
  const diffuse = Math.round(e.diffuseWm2);
  return { direct: total - diffuse, diffuse, total };
}

function withColumn20(exposure: FoldedExposure | "horizontal"): PeakIrradianceRow {
  const read = TABLE_10_AS_READ_25_TO_60[exposure];
  const c = column20(exposure);
  return {
    directWm2: [c.direct, ...read.directWm2],
    diffuseWm2: [c.diffuse, ...read.diffuseWm2],
    totalWm2: [c.total, ...read.totalWm2],
  };
}

/** Table 10 at every TABLE_LATITUDES_DEG column (20° computed from Table 9, 25–60° as read). */
export const TABLE_10_PEAK_IRRADIANCE: Readonly<Record<FoldedExposure | "horizontal", PeakIrradianceRow>> = {
  north: withColumn20("north"),
  "northeast-northwest": withColumn20("northeast-northwest"),
  "east-west": withColumn20("east-west"),
  "southeast-southwest": withColumn20("southeast-southwest"),
  south: withColumn20("south"),
  horizontal: withColumn20("horizontal"),
};

/**
 * Table 11 "Exterior Attachment Transmission" T_x (p. 17.9): none 1.0; exterior insect screen 0.64
 * ("see Chapter 15, Table 13G"); shade screen: the manufacturer's shading coefficient, "typically 0.4 to 0.6".
 */
export const TABLE_11_EXTERIOR_TRANSMISSION = {
  none: 1.0,
  insectScreen: 0.64,
  shadeScreenTypical: { min: 0.4, max: 0.6 },
} as const;

/**
 * Table 12 "Shade Line Factors (SLFs)" (p. 17.9), July 21, by folded exposure and TABLE_LATITUDES_DEG.
 * Read as printed (nine distinct values a row, no repeat, unlike Table 10; the example's "west exposure
 * and latitude 34°, SLF = 1.1" is consistent). Shadow length below an overhang = SLF × D_oh.
 */
export const TABLE_12_SHADE_LINE_FACTORS: Readonly<Record<FoldedExposure, readonly number[]>> = {
  north: [2.8, 2.1, 1.4, 1.5, 1.7, 1.0, 0.8, 0.9, 0.8],
  "northeast-northwest": [1.4, 1.5, 1.6, 1.2, 1.3, 1.3, 0.9, 0.9, 0.8],
  "east-west": [1.2, 1.2, 1.1, 1.1, 1.1, 1.0, 1.0, 0.9, 0.8],
  "southeast-southwest": [2.1, 1.8, 2.0, 1.7, 1.5, 1.6, 1.4, 1.2, 1.1],
  south: [20.0, 14.0, 6.9, 4.7, 3.3, 2.7, 2.1, 1.7, 1.4],
};

/** The eight compass exposures of Table 13, clockwise from north (index = azimuth / 45°). */
export const COMPASS_EXPOSURES = [
  "north",
  "northeast",
  "east",
  "southeast",
  "south",
  "southwest",
  "west",
  "northwest",
] as const;
export type CompassExposure = (typeof COMPASS_EXPOSURES)[number];

export type BuildingType = "single-family-detached" | "multifamily";

/** Table 13 "Fenestration Solar Load Factors FF_s" (pp. 17.9–17.10), by COMPASS_EXPOSURES order, then horizontal. */
export const TABLE_13_SOLAR_LOAD_FACTORS: Readonly<
  Record<BuildingType, { vertical: readonly number[]; horizontal: number }>
> = {
  "single-family-detached": { vertical: [0.44, 0.21, 0.31, 0.37, 0.47, 0.58, 0.56, 0.46], horizontal: 0.58 },
  multifamily: { vertical: [0.27, 0.43, 0.56, 0.54, 0.53, 0.61, 0.65, 0.57], horizontal: 0.73 },
};

/** Eq. 29 (p. 17.10): IAC = 1 + F_cl·(IAC_cl − 1), F_cl the fraction of the shade closed (0 to 1). */
export function interiorAttenuationCoefficient(closedIac: number, fractionClosed: number): number {
  return 1 + fractionClosed * (closedIac - 1);
}

export const TABLE_14_SHADES = [
  "drapes-open-weave-light",
  "drapes-closed-weave-dark",
  "drapes-closed-weave-light",
  "roller-shade-opaque-dark",
  "roller-shade-opaque-white",
  "roller-shade-translucent-light",
  "blinds-medium",
  "blinds-white",
] as const;
export type InteriorShade = (typeof TABLE_14_SHADES)[number];

/**
 * Table 14 "Interior Attenuation Coefficients (IAC_cl)" (p. 17.10), by glazing (ch. 15 identifier) in the
 * order of TABLE_14_SHADES. Unclear in the stored copy: the header's group labels (drapes, roller shades,
 * blinds) are run together; the column order is read as drapes (open-weave light, closed-weave dark,
 * closed-weave light), roller shades (opaque dark, opaque white, translucent light), blinds (medium,
 * white), which puts the example's "closed-weave light drape" on low-e low-solar glass (25a) at 0.68,
 * as Table 17 prints.
 */
export const TABLE_14_IAC_CLOSED: Readonly<Record<string, readonly number[]>> = {
  "1a-single-clear": [0.64, 0.71, 0.45, 0.64, 0.34, 0.44, 0.74, 0.66],
  "1c-single-heat-absorbing": [0.68, 0.72, 0.5, 0.67, 0.4, 0.49, 0.76, 0.69],
  "5a-double-clear": [0.72, 0.81, 0.57, 0.76, 0.48, 0.55, 0.82, 0.74],
  "17c-double-low-e-high-solar": [0.76, 0.86, 0.64, 0.82, 0.57, 0.62, 0.86, 0.79],
  "25a-double-low-e-low-solar": [0.79, 0.88, 0.68, 0.85, 0.6, 0.66, 0.88, 0.82],
  "5c-double-heat-absorbing": [0.73, 0.82, 0.59, 0.77, 0.51, 0.58, 0.83, 0.76],
};

// ---------------------------------------------------------------------------------------------
// Internal gains, eq. 30–31 (p. 17.10): W, A_cf in m², N_oc occupants ("if unknown, estimate as N_br + 1").

export const INTERNAL_GAINS_EQ_30_31 = {
  sensible: { constantW: 136, perM2W: 2.2, perOccupantW: 22 },
  latent: { constantW: 20, perM2W: 0.22, perOccupantW: 12 },
} as const;

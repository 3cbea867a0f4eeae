/**
 * Assembly U-factors from a base-assembly library plus the user's added insulation
 * (parallel-path method, HoF 2021 ch. 27/26: U = Σ fᵢ / Rᵢ over the framing and cavity paths,
 * each path's R the sum of its layers in series).
 *
 * Material and film resistances (h·ft²·°F/Btu), checked against HoF 2021 SI ch. 26 read in a
 * stored Markdown copy of the SI chapter (SI values × 5.678 = IP; tests/unit/load/material-resistances.test.ts):
 * - surface films, ch. 26 Table 10 (nonreflective, ε 0.90; R = 1/h): inside vertical 0.68
 *   (h 8.29 W/m²·K), heat flow up 0.61 (9.26), heat flow down 0.92 (6.13), 45° slope up 0.62
 *   (9.09) / down 0.76 (7.50); outside winter 6.7 m/s (15 mph) 0.17 (h 34.0), outside summer
 *   3.4 m/s (7.5 mph) 0.25 (h 22.7).
 * - materials, ch. 26 Table 1: gypsum or plaster board ½ in 0.45 (k 0.16 W/m·K); OSB 7/16 in
 *   0.62 (9 to 11 mm, R 0.11 m²·K/W); plywood ¾ in 1.08 (19.0 mm, R 0.19); vinyl siding
 *   hollow-backed 0.62 (R 0.11); asphalt shingles 0.44 (R 0.078); stucco ⅞ in 0.18 (cement
 *   plaster, sand aggregate, k 0.72); 8 in hollow normal-weight block 1.1 (printed range
 *   0.17–0.20 m²·K/W = 0.97–1.14 for 2 or 3 cores; 1.1 used), perlite-filled
 *   cores 1.99 (R 0.35; was 2.0 from memory); softwood 1.25 per inch (as ch. 27 Example 3
 *   uses, below, and the 90.1 Appendix A convention; inside Table 1's hem/fir and spruce/pine/fir range,
 *   k 0.11–0.13 W/m·K = 1.11–1.31 per inch; Douglas fir and southern pine, k 0.14–0.16, are
 *   lower, about 0.9–1.0 per inch).
 * - unventilated vertical air space ¾–3½ in about 1.0: our rounded value inside ch. 26 Table 3
 *   (20 to 90 mm, vertical, ε 0.82: 0.13–0.27 m²·K/W = 0.8–1.5 by mean temperature).
 * - framing fractions: walls 25 % at 16 in o.c., 22 % at 24 in — HoF 2021 SI ch. 27 (read in a
 *   stored copy, p. 27.3: studs, plates and sills 0.21 / 0.18 plus headers 0.04, cavity 0.75 /
 *   0.78), which is also the 90.1 Appendix A convention (from memory); attic ceilings 85 %
 *   full-depth insulation, 5 % half depth (eaves), 10 % joist (truss chord); rafters and floor
 *   joists 10 % at 16 in, 7 % at 24 in (from memory).
 * - softwood 1.25 per inch is also what HoF 2021 ch. 27 Example 3 uses: a 38 × 90 mm stud at
 *   R 0.77 m²·K/W = 4.37 h·ft²·°F/Btu for 3.5 in (read); the wall test reproduces that example.
 *
 * Walls follow the 90.1 Appendix A wall convention (films, siding, studs and cavity, gypsum; the
 * structural sheathing is not counted), which reproduces its published U-factors and errs a few
 * per cent high (conservative) for a sheathed wall.
 */
import type {
  CeilingConstruction,
  FloorConstruction,
  RoofConstruction,
  WallBaseAssembly,
  WallConstruction,
} from "./input";

export const FILM_R = {
  insideVertical: 0.68,
  insideHeatFlowUp: 0.61,
  insideHeatFlowDown: 0.92,
  insideSlopedUp: 0.62,
  insideSlopedDown: 0.76,
  outsideWinter: 0.17,
  outsideSummer: 0.25,
} as const;

export const MATERIAL_R = {
  gypsumHalfInch: 0.45,
  osbSevenSixteenthsInch: 0.62,
  plywoodThreeQuarterInch: 1.08,
  vinylSiding: 0.62,
  asphaltShingles: 0.44,
  softwoodPerInch: 1.25,
  cmu8inHollow: 1.1,
  cmu8inCoreFilled: 1.99,
  stuccoSevenEighthsInch: 0.18,
  airSpaceVertical: 1.0,
  /**
   * Blown loose-fill insulation per inch, used only to find how much lies over a ceiling joist: our
   * middle value between HoF 2021 ch. 26 Table 1 attic glass fiber (k 0.052–0.055 W/m·K, 2.6–2.8
   * per inch) and attic cellulose (k 0.039–0.040, 3.6–3.7 per inch).
   */
  looseFillPerInch: 3.1,
} as const;

export type Season = "heating" | "cooling";
export type MassClass = "light-frame" | "masonry";

interface Path {
  fraction: number;
  r: number;
}

/** Parallel-path U-factor: U = Σ fᵢ/Rᵢ (HoF 2021 ch. 27, the method it gives for wood-frame walls; read). */
export function parallelPathU(paths: readonly Path[]): number {
  let u = 0;
  for (const p of paths) u += p.fraction / p.r;
  return u;
}

function outsideFilm(season: Season): number {
  return season === "heating" ? FILM_R.outsideWinter : FILM_R.outsideSummer;
}

interface WallBase {
  kind: "wood" | "cmu";
  /** Stud or furring depth, in. */
  framingDepthIn: number;
  framingFraction: number;
  /** Mass class for the cooling time lag. */
  mass: MassClass;
  /** R of the block itself (cmu only). */
  blockR?: number;
}

const WALL_BASES: Record<WallBaseAssembly, WallBase> = {
  "wood-2x4-16in-oc": { kind: "wood", framingDepthIn: 3.5, framingFraction: 0.25, mass: "light-frame" },
  "wood-2x4-24in-oc": { kind: "wood", framingDepthIn: 3.5, framingFraction: 0.22, mass: "light-frame" },
  "wood-2x6-16in-oc": { kind: "wood", framingDepthIn: 5.5, framingFraction: 0.25, mass: "light-frame" },
  "wood-2x6-24in-oc": { kind: "wood", framingDepthIn: 5.5, framingFraction: 0.22, mass: "light-frame" },
  // Block walls: interior 1½ in wood furring at 24 in o.c. (10 %, from memory) holds any cavity insulation.
  "cmu-8in-hollow": {
    kind: "cmu",
    framingDepthIn: 1.5,
    framingFraction: 0.1,
    mass: "masonry",
    blockR: MATERIAL_R.cmu8inHollow,
  },
  "cmu-8in-core-filled": {
    kind: "cmu",
    framingDepthIn: 1.5,
    framingFraction: 0.1,
    mass: "masonry",
    blockR: MATERIAL_R.cmu8inCoreFilled,
  },
};

export function wallMassClass(baseId: WallBaseAssembly): MassClass {
  return WALL_BASES[baseId].mass;
}

/** Wall U-factor, Btu/h·ft²·°F, for a base assembly plus added cavity/continuous insulation. */
export function wallU(construction: WallConstruction, season: Season = "heating"): number {
  if (construction.uFactor !== undefined) return construction.uFactor;
  const base = WALL_BASES[construction.baseId];
  const framingR = base.framingDepthIn * MATERIAL_R.softwoodPerInch;
  const cavityR = construction.cavityR > 0 ? construction.cavityR : MATERIAL_R.airSpaceVertical;
  const exteriorR =
    base.kind === "wood" ? MATERIAL_R.vinylSiding : MATERIAL_R.stuccoSevenEighthsInch + (base.blockR ?? 0);
  const seriesR =
    outsideFilm(season) +
    exteriorR +
    construction.continuousR +
    MATERIAL_R.gypsumHalfInch +
    FILM_R.insideVertical;
  return parallelPathU([
    { fraction: 1 - base.framingFraction, r: seriesR + cavityR },
    { fraction: base.framingFraction, r: seriesR + framingR },
  ]);
}

/**
 * Ceiling under a vented attic, heat flow up (heating) or down (cooling): 85 % full-depth
 * insulation, 5 % half depth at the eaves, 10 % over the 3½ in truss chord (90.1 Appendix A
 * convention, from memory). The attic side has a still-air film.
 */
export function ceilingU(construction: CeilingConstruction, season: Season = "heating"): number {
  if (construction.uFactor !== undefined) return construction.uFactor;
  const joistFraction = construction.baseId === "attic-joists-16in-oc" ? 0.13 : 0.1;
  const chordDepthIn = 3.5;
  const film = season === "heating" ? 2 * FILM_R.insideHeatFlowUp : 2 * FILM_R.insideHeatFlowDown;
  const series = film + MATERIAL_R.gypsumHalfInch + construction.continuousR;
  const insulR = construction.cavityR;
  // Over the joist: the joist plus whatever insulation lies above its top.
  const insulDepthIn = insulR / MATERIAL_R.looseFillPerInch;
  const overJoistR = Math.max(0, insulDepthIn - chordDepthIn) * MATERIAL_R.looseFillPerInch;
  const emptyR = insulR > 0 ? 0 : MATERIAL_R.airSpaceVertical; // an uninsulated ceiling still has an air layer
  const fullFraction = 0.9 - joistFraction + 0.05; // 85 % at 24 in o.c.
  return parallelPathU([
    { fraction: fullFraction, r: series + insulR + emptyR },
    { fraction: 0.05, r: series + insulR / 2 + emptyR },
    { fraction: joistFraction, r: series + chordDepthIn * MATERIAL_R.softwoodPerInch + overJoistR },
  ]);
}

const RAFTER_DEPTH_IN = {
  "roof-rafters-2x8-24in-oc": 7.25,
  "roof-rafters-2x10-24in-oc": 9.25,
  "roof-rafters-2x12-24in-oc": 11.25,
} as const;

/**
 * Insulated roof on rafters, 24 in o.c. (7 % framing, from memory): shingles, OSB deck, cavity
 * (or air), continuous insulation, and either a gypsum ceiling (vaulted) or an open underside
 * (encapsulated attic deck).
 */
export function roofU(
  construction: RoofConstruction,
  options: { season: Season; gypsumCeiling: boolean; includeOutsideFilm?: boolean },
): number {
  if (construction.uFactor !== undefined) return construction.uFactor;
  const depthIn = RAFTER_DEPTH_IN[construction.baseId];
  const framingFraction = 0.07;
  const insideFilm = options.season === "heating" ? FILM_R.insideSlopedUp : FILM_R.insideSlopedDown;
  const out = options.includeOutsideFilm === false ? 0 : outsideFilm(options.season);
  const series =
    out +
    MATERIAL_R.asphaltShingles +
    MATERIAL_R.osbSevenSixteenthsInch +
    construction.continuousR +
    (options.gypsumCeiling ? MATERIAL_R.gypsumHalfInch : 0) +
    insideFilm;
  const cavityR = construction.cavityR > 0 ? construction.cavityR : MATERIAL_R.airSpaceVertical;
  return parallelPathU([
    { fraction: 1 - framingFraction, r: series + cavityR },
    { fraction: framingFraction, r: series + depthIn * MATERIAL_R.softwoodPerInch },
  ]);
}

/** Bare roof deck of a vented attic (shingles + OSB + attic-side film), outside film excluded (sol-air supplies it). */
export function ventedRoofDeckUWithoutOutsideFilm(): number {
  return 1 / (MATERIAL_R.asphaltShingles + MATERIAL_R.osbSevenSixteenthsInch + FILM_R.insideSlopedDown);
}

/**
 * Framed floor over unconditioned space: carpetless ¾ in plywood subfloor, joists 9¼ in (2x10)
 * at 16 in (10 %) or 24 in (7 %) o.c., still-air films both sides, or an outdoor film below.
 */
export function floorU(
  construction: FloorConstruction,
  underside: "still-air" | "outdoors",
  season: Season = "heating",
): number {
  if (construction.uFactor !== undefined) return construction.uFactor;
  const framingFraction = construction.baseId === "floor-joists-2x10-24in-oc" ? 0.07 : 0.1;
  const depthIn = 9.25;
  const filmAbove = season === "heating" ? FILM_R.insideHeatFlowDown : FILM_R.insideHeatFlowUp;
  const filmBelow = underside === "outdoors" ? outsideFilm(season) : filmAbove;
  const series = filmAbove + MATERIAL_R.plywoodThreeQuarterInch + construction.continuousR + filmBelow;
  const cavityR = construction.cavityR > 0 ? construction.cavityR : MATERIAL_R.airSpaceVertical;
  return parallelPathU([
    { fraction: 1 - framingFraction, r: series + cavityR },
    { fraction: framingFraction, r: series + depthIn * MATERIAL_R.softwoodPerInch },
  ]);
}

// ---------------------------------------------------------------------------------------------
// Slabs and foundation walls.

/** 1 W/(m·K) in Btu/(h·ft·°F) (NIST SP 811: 1 Btu/(h·ft·°F) = 1.730735 W/(m·K)). */
export const BTUH_FT_F_PER_W_M_K = 1 / 1.730735;

/**
 * Slab-on-grade perimeter heat loss coefficients F_p, HoF 2021 SI ch. 18 Table 24 (read in a stored
 * copy, p. 18.39), W/(m·K), by the foundation wall under the slab edge, uninsulated or with
 * m²·K/W (R-5.4 h·ft²·°F/Btu) from the slab edge to the footer. Used with eq. 40–41:
 * q = p·F_p·Δt.
 */
export const SLAB_EDGE_F_P_W_M_K = {
  "block-8in-brick-facing": { uninsulated: 1.17, insulated: 0.86 },
  "block-4in-brick-facing": { uninsulated: 1.45, insulated: 0.85 },
  "metal-stud-stucco": { uninsulated: 2.07, insulated: 0.92 },
  "poured-concrete-perimeter-duct": { uninsulated: 3.67, insulated: 1.24 },
} as const;
export type SlabEdgeConstruction = keyof typeof SLAB_EDGE_F_P_W_M_K;
/** The edge insulation of the table's insulated case, h·ft²·°F/Btu (R-0.95 m²·K/W × 5.678). */
export const SLAB_TABLE_INSULATED_R = 0.95 * 5.678;

/**
 * F-factor of a slab edge, Btu/h·ft·°F: the Table 24 value of its construction, uninsulated or
 * insulated. Between R-0 and the table's our linear interpolation in R; above the
 * table's insulated value is kept (it gives nothing for more insulation, so the loss is then
 * overstated a little — conservative for heating).
 */
export function slabFFactor(
  edgeInsulationR: number,
  construction: SlabEdgeConstruction = "block-8in-brick-facing",
): number {
  const row = SLAB_EDGE_F_P_W_M_K[construction];
  const t = Math.min(1, edgeInsulationR / SLAB_TABLE_INSULATED_R);
  return (row.uninsulated + t * (row.insulated - row.uninsulated)) * BTUH_FT_F_PER_W_M_K;
}

/**
 * Soil conductivity for below-grade heat loss, Btu/h·ft·°F: HoF 2021 SI ch. 26 Table 8 (read in a
 * stored copy), "high" design value, "moderately conservative ... for maximum heat loss (e.g., peak
 * winter heat loss calculations for a basement)": 2.25 W/(m·K) for sands, silts and loams (clays
 * 1.56), taken because the soil is not known; ÷ 1.7307 = 1.30. Was 0.8 (from memory).
 */
const SOIL_CONDUCTIVITY_BTUH_FT_F = 1.3;

/**
 * Below-grade concrete wall, Btu/h·ft²·°F to the ground temperature: inside film 0.68, 8 in
 * concrete (C-factor 1.14 → R 0.88, 90.1 Appendix A, from memory; HoF 2021 ch. 26 Table 1 gives
 * sand-and-gravel concretes k 1.3–2.9 W/(m·K), i.e. R 0.40–0.89 for 8 in, so 0.88 is its top),
 * added continuous insulation, and an effective soil resistance of half the depth over the soil
 * conductivity: our one-line simplification of HoF 2021 ch. 18 eq. 38 (read), which it matches
 * within +1 to +8 % (higher, so conservative) from 1 to 8 ft deep, uninsulated or R-10, at the
 * same soil conductivity (tests/unit/load/material-resistances.test.ts). Ch. 18 itself tabulates
 * at k 1.4 W/(m·K), "a typical value"; we take ch. 26's high design value for peak heat loss.
 */
export function belowGradeWallU(insulationR: number, depthBelowGradeFt: number): number {
  const soilR = (0.5 * depthBelowGradeFt) / SOIL_CONDUCTIVITY_BTUH_FT_F;
  return 1 / (FILM_R.insideVertical + 0.88 + insulationR + soilR);
}

/** Above-grade part of a concrete foundation wall, Btu/h·ft²·°F. */
export function aboveGradeFoundationWallU(insulationR: number, season: Season = "heating"): number {
  return 1 / (outsideFilm(season) + 0.88 + insulationR + FILM_R.insideVertical);
}

/**
 * Radiant time series (RTS) of the 2021 ASHRAE Handbook—Fundamentals, SI edition, ch. 18
 * ("Nonresidential Cooling and Heating Load Calculations"), section 6, read in a stored Markdown
 * copy of the chapter:
 *
 * - a heat gain is split into a convective part, which is cooling load in the hour it arrives,
 *   and a radiant part, which surfaces absorb and give back to the air over the next 23 hours
 *   (§6.1, §6.3 steps 2–4; Table 14 for the split);
 * - the radiant cooling load is Q_r,θ = r₀·q_r,θ + r₁·q_r,θ−1 + … + r₂₃·q_r,θ−23 (eq. 33), on a
 *   design day that repeats every 24 h (§6.1 "steady-periodic conditions");
 * - "solar" RTS for beam solar gain through glass without interior shading (assumed to land on the
 *   floor and furnishings), "nonsolar" RTS for everything else: people, lights, appliances,
 *   conduction through walls, roofs, floors and glass, diffuse solar, and beam solar behind
 *   interior shading (§6.6 text beside Table 16);
 * - by definition each series totals 100 % (§6.2).
 *
 * Ch. 18 is written for nonresidential zones at a fixed set point; ch. 17 (residential, read in the
 * same store) warns that "direct application of nonresidential methods (based on a fixed set
 * point) results in unrealistically high cooling loads for residential applications" (§3) and
 * gives no residential RTS of its own. These series are a tool for the engine's design estimate,
 * not the handbook's residential procedure.
 *
 * Units: the series are dimensionless fractions; the convolution keeps the unit of its input
 * (the engine passes Btu/h).
 */
import { LoadInputError } from "../errors";

/** Hours in the periodic design day; index 0 is the current hour, j is j hours ago. */
export const HOURS_PER_DAY = 24;

export type ZoneMass = "light" | "medium" | "heavy";

/** One printed column of HoF 2021 ch. 18 Table 19 or Table 20, percent per hour (hour 0 first). */
export interface PrintedRadiantTimeSeries {
  /** The column's number counting left to right (1–18 perimeter, 19–24 interior); the chapter's example calls column 8 "zone type 8". */
  zoneType: number;
  mass: ZoneMass;
  carpet: boolean;
  /** Glass as a percent of the exterior wall; absent for interior zones. */
  glassPct?: number;
  factorsPct: readonly number[];
}

/**
 * HoF 2021 ch. 18 Table 19 "Representative Nonsolar RTS Values for Light to Heavy Construction",
 * radiant time factors in percent, read in the stored copy. Columns: light, medium, heavy; each with
 * carpet (10, 50, 90 % glass) then no carpet (10, 50, 90 % glass). Every column totals 100.
 */
export const NONSOLAR_RTS: readonly PrintedRadiantTimeSeries[] = [
  {
    zoneType: 1,
    mass: "light",
    carpet: true,
    glassPct: 10,
    factorsPct: [47, 19, 11, 6, 4, 3, 2, 2, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 2,
    mass: "light",
    carpet: true,
    glassPct: 50,
    factorsPct: [50, 18, 10, 6, 4, 3, 2, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 3,
    mass: "light",
    carpet: true,
    glassPct: 90,
    factorsPct: [53, 17, 9, 5, 3, 2, 2, 1, 1, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 4,
    mass: "light",
    carpet: false,
    glassPct: 10,
    factorsPct: [41, 20, 12, 8, 5, 4, 3, 2, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 5,
    mass: "light",
    carpet: false,
    glassPct: 50,
    factorsPct: [43, 19, 11, 7, 5, 3, 3, 2, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 6,
    mass: "light",
    carpet: false,
    glassPct: 90,
    factorsPct: [46, 19, 11, 7, 5, 3, 2, 2, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 7,
    mass: "medium",
    carpet: true,
    glassPct: 10,
    factorsPct: [46, 18, 10, 6, 4, 2, 2, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 8,
    mass: "medium",
    carpet: true,
    glassPct: 50,
    factorsPct: [49, 17, 9, 5, 3, 2, 2, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0],
  },
  {
    zoneType: 9,
    mass: "medium",
    carpet: true,
    glassPct: 90,
    factorsPct: [52, 16, 8, 5, 3, 2, 2, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 10,
    mass: "medium",
    carpet: false,
    glassPct: 10,
    factorsPct: [31, 17, 11, 8, 6, 4, 4, 3, 3, 2, 2, 2, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 11,
    mass: "medium",
    carpet: false,
    glassPct: 50,
    factorsPct: [33, 16, 10, 7, 5, 4, 3, 3, 2, 2, 2, 2, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 0],
  },
  {
    zoneType: 12,
    mass: "medium",
    carpet: false,
    glassPct: 90,
    factorsPct: [35, 15, 10, 7, 5, 4, 3, 3, 2, 2, 2, 2, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 0, 0],
  },
  {
    zoneType: 13,
    mass: "heavy",
    carpet: true,
    glassPct: 10,
    factorsPct: [34, 9, 6, 4, 4, 4, 3, 3, 3, 3, 3, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 1, 1],
  },
  {
    zoneType: 14,
    mass: "heavy",
    carpet: true,
    glassPct: 50,
    factorsPct: [38, 9, 6, 4, 4, 3, 3, 3, 3, 3, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 1, 1, 1, 1],
  },
  {
    zoneType: 15,
    mass: "heavy",
    carpet: true,
    glassPct: 90,
    factorsPct: [42, 9, 5, 4, 4, 3, 3, 3, 3, 2, 2, 2, 2, 2, 2, 2, 2, 2, 1, 1, 1, 1, 1, 1],
  },
  {
    zoneType: 16,
    mass: "heavy",
    carpet: false,
    glassPct: 10,
    factorsPct: [22, 10, 6, 5, 5, 4, 4, 4, 4, 3, 3, 3, 3, 3, 3, 2, 2, 2, 2, 2, 2, 2, 2, 2],
  },
  {
    zoneType: 17,
    mass: "heavy",
    carpet: false,
    glassPct: 50,
    factorsPct: [25, 9, 6, 5, 5, 4, 4, 4, 3, 3, 3, 3, 3, 3, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2],
  },
  {
    zoneType: 18,
    mass: "heavy",
    carpet: false,
    glassPct: 90,
    factorsPct: [28, 9, 6, 5, 4, 4, 4, 4, 3, 3, 3, 3, 3, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 1],
  },
];

/**
 * HoF 2021 ch. 18 Table 19, "Interior Zones" columns (no exterior glass): light, medium, heavy,
 * each with then without carpet. The stored copy's header row for these columns is garbled; the
 * with/without-carpet order is taken from the perimeter columns' order and the larger r₀ with
 * carpet, as in every perimeter pair.
 */
export const INTERIOR_NONSOLAR_RTS: readonly PrintedRadiantTimeSeries[] = [
  {
    zoneType: 19,
    mass: "light",
    carpet: true,
    factorsPct: [46, 19, 11, 6, 4, 3, 2, 2, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 20,
    mass: "light",
    carpet: false,
    factorsPct: [40, 20, 12, 8, 5, 4, 3, 2, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 21,
    mass: "medium",
    carpet: true,
    factorsPct: [46, 18, 10, 6, 3, 2, 2, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0],
  },
  {
    zoneType: 22,
    mass: "medium",
    carpet: false,
    factorsPct: [31, 17, 11, 8, 6, 4, 4, 3, 3, 2, 2, 2, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 23,
    mass: "heavy",
    carpet: true,
    factorsPct: [33, 9, 6, 5, 4, 4, 3, 3, 3, 3, 3, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 1, 1],
  },
  {
    zoneType: 24,
    mass: "heavy",
    carpet: false,
    factorsPct: [21, 9, 6, 5, 5, 4, 4, 4, 4, 3, 3, 3, 3, 3, 3, 3, 3, 2, 2, 2, 2, 2, 2, 2],
  },
];

/**
 * HoF 2021 ch. 18 Table 20 "Representative Solar RTS Values for Light to Heavy Construction",
 * percent, same column order as Table 19's perimeter columns. Every column totals 100. (The stored
 * copy repeats the medium columns in a stray second table under Table 20; the repeat matches.)
 */
export const SOLAR_RTS: readonly PrintedRadiantTimeSeries[] = [
  {
    zoneType: 1,
    mass: "light",
    carpet: true,
    glassPct: 10,
    factorsPct: [53, 17, 9, 5, 3, 2, 2, 1, 1, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 2,
    mass: "light",
    carpet: true,
    glassPct: 50,
    factorsPct: [55, 17, 9, 5, 3, 2, 2, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 3,
    mass: "light",
    carpet: true,
    glassPct: 90,
    factorsPct: [56, 17, 9, 5, 3, 2, 2, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 4,
    mass: "light",
    carpet: false,
    glassPct: 10,
    factorsPct: [44, 19, 11, 7, 5, 3, 3, 2, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 5,
    mass: "light",
    carpet: false,
    glassPct: 50,
    factorsPct: [45, 20, 11, 7, 5, 3, 2, 2, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 6,
    mass: "light",
    carpet: false,
    glassPct: 90,
    factorsPct: [46, 20, 11, 7, 5, 3, 2, 2, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 7,
    mass: "medium",
    carpet: true,
    glassPct: 10,
    factorsPct: [52, 16, 8, 5, 3, 2, 2, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 8,
    mass: "medium",
    carpet: true,
    glassPct: 50,
    factorsPct: [54, 16, 8, 4, 3, 2, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 9,
    mass: "medium",
    carpet: true,
    glassPct: 90,
    factorsPct: [55, 15, 8, 4, 3, 2, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0],
  },
  {
    zoneType: 10,
    mass: "medium",
    carpet: false,
    glassPct: 10,
    factorsPct: [28, 15, 10, 7, 6, 5, 4, 4, 3, 3, 2, 2, 2, 2, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0],
  },
  {
    zoneType: 11,
    mass: "medium",
    carpet: false,
    glassPct: 50,
    factorsPct: [29, 15, 10, 7, 6, 5, 4, 3, 3, 3, 2, 2, 2, 2, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0],
  },
  {
    zoneType: 12,
    mass: "medium",
    carpet: false,
    glassPct: 90,
    factorsPct: [29, 15, 10, 7, 6, 5, 4, 3, 3, 3, 2, 2, 2, 2, 1, 1, 1, 1, 1, 1, 1, 0, 0, 0],
  },
  {
    zoneType: 13,
    mass: "heavy",
    carpet: true,
    glassPct: 10,
    factorsPct: [47, 11, 6, 4, 3, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 1, 1, 1, 1, 1, 1, 1, 1, 1],
  },
  {
    zoneType: 14,
    mass: "heavy",
    carpet: true,
    glassPct: 50,
    factorsPct: [49, 12, 6, 4, 3, 2, 2, 2, 2, 2, 2, 2, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1],
  },
  {
    zoneType: 15,
    mass: "heavy",
    carpet: true,
    glassPct: 90,
    factorsPct: [51, 12, 6, 3, 3, 2, 2, 2, 2, 2, 2, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1],
  },
  {
    zoneType: 16,
    mass: "heavy",
    carpet: false,
    glassPct: 10,
    factorsPct: [26, 12, 7, 5, 4, 4, 3, 3, 3, 3, 3, 3, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2],
  },
  {
    zoneType: 17,
    mass: "heavy",
    carpet: false,
    glassPct: 50,
    factorsPct: [27, 13, 7, 5, 4, 4, 3, 3, 3, 3, 3, 3, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 1, 1],
  },
  {
    zoneType: 18,
    mass: "heavy",
    carpet: false,
    glassPct: 90,
    factorsPct: [28, 13, 7, 5, 4, 4, 3, 3, 3, 3, 3, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 1, 1],
  },
];

/** The glass percentages printed as columns of Tables 19 and 20. */
export const PRINTED_GLASS_PCT = [10, 50, 90] as const;

// ---------------------------------------------------------------------------------------------
// Radiant fractions: HoF 2021 ch. 18 Table 14 "Recommended Radiative/Convective Splits for
// Internal Heat Gains" (source given there: Nigusse 2007), read in the stored copy. The convective
// fraction is 1 − radiant.

/** Table 14: occupants, typical office conditions. Table 1 gives 0.49–0.60 at low air speed by activity. */
export const RADIANT_FRACTION_OCCUPANTS = 0.6;
/** Table 14: office equipment with a fan. */
export const RADIANT_FRACTION_EQUIPMENT_WITH_FAN = 0.1;
/** Table 14: office equipment without a fan. */
export const RADIANT_FRACTION_EQUIPMENT_WITHOUT_FAN = 0.3;
/** Table 14: the printed range for equipment in general (details in ch. 18 Tables 6–12). */
export const RADIANT_FRACTION_EQUIPMENT_RANGE = { low: 0.1, high: 0.8 } as const;
/** Ch. 18 §2.3 "Radiation and Convection": motor heat gain "equally divided between radiant and convective". */
export const RADIANT_FRACTION_MOTORS = 0.5;
/** Table 14: conduction heat gain through walls and floors. */
export const RADIANT_FRACTION_CONDUCTION_WALLS_FLOORS = 0.46;
/** Table 14: conduction heat gain through the roof. */
export const RADIANT_FRACTION_CONDUCTION_ROOF = 0.6;
/** Table 14: conduction through windows with SHGC > 0.5. */
export const RADIANT_FRACTION_CONDUCTION_WINDOW_HIGH_SHGC = 0.33;
/** Table 14: conduction through windows with SHGC < 0.5. */
export const RADIANT_FRACTION_CONDUCTION_WINDOW_LOW_SHGC = 0.46;
/** Table 14: solar heat gain through fenestration without interior shading (use the solar RTS for its beam part). */
export const RADIANT_FRACTION_SOLAR_UNSHADED = 1.0;
/**
 * Solar heat gain behind interior shading: Table 14 says "varies; see Tables 14A to 14G in
 * Chapter 15", which the reference store does not hold. The one value read is the ch. 18 §9.1
 * example's light-colored venetian blinds (louver reflectance 0.8 at 45°) on heat-absorbing double
 * glazing, type 5d of ch. 15 Table 14B: radiant fraction 0.54 (with the nonsolar RTS).
 */
export const RADIANT_FRACTION_SOLAR_LIGHT_VENETIAN_BLINDS_EXAMPLE = 0.54;
/** Table 14: infiltration is all convective. */
export const RADIANT_FRACTION_INFILTRATION = 0;

/**
 * Lighting: Table 14 defers to ch. 18 Table 3 "Lighting Heat Gain Parameters for Typical Operating
 * Conditions" (Fisher and Chantrasrisalai 2006; Zhou et al. 2016), radiative fraction of the heat
 * that reaches the room, by luminaire category, as printed (low to high). Table 3's notes: "use
 * middle values in most situations" (our `middle` is the midpoint of the printed range).
 */
export const LIGHTING_RADIANT_FRACTION = {
  recessedFluorescentWithoutLens: { low: 0.48, high: 0.68 },
  recessedFluorescentWithLens: { low: 0.61, high: 0.73 },
  downlightCompactFluorescent: { low: 0.95, high: 1.0 },
  downlightIncandescent: { low: 0.95, high: 1.0 },
  /** The §9.1 example takes the high value, 0.57, for a pendant luminaire. */
  nonInCeilingFluorescent: { low: 0.5, high: 0.57 },
  recessedLedTrofferPartialApertureDiffuser: { low: 0.37, high: 0.47 },
  recessedLedTrofferUniformDiffuser: { low: 0.32, high: 0.41 },
  recessedHighEfficacyLedTroffer: { low: 0.51, high: 0.51 },
  recessedLedDownlight: { low: 0.15, high: 0.18 },
  recessedLedRetrofitKit2x4: { low: 0.31, high: 0.42 },
  recessedLedColorTuningFixture: { low: 0.4, high: 0.42 },
  highBayLedFixture: { low: 0.42, high: 0.51 },
  linearPendantLedFixture: { low: 0.55, high: 0.6 },
} as const;

export type LuminaireCategory = keyof typeof LIGHTING_RADIANT_FRACTION;

/** Midpoint of Table 3's printed radiative-fraction range for a luminaire category. */
export function lightingRadiantFraction(category: LuminaireCategory): number {
  const r = LIGHTING_RADIANT_FRACTION[category];
  return (r.low + r.high) / 2;
}

/**
 * Table 14 radiant fraction of window conduction by SHGC. The table prints "> 0.5" and "< 0.5";
 * at exactly 0.5 we take the SHGC > 0.5 value, 0.33, whose smaller radiant share delays less of
 * the gain (our choice: the higher, conservative, peak).
 */
export function windowConductionRadiantFraction(shgc: number): number {
  if (!Number.isFinite(shgc) || shgc < 0 || shgc > 1) {
    throw new LoadInputError("shgc", `must be a number from 0 to 1, got ${String(shgc)}`, { min: 0, max: 1 });
  }
  return shgc >= 0.5
    ? RADIANT_FRACTION_CONDUCTION_WINDOW_HIGH_SHGC
    : RADIANT_FRACTION_CONDUCTION_WINDOW_LOW_SHGC;
}

// ---------------------------------------------------------------------------------------------
// Choosing a series.

export interface RadiantTimeSeriesOptions {
  mass: ZoneMass;
  /** true: Table 20 (beam solar through unshaded glass); false: Table 19 (every other radiant gain). */
  solar: boolean;
  carpet: boolean;
  /**
   * Glass as a percent of the exterior wall area of the zone, 0–100. Default 10: the first printed
   * column, and our choice for houses, whose glazing is usually a small share of the wall.
   */
  glassPct?: number;
}

export interface RadiantTimeSeriesChoice {
  /** 24 fractions, index 0 = the current hour; sums to 1. */
  series: Float64Array;
  /** Table 19 (nonsolar) or Table 20 (solar). */
  table: 19 | 20;
  /** The printed column(s) used, with their weights (two when glassPct lies between printed columns). */
  columns: ReadonlyArray<{ zoneType: number; glassPct: number; weight: number }>;
  /** A short description of the choice for reports. */
  label: string;
}

/**
 * The RTS for a zone, from HoF 2021 ch. 18 Table 19 (nonsolar) or Table 20 (solar).
 *
 * Glass percentages between the printed 10, 50 and 90 % columns are interpolated linearly between
 * the two neighbouring columns (our interpolation; the chapter prints only the three columns). From
 * 0 to 10 % the 10 % column applies and from 90 to 100 % the 90 % column, as the chapter's nearest
 * representative zones; the choice's `columns` and `label` say which column was used.
 *
 * Rounding: the printed factors are whole percents and every printed column totals exactly 100, so
 * each series (and any interpolation of two) sums to 1 to floating-point precision.
 *
 * Allocates a new array: call it once per plan, not in the hourly loop.
 */
export function radiantTimeSeriesChoice(options: RadiantTimeSeriesOptions): RadiantTimeSeriesChoice {
  const { mass, solar, carpet } = options;
  if (mass !== "light" && mass !== "medium" && mass !== "heavy") {
    throw new LoadInputError("rts.mass", `must be "light", "medium" or "heavy", got ${String(mass)}`);
  }
  if (typeof solar !== "boolean")
    throw new LoadInputError("rts.solar", `must be true or false, got ${String(solar)}`);
  if (typeof carpet !== "boolean")
    throw new LoadInputError("rts.carpet", `must be true or false, got ${String(carpet)}`);
  const glassPct = options.glassPct ?? 10;
  if (typeof glassPct !== "number" || !Number.isFinite(glassPct) || glassPct < 0 || glassPct > 100) {
    throw new LoadInputError("rts.glassPct", `must be a percent from 0 to 100, got ${String(glassPct)}`, {
      min: 0,
      max: 100,
      unit: "%",
    });
  }
  const table = solar ? SOLAR_RTS : NONSOLAR_RTS;
  const column = (g: number): PrintedRadiantTimeSeries => {
    const found = table.find((c) => c.mass === mass && c.carpet === carpet && c.glassPct === g);
    if (!found) throw new Error(`RTS table has no column for ${mass}, carpet ${carpet}, ${g} % glass`);
    return found;
  };
  let lo: number = PRINTED_GLASS_PCT[0];
  let hi: number = lo;
  let t = 0;
  if (glassPct >= PRINTED_GLASS_PCT[PRINTED_GLASS_PCT.length - 1]) {
    lo = hi = PRINTED_GLASS_PCT[PRINTED_GLASS_PCT.length - 1];
  } else if (glassPct > PRINTED_GLASS_PCT[0]) {
    for (let i = 1; i < PRINTED_GLASS_PCT.length; i++) {
      if (glassPct <= PRINTED_GLASS_PCT[i]) {
        lo = PRINTED_GLASS_PCT[i - 1];
        hi = PRINTED_GLASS_PCT[i];
        t = (glassPct - lo) / (hi - lo);
        break;
      }
    }
    if (t === 1) lo = hi;
  }
  const a = column(lo);
  const b = column(hi);
  const series = new Float64Array(HOURS_PER_DAY);
  for (let j = 0; j < HOURS_PER_DAY; j++) series[j] = ((1 - t) * a.factorsPct[j] + t * b.factorsPct[j]) / 100;
  const columns =
    lo === hi || t === 0
      ? [{ zoneType: a.zoneType, glassPct: lo, weight: 1 }]
      : [
          { zoneType: a.zoneType, glassPct: lo, weight: 1 - t },
          { zoneType: b.zoneType, glassPct: hi, weight: t },
        ];
  const glassText =
    columns.length === 1
      ? `${columns[0].glassPct} % glass column${glassPct !== columns[0].glassPct ? ` (nearest printed to ${glassPct} %)` : ""}`
      : `${glassPct} % glass, interpolated between the ${lo} % and ${hi} % columns`;
  const label = `HoF 2021 ch. 18 Table ${solar ? 20 : 19} ${solar ? "solar" : "nonsolar"} RTS, ${mass}, ${carpet ? "with" : "no"} carpet, ${glassText}`;
  return { series, table: solar ? 20 : 19, columns, label };
}

/** The 24-value series of {@link radiantTimeSeriesChoice} (index 0 = current hour; sums to 1). */
export function radiantTimeSeries(options: RadiantTimeSeriesOptions): Float64Array {
  return radiantTimeSeriesChoice(options).series;
}

/**
 * Which RTS suits our plans (our recommendation, for the engine's wiring):
 *
 * - Ch. 17 (residential) has no RTS and no residential zone type; ch. 18 Table 21 describes the
 *   representative zones behind Tables 19–20: light = steel siding, 50 mm insulation, air space,
 *   19 mm gypsum walls; 100 mm lightweight-concrete floor; gypsum partitions. Medium = the same
 *   partitions with 100 mm face brick walls and a 100 mm heavyweight-concrete floor. Heavy = 200 mm
 *   concrete walls, 200 mm concrete-block partitions and a 200 mm heavyweight-concrete floor. All
 *   with 25 mm wood furnishings over half the floor and an acoustic-tile ceiling.
 * - Wood-frame house (any wood wall base), framed floors or carpeted: light, with carpet. Its walls,
 *   partitions and ceilings are gypsum on framing like the light zone's, and a framed floor is
 *   lighter still. With carpet the light and medium columns differ by at most 1 percentage point
 *   in any hour at 10 % and 50 % glass (2 at 90 %, solar), against up to 10 points without carpet:
 *   the carpet decouples the slab, so a carpeted slab under a wood frame stays light-with-carpet.
 * - Masonry walls (our 8 in CMU bases, furred and gypsum-finished inside) or a slab with hard floors
 *   (tile, bare concrete): medium, with carpet where carpeted, else no carpet. A 4 in slab is
 *   the medium zone's 100 mm heavyweight-concrete floor; the furring and gypsum keep the block
 *   walls' mass behind a light interior surface. The heavy zone (200 mm concrete floors and
 *   block partitions) is beyond a production house.
 * - Glass: the 10 % column for most houses; pass the plan's window-to-exterior-wall percentage.
 */
export const RECOMMENDED_RTS = {
  woodFrame: { mass: "light", carpet: true, glassPct: 10 },
  woodFrameOnHardSurfacedSlab: { mass: "medium", carpet: false, glassPct: 10 },
  masonryCarpeted: { mass: "medium", carpet: true, glassPct: 10 },
  masonryHardSurfaced: { mass: "medium", carpet: false, glassPct: 10 },
} as const satisfies Record<string, Omit<RadiantTimeSeriesOptions, "solar">>;

// ---------------------------------------------------------------------------------------------
// The convolutions (no allocation: plain loops over the caller's arrays).

function checkDay(field: string, a: ArrayLike<number>): void {
  if (a.length !== HOURS_PER_DAY) {
    throw new LoadInputError(field, `must hold ${HOURS_PER_DAY} hourly values, got ${a.length}`, {
      min: HOURS_PER_DAY,
      max: HOURS_PER_DAY,
    });
  }
  for (let i = 0; i < HOURS_PER_DAY; i++) {
    if (!Number.isFinite(a[i]))
      throw new LoadInputError(`${field}[${i}]`, `must be a finite number, got ${String(a[i])}`);
  }
}

function checkOut(out: Float64Array, input: ArrayLike<number>, inputField: string): void {
  if (!(out instanceof Float64Array) || out.length !== HOURS_PER_DAY) {
    throw new LoadInputError("out", `must be a Float64Array of ${HOURS_PER_DAY} hours`, {
      min: HOURS_PER_DAY,
      max: HOURS_PER_DAY,
    });
  }
  if ((out as ArrayLike<number>) === input || (ArrayBuffer.isView(input) && input.buffer === out.buffer)) {
    throw new LoadInputError(
      "out",
      `must not share memory with ${inputField} (the sum reads every input hour)`,
    );
  }
}

/**
 * Checks a 24-value series and returns the index of its last non-zero factor: the printed series
 * end in runs of zeros (a wood wall's CTS after hour 7), which the sums skip.
 */
export function checkSeries(field: string, series: ArrayLike<number>): number {
  checkDay(field, series);
  let last = HOURS_PER_DAY - 1;
  while (last > 0 && series[last] === 0) last--;
  return last;
}

/**
 * out[h] = Σ_{j ≤ last} series[j] · input[(h − j) mod 24], unchecked: for this folder's checked
 * functions, which validate first. Two loops instead of a modulo: j ≤ h reads the same day,
 * j > h the day before.
 */
export function convolveDay(
  input: ArrayLike<number>,
  series: ArrayLike<number>,
  last: number,
  out: Float64Array,
): void {
  for (let h = 0; h < HOURS_PER_DAY; h++) {
    let sum = 0;
    const sameDay = h < last ? h : last;
    for (let j = 0; j <= sameDay; j++) sum += series[j] * input[h - j];
    for (let j = h + 1; j <= last; j++) sum += series[j] * input[h - j + HOURS_PER_DAY];
    out[h] = sum;
  }
}

/**
 * Periodic convolution of a 24-hour design day with a time series (HoF 2021 ch. 18 eq. 31 for CTS,
 * eq. 33 for RTS, on the steady-periodic day of §6.1):
 *   out[h] = Σ_j series[j] · input[(h − j + 24) mod 24].
 * Writes into `out` and returns it; allocates nothing. `out` must not alias `input`.
 */
export function applyTimeSeries(
  input: ArrayLike<number>,
  series: ArrayLike<number>,
  out: Float64Array,
): Float64Array {
  checkDay("input", input);
  const last = checkSeries("series", series);
  checkOut(out, input, "input");
  convolveDay(input, series, last, out);
  return out;
}

/**
 * Hourly cooling load of one heat-gain component (HoF 2021 ch. 18 §6.3 steps 2–4, eq. 33):
 *   out[h] = (1 − F_r)·q[h] + F_r·Σ_j r_j·q[h − j],
 * the convective part at once plus the radiant part through the RTS. `radiantFraction` F_r from
 * Table 14 (the constants above). Allocates nothing; `out` must not alias `heatGain`.
 */
export function coolingLoadFromHeatGain(
  heatGain: ArrayLike<number>,
  radiantFraction: number,
  rts: ArrayLike<number>,
  out: Float64Array,
): Float64Array {
  if (
    typeof radiantFraction !== "number" ||
    !Number.isFinite(radiantFraction) ||
    radiantFraction < 0 ||
    radiantFraction > 1
  ) {
    throw new LoadInputError(
      "radiantFraction",
      `must be a fraction from 0 to 1, got ${String(radiantFraction)}`,
      { min: 0, max: 1 },
    );
  }
  checkDay("heatGain", heatGain);
  const last = checkSeries("rts", rts);
  checkOut(out, heatGain, "heatGain");
  convolveDay(heatGain, rts, last, out);
  const convective = 1 - radiantFraction;
  for (let h = 0; h < HOURS_PER_DAY; h++) out[h] = convective * heatGain[h] + radiantFraction * out[h];
  return out;
}

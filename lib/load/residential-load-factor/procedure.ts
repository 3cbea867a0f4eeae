/**
 * The residential load factor (RLF) procedure of ASHRAE Handbook—Fundamentals 2021 (SI), chapter 17,
 * read in a stored Markdown copy of the chapter: block (whole-house) heating and peak cooling loads
 * from load factors, component by component, as in the chapter's section 5 (method), 6 (common data:
 * infiltration eq. 8–10, ventilation eq. 11–18, distribution eq. 19), 7 (cooling: opaque surfaces
 * eq. 20–21, slabs eq. 22–23, fenestration eq. 24–29, internal gains eq. 30–31, latent eq. 32) and 8
 * (heating: eq. 33–35, Table 16).
 *
 * Pure: plain data in (a neutral description of the house, IP units), plain data out (Btu/h). No zod
 * here: the caller validates at its edge; this function range-checks what it uses and throws a
 * LoadInputError naming the field (a dotted path such as `fenestration.2.shgc`) and its valid range.
 *
 * Units: tables.ts keeps the chapter's SI values as printed (eq. 22–23 for slabs lives in lib/load/slab.ts,
 * shared with the hourly method); the coefficients are converted to IP at use here (K → °F of OF_b by 1.8; W/m² → Btu/h·ft² by BTUH_FT2_PER_W_M2; L/s → cfm by LPS_PER_CFM; W →
 * Btu/h by BTUH_PER_W; m² → ft² by M2_PER_FT2; m·K/W and m²·K/W by the factors in tables.ts).
 *
 * Results are design estimates by a simplified published method, not the approved procedure of any
 * standard; local codes and a licensed professional govern equipment sizing.
 */
import { ductHeatingMode, ductLossFactor, type DuctTableLocation } from "../ducts";
import { LoadInputError } from "../errors";
import { effectiveLeakageAreaCm2 } from "../infiltration";
import type { DuctHeatingSystem } from "../input";
import {
  humidityRatioGrFromRelHum,
  humidityRatioGrFromWetBulb,
  SEA_LEVEL_PRESSURE_PSIA,
  standardPressurePsia,
} from "../psychrometrics";
import { slabCoolingFactorWm2 } from "../slab";
import { BTUH_FT2_PER_W_M2, BTUH_PER_W, CM2_PER_IN2, GRAINS_PER_LB, LPS_PER_CFM, M2_PER_FT2 } from "../units";
import {
  COMPASS_EXPOSURES,
  FENESTRATION_DAILY_RANGE_FACTOR,
  FOLDED_EXPOSURES,
  IDF_COEFFICIENTS,
  INTERNAL_GAINS_EQ_30_31,
  interiorAttenuationCoefficient,
  K_PER_F,
  LATENT_AIR_FACTOR_W_PER_LPS,
  M_PER_FT,
  SENSIBLE_AIR_FACTOR_W_PER_LPS_K,
  STACK_HEIGHT_PER_STORY_M,
  TABLE_10_PEAK_IRRADIANCE,
  TABLE_11_EXTERIOR_TRANSMISSION,
  TABLE_12_SHADE_LINE_FACTORS,
  TABLE_13_SOLAR_LOAD_FACTORS,
  TABLE_7_OPAQUE_FACTORS,
  table9HorizontalPeakIrradianceWm2,
  table9VerticalPeakIrradianceWm2,
  TABLE_1_LIMITS,
  VENTILATION_EQ_11,
  W_M2K_PER_BTUH_FT2F,
  type BuildingType,
  type OpaqueFactorRow,
} from "./tables";

// ---------------------------------------------------------------------------------------------
// Input: a neutral description of the house (IP units).

export interface RlfSite {
  /** Site latitude, degrees (north positive; south negative: the tables are used with N and S exposures swapped, as Table 1 allows). */
  latitudeDeg: number;
  elevationFt: number;
  /** Heating outdoor design dry bulb (ch. 17: 99 % value, or 99.6 %), °F. */
  heatingOutdoorDbF: number;
  /** Cooling outdoor design dry bulb (ch. 17: 1 % value), °F. */
  coolingOutdoorDbF: number;
  /** Mean daily range of the hottest month, °F. */
  dailyRangeF: number;
  /** Mean coincident wet bulb at the cooling design dry bulb, °F. Give this or `humidityRatioDifference`. */
  coolingOutdoorWbF?: number;
  /** Outdoor minus indoor humidity ratio at cooling design, lb_w/lb_da (= kg/kg). Give this or `coolingOutdoorWbF`. */
  humidityRatioDifference?: number;
  indoorHeatingF: number;
  indoorCoolingF: number;
  /** Indoor relative humidity for cooling, % (default 50, ch. 17 "Design Conditions"). */
  indoorCoolingRhPct?: number;
}

/**
 * Opaque component kinds and the chapter's treatment of each:
 * - attic-ceiling / attic-knee-wall: "ceiling or wall adjacent to vented attic" (Table 7; heating: the attic
 *   at the outdoor design temperature, ch. 17 section 8). Needs `roofSolarAbsorptance` (Table 8).
 * - roof-ceiling: "ceiling/roof assembly" (cathedral ceiling, flat roof). Needs `roofSolarAbsorptance`.
 * - wall / door: wood-frame wall or door, sunlit, or `shaded: true` (Table 7's shaded row; the example
 *   treats the wall to the garage this way).
 * - floor-over-ambient, floor-over-crawlspace: Table 7 rows (heating to outdoor temperature, or to
 *   `bufferHeatingF` for a crawlspace when given).
 * - buffer-partition: partition to an unconditioned space at `bufferHeatingF` / `bufferCoolingF`
 *   (q = U·A·Δt across the partition, Tables 15 and 16; eq. 35).
 * - below-grade: wall or floor below grade, heating only, q = U_avg·A·(t_in − t_gr) (Table 16); cooling
 *   zero ("for cooling calculations, heat flow into the ground is usually ignored", ch. 17 section 6).
 */
export type RlfOpaqueKind =
  | "attic-ceiling"
  | "attic-knee-wall"
  | "roof-ceiling"
  | "wall"
  | "door"
  | "floor-over-ambient"
  | "floor-over-crawlspace"
  | "buffer-partition"
  | "below-grade";

export interface RlfOpaqueComponent {
  /** Row name in the result, e.g. "Ceiling". */
  label: string;
  /** Free tag passed through to the result row (from-plan.ts puts the engine's component name here). */
  tag?: string;
  kind: RlfOpaqueKind;
  /** Net area, ft². */
  areaFt2: number;
  /** U-factor under heating conditions ("U-factors should be evaluated under heating (winter) conditions", ch. 17), Btu/h·ft²·°F. */
  uBtuPerHrFt2F: number;
  /** Roof solar absorptance α_roof (Table 8) for attic-ceiling, attic-knee-wall and roof-ceiling. */
  roofSolarAbsorptance?: number;
  /** Wall or door without solar exposure (Table 7 shaded row). */
  shaded?: boolean;
  /** Buffer-space air temperature in heating, °F (buffer-partition: required; floor-over-crawlspace: optional). */
  bufferHeatingF?: number;
  /** Buffer-space air temperature at the cooling peak, °F (buffer-partition: required). */
  bufferCoolingF?: number;
  /** Ground temperature for heating, °F (below-grade: required). */
  groundHeatingF?: number;
}

export type RlfExteriorAttachment =
  | { kind: "none" }
  /** Exterior insect screen, T_x = 0.64 (Table 11). */
  | { kind: "insect-screen" }
  /** Shade screen: T_x = the manufacturer's shading coefficient, typically 0.4 to 0.6 (Table 11). */
  | { kind: "shade-screen"; transmission: number };

export interface RlfFenestrationGroup {
  label: string;
  tag?: string;
  /** Facade name for the Table 1 per-facade area check (e.g. "front"); default: grouped by azimuth. */
  facade?: string;
  /**
   * Vertical, with its outward azimuth (degrees clockwise from north), or horizontal. Skylights tilted
   * less than 30° "can be treated as horizontal"; steeper sloped glazing is not supported by the
   * method: it is computed as horizontal and flagged by applicability.ts (give its real `tiltDeg`).
   */
  orientation: { kind: "vertical"; azimuthDeg: number } | { kind: "horizontal"; tiltDeg?: number };
  /** Area including frame (rough opening), ft². */
  areaFt2: number;
  /** NFRC heating U-factor, Btu/h·ft²·°F. */
  uBtuPerHrFt2F: number;
  /** NFRC SHGC. */
  shgc: number;
  /** IAC directly (default 1, no interior shade). */
  interiorAttenuation?: number;
  /** Or eq. 29 from a closed-shade IAC_cl (Table 14) and the fraction closed. */
  interiorShade?: { closedIac: number; fractionClosed: number };
  /** Exterior attachment (Table 11); default none. */
  exteriorAttachment?: RlfExteriorAttachment;
  /** Or T_x given directly (the plan input's `exteriorAttenuation`), 0.05 to 1. */
  exteriorTransmission?: number;
  /** Overhang depth from the plane of the glazing D_oh, ft (eq. 28). */
  overhangDepthFt?: number;
  /** Vertical distance from the top of the glazing up to the overhang X_oh, ft. */
  overhangAboveHeadFt?: number;
  /** Height of the glazing h, ft (needed with an overhang). */
  heightFt?: number;
  /** Shaded fraction F_shd given directly (e.g. 1 when adjacent structures shade it at peak hours), instead of eq. 28. */
  shadedFraction?: number;
}

export interface RlfSlab {
  label?: string;
  tag?: string;
  /** Exposed slab-edge perimeter p, ft (the example includes the perimeter next to the garage). */
  perimeterFt: number;
  /** Heat loss coefficient per unit perimeter F_p, Btu/h·ft·°F (ch. 18 eq. 42 / Table 24 via ch. 17 Table 16). */
  fFactorBtuhPerFtF: number;
  /** Slab area for the cooling credit of eq. 22, ft². */
  areaFt2: number;
  /** Floor covering resistance R_cvr, h·ft²·°F/Btu (0 = bare slab; the example's heavy carpet on rubber pad is 0.21 m²·K/W = 1.19). */
  floorCoveringR: number;
}

export type RlfLeakage =
  /** Effective leakage area at 4 Pa, C_D = 1 (incl. flues), in² (ch. 17 eq. 8: A_L). */
  | { method: "effective-leakage-area"; elaIn2: number }
  /** Blower-door flow at 50 Pa, converted to A_L by ch. 16 eq. 40–41 (lib/load/infiltration.ts). */
  | { method: "blower-door"; cfm50: number; flowExponent?: number }
  | { method: "blower-door-ach50"; ach50: number; volumeFt3: number; flowExponent?: number }
  /** Design estimate, eq. 9: A_L = A_es·A_ul, A_es the exposed surface (Table 4), A_ul from Table 3, cm²/m². */
  | { method: "unit-leakage"; exposedSurfaceAreaFt2: number; unitLeakageCm2PerM2: number };

export interface RlfInfiltration {
  leakage: RlfLeakage;
  /** Flue leakage area A_L,flue, in² (default 0; eq. 10 is valid for A_L,flue < A_L/2). */
  flueLeakageAreaIn2?: number;
  /** Building average stack height H, ft (default 2.5 m = 8.2 ft per story, eq. 10). */
  stackHeightFt?: number;
  /** IDF read from Table 5 instead of eq. 10, L/(s·cm²) (the chapter's example does this: 0.073 heating, 0.035 cooling). */
  idfOverride?: { heatingLpsPerCm2: number; coolingLpsPerCm2: number };
}

export interface RlfVentilation {
  /** Total mechanical outdoor-air supply, cfm. */
  supplyCfm: number;
  /** Total mechanical exhaust, including combustion air, cfm. */
  exhaustCfm: number;
  /** Part of the balanced flow through an HRV/ERV, cfm (Q_bal,hr; default 0). */
  heatRecoveryCfm?: number;
  sensibleRecoveryEffectiveness?: number;
  latentRecoveryEffectiveness?: number;
}

export type RlfDucts =
  /** Ducts in conditioned space: no loss (Table 6, F_dl = 0). */
  | { method: "none" }
  /** Table 6 factors (lib/load/ducts.ts ductLossFactor). */
  | {
      method: "table-6";
      location: DuctTableLocation;
      insulationR: number;
      supplyLeakagePct: number;
      returnLeakagePct: number;
      heatingSystem: DuctHeatingSystem;
    }
  /** F_dl from ASHRAE 152 design efficiencies or a detailed model (eq. 19 allows either). */
  | { method: "factors"; heatingFactor: number; coolingFactor: number };

export interface RlfOptions {
  /**
   * How latitude and exposure are looked up in Tables 10, 12 and 13. "interpolate" (default): linear in
   * latitude between the 5° columns and linear in azimuth between the eight exposures (our choice; the
   * chapter prints the columns and lets Table 9 serve "any exposure"). "nearest": the nearest column and
   * exposure, as the chapter's example does ("approximating site latitude as 35°N").
   */
  tableLookup?: "interpolate" | "nearest";
  /** Peak irradiance from Table 10 (default) or the Table 9 equations. */
  peakIrradiance?: "table-10" | "table-9-equations";
  /**
   * Scale C_s and C_l by the air density ratio P/P0 at the site's standard pressure (default true; ch. 17:
   * sea-level factors "are appropriate for elevations up to about 300 m"; the example, at 313 m, notes a 4 %
   * reduction and does not adjust).
   */
  airFactorElevationCorrection?: boolean;
}

export interface RlfHouse {
  site: RlfSite;
  conditionedFloorAreaFt2: number;
  stories: number;
  bedrooms: number;
  /** Occupants (default bedrooms + 1, eq. 30–31). */
  occupants?: number;
  /** Table 13 column (default single-family detached). */
  buildingType?: BuildingType;
  /** Wall construction for the Table 1 check (default light-frame). */
  construction?: "light-frame" | "masonry-veneer-over-frame" | "structural-masonry" | "other";
  opaque: readonly RlfOpaqueComponent[];
  fenestration: readonly RlfFenestrationGroup[];
  slab?: RlfSlab;
  infiltration: RlfInfiltration;
  /** Mechanical ventilation (default none). */
  ventilation?: RlfVentilation;
  /** Internal gains replacing eq. 30–31 (e.g. explicit rows), Btu/h. */
  internalGains?: { sensibleBtuh: number; latentBtuh: number };
  ducts: RlfDucts;
  options?: RlfOptions;
  /** Assumptions made while building this description; copied to the result's notes. */
  notes?: readonly string[];
}

// ---------------------------------------------------------------------------------------------
// Output.

export type RlfRowKind = RlfOpaqueKind | "fenestration" | "slab-perimeter" | "slab-area";

export interface RlfFenestrationDetail {
  /** The group's facade name, as given. */
  facade: string | undefined;
  /** Exposure used, e.g. "west" or "horizontal". */
  exposure: string;
  /** T_x (Table 11). */
  exteriorTransmission: number;
  /** SLF (Table 12), null for horizontal glazing or a given shaded fraction. */
  shadeLineFactor: number | null;
  /** F_shd (eq. 28 or given). */
  shadedFraction: number;
  /** E_D and E_d (Table 10 or 9), W/m², the chapter's units (as Table 21 prints). */
  peakDirectWm2: number;
  peakDiffuseWm2: number;
  /** PXI (eq. 26–27), W/m². */
  pxiWm2: number;
  interiorAttenuation: number;
  /** FF_s (Table 13). */
  solarLoadFactor: number;
}

export interface RlfComponentRow {
  label: string;
  tag: string | undefined;
  kind: RlfRowKind;
  quantity: number;
  quantityUnit: "ft²" | "ft";
  /** HF, Btu/h per ft² (or per ft of slab perimeter). */
  heatingFactorBtuhPerUnit: number;
  /** CF, Btu/h per ft². */
  coolingFactorBtuhPerUnit: number;
  heatingBtuh: number;
  coolingBtuh: number;
  fenestration: RlfFenestrationDetail | null;
}

export interface RlfResult {
  method: "residential-load-factor";
  rows: RlfComponentRow[];
  heating: {
    envelopeBtuh: number;
    infiltrationBtuh: number;
    ventilationBtuh: number;
    /** q_bl of eq. 19. */
    subtotalBtuh: number;
    ductFactor: number;
    ductBtuh: number;
    totalBtuh: number;
  };
  cooling: {
    envelopeBtuh: number;
    infiltrationBtuh: number;
    ventilationBtuh: number;
    internalBtuh: number;
    subtotalBtuh: number;
    ductFactor: number;
    ductBtuh: number;
    sensibleBtuh: number;
    latent: { infiltrationBtuh: number; ventilationBtuh: number; internalBtuh: number; totalBtuh: number };
    totalBtuh: number;
  };
  air: {
    effectiveLeakageAreaIn2: number;
    flueLeakageAreaIn2: number;
    stackHeightFt: number;
    idfHeatingLpsPerCm2: number;
    idfCoolingLpsPerCm2: number;
    infiltrationHeatingCfm: number;
    infiltrationCoolingCfm: number;
    balancedCfm: number;
    unbalancedCfm: number;
    /** Q_vi of eq. 14 (without the balanced flow). */
    combinedHeatingCfm: number;
    combinedCoolingCfm: number;
    /** Eq. 11 requirement, for comparison with the provided flow. */
    requiredVentilationCfm: number;
    /** C_s and C_l used, Btu/h per cfm·°F and Btu/h per cfm per lb_w/lb_da. */
    sensibleAirFactor: number;
    latentAirFactor: number;
  };
  conditions: {
    heatingDeltaF: number;
    coolingDeltaF: number;
    dailyRangeF: number;
    humidityRatioDifference: number;
    outdoorHumidityRatio: number | null;
    indoorHumidityRatio: number | null;
    /** Latitude used in the tables (|latitude| clamped to 20–60°, or the nearest column). */
    tableLatitudeDeg: number;
    pressureRatio: number;
    occupants: number;
  };
  notes: string[];
}

// ---------------------------------------------------------------------------------------------
// Module-local aliases of the imported constants used per call (a transpiled import is read through a
// getter on every access; a local const is not) and small memos of the facing-independent parts.

const T7 = TABLE_7_OPAQUE_FACTORS;
const T10 = TABLE_10_PEAK_IRRADIANCE;
const T11 = TABLE_11_EXTERIOR_TRANSMISSION;
const T12 = TABLE_12_SHADE_LINE_FACTORS;
const T13 = TABLE_13_SOLAR_LOAD_FACTORS;
const IDF = IDF_COEFFICIENTS;
const GAINS = INTERNAL_GAINS_EQ_30_31;
const LIMITS = TABLE_1_LIMITS;
const FOLDED = FOLDED_EXPOSURES;
const COMPASS = COMPASS_EXPOSURES;
const DR_FACTOR = FENESTRATION_DAILY_RANGE_FACTOR;
const IRR_IP = BTUH_FT2_PER_W_M2;
const W_TO_BTUH = BTUH_PER_W;
const CM2_IN2 = CM2_PER_IN2;
const M2_FT2 = M2_PER_FT2;
const LPS_CFM = LPS_PER_CFM;
const M_FT = M_PER_FT;
const U_SI_PER_IP = W_M2K_PER_BTUH_FT2F;
const GR_PER_LB = GRAINS_PER_LB;
const P0_PSIA = SEA_LEVEL_PRESSURE_PSIA;

/** Last psychrometric state computed (sites repeat across the lots of a community). */
let psyKey = "";
let psyValue = { pressurePsia: 0, outdoorW: 0, indoorW: 0 };
function psychrometricsOf(
  elevationFt: number,
  dbF: number,
  wbF: number | undefined,
  indoorF: number,
  rhPct: number,
) {
  const key = `${elevationFt}|${dbF}|${wbF}|${indoorF}|${rhPct}`;
  if (key !== psyKey) {
    const pressurePsia = standardPressurePsia(elevationFt);
    psyValue = {
      pressurePsia,
      outdoorW: wbF === undefined ? 0 : humidityRatioGrFromWetBulb(dbF, wbF, pressurePsia) / GR_PER_LB,
      indoorW: wbF === undefined ? 0 : humidityRatioGrFromRelHum(indoorF, rhPct, pressurePsia) / GR_PER_LB,
    };
    psyKey = key;
  }
  return psyValue;
}

/** Last duct factors, keyed by value (every facing of a plan asks for the same ones). */
let ductMemo: { key: string; heat: number; cool: number; notes: readonly string[] } | null = null;

// ---------------------------------------------------------------------------------------------
// Conversions at use (SI coefficients of tables.ts → IP).

/** C_s at sea level, Btu/h per cfm·°F: 1.23 W/(L/s·K) × 3.412142 Btu/h/W × 0.471947 L/s/cfm ÷ 1.8 = 1.1004. */
const CS_IP = (SENSIBLE_AIR_FACTOR_W_PER_LPS_K * BTUH_PER_W * LPS_PER_CFM) / 1.8;
/** C_l at sea level, Btu/h per cfm per lb/lb: 3010 × 3.412142 × 0.471947 = 4847 (0.692 per grain). */
const CL_IP = LATENT_AIR_FACTOR_W_PER_LPS * BTUH_PER_W * LPS_PER_CFM;
const STACK_HEIGHT_PER_STORY_FT = STACK_HEIGHT_PER_STORY_M / M_PER_FT;
/** Eq. 11 in IP: 0.15 L/(s·m²) → cfm/ft², 3.5 L/s → cfm. */
const VENT_CFM_PER_FT2 = (VENTILATION_EQ_11.lpsPerM2 * M2_PER_FT2) / LPS_PER_CFM;
const VENT_CFM_PER_BEDROOM_PLUS_ONE = VENTILATION_EQ_11.lpsPerBedroomPlusOne / LPS_PER_CFM;

/** Required whole-building ventilation by ch. 17 eq. 11, Q_v = 0.15·A_cf + 3.5·(N_br + 1) L/s (N_br not less than 1), in cfm. */
export function ventilationRateEq11Cfm(conditionedFloorAreaFt2: number, bedrooms: number): number {
  return (
    conditionedFloorAreaFt2 * VENT_CFM_PER_FT2 + VENT_CFM_PER_BEDROOM_PLUS_ONE * (Math.max(1, bedrooms) + 1)
  );
}

// ---------------------------------------------------------------------------------------------
// Range checks.

function describe(value: unknown): string {
  return value === undefined ? "missing" : (JSON.stringify(value) ?? String(value));
}

function checkNumber(value: unknown, field: string, min: number, max: number, unit = ""): number {
  if (typeof value !== "number" || !Number.isFinite(value) || value < min || value > max) {
    const u = unit ? ` ${unit}` : "";
    const message =
      value === undefined
        ? `required: a number (valid range ${min} to ${max}${u})`
        : typeof value !== "number" || !Number.isFinite(value)
          ? `must be a number (valid range ${min} to ${max}${u}), got ${describe(value)}`
          : `${value} is out of range (valid range ${min} to ${max}${u})`;
    throw new LoadInputError(field, message, { min, max, unit: unit || undefined });
  }
  return value;
}

function checkOptional(
  value: unknown,
  field: string,
  min: number,
  max: number,
  unit = "",
): number | undefined {
  return value === undefined ? undefined : checkNumber(value, field, min, max, unit);
}

function checkInteger(value: unknown, field: string, min: number, max: number): number {
  const v = checkNumber(value, field, min, max);
  if (!Number.isInteger(v)) throw new LoadInputError(field, `must be a whole number, got ${v}`, { min, max });
  return v;
}

function fail(field: string, message: string): never {
  throw new LoadInputError(field, message);
}

const MAX_AREA_FT2 = 100_000;

// ---------------------------------------------------------------------------------------------
// Table lookups.

/** Position of a latitude among TABLE_LATITUDES_DEG (0 = 20°, 8 = 60°), clamped. */
function latitudePosition(absLatitudeDeg: number, nearest: boolean): number {
  const p = (Math.min(60, Math.max(20, absLatitudeDeg)) - 20) / 5;
  return nearest ? Math.round(p) : p;
}

function atPosition(values: readonly number[], p: number): number {
  const i = Math.floor(p);
  if (i >= values.length - 1) return values[values.length - 1];
  const t = p - i;
  return t === 0 ? values[i] : values[i] + t * (values[i + 1] - values[i]);
}

/** Azimuth in [0, 360), mirrored N↔S for the southern hemisphere (Table 1). */
function tableAzimuth(azimuthDeg: number, southern: boolean): number {
  let a = azimuthDeg % 360;
  if (a < 0) a += 360;
  if (southern) {
    a = (540 - a) % 360;
  }
  return a;
}

/** The nearest compass name, with the azimuth when it is not a compass point. */
export function exposureName(azimuthDeg: number): string {
  let a = azimuthDeg % 360;
  if (a < 0) a += 360;
  const k = Math.round(a / 45) % 8;
  const exact = Math.abs(a - k * 45) < 1e-9 || Math.abs(a - 360) < 1e-9;
  return exact ? COMPASS[k] : `${COMPASS[k]} (${Math.round(a)}°)`;
}

/** Value of a folded-exposure table (Tables 10, 12) at folded position f (0 = N … 4 = S) and latitude position. */
function foldedValue(rows: Readonly<Record<string, readonly number[]>>, f: number, p: number): number {
  const i = Math.floor(f);
  const lo = atPosition(rows[FOLDED[i]], p);
  if (i >= 4) return lo;
  const t = f - i;
  if (t === 0) return lo;
  const hi = atPosition(rows[FOLDED[i + 1]], p);
  return lo + t * (hi - lo);
}

const TABLE_10_DIRECT: Record<string, readonly number[]> = {};
const TABLE_10_DIFFUSE: Record<string, readonly number[]> = {};
for (const e of FOLDED_EXPOSURES) {
  TABLE_10_DIRECT[e] = TABLE_10_PEAK_IRRADIANCE[e].directWm2;
  TABLE_10_DIFFUSE[e] = TABLE_10_PEAK_IRRADIANCE[e].diffuseWm2;
}

// ---------------------------------------------------------------------------------------------
// The procedure.

/**
 * Heating and cooling loads of a house by the RLF method of HoF 2021 ch. 17. Throws LoadInputError
 * for out-of-range input (field and valid range named). Applicability against Table 1 is checked
 * separately (applicability.ts), as the procedure computes outside its derivation range too.
 */
export function residentialLoadFactorLoads(house: RlfHouse): RlfResult {
  const notes: string[] = house.notes ? [...house.notes] : [];
  const opt = house.options ?? {};
  const nearest = opt.tableLookup === "nearest";
  if (opt.tableLookup !== undefined && opt.tableLookup !== "interpolate" && !nearest) {
    fail(
      "options.tableLookup",
      `unknown table lookup ${describe(opt.tableLookup)}; choose interpolate or nearest`,
    );
  }
  const equations = opt.peakIrradiance === "table-9-equations";
  if (opt.peakIrradiance !== undefined && opt.peakIrradiance !== "table-10" && !equations) {
    fail(
      "options.peakIrradiance",
      `unknown peak irradiance source ${describe(opt.peakIrradiance)}; choose table-10 or table-9-equations`,
    );
  }

  // --- Site and design conditions (ch. 17 "Design Conditions") ---------------------------------
  const s = house.site;
  if (s === undefined || s === null) fail("site", "required: the site and design conditions");
  const latitudeDeg = checkNumber(s.latitudeDeg, "site.latitudeDeg", -66, 66, "°");
  const elevationFt = checkNumber(s.elevationFt, "site.elevationFt", -1000, 14_000, "ft");
  const ti = checkNumber(s.indoorHeatingF, "site.indoorHeatingF", 55, 80, "°F");
  const tic = checkNumber(s.indoorCoolingF, "site.indoorCoolingF", 65, 85, "°F");
  const toh = checkNumber(s.heatingOutdoorDbF, "site.heatingOutdoorDbF", -60, ti - 0.1, "°F");
  const toc = checkNumber(s.coolingOutdoorDbF, "site.coolingOutdoorDbF", 60, 125, "°F");
  const drF = checkNumber(s.dailyRangeF, "site.dailyRangeF", 0, 50, "°F");
  const rh = checkOptional(s.indoorCoolingRhPct, "site.indoorCoolingRhPct", 20, 70, "%") ?? 50;
  const dtHeatF = ti - toh;
  const dtCoolF = toc - tic;

  const airCorrection = opt.airFactorElevationCorrection ?? true;
  if (s.humidityRatioDifference !== undefined && s.coolingOutdoorWbF !== undefined) {
    fail("site.humidityRatioDifference", "give coolingOutdoorWbF or humidityRatioDifference, not both");
  }
  const wbChecked =
    s.humidityRatioDifference === undefined && s.coolingOutdoorWbF !== undefined
      ? checkNumber(s.coolingOutdoorWbF, "site.coolingOutdoorWbF", 40, toc, "°F")
      : undefined;
  const psy = psychrometricsOf(elevationFt, toc, wbChecked, tic, rh);
  const pressurePsia = psy.pressurePsia;
  const pressureRatio = airCorrection ? pressurePsia / P0_PSIA : 1;
  const cs = CS_IP * pressureRatio;
  const cl = CL_IP * pressureRatio;
  if (!airCorrection && elevationFt * M_FT > 300) {
    notes.push(
      `Sea-level air factors used at ${Math.round(elevationFt * M_FT)} m; ch. 17 says they are appropriate up to about 300 m ` +
        `(the density ratio there is ${(pressurePsia / P0_PSIA).toFixed(3)}).`,
    );
  }

  let deltaW: number;
  let outdoorW: number | null = null;
  let indoorW: number | null = null;
  if (s.humidityRatioDifference !== undefined) {
    deltaW = checkNumber(s.humidityRatioDifference, "site.humidityRatioDifference", -0.02, 0.03, "lb/lb");
  } else if (wbChecked !== undefined) {
    outdoorW = psy.outdoorW;
    indoorW = psy.indoorW;
    deltaW = outdoorW - indoorW;
  } else {
    fail(
      "site.coolingOutdoorWbF",
      "required: the coincident wet bulb (coolingOutdoorWbF) or the humidity ratio difference (humidityRatioDifference)",
    );
  }
  if (deltaW < 0) {
    notes.push(
      "Outdoor design air is drier than indoor air: the outdoor-air latent load is taken as zero (no latent credit).",
    );
    deltaW = 0;
  }

  // --- House -----------------------------------------------------------------------------------
  const floorFt2 = checkNumber(house.conditionedFloorAreaFt2, "conditionedFloorAreaFt2", 100, 50_000, "ft²");
  const stories = checkInteger(house.stories, "stories", 1, 4);
  const bedrooms = checkInteger(house.bedrooms, "bedrooms", 0, 20);
  const occupants = checkOptional(house.occupants, "occupants", 0, 50) ?? bedrooms + 1;
  const buildingType: BuildingType = house.buildingType ?? "single-family-detached";
  if (buildingType !== "single-family-detached" && buildingType !== "multifamily") {
    fail(
      "buildingType",
      `unknown building type ${describe(buildingType)}; choose single-family-detached or multifamily`,
    );
  }
  const ffsRow = T13[buildingType];

  // Tables by latitude (Table 1: southern latitudes with N and S exposures reversed).
  const southern = latitudeDeg < 0;
  const absLat = Math.abs(latitudeDeg);
  const p = latitudePosition(absLat, nearest);
  const tableLatitudeDeg = 20 + 5 * p;
  if (absLat < LIMITS.latitudeDeg.min || absLat > LIMITS.latitudeDeg.max) {
    notes.push(`Latitude ${absLat}° is outside the tables' 20–60°; the ${tableLatitudeDeg}° column is used.`);
  }
  if (southern)
    notes.push(
      "Southern latitude: the tables are used with north and south exposures swapped (ch. 17 Table 1).",
    );

  const rows: RlfComponentRow[] = [];
  let envHeat = 0;
  let envCool = 0;

  // --- Opaque surfaces: heating eq. 33–35 and Table 16; cooling eq. 20–21 with Table 7 -----------
  const opaque = house.opaque;
  if (!Array.isArray(opaque)) fail("opaque", "required: a list of opaque components (may be empty)");
  for (let i = 0; i < opaque.length; i++) {
    const c = opaque[i];
    const f = `opaque.${i}`;
    const area = checkNumber(c.areaFt2, `${f}.areaFt2`, 0, MAX_AREA_FT2, "ft²");
    const u = checkNumber(c.uBtuPerHrFt2F, `${f}.uBtuPerHrFt2F`, 0.005, 2, "Btu/h·ft²·°F");
    let hf = 0;
    let cf = 0;
    let factorRow: OpaqueFactorRow | null = null;
    switch (c.kind) {
      case "attic-ceiling":
      case "attic-knee-wall":
        factorRow = "ceiling-or-wall-adjacent-to-vented-attic";
        hf = u * dtHeatF; // attic at the outdoor design temperature (ch. 17 section 8)
        break;
      case "roof-ceiling":
        factorRow = "ceiling-roof-assembly";
        hf = u * dtHeatF;
        break;
      case "wall":
      case "door":
        factorRow = c.shaded ? "wall-or-door-shaded" : "wall-or-door-sunlit";
        hf = u * dtHeatF;
        break;
      case "floor-over-ambient":
        factorRow = "floor-over-ambient";
        hf = u * dtHeatF;
        break;
      case "floor-over-crawlspace": {
        factorRow = "floor-over-crawlspace";
        const tb = checkOptional(c.bufferHeatingF, `${f}.bufferHeatingF`, -60, ti, "°F") ?? toh;
        hf = u * (ti - tb);
        break;
      }
      case "buffer-partition": {
        const tbh = checkNumber(c.bufferHeatingF, `${f}.bufferHeatingF`, -60, 90, "°F");
        const tbc = checkNumber(c.bufferCoolingF, `${f}.bufferCoolingF`, 40, 160, "°F");
        hf = u * (ti - tbh); // eq. 35
        cf = u * (tbc - tic); // Table 15: q = A·U·Δt across the partition
        break;
      }
      case "below-grade": {
        const tg = checkNumber(c.groundHeatingF, `${f}.groundHeatingF`, -40, 90, "°F");
        hf = u * (ti - tg); // Table 16: q = U_avg·A·(t_in − t_gr)
        cf = 0; // ground heat flow ignored for cooling (ch. 17 section 6, Below-Grade Surfaces)
        break;
      }
      default:
        fail(
          `${f}.kind`,
          `unknown opaque kind ${describe((c as { kind: unknown }).kind)}; choose attic-ceiling, attic-knee-wall, roof-ceiling, wall, door, ` +
            "floor-over-ambient, floor-over-crawlspace, buffer-partition or below-grade",
        );
    }
    if (factorRow !== null) {
      const of = T7[factorRow];
      let ofbK = of.ofbK;
      if (of.ofbPerRoofAbsorptanceK !== 0) {
        const alpha = checkNumber(c.roofSolarAbsorptance, `${f}.roofSolarAbsorptance`, 0, 1, "");
        ofbK += of.ofbPerRoofAbsorptanceK * alpha;
      }
      // Eq. 21 in IP: CF = U·(OF_t·Δt + OF_b + OF_r·DR), OF_b converted K → °F (× 1.8).
      cf = u * (of.oft * dtCoolF + ofbK * 1.8 + of.ofr * drF);
    }
    const heatingBtuh = hf * area;
    const coolingBtuh = cf * area;
    envHeat += heatingBtuh;
    envCool += coolingBtuh;
    rows.push({
      label: c.label,
      tag: c.tag,
      kind: c.kind,
      quantity: area,
      quantityUnit: "ft²",
      heatingFactorBtuhPerUnit: hf,
      coolingFactorBtuhPerUnit: cf,
      heatingBtuh,
      coolingBtuh,
      fenestration: null,
    });
  }

  // --- Slab: heating F_p·p·Δt (Table 16, ch. 18 eq. 42); cooling eq. 22–23 ----------------------
  if (house.slab !== undefined) {
    const sl = house.slab;
    const perimeter = checkNumber(sl.perimeterFt, "slab.perimeterFt", 0, 10_000, "ft");
    const fp = checkNumber(sl.fFactorBtuhPerFtF, "slab.fFactorBtuhPerFtF", 0, 3, "Btu/h·ft·°F");
    const area = checkNumber(sl.areaFt2, "slab.areaFt2", 0, MAX_AREA_FT2, "ft²");
    const rCvrIp = checkNumber(sl.floorCoveringR, "slab.floorCoveringR", 0, 11, "h·ft²·°F/Btu");
    const hf = fp * dtHeatF;
    // Eq. 23 via lib/load/slab.ts (shared with the hourly method), R_cvr converted to m²·K/W.
    const cf = slabCoolingFactorWm2(rCvrIp / U_SI_PER_IP) * IRR_IP;
    const label = sl.label ?? "Slab";
    rows.push({
      label: `${label} perimeter`,
      tag: sl.tag,
      kind: "slab-perimeter",
      quantity: perimeter,
      quantityUnit: "ft",
      heatingFactorBtuhPerUnit: hf,
      coolingFactorBtuhPerUnit: 0,
      heatingBtuh: hf * perimeter,
      coolingBtuh: 0,
      fenestration: null,
    });
    rows.push({
      label: `${label} area`,
      tag: sl.tag,
      kind: "slab-area",
      quantity: area,
      quantityUnit: "ft²",
      heatingFactorBtuhPerUnit: 0,
      coolingFactorBtuhPerUnit: cf,
      heatingBtuh: 0,
      coolingBtuh: cf * area,
      fenestration: null,
    });
    envHeat += hf * perimeter;
    envCool += cf * area;
  }

  // --- Fenestration: heating eq. 34; cooling eq. 24–29 -----------------------------------------
  const fen = house.fenestration;
  if (!Array.isArray(fen)) fail("fenestration", "required: a list of fenestration groups (may be empty)");
  for (let i = 0; i < fen.length; i++) {
    const g = fen[i];
    const f = `fenestration.${i}`;
    const area = checkNumber(g.areaFt2, `${f}.areaFt2`, 0, MAX_AREA_FT2, "ft²");
    const u = checkNumber(g.uBtuPerHrFt2F, `${f}.uBtuPerHrFt2F`, 0.05, 2, "Btu/h·ft²·°F");
    const shgc = checkNumber(g.shgc, `${f}.shgc`, 0, 1, "");
    let iac: number;
    if (g.interiorShade !== undefined) {
      if (g.interiorAttenuation !== undefined)
        fail(`${f}.interiorAttenuation`, "give interiorAttenuation or interiorShade, not both");
      const closed = checkNumber(g.interiorShade.closedIac, `${f}.interiorShade.closedIac`, 0.1, 1, "");
      const frac = checkNumber(g.interiorShade.fractionClosed, `${f}.interiorShade.fractionClosed`, 0, 1, "");
      iac = interiorAttenuationCoefficient(closed, frac); // eq. 29
    } else {
      iac = checkOptional(g.interiorAttenuation, `${f}.interiorAttenuation`, 0.1, 1, "") ?? 1;
    }
    let tx: number = T11.none;
    const att = g.exteriorAttachment;
    if (g.exteriorTransmission !== undefined) {
      if (att !== undefined)
        fail(`${f}.exteriorTransmission`, "give exteriorAttachment or exteriorTransmission, not both");
      tx = checkNumber(g.exteriorTransmission, `${f}.exteriorTransmission`, 0.05, 1, "");
    } else if (att !== undefined) {
      if (att.kind === "insect-screen") tx = T11.insectScreen;
      else if (att.kind === "shade-screen")
        tx = checkNumber(att.transmission, `${f}.exteriorAttachment.transmission`, 0.05, 1, "");
      else if (att.kind !== "none") {
        fail(
          `${f}.exteriorAttachment.kind`,
          `unknown exterior attachment ${describe((att as { kind: unknown }).kind)}; choose none, insect-screen or shade-screen`,
        );
      }
    }
    const givenShd = checkOptional(g.shadedFraction, `${f}.shadedFraction`, 0, 1, "");
    const o = g.orientation;
    if (o === undefined || o === null)
      fail(`${f}.orientation`, 'required: { kind: "vertical", azimuthDeg } or { kind: "horizontal" }');
    let eD: number;
    let ed: number;
    let ffs: number;
    let slf: number | null = null;
    let shd = givenShd ?? 0;
    let exposure: string;
    if (o.kind === "horizontal") {
      const tilt = checkOptional(o.tiltDeg, `${f}.orientation.tiltDeg`, 0, 90, "°") ?? 0;
      if (tilt >= LIMITS.skylightMaxTiltForHorizontalDeg) {
        notes.push(
          `${g.label}: glazing tilted ${tilt}° is computed as horizontal; ch. 17 treats only tilts under 30° as horizontal and does not support steeper sloped glazing.`,
        );
      }
      exposure = "horizontal";
      if (equations) {
        const e = table9HorizontalPeakIrradianceWm2(tableLatitudeDeg);
        ed = e.diffuseWm2;
        eD = e.totalWm2 - e.diffuseWm2;
      } else {
        eD = atPosition(T10.horizontal.directWm2, p);
        ed = atPosition(T10.horizontal.diffuseWm2, p);
      }
      ffs = ffsRow.horizontal;
    } else if (o.kind === "vertical") {
      const az = checkNumber(o.azimuthDeg, `${f}.orientation.azimuthDeg`, -360, 720, "°");
      const a = tableAzimuth(az, southern);
      exposure = exposureName(az);
      // Folded exposure position (0 = N, 4 = S) and compass position (0 = N … 8 = N again).
      const folded = a <= 180 ? a : 360 - a;
      const fPos = nearest ? Math.round(folded / 45) : folded / 45;
      const cPos = nearest ? Math.round(a / 45) % 8 : a / 45;
      if (equations) {
        const e = table9VerticalPeakIrradianceWm2(fPos / 4, tableLatitudeDeg);
        ed = e.diffuseWm2;
        eD = e.totalWm2 - e.diffuseWm2;
      } else {
        eD = foldedValue(TABLE_10_DIRECT, fPos, p);
        ed = foldedValue(TABLE_10_DIFFUSE, fPos, p);
      }
      const ci = Math.floor(cPos);
      const ct = cPos - ci;
      const v = ffsRow.vertical;
      ffs = ct === 0 ? v[ci % 8] : v[ci % 8] + ct * (v[(ci + 1) % 8] - v[ci % 8]);
      const depth = checkOptional(g.overhangDepthFt, `${f}.overhangDepthFt`, 0, 30, "ft") ?? 0;
      if (givenShd === undefined && depth > 0) {
        const x = checkOptional(g.overhangAboveHeadFt, `${f}.overhangAboveHeadFt`, 0, 30, "ft") ?? 0;
        const h = checkNumber(g.heightFt, `${f}.heightFt`, 0.5, 30, "ft");
        slf = foldedValue(T12, fPos, p);
        // Eq. 28: F_shd = min(1, max(0, (SLF·D_oh − X_oh)/h)); feet in, a ratio out.
        shd = Math.min(1, Math.max(0, (slf * depth - x) / h));
      }
    } else {
      fail(
        `${f}.orientation.kind`,
        `unknown orientation ${describe((o as { kind: unknown }).kind)}; choose vertical or horizontal`,
      );
    }
    // Eq. 26–27: PXI = T_x·[E_d + (1 − F_shd)·E_D], W/m².
    const pxi = tx * (ed + (1 - shd) * eD);
    // Eq. 25 in IP: CF = U·(Δt − 0.46·DR) + PXI·SHGC·IAC·FF_s, PXI converted W/m² → Btu/h·ft².
    const cf = u * (dtCoolF - DR_FACTOR * drF) + pxi * IRR_IP * shgc * iac * ffs;
    const hf = u * dtHeatF; // eq. 34
    envHeat += hf * area;
    envCool += cf * area;
    rows.push({
      label: g.label,
      tag: g.tag,
      kind: "fenestration",
      quantity: area,
      quantityUnit: "ft²",
      heatingFactorBtuhPerUnit: hf,
      coolingFactorBtuhPerUnit: cf,
      heatingBtuh: hf * area,
      coolingBtuh: cf * area,
      fenestration: {
        facade: g.facade,
        exposure,
        exteriorTransmission: tx,
        shadeLineFactor: slf,
        shadedFraction: shd,
        peakDirectWm2: eD,
        peakDiffuseWm2: ed,
        pxiWm2: pxi,
        interiorAttenuation: iac,
        solarLoadFactor: ffs,
      },
    });
  }

  // --- Infiltration: eq. 8–10 ------------------------------------------------------------------
  const inf = house.infiltration;
  if (inf === undefined || inf === null) fail("infiltration", "required: the air leakage");
  const lk = inf.leakage;
  if (lk === undefined || lk === null)
    fail("infiltration.leakage", "required: the air leakage (method and figure)");
  let alCm2: number;
  switch (lk.method) {
    case "effective-leakage-area":
      alCm2 = checkNumber(lk.elaIn2, "infiltration.leakage.elaIn2", 0, 10_000, "in²") * CM2_IN2;
      break;
    case "blower-door": {
      const n = checkOptional(lk.flowExponent, "infiltration.leakage.flowExponent", 0.5, 1, "") ?? 0.65;
      alCm2 = effectiveLeakageAreaCm2(
        checkNumber(lk.cfm50, "infiltration.leakage.cfm50", 1, 100_000, "cfm"),
        n,
      );
      break;
    }
    case "blower-door-ach50": {
      const n = checkOptional(lk.flowExponent, "infiltration.leakage.flowExponent", 0.5, 1, "") ?? 0.65;
      const ach50 = checkNumber(lk.ach50, "infiltration.leakage.ach50", 0.1, 50, "1/h");
      const vol = checkNumber(lk.volumeFt3, "infiltration.leakage.volumeFt3", 500, 1_500_000, "ft³");
      alCm2 = effectiveLeakageAreaCm2((ach50 * vol) / 60, n);
      break;
    }
    case "unit-leakage": {
      const aes = checkNumber(
        lk.exposedSurfaceAreaFt2,
        "infiltration.leakage.exposedSurfaceAreaFt2",
        0,
        1_000_000,
        "ft²",
      );
      const aul = checkNumber(
        lk.unitLeakageCm2PerM2,
        "infiltration.leakage.unitLeakageCm2PerM2",
        0,
        30,
        "cm²/m²",
      );
      alCm2 = aes * M2_FT2 * aul; // eq. 9
      break;
    }
    default:
      fail(
        "infiltration.leakage.method",
        `unknown leakage method ${describe((lk as { method: unknown }).method)}; choose effective-leakage-area, blower-door, blower-door-ach50 or unit-leakage`,
      );
  }
  const flueCm2 =
    (checkOptional(inf.flueLeakageAreaIn2, "infiltration.flueLeakageAreaIn2", 0, 10_000, "in²") ?? 0) *
    CM2_IN2;
  if (flueCm2 > 0 && flueCm2 >= alCm2 / 2) {
    notes.push(
      "Flue leakage area is half the building's leakage area or more; ch. 17 eq. 10 is valid only below half.",
    );
  }
  const stackFt =
    checkOptional(inf.stackHeightFt, "infiltration.stackHeightFt", 3, 100, "ft") ??
    stories * STACK_HEIGHT_PER_STORY_FT;
  const stackM = stackFt * M_FT;
  const flueRatio = alCm2 > 0 ? flueCm2 / alCm2 : 0;
  let idfH: number;
  let idfC: number;
  if (inf.idfOverride !== undefined) {
    idfH = checkNumber(
      inf.idfOverride.heatingLpsPerCm2,
      "infiltration.idfOverride.heatingLpsPerCm2",
      0,
      1,
      "L/(s·cm²)",
    );
    idfC = checkNumber(
      inf.idfOverride.coolingLpsPerCm2,
      "infiltration.idfOverride.coolingLpsPerCm2",
      0,
      1,
      "L/(s·cm²)",
    );
  } else {
    // Eq. 10, Δt in K.
    const h = IDF.heating;
    const c = IDF.cooling;
    idfH = (h.i0 * (1 + h.i2 * flueRatio) + h.i1 * stackM * Math.abs(dtHeatF) * K_PER_F) / 1000;
    idfC = (c.i0 * (1 + c.i2 * flueRatio) + c.i1 * stackM * Math.abs(dtCoolF) * K_PER_F) / 1000;
  }
  // Eq. 8: Q_i = A_L·IDF, L/s → cfm.
  const qiHeat = (alCm2 * idfH) / LPS_CFM;
  const qiCool = (alCm2 * idfC) / LPS_CFM;

  // --- Ventilation: eq. 11–18 ------------------------------------------------------------------
  const v = house.ventilation;
  const supply = v ? checkNumber(v.supplyCfm, "ventilation.supplyCfm", 0, 5000, "cfm") : 0;
  const exhaust = v ? checkNumber(v.exhaustCfm, "ventilation.exhaustCfm", 0, 5000, "cfm") : 0;
  const qBal = Math.min(supply, exhaust); // eq. 12
  const qUnbal = Math.max(supply, exhaust) - qBal; // eq. 13
  const qHr = v
    ? (checkOptional(
        v.heatRecoveryCfm,
        "ventilation.heatRecoveryCfm",
        0,
        qBal,
        "cfm (at most the balanced flow)",
      ) ?? 0)
    : 0;
  const qOth = qBal - qHr;
  const es = v
    ? (checkOptional(
        v.sensibleRecoveryEffectiveness,
        "ventilation.sensibleRecoveryEffectiveness",
        0,
        0.95,
        "",
      ) ?? 0)
    : 0;
  const el = v
    ? (checkOptional(v.latentRecoveryEffectiveness, "ventilation.latentRecoveryEffectiveness", 0, 0.95, "") ??
      0)
    : 0;
  // Eq. 14: Q_vi = max(Q_unbal, Q_i + 0.5·Q_unbal).
  const qviHeat = Math.max(qUnbal, qiHeat + 0.5 * qUnbal);
  const qviCool = Math.max(qUnbal, qiCool + 0.5 * qUnbal);
  const requiredVentCfm = ventilationRateEq11Cfm(floorFt2, bedrooms);
  if (Math.max(supply, exhaust) < 0.99 * requiredVentCfm) {
    notes.push(
      `Mechanical ventilation of ${Math.round(Math.max(supply, exhaust))} cfm is below the ch. 17 eq. 11 (ASHRAE 62.2) rate of ` +
        `${Math.round(requiredVentCfm)} cfm; local authorities set the actual requirement.`,
    );
  }
  // Eq. 15: q_s = C_s·[Q_vi + (1 − ε_s)·Q_bal,hr + Q_bal,oth]·Δt; split as infiltration C_s·Q_i·Δt and the rest.
  const ventSensFlowHeat = qviHeat - qiHeat + (1 - es) * qHr + qOth;
  const ventSensFlowCool = qviCool - qiCool + (1 - es) * qHr + qOth;
  const infHeatBtuh = cs * qiHeat * dtHeatF;
  const ventHeatBtuh = cs * ventSensFlowHeat * dtHeatF;
  const infCoolBtuh = cs * qiCool * dtCoolF;
  const ventCoolBtuh = cs * ventSensFlowCool * dtCoolF;
  // Latent, eq. 16 (no HRV/ERV) and eq. 17–18 with recovery: writing Δh as its sensible and latent parts,
  // eq. 18 gives C_l·[Q_vi + (1 − ε_l)·Q_bal,hr + Q_bal,oth]·ΔW with ε_l the latent effectiveness (our algebra).
  const infLatBtuh = cl * qiCool * deltaW;
  const ventLatBtuh = cl * (qviCool - qiCool + (1 - el) * qHr + qOth) * deltaW;

  // --- Internal gains: eq. 30–31 ---------------------------------------------------------------
  let igSens: number;
  let igLat: number;
  if (house.internalGains !== undefined) {
    igSens = checkNumber(house.internalGains.sensibleBtuh, "internalGains.sensibleBtuh", 0, 200_000, "Btu/h");
    igLat = checkNumber(house.internalGains.latentBtuh, "internalGains.latentBtuh", 0, 100_000, "Btu/h");
  } else {
    const aM2 = floorFt2 * M2_FT2;
    const gs = GAINS.sensible;
    const gl = GAINS.latent;
    igSens = (gs.constantW + gs.perM2W * aM2 + gs.perOccupantW * occupants) * W_TO_BTUH;
    igLat = (gl.constantW + gl.perM2W * aM2 + gl.perOccupantW * occupants) * W_TO_BTUH;
  }

  // --- Distribution: eq. 19 with Table 6 -------------------------------------------------------
  const d = house.ducts;
  if (d === undefined || d === null)
    fail("ducts", "required: the duct description (method none, table-6 or factors)");
  let fHeat: number;
  let fCool: number;
  if (d.method === "none") {
    fHeat = 0;
    fCool = 0;
  } else if (d.method === "factors") {
    fHeat = checkNumber(d.heatingFactor, "ducts.heatingFactor", 0, 2, "");
    fCool = checkNumber(d.coolingFactor, "ducts.coolingFactor", 0, 2, "");
  } else if (d.method === "table-6") {
    if (d.location !== "attic" && d.location !== "basement" && d.location !== "crawlspace") {
      fail(
        "ducts.location",
        `unknown Table 6 duct location ${describe(d.location)}; choose attic, basement or crawlspace`,
      );
    }
    if (d.heatingSystem !== "furnace" && d.heatingSystem !== "heat-pump") {
      fail(
        "ducts.heatingSystem",
        `unknown heating system ${describe(d.heatingSystem)}; choose furnace or heat-pump`,
      );
    }
    const key = `${d.location}|${d.insulationR}|${d.supplyLeakagePct}|${d.returnLeakagePct}|${d.heatingSystem}|${stories}`;
    if (ductMemo === null || ductMemo.key !== key) {
      const insulationR = checkNumber(d.insulationR, "ducts.insulationR", 0, 30, "h·ft²·°F/Btu");
      const supplyLeakagePct = checkNumber(d.supplyLeakagePct, "ducts.supplyLeakagePct", 0, 50, "%");
      const returnLeakagePct = checkNumber(d.returnLeakagePct, "ducts.returnLeakagePct", 0, 50, "%");
      const location = d.location;
      const heat = ductLossFactor({
        location,
        stories,
        insulationR,
        supplyLeakagePct,
        returnLeakagePct,
        mode: ductHeatingMode(d.heatingSystem),
      });
      const cool = ductLossFactor({
        location,
        stories,
        insulationR,
        supplyLeakagePct,
        returnLeakagePct,
        mode: "cooling",
      });
      ductMemo = { key, heat: heat.factor, cool: cool.factor, notes: heat.notes };
    }
    fHeat = ductMemo.heat;
    fCool = ductMemo.cool;
    for (const n of ductMemo.notes) notes.push(n);
  } else {
    fail(
      "ducts.method",
      `unknown duct method ${describe((d as { method: unknown }).method)}; choose none, table-6 or factors`,
    );
  }
  if (fCool > 0) {
    notes.push(
      "Duct latent gain (return leakage) is not included: Table 6 factors are sensible only (ch. 17 eq. 19).",
    );
  }

  const heatSubtotal = envHeat + infHeatBtuh + ventHeatBtuh;
  const coolSubtotal = envCool + infCoolBtuh + ventCoolBtuh + igSens;
  const heatDuct = fHeat * heatSubtotal;
  const coolDuct = fCool * coolSubtotal;
  const heatTotal = heatSubtotal + heatDuct;
  const coolSensible = coolSubtotal + coolDuct;
  const latentTotal = infLatBtuh + ventLatBtuh + igLat; // eq. 32

  return {
    method: "residential-load-factor",
    rows,
    heating: {
      envelopeBtuh: envHeat,
      infiltrationBtuh: infHeatBtuh,
      ventilationBtuh: ventHeatBtuh,
      subtotalBtuh: heatSubtotal,
      ductFactor: fHeat,
      ductBtuh: heatDuct,
      totalBtuh: heatTotal,
    },
    cooling: {
      envelopeBtuh: envCool,
      infiltrationBtuh: infCoolBtuh,
      ventilationBtuh: ventCoolBtuh,
      internalBtuh: igSens,
      subtotalBtuh: coolSubtotal,
      ductFactor: fCool,
      ductBtuh: coolDuct,
      sensibleBtuh: coolSensible,
      latent: {
        infiltrationBtuh: infLatBtuh,
        ventilationBtuh: ventLatBtuh,
        internalBtuh: igLat,
        totalBtuh: latentTotal,
      },
      totalBtuh: coolSensible + latentTotal,
    },
    air: {
      effectiveLeakageAreaIn2: alCm2 / CM2_IN2,
      flueLeakageAreaIn2: flueCm2 / CM2_IN2,
      stackHeightFt: stackFt,
      idfHeatingLpsPerCm2: idfH,
      idfCoolingLpsPerCm2: idfC,
      infiltrationHeatingCfm: qiHeat,
      infiltrationCoolingCfm: qiCool,
      balancedCfm: qBal,
      unbalancedCfm: qUnbal,
      combinedHeatingCfm: qviHeat,
      combinedCoolingCfm: qviCool,
      requiredVentilationCfm: requiredVentCfm,
      sensibleAirFactor: cs,
      latentAirFactor: cl,
    },
    conditions: {
      heatingDeltaF: dtHeatF,
      coolingDeltaF: dtCoolF,
      dailyRangeF: drF,
      humidityRatioDifference: deltaW,
      outdoorHumidityRatio: outdoorW,
      indoorHumidityRatio: indoorW,
      tableLatitudeDeg,
      pressureRatio,
      occupants,
    },
    notes,
  };
}

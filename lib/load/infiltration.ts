/**
 * Air leakage and ventilation.
 *
 * Read in a stored Markdown copy of HoF 2021 SI ch. 16 (sections 7 and 10, pp. 16.15–16.26).
 * Effective leakage area from a blower-door figure: the flow at the 4 Pa reference by the power
 * law Q = c·Δp^n (ch. 16 eq. 40; "a typical value for n is about 0.65"), Q4 = Q50·(4/50)^n, and
 * A_L = 10 000·Q4·√(ρ/(2·Δp_r))/C_D (eq. 41) with Δp_r = 4 Pa and C_D = 1 (the chapter's
 * Sherman–Grimsrud rating), ρ = 1.2 kg/m³ (from memory; it reproduces the chapter's pairs
 * c 0.051 m³/(s·Pa^n), n 0.67 ↔ 500 cm² and c 0.102 ↔ 1000 cm² of Examples 5 and 7).
 * Infiltration by the basic (LBL) model, ch. 16 eq. 48: Q = (A_L/1000)·√(Cs·ΔT + Cw·U²), m³/s
 * (here L/s), A_L in cm², ΔT in K, U in m/s.
 *
 * Stack coefficients Cs (ch. 16 Table 4) and wind coefficients Cw by stories and shelter class
 * (ch. 16 Table 6; classes described in Table 5) are the printed SI values; with them the engine
 * reproduces ch. 16 Examples 2, 3 and 4 (0.0736, 0.0392, 0.077 m³/s). The tables assume rural
 * terrain with scattered obstacles, half the leakage in the walls, equal floor and ceiling
 * leakage, and story heights 2.5/5.0/7.5 m. In IP they are Cs 0.0150/0.0299/0.0449
 * (cfm²/in⁴/°F).
 */
import { CM2_PER_IN2, LPS_PER_CFM, MPS_PER_MPH, deltaFToK } from "./units";

/** Cs, (L/s)²/(cm⁴·K), for 1, 2, 3 stories (HoF 2021 SI ch. 16 Table 4, read). */
const STACK_COEFFICIENT_SI: Record<1 | 2 | 3, number> = { 1: 0.000145, 2: 0.00029, 3: 0.000435 };

/** Cw, (L/s)²/(cm⁴·(m/s)²), by stories then shelter class 1–5 (HoF 2021 SI ch. 16 Table 6, read). */
const WIND_COEFFICIENT_SI: Record<1 | 2 | 3, readonly number[]> = {
  1: [0.000319, 0.000246, 0.000174, 0.000104, 0.000032],
  2: [0.00042, 0.000325, 0.000231, 0.000137, 0.000042],
  3: [0.000494, 0.000382, 0.000271, 0.000161, 0.000049],
};

/** Air density used for the leakage-area conversion, kg/m³ (standard air, from memory; see the header). */
const AIR_DENSITY_KG_M3 = 1.2;
/** Reference pressure of the effective leakage area, Pa (HoF 2021 ch. 16: effective leakage area at 4 Pa, C_D = 1). */
const ELA_REFERENCE_PA = 4;

/** Wind speeds for design infiltration, mph (HoF 2021 ch. 17 eq. 10 and example: 3.4 m/s cooling, 6.7 m/s heating, read). */
export const COOLING_WIND_MPH = 7.5;
export const HEATING_WIND_MPH = 15;

/** Stories the LBL tables cover; taller houses use the 3-story row (the results carry a note). */
export function lblStoryRow(stories: number): 1 | 2 | 3 {
  return stories <= 1 ? 1 : stories === 2 ? 2 : 3;
}

export function stackCoefficientSi(stories: number): number {
  return STACK_COEFFICIENT_SI[lblStoryRow(stories)];
}

export function windCoefficientSi(stories: number, shelterClass: number): number {
  const row = WIND_COEFFICIENT_SI[lblStoryRow(stories)];
  const value = row[shelterClass - 1];
  if (value === undefined) throw new RangeError(`shelter class must be 1–5, got ${shelterClass}`);
  return value;
}

/** Blower-door flow at 50 Pa, cfm, from ACH50 and volume. */
export function cfm50FromAch50(ach50: number, volumeFt3: number): number {
  return (ach50 * volumeFt3) / 60;
}

/** Effective leakage area at 4 Pa, cm² (HoF 2021 ch. 16 eq. 40 to reach 4 Pa, then eq. 41). */
export function effectiveLeakageAreaCm2(cfm50: number, flowExponent: number): number {
  const q4Lps = cfm50 * LPS_PER_CFM * Math.pow(ELA_REFERENCE_PA / 50, flowExponent);
  const q4M3s = q4Lps / 1000;
  const areaM2 = q4M3s * Math.sqrt(AIR_DENSITY_KG_M3 / (2 * ELA_REFERENCE_PA)); // C_D = 1
  return areaM2 * 1e4;
}

export function cm2ToIn2(areaCm2: number): number {
  return areaCm2 / CM2_PER_IN2;
}

/** LBL infiltration, L/s (HoF 2021 ch. 16 eq. 48, there in m³/s with A_L/1000): Q = A_L·√(Cs·ΔT + Cw·U²). */
export function lblInfiltrationLps(
  leakageAreaCm2: number,
  stackCoefficient: number,
  deltaTK: number,
  windCoefficient: number,
  windSpeedMps: number,
): number {
  return (
    leakageAreaCm2 *
    Math.sqrt(stackCoefficient * Math.abs(deltaTK) + windCoefficient * windSpeedMps * windSpeedMps)
  );
}

/** LBL infiltration in IP: cfm from ELA (cm²), ΔT (°F) and wind (mph). */
export function lblInfiltrationCfm(
  leakageAreaCm2: number,
  stories: number,
  shelterClass: number,
  deltaTF: number,
  windMph: number,
): number {
  const lps = lblInfiltrationLps(
    leakageAreaCm2,
    stackCoefficientSi(stories),
    deltaFToK(deltaTF),
    windCoefficientSi(stories, shelterClass),
    windMph * MPS_PER_MPH,
  );
  return lps / LPS_PER_CFM;
}

/** Whole-house ventilation requirement, cfm: ASHRAE 62.2-2016 eq. 4.1a, Qtot = 0.03·A_floor + 7.5·(N_br + 1). */
export function ashrae622VentilationCfm(conditionedFloorAreaFt2: number, bedrooms: number): number {
  return 0.03 * conditionedFloorAreaFt2 + 7.5 * (bedrooms + 1);
}

/**
 * Outdoor air through the envelope when unbalanced mechanical flow and infiltration act together:
 * Q = Q_bal + √(Q_unbal² + Q_inf²) (HoF 2021 ch. 16 eq. 51, read; the chapter's superposition
 * "for the general case"). This function returns the unbalanced-plus-infiltration term; callers add Q_bal.
 */
export function combineUnbalanced(infiltrationCfm: number, unbalancedCfm: number): { totalCfm: number } {
  return { totalCfm: Math.sqrt(infiltrationCfm * infiltrationCfm + unbalancedCfm * unbalancedCfm) };
}

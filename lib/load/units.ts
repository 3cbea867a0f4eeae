/** Unit conversions used at the engine's edges (exact by definition unless noted). */

/** 1 W/m² = 0.316998 Btu/h·ft² (NIST SP 811 conversion factors). */
export const BTUH_FT2_PER_W_M2 = 0.316998;
/** 1 W = 3.412142 Btu/h (NIST SP 811). */
export const BTUH_PER_W = 3.412142;
/** 1 cfm = 0.471947 L/s (NIST SP 811). */
export const LPS_PER_CFM = 0.471947443;
/** 1 in² = 6.4516 cm² (exact). */
export const CM2_PER_IN2 = 6.4516;
/** 1 ft² = 0.09290304 m² (exact). */
export const M2_PER_FT2 = 0.09290304;
/** 1 mph = 0.44704 m/s (exact). */
export const MPS_PER_MPH = 0.44704;
/** 1 ft³ = 0.028316846592 m³ (exact). */
export const M3_PER_FT3 = 0.028316846592;
/** grains per pound (exact). */
export const GRAINS_PER_LB = 7000;
/** Btu/h in one ton of refrigeration (definition: 12,000 Btu/h). */
export const BTUH_PER_TON = 12_000;

export const DEG = Math.PI / 180;

/** Temperature difference °F → K. */
export function deltaFToK(deltaF: number): number {
  return deltaF / 1.8;
}

/** 24 zeros in a plain array, one per solar hour (typed arrays cost more to allocate than they save at this size). */
export function hours24(): number[] {
  return [0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0];
}

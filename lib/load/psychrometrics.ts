/**
 * Psychrometrics through psychrolib, always in IP units.
 *
 * psychrolib keeps its unit system in library-wide mutable state (SetUnitSystem). To keep that
 * from changing results anywhere, this module is the ONLY place in Platload that imports
 * psychrolib: it sets IP once, here at load time, and never switches. Every other module calls
 * the functions below. Do not import psychrolib elsewhere (and never call SetUnitSystem(SI)).
 */
import psychrolib from "psychrolib";
import { GRAINS_PER_LB } from "./units";

psychrolib.SetUnitSystem(psychrolib.IP);

/** Standard sea-level pressure, psia (ASHRAE HoF ch. 1, 14.696 psia). */
export const SEA_LEVEL_PRESSURE_PSIA = 14.696;

function assertIp(): void {
  // Guard against a stray SetUnitSystem elsewhere in the process.
  if (psychrolib.GetUnitSystem() !== psychrolib.IP) {
    throw new Error("psychrolib unit system was changed away from IP outside lib/load/psychrometrics.ts");
  }
}

/** Standard-atmosphere pressure at an elevation, psia (HoF ch. 1 eq. 3, via psychrolib). */
export function standardPressurePsia(elevationFt: number): number {
  assertIp();
  return psychrolib.GetStandardAtmPressure(elevationFt);
}

/** Humidity ratio from dry bulb and wet bulb, grains of water per lb of dry air (HoF ch. 1 eq. 33/35). */
export function humidityRatioGrFromWetBulb(dryBulbF: number, wetBulbF: number, pressurePsia: number): number {
  assertIp();
  return psychrolib.GetHumRatioFromTWetBulb(dryBulbF, wetBulbF, pressurePsia) * GRAINS_PER_LB;
}

/** Humidity ratio from dry bulb and relative humidity (%), grains per lb dry air (HoF ch. 1 eq. 20/22). */
export function humidityRatioGrFromRelHum(dryBulbF: number, relHumPct: number, pressurePsia: number): number {
  assertIp();
  return psychrolib.GetHumRatioFromRelHum(dryBulbF, relHumPct / 100, pressurePsia) * GRAINS_PER_LB;
}

/**
 * Psychrometrics through psychrolib, always in IP units.
 *
 * psychrolib's default export is one shared instance whose unit system is mutable state
 * (SetUnitSystem). The engine does not use it: it builds a private instance from the same
 * constructor, sets IP on it once and never exposes it, so nothing else in the process can switch
 * the engine's units.
 */
import psychrolib, { type Psychrolib } from "psychrolib";
import { GRAINS_PER_LB } from "./units";

const PsychrometricsInstance = psychrolib.constructor as new () => Psychrolib;
const ip: Psychrolib = new PsychrometricsInstance();
ip.SetUnitSystem(ip.IP);

/** Standard sea-level pressure, psia (ASHRAE HoF ch. 1, 14.696 psia). */
export const SEA_LEVEL_PRESSURE_PSIA = 14.696;

/** Standard-atmosphere pressure at an elevation, psia (HoF ch. 1 eq. 3, via psychrolib). */
export function standardPressurePsia(elevationFt: number): number {
  return ip.GetStandardAtmPressure(elevationFt);
}

/** Humidity ratio from dry bulb and wet bulb, grains of water per lb of dry air (HoF ch. 1 eq. 33/35). */
export function humidityRatioGrFromWetBulb(dryBulbF: number, wetBulbF: number, pressurePsia: number): number {
  return ip.GetHumRatioFromTWetBulb(dryBulbF, wetBulbF, pressurePsia) * GRAINS_PER_LB;
}

/** Humidity ratio from dry bulb and relative humidity (%), grains per lb dry air (HoF ch. 1 eq. 20/22). */
export function humidityRatioGrFromRelHum(dryBulbF: number, relHumPct: number, pressurePsia: number): number {
  return ip.GetHumRatioFromRelHum(dryBulbF, relHumPct / 100, pressurePsia) * GRAINS_PER_LB;
}

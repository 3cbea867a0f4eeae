/**
 * Indoor temperature swing for the hourly method. A house's thermostat lets the rooms drift a
 * little above the set point at the hottest hours while its furnishings and linings store heat;
 * HoF 2021 ch. 17 (read) says this "has a significant moderating effect on peak loads", warns that
 * fixed-set-point methods give "unrealistically high cooling loads for residential applications",
 * derives its residential factors with a 1.7 K swing (Table 1), and describes its reference
 * method's approach: it "searches for sensible capacity sufficient to hold the space temperature
 * within a specified excursion above the set point". We do the same search on a one-node model of
 * ours: interior heat capacity C and conductance K to outdoors, the fixed-set-point hourly load L(h)
 * (after the radiant and conduction time series) as the driving gain:
 *   C·dδ/dt = L(h) − K·δ − E(h),  E = the capacity Q while δ > 0 or L > Q, else just L (δ held at 0).
 */

/** The excursion the handbook's residential factors assume, 1.7 K (HoF 2021 ch. 17 Table 1, read) = 3.06 °F. */
export const DESIGN_TEMPERATURE_SWING_F = 1.7 * 1.8;

/**
 * Heat capacity of a house's interior linings and contents per unit area, from HoF 2021 ch. 18
 * Table 18 (read), kJ/(m²·K): 16 mm gypsum board 13.90, 25 mm wood 25.35. Our interior: ½ in
 * (12.7 mm) gypsum on the ceilings and on the inside of every exterior wall (13.90 × 12.7/15.9), and
 * furnishings as the chapter's representative zones have them (Table 21: 25 mm wood over 50 % of the
 * floor). Partitions, floor mass under carpet and framing are left out (less capacity, a smaller
 * credit: conservative).
 */
const GYPSUM_HALF_INCH_KJ_M2K = (13.9 * 12.7) / 15.9;
const FURNISHINGS_KJ_PER_M2_FLOOR = 25.35 * 0.5;
/** 1 kJ/(m²·K) in Btu/(ft²·°F): 0.947817 Btu per kJ ÷ (10.76391 ft² per m² × 1.8 °F per K). */
const BTU_FT2F_PER_KJ_M2K = 0.947817 / (10.76391 * 1.8);

export function interiorCapacitanceBtuPerF(
  floorAreaFt2: number,
  ceilingAreaFt2: number,
  exteriorWallNetFt2: number,
): number {
  return (
    (FURNISHINGS_KJ_PER_M2_FLOOR * floorAreaFt2 +
      GYPSUM_HALF_INCH_KJ_M2K * (ceilingAreaFt2 + exteriorWallNetFt2)) *
    BTU_FT2F_PER_KJ_M2K
  );
}

const DAYS = 3; // the periodic day is reached well within three from δ = 0 (C/K is a few hours)

function maxExcursionF(
  load: ArrayLike<number>,
  capacity: number,
  conductance: number,
  decay: number,
): number {
  let delta = 0;
  let max = 0;
  for (let d = 0; d < DAYS; d++) {
    for (let h = 0; h < 24; h++) {
      const l = load[h];
      if (delta <= 0 && l <= capacity) {
        delta = 0;
        continue;
      }
      const equilibrium = (l - capacity) / conductance;
      delta = equilibrium + (delta - equilibrium) * decay; // exact over the hour for a constant L
      if (delta < 0) delta = 0;
      if (d === DAYS - 1 && delta > max) max = delta;
    }
  }
  return max;
}

/**
 * The smallest sensible capacity, Btu/h, that keeps the rooms within `swingF` above the set point
 * over the periodic design day, given the hourly fixed-set-point load (Btu/h), the conductance to
 * outdoors K (Btu/h·°F) and the interior capacitance C (Btu/°F). Never more than the peak load.
 */
export function capacityWithSwingBtuh(
  load: ArrayLike<number>,
  conductanceBtuhF: number,
  capacitanceBtuF: number,
  swingF: number,
): number {
  let peak = 0;
  for (let h = 0; h < 24; h++) if (load[h] > peak) peak = load[h];
  if (!(swingF > 0) || !(capacitanceBtuF > 0) || !(conductanceBtuhF > 0) || peak <= 0) return peak;
  const decay = Math.exp(-conductanceBtuhF / capacitanceBtuF);
  let lo = 0;
  let hi = peak;
  for (let i = 0; i < 40 && hi - lo > 1; i++) {
    const mid = 0.5 * (lo + hi);
    if (maxExcursionF(load, mid, conductanceBtuhF, decay) <= swingF) hi = mid;
    else lo = mid;
  }
  return hi;
}

/**
 * The cooling design day's outdoor dry-bulb profile.
 *
 * Fraction of the daily range below the design dry bulb, by hour 1–24: HoF 2009–2021 ch. 14
 * Table 6 (from RP-1363). Values recalled (from memory) and matching two independent public
 * implementations of the same table; hour 15 is the daily maximum, hour 5 the minimum.
 */
export const FRACTION_OF_DAILY_RANGE: readonly number[] = [
  0.87, 0.92, 0.96, 0.99, 1.0, 0.98, 0.93, 0.84, 0.71, 0.56, 0.39, 0.23, 0.11, 0.03, 0.0, 0.03, 0.1, 0.21, 0.34,
  0.47, 0.58, 0.68, 0.76, 0.82,
];

/** Outdoor dry bulb for hours 1–24 (index 0 = hour 1): To(h) = To,design − DR·f(h). */
export function outdoorDryBulbProfileF(coolingOutdoorDbF: number, dailyRangeF: number): number[] {
  return FRACTION_OF_DAILY_RANGE.map((f) => coolingOutdoorDbF - dailyRangeF * f);
}

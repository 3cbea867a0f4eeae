/**
 * The cooling design day's outdoor dry-bulb profile.
 *
 * Fraction of the daily range below the design dry bulb, by hour 1–24: HoF 2021 SI ch. 14
 * Table 6 "Fraction of Daily Temperature Range" (from RP-1363 and RP-1453), read in a stored
 * Markdown copy of the 2021 SI chapter (p. 14.13). The chapter says the profile is, strictly,
 * in solar time; we apply it on apparent solar hours. Hours 14 and 15 are the daily maximum
 * (0.00), hour 5 the minimum (1.00).
 */
export const FRACTION_OF_DAILY_RANGE: readonly number[] = [
  0.88, 0.92, 0.95, 0.98, 1.0, 0.98, 0.91, 0.74, 0.55, 0.38, 0.23, 0.13, 0.05, 0.0, 0.0, 0.06, 0.14, 0.24,
  0.39, 0.5, 0.59, 0.68, 0.75, 0.82,
];

/** Outdoor dry bulb for hours 1–24 (index 0 = hour 1): To(h) = To,design − DR·f(h) (HoF 2021 ch. 14, Generating Design-Day Data). */
export function outdoorDryBulbProfileF(coolingOutdoorDbF: number, dailyRangeF: number): number[] {
  return FRACTION_OF_DAILY_RANGE.map((f) => coolingOutdoorDbF - dailyRangeF * f);
}

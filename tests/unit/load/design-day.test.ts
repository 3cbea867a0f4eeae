/**
 * Design-day outdoor dry bulb against HoF 2021 SI ch. 14 (read in a stored Markdown copy of the
 * 2021 SI chapter, pp. 14.12–14.13): Table 6 "Fraction of Daily Temperature Range" and
 * Example 9 / Table 8, Atlanta July 5 % dry-bulb design day.
 */
import { describe, expect, it } from "vitest";
import { FRACTION_OF_DAILY_RANGE, outdoorDryBulbProfileF } from "../../../lib/load/design-day";

// HoF 2021 SI ch. 14 Table 6, hours 1–24 (solar time).
const HOF_2021_CH14_TABLE_6 = [
  0.88, 0.92, 0.95, 0.98, 1.0, 0.98, 0.91, 0.74, 0.55, 0.38, 0.23, 0.13, 0.05, 0.0, 0.0, 0.06, 0.14, 0.24,
  0.39, 0.5, 0.59, 0.68, 0.75, 0.82,
];

// HoF 2021 SI ch. 14 Table 8: Atlanta July 5 % design day, dry bulb °C by hour 1–24 local daylight time.
const HOF_2021_CH14_TABLE_8_DB_C = [
  24.7, 23.9, 23.2, 22.8, 22.5, 22.1, 21.9, 22.1, 22.9, 24.8, 26.9, 28.8, 30.5, 31.6, 32.5, 33.1, 33.1, 32.4,
  31.5, 30.4, 28.7, 27.5, 26.5, 25.5,
];

describe("fraction of daily range (HoF 2021 SI ch. 14 Table 6)", () => {
  it("has the 24 printed fractions", () => {
    expect(FRACTION_OF_DAILY_RANGE).toEqual(HOF_2021_CH14_TABLE_6);
  });
});

describe("Atlanta July 5 % design day (HoF 2021 SI ch. 14 Example 9, Table 8)", () => {
  // Example 9: DB 33.1 °C, MCDBR 11.2 °C; daylight time in effect. AST by eq. 7 with ET −6.4 min
  // (Table 2, July 21), LON −84.43°, LSM −75°: AST = LDT − 1 − 0.107 − 0.629; the example then
  // takes the nearest whole solar hour (hour 1 LDT → AST −0.73 → hour 23, fraction 0.75, 24.7 °C).
  const profileC = outdoorDryBulbProfileF(33.1, 11.2); // linear in temperature, so °C works as well as °F
  it.each(HOF_2021_CH14_TABLE_8_DB_C.map((db, i) => [i + 1, db] as const))(
    "hour %i LDT: %f °C (±0.05)",
    (ldtHour, dbC) => {
      const ast = ldtHour - 1 + -6.4 / 60 + (-84.43 - -75) / 15;
      const solarHour = ((Math.round(ast) + 23) % 24) + 1; // 1–24
      expect(Math.abs(profileC[solarHour - 1] - dbC)).toBeLessThanOrEqual(0.05 + 1e-9);
    },
  );
});

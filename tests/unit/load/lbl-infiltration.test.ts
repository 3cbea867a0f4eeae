/**
 * Basic (LBL) infiltration model and effective leakage area against HoF 2021 SI ch. 16, read in a
 * stored Markdown copy of the SI chapter: Table 4 (stack coefficients), Table 6 (wind
 * coefficients), eq. 41 and eq. 48, and the chapter's Examples 2–7 (pp. 16.15–16.25).
 */
import { describe, expect, it } from "vitest";
import {
  effectiveLeakageAreaCm2,
  lblInfiltrationLps,
  stackCoefficientSi,
  windCoefficientSi,
} from "../../../lib/load/infiltration";
import { LPS_PER_CFM } from "../../../lib/load/units";

describe("HoF 2021 SI ch. 16 Table 4, basic model stack coefficient, (L/s)²/(cm⁴·K)", () => {
  it.each([
    [1, 0.000145],
    [2, 0.00029],
    [3, 0.000435],
  ])("%i stories: %f", (stories, cs) => {
    expect(stackCoefficientSi(stories)).toBe(cs);
  });
});

describe("HoF 2021 SI ch. 16 Table 6, basic model wind coefficient, (L/s)²/(cm⁴·(m/s)²)", () => {
  // Rows shelter class 1–5; columns one, two, three stories (as printed).
  const TABLE_6 = [
    [0.000319, 0.00042, 0.000494],
    [0.000246, 0.000325, 0.000382],
    [0.000174, 0.000231, 0.000271],
    [0.000104, 0.000137, 0.000161],
    [0.000032, 0.000042, 0.000049],
  ];
  const cells = TABLE_6.flatMap((row, c) => row.map((cw, s) => [c + 1, s + 1, cw] as const));
  it.each(cells)("shelter class %i, %i stories: %f", (shelterClass, stories, cw) => {
    expect(windCoefficientSi(stories, shelterClass)).toBe(cw);
  });
});

describe("HoF 2021 SI ch. 16 eq. 48 examples (m³/s, to the printed digits)", () => {
  it("Example 3: one story, 690 cm², shelter class 4, ΔT 17 K, 2.7 m/s → 0.0392 m³/s", () => {
    const q = lblInfiltrationLps(690, stackCoefficientSi(1), 17, windCoefficientSi(1, 4), 2.7) / 1000;
    expect(Math.abs(q - 0.0392)).toBeLessThanOrEqual(0.00005);
  });
  it("Example 4: two stories, 848 cm², shelter class 3, ΔT 20 K, 3.2 m/s → 0.077 m³/s", () => {
    const q = lblInfiltrationLps(848, stackCoefficientSi(2), 20, windCoefficientSi(2, 3), 3.2) / 1000;
    expect(Math.abs(q - 0.077)).toBeLessThanOrEqual(0.0005);
  });
});

describe("effective leakage area at 4 Pa (HoF 2021 ch. 16 eq. 40–41) against the chapter's stated pairs", () => {
  // Examples 5–7 state the flow coefficient c (m³/(s·Pa^n)) and exponent n of houses and "the
  // corresponding effective leakage area at 4 Pa". We give the engine the 50 Pa flow c·50^n in cfm.
  const cfm50 = (c: number, n: number) => (c * Math.pow(50, n) * 1000) / LPS_PER_CFM;
  it.each([
    ["Example 5", 0.051, 0.67, 500],
    ["Example 6", 0.078, 0.6, 690],
    ["Example 7", 0.102, 0.67, 1000],
  ] as const)("%s: c %f, n %f → %i cm² (±1 %)", (_example, c, n, elaCm2) => {
    expect(Math.abs(effectiveLeakageAreaCm2(cfm50(c, n), n) - elaCm2)).toBeLessThanOrEqual(0.01 * elaCm2);
  });
});

/** Smaller pieces: solar geometry facts, overhang shading geometry, SHGC angular curve, orientation. */
import { describe, expect, it } from "vitest";
import { computeFacingLoads } from "../../../lib/load";
import { declinationDeg, designDayOfYear, equationOfTimeMin, sunPosition } from "../../../lib/load/solar";
import { overhangSunlitFraction, shgcAngleRatio } from "../../../lib/load/windows";
import { ASPEN_1, CEDAR_BEND_SITE } from "../../fixtures/engine/example-plans";

describe("solar geometry", () => {
  it("July 21 declination and equation of time match HoF 2021 SI ch. 14 Table 2 (20.4°, −6.4 min; read in a stored copy, p. 14.8)", () => {
    const n = designDayOfYear(7);
    expect(n).toBe(202);
    expect(declinationDeg(n)).toBeCloseTo(20.4, 0);
    expect(Math.abs(equationOfTimeMin(n) - -6.4)).toBeLessThan(0.2);
  });
  it("solar noon altitude is 90° − latitude + declination (geometry)", () => {
    const n = designDayOfYear(7);
    expect(sunPosition(33.64, n, 12).altitudeDeg).toBeCloseTo(90 - 33.64 + declinationDeg(n), 6);
  });
  it("morning sun is in the east, afternoon sun in the west (azimuth clockwise from north)", () => {
    const n = designDayOfYear(7);
    expect(sunPosition(35, n, 9).azimuthDeg).toBeGreaterThan(45);
    expect(sunPosition(35, n, 9).azimuthDeg).toBeLessThan(135);
    expect(sunPosition(35, n, 16).azimuthDeg).toBeGreaterThan(225);
    expect(sunPosition(35, n, 16).azimuthDeg).toBeLessThan(315);
  });
});

describe("overhang shading geometry", () => {
  // Shadow below the overhang = depth × tan(profile angle); shaded part of the glass = shadow − gap above the head.
  it("a 2 ft overhang 1 ft above a 5 ft window, profile angle 60° (tan 1.732): 2.464 ft of 5 ft shaded", () => {
    expect(overhangSunlitFraction(2, 1, 5, Math.tan((60 * Math.PI) / 180))).toBeCloseTo(
      1 - (2 * 1.7320508 - 1) / 5,
      6,
    );
  });
  it("no overhang, or low sun, leaves the window fully sunlit; a deep one shades it all", () => {
    expect(overhangSunlitFraction(0, 1, 5, 3)).toBe(1);
    expect(overhangSunlitFraction(2, 1, 5, 0.3)).toBe(1);
    expect(overhangSunlitFraction(10, 0, 5, 2)).toBe(0);
  });
  it("an overhang lowers the window's solar gain on a south facade", () => {
    // ASPEN_1 has 1.5 ft overhangs; at July noon at 33.5° N that shades a south window fully.
    const shaded = computeFacingLoads(ASPEN_1, CEDAR_BEND_SITE, 180, { procedure: "hourly" });
    const plan = structuredClone(ASPEN_1) as typeof ASPEN_1 & {
      facades: { front: { window: { overhangDepthFt: number } } };
    };
    plan.facades.front.window.overhangDepthFt = 0;
    const bare = computeFacingLoads(plan, CEDAR_BEND_SITE, 180, { procedure: "hourly" });
    // Solar noon (hour 12), when the sun is square to the south facade.
    expect(shaded.cooling.hourlySensibleBtuh[11]).toBeLessThan(bare.cooling.hourlySensibleBtuh[11] - 300);
    expect(shaded.heating.totalBtuh).toBe(bare.heating.totalBtuh);
  });
});

describe("SHGC angular curve", () => {
  it("is 1 at normal incidence, 0 at grazing, and never rises with angle", () => {
    expect(shgcAngleRatio(0)).toBe(1);
    expect(shgcAngleRatio(90)).toBe(0);
    let last = 1;
    for (let a = 0; a <= 90; a += 5) {
      const r = shgcAngleRatio(a);
      expect(r).toBeLessThanOrEqual(last);
      last = r;
    }
  });
});

describe("orientation", () => {
  it("facade azimuths: front = θ, left = θ + 90, back = θ + 180, right = θ + 270", () => {
    expect(
      computeFacingLoads(ASPEN_1, CEDAR_BEND_SITE, 300, { procedure: "hourly" }).facadeAzimuthsDeg,
    ).toEqual({ front: 300, left: 30, back: 120, right: 210 });
  });
});

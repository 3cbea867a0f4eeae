/**
 * Solar geometry and the ASHRAE clear-sky model, HoF 2021 ch. 14 ("Climatic Design
 * Information", section on clear-sky solar radiation).
 *
 * Equations, numbers and constants checked against the 2021 SI edition of the chapter, read in a
 * stored Markdown copy (section 2 "Calculating Clear-Sky Solar Radiation" and section 3
 * "Transposition to Receiving Surfaces", pp. 14.8–14.12). The formulas reproduce the chapter's
 * Atlanta July 21 Examples 3 and 7 (beam 784, diffuse 166 W/m² at noon; 280/121/87.9 W/m² on a
 * surface 60° W of S at 3 pm daylight time) to within 0.5 % — see
 * tests/unit/load/reference-checks.test.ts.
 *
 * Conventions (stated once): angles in degrees; azimuths measured clockwise from north
 * (0 = N, 90 = E, 180 = S, 270 = W), for the sun and for surfaces alike; surface tilt Σ from
 * horizontal (0 = facing up, 90 = vertical); hours are apparent solar time, hour h of the
 * design day evaluated at h:00 (hour 12 = solar noon). Irradiances in W/m² inside this module;
 * callers convert with BTUH_FT2_PER_W_M2.
 */
import { DEG } from "./units";

/** Solar constant, W/m² (HoF 2021 ch. 14, Esc = 1367 W/m², the WMO 1981 value the chapter uses). */
export const SOLAR_CONSTANT_W_M2 = 1367;

/** Day of year of the 21st of each month, the handbook's design days (HoF 2021 ch. 14 Table 2, day of year row). */
const DAY_OF_YEAR_21ST = [21, 52, 80, 111, 141, 172, 202, 233, 264, 294, 325, 355] as const;

export function designDayOfYear(month: number): number {
  const n = DAY_OF_YEAR_21ST[month - 1];
  if (n === undefined) throw new RangeError(`design month must be 1–12, got ${month}`);
  return n;
}

/** Extraterrestrial normal irradiance E0, W/m² (HoF 2021 ch. 14 eq. 4). */
export function extraterrestrialIrradianceWm2(dayOfYear: number): number {
  return SOLAR_CONSTANT_W_M2 * (1 + 0.033 * Math.cos((360 * (dayOfYear - 3) * DEG) / 365));
}

/** Equation of time, minutes (HoF 2021 ch. 14 eq. 5, Γ = 360°(n − 1)/365). */
export function equationOfTimeMin(dayOfYear: number): number {
  const g = ((360 * (dayOfYear - 1)) / 365) * DEG;
  return (
    2.2918 *
    (0.0075 +
      0.1868 * Math.cos(g) -
      3.2077 * Math.sin(g) -
      1.4615 * Math.cos(2 * g) -
      4.089 * Math.sin(2 * g))
  );
}

/** Solar declination, degrees (HoF 2021 ch. 14 eq. 10). */
export function declinationDeg(dayOfYear: number): number {
  return 23.45 * Math.sin(((360 * (dayOfYear + 284)) / 365) * DEG);
}

/**
 * Apparent solar time from local standard time (HoF 2021 ch. 14 eq. 7):
 * AST = LST + ET/60 + (LON − LSM)/15, longitudes east-positive, hours.
 */
export function apparentSolarTimeHours(
  localStandardTimeHours: number,
  longitudeDeg: number,
  standardMeridianDeg: number,
  dayOfYear: number,
): number {
  return (
    localStandardTimeHours + equationOfTimeMin(dayOfYear) / 60 + (longitudeDeg - standardMeridianDeg) / 15
  );
}

export interface SunPosition {
  altitudeDeg: number;
  /** Clockwise from north. */
  azimuthDeg: number;
}

/**
 * Solar altitude and azimuth (HoF 2021 ch. 14 eq. 11–15): hour angle H = 15(AST − 12) (eq. 11);
 * sin β = cos L cos δ cos H + sin L sin δ (eq. 12); azimuth from the handbook's south-based angle φ.
 */
export function sunPosition(latitudeDeg: number, dayOfYear: number, solarTimeHours: number): SunPosition {
  const lat = latitudeDeg * DEG;
  const dec = declinationDeg(dayOfYear) * DEG;
  const hourAngle = 15 * (solarTimeHours - 12) * DEG;
  const sinBeta = Math.cos(lat) * Math.cos(dec) * Math.cos(hourAngle) + Math.sin(lat) * Math.sin(dec);
  const beta = Math.asin(Math.max(-1, Math.min(1, sinBeta)));
  // φ measured from south, positive west (afternoon), HoF 2021 ch. 14 eq. 14–15; this cos φ is
  // the same quantity as eq. 15's (cos H cos δ sin L − sin δ cos L)/cos β, written with sin β.
  const cosPhi = (sinBeta * Math.sin(lat) - Math.sin(dec)) / (Math.cos(beta) * Math.cos(lat));
  let phi = Math.acos(Math.max(-1, Math.min(1, cosPhi)));
  if (hourAngle < 0) phi = -phi;
  const azimuthDeg = (180 + phi / DEG + 360) % 360;
  return { altitudeDeg: beta / DEG, azimuthDeg };
}

/** Relative air mass, Kasten and Young (1989), as adopted in HoF 2021 ch. 14 eq. 16. */
export function airMassKastenYoung(altitudeDeg: number): number {
  return 1 / (Math.sin(altitudeDeg * DEG) + 0.50572 * Math.pow(6.07995 + altitudeDeg, -1.6364));
}

/** Air-mass exponents of the 2013+ clear-sky model (HoF 2013–2021 ch. 14 eq. 19–20). */
export function airMassExponents(tauBeam: number, tauDiffuse: number): { ab: number; ad: number } {
  return {
    ab: 1.454 - 0.406 * tauBeam - 0.268 * tauDiffuse + 0.021 * tauBeam * tauDiffuse,
    ad: 0.507 + 0.205 * tauBeam - 0.08 * tauDiffuse - 0.19 * tauBeam * tauDiffuse,
  };
}

export interface ClearSky {
  beamNormalWm2: number;
  diffuseHorizontalWm2: number;
}

/** Clear-sky beam normal and diffuse horizontal irradiance (HoF 2021 ch. 14 eq. 17–18). */
export function clearSkyIrradiance(
  dayOfYear: number,
  altitudeDeg: number,
  tauBeam: number,
  tauDiffuse: number,
): ClearSky {
  if (altitudeDeg <= 0) return { beamNormalWm2: 0, diffuseHorizontalWm2: 0 };
  const e0 = extraterrestrialIrradianceWm2(dayOfYear);
  const m = airMassKastenYoung(altitudeDeg);
  const { ab, ad } = airMassExponents(tauBeam, tauDiffuse);
  return {
    beamNormalWm2: e0 * Math.exp(-tauBeam * Math.pow(m, ab)),
    diffuseHorizontalWm2: e0 * Math.exp(-tauDiffuse * Math.pow(m, ad)),
  };
}

export interface SurfaceIrradiance {
  /** Incidence angle θ between the beam and the surface normal, degrees. */
  incidenceDeg: number;
  beamWm2: number;
  diffuseWm2: number;
  reflectedWm2: number;
  totalWm2: number;
}

/**
 * Irradiance on a surface (HoF 2021 ch. 14 eq. 21–31): γ = φ − ψ, cos θ = cos β cos γ sin Σ + sin β cos Σ;
 * beam Eb·cos θ; sky diffuse Ed·Y on vertical surfaces, Ed·(Y sin Σ + cos Σ) for Σ ≤ 90°, with
 * Y = max(0.45, 0.55 + 0.437 cos θ + 0.313 cos² θ); ground-reflected (Eb sin β + Ed)·ρg·(1 − cos Σ)/2.
 */
export function surfaceIrradiance(
  sky: ClearSky,
  sun: SunPosition,
  surfaceAzimuthDeg: number,
  tiltDeg: number,
  groundReflectance: number,
): SurfaceIrradiance {
  if (sun.altitudeDeg <= 0) {
    return { incidenceDeg: 90, beamWm2: 0, diffuseWm2: 0, reflectedWm2: 0, totalWm2: 0 };
  }
  const beta = sun.altitudeDeg * DEG;
  const gamma = (sun.azimuthDeg - surfaceAzimuthDeg) * DEG;
  const sigma = tiltDeg * DEG;
  const cosTheta = Math.cos(beta) * Math.cos(gamma) * Math.sin(sigma) + Math.sin(beta) * Math.cos(sigma);
  const beamWm2 = cosTheta > 0 ? sky.beamNormalWm2 * cosTheta : 0;
  const y = Math.max(0.45, 0.55 + 0.437 * cosTheta + 0.313 * cosTheta * cosTheta);
  const diffuseWm2 =
    tiltDeg >= 90
      ? sky.diffuseHorizontalWm2 * y
      : sky.diffuseHorizontalWm2 * (y * Math.sin(sigma) + Math.cos(sigma));
  const reflectedWm2 =
    (sky.beamNormalWm2 * Math.sin(beta) + sky.diffuseHorizontalWm2) *
    groundReflectance *
    ((1 - Math.cos(sigma)) / 2);
  return {
    incidenceDeg: Math.acos(Math.max(-1, Math.min(1, cosTheta))) / DEG,
    beamWm2,
    diffuseWm2,
    reflectedWm2,
    totalWm2: beamWm2 + diffuseWm2 + reflectedWm2,
  };
}

// ---------------------------------------------------------------------------------------------
// Per-site precomputation: the 24 design-day hours, computed once per site and reused for every
// plan and facing. Surface profiles are cached by (azimuth, tilt) on the site object.

export interface SolarHour {
  hour: number;
  sun: SunPosition;
  sky: ClearSky;
}

/** One surface's 24-hour irradiance, in W/m², plus the pieces a window needs. */
export interface SurfaceProfile {
  azimuthDeg: number;
  tiltDeg: number;
  /** Beam on the surface (before shading), W/m², hours 1–24. */
  beamWm2: Float64Array;
  /** Sky diffuse + ground-reflected on the surface, W/m². */
  diffuseAndReflectedWm2: Float64Array;
  /** Total (beam + diffuse + reflected), W/m². */
  totalWm2: Float64Array;
  incidenceDeg: Float64Array;
  /** tan of the profile angle for overhang geometry (vertical surfaces); 0 when the sun is behind. */
  tanProfileAngle: Float64Array;
}

export class SiteSolarDay {
  readonly hours: SolarHour[];
  private readonly profiles = new Map<number, SurfaceProfile>();

  constructor(
    readonly latitudeDeg: number,
    readonly dayOfYear: number,
    readonly tauBeam: number,
    readonly tauDiffuse: number,
    readonly groundReflectance: number,
  ) {
    this.hours = [];
    for (let hour = 1; hour <= 24; hour++) {
      const sun = sunPosition(latitudeDeg, dayOfYear, hour);
      this.hours.push({
        hour,
        sun,
        sky: clearSkyIrradiance(dayOfYear, sun.altitudeDeg, tauBeam, tauDiffuse),
      });
    }
  }

  /** The 24-hour irradiance on a surface of the given azimuth and tilt (cached). */
  surface(azimuthDeg: number, tiltDeg: number): SurfaceProfile {
    const az = ((azimuthDeg % 360) + 360) % 360;
    // Numeric key to 0.001° in azimuth and 0.01° in tilt.
    const key = Math.round(az * 1000) * 100_000 + Math.round(tiltDeg * 100);
    const cached = this.profiles.get(key);
    if (cached) return cached;
    const beamWm2 = new Float64Array(24);
    const diffuseAndReflectedWm2 = new Float64Array(24);
    const totalWm2 = new Float64Array(24);
    const incidenceDeg = new Float64Array(24);
    const tanProfileAngle = new Float64Array(24);
    this.hours.forEach(({ sun, sky }, i) => {
      const s = surfaceIrradiance(sky, sun, az, tiltDeg, this.groundReflectance);
      beamWm2[i] = s.beamWm2;
      diffuseAndReflectedWm2[i] = s.diffuseWm2 + s.reflectedWm2;
      totalWm2[i] = s.totalWm2;
      incidenceDeg[i] = s.incidenceDeg;
      // Profile (vertical shadow) angle Ω on a vertical surface: tan Ω = tan β / cos γ (HoF ch. 15).
      const cosGamma = Math.cos((sun.azimuthDeg - az) * DEG);
      tanProfileAngle[i] =
        sun.altitudeDeg > 0 && cosGamma > 1e-6 ? Math.tan(sun.altitudeDeg * DEG) / cosGamma : 0;
    });
    const profile: SurfaceProfile = {
      azimuthDeg: az,
      tiltDeg,
      beamWm2,
      diffuseAndReflectedWm2,
      totalWm2,
      incidenceDeg,
      tanProfileAngle,
    };
    this.profiles.set(key, profile);
    return profile;
  }
}

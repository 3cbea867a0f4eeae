/** Facing conventions, stated once: azimuths in degrees clockwise from north, taken modulo 360. */
import type { Facade } from "./input";

export function normalizeAzimuth(deg: number): number {
  return ((deg % 360) + 360) % 360;
}

/** Facade azimuths for a front facing `facingAzimuthDeg`: left +90°, back +180°, right +270° (as seen from the street). */
export function facadeAzimuthsDeg(facingAzimuthDeg: number): Record<Facade, number> {
  const az = normalizeAzimuth(facingAzimuthDeg);
  return {
    front: az,
    left: normalizeAzimuth(az + 90),
    back: normalizeAzimuth(az + 180),
    right: normalizeAzimuth(az + 270),
  };
}

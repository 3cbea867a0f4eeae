/**
 * A lot's facing: the azimuth the front door faces, degrees clockwise from north (the engine's convention,
 * "Orientation"). Typed as a compass point of the 16-point rose (N, NNE, NE, … NNW) or degrees
 * ("135", "135°", "135 deg").
 */
export const COMPASS_POINTS = ["N", "NNE", "NE", "ENE", "E", "ESE", "SE", "SSE", "S", "SSW", "SW", "WSW", "W", "WNW", "NW", "NNW"] as const;
export type CompassPoint = (typeof COMPASS_POINTS)[number];

const WORDS: Record<string, CompassPoint> = { NORTH: "N", EAST: "E", SOUTH: "S", WEST: "W", NORTHEAST: "NE", NORTHWEST: "NW", SOUTHEAST: "SE", SOUTHWEST: "SW" };

export type FacingRead = { ok: true; deg: number } | { ok: false; reason: string };

export function parseFacing(input: string | number | null | undefined): FacingRead {
  if (input === null || input === undefined || String(input).trim() === "") return { ok: false, reason: "is required: a compass point (N, NE, E, …) or degrees from north (0–360)" };
  if (typeof input === "number") return degrees(input, String(input));
  const text = input.trim().toUpperCase().replace(/[\s-]+/g, "");
  const point = (COMPASS_POINTS as readonly string[]).includes(text) ? (text as CompassPoint) : WORDS[text];
  if (point) return { ok: true, deg: COMPASS_POINTS.indexOf(point) * 22.5 };
  const match = /^(-?\d+(?:\.\d+)?)(?:°|DEG|DEGREES)?$/.exec(text);
  if (match) return degrees(Number(match[1]), input.trim());
  return { ok: false, reason: `"${input.trim()}" is not a facing: use a compass point (N, NE, E, SE, S, SW, W, NW and the points between, like NNE) or degrees from north (0–360)` };
}

function degrees(value: number, shown: string): FacingRead {
  if (!Number.isFinite(value) || value < 0 || value > 360) return { ok: false, reason: `${shown} is out of range: degrees from north run from 0 to 360` };
  return { ok: true, deg: value === 360 ? 0 : Math.round(value * 10) / 10 };
}

/** "NE (45°)" for a compass point's azimuth, else "137.5°". */
export function facingLabel(deg: number): string {
  const index = deg / 22.5;
  if (Number.isInteger(index)) return `${COMPASS_POINTS[index % 16]} (${deg}°)`;
  return `${deg}°`;
}

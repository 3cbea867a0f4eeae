/**
 * A lot's facing: the azimuth the front door faces, degrees clockwise from north (the engine's
 * convention). Typed as a compass point of the 16-point rose (N, NNE, NE, … NNW), one of the
 * eight compass words ("north", "north-east", "South West"), or degrees from 0 to 360 written in
 * digits ("135", "22.5", "135°", "135 deg"). Negative degrees are not facings (45° west of north is
 * 315): the grid, the bulk set, the lots import and the API all read facings here, so each of them
 * refuses "-45", "1-80" or "45e0" with the same reason instead of reading some other angle.
 */
export const COMPASS_POINTS = [
  "N",
  "NNE",
  "NE",
  "ENE",
  "E",
  "ESE",
  "SE",
  "SSE",
  "S",
  "SSW",
  "SW",
  "WSW",
  "W",
  "WNW",
  "NW",
  "NNW",
] as const;
export type CompassPoint = (typeof COMPASS_POINTS)[number];

const WORDS: Record<string, CompassPoint> = {
  NORTH: "N",
  EAST: "E",
  SOUTH: "S",
  WEST: "W",
  NORTHEAST: "NE",
  NORTHWEST: "NW",
  SOUTHEAST: "SE",
  SOUTHWEST: "SW",
};

/** Letters, with single spaces or hyphens only between words ("north-east", "South West"). */
const COMPASS_TEXT = /^[A-Z]+(?:[ -][A-Z]+)*$/;
/** Digits with an optional decimal part and an optional degree mark; no sign, no exponent. */
const DEGREES_TEXT = /^(\d{1,3}(?:\.\d+)?)\s*(?:°|DEG|DEGREES)?$/;

export type FacingRead = { ok: true; deg: number } | { ok: false; reason: string };

const FORMS =
  "use a compass point (N, NE, E, SE, S, SW, W, NW and the points between, like NNE) or degrees from north, 0 to 360 clockwise";

export function parseFacing(input: string | number | null | undefined): FacingRead {
  if (input === null || input === undefined || String(input).trim() === "")
    return { ok: false, reason: "is required: a compass point (N, NE, E, …) or degrees from north (0–360)" };
  if (typeof input === "number") return degrees(input, String(input));
  const shown = input.trim();
  const text = shown.toUpperCase().replace(/\s+/g, " ");
  if (COMPASS_TEXT.test(text)) {
    const joined = text.replace(/[ -]/g, "");
    const point = (COMPASS_POINTS as readonly string[]).includes(joined)
      ? (joined as CompassPoint)
      : WORDS[joined];
    if (point) return { ok: true, deg: COMPASS_POINTS.indexOf(point) * 22.5 };
  }
  const match = DEGREES_TEXT.exec(text);
  if (match) return degrees(Number(match[1]), shown);
  if (/^-\s*\d/.test(text))
    return {
      ok: false,
      reason: `"${shown}" is not a facing: degrees from north run from 0 to 360 clockwise, without a minus sign (45° west of north is 315)`,
    };
  return { ok: false, reason: `"${shown}" is not a facing: ${FORMS}` };
}

function degrees(value: number, shown: string): FacingRead {
  if (!Number.isFinite(value) || value < 0 || value > 360)
    return {
      ok: false,
      reason: `${shown} is out of range: degrees from north run from 0 to 360 clockwise (45° west of north is 315)`,
    };
  // Kept to a tenth of a degree (the lots column); 360 and anything that rounds to it is north.
  const tenths = Math.round(value * 10) / 10;
  return { ok: true, deg: tenths === 360 ? 0 : tenths };
}

/** "NE (45°)" for a compass point's azimuth, else "137.5°". */
export function facingLabel(deg: number): string {
  const index = deg / 22.5;
  if (Number.isInteger(index)) return `${COMPASS_POINTS[index % 16]} (${deg}°)`;
  return `${deg}°`;
}

/**
 * Reading a typed cell for a column of a known quantity kind.
 *
 * A builder types "R-19", "1,250 sf", "0.30 U" or "12'" into a cell. Each column has one
 * quantity kind; a cell is read as a number in that kind's unit or rejected with a reason.
 * Nothing is guessed: a unit that belongs to another kind of column ("R-19" in an area
 * column), a metric unit (we do not convert metric), a comma that could be a decimal comma,
 * or anything else we cannot read is an error on that cell, never a silently wrong number.
 *
 * Conventions:
 * - IP units only, the engine's units (ft², ft, h·ft²·°F/Btu, Btu/h·ft²·°F, cfm, °F, Btu/h).
 * - Inches in a length column are converted to feet (12 in = 1 ft, exact); feet-and-inches
 *   (12'6") is read as 12.5 ft. These are IP-to-IP conversions by definition.
 * - A percent sign in a fraction column (0–1) divides by 100 ("70%" → 0.7).
 * - Thousands separators are accepted only in kinds whose values can reach 1,000
 *   (area, length, cfm, Btu/h, count) and only in strict groups of three ("1,250", "12,000.5").
 *   "1,25" or a comma in an R-value, U-factor or SHGC is rejected as a possible decimal comma.
 */

export const QUANTITY_KINDS = [
  "areaFt2",
  "lengthFt",
  "rValue",
  "uFactor",
  "fFactor",
  "shgc",
  "ach50",
  "cfm",
  "cfm50",
  "leakageAreaIn2",
  "temperatureF",
  "temperatureDifferenceF",
  "count",
  "percent",
  "fraction",
  "btuh",
  "degrees",
  "volumeFt3",
  "pitchIn12",
  "ratio",
] as const;
export type QuantityKind = (typeof QUANTITY_KINDS)[number];

/** What each kind is, for error messages, headers and the templates README. */
export const QUANTITY_KIND_INFO: Record<
  QuantityKind,
  {
    label: string;
    unit: string;
    allowsThousands: boolean;
    minimum?: number;
    maximum?: number;
    integer?: boolean;
  }
> = {
  areaFt2: { label: "area", unit: "ft²", allowsThousands: true, minimum: 0 },
  lengthFt: { label: "length", unit: "ft", allowsThousands: true },
  rValue: { label: "R-value", unit: "h·ft²·°F/Btu", allowsThousands: false, minimum: 0 },
  uFactor: { label: "U-factor", unit: "Btu/h·ft²·°F", allowsThousands: false, minimum: 0 },
  fFactor: { label: "slab-edge F-factor", unit: "Btu/h·ft·°F", allowsThousands: false, minimum: 0 },
  shgc: { label: "SHGC", unit: "0–1", allowsThousands: false, minimum: 0, maximum: 1 },
  ach50: { label: "air changes per hour at 50 Pa", unit: "ACH50", allowsThousands: false, minimum: 0 },
  cfm: { label: "airflow", unit: "cfm", allowsThousands: true, minimum: 0 },
  cfm50: { label: "blower-door airflow at 50 Pa", unit: "CFM50", allowsThousands: true, minimum: 0 },
  leakageAreaIn2: { label: "effective leakage area", unit: "in²", allowsThousands: true, minimum: 0 },
  temperatureF: { label: "temperature", unit: "°F", allowsThousands: false },
  temperatureDifferenceF: { label: "temperature difference", unit: "°F", allowsThousands: false },
  count: { label: "count", unit: "count", allowsThousands: true, minimum: 0, integer: true },
  percent: { label: "percent", unit: "%", allowsThousands: false, minimum: 0, maximum: 100 },
  fraction: { label: "fraction", unit: "0–1", allowsThousands: false, minimum: 0, maximum: 1 },
  btuh: { label: "heat rate", unit: "Btu/h", allowsThousands: true },
  degrees: { label: "angle", unit: "°", allowsThousands: false },
  volumeFt3: { label: "volume", unit: "ft³", allowsThousands: true, minimum: 0 },
  pitchIn12: { label: "roof pitch", unit: "in per 12 in", allowsThousands: false, minimum: 0 },
  ratio: { label: "ratio", unit: "no unit", allowsThousands: false },
};

export type UnitReadResult = { ok: true; value: number } | { ok: false; reason: string };

type UnitToken = {
  /** Lower-case spellings after whitespace is collapsed. */
  spellings: readonly string[];
  /** The kinds this unit is valid in, with the factor that converts it to the kind's unit. */
  kinds: Partial<Record<QuantityKind, number>>;
  /** How the unit is named in a message. */
  name: string;
};

// Spellings are compared after lower-casing and collapsing whitespace; the unit may sit before
// or after the number ("R-19", "19 R", "U 0.30", "0.30 U").
const UNIT_TOKENS: readonly UnitToken[] = [
  {
    name: "ft²",
    spellings: [
      "sf",
      "s.f.",
      "sq ft",
      "sq. ft.",
      "sq. ft",
      "sq.ft.",
      "sq.ft",
      "sqft",
      "ft2",
      "ft^2",
      "ft²",
      "square feet",
      "square foot",
      "sq feet",
    ],
    kinds: { areaFt2: 1 },
  },
  { name: "ft", spellings: ["'", "ft", "ft.", "feet", "foot", "′"], kinds: { lengthFt: 1 } },
  // 12 in = 1 ft by definition.
  { name: "in", spellings: ['"', "in", "in.", "inch", "inches", "″"], kinds: { lengthFt: 1 / 12 } },
  {
    name: "R",
    spellings: ["r", "r-value", "r value", "h·ft²·°f/btu", "h-ft2-f/btu", "hr-ft2-f/btu"],
    kinds: { rValue: 1 },
  },
  {
    name: "U",
    spellings: ["u", "u-factor", "u factor", "u-value", "btu/h·ft²·°f", "btu/hr-ft2-f", "btu/h-ft2-f"],
    kinds: { uFactor: 1 },
  },
  // "F" alone is read as the F-factor's letter only in an F-factor column (readQuantity); elsewhere it is °F.
  {
    name: "F-factor",
    spellings: ["f-factor", "f factor", "btu/h·ft·°f", "btu/hr-ft-f", "btu/h-ft-f", "btu/h·ft·f"],
    kinds: { fFactor: 1 },
  },
  { name: "SHGC", spellings: ["shgc"], kinds: { shgc: 1 } },
  {
    name: "ACH50",
    spellings: ["ach50", "ach 50", "ach@50", "ach @ 50", "ach@50pa", "ach50 pa"],
    kinds: { ach50: 1 },
  },
  { name: "CFM50", spellings: ["cfm50", "cfm 50", "cfm@50", "cfm @ 50", "cfm@50pa"], kinds: { cfm50: 1 } },
  { name: "cfm", spellings: ["cfm", "ft3/min", "ft³/min"], kinds: { cfm: 1 } },
  // Square inches are read only as a leakage area; ft² is not converted into one (rejected with the reason).
  {
    name: "in²",
    spellings: [
      "in2",
      "in^2",
      "in²",
      "sq in",
      "sq. in.",
      "sq. in",
      "sqin",
      "square inches",
      "square inch",
      "ela",
    ],
    kinds: { leakageAreaIn2: 1 },
  },
  {
    name: "°F",
    spellings: ["°f", "f", "deg f", "degf", "º f", "ºf", "° f", "degrees f", "fahrenheit"],
    kinds: { temperatureF: 1, temperatureDifferenceF: 1 },
  },
  { name: "%", spellings: ["%", "pct", "percent"], kinds: { percent: 1, fraction: 0.01 } },
  { name: "Btu/h", spellings: ["btu/h", "btuh", "btu/hr", "btu/hour", "btu"], kinds: { btuh: 1 } },
  { name: "°", spellings: ["°", "deg", "degrees", "º"], kinds: { degrees: 1 } },
  {
    name: "ft³",
    spellings: ["ft3", "ft^3", "ft³", "cu ft", "cu. ft.", "cu.ft.", "cuft", "cf", "cubic feet", "cubic foot"],
    kinds: { volumeFt3: 1 },
  },
  {
    name: "in per 12 in",
    spellings: ["/12", ":12", "in 12", "in/12", "in/ft", "in 12 in", "in/12 in", "in:12"],
    kinds: { pitchIn12: 1 },
  },
];

// Units we recognise but do not convert, so the message can say so instead of "junk".
const METRIC_SPELLINGS: readonly string[] = [
  "m2",
  "m²",
  "m^2",
  "m3",
  "m³",
  "m^3",
  "l",
  "sq m",
  "sqm",
  "square meters",
  "square metres",
  "m",
  "cm",
  "mm",
  "meter",
  "meters",
  "metre",
  "metres",
  "rsi",
  "w/m2k",
  "w/m²k",
  "w/m2·k",
  "w/m²·k",
  "w/(m2·k)",
  "w/(m²·k)",
  "w/m2-k",
  "m2k/w",
  "m²k/w",
  "m²·k/w",
  "l/s",
  "m3/h",
  "m³/h",
  "m3/s",
  "m³/s",
  "°c",
  "c",
  "deg c",
  "degc",
  "ºc",
  "° c",
  "k",
  "w",
  "kw",
];

// Prefix forms that read naturally before the number ("R-19", "U-0.30", "SHGC 0.25", "ACH50 3").
// The hyphen after the letter is a separator, not a minus sign.
const PREFIX_PATTERN = /^(rsi|shgc|ach50|ach 50|cfm50|ela|f-factor|f factor|r|u)\s*(?:-|=|:|\s)?\s*(.+)$/i;

/** Strict decimal number: optional sign, digits with optional comma grouping, optional fraction, optional exponent. */
const NUMBER_PATTERN = /^([+-]?)((?:\d{1,3}(?:,\d{3})+)|\d+|)(?:\.(\d+))?(?:[eE]([+-]?\d+))?$/;

function normalizeSpelling(text: string): string {
  return text.trim().toLowerCase().replace(/\s+/g, " ");
}

function findUnit(spelling: string): UnitToken | undefined {
  const normal = normalizeSpelling(spelling);
  return UNIT_TOKENS.find((token) => token.spellings.includes(normal));
}

function isMetric(spelling: string): boolean {
  return METRIC_SPELLINGS.includes(normalizeSpelling(spelling));
}

function describeKind(kind: QuantityKind): string {
  const info = QUANTITY_KIND_INFO[kind];
  return info.unit === "count" ? "a count" : `${info.label} (${info.unit})`;
}

function kindsOf(token: UnitToken): string {
  return Object.keys(token.kinds)
    .map((kind) => QUANTITY_KIND_INFO[kind as QuantityKind].label)
    .join(" or ");
}

type NumberRead = { ok: true; value: number } | { ok: false; reason: string };

function readPlainNumber(text: string, kind: QuantityKind): NumberRead {
  const match = NUMBER_PATTERN.exec(text);
  if (!match || (match[2] === "" && match[3] === undefined)) {
    if (/^[+-]?\d+,\d+/.test(text) || /^[+-]?\d{1,3}(\.\d{3})+,\d+$/.test(text)) {
      return {
        ok: false,
        reason: `"${text}" has a comma we cannot read unambiguously (a decimal comma?); write the number with a decimal point, e.g. 1250 or 0.30`,
      };
    }
    return { ok: false, reason: `"${text}" is not a number` };
  }
  if (match[2].includes(",") && !QUANTITY_KIND_INFO[kind].allowsThousands) {
    return {
      ok: false,
      reason: `"${text}": a thousands separator is not expected in ${describeKind(kind)} and could be a decimal comma; write it without the comma`,
    };
  }
  const value = Number(text.replace(/,/g, ""));
  if (!Number.isFinite(value)) return { ok: false, reason: `"${text}" is not a finite number` };
  return { ok: true, value };
}

/** Checks that hold for every column of a kind (an area is never negative, an SHGC is 0–1…). */
export function checkKindRange(value: number, kind: QuantityKind): UnitReadResult {
  const info = QUANTITY_KIND_INFO[kind];
  if (!Number.isFinite(value)) return { ok: false, reason: "is not a finite number" };
  if (info.integer && !Number.isInteger(value)) {
    return {
      ok: false,
      reason: `${value} is not a whole number; ${describeKind(kind)} must be a whole number`,
    };
  }
  if (info.minimum !== undefined && value < info.minimum) {
    return {
      ok: false,
      reason: `${value} is negative; ${describeKind(kind)} cannot be below ${info.minimum}`,
    };
  }
  if (info.maximum !== undefined && value > info.maximum) {
    const hint = kind === "fraction" ? ` (write 70% or 0.70, not 70)` : "";
    return {
      ok: false,
      reason: `${value} is above ${info.maximum}; ${describeKind(kind)} must be between ${info.minimum ?? "-∞"} and ${info.maximum}${hint}`,
    };
  }
  return { ok: true, value };
}

// Feet and inches, e.g. 12'6" or 12' 6 in.
const FEET_INCHES_PATTERN = /^(\d+(?:\.\d+)?)\s*(?:'|ft|′)\s*(\d+(?:\.\d+)?)\s*(?:"|in|″)$/i;

/**
 * Read one cell typed into a column of `kind`. The text must not be blank or a formula
 * (the caller handles those).
 *
 * @example readQuantity("R-19", "rValue") // { ok: true, value: 19 }
 * @example readQuantity("1,250 sq ft", "areaFt2") // { ok: true, value: 1250 }
 * @example readQuantity("R-19", "areaFt2") // { ok: false, reason: "R is a unit of R-value; this column takes area (ft²)" }
 */
export function readQuantity(text: string, kind: QuantityKind): UnitReadResult {
  const raw = text.trim().replace(/\u2212/g, "-"); // U+2212 minus sign, as pasted from documents
  if (raw === "") return { ok: false, reason: "is blank" };
  if (/^\d{4}-\d{2}-\d{2}(?:T[\d:.]+Z?)?$/.test(raw)) {
    return {
      ok: false,
      reason: `"${raw}" is a date: the spreadsheet program may have turned an entry such as 6/12 into a date; format the cell as text or enter a plain number`,
    };
  }

  if (kind === "lengthFt") {
    const feetInches = FEET_INCHES_PATTERN.exec(raw);
    if (feetInches) {
      return checkKindRange(Number(feetInches[1]) + Number(feetInches[2]) / 12, kind);
    }
  }

  // Split into number and unit: either "<unit> <number>" (R-19, U-0.30) or "<number> <unit>".
  let numberText = raw;
  let unitText = "";
  const prefix =
    PREFIX_PATTERN.exec(raw) ?? (kind === "fFactor" ? /^(f)\s*(?:-|=|:|\s)?\s*(.+)$/i.exec(raw) : null);
  if (prefix && /^[+-]?[\d.,]/.test(prefix[2])) {
    unitText = prefix[1];
    numberText = prefix[2].trim();
  } else {
    const suffix = /^([+-]?[\d.,]*\d(?:[eE][+-]?\d+)?)\s*(.*)$/.exec(raw);
    if (!suffix)
      return {
        ok: false,
        reason: `"${raw}" is not a number${kind === "count" ? "" : ` in ${QUANTITY_KIND_INFO[kind].unit}`}`,
      };
    numberText = suffix[1];
    unitText = suffix[2];
  }

  // In an F-factor column a bare "F" ("F-0.54", "0.54 F") is the F-factor's letter, not °F.
  if (kind === "fFactor" && unitText.trim().toLowerCase() === "f") unitText = "F-factor";
  let factor = 1;
  if (unitText !== "") {
    const unit = findUnit(unitText);
    if (!unit) {
      if (kind === "ach50" && /^ach$/i.test(unitText.trim())) {
        return {
          ok: false,
          reason: `"ACH" alone could mean natural air changes; write the blower-door figure as ACH50 (air changes per hour at 50 Pa)`,
        };
      }
      if (isMetric(unitText)) {
        return {
          ok: false,
          reason: `"${unitText.trim()}" is a metric unit, which is not converted; enter ${describeKind(kind)}`,
        };
      }
      return { ok: false, reason: `"${unitText.trim()}" is not a unit we read for ${describeKind(kind)}` };
    }
    const unitFactor = unit.kinds[kind];
    if (unitFactor === undefined) {
      return {
        ok: false,
        reason: `${unit.name} is a unit of ${kindsOf(unit)}; this column takes ${describeKind(kind)}`,
      };
    }
    factor = unitFactor;
  }
  const number = readPlainNumber(numberText, kind);
  if (!number.ok) return number;
  // Round away binary noise from a conversion (70 % × 0.01 = 0.7000000000000001).
  const value = factor === 1 ? number.value : Number((number.value * factor).toPrecision(12));
  return checkKindRange(value, kind);
}

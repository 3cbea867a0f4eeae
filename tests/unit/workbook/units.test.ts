import { describe, expect, it } from "vitest";
import { readQuantity, type QuantityKind } from "@/lib/workbook/units";

// Accepted forms: [cell text, column kind, value in the kind's unit]. Conversions are by
// definition (12 in = 1 ft; 70 % = 0.70).
const ACCEPTED: [string, QuantityKind, number][] = [
  ["R-19", "rValue", 19],
  ["R19", "rValue", 19],
  ["R 19", "rValue", 19],
  ["19 R", "rValue", 19],
  ["r-13", "rValue", 13],
  ["1,250 sf", "areaFt2", 1250],
  ["1250 ft2", "areaFt2", 1250],
  ["1,250 sq ft", "areaFt2", 1250],
  ["1250 ft²", "areaFt2", 1250],
  ["1,250", "areaFt2", 1250],
  ["12,000.5", "areaFt2", 12000.5],
  ["0.30 U", "uFactor", 0.3],
  ["U-0.30", "uFactor", 0.3],
  [".30", "uFactor", 0.3],
  ["0.25 SHGC", "shgc", 0.25],
  ["SHGC 0.25", "shgc", 0.25],
  ["12'", "lengthFt", 12],
  ["12 ft", "lengthFt", 12],
  ["12 feet", "lengthFt", 12],
  ["12'6\"", "lengthFt", 12.5],
  ["18 in", "lengthFt", 1.5],
  ["3 ACH50", "ach50", 3],
  ["ACH50 3", "ach50", 3],
  ["1,800 CFM50", "cfm50", 1800],
  ["90 cfm", "cfm", 90],
  ["95°F", "temperatureF", 95],
  ["95 F", "temperatureF", 95],
  ["-5 °F", "temperatureF", -5],
  ["3", "count", 3],
  ["4%", "percent", 4],
  ["70%", "fraction", 0.7],
  ["0.7", "fraction", 0.7],
  ["6/12", "pitchIn12", 6],
  ["6:12", "pitchIn12", 6],
  ["14,850 cu ft", "volumeFt3", 14850],
  ["26.6°", "degrees", 26.6],
  ["12,000 Btu/h", "btuh", 12000],
  ["0.65", "ratio", 0.65],
  ["85 in²", "leakageAreaIn2", 85],
  ["85 sq in", "leakageAreaIn2", 85],
  ["1,200 in2", "leakageAreaIn2", 1200],
  ["ELA 85", "leakageAreaIn2", 85],
  ["0.54", "fFactor", 0.54],
  ["F-0.54", "fFactor", 0.54],
  ["0.54 F", "fFactor", 0.54],
  ["0.54 F-factor", "fFactor", 0.54],
  ["0.54 Btu/h·ft·°F", "fFactor", 0.54],
];

// Rejected forms and a piece of the reason the user must see.
const REJECTED: [string, QuantityKind, RegExp][] = [
  ["R-19", "areaFt2", /R is a unit of R-value; this column takes area/],
  ["0.30 sf", "uFactor", /ft² is a unit of area; this column takes U-factor/],
  ["U-0.30", "rValue", /U is a unit of U-factor/],
  ["12 ft", "areaFt2", /ft is a unit of length/],
  ["116 m2", "areaFt2", /metric unit.*not converted/],
  ["3.7 m", "lengthFt", /metric unit/],
  ["RSI 3.3", "rValue", /metric unit/],
  ["1.7 W/m2K", "uFactor", /metric unit/],
  ["35 °C", "temperatureF", /metric unit/],
  ["3 ach", "ach50", /ACH50/],
  ["abc", "areaFt2", /is not a number/],
  ["twelve", "lengthFt", /is not a number/],
  ["12 ft 6", "lengthFt", /not a unit we read/],
  ["1,25", "areaFt2", /comma we cannot read unambiguously/],
  ["1.250,5", "areaFt2", /comma we cannot read unambiguously/],
  ["0,30", "uFactor", /comma/],
  ["1,000", "shgc", /thousands separator is not expected/],
  ["-5", "areaFt2", /negative/],
  ["1.2", "shgc", /above 1/],
  ["70", "fraction", /above 1.*70%/],
  ["3.5", "count", /whole number/],
  ["", "areaFt2", /blank/],
  ["2026-06-12", "pitchIn12", /is a date/],
  // A leakage area in ft² is refused, not converted: 1 ft² typed where in² was meant is 144 times too big.
  ["0.6 sf", "leakageAreaIn2", /ft² is a unit of area; this column takes effective leakage area \(in²\)/],
  ["85 in²", "areaFt2", /in² is a unit of effective leakage area; this column takes area/],
  ["85 cm2", "leakageAreaIn2", /not a unit we read|metric/],
  ["0.54 U", "fFactor", /U is a unit of U-factor; this column takes slab-edge F-factor/],
  ["0.54 °F", "fFactor", /°F is a unit of temperature/],
  ["0,54", "fFactor", /comma/],
];

describe("reading typed cells with units", () => {
  it.each(ACCEPTED)("reads %j in a %s column as %d", (text, kind, expected) => {
    const result = readQuantity(text, kind);
    expect(result).toEqual({ ok: true, value: expected });
  });

  it.each(REJECTED)("rejects %j in a %s column with a reason", (text, kind, reason) => {
    const result = readQuantity(text, kind);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.reason).toMatch(reason);
  });
});

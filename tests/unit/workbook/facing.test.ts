import { describe, expect, it } from "vitest";
import { facingLabel, parseFacing } from "@/lib/workbook/facing";

// Azimuths by definition: the 16-point rose is 22.5° a point clockwise from north; degrees are
// read as written, 360 is north again.
const ACCEPTED: [string | number, number][] = [
  ["N", 0],
  ["nne", 22.5],
  ["NE", 45],
  ["SE", 135],
  ["SSW", 202.5],
  ["NNW", 337.5],
  ["north", 0],
  ["North-East", 45],
  ["south west", 225],
  ["SOUTHEAST", 135],
  ["N E", 45],
  ["0", 0],
  ["045", 45],
  ["135", 135],
  ["135°", 135],
  ["135 °", 135],
  ["135 deg", 135],
  ["135 degrees", 135],
  ["22.5", 22.5],
  ["137.46", 137.5],
  ["359.96", 0],
  ["360", 0],
  [" 90 ", 90],
  [270, 270],
  [0, 0],
  [360, 0],
];

// Every one of these was read as some other angle, or must not be read at all.
const REFUSED: (string | number)[] = [
  "-45",
  "- 45",
  "-0",
  "1-80",
  "18-0",
  "45-",
  "N-45",
  "+45",
  "45e0",
  "4.5e1",
  "0x2D",
  "361",
  "720",
  "1,80",
  "45.",
  ".5",
  "NaN",
  "Infinity",
  "north--east",
  "NEE",
  "upward",
  "N45E",
  "45 N",
  -45,
  -0.1,
  360.01,
  Number.NaN,
  Number.POSITIVE_INFINITY,
];

describe("reading a facing", () => {
  for (const [input, deg] of ACCEPTED) {
    it(`reads ${JSON.stringify(input)} as ${deg}°`, () => {
      expect(parseFacing(input)).toEqual({ ok: true, deg });
    });
  }

  for (const input of REFUSED) {
    it(`refuses ${JSON.stringify(input)} with a reason`, () => {
      const read = parseFacing(input);
      expect(read.ok).toBe(false);
      if (!read.ok) expect(read.reason).toMatch(/0 to 360|compass point/);
    });
  }

  it("says why a negative angle is refused and what to write instead", () => {
    const read = parseFacing("-45");
    expect(read).toMatchObject({ ok: false });
    if (!read.ok) expect(read.reason).toContain("315");
  });

  it("a blank facing is required", () => {
    for (const input of ["", "  ", null, undefined])
      expect(parseFacing(input)).toMatchObject({ ok: false, reason: expect.stringContaining("required") });
  });

  it("labels compass azimuths with their point and others in degrees", () => {
    expect(facingLabel(45)).toBe("NE (45°)");
    expect(facingLabel(0)).toBe("N (0°)");
    expect(facingLabel(137.5)).toBe("137.5°");
  });
});

describe("facings in a lots file", () => {
  it("a row with a negative or broken facing is an error naming the row and the Facing column; good rows read as written", async () => {
    const { readCsv } = await import("@/lib/workbook/table-io");
    const { LOT_HEADERS, validateLotTable } = await import("@/lib/workbook/lot-columns");
    const rows = [
      ["L-1", "1 Larch Loop", "AS-1450", "NE", "", "planned", ""],
      ["L-2", "2 Larch Loop", "AS-1450", "-45", "", "planned", ""],
      ["L-3", "3 Larch Loop", "AS-1450", "1-80", "", "planned", ""],
      ["L-4", "4 Larch Loop", "AS-1450", "315", "", "planned", ""],
    ];
    const table = readCsv([LOT_HEADERS.join(","), ...rows.map((r) => r.join(","))].join("\n"));
    const result = validateLotTable(table, { planCodes: new Set(["AS-1450"]) });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors.map((e) => [e.row, e.column])).toEqual([
      [3, "Facing"],
      [4, "Facing"],
    ]);
    expect(result.errors[0].reason).toContain("315");
    const good = validateLotTable(
      readCsv([LOT_HEADERS.join(","), rows[0].join(","), rows[3].join(",")].join("\n")),
      { planCodes: new Set(["AS-1450"]) },
    );
    expect(good.ok && good.lots.map((l) => l.facingDeg)).toEqual([45, 315]);
  });
});

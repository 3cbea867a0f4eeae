/** Equipment schedule counts and costs on a small hand-made set (invented communities and systems). */
import { describe, expect, it } from "vitest";
import {
  ReportInputError,
  buildEquipmentSchedule,
  equipmentScheduleTables,
  type ScheduleLotInput,
  type ScheduleSystemInput,
} from "@/lib/reports";
import { readCsv, writeCsv } from "@/lib/workbook/table-io";

const SYSTEMS: ScheduleSystemInput[] = [
  { id: "A", type: "ac-furnace", modelNumber: "A-OUT / A-COIL / A-FURN", nominalTons: 2, priceUsd: 4000 },
  { id: "B", type: "heat-pump-backup", modelNumber: "B-OUT / B-AH", nominalTons: 3, priceUsd: 5500.5 },
  { id: "C", type: "heat-pump", modelNumber: "C-OUT", nominalTons: 2.5 }, // no price
];

const LOTS: ScheduleLotInput[] = [
  { communityName: "Birch Hollow", lotNumber: "10", systemCode: "B", plannedStart: "2027-03-15" },
  { communityName: "Alder Flats", lotNumber: "1", systemCode: "A", plannedStart: "2027-03-05" },
  { communityName: "Alder Flats", lotNumber: "2", systemCode: "A", plannedStart: "2027-03-20" },
  { communityName: "Alder Flats", lotNumber: "3", systemCode: "B", plannedStart: "2027-04-02" },
  { communityName: "Alder Flats", lotNumber: "4", systemCode: "A", plannedStart: null },
  {
    communityName: "Alder Flats",
    lotNumber: "5",
    systemCode: null,
    noFitReason: "latent capacity short on every system",
    plannedStart: "2027-04-10",
  },
  { communityName: "Birch Hollow", lotNumber: "11", systemCode: "C", plannedStart: "2027-05-01" },
  { communityName: "Birch Hollow", lotNumber: "12", systemCode: "B", plannedStart: "2027-03-01" },
];

describe("equipment schedule (expected numbers worked by hand)", () => {
  const schedule = buildEquipmentSchedule({ lots: LOTS, systems: SYSTEMS });

  it("counts each system per community, with unit price and extended cost", () => {
    // Alder Flats: A on lots 1, 2, 4 → 3 × 4,000 = 12,000; B on lot 3 → 1 × 5,500.50.
    // Birch Hollow: B on lots 10, 12 → 2 × 5,500.50 = 11,001.00; C on lot 11, no price.
    expect(
      schedule.byCommunity.map((l) => [
        l.communityName,
        l.systemCode,
        l.count,
        l.unitPriceUsd,
        l.extendedCostUsd,
      ]),
    ).toEqual([
      ["Alder Flats", "A", 3, 4000, 12_000],
      ["Alder Flats", "B", 1, 5500.5, 5500.5],
      ["Birch Hollow", "B", 2, 5500.5, 11_001],
      ["Birch Hollow", "C", 1, null, null],
    ]);
  });

  it("counts per community × month of planned start, 'no date' last", () => {
    expect(
      schedule.byMonth.map((l) => [l.communityName, l.month, l.systemCode, l.count, l.extendedCostUsd]),
    ).toEqual([
      ["Alder Flats", "2027-03", "A", 2, 8000],
      ["Alder Flats", "2027-04", "B", 1, 5500.5],
      ["Alder Flats", null, "A", 1, 4000],
      ["Birch Hollow", "2027-03", "B", 2, 11_001],
      ["Birch Hollow", "2027-05", "C", 1, null],
    ]);
  });

  it("totals per community, per system and overall; unpriced systems are counted apart", () => {
    expect(schedule.communityTotals).toEqual([
      // 5 lots, 4 with a system: 12,000 + 5,500.50 = 17,500.50.
      {
        communityName: "Alder Flats",
        lotCount: 5,
        lotsWithSystem: 4,
        lotsWithoutSystem: 1,
        costUsd: 17_500.5,
        unpricedSystemCount: 0,
      },
      // 3 lots, all with a system: 11,001.00 priced, C unpriced.
      {
        communityName: "Birch Hollow",
        lotCount: 3,
        lotsWithSystem: 3,
        lotsWithoutSystem: 0,
        costUsd: 11_001,
        unpricedSystemCount: 1,
      },
    ]);
    // A: 3 × 4,000 = 12,000; B: 3 × 5,500.50 = 16,501.50; C: 1, no price.
    expect(schedule.systemTotals.map((l) => [l.systemCode, l.count, l.extendedCostUsd])).toEqual([
      ["A", 3, 12_000],
      ["B", 3, 16_501.5],
      ["C", 1, null],
    ]);
    // 12,000 + 16,501.50 = 28,501.50 over 8 lots, 7 with a system.
    expect(schedule.totals).toEqual({
      lotCount: 8,
      lotsWithSystem: 7,
      lotsWithoutSystem: 1,
      costUsd: 28_501.5,
      unpricedSystemCount: 1,
    });
  });

  it("lists the lots no system fits, with the reason", () => {
    expect(schedule.lotsWithoutSystem).toEqual([
      {
        communityName: "Alder Flats",
        lotNumber: "5",
        plannedStart: "2027-04-10",
        reason: "latent capacity short on every system",
      },
    ]);
  });

  it("export tables: numbers as numbers, a total row per community and for all", () => {
    const tables = equipmentScheduleTables(schedule);
    expect(tables.map((t) => t.name)).toEqual([
      "by-community",
      "by-month",
      "system-totals",
      "lots-without-system",
      "notes",
    ]);
    const byCommunity = tables[0];
    expect(byCommunity.headers).toEqual([
      "Community",
      "System code",
      "System type",
      "Model numbers",
      "Nominal tons",
      "Count",
      "Unit price (USD)",
      "Extended cost (USD)",
    ]);
    expect(byCommunity.rows).toEqual([
      ["Alder Flats", "A", "ac-furnace", "A-OUT / A-COIL / A-FURN", 2, 3, 4000, 12_000],
      ["Alder Flats", "B", "heat-pump-backup", "B-OUT / B-AH", 3, 1, 5500.5, 5500.5],
      ["Alder Flats", "Total", null, null, null, 4, null, 17_500.5],
      ["Birch Hollow", "B", "heat-pump-backup", "B-OUT / B-AH", 3, 2, 5500.5, 11_001],
      ["Birch Hollow", "C", "heat-pump", "C-OUT", 2.5, 1, null, null],
      ["Birch Hollow", "Total", null, null, null, 3, null, 11_001],
      ["All communities", "Total", null, null, null, 7, null, 28_501.5],
    ]);
    expect(tables[1].rows).toContainEqual(["Alder Flats", "no date", "A", 1, 4000, 4000]);
    expect(tables[3].rows).toEqual([
      ["Alder Flats", "5", "2027-04-10", "latent capacity short on every system"],
    ]);
    expect(tables[4].rows.find((row) => row[0] === "Caution")?.[1]).toMatch(/licensed professional/);
    for (const table of tables) expect(table.sheetName.length).toBeLessThanOrEqual(31); // XLSX sheet-name limit
  });

  it("a community name that looks like a formula is escaped in the CSV", () => {
    const tricky = buildEquipmentSchedule({
      lots: [
        { communityName: '=HYPERLINK("http://x")', lotNumber: "1", systemCode: "A", plannedStart: null },
      ],
      systems: SYSTEMS,
    });
    const table = equipmentScheduleTables(tricky)[0];
    const csv = writeCsv(table.headers, table.rows);
    expect(csv).toContain(`"'=HYPERLINK(""http://x"")"`);
    expect(readCsv(csv).rows[0].cells[0]).toBe('=HYPERLINK("http://x")'); // our own escape is undone on read
  });
});

describe("equipment schedule: bad input is refused with every field named", () => {
  it("unknown system, no system without a reason, bad dates, a lot twice", () => {
    const bad: ScheduleLotInput[] = [
      { communityName: "Alder Flats", lotNumber: "1", systemCode: "Z", plannedStart: null },
      { communityName: "Alder Flats", lotNumber: "2", systemCode: null, plannedStart: null },
      { communityName: "Alder Flats", lotNumber: "3", systemCode: "A", plannedStart: "2027-02-30" },
      { communityName: "Alder Flats", lotNumber: "4", systemCode: "A", plannedStart: "03/05/2027" },
      { communityName: "Alder Flats", lotNumber: "1", systemCode: "A", plannedStart: null },
    ];
    let error: unknown;
    try {
      buildEquipmentSchedule({ lots: bad, systems: SYSTEMS });
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(ReportInputError);
    const issues = (error as ReportInputError).issues;
    expect(issues.map((i) => i.field)).toEqual([
      "lots.0.systemCode",
      "lots.1.noFitReason",
      "lots.2.plannedStart",
      "lots.3.plannedStart",
      "lots.4.lotNumber",
    ]);
    expect(issues[0].message).toMatch(/"Z" is not a system of the catalog \(A, B, C\)/);
    expect(issues[2].message).toMatch(/not a real calendar date/);
    expect(issues[3].message).toMatch(/YYYY-MM-DD/);
    expect(issues[4].message).toMatch(/also lots\.0/);
  });

  it("duplicated system codes and negative prices", () => {
    expect(() =>
      buildEquipmentSchedule({
        lots: [],
        systems: [...SYSTEMS, { id: "A", type: "furnace", modelNumber: "F", priceUsd: -5 }],
      }),
    ).toThrow(/systems\.3\.id: system code "A" is also systems\.0.*systems\.3\.priceUsd/);
  });

  it("no lots is an empty schedule, not an error", () => {
    const empty = buildEquipmentSchedule({ lots: [], systems: SYSTEMS });
    expect(empty.totals).toEqual({
      lotCount: 0,
      lotsWithSystem: 0,
      lotsWithoutSystem: 0,
      costUsd: 0,
      unpricedSystemCount: 0,
    });
  });
});

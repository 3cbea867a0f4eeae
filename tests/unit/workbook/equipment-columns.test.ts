/** The equipment catalog's column list: validation, export, templates (all data invented). */
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { selectEquipment } from "@/lib/equipment";
import type { RawTable } from "@/lib/workbook/columns";
import {
  EQUIPMENT_COLUMNS,
  EQUIPMENT_HEADERS,
  EQUIPMENT_TEMPLATE_ROW,
  EXAMPLE_EQUIPMENT_ROWS,
  EquipmentInputError,
  catalogForHeatingDesign,
  equipmentExampleCells,
  equipmentTemplateFiles,
  equipmentRowsToTable,
  heatPumpOutputAtF,
  renderEquipmentTemplatesDoc,
  validateEquipmentTable,
  type EquipmentCatalogEntry,
} from "@/lib/workbook/equipment-columns";
import { readCsv, readXlsx, writeCsv } from "@/lib/workbook/table-io";

const templates = path.resolve(__dirname, "../../../templates");
const read = (name: string) => readFileSync(path.join(templates, name));

/** A table in file order from cells by key (blank where not given). */
function tableOf(
  rows: readonly Record<string, string>[],
  headers: readonly string[] = EQUIPMENT_HEADERS,
): RawTable {
  const keys = headers.map(
    (header) => EQUIPMENT_COLUMNS.find((column) => column.header === header)?.key ?? header,
  );
  return {
    headers: [...headers],
    rows: rows.map((row, index) => ({ rowNumber: index + 2, cells: keys.map((key) => row[key] ?? "") })),
  };
}

const GOOD_AC = {
  system_code: "T-AC30",
  system_type: "ac-furnace",
  outdoor_model: "T-C30",
  indoor_model: "T-E30",
  furnace_model: "T-G40",
  nominal_tons: "2.5",
  cooling_total_btuh: "28,800",
  cooling_sensible_btuh: "22,000",
  furnace_output_btuh: "38,000",
  price_usd: "$4,100",
};
const GOOD_HP = {
  system_code: "T-HP30",
  system_type: "heat-pump",
  outdoor_model: "T-H30",
  indoor_model: "T-A30",
  nominal_tons: "2.5",
  cooling_total_btuh: "28,700",
  cooling_sensible_btuh: "22,000",
  heat_pump_47f_btuh: "29,000",
  heat_pump_17f_btuh: "17,600",
};

function errorsOf(rows: readonly Record<string, string>[], headers?: readonly string[]) {
  const result = validateEquipmentTable(tableOf(rows, headers));
  expect(result.ok).toBe(false);
  return result.ok ? [] : result.errors;
}

describe("equipment catalog: the example file and the templates", () => {
  it("the example catalog reads into 8–10 systems of every type, as lib/equipment catalog entries", () => {
    const result = validateEquipmentTable(readCsv(read("example-equipment.csv").toString("utf8")));
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    expect(result.systems.length).toBeGreaterThanOrEqual(8);
    expect(result.systems.length).toBeLessThanOrEqual(10);
    expect(new Set(result.systems.map((s) => s.type))).toEqual(
      new Set(["ac-furnace", "heat-pump", "heat-pump-backup", "furnace"]),
    );
    const ac = result.systems.find((s) => s.id === "AC30-F40");
    expect(ac).toMatchObject({
      modelNumber: "NV-C30S / NV-E30B / NV-G40M",
      nominalTons: 2.5,
      coolingTotalBtuh: 28_800,
      coolingSensibleBtuh: 22_400,
      heatingOutputBtuh: 38_000,
      priceUsd: 4090,
      efficiency: "SEER2 14.3, AFUE 96 %",
    });
    // Until the site is known a heat pump counts its 17 °F output.
    const hp = result.systems.find((s) => s.id === "HP30-B10");
    expect(hp).toMatchObject({
      heatingOutputBtuh: 17_600,
      heatPump47FBtuh: 29_000,
      heatPump17FBtuh: 17_600,
      backupHeatBtuh: 34_100,
    });
    // Every system goes through lib/equipment's selection without a catalog error.
    expect(() =>
      selectEquipment({
        loads: {
          heatingBtuh: 20_000,
          coolingSensibleBtuh: 18_000,
          coolingLatentBtuh: 3_000,
          coolingTotalBtuh: 21_000,
        },
        catalog: result.systems,
      }),
    ).not.toThrow();
  });

  it("example capacities are plausible: total 0.95–0.97 × tons × 12,000 Btu/h, sensible 0.72–0.78 of total (common practice; a ton is 12,000 Btu/h by definition)", () => {
    const result = validateEquipmentTable(readCsv(read("example-equipment.csv").toString("utf8")));
    if (!result.ok) throw new Error("example does not validate");
    for (const system of result.systems.filter((s) => s.type !== "furnace")) {
      const nominalBtuh = (system.nominalTons ?? 0) * 12_000;
      expect((system.coolingTotalBtuh ?? 0) / nominalBtuh, system.id).toBeGreaterThanOrEqual(0.95);
      expect((system.coolingTotalBtuh ?? 0) / nominalBtuh, system.id).toBeLessThanOrEqual(0.97);
      const sensibleRatio = (system.coolingSensibleBtuh ?? 0) / (system.coolingTotalBtuh ?? 1);
      expect(sensibleRatio, system.id).toBeGreaterThanOrEqual(0.72);
      expect(sensibleRatio, system.id).toBeLessThanOrEqual(0.78);
    }
  });

  it("the CSV and XLSX templates have every column and one example row that imports", async () => {
    for (const table of [
      readCsv(read("equipment-catalog-template.csv").toString("utf8")),
      await readXlsx(new Uint8Array(read("equipment-catalog-template.xlsx"))),
    ]) {
      expect(table.headers).toEqual([...EQUIPMENT_HEADERS]);
      const result = validateEquipmentTable(table);
      if (!result.ok) throw new Error(JSON.stringify(result.errors));
      expect(result.systems.map((s) => s.id)).toEqual(["SAMPLE-AC30"]);
    }
  });

  it("the files are up to date with the column list (regenerate with equipmentTemplateFiles)", async () => {
    expect(read("equipment-catalog-template.csv").toString("utf8")).toBe(
      writeCsv(EQUIPMENT_HEADERS, equipmentExampleCells([EQUIPMENT_TEMPLATE_ROW])) + "\r\n",
    );
    expect(read("example-equipment.csv").toString("utf8")).toBe(
      writeCsv(EQUIPMENT_HEADERS, equipmentExampleCells(EXAMPLE_EQUIPMENT_ROWS)) + "\r\n",
    );
    expect(read("EQUIPMENT.md").toString("utf8")).toBe(renderEquipmentTemplatesDoc());
    const files = await equipmentTemplateFiles();
    expect(files.map((file) => file.name)).toEqual([
      "equipment-catalog-template.csv",
      "equipment-catalog-template.xlsx",
      "example-equipment.csv",
      "EQUIPMENT.md",
    ]);
    for (const file of files)
      if (typeof file.content === "string")
        expect(read(file.name).toString("utf8"), file.name).toBe(file.content);
    const xlsx = files.find((file) => file.name.endsWith(".xlsx"))?.content as Uint8Array;
    expect((await readXlsx(xlsx)).rows).toEqual(
      (await readXlsx(new Uint8Array(read("equipment-catalog-template.xlsx")))).rows,
    );
  });

  it("EQUIPMENT.md documents every column by key and header, and carries the caution", () => {
    const doc = read("EQUIPMENT.md").toString("utf8");
    for (const column of EQUIPMENT_COLUMNS) {
      expect(doc).toContain(`\`${column.key}\``);
      expect(doc).toContain(column.header);
    }
    expect(doc).toMatch(/design estimate/i);
    expect(doc).toMatch(/licensed professional/i);
  });
});

describe("equipment catalog: bad rows are reported by row and column, and nothing is returned", () => {
  it("a good table reads; units and prices as builders type them", () => {
    const result = validateEquipmentTable(
      tableOf([
        { ...GOOD_AC, cooling_total_btuh: "28800 btuh", price_usd: "4,250.50 USD" },
        GOOD_HP,
        { ...GOOD_AC, system_code: "T-F", cooling_total_btuh: "=nominal_tons*12000*0.96", afue_pct: "96%" },
      ]),
    );
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    expect(result.systems[0]).toMatchObject({ coolingTotalBtuh: 28_800, priceUsd: 4250.5 });
    expect(result.systems[1]).toMatchObject({ type: "heat-pump", heatingOutputBtuh: 17_600 });
    expect(result.systems[2]).toMatchObject({
      coolingTotalBtuh: 28_800,
      afuePct: 96,
      efficiency: "AFUE 96 %",
    }); // 2.5 × 12,000 × 0.96
  });

  it("text in a number cell, a negative capacity, a unit of another kind, a bad price", () => {
    const errors = errorsOf([
      { ...GOOD_AC, cooling_total_btuh: "about 29k" },
      { ...GOOD_AC, system_code: "T2", cooling_sensible_btuh: "-1000" },
      { ...GOOD_AC, system_code: "T3", furnace_output_btuh: "R-19" },
      { ...GOOD_AC, system_code: "T4", price_usd: "$4,25" },
    ]);
    expect(errors).toEqual([
      expect.objectContaining({ row: 2, column: "Cooling total at design (Btu/h)" }),
      expect.objectContaining({ row: 3, column: "Cooling sensible at design (Btu/h)" }),
      expect.objectContaining({ row: 4, column: "Furnace heating output (Btu/h)" }),
      expect.objectContaining({ row: 5, column: "Price (USD)" }),
    ]);
    expect(errors[1].reason).toMatch(/negative|out of range/);
    expect(errors[2].reason).toMatch(/R is a unit of R-value/);
  });

  it("sensible above total, a heat pump without its 47 °F output, a furnace alone with cooling, a duplicated code", () => {
    const errors = errorsOf([
      { ...GOOD_AC, cooling_sensible_btuh: "30,000" },
      { ...GOOD_HP, heat_pump_47f_btuh: "" },
      {
        system_code: "T-F40",
        system_type: "furnace",
        furnace_model: "T-G40",
        furnace_output_btuh: "38,000",
        cooling_total_btuh: "24,000",
      },
      { ...GOOD_HP, system_code: "t-ac30" },
    ]);
    expect(errors).toEqual([
      {
        row: 2,
        column: "Cooling sensible at design (Btu/h)",
        reason: expect.stringMatching(/above the cooling total of 28800/),
      },
      {
        row: 3,
        column: "Heat pump heating at 47 °F (Btu/h)",
        reason: expect.stringMatching(/required for a heat-pump/),
      },
      {
        row: 4,
        column: "Cooling total at design (Btu/h)",
        reason: expect.stringMatching(/furnace alone has no cooling/),
      },
      { row: 5, column: "System code", reason: expect.stringMatching(/already used on row 2/) },
    ]);
  });

  it("a heat pump whose 17 °F output is above its 47 °F output, backup heat on the wrong type, an unknown type", () => {
    const errors = errorsOf([
      { ...GOOD_HP, heat_pump_17f_btuh: "30,000" },
      { ...GOOD_AC, system_code: "T2", backup_heat_btuh: "10,000" },
      { ...GOOD_AC, system_code: "T3", system_type: "split" },
      { ...GOOD_HP, system_code: "T4", system_type: "heat-pump-backup" },
    ]);
    expect(errors.map((e) => [e.row, e.column])).toEqual([
      [2, "Heat pump heating at 17 °F (Btu/h)"],
      [3, "Backup heat (Btu/h)"],
      [4, "System type"],
      [5, "Backup heat (Btu/h)"],
    ]);
    expect(errors[0].reason).toMatch(/swapped/);
    expect(errors[2].reason).toMatch(
      /not one of the choices: ac-furnace, heat-pump, heat-pump-backup, furnace/,
    );
  });

  it("a missing required column and an unknown column are reported on row 1", () => {
    const headers = EQUIPMENT_HEADERS.filter((header) => header !== "System type");
    const errors = errorsOf([GOOD_AC], [...headers, "Colour"]);
    expect(errors).toEqual(
      expect.arrayContaining([
        expect.objectContaining({
          row: 1,
          column: "System type",
          reason: expect.stringMatching(/required column and is missing/),
        }),
        expect.objectContaining({
          row: 1,
          column: "Colour",
          reason: expect.stringMatching(/not a known column/),
        }),
      ]),
    );
  });

  it("an empty table is an error, not an empty catalog", () => {
    expect(validateEquipmentTable(tableOf([]))).toEqual({
      ok: false,
      errors: [{ row: 2, column: "System code", reason: "the table has no system rows" }],
    });
  });
});

describe("equipment catalog: export", () => {
  it("export → CSV → import gives the same systems; formula-like text is escaped", () => {
    const first = validateEquipmentTable(readCsv(read("example-equipment.csv").toString("utf8")));
    if (!first.ok) throw new Error("example does not validate");
    const tricky: EquipmentCatalogEntry = {
      ...first.systems[0],
      id: "T-X",
      outdoorModel: '=HYPERLINK("x")',
      modelNumber: '=HYPERLINK("x") / NV-E18A / NV-G30M',
    };
    const systems = [...first.systems, tricky];
    const table = equipmentRowsToTable(systems);
    expect(table.headers).toEqual([...EQUIPMENT_HEADERS]);
    const csv = writeCsv(table.headers, table.rows);
    expect(csv).toContain(`'=HYPERLINK`);
    const again = validateEquipmentTable(readCsv(csv));
    if (!again.ok) throw new Error(JSON.stringify(again.errors));
    expect(again.systems).toEqual(systems);
  });

  it("numbers are written as numbers", () => {
    const table = equipmentRowsToTable([
      {
        id: "F1",
        modelNumber: "G1",
        type: "furnace",
        furnaceModel: "G1",
        heatingOutputBtuh: 38_000,
        furnaceOutputBtuh: 38_000,
        priceUsd: 1500,
      },
    ]);
    const byHeader = Object.fromEntries(table.headers.map((header, i) => [header, table.rows[0][i]]));
    expect(byHeader["Furnace heating output (Btu/h)"]).toBe(38_000);
    expect(byHeader["Price (USD)"]).toBe(1500);
    expect(byHeader["Cooling total at design (Btu/h)"]).toBeNull();
  });
});

describe("heat pump output at the heating design temperature", () => {
  const ratings = { heatPump47FBtuh: 30_000, heatPump17FBtuh: 18_000 };
  it("lies on the line through the two rating points (by hand: slope (30,000 − 18,000) / 30 = 400 Btu/h per °F)", () => {
    expect(heatPumpOutputAtF(ratings, 47)).toBe(30_000);
    expect(heatPumpOutputAtF(ratings, 17)).toBe(18_000);
    expect(heatPumpOutputAtF(ratings, 24)).toBeCloseTo(20_800, 6); // 18,000 + 7 × 400
    expect(heatPumpOutputAtF(ratings, 5)).toBeCloseTo(13_200, 6); // 18,000 − 12 × 400
    expect(heatPumpOutputAtF(ratings, -40)).toBe(0); // the line reaches 0 at −28 °F
  });

  it("refuses a temperature outside the engine's heating design range", () => {
    expect(() => heatPumpOutputAtF(ratings, 90)).toThrow(EquipmentInputError);
    expect(() => heatPumpOutputAtF(ratings, Number.NaN)).toThrow(/heatingOutdoorDbF/);
  });

  it("the design temperature decides whether a heat pump alone fits (hand-made loads)", () => {
    const result = validateEquipmentTable(readCsv(read("example-equipment.csv").toString("utf8")));
    if (!result.ok) throw new Error("example does not validate");
    // HP24: 23,600 Btu/h at 47 °F, 14,400 at 17 °F → at 24 °F: 14,400 + 7 × 9,200 / 30 = 16,546.7 Btu/h.
    const loads = {
      heatingBtuh: 16_000,
      coolingSensibleBtuh: 15_500,
      coolingLatentBtuh: 3_000,
      coolingTotalBtuh: 20_500,
    };
    const at24 = selectEquipment({ loads, catalog: catalogForHeatingDesign(result.systems, 24) });
    expect(catalogForHeatingDesign(result.systems, 24).find((s) => s.id === "HP24")?.heatingOutputBtuh).toBe(
      16_547,
    );
    expect(at24.bestFit?.system.id).toBe("HP24");
    const at17 = selectEquipment({ loads, catalog: catalogForHeatingDesign(result.systems, 17) });
    expect(at17.notFitting.find((e) => e.system.id === "HP24")?.reasons.map((r) => r.reason)).toEqual([
      "heating-short",
    ]);
    // Furnaces are unchanged.
    expect(catalogForHeatingDesign(result.systems, 17).find((s) => s.id === "F40")?.heatingOutputBtuh).toBe(
      38_000,
    );
  });
});

import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import type { TableCellError } from "@/lib/workbook/columns";
import {
  PLAN_COLUMN_BY_KEY,
  PLAN_COLUMNS,
  PLAN_HEADERS,
  validatePlanTable,
} from "@/lib/workbook/plan-columns";
import { readCsv, readXlsx, writeCsv, writeXlsx, type OutputCell } from "@/lib/workbook/table-io";

const root = path.resolve(__dirname, "../../..");
const exampleCsv = readFileSync(path.join(root, "templates/example-plans.csv"), "utf8");

function header(key: string): string {
  const column = PLAN_COLUMN_BY_KEY.get(key);
  if (!column) throw new Error(`no column ${key}`);
  return column.header;
}

/** The example library as a mutable header + rows, to corrupt one cell at a time. */
function exampleTable(): { headers: string[]; rows: string[][] } {
  const table = readCsv(exampleCsv);
  return { headers: [...table.headers], rows: table.rows.map((row) => [...row.cells]) };
}

function setCell(
  table: { headers: string[]; rows: string[][] },
  dataRowIndex: number,
  key: string,
  text: string,
): void {
  table.rows[dataRowIndex][table.headers.indexOf(header(key))] = text;
}

function validate(table: { headers: string[]; rows: OutputCell[][] }) {
  return validatePlanTable(readCsv(writeCsv(table.headers, table.rows)));
}

function errorsOf(result: ReturnType<typeof validatePlanTable>): TableCellError[] {
  expect(result.ok).toBe(false);
  return result.ok ? [] : result.errors;
}

describe("validating a plan-library table", () => {
  it("a good file gives every plan with its code, name and engine input", () => {
    const result = validatePlanTable(readCsv(exampleCsv));
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.plans.map((plan) => plan.planCode)).toEqual([
      "WF-1480",
      "WF-1860",
      "WF-2240",
      "WF-2650",
      "WF-3150",
    ]);
    const juniper = result.plans[0];
    expect(juniper.rowNumber).toBe(2);
    expect(juniper.planName).toBe("The Juniper");
    expect(juniper.input.conditionedFloorAreaFt2).toBe(1480); // typed "1,480 sf"
    expect(juniper.input.attic.ceiling.cavityR).toBe(49); // typed "R-49"
    expect(juniper.input.facades.front.window.uFactor).toBe(0.3); // typed "0.30 U"
    expect(juniper.input.facades.front.window.overhangDepthFt).toBe(1.5); // typed "1.5'"
    expect(juniper.input.infiltration.ach50).toBe(4); // typed "4 ACH50"
    expect(juniper.input.ducts.supplyLeakagePct).toBe(4); // typed "4%"
    expect(result.plans[2].input.ceilingHeightFt).toBe(9.5); // typed 9'6"
  });

  it("reports wrong columns on row 1: unknown, duplicated and missing required", () => {
    const table = exampleTable();
    table.headers[table.headers.indexOf(header("bedrooms"))] = "Bedroom count";
    table.headers[table.headers.indexOf(header("stories"))] = header("plan_name");
    const errors = errorsOf(validate(table));
    expect(errors).toContainEqual({
      row: 1,
      column: "Bedroom count",
      reason: expect.stringMatching(/not a known column/),
    });
    expect(errors).toContainEqual({
      row: 1,
      column: header("plan_name"),
      reason: expect.stringMatching(/appears twice/),
    });
    expect(errors).toContainEqual({
      row: 1,
      column: header("bedrooms"),
      reason: expect.stringMatching(/required column and is missing/),
    });
  });

  it("reports text in a number cell, a negative area and a bad formula with row and column", () => {
    const table = exampleTable();
    setCell(table, 0, "conditioned_area_ft2", "about fifteen hundred");
    setCell(table, 1, "back_window_ft2", "-95");
    setCell(table, 2, "left_wall_ft2", "=front_wall_ft2*");
    setCell(table, 3, "ceiling_cavity_r", "1,250 sf");
    const errors = errorsOf(validate(table));
    expect(errors).toContainEqual({
      row: 2,
      column: header("conditioned_area_ft2"),
      reason: expect.stringMatching(/is not a number/),
    });
    expect(errors).toContainEqual({
      row: 3,
      column: header("back_window_ft2"),
      reason: expect.stringMatching(/negative/),
    });
    expect(errors).toContainEqual({
      row: 4,
      column: header("left_wall_ft2"),
      reason: expect.stringMatching(/formula/),
    });
    expect(errors).toContainEqual({
      row: 5,
      column: header("ceiling_cavity_r"),
      reason: expect.stringMatching(/ft² is a unit of area; this column takes R-value/),
    });
    expect(errors).toHaveLength(4);
  });

  it("reports every bad cell of a row, not just the first", () => {
    const table = exampleTable();
    setCell(table, 0, "bedrooms", "three");
    setCell(table, 0, "front_window_shgc", "1.4");
    setCell(table, 0, "duct_location", "roof");
    const errors = errorsOf(validate(table));
    expect(errors.map((error) => error.column).sort()).toEqual(
      [header("bedrooms"), header("duct_location"), header("front_window_shgc")].sort(),
    );
    expect(errors.every((error) => error.row === 2)).toBe(true);
  });

  it("reports data in a column that has no header", () => {
    const lines = exampleCsv.split("\r\n");
    lines[3] += ",stray note";
    const headerCount = readCsv(exampleCsv).headers.length;
    expect(errorsOf(validatePlanTable(readCsv(lines.join("\r\n"))))).toEqual([
      { row: 1, column: `(column ${headerCount + 1})`, reason: "has data but no header" },
    ]);
  });

  it("reports a duplicated plan code on the later row, naming the first", () => {
    const table = exampleTable();
    setCell(table, 3, "plan_code", "wf-1480");
    const errors = errorsOf(validate(table));
    expect(errors).toEqual([
      { row: 5, column: header("plan_code"), reason: expect.stringMatching(/already used on row 2/) },
    ]);
  });

  it("reports a required cell left blank", () => {
    const table = exampleTable();
    setCell(table, 1, "right_wall_ft2", "");
    expect(errorsOf(validate(table))).toEqual([
      { row: 3, column: header("right_wall_ft2"), reason: "is required and is blank" },
    ]);
  });

  it("maps the engine's cross-field checks back to a column", () => {
    const table = exampleTable();
    setCell(table, 0, "front_window_ft2", "400"); // wall is 180 ft²
    setCell(table, 1, "duct_location", "vented-crawlspace"); // slab foundation
    setCell(table, 2, "blower_door_ach50", "");
    setCell(table, 3, "occupants", "0"); // engine range 1–50
    const errors = errorsOf(validate(table));
    expect(errors).toContainEqual({
      row: 2,
      column: header("front_window_ft2"),
      reason: expect.stringMatching(/exceed the front facade's gross wall area/),
    });
    expect(errors).toContainEqual({
      row: 3,
      column: header("duct_location"),
      reason: expect.stringMatching(/not a vented crawlspace/),
    });
    expect(errors).toContainEqual({
      row: 4,
      column: header("blower_door_ach50"),
      reason: expect.stringMatching(/ach50 or cfm50/),
    });
    expect(errors).toContainEqual({
      row: 5,
      column: header("occupants"),
      reason: expect.stringMatching(/valid range 1 to 50/),
    });
  });

  it("keeps the sheet's row numbers across blank rows, and finds columns by key or header in any order", () => {
    const table = exampleTable();
    const headers = [...table.headers]
      .reverse()
      .map((text) => PLAN_COLUMNS.find((column) => column.header === text)?.key ?? text);
    const rows = table.rows.map((row) => [...row].reverse());
    rows.splice(
      1,
      0,
      headers.map(() => ""),
    );
    const lastRow = rows.length - 1;
    rows[lastRow][headers.indexOf("bedrooms")] = "many";
    const errors = errorsOf(validate({ headers, rows }));
    expect(errors).toEqual([
      { row: lastRow + 2, column: header("bedrooms"), reason: expect.stringMatching(/not a number/) },
    ]);
  });

  it("reads the same library from XLSX, with its errors on the same rows and columns", async () => {
    const table = exampleTable();
    setCell(table, 1, "back_window_ft2", "-95");
    const bytes = await writeXlsx(table.headers, table.rows);
    const errors = errorsOf(validatePlanTable(await readXlsx(bytes)));
    expect(errors).toEqual([
      { row: 3, column: header("back_window_ft2"), reason: expect.stringMatching(/negative/) },
    ]);
    const good = validatePlanTable(await readXlsx(await writeXlsx(PLAN_HEADERS, exampleTable().rows)));
    expect(good.ok && good.plans.length).toBe(5);
  });

  it("an empty table is an error, not an empty success", () => {
    const errors = errorsOf(validatePlanTable(readCsv(writeCsv(PLAN_HEADERS, []))));
    expect(errors[0]).toMatchObject({ row: 2, reason: expect.stringMatching(/no plan rows/) });
  });
});

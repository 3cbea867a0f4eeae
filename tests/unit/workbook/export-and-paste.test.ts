import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { parseSiteConditions } from "@/lib/load/input";
import { computePlanFacings } from "@/lib/load/index";
import {
  PLAN_COLUMNS,
  PLAN_RESULT_COLUMNS,
  planInputToRow,
  planLibraryExportTable,
  validatePlanTable,
} from "@/lib/workbook/plan-columns";
import {
  parsePastedBlock,
  placePastedBlock,
  readCsv,
  readXlsx,
  writeCsv,
  writeXlsx,
} from "@/lib/workbook/table-io";

const root = path.resolve(__dirname, "../../..");

describe("exporting the plan library with its computed columns", () => {
  it("an export with results re-imports as the same plans (computed columns are skipped)", async () => {
    const library = validatePlanTable(
      readCsv(readFileSync(path.join(root, "templates/example-plans.csv"), "utf8")),
    );
    if (!library.ok) throw new Error("example file does not validate");
    const site = parseSiteConditions(
      JSON.parse(readFileSync(path.join(root, "templates/example-site.json"), "utf8")),
    );
    const entries = library.plans.map((plan) => ({
      cells: planInputToRow(plan.input, plan.planCode, plan.planName),
      results: computePlanFacings(plan.input, site),
    }));
    const table = planLibraryExportTable(entries);
    expect(table.headers.slice(-PLAN_RESULT_COLUMNS.length)).toEqual(
      PLAN_RESULT_COLUMNS.map((column) => column.header),
    );
    const worst = table.headers.indexOf("Worst facing");
    expect(["N", "E", "S", "W"]).toContain(table.rows[0][worst]);
    const heatingN = table.rows[0][table.headers.indexOf("Heating, front N (Btu/h)")];
    expect(heatingN).toBe(Math.round(entries[0].results.facings[0].heating.totalBtuh));

    for (const reread of [
      readCsv(writeCsv(table.headers, table.rows)),
      await readXlsx(await writeXlsx(table.headers, table.rows)),
    ]) {
      const again = validatePlanTable(reread);
      expect(again.ok).toBe(true);
      if (again.ok)
        expect(again.plans.map((plan) => plan.input)).toEqual(library.plans.map((plan) => plan.input));
    }
  });

  it("plan names that look like formulas are exported as text", async () => {
    const library = validatePlanTable(
      readCsv(readFileSync(path.join(root, "templates/plan-library-template.csv"), "utf8")),
    );
    if (!library.ok) throw new Error("template does not validate");
    const plan = library.plans[0];
    const table = planLibraryExportTable([
      { cells: planInputToRow(plan.input, plan.planCode, '=HYPERLINK("http://example.invalid","x")') },
    ]);
    const csv = writeCsv(table.headers, table.rows);
    expect(csv).toContain(`"'=HYPERLINK(""http://example.invalid"",""x"")"`);
    const back = validatePlanTable(readCsv(csv));
    expect(back.ok && back.plans[0].planName).toBe('=HYPERLINK("http://example.invalid","x")');
    const fromXlsx = validatePlanTable(await readXlsx(await writeXlsx(table.headers, table.rows)));
    expect(fromXlsx.ok && fromXlsx.plans[0].planName).toBe('=HYPERLINK("http://example.invalid","x")');
  });
});

describe("placing a pasted block on the grid", () => {
  const keys = PLAN_COLUMNS.map((column) => column.key);

  it("fills rightward from the start column and downward from the start row", () => {
    const block = parsePastedBlock("R-49\tR-0\n R-38\t0\n");
    const placed = placePastedBlock(block, keys, "ceiling_cavity_r");
    expect(placed).toEqual({
      cells: [
        { rowOffset: 0, key: "ceiling_cavity_r", text: "R-49" },
        { rowOffset: 0, key: "ceiling_continuous_r", text: "R-0" },
        { rowOffset: 1, key: "ceiling_cavity_r", text: " R-38" },
        { rowOffset: 1, key: "ceiling_continuous_r", text: "0" },
      ],
      droppedCells: 0,
      readOnlyCells: 0,
    });
  });

  it("counts cells past the last column and on read-only columns instead of wrapping them", () => {
    const visible = ["plan_code", "bedrooms", "heating_n_btuh"];
    const placed = placePastedBlock(
      [["3", "99", "x", "y"]],
      visible,
      "bedrooms",
      new Set(["plan_code", "bedrooms"]),
    );
    expect(placed).toEqual({
      cells: [{ rowOffset: 0, key: "bedrooms", text: "3" }],
      droppedCells: 2,
      readOnlyCells: 1,
    });
    expect(() => placePastedBlock([["1"]], visible, "nope")).toThrow(/not a column of the grid/);
  });
});

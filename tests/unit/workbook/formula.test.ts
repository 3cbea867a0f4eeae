import { describe, expect, it } from "vitest";
import {
  evaluateFormula,
  evaluateRow,
  isFormula,
  isFormulaSafeKey,
  type RowCellValue,
} from "@/lib/workbook/formula";
import { PLAN_COLUMNS, rowToPlanInput } from "@/lib/workbook/plan-columns";
import { readQuantity } from "@/lib/workbook/units";

const noReferences = () => ({
  ok: false as const,
  reason: "no references in this test",
  unknownName: true as const,
});

/** A row of area columns; "label" is a text column. */
function evaluate(
  cells: Record<string, string>,
  defaults: Record<string, number> = {},
): Map<string, RowCellValue> {
  return evaluateRow({
    cells,
    isColumn: (key) => key in cells || key === "label" || key in defaults,
    isNumberColumn: (key) => (key in cells || key in defaults) && key !== "label",
    readNumber: (_key, text) => readQuantity(text, "areaFt2"),
    blankValue: (key) => defaults[key],
  });
}

function errorOf(result: RowCellValue | undefined): string {
  expect(result?.status).toBe("error");
  return result?.status === "error" ? result.reason : "";
}

describe("cell formulas", () => {
  it("knows a formula by its leading =", () => {
    expect(isFormula("=1+1")).toBe(true);
    expect(isFormula("  =1+1")).toBe(true);
    expect(isFormula("1+1")).toBe(false);
    expect(isFormula("")).toBe(false);
  });

  it.each([
    ["=38*9-2*15", 312],
    ["=(38+2)*9", 360],
    ["=2^3", 8],
    ["=10%", 0.1],
    ["=SUM(1,2,3.5)", 6.5],
    ["=ROUND(1650/9, 1)", 183.3],
    ["=MIN(3, 1, 2)", 1],
    ["=MAX(3, 1, 2)", 3],
    ["=round(2.345, 2)", 2.35],
  ])("evaluates %s = %d", (formula, expected) => {
    const result = evaluateFormula(formula, noReferences);
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.value).toBeCloseTo(expected, 10);
  });

  it.each([
    ["=1/0", /division by zero/],
    ["=(1+", /cannot be read/],
    ["=", /empty/],
    ["=RAND()", /function RAND is not offered/],
    ["=NOW()", /not offered/],
    ['=SUM(1,"a")', /text in quotes/],
    ["=1>0", /boolean, not a number/],
    ["=A1+1", /A1 looks like a spreadsheet cell address/],
    ["=SUM(A1:B2)", /cell (range|address)/],
  ])("reports %s as an error, not a number", (formula, reason) => {
    const result = evaluateFormula(formula, noReferences);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.reason).toMatch(reason);
  });

  it("reports an unknown name, and does not let TRUE stand for 1", () => {
    const row = evaluate({ a_ft2: "=wall_area*2", b_ft2: "=TRUE*3" });
    expect(errorOf(row.get("a_ft2"))).toMatch(/unknown name "wall_area"/);
    expect(errorOf(row.get("b_ft2"))).toMatch(/unknown name "TRUE"/);
  });

  it("refers to other columns of the row by key, with their units read", () => {
    const row = evaluate({ front_wall_ft2: "1,250 sf", front_window_ft2: "=front_wall_ft2*0.15" });
    expect(row.get("front_window_ft2")).toEqual({
      status: "value",
      value: 187.5,
      formula: "=front_wall_ft2*0.15",
    });
  });

  it("follows chains of formula cells in any order", () => {
    const row = evaluate({ c_ft2: "=b_ft2+1", b_ft2: "=a_ft2*2", a_ft2: "=SUM(2, 3)" });
    expect(row.get("a_ft2")).toMatchObject({ value: 5 });
    expect(row.get("b_ft2")).toMatchObject({ value: 10 });
    expect(row.get("c_ft2")).toMatchObject({ value: 11 });
  });

  it("reports a circular reference on every cell of the cycle, and a dependent cell as depending on it", () => {
    const row = evaluate({
      a_ft2: "=b_ft2+1",
      b_ft2: "=c_ft2+1",
      c_ft2: "=a_ft2+1",
      d_ft2: "=a_ft2*2",
      e_ft2: "=e_ft2",
    });
    for (const key of ["a_ft2", "b_ft2", "c_ft2"])
      expect(errorOf(row.get(key))).toMatch(/circular reference: a_ft2 → b_ft2 → c_ft2 → a_ft2/);
    expect(errorOf(row.get("d_ft2"))).toMatch(/refers to a_ft2, which has an error \(circular/);
    expect(errorOf(row.get("e_ft2"))).toMatch(/circular reference: e_ft2 → e_ft2/);
  });

  it("never turns a bad reference into 0", () => {
    const row = evaluate(
      { a_ft2: "", b_ft2: "=a_ft2+5", c_ft2: "abc", d_ft2: "=c_ft2*2", e_ft2: "=label*2", f_ft2: "=g_ft2+1" },
      { g_ft2: 7 },
    );
    expect(errorOf(row.get("b_ft2"))).toMatch(/refers to a_ft2, which is blank/);
    expect(errorOf(row.get("c_ft2"))).toMatch(/not a number/);
    expect(errorOf(row.get("d_ft2"))).toMatch(/refers to c_ft2, which has an error/);
    expect(errorOf(row.get("e_ft2"))).toMatch(/label is not a number column/);
    // A blank column with a default stands for its default.
    expect(row.get("f_ft2")).toMatchObject({ status: "value", value: 8 });
  });

  it("every plan column key can be written in a formula", () => {
    const unsafe = PLAN_COLUMNS.filter((column) => !isFormulaSafeKey(column.key)).map((column) => column.key);
    expect(unsafe).toEqual([]);
    expect(isFormulaSafeKey("ach50")).toBe(false); // the parser would read it as the cell ACH50
  });

  it("evaluates formulas in a plan row, and range-checks their results like typed values", () => {
    const base = {
      plan_code: "T-1",
      plan_name: "Test",
      conditioned_area_ft2: "1600",
      bedrooms: "3",
      front_wall_ft2: "=38*9-2*15",
      front_window_ft2: "=front_wall_ft2*0.15",
      left_wall_ft2: "=ROUND(conditioned_area_ft2/5, 0)",
      back_wall_ft2: "=SUM(front_wall_ft2, 48)",
      right_wall_ft2: "=left_wall_ft2",
      blower_door_ach50: "=MAX(3, 2)",
    };
    const good = rowToPlanInput(base);
    expect(good.ok).toBe(true);
    if (good.ok) {
      expect(good.input.facades.front.grossWallAreaFt2).toBe(312);
      expect(good.input.facades.front.window.areaFt2).toBeCloseTo(46.8, 10);
      expect(good.input.facades.left.grossWallAreaFt2).toBe(320);
      expect(good.input.facades.back.grossWallAreaFt2).toBe(360);
      expect(good.input.facades.right.grossWallAreaFt2).toBe(320);
      expect(good.input.infiltration.ach50).toBe(3);
    }
    const bad = rowToPlanInput({
      ...base,
      front_window_ft2: "=front_wall_ft2-400",
      front_window_shgc: "=1/0",
    });
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      expect(bad.errors).toContainEqual(
        expect.objectContaining({
          key: "front_window_ft2",
          reason: expect.stringMatching(/formula gives -88.*cannot be below 0/),
        }),
      );
      expect(bad.errors).toContainEqual(
        expect.objectContaining({
          key: "front_window_shgc",
          reason: expect.stringMatching(/division by zero/),
        }),
      );
    }
  });
});

import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { parseSiteConditions } from "@/lib/load/input";
import { PLAN_COLUMNS, PLAN_HEADERS, validatePlanTable } from "@/lib/workbook/plan-columns";
import { readCsv, readXlsx, writeCsv } from "@/lib/workbook/table-io";
import { EXAMPLE_PLAN_ROWS, TEMPLATE_EXAMPLE_ROW } from "@/lib/workbook/templates";
import { renderTemplatesReadme } from "@/lib/workbook/templates-readme";

const templates = path.resolve(__dirname, "../../../templates");
const read = (name: string) => readFileSync(path.join(templates, name));

describe("templates/", () => {
  it("the CSV and XLSX templates have every column and one example row that imports", async () => {
    for (const table of [
      readCsv(read("plan-library-template.csv").toString("utf8")),
      await readXlsx(new Uint8Array(read("plan-library-template.xlsx"))),
    ]) {
      expect(table.headers).toEqual([...PLAN_HEADERS]);
      const result = validatePlanTable(table);
      expect(result.ok).toBe(true);
      if (result.ok) expect(result.plans.map((plan) => plan.planCode)).toEqual(["SAMPLE-1500"]);
    }
  });

  it("the example library holds 4–6 invented one- and two-story plans of 1,400–3,200 ft²", () => {
    const result = validatePlanTable(readCsv(read("example-plans.csv").toString("utf8")));
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.plans.length).toBeGreaterThanOrEqual(4);
    expect(result.plans.length).toBeLessThanOrEqual(6);
    for (const plan of result.plans) {
      expect(plan.input.conditionedFloorAreaFt2).toBeGreaterThanOrEqual(1400);
      expect(plan.input.conditionedFloorAreaFt2).toBeLessThanOrEqual(3200);
    }
    expect(new Set(result.plans.map((plan) => plan.input.stories))).toEqual(new Set([1, 2]));
  });

  it("the example site is valid design conditions and says its values are approximate", () => {
    const raw = JSON.parse(read("example-site.json").toString("utf8")) as Record<string, unknown>;
    expect(() => parseSiteConditions(raw)).not.toThrow();
    expect(String(raw.note)).toMatch(/approximate/i);
  });

  it("the files are up to date with the column list (run npx tsx scripts/make-templates.ts)", () => {
    const cells = (rows: readonly Record<string, string>[]) =>
      rows.map((row) => PLAN_COLUMNS.map((column) => row[column.key] ?? ""));
    expect(read("plan-library-template.csv").toString("utf8")).toBe(
      writeCsv(PLAN_HEADERS, cells([TEMPLATE_EXAMPLE_ROW])) + "\r\n",
    );
    expect(read("example-plans.csv").toString("utf8")).toBe(
      writeCsv(PLAN_HEADERS, cells(EXAMPLE_PLAN_ROWS)) + "\r\n",
    );
    expect(read("README.md").toString("utf8")).toBe(renderTemplatesReadme());
  });

  it("the README documents every column by key and header", () => {
    const readme = read("README.md").toString("utf8");
    for (const column of PLAN_COLUMNS) {
      expect(readme).toContain(`\`${column.key}\``);
      expect(readme).toContain(column.header);
    }
    expect(readme).toMatch(/design estimates/i);
  });
});

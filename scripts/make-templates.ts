/**
 * Regenerates templates/ from lib/workbook/plan-columns.ts and lib/workbook/templates.ts:
 *   npx tsx scripts/make-templates.ts
 * Every file is validated before anything is written; a bad example stops the script with
 * the row, column and reason, and writes nothing.
 */
import { mkdir, writeFile } from "node:fs/promises";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { parseSiteConditions } from "../lib/load/input";
import { formatTableErrors } from "../lib/workbook/columns";
import { PLAN_COLUMNS, PLAN_HEADERS, validatePlanTable } from "../lib/workbook/plan-columns";
import { equipmentTemplateFiles } from "../lib/workbook/equipment-columns";
import { readCsv, writeCsv, writeXlsx } from "../lib/workbook/table-io";
import {
  EXAMPLE_PLAN_ROWS,
  EXAMPLE_SITE,
  TEMPLATE_EXAMPLE_ROW,
  type ExampleRow,
} from "../lib/workbook/templates";
import { renderTemplatesReadme } from "../lib/workbook/templates-readme";

const templatesDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..", "templates");

/** Every XLSX is stamped with this time, so regenerating unchanged templates changes no byte. */
const TEMPLATE_TIMESTAMP = new Date(Date.UTC(2026, 0, 1));

function toCells(rows: readonly ExampleRow[]): string[][] {
  for (const row of rows) {
    for (const key of Object.keys(row)) {
      if (!PLAN_COLUMNS.some((column) => column.key === key))
        throw new Error(`example row ${row.plan_code}: unknown column key ${key}`);
    }
  }
  return rows.map((row) => PLAN_COLUMNS.map((column) => row[column.key] ?? ""));
}

function checkCsv(name: string, csv: string): void {
  const result = validatePlanTable(readCsv(csv));
  if (!result.ok) throw new Error(`${name} does not validate:\n${formatTableErrors(result.errors)}`);
}

async function main(): Promise<void> {
  const templateRows = toCells([TEMPLATE_EXAMPLE_ROW]);
  const exampleRows = toCells(EXAMPLE_PLAN_ROWS);
  const templateCsv = writeCsv(PLAN_HEADERS, templateRows);
  const exampleCsv = writeCsv(PLAN_HEADERS, exampleRows);
  checkCsv("plan-library-template.csv", templateCsv);
  checkCsv("example-plans.csv", exampleCsv);
  parseSiteConditions(EXAMPLE_SITE);
  const templateXlsx = await writeXlsx(PLAN_HEADERS, templateRows, {
    sheetName: "Plan library",
    columnWidths: PLAN_COLUMNS.map((column) => Math.min(36, Math.max(12, column.header.length * 0.9))),
    fixedTimestamp: TEMPLATE_TIMESTAMP,
  });

  await mkdir(templatesDir, { recursive: true });
  const files: [string, string | Uint8Array][] = [
    ["plan-library-template.csv", templateCsv + "\r\n"],
    ["plan-library-template.xlsx", templateXlsx],
    ["example-plans.csv", exampleCsv + "\r\n"],
    ["example-site.json", `${JSON.stringify(EXAMPLE_SITE, null, 2)}\n`],
    ["README.md", renderTemplatesReadme()],
    // The equipment catalog's template, example and column guide (lib/workbook/equipment-columns.ts).
    ...(await equipmentTemplateFiles({ fixedTimestamp: TEMPLATE_TIMESTAMP })).map(
      ({ name, content }): [string, string | Uint8Array] => [name, content],
    ),
  ];
  for (const [name, content] of files) {
    await writeFile(path.join(templatesDir, name), content);
    console.log(`wrote templates/${name}`);
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : String(error));
  process.exit(1);
});

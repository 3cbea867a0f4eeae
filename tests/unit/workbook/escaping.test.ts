import ExcelJS from "exceljs";
import { describe, expect, it } from "vitest";
import {
  escapeCsvText,
  needsFormulaEscape,
  parsePastedBlock,
  readCsv,
  readXlsx,
  writeCsv,
  writeXlsx,
} from "@/lib/workbook/table-io";

// Cells a spreadsheet program would run as formulas (OWASP "CSV injection" list: = + - @,
// tab and carriage return at the start), plus harmless text and numbers.
const DANGEROUS = [
  "=1+1",
  "+SUM(A1:A2)",
  "-2+3",
  "@SUM(A1)",
  "\t=1+1",
  "\r=1+1",
  '  =HYPERLINK("http://example.invalid")',
  "=1\n+2",
];
const HARMLESS = ["The Juniper", "R-19", "1,250 sf", "a=b", "", "O'Brien"];

describe("escaping cells that could run as formulas", () => {
  it("knows which text needs escaping", () => {
    for (const text of DANGEROUS) expect(needsFormulaEscape(text), JSON.stringify(text)).toBe(true);
    for (const text of HARMLESS) expect(needsFormulaEscape(text), JSON.stringify(text)).toBe(false);
    expect(escapeCsvText("=1+1")).toBe("'=1+1");
  });

  it("CSV: a leading quote on every dangerous text cell, numbers left as numbers, read back as entered", () => {
    const csv = writeCsv(
      ["name", "value"],
      [...DANGEROUS.map((text) => [text, -5]), ...HARMLESS.map((text) => [text, 12.5])],
    );
    // In the written file, no record's cell begins with a formula trigger.
    const raw = readCsv(csv.replace(/^\uFEFF/, ""));
    const parsedWithoutUnescape = csv.split(/\r\n/).slice(1, DANGEROUS.length + 1);
    for (const line of parsedWithoutUnescape) expect(line.startsWith("\"'")).toBe(true);
    // Negative numbers stay numbers: the line ends in ,-5, not ,'-5.
    expect(parsedWithoutUnescape[0].endsWith(",-5")).toBe(true);
    // Our reader removes our own escape, so a round trip gives the text back.
    expect(raw.rows.map((row) => row.cells[0])).toEqual([...DANGEROUS, ...HARMLESS]);
    expect(raw.rows[0].cells[1]).toBe("-5");
  });

  it("XLSX: dangerous text is stored as plain string cells, never as formulas", async () => {
    const bytes = await writeXlsx(
      ["name", "value"],
      [...DANGEROUS.map((text) => [text, -5]), ["The Juniper", 1250]],
    );
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(Buffer.from(bytes) as unknown as ExcelJS.Buffer);
    const sheet = workbook.worksheets[0];
    DANGEROUS.forEach((text, index) => {
      const cell = sheet.getRow(index + 2).getCell(1);
      expect(cell.type).toBe(ExcelJS.ValueType.String);
      expect(cell.formula).toBeUndefined();
      // XML parsers normalise a bare carriage return to a line feed (XML 1.0 §2.11).
      expect(cell.value).toBe(text.replace(/\r/g, "\n"));
      const number = sheet.getRow(index + 2).getCell(2);
      expect(number.type).toBe(ExcelJS.ValueType.Number);
      expect(number.value).toBe(-5);
    });
    const table = await readXlsx(bytes);
    expect(table.headers).toEqual(["name", "value"]);
    expect(table.rows.slice(0, DANGEROUS.length).map((row) => row.cells[0])).toEqual(
      DANGEROUS.map((text) => text.replace(/\r/g, "\n")),
    );
  });

  it("XLSX: a formula made by a spreadsheet program is read as its computed result", async () => {
    const workbook = new ExcelJS.Workbook();
    const sheet = workbook.addWorksheet("Plans");
    sheet.addRow(["front_wall_ft2", "share"]);
    sheet.getCell("A2").value = { formula: "38*9-2*15", result: 312 };
    sheet.getCell("B2").value = 0.15;
    sheet.getCell("B2").numFmt = "0%";
    sheet.getCell("A3").value = { formula: "38*9" }; // no cached result: our own evaluator gets it
    const buffer = await workbook.xlsx.writeBuffer();
    const table = await readXlsx(new Uint8Array(buffer as ArrayBuffer));
    expect(table.rows[0].cells).toEqual(["312", "15%"]);
    expect(table.rows[1].cells[0]).toBe("=38*9");
  });
});

describe("pasting a block copied from a spreadsheet", () => {
  it("splits tab-separated lines into cells, quoted cells included", () => {
    const block = 'WF-1480\t1,480 sf\tR-49\r\nWF-1860\t"1,860\tsf"\tR-38\r\n';
    expect(parsePastedBlock(block)).toEqual([
      ["WF-1480", "1,480 sf", "R-49"],
      ["WF-1860", "1,860\tsf", "R-38"],
    ]);
    expect(parsePastedBlock("")).toEqual([]);
    expect(parsePastedBlock("R-49")).toEqual([["R-49"]]);
  });
});

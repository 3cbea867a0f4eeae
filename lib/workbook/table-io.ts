/**
 * Reading CSV (papaparse) and XLSX (exceljs) into a header and string rows, and writing
 * them back with every text cell that a spreadsheet program could run as a formula escaped.
 *
 * The reader is generic: it knows nothing of plans. `readTable` in ./columns matches the
 * headers to a column list (plan library now; lots and equipment catalog later).
 */
import ExcelJS from "exceljs";
import Papa from "papaparse";
import type { RawTable } from "./columns";

export class TableFileError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "TableFileError";
  }
}

/**
 * Text that a spreadsheet program could read as a formula: it begins (after any spaces)
 * with = + - @, or begins with a tab or carriage return (OWASP "CSV injection" guidance;
 * full-width ＝＋－＠ included because some programs fold them).
 */
export const FORMULA_TRIGGER = /^(?:[\t\r]|\s*[=+\-@\uFF1D\uFF0B\uFF0D\uFF20])/;

/** True when a text cell must be escaped before it is written. */
export function needsFormulaEscape(text: string): boolean {
  return FORMULA_TRIGGER.test(text);
}

/** The quote-prefixed form written to CSV ("'=1+1"). */
export function escapeCsvText(text: string): string {
  return needsFormulaEscape(text) ? `'${text}` : text;
}

/**
 * Undoes our own CSV escape on read: a leading single quote followed by a formula trigger is
 * the escape we wrote, so "'=38*9" reads back as "=38*9". Any other leading quote is kept.
 */
export function unescapeCsvText(text: string): string {
  return text.startsWith("'") && needsFormulaEscape(text.slice(1)) ? text.slice(1) : text;
}

export type OutputCell = string | number | null | undefined;

/**
 * Counts the separators of the first line outside quotes: a file saved with semicolons or tabs
 * (a spreadsheet program set to a decimal-comma locale does that) reads as one wide column of
 * whole header chunks otherwise.
 */
function firstLineSeparators(text: string): { comma: number; semicolon: number; tab: number } {
  const counts = { comma: 0, semicolon: 0, tab: 0 };
  let quoted = false;
  for (const ch of text) {
    if (ch === '"') quoted = !quoted;
    else if (!quoted && (ch === "\n" || ch === "\r")) break;
    else if (!quoted && ch === ",") counts.comma += 1;
    else if (!quoted && ch === ";") counts.semicolon += 1;
    else if (!quoted && ch === "\t") counts.tab += 1;
  }
  return counts;
}

/** Reads CSV text: the first record is the header; records keep their 1-based numbers. */
export function readCsv(text: string): RawTable {
  const withoutBom = text.replace(/^\uFEFF/, "");
  if (withoutBom.includes("\u0000"))
    throw new TableFileError(
      "the file is not text (it holds NUL bytes): is it a workbook or another binary file saved as .csv?",
    );
  // Semicolon- or tab-separated files are refused rather than guessed: such files often write
  // decimals with commas ("12,5"), which would silently read as other numbers.
  const separators = firstLineSeparators(withoutBom);
  if (separators.semicolon > separators.comma || separators.tab > separators.comma) {
    const kind = separators.semicolon >= separators.tab ? "semicolon" : "tab";
    throw new TableFileError(
      `this file looks ${kind}-separated (its header row has ${kind === "semicolon" ? separators.semicolon : separators.tab} ${kind}s and ${separators.comma} commas); save it as comma-separated CSV, with a point as the decimal mark, or as .xlsx`,
    );
  }
  const parsed = Papa.parse<string[]>(withoutBom, { header: false, skipEmptyLines: false, delimiter: "," });
  const fatal = parsed.errors.find((error) => error.type === "Quotes");
  if (fatal) {
    throw new TableFileError(`CSV row ${(fatal.row ?? 0) + 1}: ${fatal.message}`);
  }
  const records = parsed.data;
  // A file ending in a newline yields one empty trailing record.
  while (records.length > 0 && records[records.length - 1].every((cell) => cell.trim() === "")) records.pop();
  if (records.length === 0) throw new TableFileError("the file is empty: a header row is needed");
  const [headers, ...rest] = records;
  return {
    headers: headers.map((cell) => cell.trim()),
    rows: rest.map((cells, index) => ({ rowNumber: index + 2, cells: cells.map(unescapeCsvText) })),
  };
}

function xlsxCellText(cell: ExcelJS.Cell): string {
  const value = cell.value;
  if (value === null || value === undefined) return "";
  if (typeof value === "number") {
    // A cell formatted as a percentage holds 0.7 for "70%": keep what the user sees.
    if (typeof cell.numFmt === "string" && cell.numFmt.includes("%")) {
      return `${Number((value * 100).toPrecision(12))}%`;
    }
    return String(value);
  }
  if (typeof value === "string") return value;
  if (typeof value === "boolean") return value ? "TRUE" : "FALSE";
  if (value instanceof Date) return value.toISOString().slice(0, 10);
  if (typeof value === "object") {
    if ("richText" in value) return value.richText.map((part) => part.text).join("");
    if ("formula" in value || "sharedFormula" in value) {
      // The spreadsheet program's computed result is what the user saw; without one, hand
      // the formula to our own evaluator.
      const result = value.result;
      if (result === undefined || result === null)
        return "formula" in value && value.formula ? `=${value.formula}` : "";
      if (typeof result === "object" && "error" in result) return String(result.error);
      if (result instanceof Date) return result.toISOString().slice(0, 10);
      return String(result);
    }
    if ("error" in value) return String(value.error);
    if ("text" in value) return String(value.text);
  }
  return String(cell.text ?? "");
}

function headerCells(sheet: ExcelJS.Worksheet): string[] {
  const headerRow = sheet.getRow(1);
  const headers: string[] = [];
  for (let column = 1; column <= sheet.columnCount; column += 1)
    headers.push(xlsxCellText(headerRow.getCell(column)).trim());
  while (headers.length > 0 && headers[headers.length - 1] === "") headers.pop();
  return headers;
}

/** An XLSX file is a zip archive: it starts with the zip signature "PK\x03\x04". */
const isZip = (bytes: Uint8Array) =>
  bytes.byteLength >= 4 && bytes[0] === 0x50 && bytes[1] === 0x4b && bytes[2] === 0x03 && bytes[3] === 0x04;

const NOT_XLSX = "not a readable XLSX workbook";

/**
 * Reads the first worksheet (or the one named `sheetName`): row 1 is the header. The other
 * sheets' header rows come along, so an import can say when the data is on another sheet.
 * Anything that is not a workbook is "not a readable XLSX workbook", never the zip reader's words.
 */
export async function readXlsx(data: ArrayBuffer | Uint8Array, sheetName?: string): Promise<RawTable> {
  const workbook = new ExcelJS.Workbook();
  const bytes = data instanceof Uint8Array ? data : new Uint8Array(data);
  if (!isZip(bytes)) {
    const looksLikeText =
      bytes.byteLength > 0 &&
      !bytes.subarray(0, 512).includes(0) &&
      /[,;\t]/.test(new TextDecoder().decode(bytes.subarray(0, 512)));
    throw new TableFileError(
      `the file is ${NOT_XLSX}${looksLikeText ? " (it looks like CSV text: save it with the .csv extension)" : " (an .xlsx file is a zip archive and this one is not)"}`,
    );
  }
  try {
    // exceljs' typings want a Node Buffer; a Uint8Array view over the same bytes works.
    await workbook.xlsx.load(
      Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength) as unknown as ExcelJS.Buffer,
    );
  } catch {
    throw new TableFileError(
      `the file is ${NOT_XLSX} (it is damaged, password-protected or another kind of zip archive); save it again from the spreadsheet program as .xlsx or .csv`,
    );
  }
  const sheet = sheetName ? workbook.getWorksheet(sheetName) : workbook.worksheets[0];
  if (!sheet)
    throw new TableFileError(
      sheetName ? `the workbook has no sheet named "${sheetName}"` : "the workbook has no sheets",
    );
  const otherSheets = workbook.worksheets
    .filter((other) => other !== sheet)
    .map((other) => ({ name: other.name, headers: headerCells(other) }));
  const headers = headerCells(sheet);
  if (headers.length === 0) {
    const withData = otherSheets
      .filter((other) => other.headers.length > 0)
      .map((other) => `"${other.name}"`);
    throw new TableFileError(
      `the first row of the sheet "${sheet.name}" is empty: a header row is needed${withData.length > 0 ? `; the data looks to be on the sheet ${withData.join(" or ")} — move that sheet first, or save it alone` : ""}`,
    );
  }
  const columnCount = sheet.columnCount;
  const rows: RawTable["rows"] = [];
  for (let rowNumber = 2; rowNumber <= sheet.rowCount; rowNumber += 1) {
    const row = sheet.getRow(rowNumber);
    const cells: string[] = [];
    for (let column = 1; column <= Math.max(columnCount, headers.length); column += 1)
      cells.push(xlsxCellText(row.getCell(column)));
    rows.push({ rowNumber, cells });
  }
  return { headers, rows, sheetName: sheet.name, otherSheets };
}

/** Reads a CSV or XLSX file's bytes, choosing by the file name's extension. */
export async function readTableFile(fileName: string, data: Uint8Array): Promise<RawTable> {
  const lower = fileName.toLowerCase();
  if (lower.endsWith(".csv")) return readCsv(new TextDecoder("utf-8").decode(data));
  if (lower.endsWith(".xlsx")) return readXlsx(data);
  if (lower.endsWith(".xls"))
    throw new TableFileError("old .xls workbooks are not read; save the sheet as .xlsx or .csv");
  throw new TableFileError(`"${fileName}" is neither .csv nor .xlsx`);
}

/**
 * Writes CSV. Numbers are written as numbers; text that could run as a formula gets a
 * leading single quote (papaparse's escapeFormulae with our wider trigger pattern).
 * With `bom` (default true) the text starts with a UTF-8 byte-order mark so that spreadsheet
 * programs read "ft²" and "°F" as UTF-8; readCsv drops it again.
 */
export function writeCsv(
  headers: readonly string[],
  rows: readonly (readonly OutputCell[])[],
  options: { bom?: boolean } = {},
): string {
  const bom = options.bom === false ? "" : "\uFEFF";
  return (
    bom +
    Papa.unparse(
      {
        fields: [...headers],
        data: rows.map((row) => row.map((cell) => (cell === undefined ? null : cell))),
      },
      { escapeFormulae: FORMULA_TRIGGER, newline: "\r\n" },
    )
  );
}

/**
 * Writes XLSX: numbers as numbers, every text as a plain string cell — never a formula,
 * whatever it begins with. The header row is bold and frozen.
 */
export async function writeXlsx(
  headers: readonly string[],
  rows: readonly (readonly OutputCell[])[],
  options: {
    sheetName?: string;
    columnWidths?: readonly number[];
    /**
     * Stamp the workbook and every part of its zip with this time instead of now, so that the same
     * table gives the same bytes (templates/ is regenerated and committed: no churn in git).
     */
    fixedTimestamp?: Date;
  } = {},
): Promise<Uint8Array> {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = "Platload";
  if (options.fixedTimestamp) {
    workbook.created = options.fixedTimestamp;
    workbook.modified = options.fixedTimestamp;
  }
  const sheet = workbook.addWorksheet(options.sheetName ?? "Sheet1", {
    views: [{ state: "frozen", ySplit: 1 }],
  });
  const header = sheet.addRow([...headers]);
  header.font = { bold: true };
  for (const row of rows) {
    const added = sheet.addRow([]);
    row.forEach((cell, index) => {
      if (cell === null || cell === undefined || cell === "") return;
      // Assigning a JS string makes a string cell; exceljs writes a formula only for { formula }.
      added.getCell(index + 1).value = typeof cell === "number" ? cell : String(cell);
    });
  }
  headers.forEach((text, index) => {
    sheet.getColumn(index + 1).width =
      options.columnWidths?.[index] ?? Math.min(40, Math.max(10, text.length + 2));
  });
  const buffer = await workbook.xlsx.writeBuffer();
  if (!options.fixedTimestamp) return new Uint8Array(buffer as ArrayBuffer);
  // exceljs dates each zip entry with the current time; rewrite the entries with the fixed one.
  // jszip is loaded here, not at the top: grids in the browser import this module for pasting,
  // and jszip's browser build brings a polyfill that probes for eval, which the pages' content
  // security policy refuses (lib/http/security-headers.ts).
  const { default: JSZip } = await import("jszip");
  const zip = await JSZip.loadAsync(buffer as ArrayBuffer);
  const stamped = new JSZip();
  const names = Object.keys(zip.files).filter((name) => !zip.files[name].dir);
  for (const name of names) {
    stamped.file(name, await zip.files[name].async("uint8array"), {
      date: options.fixedTimestamp,
      createFolders: false,
    });
  }
  return stamped.generateAsync({ type: "uint8array", compression: "DEFLATE" });
}

/**
 * Parses a block pasted from a spreadsheet (tab-separated, one line per row) into cells.
 * Quoted cells with embedded tabs or newlines are handled by papaparse.
 */
export function parsePastedBlock(text: string): string[][] {
  const trimmed = text.replace(/\r?\n$/, "");
  if (trimmed === "") return [];
  const parsed = Papa.parse<string[]>(trimmed, { delimiter: "\t", header: false, skipEmptyLines: false });
  return parsed.data;
}

/** One pasted cell placed on the grid: rows counted from the start row, columns by key. */
export interface PastedCell {
  rowOffset: number;
  key: string;
  text: string;
}

/**
 * Places a parsed block onto the grid's visible column order, starting at `startKey`:
 * the block's first column lands in `startKey`, the next in the column to its right, and so
 * on. Cells that would fall past the last column are counted in `droppedCells`, never
 * silently wrapped. Columns not in `editableKeys` (computed columns) are skipped and counted.
 */
export function placePastedBlock(
  block: readonly (readonly string[])[],
  visibleKeys: readonly string[],
  startKey: string,
  editableKeys: ReadonlySet<string> = new Set(visibleKeys),
): { cells: PastedCell[]; droppedCells: number; readOnlyCells: number } {
  const start = visibleKeys.indexOf(startKey);
  if (start < 0)
    throw new TableFileError(`the paste starts in "${startKey}", which is not a column of the grid`);
  const cells: PastedCell[] = [];
  let droppedCells = 0;
  let readOnlyCells = 0;
  block.forEach((row, rowOffset) => {
    row.forEach((text, columnOffset) => {
      const key = visibleKeys[start + columnOffset];
      if (key === undefined) droppedCells += 1;
      else if (!editableKeys.has(key)) readOnlyCells += 1;
      else cells.push({ rowOffset, key, text });
    });
  });
  return { cells, droppedCells, readOnlyCells };
}

/**
 * A generic column definition for the workbook's tables (plan library now; lots and the
 * equipment catalog later), and the reading of one table's cells against a column list.
 *
 * Rows are numbered as the user sees them in a spreadsheet program: the header is row 1,
 * the first data row is row 2.
 */
import { evaluateRow, isFormula, type RowCellValue } from "./formula";
import { QUANTITY_KIND_INFO, readQuantity, type QuantityKind } from "./units";

export type ColumnValueType =
  | { type: "number"; quantity: QuantityKind; minimum?: number; maximum?: number; integer?: boolean }
  | { type: "enum"; choices: readonly string[] }
  | { type: "text"; maxLength?: number; pattern?: RegExp; patternHint?: string }
  | { type: "boolean" };

export interface ColumnDef {
  /** Stable snake_case key: used in formulas, JSON and the API. Never renamed once published. */
  key: string;
  /** The header written in the file, with its unit ("Front wall gross (ft²)"). */
  header: string;
  /** Column group of our own naming ("Front facade"). */
  group: string;
  value: ColumnValueType;
  /** A required column must be present in the file and every row must fill it. */
  required: boolean;
  /** What a blank cell stands for (shown in the README); absent = blank means "not given". */
  defaultValue?: number | string | boolean;
  /** One sentence: what the builder enters here. */
  meaning: string;
  /** An example entry as a builder would type it. */
  example: string;
}

export type CellValue = number | string | boolean;

/** How a column's value reads in generated documentation; the number unit is the caller's wording. */
export function describeColumnValue(value: ColumnValueType, numberUnit: string): string {
  switch (value.type) {
    case "number":
      return numberUnit;
    case "enum":
      return `one of: ${value.choices.map((choice) => `\`${choice}\``).join(", ")}`;
    case "text":
      return value.maxLength ? `text (≤ ${value.maxLength} characters)` : "text";
    case "boolean":
      return "yes / no";
  }
}

/** One bad cell: row as the user sees it (header = row 1), the column's header, the reason. */
export interface TableCellError {
  row: number;
  column: string;
  reason: string;
}

/** A table as read from a file: header texts and data rows (strings), with sheet row numbers. */
export interface RawTable {
  headers: string[];
  rows: { rowNumber: number; cells: string[] }[];
  /** For a workbook: the sheet read, and the header rows of its other sheets (to say where data is). */
  sheetName?: string;
  otherSheets?: { name: string; headers: string[] }[];
}

export interface ReadRow {
  rowNumber: number;
  /** Typed values by key; a blank cell with a default has the default; a blank without one is absent. */
  values: Record<string, CellValue>;
  /** The cell text as entered (formulas kept), by key, for display and round trips. */
  entered: Record<string, string>;
}

export interface ReadTableResult {
  rows: ReadRow[];
  errors: TableCellError[];
}

/** Header comparison: Unicode-compatible (ft² = ft2), case- and spacing-insensitive. */
export function normalizeHeader(text: string): string {
  return text.normalize("NFKC").trim().toLowerCase().replace(/\s+/g, " ");
}

/** Finds a column by its header or its key. */
export function matchColumn(columns: readonly ColumnDef[], headerText: string): ColumnDef | undefined {
  const wanted = normalizeHeader(headerText);
  return columns.find((column) => normalizeHeader(column.header) === wanted || column.key === wanted);
}

const TRUE_WORDS = ["yes", "y", "true", "1"];
const FALSE_WORDS = ["no", "n", "false", "0"];

function describeRange(column: ColumnDef & { value: { type: "number" } }): string {
  const unit = QUANTITY_KIND_INFO[column.value.quantity].unit;
  const { minimum, maximum } = column.value;
  if (minimum !== undefined && maximum !== undefined)
    return `${minimum} to ${maximum}${unit === "count" ? "" : ` ${unit}`}`;
  if (minimum !== undefined) return `at least ${minimum}`;
  return `at most ${maximum}`;
}

/** Reads the typed (non-formula) text of a numeric column: units, then the column's range. */
export function readNumberCell(
  column: ColumnDef,
  text: string,
): { ok: true; value: number } | { ok: false; reason: string } {
  if (column.value.type !== "number") return { ok: false, reason: `${column.key} is not a number column` };
  const reading = readQuantity(text, column.value.quantity);
  if (!reading.ok) return reading;
  return checkNumberRange(column, reading.value);
}

export function checkNumberRange(
  column: ColumnDef,
  value: number,
): { ok: true; value: number } | { ok: false; reason: string } {
  if (column.value.type !== "number") return { ok: false, reason: `${column.key} is not a number column` };
  const { minimum, maximum, integer } = column.value;
  const numberColumn = column as ColumnDef & { value: { type: "number" } };
  if (integer && !Number.isInteger(value)) return { ok: false, reason: `${value} is not a whole number` };
  if ((minimum !== undefined && value < minimum) || (maximum !== undefined && value > maximum)) {
    return { ok: false, reason: `${value} is out of range; valid range ${describeRange(numberColumn)}` };
  }
  return { ok: true, value };
}

/** Reads an enum, text or boolean cell (never blank). */
export function readChoiceOrTextCell(
  column: ColumnDef,
  text: string,
): { ok: true; value: CellValue } | { ok: false; reason: string } {
  const value = column.value;
  switch (value.type) {
    case "enum": {
      const found = value.choices.find((choice) => choice.toLowerCase() === text.trim().toLowerCase());
      if (found === undefined)
        return { ok: false, reason: `"${text}" is not one of the choices: ${value.choices.join(", ")}` };
      return { ok: true, value: found };
    }
    case "boolean": {
      const word = text.trim().toLowerCase();
      if (TRUE_WORDS.includes(word)) return { ok: true, value: true };
      if (FALSE_WORDS.includes(word)) return { ok: true, value: false };
      return { ok: false, reason: `"${text}" is not yes or no` };
    }
    case "text": {
      const trimmed = text.trim();
      if (value.maxLength !== undefined && trimmed.length > value.maxLength) {
        return {
          ok: false,
          reason: `is ${trimmed.length} characters long; at most ${value.maxLength} are allowed`,
        };
      }
      if (value.pattern && !value.pattern.test(trimmed)) {
        return {
          ok: false,
          reason: `"${trimmed}" ${value.patternHint ?? "has characters that are not allowed"}`,
        };
      }
      return { ok: true, value: trimmed };
    }
    case "number":
      return { ok: false, reason: "is a number column" };
  }
}

/**
 * Reads one row's cells (by key) against the column list: numbers with units and formulas,
 * choices, text, booleans, defaults and required cells. Returns the typed values and every
 * bad cell as { key, reason }.
 */
export function readRowCells(
  columns: readonly ColumnDef[],
  entered: Readonly<Record<string, string>>,
): { values: Record<string, CellValue>; errors: { key: string; reason: string }[] } {
  const byKey = new Map(columns.map((column) => [column.key, column]));
  const values: Record<string, CellValue> = {};
  const errors: { key: string; reason: string }[] = [];

  const numeric = evaluateRow({
    cells: Object.fromEntries(
      columns.filter((c) => c.value.type === "number").map((c) => [c.key, entered[c.key] ?? ""]),
    ),
    isColumn: (key) => byKey.has(key),
    isNumberColumn: (key) => byKey.get(key)?.value.type === "number",
    readNumber: (key, text) => readNumberCell(byKey.get(key) as ColumnDef, text),
    blankValue: (key) => {
      const fallback = byKey.get(key)?.defaultValue;
      return typeof fallback === "number" ? fallback : undefined;
    },
  });

  for (const column of columns) {
    const text = (entered[column.key] ?? "").trim();
    if (column.value.type === "number") {
      const result: RowCellValue = numeric.get(column.key) ?? { status: "blank" };
      if (result.status === "error") {
        errors.push({ key: column.key, reason: result.reason });
        continue;
      }
      if (result.status === "value") {
        // A formula's result is range-checked like a typed value.
        const checked = isFormula(text)
          ? checkFormulaResult(column, result.value)
          : { ok: true as const, value: result.value };
        if (checked.ok) values[column.key] = checked.value;
        else errors.push({ key: column.key, reason: checked.reason });
        continue;
      }
    } else if (text !== "") {
      // Text columns keep a leading "=" as literal text (it is never evaluated, and exports escape it).
      if (isFormula(text) && column.value.type !== "text") {
        errors.push({ key: column.key, reason: "a formula is only allowed in a number column" });
        continue;
      }
      const reading = readChoiceOrTextCell(column, text);
      if (reading.ok) values[column.key] = reading.value;
      else errors.push({ key: column.key, reason: reading.reason });
      continue;
    }
    // Blank cell.
    if (column.defaultValue !== undefined) values[column.key] = column.defaultValue;
    else if (column.required) errors.push({ key: column.key, reason: "is required and is blank" });
  }
  return { values, errors };
}

function checkFormulaResult(
  column: ColumnDef,
  value: number,
): { ok: true; value: number } | { ok: false; reason: string } {
  if (column.value.type !== "number") return { ok: false, reason: "is not a number column" };
  const info = QUANTITY_KIND_INFO[column.value.quantity];
  if (info.minimum !== undefined && value < info.minimum) {
    return { ok: false, reason: `the formula gives ${value}; ${info.label} cannot be below ${info.minimum}` };
  }
  if (info.maximum !== undefined && value > info.maximum) {
    return { ok: false, reason: `the formula gives ${value}; ${info.label} cannot be above ${info.maximum}` };
  }
  if (info.integer && !Number.isInteger(value))
    return { ok: false, reason: `the formula gives ${value}, not a whole number` };
  const ranged = checkNumberRange(column, value);
  return ranged.ok ? ranged : { ok: false, reason: `the formula gives ${ranged.reason}` };
}

/**
 * Reads a whole table against a column list: unknown, duplicated and missing required
 * columns (reported on row 1), then every cell of every non-blank row.
 */
export function readTable(
  table: RawTable,
  columns: readonly ColumnDef[],
  options: { ignoredColumns?: readonly Pick<ColumnDef, "key" | "header">[] } = {},
): ReadTableResult {
  const errors: TableCellError[] = [];
  const positions = new Map<string, number>();
  const ignored = options.ignoredColumns ?? [];
  table.headers.forEach((headerText, index) => {
    if (headerText.trim() === "") {
      const columnHasData = table.rows.some((row) => (row.cells[index] ?? "").trim() !== "");
      if (columnHasData)
        errors.push({ row: 1, column: `(column ${index + 1})`, reason: "has data but no header" });
      return;
    }
    // Output-only columns (computed results in an export) are recognised and skipped.
    const wanted = normalizeHeader(headerText);
    if (ignored.some((column) => normalizeHeader(column.header) === wanted || column.key === wanted)) return;
    const column = matchColumn(columns, headerText);
    if (!column) {
      errors.push({
        row: 1,
        column: headerText,
        reason: "is not a known column; see templates/README.md for the column list",
      });
      return;
    }
    if (positions.has(column.key)) {
      errors.push({
        row: 1,
        column: headerText,
        reason: `appears twice (also column ${(positions.get(column.key) ?? 0) + 1})`,
      });
      return;
    }
    positions.set(column.key, index);
  });
  const overflowColumns = new Set<number>();
  for (const row of table.rows) {
    for (let index = table.headers.length; index < row.cells.length; index += 1) {
      if ((row.cells[index] ?? "").trim() !== "") overflowColumns.add(index);
    }
  }
  for (const index of [...overflowColumns].sort((a, b) => a - b)) {
    errors.push({ row: 1, column: `(column ${index + 1})`, reason: "has data but no header" });
  }
  for (const column of columns) {
    if (column.required && !positions.has(column.key)) {
      errors.push({ row: 1, column: column.header, reason: "is a required column and is missing" });
    }
  }

  const rows: ReadRow[] = [];
  for (const row of table.rows) {
    if (row.cells.every((cell) => (cell ?? "").trim() === "")) continue;
    const entered: Record<string, string> = {};
    for (const [key, index] of positions) entered[key] = row.cells[index] ?? "";
    const present = columns.filter((column) => positions.has(column.key) || !column.required);
    const read = readRowCells(present, entered);
    for (const error of read.errors) {
      const column = columns.find((c) => c.key === error.key);
      errors.push({ row: row.rowNumber, column: column?.header ?? error.key, reason: error.reason });
    }
    rows.push({ rowNumber: row.rowNumber, values: read.values, entered });
  }
  return { rows, errors };
}

/** One line per bad cell, for a command line or a log. */
export function formatTableErrors(errors: readonly TableCellError[]): string {
  return errors.map((error) => `row ${error.row}, column "${error.column}": ${error.reason}`).join("\n");
}

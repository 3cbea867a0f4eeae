/**
 * Cell formulas for numeric cells, evaluated with hot-formula-parser.
 *
 * A numeric cell that begins with "=" is a formula: arithmetic (+ - * / ^ %, parentheses),
 * a short list of functions (FORMULA_FUNCTIONS) and references to other columns of the same
 * row by their column key (`=front_wall_ft2*0.15`, keys listed in templates/README.md).
 * Spreadsheet cell addresses (A1, B2:C4) are not supported: a row has no addresses, only keys.
 *
 * Every failure is an error on that cell with a reason — a bad formula, division by zero, an
 * unknown name, a reference to a blank or non-numeric column, a circular reference — never a
 * silent 0.
 */
import { Parser } from "hot-formula-parser";

/** Functions a numeric cell may use. Deterministic ones only (no RAND, NOW, TODAY). */
export const FORMULA_FUNCTIONS = [
  "SUM",
  "ROUND",
  "ROUNDUP",
  "ROUNDDOWN",
  "MIN",
  "MAX",
  "ABS",
  "AVERAGE",
  "SQRT",
  "POWER",
  "PI",
  "INT",
  "MOD",
  "PRODUCT",
  "CEILING",
  "FLOOR",
] as const;

export type CellEvaluation = { ok: true; value: number } | { ok: false; reason: string };

/** True when the cell text is a formula (leading "=" after optional spaces). */
export function isFormula(text: string | null | undefined): boolean {
  return typeof text === "string" && text.trimStart().startsWith("=");
}

/**
 * A key can be written in a formula when hot-formula-parser's lexer reads it as one variable:
 * lower-case snake_case, and not letters followed at once by a digit (the lexer would read
 * "ach50" as the cell address ACH50).
 */
export function isFormulaSafeKey(key: string): boolean {
  return /^[a-z][a-z0-9_]*[a-z0-9]$/.test(key) && !/^[a-z]+[0-9]/.test(key) && !/__/.test(key);
}

const PARSER_ERROR_REASONS: Record<string, string> = {
  "#DIV/0!": "division by zero",
  "#NAME?": "an unknown name or function",
  "#VALUE!": "a value of the wrong type (text or a cell address) in the formula",
  "#NUM!": "a number out of range (for example the square root of a negative number)",
  "#N/A": "a value that is not available",
  "#NULL!": "an empty intersection",
  "#REF!": "a reference that cannot be resolved",
  "#ERROR!": "the formula cannot be read (check operators and parentheses)",
};

/** Resolves a column key named in a formula to that cell's value (or its error). */
export type ReferenceResolution =
  | CellEvaluation
  | { ok: false; reason: string; unknownName: true }
  | { ok: false; reason: string; circular: true };
export type ReferenceResolver = (key: string) => ReferenceResolution;

class FormulaFailure extends Error {}

/**
 * Evaluate one formula ("=38*9-2*15"). `resolve` answers references to other columns.
 *
 * @example evaluateFormula("=38*9-2*15", () => ({ ok: false, reason: "no references" })) // { ok: true, value: 312 }
 */
export function evaluateFormula(formulaText: string, resolve: ReferenceResolver): CellEvaluation {
  const trimmed = formulaText.trim();
  if (!trimmed.startsWith("=")) return { ok: false, reason: "a formula must begin with =" };
  // hot-formula-parser's parse() takes the expression without the leading "=".
  const expression = trimmed.slice(1).trim();
  if (expression === "") return { ok: false, reason: "the formula is empty" };
  if (/["']/.test(expression)) {
    return { ok: false, reason: "text in quotes is not allowed in a numeric formula" };
  }
  for (const match of expression.matchAll(/([A-Za-z_][A-Za-z0-9_.]*)\s*\(/g)) {
    const name = match[1].toUpperCase();
    if (!(FORMULA_FUNCTIONS as readonly string[]).includes(name)) {
      return {
        ok: false,
        reason: `the function ${match[1]} is not offered; use ${FORMULA_FUNCTIONS.join(", ")}`,
      };
    }
  }

  let failure: string | undefined;
  const fail = (reason: string): never => {
    failure ??= reason;
    throw new FormulaFailure(reason);
  };
  const lookUp = (name: string, asCellAddress: boolean): number => {
    const referenced = resolve(name);
    if (referenced.ok) return referenced.value;
    if (asCellAddress && "unknownName" in referenced) {
      return fail(
        `${name.toUpperCase()} looks like a spreadsheet cell address; a row's cells are named by column key (for example front_wall_ft2)`,
      );
    }
    return fail(referenced.reason);
  };

  const parser = new Parser();
  parser.on("callVariable", (name, done) => {
    done(lookUp(name, false));
  });
  parser.on("callCellValue", (cell, done) => {
    done(lookUp(cell.label.toLowerCase(), true));
  });
  parser.on("callRangeValue", (start, end) => {
    fail(
      `${start.label}:${end.label} is a cell range; a row's cells are named by column key, not by address`,
    );
  });

  const { result, error } = parser.parse(expression);
  if (failure !== undefined) return { ok: false, reason: failure };
  if (error !== null) {
    return {
      ok: false,
      reason: `formula error ${error}: ${PARSER_ERROR_REASONS[error] ?? "the formula cannot be evaluated"}`,
    };
  }
  if (typeof result !== "number") {
    return {
      ok: false,
      reason: `the formula gives ${result === null ? "nothing" : `a ${typeof result}`}, not a number`,
    };
  }
  if (!Number.isFinite(result)) return { ok: false, reason: "the formula gives a number that is not finite" };
  return { ok: true, value: result };
}

/** How evaluateRow reads the row's cells. */
export interface RowFormulaContext {
  /** The raw text of each cell of the row, by column key (blank = "" or absent). */
  cells: Readonly<Record<string, string | undefined>>;
  /** Whether a key names a numeric column (only numeric columns can be referenced). */
  isNumberColumn: (key: string) => boolean;
  /** Whether a key names any column of the table. */
  isColumn: (key: string) => boolean;
  /** Reads a typed (non-formula) cell of a numeric column, with its units. */
  readNumber: (key: string, text: string) => CellEvaluation;
  /** The value a blank cell stands for, if its column has a default. */
  blankValue: (key: string) => number | undefined;
}

export type RowCellValue =
  | { status: "blank" }
  | { status: "value"; value: number; formula?: string }
  | { status: "error"; reason: string };

/**
 * Evaluate every numeric cell of a row. Formulas may refer to other formula cells; chains
 * are followed and cycles are reported on every cell in the cycle.
 */
export function evaluateRow(context: RowFormulaContext): Map<string, RowCellValue> {
  const results = new Map<string, RowCellValue>();
  const circular = new Map<string, string>();
  const inProgress: string[] = [];

  const evaluateKey = (key: string): RowCellValue => {
    const done = results.get(key);
    if (done) return done;
    const text = (context.cells[key] ?? "").trim();
    let value: RowCellValue;
    if (text === "") {
      value = { status: "blank" };
    } else if (isFormula(text)) {
      inProgress.push(key);
      const evaluation = evaluateFormula(text, (name) => resolveReference(key, name));
      inProgress.pop();
      const cycleReason = circular.get(key);
      if (cycleReason !== undefined) value = { status: "error", reason: cycleReason };
      else
        value = evaluation.ok
          ? { status: "value", value: evaluation.value, formula: text }
          : { status: "error", reason: evaluation.reason };
    } else {
      const reading = context.readNumber(key, text);
      value = reading.ok
        ? { status: "value", value: reading.value }
        : { status: "error", reason: reading.reason };
    }
    results.set(key, value);
    return value;
  };

  const resolveReference = (fromKey: string, name: string): ReferenceResolution => {
    const key = name.toLowerCase();
    if (!context.isColumn(key)) {
      return {
        ok: false,
        reason: `unknown name "${name}"; refer to other columns of the row by their column key`,
        unknownName: true,
      };
    }
    if (!context.isNumberColumn(key)) {
      return { ok: false, reason: `${key} is not a number column and cannot be used in a formula` };
    }
    const cycleStart = inProgress.indexOf(key);
    if (cycleStart >= 0) {
      const path = [...inProgress.slice(cycleStart), key];
      const reason = `circular reference: ${path.join(" → ")}`;
      for (const member of inProgress.slice(cycleStart)) circular.set(member, reason);
      return { ok: false, reason, circular: true };
    }
    const referenced = evaluateKey(key);
    if (referenced.status === "value") return { ok: true, value: referenced.value };
    if (referenced.status === "blank") {
      const fallback = context.blankValue(key);
      if (fallback !== undefined) return { ok: true, value: fallback };
      return { ok: false, reason: `refers to ${key}, which is blank` };
    }
    const cycleReason = circular.get(key);
    if (cycleReason !== undefined && circular.has(fromKey))
      return { ok: false, reason: cycleReason, circular: true };
    return { ok: false, reason: `refers to ${key}, which has an error (${referenced.reason})` };
  };

  for (const key of Object.keys(context.cells)) {
    if (context.isNumberColumn(key)) evaluateKey(key);
  }
  return results;
}

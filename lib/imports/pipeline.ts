/**
 * The stages every import shares, pure (no database, no HTTP): read the file into a table, check
 * it against the importer's columns, and word the problems. The runner (db/queries/imports.ts)
 * calls them in order and does the reading and writing around them.
 */
import { MAX_FIELD_ERRORS } from "@/lib/errors";
import { normalizeHeader, type ColumnDef, type RawTable, type TableCellError } from "@/lib/workbook/columns";
import { readTableFile, TableFileError } from "@/lib/workbook/table-io";

import type { ImportKind } from "./import-kinds";

export { IMPORT_KINDS, type ImportKind } from "./import-kinds";

export type StageResult<T> = { ok: true; value: T } | { ok: false; errors: TableCellError[] };

/** A problem with the file as a whole (shown on row 1, like a header problem). */
export const fileProblem = (reason: string): TableCellError => ({ row: 1, column: "(file)", reason });

/** The file types an importer reads, by name; checked when the upload arrives, before it is kept. */
export const IMPORT_FILE_PATTERN = /\.(csv|xlsx)$/i;

/** Stage 1: the file's bytes as a table; an unreadable file is one clear problem, never an exception. */
export async function readImportFile(fileName: string, data: Uint8Array): Promise<StageResult<RawTable>> {
  try {
    return { ok: true, value: await readTableFile(fileName, data) };
  } catch (error) {
    if (error instanceof TableFileError) return { ok: false, errors: [fileProblem(error.message)] };
    throw error;
  }
}

/**
 * When a workbook's first sheet lacks required columns that another sheet has, the data is most
 * likely on that sheet: say so first, before the missing-column problems it causes.
 */
export function withSheetHint(
  table: RawTable,
  columns: readonly ColumnDef[],
  errors: TableCellError[],
): TableCellError[] {
  const missing = columns.filter(
    (c) =>
      c.required &&
      !table.headers.some((h) => normalizeHeader(h) === normalizeHeader(c.header) || h.trim() === c.key),
  );
  if (missing.length === 0 || !table.otherSheets?.length) return errors;
  const hasAll = (headers: string[]) =>
    missing.every((c) =>
      headers.some((h) => normalizeHeader(h) === normalizeHeader(c.header) || h.trim() === c.key),
    );
  const found = table.otherSheets.find((sheet) => hasAll(sheet.headers));
  if (!found) return errors;
  return [
    fileProblem(
      `the first sheet ("${table.sheetName ?? "Sheet1"}") does not hold the table; the sheet "${found.name}" has its columns — move that sheet first, or save it alone, and import again`,
    ),
    ...errors,
  ];
}

/** What an import keeps and answers of its problems: the first MAX_FIELD_ERRORS and how many in all. */
export function capProblems(errors: readonly TableCellError[]): {
  errors: TableCellError[];
  errorCount: number;
} {
  return { errors: errors.slice(0, MAX_FIELD_ERRORS), errorCount: errors.length };
}

/** Every problem sorted by row, the file's own first. */
export function sortProblems(errors: TableCellError[]): TableCellError[] {
  return [...errors].sort((a, b) => a.row - b.row);
}

import "server-only";
import { eq } from "drizzle-orm";
import type { Database } from "@/db";
import { imports, IMPORT_KINDS } from "@/db/schema";
import { AppError } from "@/lib/errors";
import type { RawTable, TableCellError } from "@/lib/workbook/columns";
import { readTableFile, TableFileError } from "@/lib/workbook/table-io";

/**
 * The first steps every synchronous import shares: the import is recorded (kept whether it
 * succeeds or not), the size is checked and the file read as a table. `fail` records the errors on
 * the import and throws the 400 that names every bad cell.
 */
export async function openTableImport({
  db,
  accountId,
  userId,
  kind,
  fileName,
  data,
  maxBytes,
}: {
  db: Database;
  accountId: number;
  userId: number;
  kind: (typeof IMPORT_KINDS)[number];
  fileName: string;
  data: Uint8Array;
  maxBytes: number;
}): Promise<{ importId: number; table: RawTable; fail: (errors: TableCellError[]) => Promise<never> }> {
  const [{ id: importId }] = await db.insert(imports).values({ accountId, userId, kind, fileName: fileName.slice(0, 255), fileSizeBytes: data.byteLength, state: "validating" }).$returningId();
  const record = async (errors: TableCellError[], message: string): Promise<never> => {
    await db.update(imports).set({ state: "failed", errors, progressPct: 100, finishedAt: new Date() }).where(eq(imports.id, importId));
    throw new AppError("invalid_input", message, errors.map((e) => ({ field: `row ${e.row}, ${e.column}`, row: e.row, column: e.column, message: e.reason })));
  };
  const fail = (errors: TableCellError[]) => record(errors, `${errors.length} problem(s) in the file; nothing was imported.`);
  if (data.byteLength > maxBytes) {
    return record([{ row: 1, column: "(file)", reason: `the file is ${(data.byteLength / 1048576).toFixed(1)} MB; the limit is ${maxBytes / 1048576} MB` }], "The file is too large; nothing was imported.");
  }
  try {
    return { importId, table: await readTableFile(fileName, data), fail };
  } catch (error) {
    if (error instanceof TableFileError) return record([{ row: 1, column: "(file)", reason: error.message }], `The file could not be read: ${error.message}. Nothing was imported.`);
    throw error;
  }
}

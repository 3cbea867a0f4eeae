import "server-only";
import { and, eq, inArray, isNotNull, lt } from "drizzle-orm";
import type { Database } from "@/db";
import { communities, imports, IMPORT_STATES, type ImportRecord } from "@/db/schema";
import { AppError, notFound } from "@/lib/errors";
import { enqueueJob } from "@/lib/jobs/queue";
import { workJobId } from "@/lib/jobs/types";
import {
  capProblems,
  fileProblem,
  IMPORT_FILE_PATTERN,
  readImportFile,
  type ImportKind,
  type StageResult,
} from "@/lib/imports/pipeline";
import { deleteObject, getObject, objectKey, putObject } from "@/lib/storage/object-store";
import type { RawTable, TableCellError } from "@/lib/workbook/columns";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];
type ImportState = (typeof IMPORT_STATES)[number];
const FINAL: readonly ImportState[] = ["succeeded", "failed"];

/**
 * One importer's own steps; the runner below does the rest (the file, the state, failures).
 * `check` and `compute` are pure apart from the context they are handed; `save` runs inside the
 * transaction that also marks the import succeeded, and must refuse (ImportConflict) when what it
 * was computed from changed in the meantime.
 */
export interface ImportSteps<Context, Checked, Computed> {
  loadContext(db: Database, record: ImportRecord): Promise<Context>;
  check(table: RawTable, context: Context): StageResult<Checked>;
  compute(checked: Checked, context: Context, progress: (pct: number) => Promise<void>): Promise<Computed>;
  save(
    tx: Tx,
    record: ImportRecord,
    computed: Computed,
    context: Context,
  ): Promise<{ created: number; updated: number }>;
}

/** What the rows were computed from changed before they were saved: the job runs again from the start. */
export class ImportConflict extends Error {
  constructor(message: string) {
    super(message);
    this.name = "ImportConflict";
  }
}

const CONTENT_TYPES = {
  csv: "text/csv",
  xlsx: "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
};

/**
 * Receives an upload for any importer: checks what is cheap to check (the community, the file
 * type), keeps the original in object storage and records the import as received. The work
 * itself is a job (enqueue `import` with the id): the web process never reads the file.
 */
export async function receiveImport({
  db,
  accountId,
  userId,
  kind,
  communityId,
  fileName,
  data,
}: {
  db: Database;
  accountId: number;
  userId: number;
  kind: ImportKind;
  communityId?: number;
  fileName: string;
  data: Uint8Array;
}) {
  if (kind === "lots") {
    const [community] = await db
      .select({ id: communities.id })
      .from(communities)
      .where(and(eq(communities.id, communityId ?? 0), eq(communities.accountId, accountId)));
    if (!community) throw notFound("That community");
  }
  if (!IMPORT_FILE_PATTERN.test(fileName)) {
    const hint = /\.xls$/i.test(fileName)
      ? " Old .xls workbooks are not read; save the sheet as .xlsx or .csv."
      : "";
    throw new AppError(
      "invalid_input",
      `"${fileName}" is neither .csv nor .xlsx; nothing was imported.${hint}`,
      [{ field: "file", message: "Use a .csv or .xlsx file" }],
    );
  }
  if (data.byteLength === 0)
    throw new AppError("invalid_input", `"${fileName}" is empty; nothing was imported.`, [
      { field: "file", message: "The file is empty" },
    ]);
  const key = objectKey({ accountId, kind: `${kind}-imports`, fileName });
  await putObject({
    key,
    body: data,
    contentType: fileName.toLowerCase().endsWith(".csv") ? CONTENT_TYPES.csv : CONTENT_TYPES.xlsx,
  });
  const createdAt = new Date();
  const [{ id }] = await db
    .insert(imports)
    .values({
      accountId,
      userId,
      kind,
      communityId: kind === "lots" ? communityId : null,
      fileName: fileName.slice(0, 255),
      fileSizeBytes: data.byteLength,
      fileKey: key,
      state: "received",
      progressPct: 5,
      createdAt,
    })
    .$returningId();
  return { importId: id, jobId: workJobId("import", { id, createdAt }) };
}

/**
 * Receives an upload and queues its job. When the queue does not answer, the import is marked
 * failed (saying so) and its file deleted, and the caller gets the 503.
 */
export async function queueImport(args: Parameters<typeof receiveImport>[0]): Promise<{ importId: number }> {
  const { importId, jobId } = await receiveImport(args);
  try {
    await enqueueJob("import", { importId }, { jobId });
  } catch (error) {
    await failImport(args.db, importId, [
      fileProblem("the job queue did not answer, so the import did not start; upload the file again"),
    ]);
    throw error;
  }
  return { importId };
}

async function setProgress(db: Database, importId: number, state: ImportState, pct: number) {
  await db
    .update(imports)
    .set({ state, progressPct: pct })
    .where(
      and(
        eq(imports.id, importId),
        inArray(imports.state, ["received", "validating", "computing", "saving"]),
      ),
    );
}

/**
 * Marks an import failed with its problems (the first 200 and the count), unless it has finished
 * already. A file that failed is not kept: it is deleted first, so the row never shows "failed"
 * with its file still stored (a delete that fails leaves the key for the sweep). Safe to run twice.
 */
export async function failImport(
  db: Database,
  importId: number,
  problems: readonly TableCellError[],
): Promise<void> {
  const { errors, errorCount } = capProblems(problems);
  const [current] = await db
    .select({ state: imports.state, fileKey: imports.fileKey })
    .from(imports)
    .where(eq(imports.id, importId));
  if (!current || FINAL.includes(current.state)) return;
  const deleted = current.fileKey ? await deleteQuietly(importId, current.fileKey) : true;
  await db.transaction(async (tx) => {
    const [row] = await tx
      .select({ state: imports.state })
      .from(imports)
      .where(eq(imports.id, importId))
      .for("update");
    if (!row || FINAL.includes(row.state)) return;
    await tx
      .update(imports)
      .set({
        state: "failed",
        errors,
        errorCount,
        progressPct: 100,
        finishedAt: new Date(),
        ...(deleted ? { fileKey: null } : {}),
      })
      .where(eq(imports.id, importId));
  });
}

async function deleteQuietly(importId: number, fileKey: string): Promise<boolean> {
  try {
    await deleteObject(fileKey);
    return true;
  } catch (error) {
    // Left for the sweep (sweepFailedImportFiles), which deletes the files of failed imports.
    console.error(`could not delete the file of failed import ${importId}:`, (error as Error).message);
    return false;
  }
}

/** Time spent in each stage, ms (the worker's log and the benchmark). */
export interface ImportTimings {
  readMs: number;
  checkMs: number;
  computeMs: number;
  saveMs: number;
}

export type ImportOutcome =
  | { state: "succeeded"; created: number; updated: number; timings: ImportTimings }
  | { state: "failed"; errorCount: number }
  | { state: "already-finished" };

/**
 * The one import runner (the `import` job): file → table → check → compute → save, with the
 * import row showing each stage. Idempotent: an import that has finished is left as it is, and
 * the save checks the row's state in the same transaction that writes the rows and marks it
 * succeeded, so an import that runs twice (a worker died, the job was retried) writes once.
 * Bad files fail the import with every problem and write nothing; server errors are thrown so
 * the job is retried with backoff.
 */
export async function runImport<C, K, P>({
  db,
  importId,
  stepsFor,
  data,
}: {
  db: Database;
  importId: number;
  stepsFor: (kind: ImportKind) => ImportSteps<C, K, P>;
  /** The file's bytes when the caller has them (the benchmark); else read from object storage. */ data?: Uint8Array;
}): Promise<ImportOutcome> {
  const [record] = await db.select().from(imports).where(eq(imports.id, importId));
  if (!record) throw notFound("That import");
  if (FINAL.includes(record.state)) return { state: "already-finished" };
  const steps = stepsFor(record.kind);

  const t0 = performance.now();
  await setProgress(db, importId, "validating", 10);
  if (!record.fileKey && !data) {
    await failImport(db, importId, [fileProblem("the uploaded file is no longer stored; upload it again")]);
    return { state: "failed", errorCount: 1 };
  }
  const read = await readImportFile(record.fileName, data ?? (await getObject(record.fileKey!)));
  const t1 = performance.now();
  const context = read.ok ? await steps.loadContext(db, record) : undefined;
  const checked = read.ok ? steps.check(read.value, context as C) : read;
  if (!checked.ok) {
    await failImport(db, importId, checked.errors);
    return { state: "failed", errorCount: checked.errors.length };
  }

  const t2 = performance.now();
  await setProgress(db, importId, "computing", 35);
  const computed = await steps.compute(checked.value, context as C, (pct) =>
    setProgress(db, importId, "computing", 35 + Math.round(pct * 0.35)),
  );

  const t3 = performance.now();
  await setProgress(db, importId, "saving", 70);
  const saved = await db.transaction(async (tx) => {
    const [row] = await tx
      .select({ state: imports.state })
      .from(imports)
      .where(eq(imports.id, importId))
      .for("update");
    if (!row || FINAL.includes(row.state)) return null;
    const counts = await steps.save(tx, record, computed, context as C);
    await tx
      .update(imports)
      .set({
        state: "succeeded",
        createdCount: counts.created,
        updatedCount: counts.updated,
        errors: [],
        errorCount: 0,
        progressPct: 100,
        finishedAt: new Date(),
      })
      .where(eq(imports.id, importId));
    return counts;
  });
  const timings = { readMs: t1 - t0, checkMs: t2 - t1, computeMs: t3 - t2, saveMs: performance.now() - t3 };
  return saved ? { state: "succeeded", ...saved, timings } : { state: "already-finished" };
}

/** An import whose job has used its last attempt: failed, with the reason, and nothing written. */
export async function markImportStopped(db: Database, importId: number, reason: string): Promise<void> {
  await failImport(db, importId, [
    { row: 0, column: "(import)", reason: `the import stopped and wrote nothing: ${reason}` },
  ]);
}

/** Imports not finished that were last touched before `before` (their job may have been lost). */
export async function unfinishedImports(db: Database, before: Date) {
  return db
    .select({ id: imports.id, state: imports.state, createdAt: imports.createdAt })
    .from(imports)
    .where(
      and(
        inArray(imports.state, ["received", "validating", "computing", "saving"]),
        lt(imports.createdAt, before),
      ),
    );
}

/** Deletes the files failed imports still hold (a delete that failed when the import failed). */
export async function sweepFailedImportFiles(db: Database): Promise<number> {
  const rows = await db
    .select({ id: imports.id, fileKey: imports.fileKey })
    .from(imports)
    .where(and(eq(imports.state, "failed"), isNotNull(imports.fileKey)));
  let deleted = 0;
  for (const row of rows) {
    if (!(await deleteQuietly(row.id, row.fileKey!))) continue;
    await db.update(imports).set({ fileKey: null }).where(eq(imports.id, row.id));
    deleted++;
  }
  return deleted;
}

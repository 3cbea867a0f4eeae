import "server-only";
import { and, eq, sql } from "drizzle-orm";
import type { Database } from "@/db";
import { communities, imports, lots, planRevisions, plans } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { AppError, notFound } from "@/lib/errors";
import type { PlanInput } from "@/lib/load";
import { getObject, objectKey, putObject } from "@/lib/storage/object-store";
import type { TableCellError } from "@/lib/workbook/columns";
import { LOT_COLUMNS, validateLotTable } from "@/lib/workbook/lot-columns";
import { readTableFile, TableFileError } from "@/lib/workbook/table-io";
import { LotEquipmentSelector } from "../equipment";
import { loadProcedureOf } from "../load-procedure";
import { isFrozen, LotCalculator, recomputeLots, type LotResults } from "../recompute";

const header = (key: string) => LOT_COLUMNS.find((c) => c.key === key)!.header;

/** Stage timings of the last import, for the benchmark and the closing note. */
export interface LotImportTimings {
  readMs: number;
  validateMs: number;
  computeMs: number;
  saveMs: number;
}

/**
 * Receives a lots file: keeps the original in object storage and records the import. The file is
 * then processed by `processLotImport` (after the response), so the user can leave and come back.
 */
export async function receiveLotImport({ db, accountId, userId, communityId, fileName, data, maxBytes }: { db: Database; accountId: number; userId: number; communityId: number; fileName: string; data: Uint8Array; maxBytes: number }) {
  const [community] = await db.select({ id: communities.id }).from(communities).where(and(eq(communities.id, communityId), eq(communities.accountId, accountId)));
  if (!community) throw notFound("That community");
  if (data.byteLength > maxBytes) {
    throw new AppError("payload_too_large", `The file is ${(data.byteLength / 1048576).toFixed(1)} MB; uploads are limited to ${(maxBytes / 1048576).toFixed(0)} MB. Nothing was imported.`);
  }
  if (!/\.(csv|xlsx)$/i.test(fileName)) throw new AppError("invalid_input", `"${fileName}" is neither .csv nor .xlsx; nothing was imported.`, [{ field: "file", message: "Use a .csv or .xlsx file" }]);
  const key = objectKey({ accountId, kind: "lot-imports", fileName });
  await putObject({ key, body: data, contentType: fileName.toLowerCase().endsWith(".csv") ? "text/csv" : "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet" });
  const [{ id }] = await db.insert(imports).values({ accountId, userId, kind: "lots", communityId, fileName: fileName.slice(0, 255), fileSizeBytes: data.byteLength, fileKey: key, state: "received", progressPct: 5 }).$returningId();
  return { importId: id };
}

async function progress(db: Database, importId: number, state: "validating" | "computing" | "saving", pct: number) {
  await db.update(imports).set({ state, progressPct: pct }).where(eq(imports.id, importId));
}

/**
 * Validates the whole file, computes every lot, and upserts by lot number in one transaction, then
 * recomputes every lot of the community. Any bad cell fails the import and writes no lot.
 */
export async function processLotImport({ db, importId, data }: { db: Database; importId: number; data?: Uint8Array }): Promise<{ created: number; updated: number; timings: LotImportTimings }> {
  const [record] = await db.select().from(imports).where(eq(imports.id, importId));
  if (!record || record.kind !== "lots" || !record.communityId) throw notFound("That import");
  const { accountId, communityId, userId } = record;
  const fail = async (errors: TableCellError[]) => {
    await db.update(imports).set({ state: "failed", errors, progressPct: 100, finishedAt: new Date() }).where(eq(imports.id, importId));
    return errors;
  };
  const t0 = performance.now();
  try {
    await progress(db, importId, "validating", 10);
    const bytes = data ?? (await getObject(record.fileKey!));
    let table;
    try {
      table = await readTableFile(record.fileName, bytes);
    } catch (error) {
      if (error instanceof TableFileError) throw new ImportFailure(await fail([{ row: 1, column: "(file)", reason: error.message }]));
      throw error;
    }
    const t1 = performance.now();
    const planRows = await db
      .select({ id: plans.id, planCode: plans.planCode, revisionId: planRevisions.id, revisionNumber: planRevisions.number, input: planRevisions.input })
      .from(plans)
      .innerJoin(planRevisions, eq(planRevisions.id, plans.currentRevisionId))
      .where(eq(plans.accountId, accountId));
    const planByCode = new Map(planRows.map((p) => [p.planCode, p]));
    const result = validateLotTable(table, { planCodes: new Set(planByCode.keys()) });
    if (!result.ok) throw new ImportFailure(await fail(result.errors));

    const existing = await db
      .select({ id: lots.id, lotNumber: lots.lotNumber, status: lots.status, planId: lots.planId, facingDeg: lots.facingDeg, results: lots.results, equipmentSystemId: lots.equipmentSystemId, equipmentOverride: lots.equipmentOverride, selection: lots.selection })
      .from(lots)
      .where(eq(lots.communityId, communityId));
    const existingByNumber = new Map(existing.map((l) => [l.lotNumber.toLowerCase(), l]));
    const frozenErrors: TableCellError[] = [];
    for (const row of result.lots) {
      const lot = existingByNumber.get(row.lotNumber.toLowerCase());
      const plan = planByCode.get(row.planCode)!;
      if (lot && isFrozen(lot.status) && (lot.planId !== plan.id || Number(lot.facingDeg) !== row.facingDeg)) {
        frozenErrors.push({ row: row.rowNumber, column: lot.planId !== plan.id ? header("plan_code") : header("facing"), reason: `lot ${row.lotNumber} is frozen for permit (${lot.status.replace("_", " ")}); its plan and facing cannot change by import` });
      }
      const from = lot?.status ?? "planned";
      if (from !== row.status && (isFrozen(from) || isFrozen(row.status))) {
        frozenErrors.push({ row: row.rowNumber, column: header("status"), reason: `an import does not move a lot ${isFrozen(row.status) ? "to" : "out of"} a permit status (${from.replace("_", " ")} → ${row.status.replace("_", " ")}); do it in the lots grid, which freezes or releases the permit snapshot` });
      }
    }
    if (frozenErrors.length > 0) throw new ImportFailure(await fail(frozenErrors.sort((a, b) => a.row - b.row)));
    const t2 = performance.now();

    await progress(db, importId, "computing", 35);
    const [community] = await db.select().from(communities).where(eq(communities.id, communityId));
    const calculator = await LotCalculator.forAccount(db, accountId, new Map([[communityId, community.conditions]]));
    const selector = await LotEquipmentSelector.forAccount(db, accountId);
    const computed = result.lots.map((row) => {
      const plan = planByCode.get(row.planCode)!;
      const existingLot = existingByNumber.get(row.lotNumber.toLowerCase());
      const previous = (existingLot?.results as LotResults | null) ?? null;
      const { summary } = calculator.compute({ communityId, facingDeg: row.facingDeg, previous }, { id: plan.revisionId, number: plan.revisionNumber, input: plan.input as PlanInput });
      const frozen = existingLot ? isFrozen(existingLot.status) : false;
      const selection = frozen ? null : calculator.select(selector, communityId, summary, existingLot?.equipmentOverride ? existingLot.equipmentSystemId : null);
      return { row, plan, summary, selection, existingLot };
    });
    const t3 = performance.now();

    await progress(db, importId, "saving", 70);
    const now = new Date();
    const counts = await db.transaction(async (tx) => {
      let created = 0;
      for (let i = 0; i < computed.length; i += 1000) {
        const chunk = computed.slice(i, i + 1000);
        created += chunk.filter((c) => !existingByNumber.has(c.row.lotNumber.toLowerCase())).length;
        await tx
          .insert(lots)
          .values(
            chunk.map(({ row, plan, summary, selection, existingLot }) => ({
              accountId,
              communityId,
              lotNumber: row.lotNumber,
              address: row.address,
              planId: plan.id,
              facingDeg: String(row.facingDeg),
              optionsNote: row.optionsNote,
              status: row.status,
              plannedStart: row.plannedStart,
              results: summary,
              resultsRevisionId: plan.revisionId,
              resultsComputedAt: now,
              selection: selection ? selection.selection : (existingLot?.selection ?? null),
              equipmentSystemId: selection ? selection.systemId : (existingLot?.equipmentSystemId ?? null),
            })),
          )
          .onDuplicateKeyUpdate({
            set: {
              address: sql`VALUES(${lots.address})`,
              planId: sql`VALUES(${lots.planId})`,
              facingDeg: sql`VALUES(${lots.facingDeg})`,
              optionsNote: sql`VALUES(${lots.optionsNote})`,
              plannedStart: sql`VALUES(${lots.plannedStart})`,
              results: sql`VALUES(${lots.results})`,
              resultsRevisionId: sql`VALUES(${lots.resultsRevisionId})`,
              resultsComputedAt: sql`VALUES(${lots.resultsComputedAt})`,
              selection: sql`VALUES(${lots.selection})`,
              equipmentSystemId: sql`VALUES(${lots.equipmentSystemId})`,
              version: sql`${lots.version} + 1`,
            },
          });
        await tx.update(imports).set({ progressPct: 70 + Math.round((25 * (i + chunk.length)) / computed.length) }).where(eq(imports.id, importId));
      }
      const updated = computed.length - created;
      // Every other lot of the community is recomputed too, from the current plans and conditions.
      const inFile = new Set(computed.map((c) => c.row.lotNumber.toLowerCase()));
      const others = existing.filter((l) => !inFile.has(l.lotNumber.toLowerCase())).map((l) => l.id);
      if (others.length > 0) await recomputeLots(tx, { accountId, lotIds: others });
      // The file's lots were computed before this transaction: if an admin changed the account's
      // procedure meanwhile, they are computed again by the one in force now.
      if ((await loadProcedureOf(tx, accountId)) !== calculator.procedure) {
        const fileLots = await tx.select({ id: lots.id, lotNumber: lots.lotNumber }).from(lots).where(eq(lots.communityId, communityId));
        await recomputeLots(tx, { accountId, lotIds: fileLots.filter((l) => inFile.has(l.lotNumber.toLowerCase())).map((l) => l.id) });
      }
      await recordAudit(tx, { accountId, userId, action: "lot_import", entityType: "community", entityId: communityId, summary: `Imported ${record.fileName} into ${community.name}: ${created} lots created, ${updated} updated`, after: { importId, created, updated } });
      await tx.update(imports).set({ state: "succeeded", createdCount: created, updatedCount: updated, errors: [], progressPct: 100, finishedAt: new Date() }).where(eq(imports.id, importId));
      return { created, updated };
    });
    const t4 = performance.now();
    return { ...counts, timings: { readMs: t1 - t0, validateMs: t2 - t1, computeMs: t3 - t2, saveMs: t4 - t3 } };
  } catch (error) {
    if (error instanceof ImportFailure) throw new AppError("invalid_input", `${error.errors.length} problem(s) in the file; nothing was imported.`, error.errors.map((e) => ({ field: `row ${e.row}, ${e.column}`, row: e.row, column: e.column, message: e.reason })));
    await fail([{ row: 0, column: "(import)", reason: `the import stopped on a server error and wrote nothing: ${(error as Error).message}` }]);
    throw error;
  }
}

class ImportFailure extends Error {
  constructor(readonly errors: TableCellError[]) {
    super("import failed");
  }
}

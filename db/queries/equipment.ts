import "server-only";
import { and, asc, eq } from "drizzle-orm";
import type { Database } from "@/db";
import { accounts, equipmentSystems, lots } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { sizingLimitsSchema } from "@/lib/equipment";
import { AppError, notFound } from "@/lib/errors";
import { checkCatalogImport } from "@/lib/imports/kinds";
import {
  EQUIPMENT_COLUMNS,
  equipmentEntryToRow,
  validateEquipmentTable,
  type EquipmentCatalogEntry,
} from "@/lib/workbook/equipment-columns";
import type { ImportSteps } from "./imports";
import { catalogEntryFromRow, rowValuesFromEntry, sizingLimitsOf } from "../equipment";
import { isFrozen, recomputeLots } from "../recompute";

export async function listCatalog({ db, accountId }: { db: Database; accountId: number }) {
  const rows = await db
    .select()
    .from(equipmentSystems)
    .where(eq(equipmentSystems.accountId, accountId))
    .orderBy(asc(equipmentSystems.systemCode));
  return rows.map((r) => ({
    id: r.id,
    version: r.version,
    cells: equipmentEntryToRow(catalogEntryFromRow(r)),
  }));
}

/**
 * The catalog importer: the file checked as a whole (every bad cell reported, nothing written
 * unless all are good), then systems created or updated by system code in the save transaction
 * (the catalog read under lock there), and every lot's selection recomputed (frozen lots keep
 * theirs). Systems not in the file are kept.
 */
export const catalogImportSteps: ImportSteps<undefined, EquipmentCatalogEntry[], EquipmentCatalogEntry[]> = {
  loadContext: async () => undefined,
  check: (table) => checkCatalogImport(table),
  compute: async (systems) => systems,
  async save(tx, record, systems) {
    const { accountId, userId } = record;
    const existing = await tx
      .select()
      .from(equipmentSystems)
      .where(eq(equipmentSystems.accountId, accountId))
      .for("update");
    const byCode = new Map(existing.map((e) => [e.systemCode.toLowerCase(), e]));
    let created = 0;
    let updated = 0;
    for (const entry of systems) {
      const values = rowValuesFromEntry(entry, accountId);
      const found = byCode.get(entry.id.toLowerCase());
      if (found) {
        await tx
          .update(equipmentSystems)
          .set({ ...values, systemCode: found.systemCode, version: found.version + 1 })
          .where(eq(equipmentSystems.id, found.id));
        updated++;
      } else {
        await tx.insert(equipmentSystems).values(values);
        created++;
      }
    }
    const recomputed = await recomputeLots(tx, { accountId });
    await recordAudit(tx, {
      accountId,
      userId,
      action: "equipment_import",
      entityType: "equipment",
      entityId: null,
      summary: `Imported the equipment catalog ${record.fileName}: ${created} systems created, ${updated} updated; ${recomputed.recomputed} lots reselected`,
      after: { importId: record.id, created, updated },
    });
    return { created, updated };
  },
};

/** Edits one system's cells (as the catalog table reads them) with a version check, then reselects every lot. */
export async function editCatalogSystem({
  db,
  accountId,
  userId,
  systemId,
  version,
  cells,
}: {
  db: Database;
  accountId: number;
  userId: number;
  systemId: number;
  version: number;
  cells: Record<string, string | number | null>;
}) {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(equipmentSystems)
      .where(and(eq(equipmentSystems.id, systemId), eq(equipmentSystems.accountId, accountId)))
      .for("update");
    if (!row) throw notFound("That equipment system");
    if (row.version !== version)
      throw new AppError(
        "conflict",
        `${row.systemCode} was changed by someone else since you loaded it. Nothing was saved; reload to see it.`,
      );
    const before = equipmentEntryToRow(catalogEntryFromRow(row));
    const merged = { ...before, ...cells };
    const table = {
      headers: EQUIPMENT_COLUMNS.map((c) => c.header),
      rows: [
        {
          rowNumber: 2,
          cells: EQUIPMENT_COLUMNS.map((c) =>
            merged[c.key] === null || merged[c.key] === undefined ? "" : String(merged[c.key]),
          ),
        },
      ],
    };
    const result = validateEquipmentTable(table);
    if (!result.ok)
      throw new AppError(
        "invalid_input",
        `${row.systemCode}: ${result.errors.map((e) => `${e.column} ${e.reason}`).join("; ")}. Nothing was saved.`,
        result.errors.map((e) => ({
          field: EQUIPMENT_COLUMNS.find((c) => c.header === e.column)?.key ?? e.column,
          column: e.column,
          message: e.reason,
        })),
      );
    const entry = result.systems[0];
    const clash =
      entry.id.toLowerCase() !== row.systemCode.toLowerCase()
        ? (
            await tx
              .select({ id: equipmentSystems.id })
              .from(equipmentSystems)
              .where(
                and(eq(equipmentSystems.accountId, accountId), eq(equipmentSystems.systemCode, entry.id)),
              )
          )[0]
        : undefined;
    if (clash)
      throw new AppError("conflict", `System code ${entry.id} is already used.`, [
        { field: "system_code", message: "Already used" },
      ]);
    await tx
      .update(equipmentSystems)
      .set({ ...rowValuesFromEntry(entry, accountId), version: row.version + 1 })
      .where(eq(equipmentSystems.id, systemId));
    const recomputed = await recomputeLots(tx, { accountId });
    await recordAudit(tx, {
      accountId,
      userId,
      action: "equipment_edit",
      entityType: "equipment",
      entityId: systemId,
      summary: `Edited equipment system ${entry.id}`,
      before,
      after: equipmentEntryToRow(entry),
    });
    return { version: row.version + 1, lotsReselected: recomputed.recomputed };
  });
}

export async function getSizingLimits({ db, accountId }: { db: Database; accountId: number }) {
  const [account] = await db
    .select({ limits: accounts.sizingLimits })
    .from(accounts)
    .where(eq(accounts.id, accountId));
  return {
    limits: await sizingLimitsOf(db, accountId),
    custom: account?.limits !== null && account?.limits !== undefined,
  };
}

/** An admin sets the account's sizing limits; every lot is reselected with them. */
export async function setSizingLimits({
  db,
  accountId,
  userId,
  limits,
}: {
  db: Database;
  accountId: number;
  userId: number;
  limits: unknown;
}) {
  const parsed = sizingLimitsSchema.safeParse(limits);
  if (!parsed.success)
    throw new AppError(
      "invalid_input",
      "Some sizing limits are not valid; nothing was saved.",
      parsed.error.issues.map((i) => ({ field: i.path.join("."), message: i.message })),
    );
  return db.transaction(async (tx) => {
    const before = await sizingLimitsOf(tx, accountId);
    await tx.update(accounts).set({ sizingLimits: parsed.data }).where(eq(accounts.id, accountId));
    const recomputed = await recomputeLots(tx, { accountId });
    await recordAudit(tx, {
      accountId,
      userId,
      action: "sizing_limits",
      entityType: "account",
      entityId: accountId,
      summary: `Changed the equipment sizing limits; ${recomputed.recomputed} lots reselected`,
      before,
      after: parsed.data,
    });
    return { limits: parsed.data, lotsReselected: recomputed.recomputed };
  });
}

/** A purchaser picks a lot's system (kept through recomputes), or clears the pick to use the best fit again. */
export async function overrideLotSystem({
  db,
  accountId,
  userId,
  lotId,
  version,
  systemId,
}: {
  db: Database;
  accountId: number;
  userId: number;
  lotId: number;
  version: number;
  systemId: number | null;
}) {
  return db.transaction(async (tx) => {
    const [lot] = await tx
      .select()
      .from(lots)
      .where(and(eq(lots.id, lotId), eq(lots.accountId, accountId)))
      .for("update");
    if (!lot) throw notFound("That lot");
    if (lot.version !== version)
      throw new AppError(
        "conflict",
        `Lot ${lot.lotNumber} was changed by someone else since you loaded it. Nothing was saved; reload to see it.`,
      );
    if (isFrozen(lot.status))
      throw new AppError(
        "conflict",
        `Lot ${lot.lotNumber} is frozen for permit; its equipment is part of the permit copy. Move it back to planned first.`,
      );
    let code: string | null = null;
    if (systemId !== null) {
      const [system] = await tx
        .select()
        .from(equipmentSystems)
        .where(and(eq(equipmentSystems.id, systemId), eq(equipmentSystems.accountId, accountId)));
      if (!system) throw notFound("That equipment system");
      code = system.systemCode;
    }
    await tx
      .update(lots)
      .set({ equipmentSystemId: systemId, equipmentOverride: systemId !== null, version: lot.version + 1 })
      .where(eq(lots.id, lotId));
    await recomputeLots(tx, { accountId, lotIds: [lotId] });
    await recordAudit(tx, {
      accountId,
      userId,
      action: "lot_equipment",
      entityType: "lot",
      entityId: lotId,
      summary: systemId
        ? `Lot ${lot.lotNumber}: system set to ${code} by hand`
        : `Lot ${lot.lotNumber}: back to the best-fitting system`,
      before: { equipmentSystemId: lot.equipmentSystemId, override: lot.equipmentOverride },
      after: { equipmentSystemId: systemId, override: systemId !== null },
    });
    return { ok: true };
  });
}

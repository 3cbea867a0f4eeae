import "server-only";
import ExcelJS from "exceljs";
import { and, asc, eq } from "drizzle-orm";
import type { Database } from "@/db";
import { catalogEntryFromRow, sizingLimitsOf, type LotSelection } from "@/db/equipment";
import { communities, equipmentSystems, lots } from "@/db/schema";
import type { SizingLimits } from "@/lib/equipment";
import { notFound } from "@/lib/errors";
import {
  buildEquipmentSchedule,
  equipmentScheduleTables,
  type EquipmentSchedule,
  type ScheduleCell,
  type ScheduleTable,
} from "@/lib/reports/equipment-schedule";
import { writeCsv } from "@/lib/workbook/table-io";
import { LOAD_PROCEDURE_LABELS, LOAD_PROCEDURES, type LoadProcedure } from "@/lib/load";
import { loadProcedureOf } from "../load-procedure";
import { procedureOfStored, type PermitSnapshot } from "../recompute";

/** Shown for a lot that has no system yet because the selection has not run (not a misfit). */
export const NOT_SELECTED_YET = "not selected yet: the equipment selection has not run for this lot";

/**
 * The system and selection a lot is counted and reported with: a lot frozen for permit keeps the
 * ones of its permit snapshot (as the lots grid shows them); the others their current ones.
 */
export function lotEquipment(lot: {
  equipmentSystemId: number | null;
  selection: unknown;
  permitSnapshot: unknown;
}): { systemId: number | null; selection: LotSelection | null } {
  const snapshot = lot.permitSnapshot as PermitSnapshot | null;
  // Snapshots taken before selections existed carry no equipment: the lot's own columns then.
  if (snapshot && snapshot.equipmentSystemId !== undefined)
    return { systemId: snapshot.equipmentSystemId, selection: snapshot.selection ?? null };
  return { systemId: lot.equipmentSystemId, selection: (lot.selection as LotSelection | null) ?? null };
}

/** The sizing limits in words, as every schedule and report states them. */
export const SIZING_LIMIT_LABELS: Record<keyof SizingLimits, string> = {
  coolingMinPct: "Cooling capacity, least % of the cooling total load",
  coolingMaxPct: "Cooling capacity, most % of the cooling total load",
  heatPumpCoolingMaxPct:
    "Heat pump cooling capacity where the heating load is the larger, most % of the cooling total load",
  heatingMinPct: "Heating capacity, least % of the heating load",
  heatingMaxPct: "Furnace output, most % of the heating load",
};

export interface ScheduleLotLine {
  lotId: number;
  lotNumber: string;
  status: string;
  plannedStart: string | null;
  systemCode: string | null;
  overridden: boolean;
  /** Why the lot has no system (the selection's reason, or not selected yet). */
  reason: string | null;
  /** The procedure of the loads the system was chosen for (a frozen lot's snapshot's); null before any loads. */
  procedure: LoadProcedure | null;
}

export interface CommunityEquipmentSchedule {
  community: { id: number; name: string };
  schedule: EquipmentSchedule;
  limits: SizingLimits;
  lots: ScheduleLotLine[];
  /** The account's procedure now, and how many lots were sized by each procedure. */
  accountProcedure: LoadProcedure;
  procedures: { procedure: LoadProcedure; label: string; lotCount: number }[];
}

/** How many lots were sized by each procedure (only the procedures that occur). */
function procedureCounts(lines: readonly ScheduleLotLine[]) {
  return LOAD_PROCEDURES.map((procedure) => ({
    procedure,
    label: LOAD_PROCEDURE_LABELS[procedure],
    lotCount: lines.filter((l) => l.procedure === procedure).length,
  })).filter((p) => p.lotCount > 0);
}

/**
 * The equipment schedule of one community: each lot counted under its chosen system
 * (lots.equipmentSystemId — the selection's best fit or a purchaser's override), by month of
 * planned start, with the account's sizing limits stated. A lot with no system is listed with
 * the selection's reason, or "not selected yet" when no selection was stored.
 */
export async function communityEquipmentSchedule({
  db,
  accountId,
  communityId,
}: {
  db: Database;
  accountId: number;
  communityId: number;
}): Promise<CommunityEquipmentSchedule> {
  const [community] = await db
    .select({ id: communities.id, name: communities.name })
    .from(communities)
    .where(and(eq(communities.id, communityId), eq(communities.accountId, accountId)));
  if (!community) throw notFound("That community");
  const systemRows = await db
    .select()
    .from(equipmentSystems)
    .where(eq(equipmentSystems.accountId, accountId))
    .orderBy(asc(equipmentSystems.systemCode));
  const codeById = new Map(systemRows.map((row) => [row.id, row.systemCode]));
  const lotRows = await db
    .select({
      id: lots.id,
      lotNumber: lots.lotNumber,
      status: lots.status,
      plannedStart: lots.plannedStart,
      equipmentSystemId: lots.equipmentSystemId,
      equipmentOverride: lots.equipmentOverride,
      selection: lots.selection,
      permitSnapshot: lots.permitSnapshot,
      results: lots.results,
    })
    .from(lots)
    .where(and(eq(lots.accountId, accountId), eq(lots.communityId, communityId)))
    .orderBy(asc(lots.lotNumber));

  const lines: ScheduleLotLine[] = lotRows.map((lot) => {
    const { systemId, selection } = lotEquipment(lot);
    const systemCode = systemId === null ? null : (codeById.get(systemId) ?? null);
    const reason =
      systemCode !== null
        ? null
        : selection
          ? (selection.noFitReason ?? "no system fits within the sizing limits")
          : NOT_SELECTED_YET;
    const sizedFrom =
      (lot.permitSnapshot as PermitSnapshot | null) ?? (lot.results as { procedure?: unknown } | null);
    return {
      lotId: lot.id,
      lotNumber: lot.lotNumber,
      status: lot.status,
      plannedStart: lot.plannedStart,
      systemCode,
      overridden: lot.equipmentOverride,
      reason,
      procedure: sizedFrom ? procedureOfStored(sizedFrom) : null,
    };
  });

  const schedule = buildEquipmentSchedule({
    systems: systemRows.map(catalogEntryFromRow),
    lots: lines.map((line) => ({
      communityName: community.name,
      lotNumber: line.lotNumber,
      systemCode: line.systemCode,
      noFitReason: line.reason,
      plannedStart: line.plannedStart,
    })),
  });
  return {
    community,
    schedule,
    limits: await sizingLimitsOf(db, accountId),
    lots: lines,
    accountProcedure: await loadProcedureOf(db, accountId),
    procedures: procedureCounts(lines),
  };
}

/** The schedule's tables, with the sizing limits used added to the notes. */
export function scheduleTablesWithLimits(result: CommunityEquipmentSchedule): ScheduleTable[] {
  const tables = equipmentScheduleTables(result.schedule);
  const notes = tables.find((table) => table.name === "notes");
  if (notes) {
    const limitRows: ScheduleCell[][] = (Object.keys(SIZING_LIMIT_LABELS) as (keyof SizingLimits)[]).map(
      (key) => [`Sizing limit used: ${SIZING_LIMIT_LABELS[key]}`, result.limits[key]],
    );
    const procedureRows: ScheduleCell[][] = [
      ["Load procedure of the account", LOAD_PROCEDURE_LABELS[result.accountProcedure]],
      ...result.procedures.map((p): ScheduleCell[] => [`Lots sized for loads by ${p.label}`, p.lotCount]),
    ];
    notes.rows.splice(
      notes.rows.length - 1,
      0,
      ["Community", result.community.name],
      ...procedureRows,
      ...limitRows,
      ["Generated", new Date().toISOString()],
    );
  }
  return tables;
}

export interface GeneratedFile {
  fileName: string;
  contentType: string;
  body: Uint8Array;
}

const XLSX_TYPE = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";

/** Several tables as the sheets of one workbook: numbers as numbers, text always a plain string cell, never a formula. */
export async function writeTablesXlsx(tables: readonly ScheduleTable[]): Promise<Uint8Array> {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = "Platload";
  for (const table of tables) {
    const sheet = workbook.addWorksheet(table.sheetName.slice(0, 31), {
      views: [{ state: "frozen", ySplit: 1 }],
    });
    sheet.addRow([...table.headers]).font = { bold: true };
    for (const row of table.rows) {
      const added = sheet.addRow([]);
      row.forEach((cell, index) => {
        if (cell === null || cell === "") return;
        // A JS string becomes a string cell; exceljs writes a formula only for { formula }.
        added.getCell(index + 1).value = typeof cell === "number" ? cell : String(cell);
      });
    }
    table.headers.forEach(
      (text, index) => (sheet.getColumn(index + 1).width = Math.min(48, Math.max(10, text.length + 2))),
    );
  }
  return new Uint8Array((await workbook.xlsx.writeBuffer()) as ArrayBuffer);
}

/** Several tables in one CSV: each headed by a line with its title, a blank line between; formula-like text escaped by writeCsv. */
export function writeTablesCsv(tables: readonly ScheduleTable[]): string {
  return (
    "\uFEFF" +
    tables
      .map((table) => {
        const width = table.headers.length;
        const title = writeCsv([table.sheetName, ...Array.from({ length: width - 1 }, () => "")], [], {
          bom: false,
        });
        return `${title}\r\n${writeCsv(table.headers, table.rows, { bom: false })}`;
      })
      .join("\r\n\r\n")
  );
}

const safeFilePart = (text: string) => text.replace(/[^A-Za-z0-9._-]+/g, "-").replace(/^-+|-+$/g, "");

/** The equipment schedule of a community as an XLSX (one sheet per table) or a CSV (tables one after another). */
export async function equipmentScheduleFile({
  db,
  accountId,
  communityId,
  format,
}: {
  db: Database;
  accountId: number;
  communityId: number;
  format: "xlsx" | "csv";
}): Promise<GeneratedFile & { result: CommunityEquipmentSchedule }> {
  const result = await communityEquipmentSchedule({ db, accountId, communityId });
  const tables = scheduleTablesWithLimits(result);
  const fileName = `equipment-schedule-${safeFilePart(result.community.name)}-${new Date().toISOString().slice(0, 10)}.${format}`;
  if (format === "csv")
    return {
      fileName,
      contentType: "text/csv; charset=utf-8",
      body: new TextEncoder().encode(writeTablesCsv(tables)),
      result,
    };
  return { fileName, contentType: XLSX_TYPE, body: await writeTablesXlsx(tables), result };
}

export { XLSX_TYPE, safeFilePart };

/**
 * The account-wide equipment schedule for purchasing: every community's lots counted under their
 * systems, by community and by month of planned start, with totals and cost.
 */
export async function accountEquipmentScheduleFile({
  db,
  accountId,
  format,
}: {
  db: Database;
  accountId: number;
  format: "xlsx" | "csv";
}): Promise<GeneratedFile> {
  const all = await db
    .select({ id: communities.id })
    .from(communities)
    .where(eq(communities.accountId, accountId))
    .orderBy(asc(communities.name));
  const perCommunity = await Promise.all(
    all.map((c) => communityEquipmentSchedule({ db, accountId, communityId: c.id })),
  );
  const systemRows = await db
    .select()
    .from(equipmentSystems)
    .where(eq(equipmentSystems.accountId, accountId))
    .orderBy(asc(equipmentSystems.systemCode));
  const schedule = buildEquipmentSchedule({
    systems: systemRows.map(catalogEntryFromRow),
    lots: perCommunity.flatMap((r) =>
      r.lots.map((line) => ({
        communityName: r.community.name,
        lotNumber: line.lotNumber,
        systemCode: line.systemCode,
        noFitReason: line.reason,
        plannedStart: line.plannedStart,
      })),
    ),
  });
  const allLots = perCommunity.flatMap((r) => r.lots);
  const tables = scheduleTablesWithLimits({
    community: { id: 0, name: "All communities" },
    schedule,
    limits: await sizingLimitsOf(db, accountId),
    lots: allLots,
    accountProcedure: await loadProcedureOf(db, accountId),
    procedures: procedureCounts(allLots),
  });
  const fileName = `equipment-schedule-all-communities-${new Date().toISOString().slice(0, 10)}.${format}`;
  if (format === "csv")
    return {
      fileName,
      contentType: "text/csv; charset=utf-8",
      body: new TextEncoder().encode(writeTablesCsv(tables)),
    };
  return { fileName, contentType: XLSX_TYPE, body: await writeTablesXlsx(tables) };
}

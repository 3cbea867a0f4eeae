/**
 * The pure check of each importer: a table in, the rows to write or every problem out. The lots
 * check also takes what it must know of the account (its plan codes, the community's lots).
 */
import type { RawTable, TableCellError } from "@/lib/workbook/columns";
import {
  EQUIPMENT_COLUMNS,
  validateEquipmentTable,
  type EquipmentCatalogEntry,
} from "@/lib/workbook/equipment-columns";
import {
  LOT_COLUMNS,
  validateLotTable,
  type LotStatusValue,
  type ValidLotRow,
} from "@/lib/workbook/lot-columns";
import { PLAN_COLUMNS, validatePlanTable, type ValidPlanRow } from "@/lib/workbook/plan-columns";
import { readImportFile, sortProblems, withSheetHint, type ImportKind, type StageResult } from "./pipeline";

/** The plan rows to write, each with its cells as entered (formulas kept) to keep with its revision. */
export function checkPlanImport(table: RawTable): StageResult<ValidPlanRow[]> {
  const result = validatePlanTable(table);
  return result.ok
    ? { ok: true, value: result.plans }
    : { ok: false, errors: withSheetHint(table, PLAN_COLUMNS, result.errors) };
}

export function checkCatalogImport(table: RawTable): StageResult<EquipmentCatalogEntry[]> {
  const result = validateEquipmentTable(table);
  return result.ok
    ? { ok: true, value: result.systems }
    : { ok: false, errors: withSheetHint(table, EQUIPMENT_COLUMNS, result.errors) };
}

/** What the lots check knows of a community's lots already there. */
export interface ExistingLot {
  status: LotStatusValue;
  planId: number | null;
  facingDeg: number;
}

export interface LotImportContext {
  /** Plan code → plan id, of this account. */
  planIds: ReadonlyMap<string, number>;
  /** Lower-cased lot number → the lot as it is. */
  existing: ReadonlyMap<string, ExistingLot>;
}

const FROZEN: readonly LotStatusValue[] = ["permit_submitted", "permitted", "built"];
const lotHeader = (key: string) => LOT_COLUMNS.find((c) => c.key === key)!.header;

/**
 * The lots file's cells, then what an import may not do to lots already there: change the plan
 * or facing of a lot frozen for permit, or move a lot into or out of a permit status.
 */
export function checkLotImport(table: RawTable, context: LotImportContext): StageResult<ValidLotRow[]> {
  const result = validateLotTable(table, { planCodes: new Set(context.planIds.keys()) });
  if (!result.ok) return { ok: false, errors: withSheetHint(table, LOT_COLUMNS, result.errors) };
  const errors: TableCellError[] = [];
  for (const row of result.lots) {
    const lot = context.existing.get(row.lotNumber.toLowerCase());
    const planId = context.planIds.get(row.planCode);
    if (lot && FROZEN.includes(lot.status) && (lot.planId !== planId || lot.facingDeg !== row.facingDeg)) {
      errors.push({
        row: row.rowNumber,
        column: lot.planId !== planId ? lotHeader("plan_code") : lotHeader("facing"),
        reason: `lot ${row.lotNumber} is frozen for permit (${lot.status.replace("_", " ")}); its plan and facing cannot change by import`,
      });
    }
    const from = lot?.status ?? "planned";
    if (from !== row.status && (FROZEN.includes(from) || FROZEN.includes(row.status))) {
      errors.push({
        row: row.rowNumber,
        column: lotHeader("status"),
        reason: `an import does not move a lot ${FROZEN.includes(row.status) ? "to" : "out of"} a permit status (${from.replace("_", " ")} → ${row.status.replace("_", " ")}); do it in the lots grid, which freezes or releases the permit snapshot`,
      });
    }
  }
  return errors.length > 0 ? { ok: false, errors: sortProblems(errors) } : { ok: true, value: result.lots };
}

export type ImportContext = { plans: undefined; equipment: undefined; lots: LotImportContext };

/**
 * Read and check in one call, for any importer: what the runner does before it computes and
 * saves, and what the fuzz tests drive with generated files.
 */
export async function readAndCheck<K extends ImportKind>(
  kind: K,
  fileName: string,
  data: Uint8Array,
  context: ImportContext[K],
): Promise<StageResult<unknown>> {
  const read = await readImportFile(fileName, data);
  if (!read.ok) return read;
  if (kind === "plans") return checkPlanImport(read.value);
  if (kind === "equipment") return checkCatalogImport(read.value);
  return checkLotImport(read.value, context as LotImportContext);
}

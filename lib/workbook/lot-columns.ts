/**
 * The lots table of a community (import template, lots grid, exports): one row per lot, keyed by
 * lot number. Plan codes must name a plan of the same account; facings are read by ./facing.
 */
import { readTable, type ColumnDef, type RawTable, type TableCellError } from "./columns";
import { parseFacing } from "./facing";

export const LOT_STATUSES = ["planned", "permit_submitted", "permitted", "built"] as const;
export type LotStatusValue = (typeof LOT_STATUSES)[number];

export const LOT_COLUMNS: readonly ColumnDef[] = [
  {
    key: "lot_number",
    header: "Lot",
    group: "Lot",
    value: { type: "text", maxLength: 40 },
    required: true,
    meaning: "The lot number, unique in the community; an import updates the lot with the same number.",
    example: "014",
  },
  {
    key: "address",
    header: "Address",
    group: "Lot",
    value: { type: "text", maxLength: 200 },
    required: false,
    meaning: "Street address of the lot.",
    example: "212 Saltgrass Way",
  },
  {
    key: "plan_code",
    header: "Plan code",
    group: "Lot",
    value: { type: "text", maxLength: 40 },
    required: true,
    meaning: "Code of the plan model built on the lot (from the plan library).",
    example: "AS-1450",
  },
  {
    key: "facing",
    header: "Facing",
    group: "Lot",
    value: { type: "text", maxLength: 20 },
    required: true,
    meaning:
      "Where the front door faces: a compass point (N, NE, … NNW) or degrees from north, 0 to 360 clockwise (no negative degrees: 45° west of north is 315).",
    example: "SE",
  },
  {
    key: "options_note",
    header: "Options note",
    group: "Lot",
    value: { type: "text", maxLength: 300 },
    required: false,
    meaning: "Options on this lot worth noting (informational).",
    example: "Extended patio",
  },
  {
    key: "status",
    header: "Status",
    group: "Lot",
    value: { type: "enum", choices: LOT_STATUSES },
    required: false,
    defaultValue: "planned",
    meaning:
      "planned, permit_submitted, permitted or built. An import never moves a lot to or from a permit status; use the lots grid.",
    example: "planned",
  },
  {
    key: "planned_start",
    header: "Planned start",
    group: "Lot",
    value: {
      type: "text",
      maxLength: 10,
      pattern: /^\d{4}-\d{2}-\d{2}$/,
      patternHint: "must be a date written YYYY-MM-DD",
    },
    required: false,
    meaning: "Planned construction start (YYYY-MM-DD), for the equipment schedule by month.",
    example: "2027-03-15",
  },
];

export interface ValidLotRow {
  rowNumber: number;
  lotNumber: string;
  address: string;
  planCode: string;
  facingDeg: number;
  optionsNote: string;
  status: LotStatusValue;
  plannedStart: string | null;
}

export type LotTableResult = { ok: true; lots: ValidLotRow[] } | { ok: false; errors: TableCellError[] };

const header = (key: string) => LOT_COLUMNS.find((c) => c.key === key)!.header;

/**
 * Validates a whole lots table and reports every bad cell: missing or unknown columns, blank
 * required cells, unknown plan codes (of this account), bad facings, bad dates and duplicated lot
 * numbers. A good table gives the lots.
 */
export function validateLotTable(
  table: RawTable,
  { planCodes }: { planCodes: ReadonlySet<string> },
): LotTableResult {
  const read = readTable(table, LOT_COLUMNS);
  const errors: TableCellError[] = [...read.errors];
  const lots: ValidLotRow[] = [];
  const seen = new Map<string, number>();
  const codes = new Map([...planCodes].map((c) => [c.toLowerCase(), c]));
  const badRows = new Set(read.errors.map((e) => e.row));
  for (const row of read.rows) {
    const lotNumber = String(row.values.lot_number ?? "").trim();
    const rowErrors: TableCellError[] = [];
    if (lotNumber) {
      const first = seen.get(lotNumber.toLowerCase());
      if (first !== undefined)
        rowErrors.push({
          row: row.rowNumber,
          column: header("lot_number"),
          reason: `lot ${lotNumber} is already on row ${first}; lot numbers must be unique`,
        });
      else seen.set(lotNumber.toLowerCase(), row.rowNumber);
    }
    const planCode = String(row.values.plan_code ?? "").trim();
    const knownCode = codes.get(planCode.toLowerCase());
    if (planCode && !knownCode)
      rowErrors.push({
        row: row.rowNumber,
        column: header("plan_code"),
        reason: `no plan model with code "${planCode}" in this account's plan library`,
      });
    // A blank facing is already reported as a missing required cell.
    const facingText = (row.entered.facing ?? "").trim();
    const facing = parseFacing(facingText);
    if (!facing.ok && facingText !== "")
      rowErrors.push({ row: row.rowNumber, column: header("facing"), reason: facing.reason });
    errors.push(...rowErrors);
    if (rowErrors.length > 0 || badRows.has(row.rowNumber) || !facing.ok || !knownCode) continue;
    const date = row.values.planned_start ? String(row.values.planned_start) : null;
    if (date && Number.isNaN(Date.parse(`${date}T00:00:00Z`))) {
      errors.push({
        row: row.rowNumber,
        column: header("planned_start"),
        reason: `${date} is not a calendar date`,
      });
      continue;
    }
    lots.push({
      rowNumber: row.rowNumber,
      lotNumber,
      address: String(row.values.address ?? ""),
      planCode: knownCode,
      facingDeg: facing.deg,
      optionsNote: String(row.values.options_note ?? ""),
      status: (row.values.status as LotStatusValue | undefined) ?? "planned",
      plannedStart: date,
    });
  }
  if (read.rows.length === 0 && errors.length === 0)
    errors.push({ row: 2, column: header("lot_number"), reason: "the table has no lot rows" });
  errors.sort((a, b) => a.row - b.row);
  return errors.length > 0 ? { ok: false, errors } : { ok: true, lots };
}

export const LOT_HEADERS: readonly string[] = LOT_COLUMNS.map((c) => c.header);

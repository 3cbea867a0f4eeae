/**
 * The equipment catalog's flat column list: one row per system the builder buys (air
 * conditioner with furnace, heat pump, heat pump with backup heat, furnace alone). One source
 * of truth for the catalog grid, its CSV/XLSX import and export, templates/ and
 * templates/EQUIPMENT.md.
 *
 * A row is read with the generic `readTable` (units, formulas, ranges), checked across its
 * cells (sensible above total, a heat pump without its 47 °F output, cooling on a furnace…),
 * and then run through lib/equipment's `catalogSystemSchema`, whose issues are mapped back to
 * the row's columns. Every bad cell is reported; a table with any bad cell gives no systems.
 *
 * Capacities are the builder's data-sheet figures at design conditions, Btu/h. A heat pump's
 * heating output depends on the outdoor temperature: the catalog keeps the two rating points
 * (47 °F and 17 °F) and `heatPumpOutputAtF` gives the output at a community's heating design
 * dry bulb.
 */
import {
  SYSTEM_TYPES,
  catalogSystemSchema,
  type CatalogSystemInput,
  type SystemType,
} from "../equipment/catalog";
import {
  describeColumnValue,
  matchColumn,
  readTable,
  type ColumnDef,
  type ColumnValueType,
  type RawTable,
  type TableCellError,
} from "./columns";
import { readCsv, writeCsv, writeXlsx } from "./table-io";
import { QUANTITY_KIND_INFO, type QuantityKind } from "./units";

export const EQUIPMENT_COLUMN_GROUPS = [
  "System",
  "Model numbers",
  "Cooling",
  "Heating",
  "Efficiency",
  "Purchasing",
] as const;
export type EquipmentColumnGroup = (typeof EQUIPMENT_COLUMN_GROUPS)[number];

/** An equipment-catalog column (the generic column shape with our group names). */
export interface EquipmentColumnDef extends ColumnDef {
  group: EquipmentColumnGroup;
}

const num = (
  quantity: QuantityKind,
  extra: { minimum?: number; maximum?: number; integer?: boolean } = {},
): ColumnValueType => ({
  type: "number",
  quantity,
  ...extra,
});
const modelText: ColumnValueType = { type: "text", maxLength: 60 };
/** The same ceiling as lib/equipment's capacity fields. */
const MAX_CAPACITY_BTUH = 1_000_000;

/** The equipment catalog's columns, in file order. */
export const EQUIPMENT_COLUMNS: readonly EquipmentColumnDef[] = [
  {
    key: "system_code",
    header: "System code",
    group: "System",
    value: {
      type: "text",
      maxLength: 40,
      pattern: /^[A-Za-z0-9][A-Za-z0-9._-]*$/,
      patternHint: "must start with a letter or digit and use only letters, digits, . _ -",
    },
    required: true,
    meaning:
      "The builder's own code for the system; unique in the catalog. Lots and schedules refer to it; an import updates the system with the same code.",
    example: "AC30-F60",
  },
  {
    key: "system_type",
    header: "System type",
    group: "System",
    value: { type: "enum", choices: SYSTEM_TYPES },
    required: true,
    meaning:
      "ac-furnace: air conditioner with a furnace; heat-pump: heat pump alone; heat-pump-backup: heat pump with backup heat (strips or a furnace); furnace: furnace alone, no cooling.",
    example: "ac-furnace",
  },
  {
    key: "outdoor_model",
    header: "Outdoor unit model",
    group: "Model numbers",
    value: modelText,
    required: false,
    meaning: "Model number of the condenser or heat pump outdoor unit (required for every type that cools).",
    example: "NV-C30S",
  },
  {
    key: "indoor_model",
    header: "Indoor coil or air handler model",
    group: "Model numbers",
    value: modelText,
    required: false,
    meaning: "Model number of the evaporator coil or air handler matched with the outdoor unit.",
    example: "NV-E30B",
  },
  {
    key: "furnace_model",
    header: "Furnace model",
    group: "Model numbers",
    value: modelText,
    required: false,
    meaning: "Model number of the furnace (required for ac-furnace and furnace).",
    example: "NV-G60M",
  },
  {
    key: "nominal_tons",
    header: "Nominal tons",
    group: "Cooling",
    value: num("ratio", { minimum: 0.5, maximum: 50 }),
    required: false,
    meaning: "The nominal size as sold (1 ton = 12,000 Btu/h by definition); blank for a furnace alone.",
    example: "2.5",
  },
  {
    key: "cooling_total_btuh",
    header: "Cooling total at design (Btu/h)",
    group: "Cooling",
    value: num("btuh", { minimum: 0, maximum: MAX_CAPACITY_BTUH }),
    required: false,
    meaning:
      "Total (sensible + latent) cooling capacity at the design conditions, from the matched system's data sheet; blank for a furnace alone.",
    example: "28,800",
  },
  {
    key: "cooling_sensible_btuh",
    header: "Cooling sensible at design (Btu/h)",
    group: "Cooling",
    value: num("btuh", { minimum: 0, maximum: MAX_CAPACITY_BTUH }),
    required: false,
    meaning:
      "The sensible part of the cooling capacity at the same conditions (at most the total); the rest is latent capacity.",
    example: "21,900",
  },
  {
    key: "furnace_output_btuh",
    header: "Furnace heating output (Btu/h)",
    group: "Heating",
    value: num("btuh", { minimum: 0, maximum: MAX_CAPACITY_BTUH }),
    required: false,
    meaning: "The furnace's heating output (not its input rating); required for ac-furnace and furnace.",
    example: "57,000",
  },
  {
    key: "heat_pump_47f_btuh",
    header: "Heat pump heating at 47 °F (Btu/h)",
    group: "Heating",
    value: num("btuh", { minimum: 0, maximum: MAX_CAPACITY_BTUH }),
    required: false,
    meaning:
      "Heat pump heating capacity at 47 °F outdoors (the high-temperature rating point); required for heat pumps.",
    example: "28,000",
  },
  {
    key: "heat_pump_17f_btuh",
    header: "Heat pump heating at 17 °F (Btu/h)",
    group: "Heating",
    value: num("btuh", { minimum: 0, maximum: MAX_CAPACITY_BTUH }),
    required: false,
    meaning:
      "Heat pump heating capacity at 17 °F outdoors (the low-temperature rating point); required for heat pumps, at most the 47 °F figure.",
    example: "17,500",
  },
  {
    key: "backup_heat_btuh",
    header: "Backup heat (Btu/h)",
    group: "Heating",
    value: num("btuh", { minimum: 0, maximum: MAX_CAPACITY_BTUH }),
    required: false,
    meaning:
      "Backup heat of a heat-pump-backup system: electric strips (1 kW = 3,412 Btu/h) or the output of a backup furnace; required for heat-pump-backup.",
    example: "34,100",
  },
  {
    key: "seer2",
    header: "SEER2",
    group: "Efficiency",
    value: num("ratio", { minimum: 1, maximum: 40 }),
    required: false,
    meaning: "Seasonal cooling efficiency rating of the matched system.",
    example: "15.2",
  },
  {
    key: "hspf2",
    header: "HSPF2",
    group: "Efficiency",
    value: num("ratio", { minimum: 1, maximum: 20 }),
    required: false,
    meaning: "Seasonal heating efficiency rating of a heat pump.",
    example: "7.8",
  },
  {
    key: "afue_pct",
    header: "AFUE (%)",
    group: "Efficiency",
    value: num("percent", { minimum: 50, maximum: 100 }),
    required: false,
    meaning: "Annual fuel utilization efficiency of the furnace.",
    example: "96%",
  },
  {
    key: "price_usd",
    header: "Price (USD)",
    group: "Purchasing",
    value: num("ratio", { minimum: 0, maximum: 1_000_000 }),
    required: false,
    meaning:
      "The builder's price for the whole system in US dollars (a leading $ and thousands separators are read: $4,250.00); blank = no price, the schedule shows no cost for it.",
    example: "$4,250",
  },
];

export const EQUIPMENT_COLUMN_BY_KEY: ReadonlyMap<string, EquipmentColumnDef> = new Map(
  EQUIPMENT_COLUMNS.map((column) => [column.key, column]),
);

/** Headers in file order. */
export const EQUIPMENT_HEADERS: readonly string[] = EQUIPMENT_COLUMNS.map((column) => column.header);

function headerOf(key: string): string {
  return EQUIPMENT_COLUMN_BY_KEY.get(key)?.header ?? key;
}

// ---------------------------------------------------------------------------------------------
// A catalog entry: lib/equipment's CatalogSystemInput plus the parts and ratings of the table.

/**
 * One system of the catalog. The first fields are lib/equipment's `CatalogSystemInput`
 * (`id` = system code, `modelNumber` = the part model numbers joined, `heatingOutputBtuh` =
 * the furnace output, or a heat pump's output at 17 °F until `catalogForHeatingDesign` puts
 * in the output at the site's design temperature); the rest keep the table's own cells.
 */
export interface EquipmentCatalogEntry extends CatalogSystemInput {
  id: string;
  modelNumber: string;
  type: SystemType;
  outdoorModel?: string;
  indoorModel?: string;
  furnaceModel?: string;
  furnaceOutputBtuh?: number;
  heatPump47FBtuh?: number;
  heatPump17FBtuh?: number;
  seer2?: number;
  hspf2?: number;
  afuePct?: number;
}

export type EquipmentTableResult =
  { ok: true; systems: EquipmentCatalogEntry[] } | { ok: false; errors: TableCellError[] };

const isHeatPump = (type: SystemType) => type === "heat-pump" || type === "heat-pump-backup";
const cools = (type: SystemType) => type !== "furnace";
const hasFurnace = (type: SystemType) => type === "ac-furnace" || type === "furnace";

/** "AC" + "coil" + "furnace" model numbers, as one text for lists and the selection. */
export function joinModelNumbers(parts: {
  outdoorModel?: string;
  indoorModel?: string;
  furnaceModel?: string;
}): string {
  return [parts.outdoorModel, parts.indoorModel, parts.furnaceModel]
    .filter((part): part is string => typeof part === "string" && part !== "")
    .join(" / ");
}

/** "SEER2 15.2, HSPF2 7.8, AFUE 96 %" (only the ratings given). */
export function efficiencyText(ratings: {
  seer2?: number;
  hspf2?: number;
  afuePct?: number;
}): string | undefined {
  const parts: string[] = [];
  if (ratings.seer2 !== undefined) parts.push(`SEER2 ${ratings.seer2}`);
  if (ratings.hspf2 !== undefined) parts.push(`HSPF2 ${ratings.hspf2}`);
  if (ratings.afuePct !== undefined) parts.push(`AFUE ${ratings.afuePct} %`);
  return parts.length > 0 ? parts.join(", ") : undefined;
}

/**
 * A price cell as builders type it: "$4,250", "4,250.00 USD". The dollar sign, "USD" and
 * thousands separators in strict groups of three are removed before the generic reader sees
 * the number; anything else (a decimal comma, words) is left for the reader to reject.
 */
function normalizePriceText(text: string): string {
  const match = /^\s*\$?\s*(\d{1,3}(?:,\d{3})+|\d+)(\.\d+)?\s*(?:usd)?\s*$/i.exec(text);
  if (!match) return text;
  return `${match[1].replace(/,/g, "")}${match[2] ?? ""}`;
}

/** Columns a lib/equipment schema path belongs to, for mapping its issues back onto the row. */
function columnForSchemaPath(path: string, type: SystemType): string {
  switch (path) {
    case "id":
      return "system_code";
    case "type":
      return "system_type";
    case "modelNumber":
      return type === "furnace" ? "furnace_model" : "outdoor_model";
    case "nominalTons":
      return "nominal_tons";
    case "coolingTotalBtuh":
      return "cooling_total_btuh";
    case "coolingSensibleBtuh":
      return "cooling_sensible_btuh";
    case "heatingOutputBtuh":
      return isHeatPump(type) ? "heat_pump_17f_btuh" : "furnace_output_btuh";
    case "backupHeatBtuh":
      return "backup_heat_btuh";
    case "efficiency":
      return "seer2";
    case "priceUsd":
      return "price_usd";
    default:
      return "system_code";
  }
}

const optionalNumber = (values: Record<string, unknown>, key: string): number | undefined => {
  const value = values[key];
  return typeof value === "number" ? value : undefined;
};
const optionalText = (values: Record<string, unknown>, key: string): string | undefined => {
  const value = values[key];
  return typeof value === "string" && value !== "" ? value : undefined;
};

/** Checks across one row's cells; each problem names the column it belongs to. */
function crossCheckRow(values: Record<string, unknown>, type: SystemType): { key: string; reason: string }[] {
  const problems: { key: string; reason: string }[] = [];
  const total = optionalNumber(values, "cooling_total_btuh");
  const sensible = optionalNumber(values, "cooling_sensible_btuh");
  const furnace = optionalNumber(values, "furnace_output_btuh");
  const hp47 = optionalNumber(values, "heat_pump_47f_btuh");
  const hp17 = optionalNumber(values, "heat_pump_17f_btuh");
  const backup = optionalNumber(values, "backup_heat_btuh");
  const tons = optionalNumber(values, "nominal_tons");

  if (cools(type)) {
    if (!optionalText(values, "outdoor_model"))
      problems.push({ key: "outdoor_model", reason: `is required for a ${type} system` });
    if (total === undefined || total <= 0)
      problems.push({
        key: "cooling_total_btuh",
        reason: `is required for a ${type} system (its cooling capacity at design, more than 0 Btu/h)`,
      });
    if (sensible === undefined || sensible <= 0)
      problems.push({
        key: "cooling_sensible_btuh",
        reason: `is required for a ${type} system (its sensible capacity at design, more than 0 Btu/h)`,
      });
    if (tons === undefined)
      problems.push({ key: "nominal_tons", reason: `is required for a ${type} system` });
  } else {
    if (total !== undefined && total > 0)
      problems.push({
        key: "cooling_total_btuh",
        reason: "a furnace alone has no cooling capacity; leave it blank or choose ac-furnace",
      });
    if (sensible !== undefined && sensible > 0)
      problems.push({
        key: "cooling_sensible_btuh",
        reason: "a furnace alone has no cooling capacity; leave it blank or choose ac-furnace",
      });
    if (tons !== undefined)
      problems.push({
        key: "nominal_tons",
        reason: "a furnace alone has no cooling size; leave it blank or choose ac-furnace",
      });
    if (optionalText(values, "outdoor_model"))
      problems.push({
        key: "outdoor_model",
        reason: "a furnace alone has no outdoor unit; leave it blank or choose ac-furnace",
      });
  }
  if (total !== undefined && sensible !== undefined && sensible > total) {
    problems.push({
      key: "cooling_sensible_btuh",
      reason: `${sensible} Btu/h is above the cooling total of ${total} Btu/h; sensible capacity is part of the total`,
    });
  }

  if (hasFurnace(type)) {
    if (!optionalText(values, "furnace_model"))
      problems.push({ key: "furnace_model", reason: `is required for a ${type} system` });
    if (furnace === undefined || furnace <= 0)
      problems.push({
        key: "furnace_output_btuh",
        reason: `is required for a ${type} system (the furnace's output, more than 0 Btu/h)`,
      });
  } else if (furnace !== undefined) {
    problems.push({
      key: "furnace_output_btuh",
      reason:
        type === "heat-pump-backup"
          ? "a heat pump's backup furnace goes in Backup heat (Btu/h)"
          : "a heat pump alone has no furnace; choose heat-pump-backup and enter its output as Backup heat (Btu/h)",
    });
  }

  if (isHeatPump(type)) {
    if (hp47 === undefined || hp47 <= 0)
      problems.push({
        key: "heat_pump_47f_btuh",
        reason: `is required for a ${type} system (its heating capacity at 47 °F, more than 0 Btu/h)`,
      });
    // Both rating points are needed to find the output at a community's design temperature.
    if (hp17 === undefined)
      problems.push({
        key: "heat_pump_17f_btuh",
        reason: `is required for a ${type} system (its heating capacity at 17 °F, needed for the output at the heating design temperature)`,
      });
    // An air-source heat pump gives less heat the colder it is outdoors (common practice).
    if (hp47 !== undefined && hp17 !== undefined && hp17 > hp47) {
      problems.push({
        key: "heat_pump_17f_btuh",
        reason: `${hp17} Btu/h at 17 °F is above the ${hp47} Btu/h at 47 °F; a heat pump's output falls as it gets colder — are the two columns swapped?`,
      });
    }
  } else {
    if (hp47 !== undefined)
      problems.push({
        key: "heat_pump_47f_btuh",
        reason: `a ${type} system has no heat pump; leave it blank or choose heat-pump`,
      });
    if (hp17 !== undefined)
      problems.push({
        key: "heat_pump_17f_btuh",
        reason: `a ${type} system has no heat pump; leave it blank or choose heat-pump`,
      });
    if (optionalNumber(values, "hspf2") !== undefined)
      problems.push({ key: "hspf2", reason: `HSPF2 rates heat pumps; a ${type} system has none` });
  }
  if (type === "heat-pump-backup" && (backup === undefined || backup <= 0)) {
    problems.push({
      key: "backup_heat_btuh",
      reason: "is required for a heat-pump-backup system (more than 0 Btu/h)",
    });
  }
  if (type !== "heat-pump-backup" && backup !== undefined && backup > 0) {
    problems.push({
      key: "backup_heat_btuh",
      reason: `only a heat-pump-backup system has backup heat; this row is ${type}`,
    });
  }
  if (optionalNumber(values, "afue_pct") !== undefined && !hasFurnace(type) && type !== "heat-pump-backup") {
    problems.push({ key: "afue_pct", reason: `AFUE rates furnaces; a ${type} system has none` });
  }
  return problems;
}

function rowToEntry(values: Record<string, unknown>): EquipmentCatalogEntry {
  const type = values.system_type as SystemType;
  const outdoorModel = optionalText(values, "outdoor_model");
  const indoorModel = optionalText(values, "indoor_model");
  const furnaceModel = optionalText(values, "furnace_model");
  const furnaceOutputBtuh = optionalNumber(values, "furnace_output_btuh");
  const heatPump47FBtuh = optionalNumber(values, "heat_pump_47f_btuh");
  const heatPump17FBtuh = optionalNumber(values, "heat_pump_17f_btuh");
  const seer2 = optionalNumber(values, "seer2");
  const hspf2 = optionalNumber(values, "hspf2");
  const afuePct = optionalNumber(values, "afue_pct");
  const entry: EquipmentCatalogEntry = {
    id: String(values.system_code),
    modelNumber: joinModelNumbers({ outdoorModel, indoorModel, furnaceModel }),
    type,
    nominalTons: optionalNumber(values, "nominal_tons"),
    coolingTotalBtuh: optionalNumber(values, "cooling_total_btuh") ?? 0,
    coolingSensibleBtuh: optionalNumber(values, "cooling_sensible_btuh") ?? 0,
    // Until the site is known, a heat pump counts its 17 °F output (catalogForHeatingDesign replaces it).
    heatingOutputBtuh: (isHeatPump(type) ? heatPump17FBtuh : furnaceOutputBtuh) ?? 0,
    backupHeatBtuh: optionalNumber(values, "backup_heat_btuh") ?? 0,
    efficiency: efficiencyText({ seer2, hspf2, afuePct }),
    priceUsd: optionalNumber(values, "price_usd"),
  };
  const extras: Partial<EquipmentCatalogEntry> = {
    outdoorModel,
    indoorModel,
    furnaceModel,
    furnaceOutputBtuh,
    heatPump47FBtuh,
    heatPump17FBtuh,
    seer2,
    hspf2,
    afuePct,
  };
  for (const [key, value] of Object.entries(extras))
    if (value !== undefined) (entry as unknown as Record<string, unknown>)[key] = value;
  for (const key of Object.keys(entry) as (keyof EquipmentCatalogEntry)[])
    if (entry[key] === undefined) delete entry[key];
  return entry;
}

/**
 * Validates a whole equipment-catalog table and reports every bad cell (row as the
 * spreadsheet shows it, column header, reason): unknown, duplicated or missing required
 * columns (row 1), unreadable or out-of-range cells, duplicated system codes, checks across a
 * row's cells, and lib/equipment's catalog schema mapped back to its column. A good table
 * gives the systems, in file order.
 */
export function validateEquipmentTable(table: RawTable): EquipmentTableResult {
  const priceIndex = table.headers.findIndex(
    (text) => matchColumn(EQUIPMENT_COLUMNS, text)?.key === "price_usd",
  );
  const prepared: RawTable =
    priceIndex < 0
      ? table
      : {
          headers: table.headers,
          rows: table.rows.map((row) => ({
            rowNumber: row.rowNumber,
            cells: row.cells.map((cell, index) => (index === priceIndex ? normalizePriceText(cell) : cell)),
          })),
        };

  const read = readTable(prepared, EQUIPMENT_COLUMNS);
  const errors: TableCellError[] = [...read.errors];
  const badRows = new Set(read.errors.map((error) => error.row));
  const firstRowOfCode = new Map<string, number>();
  const systems: EquipmentCatalogEntry[] = [];

  for (const row of read.rows) {
    const code = row.values.system_code;
    if (typeof code === "string") {
      const seen = firstRowOfCode.get(code.toLowerCase());
      if (seen !== undefined) {
        errors.push({
          row: row.rowNumber,
          column: headerOf("system_code"),
          reason: `system code "${code}" is already used on row ${seen}; system codes must be unique`,
        });
        continue;
      }
      firstRowOfCode.set(code.toLowerCase(), row.rowNumber);
    }
    if (badRows.has(row.rowNumber)) continue; // cell errors first; row checks once the cells read
    const type = row.values.system_type as SystemType | undefined;
    // Without a system type (its column is missing, reported on row 1) the row cannot be cross-checked.
    if (type === undefined) continue;
    const problems = crossCheckRow(row.values, type);
    if (problems.length > 0) {
      for (const problem of problems)
        errors.push({ row: row.rowNumber, column: headerOf(problem.key), reason: problem.reason });
      continue;
    }
    const entry = rowToEntry(row.values);
    const parsed = catalogSystemSchema.safeParse(entry);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        errors.push({
          row: row.rowNumber,
          column: headerOf(columnForSchemaPath(issue.path.map(String).join("."), type)),
          reason: issue.message,
        });
      }
      continue;
    }
    systems.push(entry);
  }
  if (read.rows.length === 0 && errors.length === 0)
    errors.push({ row: 2, column: headerOf("system_code"), reason: "the table has no system rows" });
  errors.sort((a, b) => a.row - b.row);
  return errors.length > 0 ? { ok: false, errors } : { ok: true, systems };
}

// ---------------------------------------------------------------------------------------------
// Export.

/** The cells of one system by column key (numbers as numbers, blank = null). */
export function equipmentEntryToRow(system: EquipmentCatalogEntry): Record<string, string | number | null> {
  const heatPump = isHeatPump(system.type);
  const blankZero = (value: number | undefined) => (value === undefined || value === 0 ? null : value);
  return {
    system_code: system.id,
    system_type: system.type,
    // A system stored without its parts keeps its joined model number in the first model column.
    outdoor_model:
      system.outdoorModel ??
      (system.type === "furnace" || system.furnaceModel || system.indoorModel ? null : system.modelNumber),
    indoor_model: system.indoorModel ?? null,
    furnace_model:
      system.furnaceModel ?? (system.type === "furnace" && !system.outdoorModel ? system.modelNumber : null),
    nominal_tons: system.nominalTons ?? null,
    cooling_total_btuh: blankZero(system.coolingTotalBtuh),
    cooling_sensible_btuh: blankZero(system.coolingSensibleBtuh),
    furnace_output_btuh: system.furnaceOutputBtuh ?? (heatPump ? null : blankZero(system.heatingOutputBtuh)),
    heat_pump_47f_btuh: system.heatPump47FBtuh ?? null,
    heat_pump_17f_btuh: system.heatPump17FBtuh ?? (heatPump ? blankZero(system.heatingOutputBtuh) : null),
    backup_heat_btuh: blankZero(system.backupHeatBtuh),
    seer2: system.seer2 ?? null,
    hspf2: system.hspf2 ?? null,
    afue_pct: system.afuePct ?? null,
    price_usd: system.priceUsd ?? null,
  };
}

/**
 * Systems → the header + cell arrays a CSV/XLSX writer takes (writeCsv / writeXlsx, which
 * escape formula-like text). The result imports again with validateEquipmentTable.
 */
export function equipmentRowsToTable(systems: readonly EquipmentCatalogEntry[]): {
  headers: string[];
  rows: (string | number | null)[][];
} {
  return {
    headers: [...EQUIPMENT_HEADERS],
    rows: systems.map((system) => {
      const cells = equipmentEntryToRow(system);
      return EQUIPMENT_COLUMNS.map((column) => cells[column.key] ?? null);
    }),
  };
}

// ---------------------------------------------------------------------------------------------
// Heat pump output at a community's heating design temperature.

/** The two rating points of an air-source heat pump's heating capacity, °F. */
export const HEAT_PUMP_RATING_HIGH_F = 47;
export const HEAT_PUMP_RATING_LOW_F = 17;

export class EquipmentInputError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(`${field}: ${message}`);
    this.name = "EquipmentInputError";
  }
}

/**
 * Heating output of a heat pump at `outdoorF`, on the straight line through its 47 °F and
 * 17 °F ratings, extended beyond them (capacity close to linear in outdoor temperature:
 * common practice, from memory). Below the temperature where that line reaches zero the heat
 * pump gives no heat, and 0 is returned.
 *
 * @example heatPumpOutputAtF({ heatPump47FBtuh: 30_000, heatPump17FBtuh: 18_000 }, 24) // 20,800
 * @throws EquipmentInputError for a temperature outside −60…70 °F (the engine's heating design range)
 */
export function heatPumpOutputAtF(
  ratings: { heatPump47FBtuh: number; heatPump17FBtuh: number },
  outdoorF: number,
): number {
  if (!Number.isFinite(outdoorF) || outdoorF < -60 || outdoorF > 70) {
    throw new EquipmentInputError(
      "heatingOutdoorDbF",
      `${outdoorF} °F is out of range (valid range -60 to 70 °F)`,
    );
  }
  const { heatPump47FBtuh: high, heatPump17FBtuh: low } = ratings;
  const slopeBtuhPerF = (high - low) / (HEAT_PUMP_RATING_HIGH_F - HEAT_PUMP_RATING_LOW_F);
  return Math.max(0, low + slopeBtuhPerF * (outdoorF - HEAT_PUMP_RATING_LOW_F));
}

/**
 * The catalog as lib/equipment's selection should see it for one community: every heat
 * pump's `heatingOutputBtuh` becomes its output at the community's heating design dry bulb.
 * Furnaces and entries without both ratings are returned unchanged.
 */
export function catalogForHeatingDesign(
  systems: readonly EquipmentCatalogEntry[],
  heatingOutdoorDbF: number,
): EquipmentCatalogEntry[] {
  return systems.map((system) => {
    if (
      !isHeatPump(system.type) ||
      system.heatPump47FBtuh === undefined ||
      system.heatPump17FBtuh === undefined
    )
      return { ...system };
    return {
      ...system,
      heatingOutputBtuh: Math.round(
        heatPumpOutputAtF(
          { heatPump47FBtuh: system.heatPump47FBtuh, heatPump17FBtuh: system.heatPump17FBtuh },
          heatingOutdoorDbF,
        ),
      ),
    };
  });
}

// ---------------------------------------------------------------------------------------------
// templates/: the catalog template's example row and the example catalog (invented).

/** Cells by column key, as typed text. */
export type EquipmentExampleRow = Readonly<Record<string, string>>;

/** The single example row of templates/equipment-catalog-template.csv / .xlsx. */
export const EQUIPMENT_TEMPLATE_ROW: EquipmentExampleRow = {
  system_code: "SAMPLE-AC30",
  system_type: "ac-furnace",
  outdoor_model: "SAMPLE-OUT-30",
  indoor_model: "SAMPLE-COIL-30",
  furnace_model: "SAMPLE-FURN-60",
  nominal_tons: "2.5",
  cooling_total_btuh: "28,800",
  cooling_sensible_btuh: "22,000",
  furnace_output_btuh: "57,000",
  seer2: "14.3",
  afue_pct: "96%",
  price_usd: "$4,250",
};

/**
 * The example catalog (templates/example-equipment.csv): ten invented systems with invented
 * model numbers ("NV-…", no real products). Cooling totals at design are 0.95–0.97 of nominal
 * tons × 12,000 Btu/h and sensible capacities 0.72–0.78 of the total (common practice); a
 * heat pump gives about 60 % of its 47 °F output at 17 °F (common practice, from memory);
 * 1 kW of strip heat = 3,412 Btu/h (definition); furnace outputs are about 0.95 of a 96 %
 * furnace's input (from memory). Prices are invented.
 */
export const EXAMPLE_EQUIPMENT_ROWS: readonly EquipmentExampleRow[] = [
  {
    system_code: "AC18-F30",
    system_type: "ac-furnace",
    outdoor_model: "NV-C18S",
    indoor_model: "NV-E18A",
    furnace_model: "NV-G30M",
    nominal_tons: "1.5",
    cooling_total_btuh: "17,300",
    cooling_sensible_btuh: "13,400",
    furnace_output_btuh: "28,500",
    seer2: "14.3",
    afue_pct: "96%",
    price_usd: "$3,420",
  },
  {
    system_code: "AC24-F30",
    system_type: "ac-furnace",
    outdoor_model: "NV-C24S",
    indoor_model: "NV-E24A",
    furnace_model: "NV-G30M",
    nominal_tons: "2",
    cooling_total_btuh: "23,100",
    cooling_sensible_btuh: "18,000",
    furnace_output_btuh: "28,500",
    seer2: "14.3",
    afue_pct: "96%",
    price_usd: "$3,730",
  },
  {
    system_code: "AC30-F40",
    system_type: "ac-furnace",
    outdoor_model: "NV-C30S",
    indoor_model: "NV-E30B",
    furnace_model: "NV-G40M",
    nominal_tons: "2.5",
    cooling_total_btuh: "28,800",
    cooling_sensible_btuh: "22,400",
    furnace_output_btuh: "38,000",
    seer2: "14.3",
    afue_pct: "96%",
    price_usd: "$4,090",
  },
  {
    system_code: "AC36-F60",
    system_type: "ac-furnace",
    outdoor_model: "NV-C36S",
    indoor_model: "NV-E36B",
    furnace_model: "NV-G60M",
    nominal_tons: "3",
    cooling_total_btuh: "34,600",
    cooling_sensible_btuh: "26,600",
    furnace_output_btuh: "57,000",
    seer2: "14.3",
    afue_pct: "96%",
    price_usd: "$4,540",
  },
  {
    system_code: "AC42-F60",
    system_type: "ac-furnace",
    outdoor_model: "NV-C42S",
    indoor_model: "NV-E42C",
    furnace_model: "NV-G60M",
    nominal_tons: "3.5",
    cooling_total_btuh: "40,300",
    cooling_sensible_btuh: "31,000",
    furnace_output_btuh: "57,000",
    seer2: "14.3",
    afue_pct: "96%",
    price_usd: "$4,980",
  },
  {
    system_code: "AC48-F80",
    system_type: "ac-furnace",
    outdoor_model: "NV-C48S",
    indoor_model: "NV-E48C",
    furnace_model: "NV-G80M",
    nominal_tons: "4",
    cooling_total_btuh: "46,100",
    cooling_sensible_btuh: "35,000",
    furnace_output_btuh: "76,000",
    seer2: "14.3",
    afue_pct: "96%",
    price_usd: "$5,480",
  },
  {
    system_code: "HP24",
    system_type: "heat-pump",
    outdoor_model: "NV-H24V",
    indoor_model: "NV-A24V",
    nominal_tons: "2",
    cooling_total_btuh: "23,000",
    cooling_sensible_btuh: "17,900",
    heat_pump_47f_btuh: "23,600",
    heat_pump_17f_btuh: "14,400",
    seer2: "16.0",
    hspf2: "8.1",
    price_usd: "$5,150",
  },
  {
    system_code: "HP30-B10",
    system_type: "heat-pump-backup",
    outdoor_model: "NV-H30V",
    indoor_model: "NV-A30V",
    nominal_tons: "2.5",
    cooling_total_btuh: "28,700",
    cooling_sensible_btuh: "22,300",
    heat_pump_47f_btuh: "29,000",
    heat_pump_17f_btuh: "17,600",
    backup_heat_btuh: "34,100",
    seer2: "16.0",
    hspf2: "8.1",
    price_usd: "$5,740",
  },
  {
    system_code: "HP36-B10",
    system_type: "heat-pump-backup",
    outdoor_model: "NV-H36V",
    indoor_model: "NV-A36V",
    nominal_tons: "3",
    cooling_total_btuh: "34,500",
    cooling_sensible_btuh: "26,900",
    heat_pump_47f_btuh: "34,800",
    heat_pump_17f_btuh: "21,000",
    backup_heat_btuh: "34,100",
    seer2: "15.2",
    hspf2: "7.8",
    price_usd: "$6,230",
  },
  {
    system_code: "F40",
    system_type: "furnace",
    furnace_model: "NV-G40M",
    furnace_output_btuh: "38,000",
    afue_pct: "96%",
    price_usd: "$1,840",
  },
];

/** Example rows → cells in column order (unknown keys are a programming error). */
export function equipmentExampleCells(rows: readonly EquipmentExampleRow[]): string[][] {
  for (const row of rows) {
    for (const key of Object.keys(row)) {
      if (!EQUIPMENT_COLUMN_BY_KEY.has(key))
        throw new Error(`example system ${row.system_code}: unknown column key ${key}`);
    }
  }
  return rows.map((row) => EQUIPMENT_COLUMNS.map((column) => row[column.key] ?? ""));
}

// ---------------------------------------------------------------------------------------------
// templates/EQUIPMENT.md, generated from the column list so it cannot drift.

function unitOf(column: EquipmentColumnDef): string {
  if (column.value.type !== "number") return describeColumnValue(column.value, "");
  if (column.key === "price_usd") return "US dollars";
  if (column.key === "nominal_tons") return "tons (12,000 Btu/h)";
  if (column.value.quantity === "ratio") return "number";
  return QUANTITY_KIND_INFO[column.value.quantity].unit;
}

function rangeOf(column: EquipmentColumnDef): string {
  if (column.value.type !== "number") return "";
  const { minimum, maximum } = column.value;
  if (minimum === undefined && maximum === undefined) return "";
  return `${(minimum ?? "").toLocaleString("en-US")}–${(maximum ?? "").toLocaleString("en-US")}`;
}

const escapeCell = (text: string) => text.replace(/\|/g, "\\|");

/** Which columns each system type fills (R = required, – = must stay blank, o = optional). */
const FILL_BY_TYPE: Record<string, Record<SystemType, "R" | "o" | "–">> = {
  outdoor_model: { "ac-furnace": "R", "heat-pump": "R", "heat-pump-backup": "R", furnace: "–" },
  indoor_model: { "ac-furnace": "o", "heat-pump": "o", "heat-pump-backup": "o", furnace: "o" },
  furnace_model: { "ac-furnace": "R", "heat-pump": "o", "heat-pump-backup": "o", furnace: "R" },
  nominal_tons: { "ac-furnace": "R", "heat-pump": "R", "heat-pump-backup": "R", furnace: "–" },
  cooling_total_btuh: { "ac-furnace": "R", "heat-pump": "R", "heat-pump-backup": "R", furnace: "–" },
  cooling_sensible_btuh: { "ac-furnace": "R", "heat-pump": "R", "heat-pump-backup": "R", furnace: "–" },
  furnace_output_btuh: { "ac-furnace": "R", "heat-pump": "–", "heat-pump-backup": "–", furnace: "R" },
  heat_pump_47f_btuh: { "ac-furnace": "–", "heat-pump": "R", "heat-pump-backup": "R", furnace: "–" },
  heat_pump_17f_btuh: { "ac-furnace": "–", "heat-pump": "R", "heat-pump-backup": "R", furnace: "–" },
  backup_heat_btuh: { "ac-furnace": "–", "heat-pump": "–", "heat-pump-backup": "R", furnace: "–" },
  hspf2: { "ac-furnace": "–", "heat-pump": "o", "heat-pump-backup": "o", furnace: "–" },
  afue_pct: { "ac-furnace": "o", "heat-pump": "–", "heat-pump-backup": "o", furnace: "o" },
};

/** The text of templates/EQUIPMENT.md. */
export function renderEquipmentTemplatesDoc(): string {
  const lines: string[] = [
    "# Equipment catalog templates",
    "",
    "Generated from `lib/workbook/equipment-columns.ts` (the one column list the catalog grid, its",
    "import and export and these files share); the tests check that the files match it. Change the",
    "column list there, not these files.",
    "",
    "| file | what it is |",
    "|---|---|",
    "| `equipment-catalog-template.csv` / `.xlsx` | the header row and **one example row** (system code `SAMPLE-AC30`). Overwrite it with your first system and add one row per system; delete it if you do not want it imported (it is a real row) |",
    `| \`example-equipment.csv\` | an example catalog of ${EXAMPLE_EQUIPMENT_ROWS.length} invented systems with invented model numbers (\`NV-…\`, no real products): air conditioners with furnaces of 1.5–4 tons, heat pumps with and without backup heat, a furnace alone |`,
    "",
    "Sizing with the catalog is a design estimate: selection compares these capacities with Platload's",
    "estimated loads within the account's sizing limits. Local codes and a licensed professional's review",
    "govern equipment sizing.",
    "",
    "## How a file is read",
    "",
    "- **Row 1 is the header**; headers match by their text or their key, in any order, case and spacing",
    "  ignored. An unknown, doubled or missing required column is reported on row 1.",
    "- **One row per system.** Rows are numbered as a spreadsheet shows them (the first system is row 2).",
    "  Every bad cell is reported with its row, column and reason, and **nothing is imported unless every",
    "  row is good**. System codes must be unique (case-insensitive).",
    "- **Numbers may carry their unit**: `28,800 Btu/h`, `28800 btuh`; `96%` for AFUE; a price as `$4,250`",
    "  or `4250.00`. Thousands separators only in groups of three. Text in a number cell, a negative",
    "  capacity, or a unit of another kind is rejected. Formulas (`=2.5*12000*0.96`) work as in the plan",
    "  library (see `README.md`).",
    "- **Checks across a row**: sensible capacity at most the total; every type that cools needs an outdoor",
    "  model, nominal tons, total and sensible capacity; a furnace alone has no cooling, tons or outdoor",
    "  unit; ac-furnace and furnace need a furnace model and output; heat pumps need both heating ratings",
    "  (47 °F and 17 °F, the 17 °F figure at most the 47 °F one); only heat-pump-backup has backup heat.",
    "- **Exports** write the same columns; text beginning with `=`, `+`, `-` or `@` is escaped so that no",
    "  spreadsheet program runs it.",
    "",
    "## Columns",
    "",
  ];
  for (const group of EQUIPMENT_COLUMN_GROUPS) {
    const columns = EQUIPMENT_COLUMNS.filter((column) => column.group === group);
    lines.push(
      `### ${group}`,
      "",
      "| key | header | unit | valid range | meaning | required | example |",
      "|---|---|---|---|---|---|---|",
    );
    for (const column of columns) {
      lines.push(
        `| \`${column.key}\` | ${escapeCell(column.header)} | ${escapeCell(unitOf(column))} | ${rangeOf(column)} | ${escapeCell(column.meaning)} | ${column.required ? "**required**" : "see below"} | ${column.example ? `\`${escapeCell(column.example)}\`` : ""} |`,
      );
    }
    lines.push("");
  }
  lines.push(
    "## Which columns each system type fills",
    "",
    "R = required, o = optional, – = must stay blank.",
    "",
    `| column | ${SYSTEM_TYPES.map((type) => `\`${type}\``).join(" | ")} |`,
    `|---|${SYSTEM_TYPES.map(() => "---").join("|")}|`,
    ...Object.entries(FILL_BY_TYPE).map(
      ([key, fill]) => `| \`${key}\` | ${SYSTEM_TYPES.map((type) => fill[type]).join(" | ")} |`,
    ),
    "",
    "`system_code` and `system_type` are required on every row; `seer2` and `price_usd` are optional on every type.",
    "",
    "## How the catalog is used",
    "",
    "- **Selection** (lib/equipment): a system fits a lot when its cooling total at design lies within the",
    "  account's limits of the lot's cooling load, its sensible and latent capacity (total − sensible) cover",
    "  the sensible and latent loads, and its heating output lies within the heating limits. Every report",
    "  states the limits it used.",
    "- **Heat pump heating at the design temperature**: the output is read on the straight line through the",
    "  47 °F and 17 °F ratings at the community's heating design dry bulb, extended beyond them (common",
    "  practice, from memory); with backup heat the backup is added.",
    "- **Equipment schedule**: counts of each system per community and month of planned start, priced with",
    "  `price_usd`; a system without a price shows no cost.",
    "",
  );
  return lines.join("\n");
}

/**
 * The equipment files of templates/ (name → content), each validated before it is returned:
 * for scripts/make-templates.ts to write beside the plan-library files. The XLSX carries the
 * same header and example row as the CSV template.
 * @throws Error naming the row, column and reason when an example row does not validate.
 */
export async function equipmentTemplateFiles(
  options: { fixedTimestamp?: Date } = {},
): Promise<{ name: string; content: string | Uint8Array }[]> {
  const templateCells = equipmentExampleCells([EQUIPMENT_TEMPLATE_ROW]);
  const templateCsv = writeCsv(EQUIPMENT_HEADERS, templateCells);
  const exampleCsv = writeCsv(EQUIPMENT_HEADERS, equipmentExampleCells(EXAMPLE_EQUIPMENT_ROWS));
  for (const [name, csv] of [
    ["equipment-catalog-template.csv", templateCsv],
    ["example-equipment.csv", exampleCsv],
  ] as const) {
    const result = validateEquipmentTable(readCsv(csv));
    if (!result.ok)
      throw new Error(
        `${name} does not validate:\n${result.errors.map((e) => `row ${e.row}, column "${e.column}": ${e.reason}`).join("\n")}`,
      );
  }
  const templateXlsx = await writeXlsx(EQUIPMENT_HEADERS, templateCells, {
    sheetName: "Equipment catalog",
    columnWidths: EQUIPMENT_COLUMNS.map((column) => Math.min(36, Math.max(12, column.header.length * 0.9))),
    fixedTimestamp: options.fixedTimestamp,
  });
  return [
    { name: "equipment-catalog-template.csv", content: `${templateCsv}\r\n` },
    { name: "equipment-catalog-template.xlsx", content: templateXlsx },
    { name: "example-equipment.csv", content: `${exampleCsv}\r\n` },
    { name: "EQUIPMENT.md", content: renderEquipmentTemplatesDoc() },
  ];
}

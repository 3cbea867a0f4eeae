/**
 * The equipment schedule for purchasing: how many of each catalog system every community
 * needs, by month of planned start, with unit prices and extended costs, and the lots for
 * which no system fits (with the reason). Pure data in, data out; the tables go to
 * lib/workbook's writeCsv / writeXlsx, which escape formula-like text.
 */
import type { CatalogSystemInput, SystemType } from "../equipment/catalog";
import { ReportInputError, type ReportInputIssue } from "./errors";

/** One lot as the schedule needs it. */
export interface ScheduleLotInput {
  communityName: string;
  lotNumber: string;
  /** The selected (or purchaser's override) system code; null when no catalog system fits. */
  systemCode: string | null;
  /** Why no system fits (required when systemCode is null), e.g. the selection's reasons. */
  noFitReason?: string | null;
  /** Planned start date, ISO `YYYY-MM-DD`, or null when not yet planned. */
  plannedStart: string | null;
}

/** A catalog system as the schedule needs it (any lib/equipment catalog entry will do). */
export type ScheduleSystemInput = Pick<
  CatalogSystemInput,
  "id" | "modelNumber" | "type" | "nominalTons" | "priceUsd"
>;

/** Count of one system, with its price; costs are null when the system has no price. */
export interface ScheduleSystemCount {
  systemCode: string;
  systemType: SystemType;
  modelNumber: string;
  nominalTons: number | null;
  count: number;
  unitPriceUsd: number | null;
  extendedCostUsd: number | null;
}

export interface ScheduleCommunityLine extends ScheduleSystemCount {
  communityName: string;
}

export interface ScheduleMonthLine extends ScheduleSystemCount {
  communityName: string;
  /** `YYYY-MM` of the planned start, or null for lots without a date. */
  month: string | null;
}

export interface ScheduleTotals {
  lotCount: number;
  lotsWithSystem: number;
  lotsWithoutSystem: number;
  /** Sum of the extended costs of priced systems, USD. */
  costUsd: number;
  /** Systems counted without a price (their cost is not in costUsd). */
  unpricedSystemCount: number;
}

export interface ScheduleCommunityTotals extends ScheduleTotals {
  communityName: string;
}

export interface LotWithoutSystem {
  communityName: string;
  lotNumber: string;
  plannedStart: string | null;
  reason: string;
}

export interface EquipmentSchedule {
  /** Per community × system (communities by name; systems in catalog order). */
  byCommunity: ScheduleCommunityLine[];
  /** Per community × month of planned start × system (months in order, "no date" last). */
  byMonth: ScheduleMonthLine[];
  communityTotals: ScheduleCommunityTotals[];
  /** Per system over all communities. */
  systemTotals: ScheduleSystemCount[];
  totals: ScheduleTotals;
  lotsWithoutSystem: LotWithoutSystem[];
  caution: string;
}

/** The equipment schedule's own caution (the sizing behind it is a design estimate). */
export const SCHEDULE_CAUTION =
  "Counts follow the system selected for each lot from Platload's design-estimate loads within the account's sizing limits. " +
  "Local codes and a licensed professional's review govern equipment sizing.";

export const NO_DATE_LABEL = "no date";

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

function checkIsoDate(text: string): string | null {
  const match = ISO_DATE.exec(text);
  if (!match) return `"${text}" is not a date in the form YYYY-MM-DD`;
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const date = new Date(Date.UTC(year, month - 1, day));
  if (date.getUTCFullYear() !== year || date.getUTCMonth() !== month - 1 || date.getUTCDate() !== day)
    return `"${text}" is not a real calendar date`;
  return null;
}

/** Dollars and cents, without binary noise (3 × 4,160.10 = 12,480.30). */
const cents = (usd: number) => Math.round(usd * 100) / 100;

function validate(
  lots: readonly ScheduleLotInput[],
  systems: readonly ScheduleSystemInput[],
): ReportInputIssue[] {
  const issues: ReportInputIssue[] = [];
  const codes = new Map<string, number>();
  systems.forEach((system, index) => {
    if (typeof system.id !== "string" || system.id.trim() === "")
      issues.push({ field: `systems.${index}.id`, message: "required: the system code" });
    else if (codes.has(system.id))
      issues.push({
        field: `systems.${index}.id`,
        message: `system code "${system.id}" is also systems.${codes.get(system.id)}; codes must be unique`,
      });
    else codes.set(system.id, index);
    if (system.priceUsd !== undefined && (!Number.isFinite(system.priceUsd) || system.priceUsd < 0)) {
      issues.push({
        field: `systems.${index}.priceUsd`,
        message: `${system.priceUsd} is not a price (valid range 0 or more USD)`,
      });
    }
  });
  const seenLots = new Map<string, number>();
  lots.forEach((lot, index) => {
    const at = `lots.${index}`;
    if (typeof lot.communityName !== "string" || lot.communityName.trim() === "")
      issues.push({ field: `${at}.communityName`, message: "required: the community name" });
    if (typeof lot.lotNumber !== "string" || lot.lotNumber.trim() === "")
      issues.push({ field: `${at}.lotNumber`, message: "required: the lot number" });
    else {
      const key = `${lot.communityName}\u0000${lot.lotNumber}`;
      const seen = seenLots.get(key);
      if (seen !== undefined)
        issues.push({
          field: `${at}.lotNumber`,
          message: `lot ${lot.lotNumber} of ${lot.communityName} is also lots.${seen}`,
        });
      else seenLots.set(key, index);
    }
    if (lot.systemCode === null) {
      if (typeof lot.noFitReason !== "string" || lot.noFitReason.trim() === "") {
        issues.push({
          field: `${at}.noFitReason`,
          message: "required when no system is selected: why nothing fits",
        });
      }
    } else if (!codes.has(lot.systemCode)) {
      issues.push({
        field: `${at}.systemCode`,
        message: `"${lot.systemCode}" is not a system of the catalog (${[...codes.keys()].join(", ") || "the catalog is empty"})`,
      });
    }
    if (lot.plannedStart !== null) {
      const problem =
        typeof lot.plannedStart === "string"
          ? checkIsoDate(lot.plannedStart)
          : `${String(lot.plannedStart)} is not a date in the form YYYY-MM-DD`;
      if (problem) issues.push({ field: `${at}.plannedStart`, message: problem });
    }
  });
  return issues;
}

function countLine(system: ScheduleSystemInput, count: number): ScheduleSystemCount {
  const unitPriceUsd = system.priceUsd ?? null;
  return {
    systemCode: system.id,
    systemType: system.type,
    modelNumber: system.modelNumber,
    nominalTons: system.nominalTons ?? null,
    count,
    unitPriceUsd,
    extendedCostUsd: unitPriceUsd === null ? null : cents(unitPriceUsd * count),
  };
}

function totalsOf(
  lines: readonly ScheduleSystemCount[],
  lotCount: number,
  lotsWithoutSystem: number,
): ScheduleTotals {
  let costUsd = 0;
  let unpricedSystemCount = 0;
  for (const line of lines) {
    if (line.extendedCostUsd === null) unpricedSystemCount += line.count;
    else costUsd += line.extendedCostUsd;
  }
  return {
    lotCount,
    lotsWithSystem: lotCount - lotsWithoutSystem,
    lotsWithoutSystem,
    costUsd: cents(costUsd),
    unpricedSystemCount,
  };
}

/**
 * Counts each system per community and per community × month of planned start, with unit
 * prices, extended costs and totals; lists the lots no system fits with their reasons.
 *
 * @throws ReportInputError naming every bad field (unknown system code, a lot without a
 *   system and without a reason, a date that is not YYYY-MM-DD, a lot listed twice…).
 */
export function buildEquipmentSchedule(args: {
  lots: readonly ScheduleLotInput[];
  systems: readonly ScheduleSystemInput[];
}): EquipmentSchedule {
  const issues = validate(args.lots, args.systems);
  if (issues.length > 0) throw new ReportInputError(issues);

  const systemOrder = new Map(args.systems.map((system, index) => [system.id, index]));
  const systemByCode = new Map(args.systems.map((system) => [system.id, system]));
  const communities = [...new Set(args.lots.map((lot) => lot.communityName))].sort((a, b) =>
    a.localeCompare(b, "en"),
  );
  const bySystemOrder = (a: string, b: string) => (systemOrder.get(a) ?? 0) - (systemOrder.get(b) ?? 0);

  const byCommunity: ScheduleCommunityLine[] = [];
  const byMonth: ScheduleMonthLine[] = [];
  const communityTotals: ScheduleCommunityTotals[] = [];
  const lotsWithoutSystem: LotWithoutSystem[] = [];

  for (const communityName of communities) {
    const lots = args.lots.filter((lot) => lot.communityName === communityName);
    const counts = new Map<string, number>();
    const monthCounts = new Map<string, Map<string, number>>();
    let unfit = 0;
    for (const lot of lots) {
      if (lot.systemCode === null) {
        unfit += 1;
        lotsWithoutSystem.push({
          communityName,
          lotNumber: lot.lotNumber,
          plannedStart: lot.plannedStart,
          reason: String(lot.noFitReason),
        });
        continue;
      }
      counts.set(lot.systemCode, (counts.get(lot.systemCode) ?? 0) + 1);
      const month = lot.plannedStart === null ? NO_DATE_LABEL : lot.plannedStart.slice(0, 7);
      const perSystem = monthCounts.get(month) ?? new Map<string, number>();
      perSystem.set(lot.systemCode, (perSystem.get(lot.systemCode) ?? 0) + 1);
      monthCounts.set(month, perSystem);
    }
    const lines = [...counts.keys()].sort(bySystemOrder).map((code) => ({
      communityName,
      ...countLine(systemByCode.get(code) as ScheduleSystemInput, counts.get(code) ?? 0),
    }));
    byCommunity.push(...lines);
    const months = [...monthCounts.keys()].sort((a, b) =>
      a === NO_DATE_LABEL ? 1 : b === NO_DATE_LABEL ? -1 : a.localeCompare(b),
    );
    for (const month of months) {
      const perSystem = monthCounts.get(month) as Map<string, number>;
      for (const code of [...perSystem.keys()].sort(bySystemOrder)) {
        byMonth.push({
          communityName,
          month: month === NO_DATE_LABEL ? null : month,
          ...countLine(systemByCode.get(code) as ScheduleSystemInput, perSystem.get(code) ?? 0),
        });
      }
    }
    communityTotals.push({ communityName, ...totalsOf(lines, lots.length, unfit) });
  }

  const overall = new Map<string, number>();
  for (const line of byCommunity)
    overall.set(line.systemCode, (overall.get(line.systemCode) ?? 0) + line.count);
  const systemTotals = [...overall.keys()]
    .sort(bySystemOrder)
    .map((code) => countLine(systemByCode.get(code) as ScheduleSystemInput, overall.get(code) ?? 0));

  return {
    byCommunity,
    byMonth,
    communityTotals,
    systemTotals,
    totals: totalsOf(systemTotals, args.lots.length, lotsWithoutSystem.length),
    lotsWithoutSystem,
    caution: SCHEDULE_CAUTION,
  };
}

// ---------------------------------------------------------------------------------------------
// Tables for CSV / XLSX.

export type ScheduleCell = string | number | null;

export interface ScheduleTable {
  /** Stable name, for a file name or a sheet name. */
  name: "by-community" | "by-month" | "system-totals" | "lots-without-system" | "notes";
  /** Sheet title (≤ 31 characters, an XLSX limit). */
  sheetName: string;
  headers: string[];
  rows: ScheduleCell[][];
}

const TOTAL = "Total";

/**
 * The schedule as tables (header + rows, numbers as numbers): counts by community with a
 * total row per community and one for all communities; counts by month; totals per system;
 * the lots without a system; and a notes table with the caution. Write each with writeCsv or
 * writeXlsx (they escape text that a spreadsheet could run as a formula).
 */
export function equipmentScheduleTables(schedule: EquipmentSchedule): ScheduleTable[] {
  const countHeaders = [
    "System code",
    "System type",
    "Model numbers",
    "Nominal tons",
    "Count",
    "Unit price (USD)",
    "Extended cost (USD)",
  ];
  const countCells = (line: ScheduleSystemCount): ScheduleCell[] => [
    line.systemCode,
    line.systemType,
    line.modelNumber,
    line.nominalTons,
    line.count,
    line.unitPriceUsd,
    line.extendedCostUsd,
  ];

  const byCommunityRows: ScheduleCell[][] = [];
  for (const total of schedule.communityTotals) {
    for (const line of schedule.byCommunity.filter((l) => l.communityName === total.communityName))
      byCommunityRows.push([total.communityName, ...countCells(line)]);
    byCommunityRows.push([
      total.communityName,
      TOTAL,
      null,
      null,
      null,
      total.lotsWithSystem,
      null,
      total.costUsd,
    ]);
  }
  byCommunityRows.push([
    "All communities",
    TOTAL,
    null,
    null,
    null,
    schedule.totals.lotsWithSystem,
    null,
    schedule.totals.costUsd,
  ]);

  const byMonthRows: ScheduleCell[][] = [];
  for (const total of schedule.communityTotals) {
    const lines = schedule.byMonth.filter((l) => l.communityName === total.communityName);
    for (const line of lines)
      byMonthRows.push([
        total.communityName,
        line.month ?? NO_DATE_LABEL,
        line.systemCode,
        line.count,
        line.unitPriceUsd,
        line.extendedCostUsd,
      ]);
    byMonthRows.push([total.communityName, TOTAL, null, total.lotsWithSystem, null, total.costUsd]);
  }

  const systemRows: ScheduleCell[][] = schedule.systemTotals.map(countCells);
  systemRows.push([TOTAL, null, null, null, schedule.totals.lotsWithSystem, null, schedule.totals.costUsd]);

  const notes: ScheduleCell[][] = [
    ["Lots", schedule.totals.lotCount],
    ["Lots with a system", schedule.totals.lotsWithSystem],
    ["Lots with no fitting system", schedule.totals.lotsWithoutSystem],
    ["Systems without a price (not in the cost)", schedule.totals.unpricedSystemCount],
    ["Total cost (USD)", schedule.totals.costUsd],
    ["Caution", schedule.caution],
  ];

  return [
    {
      name: "by-community",
      sheetName: "By community",
      headers: ["Community", ...countHeaders],
      rows: byCommunityRows,
    },
    {
      name: "by-month",
      sheetName: "By month of start",
      headers: [
        "Community",
        "Planned start (month)",
        "System code",
        "Count",
        "Unit price (USD)",
        "Extended cost (USD)",
      ],
      rows: byMonthRows,
    },
    { name: "system-totals", sheetName: "System totals", headers: countHeaders, rows: systemRows },
    {
      name: "lots-without-system",
      sheetName: "Lots without a system",
      headers: ["Community", "Lot", "Planned start", "Why no system fits"],
      rows: schedule.lotsWithoutSystem.map((lot) => [
        lot.communityName,
        lot.lotNumber,
        lot.plannedStart ?? NO_DATE_LABEL,
        lot.reason,
      ]),
    },
    { name: "notes", sheetName: "Notes", headers: ["Item", "Value"], rows: notes },
  ];
}

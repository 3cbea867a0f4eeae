/**
 * Equipment selection: which catalog systems fit a house's design loads within the account's
 * sizing limits, the best fit (the smallest fitting system), and why every other system does
 * not fit.
 */
import { LoadInputError, type LoadInputIssue } from "../load/errors";
import { toLoadInputIssues } from "../load/input";
import {
  DEFAULT_SIZING_LIMITS,
  catalogSystemSchema,
  selectionLoadsSchema,
  sizingLimitsSchema,
  type CatalogSystem,
  type SelectionLoads,
  type SelectionLoadsInput,
  type SizingLimits,
  type SizingLimitsInput,
} from "./catalog";

export const MISFIT_REASONS = [
  "cooling-too-small",
  "cooling-too-big",
  "sensible-short",
  "latent-short",
  "heating-short",
  "heating-over",
  "no-cooling",
] as const;
export type MisfitReason = (typeof MISFIT_REASONS)[number];

export interface Misfit {
  reason: MisfitReason;
  message: string;
}

export interface SystemEvaluation {
  system: CatalogSystem;
  fits: boolean;
  reasons: Misfit[];
  /** Capacity as a percentage of load, where it applies. */
  coolingPctOfLoad: number | null;
  heatingPctOfLoad: number | null;
}

export interface EquipmentSelection {
  fitting: SystemEvaluation[];
  bestFit: SystemEvaluation | null;
  notFitting: SystemEvaluation[];
  limitsUsed: SizingLimits;
}

/** Whole Btu/h with thousands commas ("12,345"); plain string work, since Intl formatting is slow in bulk reselection. */
const fmt = (n: number) => String(Math.round(n)).replace(/\B(?=(\d{3})+(?!\d))/g, ",");

function pctOf(capacity: number, load: number): number | null {
  return load > 0 ? (100 * capacity) / load : null;
}

export function evaluateSystem(
  system: CatalogSystem,
  loads: SelectionLoads,
  limits: SizingLimits,
): SystemEvaluation {
  const reasons: Misfit[] = [];
  const coolingPct = pctOf(system.coolingTotalBtuh, loads.coolingTotalBtuh);
  const isHeatPump = system.type === "heat-pump" || system.type === "heat-pump-backup";

  if (loads.coolingRequired) {
    if (system.type === "furnace") {
      reasons.push({
        reason: "no-cooling",
        message: "a furnace alone provides no cooling and the house needs it",
      });
    } else {
      const maxPct =
        isHeatPump && loads.heatingBtuh > loads.coolingTotalBtuh
          ? limits.heatPumpCoolingMaxPct
          : limits.coolingMaxPct;
      const minBtuh = (limits.coolingMinPct / 100) * loads.coolingTotalBtuh;
      const maxBtuh = (maxPct / 100) * loads.coolingTotalBtuh;
      if (system.coolingTotalBtuh < minBtuh) {
        reasons.push({
          reason: "cooling-too-small",
          message: `cooling ${fmt(system.coolingTotalBtuh)} Btu/h is below ${limits.coolingMinPct} % of the ${fmt(loads.coolingTotalBtuh)} Btu/h load (${fmt(minBtuh)})`,
        });
      } else if (system.coolingTotalBtuh > maxBtuh) {
        reasons.push({
          reason: "cooling-too-big",
          message: `cooling ${fmt(system.coolingTotalBtuh)} Btu/h is above ${maxPct} % of the ${fmt(loads.coolingTotalBtuh)} Btu/h load (${fmt(maxBtuh)})`,
        });
      }
      if (system.coolingSensibleBtuh < loads.coolingSensibleBtuh) {
        reasons.push({
          reason: "sensible-short",
          message: `sensible capacity ${fmt(system.coolingSensibleBtuh)} Btu/h is short of the ${fmt(loads.coolingSensibleBtuh)} Btu/h sensible load`,
        });
      }
      const latentCapacity = system.coolingTotalBtuh - system.coolingSensibleBtuh;
      if (latentCapacity < loads.coolingLatentBtuh) {
        reasons.push({
          reason: "latent-short",
          message: `latent capacity ${fmt(latentCapacity)} Btu/h is short of the ${fmt(loads.coolingLatentBtuh)} Btu/h latent load (the house would stay humid)`,
        });
      }
    }
  }

  const heatingCapacity =
    system.type === "heat-pump-backup"
      ? system.heatingOutputBtuh + system.backupHeatBtuh
      : system.heatingOutputBtuh;
  const heatingPct = pctOf(heatingCapacity, loads.heatingBtuh);
  const heatMin = (limits.heatingMinPct / 100) * loads.heatingBtuh;
  const heatMax = (limits.heatingMaxPct / 100) * loads.heatingBtuh;
  if (heatingCapacity < heatMin) {
    const what = system.type === "heat-pump-backup" ? "heat pump plus backup heat" : "heating output";
    reasons.push({
      reason: "heating-short",
      message: `${what} ${fmt(heatingCapacity)} Btu/h is below ${limits.heatingMinPct} % of the ${fmt(loads.heatingBtuh)} Btu/h heating load`,
    });
  }
  // The upper heating limit applies to furnaces (an oversized furnace short-cycles); a heat pump's
  // heating capacity follows its cooling size and its backup covers only the shortfall.
  if ((system.type === "furnace" || system.type === "ac-furnace") && heatingCapacity > heatMax) {
    reasons.push({
      reason: "heating-over",
      message: `furnace output ${fmt(heatingCapacity)} Btu/h is above ${limits.heatingMaxPct} % of the ${fmt(loads.heatingBtuh)} Btu/h heating load`,
    });
  }
  return {
    system,
    fits: reasons.length === 0,
    reasons,
    coolingPctOfLoad: coolingPct,
    heatingPctOfLoad: heatingPct,
  };
}

function parseOrThrow<T>(
  parsed: { success: true; data: T } | { success: false; error: import("zod").ZodError },
  prefix: string,
): T {
  if (parsed.success) return parsed.data;
  throw LoadInputError.fromIssues(toLoadInputIssues(parsed.error, prefix));
}

/**
 * Select equipment for one set of design loads.
 * @throws LoadInputError naming the catalog row and field (e.g. `catalog.2.coolingTotalBtuh`).
 */
export function selectEquipment(args: {
  loads: SelectionLoadsInput;
  catalog: readonly unknown[];
  limits?: SizingLimitsInput;
}): EquipmentSelection {
  const loads = parseOrThrow(selectionLoadsSchema.safeParse(args.loads), "loads");
  const limits = args.limits
    ? parseOrThrow(sizingLimitsSchema.safeParse(args.limits), "limits")
    : { ...DEFAULT_SIZING_LIMITS };
  return selectFromParsed({ loads, catalog: parseCatalog(args.catalog), limits });
}

/** Validates a catalog once (every bad row named), for many selections with `selectFromParsed`. */
export function parseCatalog(raw: readonly unknown[]): CatalogSystem[] {
  const issues: LoadInputIssue[] = [];
  const catalog: CatalogSystem[] = [];
  raw.forEach((row, i) => {
    const parsed = catalogSystemSchema.safeParse(row);
    if (parsed.success) catalog.push(parsed.data);
    else issues.push(...toLoadInputIssues(parsed.error, `catalog.${i}`));
  });
  if (issues.length > 0) throw LoadInputError.fromIssues(issues);
  return catalog;
}

/**
 * The selection itself, for inputs already validated (a bulk recompute selects for thousands of
 * lots with one parsed catalog). `selectEquipment` validates and calls it.
 */
export function selectFromParsed({
  loads,
  catalog,
  limits,
}: {
  loads: SelectionLoads;
  catalog: readonly CatalogSystem[];
  limits: SizingLimits;
}): EquipmentSelection {
  const evaluations = catalog.map((system) => evaluateSystem(system, loads, limits));
  const fitting = evaluations
    .filter((e) => e.fits)
    .sort(
      (a, b) =>
        a.system.coolingTotalBtuh - b.system.coolingTotalBtuh ||
        a.system.heatingOutputBtuh +
          a.system.backupHeatBtuh -
          (b.system.heatingOutputBtuh + b.system.backupHeatBtuh) ||
        (a.system.priceUsd ?? Infinity) - (b.system.priceUsd ?? Infinity),
    );
  return {
    fitting,
    bestFit: fitting[0] ?? null,
    notFitting: evaluations.filter((e) => !e.fits),
    limitsUsed: limits,
  };
}

/** The selection loads from a load-engine facing result. */
export function loadsFromFacing(result: {
  heating: { totalBtuh: number };
  cooling: { sensibleBtuh: number; latentBtuh: number; totalBtuh: number };
}): SelectionLoads {
  return {
    heatingBtuh: result.heating.totalBtuh,
    coolingSensibleBtuh: result.cooling.sensibleBtuh,
    coolingLatentBtuh: result.cooling.latentBtuh,
    coolingTotalBtuh: result.cooling.totalBtuh,
    coolingRequired: true,
  };
}

/**
 * The plain data of one lot's load report (`LotReport`), its schema, and the one mapping from
 * engine output, plan input, site and equipment choice to it (`lotReportFromResults`), shared
 * by the routes, the tests and the benchmark.
 */
import { z } from "zod";
import {
  catalogSystemSchema,
  DEFAULT_SIZING_LIMITS,
  sizingLimitsSchema,
  type CatalogSystemInput,
  type SizingLimits,
  type SizingLimitsInput,
  type SystemType,
  SYSTEM_TYPES,
} from "../equipment/catalog";
import {
  evaluateSystem,
  loadsFromFacing,
  type EquipmentSelection,
  type SystemEvaluation,
} from "../equipment/select";
import {
  safeParsePlanInput,
  safeParseSiteConditions,
  FACADES,
  type Facade,
  type PlanInput,
  type SiteConditions,
} from "../load/input";
import {
  COOLING_LATENT_COMPONENTS,
  COOLING_SENSIBLE_COMPONENTS,
  HEATING_COMPONENTS,
  type CoolingLatentComponent,
  type CoolingSensibleComponent,
  LOAD_PROCEDURES,
  type FacingLoads,
} from "../load/results";
import { heatPumpOutputAtF, type EquipmentCatalogEntry } from "../workbook/equipment-columns";
import { LoadInputError } from "../load/errors";
import { ReportInputError } from "./errors";

/**
 * The caution every page of a report carries: results are design estimates; local codes and a
 * licensed professional govern; no procedure is claimed as approved or certified.
 */
export const REPORT_CAUTION =
  "Results are design estimates, by the handbook's published residential load-factor procedure as implemented in Platload or by " +
  "Platload's own hourly method (the report names which); neither is a certified implementation, and it is not the approved procedure " +
  "of any standard or code. Local codes and a licensed professional's review govern.";

const finite = z.number().refine(Number.isFinite, { error: "must be a finite number" });
const nonNegative = finite.refine((value) => value >= 0, { error: "must be 0 or more" });
const text = (what: string) =>
  z
    .string({ error: `required: ${what}` })
    .trim()
    .min(1, { error: `required: ${what}` });

const constructionRowSchema = z.object({
  /** Where it is ("All facades", "Front facade", "Floor over garage"…). */
  where: z.string(),
  /** The base assembly the engine knows (framing, block, joists). */
  baseAssembly: z.string(),
  /** ADDED insulation as installed, R (h·ft²·°F/Btu). */
  cavityR: nonNegative,
  continuousR: nonNegative,
  /** A whole-assembly U-factor entered directly (it replaces the base assembly and added insulation), Btu/h·ft²·°F. */
  uFactor: nonNegative.nullable().default(null),
  areaFt2: nonNegative.nullable(),
});
export type ConstructionRow = z.output<typeof constructionRowSchema>;

const windowRowSchema = z.object({
  facade: z.enum(FACADES),
  /** Compass direction the facade faces on this lot (N, NE, …). */
  faces: z.string(),
  areaFt2: nonNegative,
  /** Area-weighted over the facade's window groups. */
  uFactor: nonNegative,
  shgc: nonNegative,
  overhangDepthFt: nonNegative,
  doorAreaFt2: nonNegative,
  windowGroups: z.number().int().min(0),
});
export type WindowRow = z.output<typeof windowRowSchema>;

const envelopeSchema = z.object({
  conditionedFloorAreaFt2: nonNegative,
  stories: z.number().int().min(1),
  bedrooms: z.number().int().min(0),
  volumeFt3: nonNegative,
  walls: z.array(constructionRowSchema),
  /** "vented" (insulation on the ceiling), "encapsulated" (under the roof deck) or "none". */
  atticKind: z.string(),
  /** Ceiling (vented attic) or roof deck (encapsulated attic) with its added insulation. */
  atticInsulation: constructionRowSchema.nullable(),
  vaultedCeiling: constructionRowSchema.nullable(),
  foundationKind: z.string(),
  slabEdge: z
    .object({
      perimeterFt: nonNegative,
      insulationR: nonNegative,
      depthFt: nonNegative,
      fFactor: nonNegative.nullable().default(null),
    })
    .nullable(),
  foundationWalls: z
    .object({ areaFt2: nonNegative, insulationR: nonNegative, uFactor: nonNegative.nullable().default(null) })
    .nullable(),
  floors: z.array(constructionRowSchema),
  windows: z.array(windowRowSchema),
  skylights: z.object({ areaFt2: nonNegative, uFactor: nonNegative, shgc: nonNegative }).nullable(),
  ach50: nonNegative.nullable(),
  cfm50: nonNegative.nullable(),
  effectiveLeakageAreaIn2: nonNegative.nullable().default(null),
  ducts: z.object({
    location: z.string(),
    insulationR: nonNegative,
    supplyLeakagePct: nonNegative,
    returnLeakagePct: nonNegative,
  }),
  ventilation: z.object({
    kind: z.string(),
    cfm: nonNegative,
    sensibleRecovery: nonNegative,
    latentRecovery: nonNegative,
  }),
});
export type EnvelopeSummary = z.output<typeof envelopeSchema>;

const selectedSystemSchema = z.object({
  status: z.literal("selected"),
  systemCode: text("the system code"),
  systemType: z.enum(SYSTEM_TYPES),
  modelNumbers: z.string(),
  outdoorModel: z.string().nullable(),
  indoorModel: z.string().nullable(),
  furnaceModel: z.string().nullable(),
  nominalTons: nonNegative.nullable(),
  coolingTotalBtuh: nonNegative,
  coolingSensibleBtuh: nonNegative,
  /** Furnace output, or the heat pump's output at the heating design temperature. */
  heatingOutputBtuh: nonNegative,
  backupHeatBtuh: nonNegative,
  /** How the heating output was found ("heat pump at 24 °F, on the line through its 47 °F and 17 °F ratings"). */
  heatingOutputNote: z.string().nullable(),
  /** Cooling capacity ÷ cooling total load, %; null without a cooling load. */
  coolingRatioPct: nonNegative.nullable(),
  /** Heating capacity (with backup) ÷ heating load, %; null without a heating load. */
  heatingRatioPct: nonNegative.nullable(),
  /** A purchaser chose this system over the selection. */
  overridden: z.boolean(),
  overrideNote: z.string().nullable(),
  /** Why the system falls outside the limits (an override may); empty when it fits. */
  outsideLimits: z.array(z.string()),
});
const noSystemSchema = z.object({ status: z.literal("none"), reason: text("why no system fits") });

export const lotReportSchema = z.object({
  builderAccountName: text("the builder account's name"),
  communityName: text("the community name"),
  lotNumber: text("the lot number"),
  address: z.string().nullable(),
  plan: z.object({
    code: text("the plan code"),
    name: z.string(),
    revisionNumber: z.number().int().min(1),
    status: text("the plan status"),
  }),
  facing: z.object({
    label: text("the facing label"),
    degrees: finite.refine((d) => d >= 0 && d < 360, { error: "must be 0 to less than 360°" }),
  }),
  designConditions: z.object({
    location: z.string(),
    latitudeDeg: finite,
    elevationFt: finite,
    heatingOutdoorDbF: finite,
    coolingOutdoorDbF: finite,
    coolingOutdoorWbF: finite,
    dailyRangeF: finite,
    designMonth: z.number().int().min(1).max(12),
    indoorHeatingF: finite,
    indoorCoolingF: finite,
    indoorCoolingRhPct: finite,
  }),
  envelope: envelopeSchema,
  heating: z.object({
    totalBtuh: nonNegative,
    outdoorF: finite,
    indoorF: finite,
    byComponent: z.array(z.object({ component: z.string(), btuh: finite })),
  }),
  cooling: z.object({
    sensibleBtuh: nonNegative,
    latentBtuh: nonNegative,
    totalBtuh: nonNegative,
    /** Solar hour of the peak; null for a procedure that gives the peak only. */
    peakHour: z.number().int().min(1).max(24).nullable(),
    byComponent: z.array(z.object({ component: z.string(), sensibleBtuh: finite, latentBtuh: finite })),
    /** Solar hours 1–24, or empty for a procedure that gives the peak only. */
    hourlySensibleBtuh: z.array(finite).refine((values) => values.length === 0 || values.length === 24, {
      error:
        "must hold 24 hourly values (solar hours 1–24), or none for a procedure that gives the peak only",
    }),
    tons: nonNegative,
    floorAreaPerTonFt2: nonNegative,
    airflowCfm: nonNegative,
    sensibleHeatRatio: nonNegative,
  }),
  equipment: z.discriminatedUnion("status", [selectedSystemSchema, noSystemSchema]),
  sizingLimits: sizingLimitsSchema,
  approval: z
    .object({
      reviewerName: text("the reviewer's name"),
      credential: z.string(),
      approvedOn: text("the approval date"),
    })
    .nullable(),
  engineVersion: text("the engine version"),
  /** The procedure the loads come from (the account's, or the permit snapshot's). */
  procedure: z.enum(LOAD_PROCEDURES, { error: `must be one of ${LOAD_PROCEDURES.join(", ")}` }),
  /** ISO date-time the report was generated. */
  generatedAt: text("the date generated"),
  /** The engine's notes on assumed defaults. */
  notes: z.array(z.string()),
});

/** One lot's report: plain data the routes fill (through lotReportFromResults) and the PDF draws. */
export type LotReport = z.output<typeof lotReportSchema>;
export type LotReportEquipment = LotReport["equipment"];

/** Validates reports; throws ReportInputError naming every bad field (`reports.2.cooling.tons`). */
export function parseLotReports(reports: readonly unknown[]): LotReport[] {
  if (reports.length === 0)
    throw new ReportInputError([{ field: "reports", message: "at least one lot report is needed" }]);
  const issues: { field: string; message: string }[] = [];
  const parsed: LotReport[] = [];
  reports.forEach((report, index) => {
    const result = lotReportSchema.safeParse(report);
    if (result.success) parsed.push(result.data);
    else
      for (const issue of result.error.issues)
        issues.push({
          field: ["reports", index, ...issue.path].map(String).join("."),
          message: issue.message,
        });
  });
  if (issues.length > 0) throw new ReportInputError(issues);
  return parsed;
}

// ---------------------------------------------------------------------------------------------
// Labels.

export const HEATING_COMPONENT_LABELS: Record<CoolingSensibleComponent, string> = {
  walls: "Walls",
  windows: "Windows",
  doors: "Doors",
  ceilings: "Ceilings under the attic",
  vaultedCeilings: "Vaulted ceilings",
  skylights: "Skylights",
  floors: "Framed floors",
  slab: "Slab",
  foundationWalls: "Foundation walls",
  garageWall: "Wall and door to the garage",
  infiltration: "Infiltration",
  ventilation: "Ventilation",
  ducts: "Ducts",
  internal: "People and appliances",
  temperatureSwing: "Indoor swing credit",
};

const COMPASS_8 = ["N", "NE", "E", "SE", "S", "SW", "W", "NW"] as const;

/** Degrees clockwise from north → N, NE, E, … (nearest of eight). */
export function compassLabel(degrees: number): string {
  const normalized = ((degrees % 360) + 360) % 360;
  return COMPASS_8[Math.round(normalized / 45) % 8];
}

export const SYSTEM_TYPE_LABELS: Record<SystemType, string> = {
  "ac-furnace": "Air conditioner with furnace",
  "heat-pump": "Heat pump",
  "heat-pump-backup": "Heat pump with backup heat",
  furnace: "Furnace only",
};

// ---------------------------------------------------------------------------------------------
// Equipment choice of a lot.

/** The system of a lot: the selection's best fit or a purchaser's override, or none with the reason. */
export type LotSystemChoice =
  | { system: CatalogSystemInput | EquipmentCatalogEntry; overridden?: boolean; overrideNote?: string | null }
  | { system: null; reason: string };

const MISFIT_SHORT: Record<string, string> = {
  "cooling-too-small": "cooling too small",
  "cooling-too-big": "cooling too big",
  "sensible-short": "sensible capacity short",
  "latent-short": "latent capacity short",
  "heating-short": "heating short",
  "heating-over": "furnace too big",
  "no-cooling": "no cooling",
};

/** The closest misfit: a system that cools when the house needs cooling, fewest reasons, then cooling capacity nearest the load. */
function closest(evaluations: readonly SystemEvaluation[]): SystemEvaluation | undefined {
  const cooling = evaluations.filter((e) => !e.reasons.some((r) => r.reason === "no-cooling"));
  return [...(cooling.length > 0 ? cooling : evaluations)].sort(
    (a, b) =>
      a.reasons.length - b.reasons.length ||
      Math.abs((a.coolingPctOfLoad ?? 1e9) - 100) - Math.abs((b.coolingPctOfLoad ?? 1e9) - 100),
  )[0];
}

/** lib/equipment's selection → the lot's choice; when nothing fits, the reason names the closest system's shortfalls. */
export function systemChoiceFromSelection(selection: EquipmentSelection): LotSystemChoice {
  if (selection.bestFit) return { system: selection.bestFit.system };
  if (selection.notFitting.length === 0) return { system: null, reason: "The catalog has no systems." };
  const tally = new Map<string, number>();
  for (const evaluation of selection.notFitting)
    for (const misfit of evaluation.reasons) tally.set(misfit.reason, (tally.get(misfit.reason) ?? 0) + 1);
  const near = closest(selection.notFitting);
  const nearText = near
    ? ` Closest: ${near.system.id}, ${near.reasons.map((r) => r.message).join("; ")}.`
    : "";
  const tallyText = [...tally.entries()]
    .map(([reason, count]) => `${MISFIT_SHORT[reason] ?? reason} (${count})`)
    .join(", ");
  return {
    system: null,
    reason: `No catalog system fits within the sizing limits.${nearText} Reasons over the catalog: ${tallyText}.`,
  };
}

// ---------------------------------------------------------------------------------------------
// The mapping.

export interface LotReportSource {
  builderAccountName: string;
  communityName: string;
  lot: { lotNumber: string; address?: string | null; facingLabel?: string | null };
  plan: { code: string; name: string; revisionNumber: number; status: string; input: unknown };
  /** The community's site and design conditions (raw or parsed). */
  site: unknown;
  /** The engine's result for this plan at this lot's facing. */
  loads: FacingLoads;
  selection: LotSystemChoice;
  /** The account's limits (defaults: the documented ones). */
  sizingLimits?: SizingLimitsInput;
  approval?: { reviewerName: string; credential: string; approvedOn: string } | null;
  generatedAt?: Date | string;
}

const round = (value: number, places = 0) => {
  const factor = 10 ** places;
  return Math.round(value * factor) / factor;
};

function envelopeFrom(plan: PlanInput, loads: FacingLoads): EnvelopeSummary {
  const walls: ConstructionRow[] = [
    {
      where: "All facades",
      baseAssembly: plan.wall.baseId,
      cavityR: plan.wall.cavityR,
      continuousR: plan.wall.continuousR,
      uFactor: plan.wall.uFactor ?? null,
      areaFt2: null,
    },
  ];
  for (const facade of FACADES) {
    const own = plan.facades[facade].wall;
    if (own)
      walls.push({
        where: `${facade[0].toUpperCase()}${facade.slice(1)} facade`,
        baseAssembly: own.baseId,
        cavityR: own.cavityR,
        continuousR: own.continuousR,
        uFactor: own.uFactor ?? null,
        areaFt2: plan.facades[facade].grossWallAreaFt2,
      });
  }
  if (plan.garage.wallAreaFt2 > 0)
    walls.push({
      where: "Wall to garage",
      baseAssembly: plan.wall.baseId,
      cavityR: plan.wall.cavityR,
      continuousR: plan.wall.continuousR,
      uFactor: plan.wall.uFactor ?? null,
      areaFt2: plan.garage.wallAreaFt2,
    });
  if (
    walls.length > 1 &&
    walls[0].where === "All facades" &&
    walls.slice(1).some((w) => w.where.endsWith("facade"))
  )
    walls[0].where = "Facades not listed below";

  const ceilingAreaFt2 = plan.attic.ceilingAreaFt2 ?? plan.conditionedFloorAreaFt2 / plan.stories;
  let atticInsulation: ConstructionRow | null = null;
  if (plan.attic.kind === "vented")
    atticInsulation = {
      where: "Ceiling under vented attic",
      baseAssembly: plan.attic.ceiling.baseId,
      cavityR: plan.attic.ceiling.cavityR,
      continuousR: plan.attic.ceiling.continuousR,
      uFactor: plan.attic.ceiling.uFactor ?? null,
      areaFt2: round(ceilingAreaFt2),
    };
  else if (plan.attic.kind === "encapsulated")
    atticInsulation = {
      where: "Roof deck of encapsulated attic",
      baseAssembly: plan.attic.roofDeck.baseId,
      cavityR: plan.attic.roofDeck.cavityR,
      continuousR: plan.attic.roofDeck.continuousR,
      uFactor: plan.attic.roofDeck.uFactor ?? null,
      areaFt2: round(ceilingAreaFt2),
    };

  const floors: ConstructionRow[] = [];
  if (plan.foundation.floorAreaFt2 > 0)
    floors.push({
      where: `Floor over ${plan.foundation.kind === "vented-crawlspace" ? "crawlspace" : "basement"}`,
      baseAssembly: plan.foundation.floor.baseId,
      cavityR: plan.foundation.floor.cavityR,
      continuousR: plan.foundation.floor.continuousR,
      uFactor: plan.foundation.floor.uFactor ?? null,
      areaFt2: plan.foundation.floorAreaFt2,
    });
  if (plan.garage.floorOverAreaFt2 > 0)
    floors.push({
      where: "Floor over garage",
      baseAssembly: plan.garage.floorOver.baseId,
      cavityR: plan.garage.floorOver.cavityR,
      continuousR: plan.garage.floorOver.continuousR,
      uFactor: plan.garage.floorOver.uFactor ?? null,
      areaFt2: plan.garage.floorOverAreaFt2,
    });
  if (plan.floorOverOutdoors.areaFt2 > 0)
    floors.push({
      where: "Floor over outdoors",
      baseAssembly: plan.floorOverOutdoors.construction.baseId,
      cavityR: plan.floorOverOutdoors.construction.cavityR,
      continuousR: plan.floorOverOutdoors.construction.continuousR,
      uFactor: plan.floorOverOutdoors.construction.uFactor ?? null,
      areaFt2: plan.floorOverOutdoors.areaFt2,
    });

  const windows: WindowRow[] = FACADES.map((facade: Facade) => {
    const f = plan.facades[facade];
    const groups = [f.window, ...f.extraWindows].filter((group) => group.areaFt2 > 0);
    const areaFt2 = groups.reduce((sum, group) => sum + group.areaFt2, 0);
    const weighted = (pick: (group: (typeof groups)[number]) => number) =>
      areaFt2 > 0
        ? groups.reduce((sum, group) => sum + pick(group) * group.areaFt2, 0) / areaFt2
        : pick(f.window);
    return {
      facade,
      faces: compassLabel(loads.facadeAzimuthsDeg[facade]),
      areaFt2,
      uFactor: round(
        weighted((group) => group.uFactor),
        3,
      ),
      shgc: round(
        weighted((group) => group.shgc),
        3,
      ),
      overhangDepthFt: f.window.overhangDepthFt,
      doorAreaFt2: f.doorAreaFt2,
      windowGroups: groups.length,
    };
  });

  const slabLike = plan.foundation.kind === "slab-on-grade" || plan.foundation.slabPerimeterFt > 0;
  return {
    conditionedFloorAreaFt2: plan.conditionedFloorAreaFt2,
    stories: plan.stories,
    bedrooms: plan.bedrooms,
    volumeFt3: round(plan.volumeFt3 ?? plan.conditionedFloorAreaFt2 * plan.ceilingHeightFt),
    walls,
    atticKind: plan.attic.kind,
    atticInsulation,
    vaultedCeiling:
      plan.vaultedCeiling.areaFt2 > 0
        ? {
            where: "Vaulted ceiling",
            baseAssembly: plan.vaultedCeiling.construction.baseId,
            cavityR: plan.vaultedCeiling.construction.cavityR,
            continuousR: plan.vaultedCeiling.construction.continuousR,
            uFactor: plan.vaultedCeiling.construction.uFactor ?? null,
            areaFt2: plan.vaultedCeiling.areaFt2,
          }
        : null,
    foundationKind: plan.foundation.kind,
    slabEdge: slabLike
      ? {
          perimeterFt: plan.foundation.slabPerimeterFt,
          insulationR: plan.foundation.slabEdgeInsulationR,
          depthFt: plan.foundation.slabEdgeInsulationDepthFt,
          fFactor: plan.foundation.slabFFactor ?? null,
        }
      : null,
    foundationWalls:
      plan.foundation.foundationWallAreaFt2 > 0
        ? {
            areaFt2: plan.foundation.foundationWallAreaFt2,
            insulationR: plan.foundation.foundationWallInsulationR,
            uFactor: plan.foundation.foundationWallUFactor ?? null,
          }
        : null,
    floors,
    windows,
    skylights:
      plan.skylights.areaFt2 > 0
        ? { areaFt2: plan.skylights.areaFt2, uFactor: plan.skylights.uFactor, shgc: plan.skylights.shgc }
        : null,
    ach50: plan.infiltration.ach50 ?? null,
    cfm50: plan.infiltration.cfm50 ?? null,
    effectiveLeakageAreaIn2: plan.infiltration.effectiveLeakageAreaIn2 ?? null,
    ducts: {
      location: plan.ducts.location,
      insulationR: plan.ducts.insulationR,
      supplyLeakagePct: plan.ducts.supplyLeakagePct,
      returnLeakagePct: plan.ducts.returnLeakagePct,
    },
    ventilation: {
      kind: plan.ventilation.kind,
      cfm: round(loads.ventilation.providedCfm),
      sensibleRecovery: plan.ventilation.sensibleRecoveryEffectiveness,
      latentRecovery: plan.ventilation.latentRecoveryEffectiveness,
    },
  };
}

function equipmentFrom(
  choice: LotSystemChoice,
  loads: FacingLoads,
  site: SiteConditions,
  limits: SizingLimits,
): LotReportEquipment {
  if (choice.system === null) return { status: "none", reason: choice.reason };
  const entry = choice.system as EquipmentCatalogEntry;
  const isHeatPump = entry.type === "heat-pump" || entry.type === "heat-pump-backup";
  let heatingOutputBtuh = entry.heatingOutputBtuh ?? 0;
  let heatingOutputNote: string | null = null;
  if (isHeatPump && entry.heatPump47FBtuh !== undefined && entry.heatPump17FBtuh !== undefined) {
    heatingOutputBtuh = round(
      heatPumpOutputAtF(
        { heatPump47FBtuh: entry.heatPump47FBtuh, heatPump17FBtuh: entry.heatPump17FBtuh },
        site.heatingOutdoorDbF,
      ),
    );
    heatingOutputNote = `heat pump at the ${site.heatingOutdoorDbF} °F heating design temperature, on the line through its 47 °F (${round(entry.heatPump47FBtuh).toLocaleString("en-US")} Btu/h) and 17 °F (${round(entry.heatPump17FBtuh).toLocaleString("en-US")} Btu/h) ratings`;
  } else if (isHeatPump) {
    heatingOutputNote = "heat pump output as entered in the catalog";
  }
  const parsed = catalogSystemSchema.safeParse({ ...entry, heatingOutputBtuh });
  if (!parsed.success) {
    throw new ReportInputError(
      parsed.error.issues.map((issue) => ({
        field: ["selection", "system", ...issue.path].map(String).join("."),
        message: issue.message,
      })),
    );
  }
  const evaluation = evaluateSystem(parsed.data, loadsFromFacing(loads), limits);
  return {
    status: "selected",
    systemCode: parsed.data.id,
    systemType: parsed.data.type,
    modelNumbers: parsed.data.modelNumber,
    outdoorModel: entry.outdoorModel ?? null,
    indoorModel: entry.indoorModel ?? null,
    furnaceModel: entry.furnaceModel ?? null,
    nominalTons: parsed.data.nominalTons ?? null,
    coolingTotalBtuh: parsed.data.coolingTotalBtuh,
    coolingSensibleBtuh: parsed.data.coolingSensibleBtuh,
    heatingOutputBtuh: parsed.data.heatingOutputBtuh,
    backupHeatBtuh: parsed.data.backupHeatBtuh,
    heatingOutputNote,
    coolingRatioPct: evaluation.coolingPctOfLoad === null ? null : round(evaluation.coolingPctOfLoad, 1),
    heatingRatioPct: evaluation.heatingPctOfLoad === null ? null : round(evaluation.heatingPctOfLoad, 1),
    overridden: choice.overridden ?? false,
    overrideNote: choice.overrideNote ?? null,
    outsideLimits: evaluation.reasons.map((reason) => reason.message),
  };
}

/**
 * Builds one lot's report from plain pieces: the engine's FacingLoads for the lot's facing,
 * the plan input (raw or parsed), the site (raw or parsed), the equipment choice and the
 * account's sizing limits. Sizing ratios are computed here with lib/equipment's evaluation,
 * so a report and the selection agree.
 *
 * @throws LoadInputError for a bad plan or site; ReportInputError when the loads are not for
 *   this lot's facing, or the chosen system is not a valid catalog system.
 */
export function lotReportFromResults(source: LotReportSource): LotReport {
  const planResult = safeParsePlanInput(source.plan.input);
  if (!planResult.ok)
    throw LoadInputError.fromIssues(
      planResult.issues.map((issue) => ({ ...issue, field: `plan.input.${issue.field}` })),
    );
  const siteResult = safeParseSiteConditions(source.site);
  if (!siteResult.ok)
    throw LoadInputError.fromIssues(
      siteResult.issues.map((issue) => ({ ...issue, field: `site.${issue.field}` })),
    );
  const plan = planResult.value;
  const site = siteResult.value;
  const limits = sizingLimitsSchema.parse(source.sizingLimits ?? DEFAULT_SIZING_LIMITS);
  const loads = source.loads;
  const degrees = ((loads.facingAzimuthDeg % 360) + 360) % 360;

  const heatingRows = HEATING_COMPONENTS.map((component) => ({
    component: HEATING_COMPONENT_LABELS[component],
    btuh: round(loads.heating.byComponent[component]),
  })).filter((row) => row.btuh !== 0);
  const coolingRows = COOLING_SENSIBLE_COMPONENTS.map((component) => ({
    component: HEATING_COMPONENT_LABELS[component],
    sensibleBtuh: round(loads.cooling.sensibleByComponent[component]),
    latentBtuh: (COOLING_LATENT_COMPONENTS as readonly string[]).includes(component)
      ? round(loads.cooling.latentByComponent[component as CoolingLatentComponent])
      : 0,
  })).filter((row) => row.sensibleBtuh !== 0 || row.latentBtuh !== 0);

  const generatedAt =
    source.generatedAt === undefined
      ? new Date().toISOString()
      : typeof source.generatedAt === "string"
        ? source.generatedAt
        : source.generatedAt.toISOString();

  const report = {
    builderAccountName: source.builderAccountName,
    communityName: source.communityName,
    lotNumber: source.lot.lotNumber,
    address: source.lot.address ?? null,
    plan: {
      code: source.plan.code,
      name: source.plan.name,
      revisionNumber: source.plan.revisionNumber,
      status: source.plan.status,
    },
    facing: { label: source.lot.facingLabel || compassLabel(degrees), degrees: round(degrees, 1) },
    designConditions: {
      location: site.name ?? source.communityName,
      latitudeDeg: site.latitudeDeg,
      elevationFt: site.elevationFt,
      heatingOutdoorDbF: site.heatingOutdoorDbF,
      coolingOutdoorDbF: site.coolingOutdoorDbF,
      coolingOutdoorWbF: site.coolingOutdoorWbF,
      dailyRangeF: site.dailyRangeF,
      designMonth: site.designMonth,
      indoorHeatingF: site.indoorHeatingF,
      indoorCoolingF: site.indoorCoolingF,
      indoorCoolingRhPct: site.indoorCoolingRhPct,
    },
    envelope: envelopeFrom(plan, loads),
    heating: {
      totalBtuh: round(loads.heating.totalBtuh),
      outdoorF: loads.heating.outdoorF,
      indoorF: loads.heating.indoorF,
      byComponent: heatingRows,
    },
    cooling: {
      sensibleBtuh: round(loads.cooling.sensibleBtuh),
      latentBtuh: round(loads.cooling.latentBtuh),
      totalBtuh: round(loads.cooling.totalBtuh),
      peakHour: loads.cooling.peakHour,
      byComponent: coolingRows,
      hourlySensibleBtuh: loads.cooling.hourlySensibleBtuh.map((value) => round(value)),
      tons: round(loads.cooling.tons, 2),
      floorAreaPerTonFt2: round(loads.cooling.floorAreaPerTonFt2),
      airflowCfm: round(loads.cooling.airflowCfm),
      sensibleHeatRatio: round(loads.cooling.sensibleHeatRatio, 2),
    },
    equipment: equipmentFrom(source.selection, loads, site, limits),
    sizingLimits: limits,
    approval: source.approval ?? null,
    engineVersion: loads.engineVersion,
    procedure: loads.procedure,
    generatedAt,
    notes: [...loads.notes],
  };
  const parsed = lotReportSchema.safeParse(report);
  if (!parsed.success) {
    throw new ReportInputError(
      parsed.error.issues.map((issue) => ({
        field: issue.path.map(String).join(".") || "(report)",
        message: issue.message,
      })),
    );
  }
  return parsed.data;
}

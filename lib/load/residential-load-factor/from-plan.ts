/**
 * The engine's plan model (lib/load/input.ts) as an RLF house description, and the RLF loads of one
 * facing in the engine's result shapes (lib/load/results.ts).
 *
 * U-factors come from the engine's assembly library (lib/load/assemblies.ts), evaluated for heating
 * conditions as ch. 17 asks ("U-factors should be evaluated under heating (winter) conditions").
 * Facade azimuths: front = facing, left = facing + 90°, back = facing + 180°, right = facing + 270°.
 * Components the chapter does not treat map to its nearest treatment; each mapping is a note.
 *
 * Callers validate plan and site once at their edge (parsePlanInput / parseSiteConditions); no zod here.
 */
import {
  aboveGradeFoundationWallU,
  belowGradeWallU,
  ceilingU,
  floorU,
  roofU,
  slabFFactor,
  wallU,
} from "../assemblies";
import { facadeAzimuthsDeg, normalizeAzimuth } from "../facing";
import { ENGINE_VERSION } from "../version";
import { LoadInputError } from "../errors";
import { internalGains, occupantsOf } from "../internal-gains";
import {
  FACADES,
  type DuctLocation,
  type Facade,
  type PlanInput,
  type SiteConditions,
  type WindowGroup,
} from "../input";
import {
  COOLING_LATENT_COMPONENTS,
  COOLING_SENSIBLE_COMPONENTS,
  HEATING_COMPONENTS,
  type ComponentLoads,
  type CoolingResult,
  type CoolingSensibleComponent,
  type FacingLoads,
  type HeatingComponent,
  type HeatingResult,
} from "../results";
import { BTUH_PER_TON, GRAINS_PER_LB } from "../units";
import { checkRlfApplicability, type RlfApplicabilityFinding } from "./applicability";
import {
  residentialLoadFactorLoads,
  ventilationRateEq11Cfm,
  type RlfDucts,
  type RlfFenestrationGroup,
  type RlfHouse,
  type RlfLeakage,
  type RlfOpaqueComponent,
  type RlfOptions,
  type RlfResult,
  type RlfSlab,
  type RlfVentilation,
} from "./procedure";
import { W_M2K_PER_BTUH_FT2F } from "./tables";
import { SLAB_FLOOR_COVERING_R_SI } from "../slab";

export const RLF_CAUTION =
  "Design estimate only, by the simplified residential load factor method published in the 2021 ASHRAE Handbook—" +
  "Fundamentals, chapter 17. It is not the approved procedure of any standard or code. Local codes and a licensed " +
  "professional's review govern equipment sizing.";

export interface RlfFromPlanOptions {
  /**
   * Slab floor covering resistance R_cvr, h·ft²·°F/Btu, replacing the plan's `slabFloorCovering` choice (which
   * maps to lib/load/slab.ts SLAB_FLOOR_COVERING_R_SI: carpet 0.21 m²·K/W as the ch. 17 example, tile from memory, bare 0).
   */
  slabFloorCoveringR?: number;
  /** Options of the procedure (table lookup, peak irradiance source, air factor elevation correction). */
  rlf?: RlfOptions;
}

const FACADE_OFFSET_DEG: Record<Facade, number> = { front: 0, left: 90, back: 180, right: 270 };

/** Ground temperature for below-grade heating losses: the engine's rough estimate, the mean of the design dry bulbs (from memory). */
function groundHeatingF(site: SiteConditions): number {
  return (site.heatingOutdoorDbF + site.coolingOutdoorDbF) / 2;
}

interface WindowTemplate {
  facade: Facade;
  index: number;
  w: WindowGroup;
}

/** The facing-independent part of the description, with the windows still to be oriented. */
interface PlanBase {
  house: Omit<RlfHouse, "fenestration">;
  windows: WindowTemplate[];
  skylight: RlfFenestrationGroup | null;
  garageHeatingF: number;
  atticHeatingF: number | null;
  basementHeatingF: number | null;
  providedVentilationCfm: number;
}

function ductsOf(plan: PlanInput, notes: string[]): RlfDucts {
  const d = plan.ducts;
  if (d.method === "conduction-leakage") {
    notes.push(
      "Ducts: the plan asks for the conduction-leakage model; the RLF method uses the ch. 17 Table 6 duct factors instead.",
    );
  }
  const table = (location: "attic" | "basement" | "crawlspace"): RlfDucts => ({
    method: "table-6",
    location,
    insulationR: d.insulationR,
    supplyLeakagePct: d.supplyLeakagePct,
    returnLeakagePct: d.returnLeakagePct,
    heatingSystem: d.heatingSystem,
  });
  const loc: DuctLocation = d.location;
  switch (loc) {
    case "conditioned-space":
    case "conditioned-crawlspace":
      return { method: "none" };
    case "vented-attic":
      return table("attic");
    case "vented-crawlspace":
      return table("crawlspace");
    case "unconditioned-basement":
      return table("basement");
    case "encapsulated-attic":
      notes.push(
        "Ducts in an encapsulated attic: ch. 17 Table 6 has no row for it; the basement row (a buffer space near indoor temperature) is used as the nearest.",
      );
      return table("basement");
    case "garage":
      notes.push(
        "Ducts in the garage: ch. 17 Table 6 has no row for it; the attic row is used (the hottest buffer in cooling, outdoor temperature in heating; conservative).",
      );
      return table("attic");
  }
}

function buildBase(plan: PlanInput, site: SiteConditions, options: RlfFromPlanOptions | undefined): PlanBase {
  const notes: string[] = [];
  const opaque: RlfOpaqueComponent[] = [];
  const ti = site.indoorHeatingF;
  const to = site.heatingOutdoorDbF;

  // Facades: walls and doors (orientation-free in Table 7), windows kept for orientation.
  const windows: WindowTemplate[] = [];
  let masonry = false;
  for (const facade of FACADES) {
    const f = plan.facades[facade];
    const wall = f.wall ?? plan.wall;
    if (wall.baseId.startsWith("cmu")) masonry = true;
    const groups = [f.window, ...f.extraWindows];
    let windowFt2 = 0;
    for (let i = 0; i < groups.length; i++) {
      if (groups[i].areaFt2 > 0) {
        windows.push({ facade, index: i, w: groups[i] });
        windowFt2 += groups[i].areaFt2;
      }
    }
    const netFt2 = f.grossWallAreaFt2 - windowFt2 - f.doorAreaFt2;
    if (netFt2 > 0) {
      opaque.push({
        label: `Wall, ${facade}`,
        tag: "walls",
        kind: "wall",
        areaFt2: netFt2,
        uBtuPerHrFt2F: wallU(wall, "heating"),
      });
    }
    if (f.doorAreaFt2 > 0) {
      opaque.push({
        label: `Door, ${facade}`,
        tag: "doors",
        kind: "door",
        areaFt2: f.doorAreaFt2,
        uBtuPerHrFt2F: f.doorUFactor,
      });
    }
  }
  if (masonry) {
    notes.push(
      "Block walls: ch. 17 Table 7 has wood-frame factors only; they are applied to the block walls (the chapter: conservative for heavier construction).",
    );
  }
  notes.push(
    "Wall colour does not enter the RLF wall factors (ch. 17 Table 7 has one solar term for every sunlit wood-frame wall or door).",
  );

  // Attic, roof, vaulted ceilings.
  const a = plan.attic;
  const ceilingAreaFt2 =
    a.kind === "none" ? 0 : (a.ceilingAreaFt2 ?? plan.conditionedFloorAreaFt2 / plan.stories);
  let atticHeatingF: number | null = null;
  if (a.kind === "vented" && ceilingAreaFt2 > 0) {
    atticHeatingF = to; // ch. 17 section 8: the vented attic at the heating design outdoor temperature
    opaque.push({
      label: "Ceiling under vented attic",
      tag: "ceilings",
      kind: "attic-ceiling",
      areaFt2: ceilingAreaFt2,
      uBtuPerHrFt2F: ceilingU(a.ceiling, "heating"),
      roofSolarAbsorptance: a.roofSolarAbsorptance,
    });
  } else if (a.kind === "encapsulated" && ceilingAreaFt2 > 0) {
    const roofAreaFt2 = ceilingAreaFt2 / Math.cos(Math.atan(a.roofPitchRisePer12In / 12)); // hip roof of one pitch (geometry)
    const uaCeiling = ceilingU(a.ceiling, "heating") * ceilingAreaFt2;
    const uaRoof = roofU(a.roofDeck, { season: "heating", gypsumCeiling: false }) * roofAreaFt2;
    const ua = 1 / (1 / uaCeiling + 1 / uaRoof);
    opaque.push({
      label: "Ceiling and insulated roof deck (encapsulated attic)",
      tag: "ceilings",
      kind: "roof-ceiling",
      areaFt2: ceilingAreaFt2,
      uBtuPerHrFt2F: ua / ceilingAreaFt2,
      roofSolarAbsorptance: a.roofSolarAbsorptance,
    });
    notes.push(
      "Encapsulated attic: ch. 17 has no factor for it; the ceiling and the insulated roof deck are taken in series as a ceiling/roof assembly (Table 7).",
    );
  }
  const vc = plan.vaultedCeiling;
  if (vc.areaFt2 > 0) {
    opaque.push({
      label: "Vaulted ceiling",
      tag: "vaultedCeilings",
      kind: "roof-ceiling",
      areaFt2: vc.areaFt2,
      uBtuPerHrFt2F: roofU(vc.construction, { season: "heating", gypsumCeiling: true }),
      roofSolarAbsorptance: vc.roofSolarAbsorptance,
    });
  }
  const sk = plan.skylights;
  const skylight: RlfFenestrationGroup | null =
    sk.areaFt2 > 0
      ? {
          label: "Skylights",
          tag: "skylights",
          facade: "roof",
          orientation: { kind: "horizontal", tiltDeg: sk.tiltDeg },
          areaFt2: sk.areaFt2,
          uBtuPerHrFt2F: sk.uFactor,
          shgc: sk.shgc,
          interiorAttenuation: sk.interiorShadingCoefficient,
        }
      : null;

  // Foundation.
  const fd = plan.foundation;
  let slab: RlfSlab | undefined;
  let basementHeatingF: number | null = null;
  const tGround = groundHeatingF(site);
  if (fd.slabPerimeterFt > 0) {
    // As the hourly engine (lib/load/envelope.ts): an entered F-factor, else HoF 2021 ch. 18 Table 24 by edge
    // construction and insulation; the slab area entered, else the floor area per story.
    const coveringR =
      options?.slabFloorCoveringR ?? SLAB_FLOOR_COVERING_R_SI[fd.slabFloorCovering] * W_M2K_PER_BTUH_FT2F;
    slab = {
      label: "Slab",
      tag: "slab",
      perimeterFt: fd.slabPerimeterFt,
      fFactorBtuhPerFtF: fd.slabFFactor ?? slabFFactor(fd.slabEdgeInsulationR, fd.slabEdgeConstruction),
      areaFt2:
        fd.kind === "slab-on-grade" ? (fd.slabAreaFt2 ?? plan.conditionedFloorAreaFt2 / plan.stories) : 0,
      floorCoveringR: coveringR,
    };
    if (fd.kind === "slab-on-grade") {
      notes.push(
        `Slab: ${Math.round(slab.areaFt2)} ft²${fd.slabAreaFt2 === undefined ? " (floor area per story)" : ""}, covering R ${coveringR.toFixed(2)} ` +
          `h·ft²·°F/Btu (${options?.slabFloorCoveringR === undefined ? fd.slabFloorCovering : "entered"}; ch. 17 eq. 23: a bare or tiled slab gives a larger cooling credit)` +
          (options?.slabFloorCoveringR === undefined && fd.slabFloorCovering === "tile"
            ? "; the tile value is from memory: approximate default — verify locally."
            : "."),
      );
    } else {
      notes.push(
        `The slab of the ${fd.kind} counts for heating only (ch. 17: ground heat flow ignored for cooling).`,
      );
    }
  }
  const agFt2 = fd.foundationWallAboveGradeAreaFt2;
  const bgFt2 = fd.foundationWallAreaFt2 - agFt2;
  if (fd.kind === "vented-crawlspace" && fd.floorAreaFt2 > 0) {
    opaque.push({
      label: "Floor over vented crawlspace",
      tag: "floors",
      kind: "floor-over-crawlspace",
      areaFt2: fd.floorAreaFt2,
      uBtuPerHrFt2F: floorU(fd.floor, "still-air", "heating"),
    });
    notes.push("Vented crawlspace at the outdoor temperature in heating (as ch. 17 Table 6 assumes).");
  } else if (fd.kind === "unconditioned-basement" && fd.floorAreaFt2 > 0) {
    const uFloor = floorU(fd.floor, "still-air", "heating");
    const uaFloor = uFloor * fd.floorAreaFt2;
    const uaAg =
      (fd.foundationWallUFactor ?? aboveGradeFoundationWallU(fd.foundationWallInsulationR, "heating")) *
      agFt2;
    const uaBg =
      (fd.foundationWallUFactor ??
        belowGradeWallU(fd.foundationWallInsulationR, fd.foundationWallDepthBelowGradeFt)) * bgFt2;
    // Ch. 17 eq. 5 without the basement's own air exchange: t_b = Σ A·U·t_x / Σ A·U.
    basementHeatingF =
      fd.basementHeatingTemperatureF ?? (uaFloor * ti + uaAg * to + uaBg * tGround) / (uaFloor + uaAg + uaBg);
    opaque.push({
      label: "Floor over unconditioned basement",
      tag: "floors",
      kind: "buffer-partition",
      areaFt2: fd.floorAreaFt2,
      uBtuPerHrFt2F: uFloor,
      bufferHeatingF: basementHeatingF,
      bufferCoolingF: site.indoorCoolingF,
    });
    notes.push(
      `Unconditioned basement: a buffer space (ch. 17 eq. 35) at ${basementHeatingF.toFixed(0)} °F in heating` +
        (fd.basementHeatingTemperatureF === undefined
          ? " (eq. 5 balance without air exchange, ground at the mean design dry bulb, from memory: approximate default — verify locally)"
          : "") +
        "; no cooling gain (ch. 17: heat flow to the ground is usually ignored for cooling).",
    );
  } else if (fd.kind === "conditioned-basement" || fd.kind === "conditioned-crawlspace") {
    if (agFt2 > 0) {
      opaque.push({
        label: "Foundation wall above grade",
        tag: "foundationWalls",
        kind: "wall",
        areaFt2: agFt2,
        uBtuPerHrFt2F:
          fd.foundationWallUFactor ?? aboveGradeFoundationWallU(fd.foundationWallInsulationR, "heating"),
      });
    }
    if (bgFt2 > 0) {
      opaque.push({
        label: "Foundation wall below grade",
        tag: "foundationWalls",
        kind: "below-grade",
        areaFt2: bgFt2,
        uBtuPerHrFt2F:
          fd.foundationWallUFactor ??
          belowGradeWallU(fd.foundationWallInsulationR, fd.foundationWallDepthBelowGradeFt),
        groundHeatingF: tGround,
      });
    }
    notes.push(
      "Foundation walls: above grade as sunlit walls (ch. 17 Table 7 wood-frame factors on concrete, conservative); below grade heating only " +
        `(ch. 17 Table 16, ground at ${tGround.toFixed(0)} °F, the mean design dry bulb, from memory: approximate default — verify locally; no cooling gain).`,
    );
  }

  const oo = plan.floorOverOutdoors;
  if (oo.areaFt2 > 0) {
    opaque.push({
      label: "Floor over outdoors",
      tag: "floors",
      kind: "floor-over-ambient",
      areaFt2: oo.areaFt2,
      uBtuPerHrFt2F: floorU(oo.construction, "outdoors", "heating"),
    });
  }

  // Garage: the chapter's example takes the wall to the garage as a shaded wall at outdoor conditions.
  const g = plan.garage;
  const garageGiven = g.heatingTemperatureF !== undefined || g.coolingTemperatureF !== undefined;
  const garageHeatingF = g.heatingTemperatureF ?? to;
  const garageCoolingF = g.coolingTemperatureF ?? site.coolingOutdoorDbF;
  const garageWallNetFt2 = g.wallAreaFt2 - g.doorAreaFt2;
  const garageParts: Array<[string, number, number, "wall" | "door"]> = [
    ["Wall to garage", garageWallNetFt2, wallU(plan.wall, "heating"), "wall"],
    ["Door to garage", g.doorAreaFt2, g.doorUFactor, "door"],
  ];
  for (const [label, areaFt2, u, kind] of garageParts) {
    if (areaFt2 <= 0) continue;
    opaque.push(
      garageGiven
        ? {
            label,
            tag: "garageWall",
            kind: "buffer-partition",
            areaFt2,
            uBtuPerHrFt2F: u,
            bufferHeatingF: garageHeatingF,
            bufferCoolingF: garageCoolingF,
          }
        : { label, tag: "garageWall", kind, areaFt2, uBtuPerHrFt2F: u, shaded: true },
    );
  }
  if (g.floorOverAreaFt2 > 0) {
    const u = floorU(g.floorOver, "still-air", "heating");
    opaque.push(
      garageGiven
        ? {
            label: "Floor over garage",
            tag: "floors",
            kind: "buffer-partition",
            areaFt2: g.floorOverAreaFt2,
            uBtuPerHrFt2F: u,
            bufferHeatingF: garageHeatingF,
            bufferCoolingF: garageCoolingF,
          }
        : {
            label: "Floor over garage",
            tag: "floors",
            kind: "floor-over-ambient",
            areaFt2: g.floorOverAreaFt2,
            uBtuPerHrFt2F: u,
          },
    );
  }
  if (g.wallAreaFt2 + g.floorOverAreaFt2 > 0) {
    notes.push(
      garageGiven
        ? `Garage as a buffer space at ${garageHeatingF.toFixed(0)} °F heating / ${garageCoolingF.toFixed(0)} °F cooling (ch. 17 eq. 35 and Table 15; an entered value missing is taken as the outdoor design temperature).`
        : "Garage at outdoor conditions, as the ch. 17 example: its wall as a shaded wall (Table 7), a floor over it as a floor over ambient.",
    );
  }

  // Air: the entered leakage area, or the blower-door figure converted (ch. 16 eq. 40–41); IDF by ch. 17 eq. 10.
  const volumeFt3 = plan.volumeFt3 ?? plan.conditionedFloorAreaFt2 * plan.ceilingHeightFt;
  const inf = plan.infiltration;
  const leakage: RlfLeakage =
    inf.effectiveLeakageAreaIn2 !== undefined
      ? { method: "effective-leakage-area", elaIn2: inf.effectiveLeakageAreaIn2 }
      : {
          method: "blower-door",
          cfm50: inf.cfm50 ?? ((inf.ach50 ?? 0) * volumeFt3) / 60,
          flowExponent: inf.flowExponent,
        };
  const stackHeightFt = plan.stories * plan.ceilingHeightFt;
  notes.push(
    `Infiltration by ch. 17 eq. 8–10 (typical suburban shelter, so the plan's shelter class is not used); stack height ${stackHeightFt.toFixed(1)} ft (stories × ceiling height` +
      (fd.kind === "conditioned-basement" || fd.kind === "unconditioned-basement"
        ? "; the above-grade basement height is not added"
        : "") +
      ").",
  );

  const v = plan.ventilation;
  const required = ventilationRateEq11Cfm(plan.conditionedFloorAreaFt2, plan.bedrooms);
  const flow = v.kind === "none" ? 0 : (v.cfm ?? required);
  if (v.kind !== "none" && v.cfm === undefined) {
    notes.push(
      `Ventilation flow not entered: the ch. 17 eq. 11 rate of ${required.toFixed(0)} cfm is assumed.`,
    );
  }
  const recovery = v.sensibleRecoveryEffectiveness > 0 || v.latentRecoveryEffectiveness > 0;
  const ventilation: RlfVentilation = {
    supplyCfm: v.kind === "supply" || v.kind === "balanced" ? flow : 0,
    exhaustCfm: v.kind === "exhaust" || v.kind === "balanced" ? flow : 0,
    heatRecoveryCfm: v.kind === "balanced" && recovery ? flow : 0,
    sensibleRecoveryEffectiveness: v.sensibleRecoveryEffectiveness,
    latentRecoveryEffectiveness: v.latentRecoveryEffectiveness,
  };

  const occupants = occupantsOf(plan);
  let gains: RlfHouse["internalGains"];
  if (plan.internalGains.rows) {
    const ig = internalGains(plan.internalGains, plan.conditionedFloorAreaFt2, occupants);
    gains = { sensibleBtuh: ig.sensibleBtuh, latentBtuh: ig.latentBtuh };
    notes.push("Internal gains from the plan's rows plus occupants, instead of ch. 17 eq. 30–31.");
  }

  const house: Omit<RlfHouse, "fenestration"> = {
    site: {
      latitudeDeg: site.latitudeDeg,
      elevationFt: site.elevationFt,
      heatingOutdoorDbF: site.heatingOutdoorDbF,
      coolingOutdoorDbF: site.coolingOutdoorDbF,
      dailyRangeF: site.dailyRangeF,
      coolingOutdoorWbF: site.coolingOutdoorWbF,
      indoorHeatingF: site.indoorHeatingF,
      indoorCoolingF: site.indoorCoolingF,
      indoorCoolingRhPct: site.indoorCoolingRhPct,
    },
    conditionedFloorAreaFt2: plan.conditionedFloorAreaFt2,
    stories: plan.stories,
    bedrooms: plan.bedrooms,
    occupants,
    construction: masonry ? "structural-masonry" : "light-frame",
    opaque,
    slab,
    infiltration: { leakage, stackHeightFt },
    ventilation,
    internalGains: gains,
    ducts: ductsOf(plan, notes),
    options: options?.rlf,
    notes,
  };
  if (site.designMonth !== 7) {
    notes.push(
      `The site's design month (${site.designMonth}) is not used: the RLF factors are for July 21 (ch. 17 Table 1).`,
    );
  }
  if (plan.skylights.areaFt2 > 0 && plan.skylights.tiltDeg >= 30) {
    notes.push(
      `Skylights tilted ${plan.skylights.tiltDeg}° are computed as horizontal; ch. 17 supports only tilts under 30°.`,
    );
  }
  return {
    house,
    windows,
    skylight,
    garageHeatingF,
    atticHeatingF,
    basementHeatingF,
    providedVentilationCfm: flow,
  };
}

/** A small ring of recently built bases, matched by object identity (as calculate.ts does for prepared plans). */
const RECENT = 32;
const recent: Array<
  | { plan: PlanInput; site: SiteConditions; options: RlfFromPlanOptions | undefined; base: PlanBase }
  | undefined
> = new Array(RECENT);
let recentNext = 0;

function baseOf(plan: PlanInput, site: SiteConditions, options: RlfFromPlanOptions | undefined): PlanBase {
  for (let i = 0; i < RECENT; i++) {
    const hit = recent[i];
    if (hit !== undefined && hit.plan === plan && hit.site === site && hit.options === options)
      return hit.base;
  }
  const base = buildBase(plan, site, options);
  recent[recentNext] = { plan, site, options, base };
  recentNext = (recentNext + 1) % RECENT;
  return base;
}

function checkFacing(facingAzimuthDeg: number): void {
  if (typeof facingAzimuthDeg !== "number" || !Number.isFinite(facingAzimuthDeg)) {
    throw new LoadInputError(
      "facingAzimuthDeg",
      `must be a finite number of degrees, got ${String(facingAzimuthDeg)}`,
      {
        min: 0,
        max: 360,
        unit: "°",
      },
    );
  }
}

function orientWindows(base: PlanBase, facingAzimuthDeg: number): RlfFenestrationGroup[] {
  const out: RlfFenestrationGroup[] = [];
  for (const t of base.windows) {
    const w = t.w;
    out.push({
      label: `Windows, ${t.facade}${t.index > 0 ? ` (group ${t.index + 1})` : ""}`,
      tag: "windows",
      facade: t.facade,
      orientation: {
        kind: "vertical",
        azimuthDeg: normalizeAzimuth(facingAzimuthDeg + FACADE_OFFSET_DEG[t.facade]),
      },
      areaFt2: w.areaFt2,
      uBtuPerHrFt2F: w.uFactor,
      shgc: w.shgc,
      interiorAttenuation: w.interiorShadingCoefficient,
      exteriorTransmission: w.exteriorAttenuation,
      overhangDepthFt: w.overhangDepthFt,
      overhangAboveHeadFt: w.overhangHeightAboveHeadFt,
      heightFt: w.windowHeightFt,
    });
  }
  if (base.skylight) out.push(base.skylight);
  return out;
}

/**
 * The plan at one facing as an RLF house description (validated PlanInput and SiteConditions;
 * `facingAzimuthDeg` is the azimuth the front facade faces, degrees clockwise from north).
 */
export function rlfHouseFromPlan(
  plan: PlanInput,
  site: SiteConditions,
  facingAzimuthDeg: number,
  options?: RlfFromPlanOptions,
): RlfHouse {
  checkFacing(facingAzimuthDeg);
  const base = baseOf(plan, site, options);
  return { ...base.house, fenestration: orientWindows(base, facingAzimuthDeg) };
}

/** RLF loads of one facing in the engine's result shapes, with the procedure's own result and the Table 1 findings. */
export interface RlfFacingLoads extends FacingLoads {
  procedure: "residential-load-factor";
  /** The procedure's result: every component row with its factors. */
  rlf: RlfResult;
  /** Table 1 findings (applicability.ts). */
  applicability: RlfApplicabilityFinding[];
  /** The house description the plan was mapped to. */
  house: RlfHouse;
}

function zeros<K extends string>(keys: readonly K[]): ComponentLoads<K> {
  const out = {} as ComponentLoads<K>;
  for (const k of keys) out[k] = 0;
  return out;
}

const HEATING_SET = new Set<string>(HEATING_COMPONENTS);

/**
 * Heating and cooling loads of the plan with its front facing `facingAzimuthDeg`, by the RLF method
 * (HoF 2021 ch. 17), in the shapes of lib/load/results.ts.
 *
 * The RLF gives a peak load only: `cooling.hourlySensibleBtuh` and `cooling.hourlyOutdoorF` are empty
 * arrays and `cooling.peakHour` is null (no hour determined); a note says so.
 */
export function computeResidentialLoadFactorFacing(
  plan: PlanInput,
  site: SiteConditions,
  facingAzimuthDeg: number,
  options?: RlfFromPlanOptions,
): RlfFacingLoads {
  const house = rlfHouseFromPlan(plan, site, facingAzimuthDeg, options);
  const base = baseOf(plan, site, options);
  const r = residentialLoadFactorLoads(house);
  const applicability = checkRlfApplicability(house);

  const heat = zeros(HEATING_COMPONENTS);
  const coolS = zeros(COOLING_SENSIBLE_COMPONENTS);
  const coolL = zeros(COOLING_LATENT_COMPONENTS);
  const byFacade = { front: 0, left: 0, back: 0, right: 0 };
  for (const row of r.rows) {
    const tag = row.tag;
    if (tag === undefined || !HEATING_SET.has(tag)) continue;
    heat[tag as HeatingComponent] += row.heatingBtuh;
    coolS[tag as CoolingSensibleComponent] += row.coolingBtuh;
    const facade = row.fenestration?.facade;
    if (facade === "front" || facade === "left" || facade === "back" || facade === "right")
      byFacade[facade] += row.coolingBtuh;
  }
  heat.infiltration = r.heating.infiltrationBtuh;
  heat.ventilation = r.heating.ventilationBtuh;
  heat.ducts = r.heating.ductBtuh;
  coolS.infiltration = r.cooling.infiltrationBtuh;
  coolS.ventilation = r.cooling.ventilationBtuh;
  coolS.internal = r.cooling.internalBtuh;
  coolS.ducts = r.cooling.ductBtuh;
  coolL.infiltration = r.cooling.latent.infiltrationBtuh;
  coolL.ventilation = r.cooling.latent.ventilationBtuh;
  coolL.internal = r.cooling.latent.internalBtuh;
  coolL.ducts = 0; // Table 6 is sensible only; duct latent gain is not estimated by the RLF method

  const heating: HeatingResult = {
    totalBtuh: r.heating.totalBtuh,
    byComponent: heat,
    outdoorF: site.heatingOutdoorDbF,
    indoorF: site.indoorHeatingF,
    infiltrationCfm: r.air.infiltrationHeatingCfm,
    atticF: base.atticHeatingF,
    garageF: base.garageHeatingF,
    basementF: base.basementHeatingF,
  };
  const sensible = r.cooling.sensibleBtuh;
  const latent = r.cooling.latent.totalBtuh;
  const total = r.cooling.totalBtuh;
  const tons = total / BTUH_PER_TON;
  // The site always carries the wet bulb, so the procedure computed both humidity ratios.
  const outdoorGr = (r.conditions.outdoorHumidityRatio ?? 0) * GRAINS_PER_LB;
  const indoorGr = (r.conditions.indoorHumidityRatio ?? 0) * GRAINS_PER_LB;
  const cooling: CoolingResult = {
    sensibleBtuh: sensible,
    latentBtuh: latent,
    totalBtuh: total,
    peakHour: null,
    sensibleByComponent: coolS,
    latentByComponent: coolL,
    windowsByFacadeBtuh: byFacade,
    hourlySensibleBtuh: [],
    hourlyOutdoorF: [],
    outdoorF: site.coolingOutdoorDbF,
    indoorF: site.indoorCoolingF,
    atticF: null,
    infiltrationCfm: r.air.infiltrationCoolingCfm,
    outdoorHumidityRatioGr: outdoorGr,
    indoorHumidityRatioGr: indoorGr,
    sensibleHeatRatio: total > 0 ? sensible / total : 1,
    airflowCfm: sensible / (r.air.sensibleAirFactor * plan.coolingSupplyDeltaF),
    tons,
    floorAreaPerTonFt2: tons > 0 ? plan.conditionedFloorAreaFt2 / tons : Infinity,
  };

  const notes = [
    ...r.notes,
    "Handbook residential load-factor procedure: a peak load only, with no 24-hour profile, peak hour or cooling attic " +
      "temperature. The 1.7 K indoor temperature swing of HoF 2021 ch. 17 Table 1 is built into its load factors.",
    `Supply airflow from the sensible load at a ${plan.coolingSupplyDeltaF} °F supply-air temperature difference.`,
  ];
  for (const f of applicability) {
    if (f.severity === "outside") notes.push(`Outside the RLF method's range (ch. 17 Table 1): ${f.message}`);
    else if (f.severity === "caution") notes.push(`RLF caution (ch. 17 Table 1): ${f.message}`);
  }

  const az = normalizeAzimuth(facingAzimuthDeg);
  return {
    engineVersion: ENGINE_VERSION,
    procedure: "residential-load-factor",
    facingAzimuthDeg: az,
    facadeAzimuthsDeg: facadeAzimuthsDeg(az),
    heating,
    cooling,
    ventilation: {
      requiredCfm: r.air.requiredVentilationCfm,
      providedCfm: base.providedVentilationCfm,
      kind: plan.ventilation.kind,
    },
    effectiveLeakageAreaIn2: r.air.effectiveLeakageAreaIn2,
    notes,
    caution: RLF_CAUTION,
    rlf: r,
    applicability,
    house,
  };
}

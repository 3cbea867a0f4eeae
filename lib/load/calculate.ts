/**
 * The load calculation: steady-state heating and a 24-hour cooling design day, for one plan at
 * one facing. See ENGINE.md for the method; every constant cites its source where it is defined.
 *
 * Work is split for speed: `prepareSite` (solar day, psychrometrics — once per site, cached) and
 * `preparePlan` (U-factors, leakage, heating, facing-independent hourly loads — once per plan and
 * site, cached by object identity); the per-facing work is then 24 hours × a handful of surfaces.
 */
import {
  aboveGradeFoundationWallU,
  belowGradeWallU,
  ceilingU,
  floorU,
  roofU,
  slabFFactor,
  ventedRoofDeckUWithoutOutsideFilm,
  wallMassClass,
  wallU,
  type MassClass,
} from "./assemblies";
import { atticAirTemperatureF, SOL_AIR_HO_BTUH_FT2F, solAirTemperatureF } from "./attic";
import { outdoorDryBulbProfileF } from "./design-day";
import {
  ductGeometry,
  ductHeatingMode,
  ductLoad,
  ductLossFactor,
  ductTableLocation,
  HEATING_SUPPLY_DELTA_F,
  type DuctGeometry,
} from "./ducts";
import { LoadInputError } from "./errors";
import {
  FACADES,
  parsePlanInput,
  parseSiteConditions,
  type Facade,
  type PlanInput,
  type SiteConditions,
  type WallConstruction,
} from "./input";
import {
  ashrae622VentilationCfm,
  cfm50FromAch50,
  cm2ToIn2,
  COOLING_WIND_MPH,
  effectiveLeakageAreaCm2,
  HEATING_WIND_MPH,
  lblInfiltrationCfm,
} from "./infiltration";
import { internalGains, occupantsOf } from "./internal-gains";
import { humidityRatioGrFromRelHum, humidityRatioGrFromWetBulb, SEA_LEVEL_PRESSURE_PSIA, standardPressurePsia } from "./psychrometrics";
import {
  COOLING_LATENT_COMPONENTS,
  COOLING_SENSIBLE_COMPONENTS,
  DESIGN_ESTIMATE_CAUTION,
  FACING_LABELS,
  HEATING_COMPONENTS,
  type ComponentLoads,
  type CoolingLatentComponent,
  type CoolingResult,
  type CoolingSensibleComponent,
  type FacingLoads,
  type HeatingComponent,
  type HeatingResult,
  type PlanFacings,
} from "./results";
import { designDayOfYear, SiteSolarDay, type SurfaceProfile } from "./solar";
import { BTUH_FT2_PER_W_M2, BTUH_PER_TON, DEG } from "./units";
import { DIFFUSE_SHGC_RATIO, overhangSunlitFraction, shgcAngleRatio } from "./windows";

export const ENGINE_VERSION = "0.1.1"; // 0.1.1: values as read in HoF 2021 (ch. 14 Table 6 daily range; ch. 26 Table 1 filled block, Table 8 soil; ch. 18 sol-air 4 K)

/**
 * Clear-sky optical depths used when a site has none (typical of US sites in July, from memory).
 * HoF 2021 ch. 14 (read) gives no default: τb and τd are location-specific and tabulated by
 * station for the 21st of each month; for scale, its Atlanta July values are 0.515 / 2.066.
 */
export const DEFAULT_TAU_BEAM = 0.5;
export const DEFAULT_TAU_DIFFUSE = 2.0;

/** Sea-level air-side factors (HoF 2021 ch. 17, read: Cs 1.23 W/(L/s·K) = 1.10 Btu/h·cfm·°F; Cl 3010 W/(L/s) → 0.69 Btu/h·cfm·gr). */
const SENSIBLE_AIR_FACTOR_SEA_LEVEL = 1.1;
const LATENT_AIR_FACTOR_SEA_LEVEL = 0.69;

/**
 * Time lag (h) and decrement of periodic conduction by mass class (from memory; orders of
 * magnitude of HoF ch. 18 conduction time series for wood-frame and 8 in block walls).
 */
const MASS_RESPONSE: Record<MassClass, { lagH: number; decrement: number }> = {
  "light-frame": { lagH: 2, decrement: 0.85 },
  masonry: { lagH: 5, decrement: 0.5 },
};
const VAULTED_RESPONSE = { lagH: 1, decrement: 0.9 };

/** Attached garage defaults when not entered (our own rough buffer-space assumption, from memory). */
const GARAGE_HEATING_FRACTION_TOWARD_INDOOR = 0.3;
const GARAGE_COOLING_ABOVE_OUTDOOR_F = 5;

export interface ComputeOptions {
  /**
   * Set when plan and site are already the output of parsePlanInput / parseSiteConditions
   * (hot loops: benchmark, bulk lot recompute); validation is then skipped. Such objects are
   * treated as immutable: the prepared plan is reused for the same object, so do not edit a
   * validated plan in place — parse the edited plan again.
   */
  validated?: boolean;
}

// ---------------------------------------------------------------------------------------------
// Site preparation (cached by value).

export interface PreparedSite {
  key: string;
  site: SiteConditions;
  solar: SiteSolarDay;
  tauBeam: number;
  tauDiffuse: number;
  outdoorF: number[];
  dailyMeanOutdoorF: number;
  pressurePsia: number;
  /** 1.10·(P/P0), Btu/h per cfm per °F. */
  sensibleFactor: number;
  /** 0.69·(P/P0), Btu/h per cfm per grain/lb. */
  latentFactor: number;
  outdoorHumidityRatioGr: number;
  indoorHumidityRatioGr: number;
  /** Design humidity difference used for latent loads (never negative: dry air is no latent credit). */
  latentDeltaGr: number;
  /** Rough annual-mean ground temperature, °F: the mean of the heating and cooling design dry bulbs. */
  groundF: number;
  notes: string[];
}

const SITE_CACHE_LIMIT = 512;
const siteCache = new Map<string, PreparedSite>();

function siteKey(site: SiteConditions): string {
  return [
    site.latitudeDeg,
    site.longitudeDeg,
    site.elevationFt,
    site.heatingOutdoorDbF,
    site.coolingOutdoorDbF,
    site.coolingOutdoorWbF,
    site.dailyRangeF,
    site.designMonth,
    site.tauBeam ?? "",
    site.tauDiffuse ?? "",
    site.groundReflectance,
    site.indoorHeatingF,
    site.indoorCoolingF,
    site.indoorCoolingRhPct,
  ].join("|");
}

const siteByIdentity = new WeakMap<SiteConditions, PreparedSite>();

export function prepareSite(site: SiteConditions): PreparedSite {
  const byIdentity = siteByIdentity.get(site);
  if (byIdentity) return byIdentity;
  const key = siteKey(site);
  const cached = siteCache.get(key);
  if (cached) {
    siteByIdentity.set(site, cached);
    return cached;
  }
  const notes: string[] = [];
  const tauBeam = site.tauBeam ?? DEFAULT_TAU_BEAM;
  const tauDiffuse = site.tauDiffuse ?? DEFAULT_TAU_DIFFUSE;
  if (site.tauBeam === undefined || site.tauDiffuse === undefined) {
    notes.push(
      `Clear-sky optical depths not entered for the site: defaults τb ${tauBeam}, τd ${tauDiffuse} used ` +
        "(enter the station's values from HoF ch. 14 for the design month).",
    );
  }
  const dayOfYear = designDayOfYear(site.designMonth);
  const solar = new SiteSolarDay(site.latitudeDeg, dayOfYear, tauBeam, tauDiffuse, site.groundReflectance);
  const outdoorF = outdoorDryBulbProfileF(site.coolingOutdoorDbF, site.dailyRangeF);
  const pressurePsia = standardPressurePsia(site.elevationFt);
  const ratio = pressurePsia / SEA_LEVEL_PRESSURE_PSIA;
  const outdoorHumidityRatioGr = humidityRatioGrFromWetBulb(site.coolingOutdoorDbF, site.coolingOutdoorWbF, pressurePsia);
  const indoorHumidityRatioGr = humidityRatioGrFromRelHum(site.indoorCoolingF, site.indoorCoolingRhPct, pressurePsia);
  const deltaGr = outdoorHumidityRatioGr - indoorHumidityRatioGr;
  if (deltaGr < 0) {
    notes.push("Outdoor design air is drier than indoor air: latent loads from outdoor air are taken as zero.");
  }
  const prepared: PreparedSite = {
    key,
    site,
    solar,
    tauBeam,
    tauDiffuse,
    outdoorF,
    dailyMeanOutdoorF: outdoorF.reduce((a, b) => a + b, 0) / 24,
    pressurePsia,
    sensibleFactor: SENSIBLE_AIR_FACTOR_SEA_LEVEL * ratio,
    latentFactor: LATENT_AIR_FACTOR_SEA_LEVEL * ratio,
    outdoorHumidityRatioGr,
    indoorHumidityRatioGr,
    latentDeltaGr: Math.max(0, deltaGr),
    groundF: (site.heatingOutdoorDbF + site.coolingOutdoorDbF) / 2,
    notes,
  };
  if (siteCache.size >= SITE_CACHE_LIMIT) siteCache.clear();
  siteCache.set(key, prepared);
  siteByIdentity.set(site, prepared);
  return prepared;
}

// ---------------------------------------------------------------------------------------------
// Plan preparation (facing-independent).

interface PreparedWindow {
  areaFt2: number;
  uaCool: number;
  shgc: number;
  iac: number;
  overhangDepthFt: number;
  overhangHeightAboveHeadFt: number;
  windowHeightFt: number;
}

interface PreparedFacade {
  facade: Facade;
  wallUaCool: number;
  wallLagH: number;
  wallDecrement: number;
  doorUaCool: number;
  windows: PreparedWindow[];
}

type ZoneKind = "outdoor" | "attic" | "crawl" | "basement" | "garage" | "indoor";

export interface PreparedPlan {
  plan: PlanInput;
  site: PreparedSite;
  occupants: number;
  volumeFt3: number;
  elaCm2: number;
  ventilationRequiredCfm: number;
  ventilationProvidedCfm: number;
  heating: HeatingResult;
  facades: PreparedFacade[];
  wallAbsorptance: number;
  attic: {
    kind: PlanInput["attic"]["kind"];
    ceilingUaCool: number;
    roofUaCool: number;
    ventilationConductance: number;
    absorptance: number;
    tiltDeg: number;
  };
  vaulted: { uaCool: number; absorptance: number };
  skylight: { areaFt2: number; uaCool: number; shgc: number; iac: number; tiltDeg: number; facade: Facade };
  roofTiltDeg: number;
  /** Hourly sensible loads that do not depend on facing, Btu/h. */
  hourlyFixed: {
    floors: number[];
    foundationWalls: number[];
    garageWall: number[];
    infiltration: number[];
    ventilation: number[];
    internal: number;
  };
  infiltrationCfmHourly: number[];
  latentFixedBtuh: { ventilation: number; internal: number };
  garageCoolingF: number[];
  ducts: DuctGeometry;
  ductZone: ZoneKind;
  /** Share of the duct gain that reaches the rooms (below 1 only for ducts in an encapsulated attic). */
  ductLossFractionCool: number;
  /**
   * Cooling duct gain factor F_dl of HoF 2021 ch. 17 Table 6 (eq. 19: gain = F_dl × room sensible load),
   * or null when the conduction-leakage model is used.
   */
  ductFactorCool: number | null;
  notes: string[];
}

/**
 * Recently prepared plans, matched by object identity and site key. A small ring (not a WeakMap:
 * WeakMap entries for many short-lived plans cost more in garbage collection than they save).
 */
const RECENT_PLANS = 64;
const recentPlans: Array<PreparedPlan | undefined> = new Array(RECENT_PLANS);
let recentNext = 0;

/** 24 zeros in a plain array (typed arrays cost more to allocate than they save at this size). */
function hours24(): number[] {
  return [0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0];
}

function wallOf(plan: PlanInput, facade: Facade): WallConstruction {
  return plan.facades[facade].wall ?? plan.wall;
}

function zeros(): ComponentLoads<HeatingComponent> {
  const out = {} as ComponentLoads<HeatingComponent>;
  for (const c of HEATING_COMPONENTS) out[c] = 0;
  return out;
}

function sum(values: Iterable<number>): number {
  let s = 0;
  for (const v of values) s += v;
  return s;
}

function ductZoneOf(plan: PlanInput): ZoneKind {
  switch (plan.ducts.location) {
    case "vented-attic":
    case "encapsulated-attic":
      return "attic";
    case "vented-crawlspace":
      return "crawl";
    case "unconditioned-basement":
      return "basement";
    case "garage":
      return "garage";
    default:
      return "indoor";
  }
}

export function preparePlan(plan: PlanInput, site: PreparedSite): PreparedPlan {
  for (let i = 0; i < RECENT_PLANS; i++) {
    const hit = recentPlans[i];
    if (hit !== undefined && hit.plan === plan && hit.site === site) return hit;
  }

  const s = site.site;
  const notes: string[] = [...site.notes];
  const ti = s.indoorHeatingF;
  const to = s.heatingOutdoorDbF;
  const dtHeat = ti - to;
  const tic = s.indoorCoolingF;
  const occupants = occupantsOf(plan);
  const volumeFt3 = plan.volumeFt3 ?? plan.conditionedFloorAreaFt2 * plan.ceilingHeightFt;
  const heating = zeros();

  // --- Air leakage (HoF ch. 16) ----------------------------------------------------------
  const { ach50, cfm50: cfm50Entered, shelterClass, flowExponent } = plan.infiltration;
  const cfm50 = cfm50Entered ?? cfm50FromAch50(ach50 ?? 0, volumeFt3);
  const elaCm2 = effectiveLeakageAreaCm2(cfm50, flowExponent);
  if (plan.stories > 3) notes.push("LBL infiltration coefficients for 3 stories used for a taller house.");
  const infHeatCfm = lblInfiltrationCfm(elaCm2, plan.stories, shelterClass, dtHeat, HEATING_WIND_MPH);

  const ventilationRequiredCfm = ashrae622VentilationCfm(plan.conditionedFloorAreaFt2, plan.bedrooms);
  const v = plan.ventilation;
  const ventilationProvidedCfm = v.kind === "none" ? 0 : (v.cfm ?? ventilationRequiredCfm);
  if (v.kind !== "none" && v.cfm === undefined) {
    notes.push(`Ventilation flow not entered: the ASHRAE 62.2-2016 rate of ${ventilationRequiredCfm.toFixed(0)} cfm is assumed.`);
  }
  if (ventilationProvidedCfm < ventilationRequiredCfm) {
    notes.push(
      `Provided ventilation ${ventilationProvidedCfm.toFixed(0)} cfm is below the ASHRAE 62.2-2016 rate of ` +
        `${ventilationRequiredCfm.toFixed(0)} cfm.`,
    );
  }
  /** Outdoor air from infiltration and ventilation, split into the two components (cfm·ΔT multipliers). */
  const airSplit = (infCfm: number) => {
    if (v.kind === "balanced") {
      return {
        infiltrationCfm: infCfm,
        ventSensibleCfm: ventilationProvidedCfm * (1 - v.sensibleRecoveryEffectiveness),
        ventLatentCfm: ventilationProvidedCfm * (1 - v.latentRecoveryEffectiveness),
      };
    }
    // Unbalanced flow combines with infiltration sub-additively: HoF 2021 ch. 16 eq. 51, read
    // (ch. 17 eq. 14 uses max(Q_unbal, Q_i + 0.5·Q_unbal) instead).
    const combined = Math.sqrt(infCfm * infCfm + ventilationProvidedCfm * ventilationProvidedCfm);
    return { infiltrationCfm: infCfm, ventSensibleCfm: combined - infCfm, ventLatentCfm: combined - infCfm };
  };
  const heatAir = airSplit(infHeatCfm);
  heating.infiltration = site.sensibleFactor * heatAir.infiltrationCfm * dtHeat;
  heating.ventilation = site.sensibleFactor * heatAir.ventSensibleCfm * dtHeat;

  // --- Buffer-space temperatures (heating) -------------------------------------------------
  const garageHeatF = plan.garage.heatingTemperatureF ?? to + GARAGE_HEATING_FRACTION_TOWARD_INDOOR * dtHeat;
  const garageCoolingF = hours24();
  for (let h = 0; h < 24; h++) garageCoolingF[h] = plan.garage.coolingTemperatureF ?? site.outdoorF[h] + GARAGE_COOLING_ABOVE_OUTDOOR_F;
  if (plan.garage.wallAreaFt2 + plan.garage.floorOverAreaFt2 > 0 && plan.garage.heatingTemperatureF === undefined) {
    notes.push(`Garage heating temperature not entered: ${garageHeatF.toFixed(0)} °F assumed (outdoor + 30 % of the difference).`);
  }

  const f = plan.foundation;
  const agArea = f.foundationWallAboveGradeAreaFt2;
  const bgArea = f.foundationWallAreaFt2 - agArea;
  const agUHeat = aboveGradeFoundationWallU(f.foundationWallInsulationR, "heating");
  const agUCool = aboveGradeFoundationWallU(f.foundationWallInsulationR, "cooling");
  const bgU = belowGradeWallU(f.foundationWallInsulationR, f.foundationWallDepthBelowGradeFt);
  const floorUHeat = floorU(f.floor, "still-air", "heating");
  const floorUCool = floorU(f.floor, "still-air", "cooling");

  let basementHeatF: number | null = null;
  if (f.kind === "unconditioned-basement") {
    const uaFloor = floorUHeat * f.floorAreaFt2;
    const uaAg = agUHeat * agArea;
    const uaBg = bgU * bgArea;
    basementHeatF =
      f.basementHeatingTemperatureF ??
      (uaFloor + uaAg + uaBg > 0 ? (uaFloor * ti + uaAg * to + uaBg * site.groundF) / (uaFloor + uaAg + uaBg) : ti);
    if (f.basementHeatingTemperatureF === undefined) {
      notes.push(`Unconditioned basement at ${basementHeatF.toFixed(0)} °F in heating (heat balance with a ${site.groundF.toFixed(0)} °F ground estimate).`);
    }
  }

  // --- Facades -------------------------------------------------------------------------------
  const facades: PreparedFacade[] = [];
  for (const facade of FACADES) {
    const fi = plan.facades[facade];
    const wall = wallOf(plan, facade);
    const groups = [fi.window, ...fi.extraWindows].filter((w) => w.areaFt2 > 0);
    const windowAreaFt2 = sum(groups.map((w) => w.areaFt2));
    const netWallFt2 = fi.grossWallAreaFt2 - windowAreaFt2 - fi.doorAreaFt2;
    heating.walls += wallU(wall, "heating") * netWallFt2 * dtHeat;
    heating.doors += fi.doorUFactor * fi.doorAreaFt2 * dtHeat;
    for (const w of groups) heating.windows += w.uFactor * w.areaFt2 * dtHeat;
    const response = MASS_RESPONSE[wallMassClass(wall.baseId)];
    facades.push({
      facade,
      wallUaCool: wallU(wall, "cooling") * netWallFt2,
      wallLagH: response.lagH,
      wallDecrement: response.decrement,
      doorUaCool: fi.doorUFactor * fi.doorAreaFt2,
      windows: groups.map((w) => ({
        areaFt2: w.areaFt2,
        uaCool: w.uFactor * w.areaFt2,
        shgc: w.shgc,
        iac: w.interiorShadingCoefficient,
        overhangDepthFt: w.overhangDepthFt,
        overhangHeightAboveHeadFt: w.overhangHeightAboveHeadFt,
        windowHeightFt: w.windowHeightFt,
      })),
    });
  }

  // --- Attic, roof, vaulted ceilings, skylights -----------------------------------------------
  const a = plan.attic;
  const roofTiltDeg = Math.atan(a.roofPitchRisePer12In / 12) / DEG;
  const ceilingAreaFt2 = a.kind === "none" ? 0 : (a.ceilingAreaFt2 ?? plan.conditionedFloorAreaFt2 / plan.stories);
  // Hip roof of one pitch: roof area = footprint / cos(tilt) (geometry).
  const roofAreaFt2 = ceilingAreaFt2 / Math.cos(roofTiltDeg * DEG);
  const ceilingUaHeat = ceilingU(a.ceiling, "heating") * ceilingAreaFt2;
  const ceilingUaCool = ceilingU(a.ceiling, "cooling") * ceilingAreaFt2;
  let atticHeatF: number | null = null;
  let roofUaCool = 0;
  let ventilationConductance = 0;
  if (a.kind === "vented") {
    atticHeatF = to; // vented attic at outdoor temperature for heating (ENGINE.md)
    heating.ceilings = ceilingUaHeat * (ti - atticHeatF);
    roofUaCool = roofAreaFt2 / (1 / SOL_AIR_HO_BTUH_FT2F + 1 / ventedRoofDeckUWithoutOutsideFilm());
    ventilationConductance = site.sensibleFactor * a.ventilationCfmPerFt2 * ceilingAreaFt2;
  } else if (a.kind === "encapsulated") {
    const roofUaHeat = roofU(a.roofDeck, { season: "heating", gypsumCeiling: false }) * roofAreaFt2;
    atticHeatF = atticAirTemperatureF({
      roofUA: roofUaHeat,
      solAirF: to,
      ceilingUA: ceilingUaHeat,
      roomF: ti,
      ventilationConductanceBtuhF: 0,
      outdoorF: to,
    });
    heating.ceilings = ceilingUaHeat * (ti - atticHeatF);
    roofUaCool = roofU(a.roofDeck, { season: "cooling", gypsumCeiling: false }) * roofAreaFt2;
  }
  const vc = plan.vaultedCeiling;
  heating.vaultedCeilings = roofU(vc.construction, { season: "heating", gypsumCeiling: true }) * vc.areaFt2 * dtHeat;
  const sk = plan.skylights;
  heating.skylights = sk.uFactor * sk.areaFt2 * dtHeat;

  // --- Floors, slab, foundation walls, garage --------------------------------------------------
  const floorsCool = hours24();
  const foundationCool = hours24();
  const garageCool = hours24();
  if (f.kind === "vented-crawlspace") {
    heating.floors += floorUHeat * f.floorAreaFt2 * dtHeat; // vented crawlspace at outdoor temperature (ENGINE.md)
    // Cooling: the crawlspace runs near the daily mean outdoor temperature (our approximation).
    for (let h = 0; h < 24; h++) floorsCool[h] += floorUCool * f.floorAreaFt2 * (site.dailyMeanOutdoorF - tic);
  } else if (f.kind === "unconditioned-basement") {
    heating.floors += floorUHeat * f.floorAreaFt2 * (ti - (basementHeatF ?? ti));
    // Cooling: an unconditioned basement is cooler than the house; no credit is taken.
  } else if (f.kind === "conditioned-basement" || f.kind === "conditioned-crawlspace") {
    heating.foundationWalls += agUHeat * agArea * dtHeat + bgU * bgArea * Math.max(0, ti - site.groundF);
    for (let h = 0; h < 24; h++) foundationCool[h] = agUCool * agArea * (site.outdoorF[h] - tic);
  }
  if (f.floorAreaFt2 > 0 && f.kind !== "vented-crawlspace" && f.kind !== "unconditioned-basement") {
    notes.push(`foundation.floorAreaFt2 is ignored for a ${f.kind} foundation.`);
  }
  heating.slab = slabFFactor(f.slabEdgeInsulationR, f.slabEdgeInsulationDepthFt) * f.slabPerimeterFt * dtHeat;

  const oo = plan.floorOverOutdoors;
  heating.floors += floorU(oo.construction, "outdoors", "heating") * oo.areaFt2 * dtHeat;
  const ooUaCool = floorU(oo.construction, "outdoors", "cooling") * oo.areaFt2;
  const g = plan.garage;
  const gFloorUaHeat = floorU(g.floorOver, "still-air", "heating") * g.floorOverAreaFt2;
  const gFloorUaCool = floorU(g.floorOver, "still-air", "cooling") * g.floorOverAreaFt2;
  heating.floors += gFloorUaHeat * (ti - garageHeatF);
  const gWallNetFt2 = g.wallAreaFt2 - g.doorAreaFt2;
  const gWallUaHeat = wallU(plan.wall, "heating") * gWallNetFt2 + g.doorUFactor * g.doorAreaFt2;
  const gWallUaCool = wallU(plan.wall, "cooling") * gWallNetFt2 + g.doorUFactor * g.doorAreaFt2;
  heating.garageWall = gWallUaHeat * (ti - garageHeatF);
  for (let h = 0; h < 24; h++) {
    floorsCool[h] += ooUaCool * (site.outdoorF[h] - tic) + gFloorUaCool * (garageCoolingF[h] - tic);
    garageCool[h] = gWallUaCool * (garageCoolingF[h] - tic);
  }

  // --- Ducts (heating) --------------------------------------------------------------------------
  const ducts = ductGeometry(plan.ducts, plan.conditionedFloorAreaFt2, plan.stories);
  const ductZone = ductZoneOf(plan);
  // Default: HoF 2021 ch. 17 eq. 19 with the Table 6 factors, where the table has the location.
  const tableLocation = plan.ducts.method === "handbook-table" ? ductTableLocation(plan.ducts.location) : null;
  const ductTable = (mode: "cooling" | "heating-furnace" | "heating-heat-pump") =>
    tableLocation === null
      ? null
      : ductLossFactor({
          location: tableLocation,
          mode,
          stories: plan.stories,
          insulationR: plan.ducts.insulationR,
          supplyLeakagePct: plan.ducts.supplyLeakagePct,
          returnLeakagePct: plan.ducts.returnLeakagePct,
        });
  const ductTableCool = ductTable("cooling");
  const ductTableHeat = ductTable(ductHeatingMode(plan.ducts.heatingSystem));
  const heatingZoneF: Record<ZoneKind, number> = {
    outdoor: to,
    attic: atticHeatF ?? to,
    crawl: to,
    basement: basementHeatF ?? ti,
    garage: garageHeatF,
    indoor: ti,
  };
  const envelopeHeatBtuh = sum(HEATING_COMPONENTS.filter((c) => c !== "ducts").map((c) => heating[c]));
  // Ducts in an encapsulated attic lose heat into a space that passes most of it back to the rooms
  // through the ceiling: by the attic's steady balance only roofUA/(roofUA + ceilingUA) of it
  // reaches outdoors (our one-node approximation).
  const encapsulatedDucts = plan.ducts.location === "encapsulated-attic" && a.kind === "encapsulated";
  const roofUaHeatForRegain = encapsulatedDucts ? roofU(a.roofDeck, { season: "heating", gypsumCeiling: false }) * roofAreaFt2 : 0;
  const ductLossFractionHeat = encapsulatedDucts ? roofUaHeatForRegain / (roofUaHeatForRegain + ceilingUaHeat) : 1;
  const ductLossFractionCool = encapsulatedDucts ? roofUaCool / (roofUaCool + ceilingUaCool) : 1;
  if (ductTableHeat !== null && ductTableCool !== null) {
    // HoF 2021 ch. 17 eq. 19: q_d = F_dl × q_bl, q_bl the building's load without ducts.
    heating.ducts = ductTableHeat.factor * envelopeHeatBtuh;
    const system = plan.ducts.heatingSystem === "heat-pump" ? "heat pump" : "furnace";
    notes.push(
      `Ducts: HoF 2021 ch. 17 Table 6 duct loss/gain factors (${tableLocation}, ${plan.stories >= 2 ? "2 or more stories" : "1 story"}): ` +
        `cooling ${ductTableCool.factor.toFixed(3)}, heating (${system}) ${ductTableHeat.factor.toFixed(3)} of the building load. ` +
        "Typical factors, guidance only; duct latent gain from return leakage is our estimate.",
    );
    for (const n of ductTableCool.notes) notes.push(n);
  } else {
    heating.ducts =
      ductLossFractionHeat *
      wrapDuctError(() =>
        ductLoad(ducts, envelopeHeatBtuh, "heating", heatingZoneF[ductZone], ti, HEATING_SUPPLY_DELTA_F, site.sensibleFactor, 0),
      ).sensibleBtuh;
    if (ducts.outsideEnvelope) {
      notes.push(
        plan.ducts.method === "handbook-table"
          ? `Ducts in the ${plan.ducts.location}: the handbook duct-factor table has no such location, so a simple conduction-and-leakage model is used (lib/load/README.md).`
          : "Duct losses by a simple conduction-and-leakage model (lib/load/README.md), not the handbook duct-factor table.",
      );
    }
  }

  const heatingResult: HeatingResult = {
    totalBtuh: sum(HEATING_COMPONENTS.map((c) => heating[c])),
    byComponent: heating,
    outdoorF: to,
    indoorF: ti,
    infiltrationCfm: infHeatCfm,
    atticF: atticHeatF,
    garageF: garageHeatF,
    basementF: basementHeatF,
  };

  // --- Cooling: facing-independent hourly pieces ------------------------------------------------
  const infCoolHourly = hours24();
  const infSensible = hours24();
  const ventSensible = hours24();
  for (let h = 0; h < 24; h++) {
    const dT = site.outdoorF[h] - tic;
    const inf = lblInfiltrationCfm(elaCm2, plan.stories, shelterClass, Math.abs(dT), COOLING_WIND_MPH);
    infCoolHourly[h] = inf;
    const air = airSplit(inf);
    infSensible[h] = site.sensibleFactor * air.infiltrationCfm * dT;
    ventSensible[h] = site.sensibleFactor * air.ventSensibleCfm * dT;
  }
  const gains = internalGains(plan.internalGains, plan.conditionedFloorAreaFt2, occupants);
  const ventLatentCfmAtAnyHour = v.kind === "balanced" ? ventilationProvidedCfm * (1 - v.latentRecoveryEffectiveness) : 0;

  const prepared: PreparedPlan = {
    plan,
    site,
    occupants,
    volumeFt3,
    elaCm2,
    ventilationRequiredCfm,
    ventilationProvidedCfm,
    heating: heatingResult,
    facades,
    wallAbsorptance: plan.wallSolarAbsorptance,
    attic: {
      kind: a.kind,
      ceilingUaCool: a.kind === "none" ? 0 : ceilingUaCool,
      roofUaCool,
      ventilationConductance,
      absorptance: a.roofSolarAbsorptance,
      tiltDeg: roofTiltDeg,
    },
    vaulted: {
      uaCool: roofU(vc.construction, { season: "cooling", gypsumCeiling: true }) * vc.areaFt2,
      absorptance: vc.roofSolarAbsorptance,
    },
    skylight: { areaFt2: sk.areaFt2, uaCool: sk.uFactor * sk.areaFt2, shgc: sk.shgc, iac: sk.interiorShadingCoefficient, tiltDeg: sk.tiltDeg, facade: sk.facade },
    roofTiltDeg,
    hourlyFixed: {
      floors: floorsCool,
      foundationWalls: foundationCool,
      garageWall: garageCool,
      infiltration: infSensible,
      ventilation: ventSensible,
      internal: gains.sensibleBtuh,
    },
    infiltrationCfmHourly: infCoolHourly,
    latentFixedBtuh: { ventilation: site.latentFactor * ventLatentCfmAtAnyHour * site.latentDeltaGr, internal: gains.latentBtuh },
    garageCoolingF,
    ducts,
    ductZone,
    ductLossFractionCool,
    ductFactorCool: ductTableCool === null ? null : ductTableCool.factor,
    notes,
  };
  recentPlans[recentNext] = prepared;
  recentNext = (recentNext + 1) % RECENT_PLANS;
  return prepared;
}

function wrapDuctError<T>(fn: () => T): T {
  try {
    return fn();
  } catch (error) {
    if (error instanceof RangeError) {
      throw new LoadInputError("ducts.supplyLeakagePct", error.message, { min: 0, max: 50, unit: "%" });
    }
    throw error;
  }
}

// ---------------------------------------------------------------------------------------------
// The facing-dependent cooling day (the hot path: keep it allocation-light; imported constants
// are copied to locals because transpiled ES-module bindings are read through getters).

const W_M2_TO_BTUH_FT2 = BTUH_FT2_PER_W_M2;
const DIFFUSE_RATIO = DIFFUSE_SHGC_RATIO;
const shgcRatio = shgcAngleRatio;
const sunlitFraction = overhangSunlitFraction;
const solAir = solAirTemperatureF;
const atticAir = atticAirTemperatureF;
const ductLoadOf = ductLoad;
const FACADE_LIST: readonly Facade[] = FACADES;
const SENSIBLE_KEYS: readonly CoolingSensibleComponent[] = COOLING_SENSIBLE_COMPONENTS;
const LATENT_KEYS: readonly CoolingLatentComponent[] = COOLING_LATENT_COMPONENTS;

function normalizeAzimuth(deg: number): number {
  return ((deg % 360) + 360) % 360;
}

const FACADE_OFFSET_DEG: Record<Facade, number> = { front: 0, left: 90, back: 180, right: 270 };

const SCRATCH = {
  walls: new Float64Array(24),
  windows: new Float64Array(24),
  doors: new Float64Array(24),
  ceilings: new Float64Array(24),
  vaulted: new Float64Array(24),
  skylights: new Float64Array(24),
  ducts: new Float64Array(24),
  ductLatent: new Float64Array(24),
  rooms: new Float64Array(24),
  total: new Float64Array(24),
  te: new Float64Array(24),
  roofIrr: new Float64Array(24),
  atticF: new Float64Array(24),
  windowsByFacade: [new Float64Array(24), new Float64Array(24), new Float64Array(24), new Float64Array(24)],
};
const SCRATCH_ROWS: Float64Array[] = [
  SCRATCH.walls,
  SCRATCH.windows,
  SCRATCH.doors,
  SCRATCH.ceilings,
  SCRATCH.vaulted,
  SCRATCH.skylights,
  SCRATCH.ducts,
  SCRATCH.ductLatent,
  SCRATCH.rooms,
  SCRATCH.total,
  SCRATCH.te,
  SCRATCH.roofIrr,
  SCRATCH.atticF,
  ...SCRATCH.windowsByFacade,
];

function coolingDay(p: PreparedPlan, facingAzimuthDeg: number): CoolingResult {
  const site = p.site;
  const solar = site.solar;
  const tic = site.site.indoorCoolingF;
  const toArr = site.outdoorF;

  // Scratch rows reused across calls (the function is synchronous and never re-entered).
  const { walls, windows, doors, ceilings, vaulted, skylights, ducts, ductLatent, rooms, total, te, roofIrr, atticF } = SCRATCH;
  const windowsByFacade = SCRATCH.windowsByFacade;
  for (const row of SCRATCH_ROWS) row.fill(0);
  const fixed = p.hourlyFixed;

  // Walls, doors, windows per facade.
  for (let fi = 0; fi < p.facades.length; fi++) {
    const fc = p.facades[fi];
    const profile: SurfaceProfile = solar.surface(facingAzimuthDeg + FACADE_OFFSET_DEG[fc.facade], 90);
    const totalWm2 = profile.totalWm2;
    let teMean = 0;
    for (let h = 0; h < 24; h++) {
      te[h] = solAir(toArr[h], p.wallAbsorptance, totalWm2[h] * W_M2_TO_BTUH_FT2, 90);
      teMean += te[h];
    }
    teMean /= 24;
    const byFacade = windowsByFacade[fi];
    const ws = fc.windows;
    for (let h = 0; h < 24; h++) {
      const lagged = te[(h - fc.wallLagH + 24) % 24];
      walls[h] += fc.wallUaCool * (teMean - tic + fc.wallDecrement * (lagged - teMean));
      doors[h] += fc.doorUaCool * (te[h] - tic);
      if (ws.length === 0) continue;
      const beamBase = profile.beamWm2[h] * W_M2_TO_BTUH_FT2 * shgcRatio(profile.incidenceDeg[h]);
      const diffuse = profile.diffuseAndReflectedWm2[h] * W_M2_TO_BTUH_FT2 * DIFFUSE_RATIO;
      const tanOmega = profile.tanProfileAngle[h];
      let win = 0;
      for (let wi = 0; wi < ws.length; wi++) {
        const w = ws[wi];
        const sunlit = sunlitFraction(w.overhangDepthFt, w.overhangHeightAboveHeadFt, w.windowHeightFt, tanOmega);
        win += w.uaCool * (toArr[h] - tic) + w.areaFt2 * w.iac * w.shgc * (beamBase * sunlit + diffuse);
      }
      windows[h] += win;
      byFacade[h] += win;
    }
  }

  // Roof planes: a hip roof with one plane toward each facade (equal areas) — average irradiance.
  const hasAttic = p.attic.kind !== "none";
  if (hasAttic || p.vaulted.uaCool > 0) {
    for (let k = 0; k < 4; k++) {
      const prof = solar.surface(facingAzimuthDeg + FACADE_OFFSET_DEG[FACADE_LIST[k]], p.roofTiltDeg);
      for (let h = 0; h < 24; h++) roofIrr[h] += prof.totalWm2[h] * W_M2_TO_BTUH_FT2 * 0.25;
    }
  }
  const at = p.attic;
  for (let h = 0; h < 24; h++) {
    if (!hasAttic) {
      atticF[h] = toArr[h];
      continue;
    }
    atticF[h] = atticAir({
      roofUA: at.roofUaCool,
      solAirF: solAir(toArr[h], at.absorptance, roofIrr[h], p.roofTiltDeg),
      ceilingUA: at.ceilingUaCool,
      roomF: tic,
      ventilationConductanceBtuhF: at.ventilationConductance,
      outdoorF: toArr[h],
    });
    ceilings[h] = at.ceilingUaCool * (atticF[h] - tic);
  }
  if (p.vaulted.uaCool > 0) {
    let mean = 0;
    for (let h = 0; h < 24; h++) {
      te[h] = solAir(toArr[h], p.vaulted.absorptance, roofIrr[h], p.roofTiltDeg);
      mean += te[h] / 24;
    }
    for (let h = 0; h < 24; h++) {
      const lagged = te[(h - VAULTED_RESPONSE.lagH + 24) % 24];
      vaulted[h] = p.vaulted.uaCool * (mean - tic + VAULTED_RESPONSE.decrement * (lagged - mean));
    }
  }
  const sk = p.skylight;
  if (sk.areaFt2 > 0) {
    const prof = solar.surface(facingAzimuthDeg + FACADE_OFFSET_DEG[sk.facade], sk.tiltDeg);
    for (let h = 0; h < 24; h++) {
      const beam = prof.beamWm2[h] * W_M2_TO_BTUH_FT2 * shgcRatio(prof.incidenceDeg[h]);
      const diffuse = prof.diffuseAndReflectedWm2[h] * W_M2_TO_BTUH_FT2 * DIFFUSE_RATIO;
      skylights[h] = sk.uaCool * (toArr[h] - tic) + sk.areaFt2 * sk.iac * sk.shgc * (beam + diffuse);
    }
  }

  // Ducts, hour by hour, on the room load (the system is taken as off in hours with no cooling need).
  const zone = p.ductZone;
  const latentPerCfm =
    site.latentFactor *
    (zone === "basement" || zone === "indoor" || (zone === "attic" && at.kind === "encapsulated") ? 0 : site.latentDeltaGr);
  const supplyDeltaF = p.plan.coolingSupplyDeltaF;
  const ductFactorCool = p.ductFactorCool;
  const ductReturnLeakage = p.ducts.returnLeakageFraction;
  let peak = 0;
  try {
    for (let h = 0; h < 24; h++) {
      rooms[h] =
        walls[h] + windows[h] + doors[h] + ceilings[h] + vaulted[h] + skylights[h] + fixed.floors[h] +
        fixed.foundationWalls[h] + fixed.garageWall[h] + fixed.infiltration[h] + fixed.ventilation[h] + fixed.internal;
      if (rooms[h] > 0 && ductFactorCool !== null) {
        // HoF 2021 ch. 17 eq. 19 with the Table 6 cooling factor (sensible only). Latent: return
        // leakage draws duct-zone air (our estimate; the table notes leakage latent gain separately).
        ducts[h] = ductFactorCool * rooms[h];
        ductLatent[h] = Math.max(0, ductReturnLeakage * ((rooms[h] + ducts[h]) / (site.sensibleFactor * supplyDeltaF)) * latentPerCfm);
      } else if (rooms[h] > 0 && p.ducts.outsideEnvelope) {
        const zoneF =
          zone === "attic" ? atticF[h] : zone === "crawl" ? site.dailyMeanOutdoorF : zone === "garage" ? p.garageCoolingF[h] : tic;
        const d = ductLoadOf(p.ducts, rooms[h], "cooling", zoneF, tic, supplyDeltaF, site.sensibleFactor, latentPerCfm);
        ducts[h] = d.sensibleBtuh * p.ductLossFractionCool;
        ductLatent[h] = d.latentBtuh * p.ductLossFractionCool;
      }
      total[h] = rooms[h] + ducts[h];
      if (total[h] > total[peak]) peak = h;
    }
  } catch (error) {
    if (error instanceof RangeError) {
      throw new LoadInputError("ducts.supplyLeakagePct", error.message, { min: 0, max: 50, unit: "%" });
    }
    throw error;
  }

  const sensibleByComponent: ComponentLoads<CoolingSensibleComponent> = {
    walls: walls[peak],
    windows: windows[peak],
    doors: doors[peak],
    ceilings: ceilings[peak],
    vaultedCeilings: vaulted[peak],
    skylights: skylights[peak],
    floors: fixed.floors[peak],
    slab: 0, // slabs are taken as no cooling gain (ground below the room temperature)
    foundationWalls: fixed.foundationWalls[peak],
    garageWall: fixed.garageWall[peak],
    infiltration: fixed.infiltration[peak],
    ventilation: fixed.ventilation[peak],
    ducts: ducts[peak],
    internal: fixed.internal,
  };
  let sensibleBtuh = 0;
  for (let k = 0; k < SENSIBLE_KEYS.length; k++) sensibleBtuh += sensibleByComponent[SENSIBLE_KEYS[k]];

  const infCfm = p.infiltrationCfmHourly[peak];
  const unbalancedVentCfm =
    p.plan.ventilation.kind === "balanced"
      ? 0
      : Math.sqrt(infCfm * infCfm + p.ventilationProvidedCfm * p.ventilationProvidedCfm) - infCfm;
  const latentByComponent: ComponentLoads<CoolingLatentComponent> = {
    infiltration: site.latentFactor * infCfm * site.latentDeltaGr,
    ventilation: p.latentFixedBtuh.ventilation + site.latentFactor * unbalancedVentCfm * site.latentDeltaGr,
    internal: p.latentFixedBtuh.internal,
    ducts: ductLatent[peak],
  };
  let latentBtuh = 0;
  for (let k = 0; k < LATENT_KEYS.length; k++) latentBtuh += latentByComponent[LATENT_KEYS[k]];
  const totalBtuh = sensibleBtuh + latentBtuh;
  const tons = totalBtuh / BTUH_PER_TON;
  const hourlySensibleBtuh = hours24();
  for (let h = 0; h < 24; h++) hourlySensibleBtuh[h] = total[h];
  return {
    sensibleBtuh,
    latentBtuh,
    totalBtuh,
    peakHour: peak + 1,
    sensibleByComponent,
    latentByComponent,
    windowsByFacadeBtuh: {
      front: windowsByFacade[0][peak],
      left: windowsByFacade[1][peak],
      back: windowsByFacade[2][peak],
      right: windowsByFacade[3][peak],
    },
    hourlySensibleBtuh,
    hourlyOutdoorF: toArr.slice(),
    outdoorF: toArr[peak],
    indoorF: tic,
    atticF: hasAttic ? atticF[peak] : null,
    infiltrationCfm: infCfm,
    outdoorHumidityRatioGr: site.outdoorHumidityRatioGr,
    indoorHumidityRatioGr: site.indoorHumidityRatioGr,
    sensibleHeatRatio: totalBtuh > 0 ? sensibleBtuh / totalBtuh : 1,
    airflowCfm: sensibleBtuh / (site.sensibleFactor * supplyDeltaF),
    tons,
    floorAreaPerTonFt2: tons > 0 ? p.plan.conditionedFloorAreaFt2 / tons : Number.POSITIVE_INFINITY,
  };
}

// ---------------------------------------------------------------------------------------------
// Public entry points.

function validate(
  plan: unknown,
  site: unknown,
  options: ComputeOptions | undefined,
): { plan: PlanInput; site: SiteConditions } {
  if (options?.validated) return { plan: plan as PlanInput, site: site as SiteConditions };
  return { plan: parsePlanInput(plan), site: parseSiteConditions(site) };
}

function facingResult(p: PreparedPlan, facingAzimuthDeg: number): FacingLoads {
  const az = normalizeAzimuth(facingAzimuthDeg);
  const notes = [...p.notes];
  return {
    engineVersion: ENGINE_VERSION,
    facingAzimuthDeg: az,
    facadeAzimuthsDeg: {
      front: az,
      left: normalizeAzimuth(az + 90),
      back: normalizeAzimuth(az + 180),
      right: normalizeAzimuth(az + 270),
    },
    heating: p.heating,
    cooling: coolingDay(p, az),
    ventilation: { requiredCfm: p.ventilationRequiredCfm, providedCfm: p.ventilationProvidedCfm, kind: p.plan.ventilation.kind },
    effectiveLeakageAreaIn2: cm2ToIn2(p.elaCm2),
    notes,
    caution: DESIGN_ESTIMATE_CAUTION,
  };
}

/**
 * Heating and cooling loads of one plan with its front facing `facingAzimuthDeg` (degrees
 * clockwise from north; any real number, taken modulo 360).
 * Throws LoadInputError for bad input (unless `options.validated`).
 */
export function computeFacingLoads(
  plan: unknown,
  site: unknown,
  facingAzimuthDeg: number,
  options?: ComputeOptions,
): FacingLoads {
  if (typeof facingAzimuthDeg !== "number" || !Number.isFinite(facingAzimuthDeg)) {
    throw new LoadInputError("facingAzimuthDeg", `must be a finite number of degrees, got ${String(facingAzimuthDeg)}`, {
      min: 0,
      max: 360,
      unit: "°",
    });
  }
  const valid = validate(plan, site, options);
  return facingResult(preparePlan(valid.plan, prepareSite(valid.site)), facingAzimuthDeg);
}

/** The four facings (front to N, E, S, W), the worst (largest cooling total) and the spread. */
export function computePlanFacings(plan: unknown, site: unknown, options?: ComputeOptions): PlanFacings {
  const valid = validate(plan, site, options);
  const prepared = preparePlan(valid.plan, prepareSite(valid.site));
  const facings = FACING_LABELS.map((label, i) => ({ ...facingResult(prepared, i * 90), label }));
  let worst = facings[0];
  let min = facings[0].cooling.totalBtuh;
  for (const f of facings) {
    if (f.cooling.totalBtuh > worst.cooling.totalBtuh) worst = f;
    if (f.cooling.totalBtuh < min) min = f.cooling.totalBtuh;
  }
  return {
    engineVersion: ENGINE_VERSION,
    facings,
    worst: { label: worst.label, facingAzimuthDeg: worst.facingAzimuthDeg, coolingTotalBtuh: worst.cooling.totalBtuh },
    coolingSpreadBtuh: worst.cooling.totalBtuh - min,
    caution: DESIGN_ESTIMATE_CAUTION,
  };
}

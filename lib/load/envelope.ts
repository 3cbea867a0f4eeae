/**
 * The thermal envelope of one plan, prepared once per plan and site: U·A of every surface,
 * buffer-space temperatures (garage, unconditioned basement, attics), the heating load of every
 * surface (steady state, HoF 2021 ch. 17/18 U·A·ΔT) and the facing-independent hourly cooling
 * pieces (floors, foundation walls, garage wall). Facing-dependent solar work is in cooling-day.ts.
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
import { atticAirTemperatureF, SOL_AIR_HO_BTUH_FT2F } from "./attic";
import {
  FACADES,
  type Facade,
  type PlanInput,
  type RoofBaseAssembly,
  type WallBaseAssembly,
  type WallConstruction,
} from "./input";
import type { ComponentLoads, HeatingComponent } from "./results";
import type { PreparedSite } from "./site";
import { slabCoolingBtuh } from "./slab";
import { DEG, hours24 } from "./units";

/**
 * An attached garage, when its temperatures are not entered, is taken at the outdoor air
 * temperature with no sun on the shared wall: the treatment of HoF 2021 ch. 17's example house
 * (Tables 20 and 22, read: the garage wall takes the full outdoor Δt in heating and the shaded-wall
 * cooling factors), which is conservative for heating.
 */

export interface PreparedWindow {
  areaFt2: number;
  uaCool: number;
  shgc: number;
  /** Interior attenuation (IAC) × exterior attenuation: the share of transmitted solar that enters. */
  attenuation: number;
  /** Interior shade present (IAC < 1): transmitted solar is then taken as convective to a larger part. */
  interiorShade: boolean;
  overhangDepthFt: number;
  overhangHeightAboveHeadFt: number;
  windowHeightFt: number;
}

export interface PreparedFacade {
  facade: Facade;
  wallUaCool: number;
  wallBaseId: WallBaseAssembly;
  wallMass: MassClass;
  doorUaCool: number;
  windows: PreparedWindow[];
}

export interface PreparedEnvelope {
  /** Heating load of every surface component, Btu/h (air, ventilation and ducts are added later). */
  heating: ComponentLoads<HeatingComponent>;
  facades: PreparedFacade[];
  attic: {
    kind: PlanInput["attic"]["kind"];
    ceilingAreaFt2: number;
    ceilingUaHeat: number;
    ceilingUaCool: number;
    roofUaHeat: number;
    roofUaCool: number;
    ventilationConductance: number;
    absorptance: number;
    roofBaseId: RoofBaseAssembly;
  };
  vaulted: { uaCool: number; absorptance: number; baseId: RoofBaseAssembly };
  skylight: {
    areaFt2: number;
    uaCool: number;
    shgc: number;
    attenuation: number;
    tiltDeg: number;
    facade: Facade;
  };
  roofTiltDeg: number;
  /** Slab: exposed perimeter and F-factor (heating), floor area and cooling credit (Btu/h, negative). */
  slab: { perimeterFt: number; fFactor: number; areaFt2: number; coolingBtuh: number };
  /** Hourly sensible loads that do not depend on facing, Btu/h. */
  floorsCool: number[];
  foundationWallsCool: number[];
  garageWallCool: number[];
  garageCoolingF: number[];
  garageHeatingF: number;
  basementHeatingF: number | null;
  atticHeatingF: number | null;
}

export function wallOf(plan: PlanInput, facade: Facade): WallConstruction {
  return plan.facades[facade].wall ?? plan.wall;
}

function zeros(): ComponentLoads<HeatingComponent> {
  return {
    walls: 0,
    windows: 0,
    doors: 0,
    ceilings: 0,
    vaultedCeilings: 0,
    skylights: 0,
    floors: 0,
    slab: 0,
    foundationWalls: 0,
    garageWall: 0,
    infiltration: 0,
    ventilation: 0,
    ducts: 0,
  };
}

export function prepareEnvelope(plan: PlanInput, site: PreparedSite, notes: string[]): PreparedEnvelope {
  const s = site.site;
  const ti = s.indoorHeatingF;
  const to = s.heatingOutdoorDbF;
  const dtHeat = ti - to;
  const tic = s.indoorCoolingF;
  const heating = zeros();

  // --- Buffer-space temperatures (heating) -------------------------------------------------
  const garageHeatingF = plan.garage.heatingTemperatureF ?? to;
  const garageCoolingF = hours24();
  for (let h = 0; h < 24; h++) garageCoolingF[h] = plan.garage.coolingTemperatureF ?? site.outdoorF[h];
  if (
    plan.garage.wallAreaFt2 + plan.garage.floorOverAreaFt2 > 0 &&
    plan.garage.heatingTemperatureF === undefined
  ) {
    notes.push(
      "Garage temperatures not entered: the garage is taken at the outdoor temperature, without sun (the handbook example's treatment).",
    );
  }

  const f = plan.foundation;
  const agArea = f.foundationWallAboveGradeAreaFt2;
  const bgArea = f.foundationWallAreaFt2 - agArea;
  const agUHeat =
    f.foundationWallUFactor ?? aboveGradeFoundationWallU(f.foundationWallInsulationR, "heating");
  const agUCool =
    f.foundationWallUFactor ?? aboveGradeFoundationWallU(f.foundationWallInsulationR, "cooling");
  const bgU =
    f.foundationWallUFactor ??
    belowGradeWallU(f.foundationWallInsulationR, f.foundationWallDepthBelowGradeFt);
  const floorUHeat = floorU(f.floor, "still-air", "heating");
  const floorUCool = floorU(f.floor, "still-air", "cooling");

  let basementHeatingF: number | null = null;
  if (f.kind === "unconditioned-basement") {
    const uaFloor = floorUHeat * f.floorAreaFt2;
    const uaAg = agUHeat * agArea;
    const uaBg = bgU * bgArea;
    basementHeatingF =
      f.basementHeatingTemperatureF ??
      (uaFloor + uaAg + uaBg > 0
        ? (uaFloor * ti + uaAg * to + uaBg * site.groundF) / (uaFloor + uaAg + uaBg)
        : ti);
    if (f.basementHeatingTemperatureF === undefined) {
      notes.push(
        `Unconditioned basement at ${basementHeatingF.toFixed(0)} °F in heating (heat balance with a ${site.groundF.toFixed(0)} °F ground estimate).`,
      );
    }
  }

  // --- Facades -------------------------------------------------------------------------------
  const facades: PreparedFacade[] = [];
  for (const facade of FACADES) {
    const fi = plan.facades[facade];
    const wall = wallOf(plan, facade);
    const groups = [fi.window, ...fi.extraWindows].filter((w) => w.areaFt2 > 0);
    let windowAreaFt2 = 0;
    for (const w of groups) windowAreaFt2 += w.areaFt2;
    const netWallFt2 = fi.grossWallAreaFt2 - windowAreaFt2 - fi.doorAreaFt2;
    heating.walls += wallU(wall, "heating") * netWallFt2 * dtHeat;
    heating.doors += fi.doorUFactor * fi.doorAreaFt2 * dtHeat;
    for (const w of groups) heating.windows += w.uFactor * w.areaFt2 * dtHeat;
    facades.push({
      facade,
      wallUaCool: wallU(wall, "cooling") * netWallFt2,
      wallBaseId: wall.baseId,
      wallMass: wallMassClass(wall.baseId),
      doorUaCool: fi.doorUFactor * fi.doorAreaFt2,
      windows: groups.map((w) => ({
        areaFt2: w.areaFt2,
        uaCool: w.uFactor * w.areaFt2,
        shgc: w.shgc,
        attenuation: w.interiorShadingCoefficient * w.exteriorAttenuation,
        interiorShade: w.interiorShadingCoefficient < 1,
        overhangDepthFt: w.overhangDepthFt,
        overhangHeightAboveHeadFt: w.overhangHeightAboveHeadFt,
        windowHeightFt: w.windowHeightFt,
      })),
    });
  }

  // --- Attic, roof, vaulted ceilings, skylights -----------------------------------------------
  const a = plan.attic;
  const roofTiltDeg = Math.atan(a.roofPitchRisePer12In / 12) / DEG;
  const ceilingAreaFt2 =
    a.kind === "none" ? 0 : (a.ceilingAreaFt2 ?? plan.conditionedFloorAreaFt2 / plan.stories);
  // Hip roof of one pitch: roof area = footprint / cos(tilt) (geometry).
  const roofAreaFt2 = ceilingAreaFt2 / Math.cos(roofTiltDeg * DEG);
  const ceilingUaHeat = ceilingU(a.ceiling, "heating") * ceilingAreaFt2;
  const ceilingUaCool = ceilingU(a.ceiling, "cooling") * ceilingAreaFt2;
  let atticHeatingF: number | null = null;
  let roofUaHeat = 0;
  let roofUaCool = 0;
  let ventilationConductance = 0;
  if (a.kind === "vented") {
    atticHeatingF = to; // a vented attic runs at the outdoor temperature in heating
    heating.ceilings = ceilingUaHeat * (ti - atticHeatingF);
    roofUaCool = roofAreaFt2 / (1 / SOL_AIR_HO_BTUH_FT2F + 1 / ventedRoofDeckUWithoutOutsideFilm());
    ventilationConductance = site.sensibleFactor * a.ventilationCfmPerFt2 * ceilingAreaFt2;
  } else if (a.kind === "encapsulated") {
    roofUaHeat = roofU(a.roofDeck, { season: "heating", gypsumCeiling: false }) * roofAreaFt2;
    atticHeatingF = atticAirTemperatureF({
      roofUA: roofUaHeat,
      solAirF: to,
      ceilingUA: ceilingUaHeat,
      roomF: ti,
      ventilationConductanceBtuhF: 0,
      outdoorF: to,
    });
    heating.ceilings = ceilingUaHeat * (ti - atticHeatingF);
    roofUaCool = roofU(a.roofDeck, { season: "cooling", gypsumCeiling: false }) * roofAreaFt2;
  }
  const vc = plan.vaultedCeiling;
  heating.vaultedCeilings =
    roofU(vc.construction, { season: "heating", gypsumCeiling: true }) * vc.areaFt2 * dtHeat;
  const sk = plan.skylights;
  heating.skylights = sk.uFactor * sk.areaFt2 * dtHeat;

  // --- Floors, slab, foundation walls, garage --------------------------------------------------
  const floorsCool = hours24();
  const foundationWallsCool = hours24();
  const garageWallCool = hours24();
  if (f.kind === "vented-crawlspace") {
    heating.floors += floorUHeat * f.floorAreaFt2 * dtHeat; // a vented crawlspace runs at the outdoor temperature in heating
    // Cooling: the crawlspace runs near the daily mean outdoor temperature (our approximation).
    for (let h = 0; h < 24; h++)
      floorsCool[h] += floorUCool * f.floorAreaFt2 * (site.dailyMeanOutdoorF - tic);
  } else if (f.kind === "unconditioned-basement") {
    heating.floors += floorUHeat * f.floorAreaFt2 * (ti - (basementHeatingF ?? ti));
    // Cooling: an unconditioned basement is cooler than the house; no credit is taken.
  } else if (f.kind === "conditioned-basement" || f.kind === "conditioned-crawlspace") {
    heating.foundationWalls += agUHeat * agArea * dtHeat + bgU * bgArea * Math.max(0, ti - site.groundF);
    for (let h = 0; h < 24; h++) foundationWallsCool[h] = agUCool * agArea * (site.outdoorF[h] - tic);
  }
  if (f.floorAreaFt2 > 0 && f.kind !== "vented-crawlspace" && f.kind !== "unconditioned-basement") {
    notes.push(`foundation.floorAreaFt2 is ignored for a ${f.kind} foundation.`);
  }
  const fFactor = f.slabFFactor ?? slabFFactor(f.slabEdgeInsulationR, f.slabEdgeConstruction);
  heating.slab = fFactor * f.slabPerimeterFt * dtHeat;
  const slabAreaFt2 =
    f.slabPerimeterFt > 0 ? (f.slabAreaFt2 ?? plan.conditionedFloorAreaFt2 / plan.stories) : 0;

  const oo = plan.floorOverOutdoors;
  heating.floors += floorU(oo.construction, "outdoors", "heating") * oo.areaFt2 * dtHeat;
  const ooUaCool = floorU(oo.construction, "outdoors", "cooling") * oo.areaFt2;
  const g = plan.garage;
  const gFloorUaHeat = floorU(g.floorOver, "still-air", "heating") * g.floorOverAreaFt2;
  const gFloorUaCool = floorU(g.floorOver, "still-air", "cooling") * g.floorOverAreaFt2;
  heating.floors += gFloorUaHeat * (ti - garageHeatingF);
  const gWallNetFt2 = g.wallAreaFt2 - g.doorAreaFt2;
  const gWallUaHeat = wallU(plan.wall, "heating") * gWallNetFt2 + g.doorUFactor * g.doorAreaFt2;
  const gWallUaCool = wallU(plan.wall, "cooling") * gWallNetFt2 + g.doorUFactor * g.doorAreaFt2;
  heating.garageWall = gWallUaHeat * (ti - garageHeatingF);
  for (let h = 0; h < 24; h++) {
    floorsCool[h] += ooUaCool * (site.outdoorF[h] - tic) + gFloorUaCool * (garageCoolingF[h] - tic);
    garageWallCool[h] = gWallUaCool * (garageCoolingF[h] - tic);
  }

  return {
    heating,
    facades,
    attic: {
      kind: a.kind,
      ceilingAreaFt2,
      ceilingUaHeat,
      ceilingUaCool: a.kind === "none" ? 0 : ceilingUaCool,
      roofUaHeat,
      roofUaCool,
      ventilationConductance,
      absorptance: a.roofSolarAbsorptance,
      roofBaseId: a.roofDeck.baseId,
    },
    vaulted: {
      uaCool: roofU(vc.construction, { season: "cooling", gypsumCeiling: true }) * vc.areaFt2,
      absorptance: vc.roofSolarAbsorptance,
      baseId: vc.construction.baseId,
    },
    skylight: {
      areaFt2: sk.areaFt2,
      uaCool: sk.uFactor * sk.areaFt2,
      shgc: sk.shgc,
      attenuation: sk.interiorShadingCoefficient,
      tiltDeg: sk.tiltDeg,
      facade: sk.facade,
    },
    roofTiltDeg,
    slab: {
      perimeterFt: f.slabPerimeterFt,
      fFactor,
      areaFt2: slabAreaFt2,
      coolingBtuh: slabCoolingBtuh(slabAreaFt2, f.slabFloorCovering),
    },
    floorsCool,
    foundationWallsCool,
    garageWallCool,
    garageCoolingF,
    garageHeatingF,
    basementHeatingF,
    atticHeatingF,
  };
}

/**
 * The facing-dependent cooling design day of the hourly method: solar on every facade, window and
 * roof, hour by hour over solar hours 1–24; the peak hour of the total sensible load governs.
 * This is the hot path (it runs for every lot): keep it allocation-light; imported constants are
 * copied to locals because transpiled ES-module bindings are read through getters.
 */
import { atticAirTemperatureF, solAirTemperatureF } from "./attic";
import { ductLoad } from "./ducts";
import { ductRangeError } from "./duct-setup";
import { FACADES, type Facade } from "./input";
import type { PreparedPlan } from "./prepare-plan";
import {
  COOLING_LATENT_COMPONENTS,
  COOLING_SENSIBLE_COMPONENTS,
  type ComponentLoads,
  type CoolingLatentComponent,
  type CoolingResult,
  type CoolingSensibleComponent,
} from "./results";
import type { SurfaceProfile } from "./solar";
import { BTUH_FT2_PER_W_M2, BTUH_PER_TON, hours24 } from "./units";
import { DIFFUSE_SHGC_RATIO, overhangSunlitFraction, shgcAngleRatio } from "./windows";

const W_M2_TO_BTUH_FT2 = BTUH_FT2_PER_W_M2;
const DIFFUSE_RATIO = DIFFUSE_SHGC_RATIO;
const shgcRatio = shgcAngleRatio;
const sunlitFraction = overhangSunlitFraction;
const solAir = solAirTemperatureF;
const atticAir = atticAirTemperatureF;
const FACADE_LIST: readonly Facade[] = FACADES;
const SENSIBLE_KEYS: readonly CoolingSensibleComponent[] = COOLING_SENSIBLE_COMPONENTS;
const LATENT_KEYS: readonly CoolingLatentComponent[] = COOLING_LATENT_COMPONENTS;

/**
 * Time lag (h) and decrement of periodic conduction by mass class (from memory; orders of
 * magnitude of HoF ch. 18 conduction time series for wood-frame and 8 in block walls).
 */
const MASS_RESPONSE = {
  "light-frame": { lagH: 2, decrement: 0.85 },
  masonry: { lagH: 5, decrement: 0.5 },
} as const;
const VAULTED_RESPONSE = { lagH: 1, decrement: 0.9 };

export const FACADE_OFFSET_DEG: Record<Facade, number> = { front: 0, left: 90, back: 180, right: 270 };

const SCRATCH = {
  walls: new Float64Array(24),
  windows: new Float64Array(24),
  doors: new Float64Array(24),
  ceilings: new Float64Array(24),
  vaulted: new Float64Array(24),
  skylights: new Float64Array(24),
  ducts: new Float64Array(24),
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
  SCRATCH.rooms,
  SCRATCH.total,
  SCRATCH.te,
  SCRATCH.roofIrr,
  SCRATCH.atticF,
  ...SCRATCH.windowsByFacade,
];

export function hourlyCoolingDay(p: PreparedPlan, facingAzimuthDeg: number): CoolingResult {
  const site = p.site;
  const solar = site.solar;
  const tic = site.site.indoorCoolingF;
  const toArr = site.outdoorF;
  const env = p.envelope;
  const air = p.air;

  // Scratch rows reused across calls (the function is synchronous and never re-entered).
  const { walls, windows, doors, ceilings, vaulted, skylights, ducts, rooms, total, te, roofIrr, atticF } = SCRATCH;
  const windowsByFacade = SCRATCH.windowsByFacade;
  for (const row of SCRATCH_ROWS) row.fill(0);

  // Walls, doors, windows per facade.
  for (let fi = 0; fi < env.facades.length; fi++) {
    const fc = env.facades[fi];
    const response = MASS_RESPONSE[fc.wallMass];
    const profile: SurfaceProfile = solar.surface(facingAzimuthDeg + FACADE_OFFSET_DEG[fc.facade], 90);
    const totalWm2 = profile.totalWm2;
    let teMean = 0;
    for (let h = 0; h < 24; h++) {
      te[h] = solAir(toArr[h], p.plan.wallSolarAbsorptance, totalWm2[h] * W_M2_TO_BTUH_FT2, 90);
      teMean += te[h];
    }
    teMean /= 24;
    const byFacade = windowsByFacade[fi];
    const ws = fc.windows;
    for (let h = 0; h < 24; h++) {
      const lagged = te[(h - response.lagH + 24) % 24];
      walls[h] += fc.wallUaCool * (teMean - tic + response.decrement * (lagged - teMean));
      doors[h] += fc.doorUaCool * (te[h] - tic);
      if (ws.length === 0) continue;
      const beamBase = profile.beamWm2[h] * W_M2_TO_BTUH_FT2 * shgcRatio(profile.incidenceDeg[h]);
      const diffuse = profile.diffuseAndReflectedWm2[h] * W_M2_TO_BTUH_FT2 * DIFFUSE_RATIO;
      const tanOmega = profile.tanProfileAngle[h];
      let win = 0;
      for (let wi = 0; wi < ws.length; wi++) {
        const w = ws[wi];
        const sunlit = sunlitFraction(w.overhangDepthFt, w.overhangHeightAboveHeadFt, w.windowHeightFt, tanOmega);
        win += w.uaCool * (toArr[h] - tic) + w.areaFt2 * w.attenuation * w.shgc * (beamBase * sunlit + diffuse);
      }
      windows[h] += win;
      byFacade[h] += win;
    }
  }

  // Roof planes: a hip roof with one plane toward each facade (equal areas) — average irradiance.
  const at = env.attic;
  const hasAttic = at.kind !== "none";
  if (hasAttic || env.vaulted.uaCool > 0) {
    for (let k = 0; k < 4; k++) {
      const prof = solar.surface(facingAzimuthDeg + FACADE_OFFSET_DEG[FACADE_LIST[k]], env.roofTiltDeg);
      for (let h = 0; h < 24; h++) roofIrr[h] += prof.totalWm2[h] * W_M2_TO_BTUH_FT2 * 0.25;
    }
  }
  for (let h = 0; h < 24; h++) {
    if (!hasAttic) {
      atticF[h] = toArr[h];
      continue;
    }
    atticF[h] = atticAir({
      roofUA: at.roofUaCool,
      solAirF: solAir(toArr[h], at.absorptance, roofIrr[h], env.roofTiltDeg),
      ceilingUA: at.ceilingUaCool,
      roomF: tic,
      ventilationConductanceBtuhF: at.ventilationConductance,
      outdoorF: toArr[h],
    });
    ceilings[h] = at.ceilingUaCool * (atticF[h] - tic);
  }
  if (env.vaulted.uaCool > 0) {
    let mean = 0;
    for (let h = 0; h < 24; h++) {
      te[h] = solAir(toArr[h], env.vaulted.absorptance, roofIrr[h], env.roofTiltDeg);
      mean += te[h] / 24;
    }
    for (let h = 0; h < 24; h++) {
      const lagged = te[(h - VAULTED_RESPONSE.lagH + 24) % 24];
      vaulted[h] = env.vaulted.uaCool * (mean - tic + VAULTED_RESPONSE.decrement * (lagged - mean));
    }
  }
  const sk = env.skylight;
  if (sk.areaFt2 > 0) {
    const prof = solar.surface(facingAzimuthDeg + FACADE_OFFSET_DEG[sk.facade], sk.tiltDeg);
    for (let h = 0; h < 24; h++) {
      const beam = prof.beamWm2[h] * W_M2_TO_BTUH_FT2 * shgcRatio(prof.incidenceDeg[h]);
      const diffuse = prof.diffuseAndReflectedWm2[h] * W_M2_TO_BTUH_FT2 * DIFFUSE_RATIO;
      skylights[h] = sk.uaCool * (toArr[h] - tic) + sk.areaFt2 * sk.attenuation * sk.shgc * (beam + diffuse);
    }
  }

  // Ducts, hour by hour, on the room load (the system is taken as off in hours with no cooling need).
  const dz = p.ducts;
  const supplyDeltaF = p.plan.coolingSupplyDeltaF;
  const internal = p.internal.sensibleBtuh;
  let peak = 0;
  try {
  for (let h = 0; h < 24; h++) {
    rooms[h] =
      walls[h] + windows[h] + doors[h] + ceilings[h] + vaulted[h] + skylights[h] + env.floorsCool[h] +
      env.foundationWallsCool[h] + env.garageWallCool[h] + air.coolingInfiltrationSensibleBtuh[h] +
      air.coolingVentilationSensibleBtuh[h] + internal;
    if (rooms[h] > 0 && dz.factorCool !== null) {
      ducts[h] = dz.factorCool * rooms[h]; // HoF 2021 ch. 17 eq. 19 with the Table 6 cooling factor
    } else if (rooms[h] > 0 && dz.geometry.outsideEnvelope) {
      const zoneF = dz.zone === "attic" ? atticF[h] : dz.zone === "crawl" ? site.dailyMeanOutdoorF : dz.zone === "garage" ? env.garageCoolingF[h] : tic;
      const d = ductLoad(dz.geometry, rooms[h], "cooling", zoneF, tic, supplyDeltaF, site.sensibleFactor, 0);
      ducts[h] = d.sensibleBtuh * dz.lossFractionCool;
    }
    total[h] = rooms[h] + ducts[h];
    if (total[h] > total[peak]) peak = h;
  }
  } catch (error) {
    throw ductRangeError(error);
  }

  const sensibleByComponent: ComponentLoads<CoolingSensibleComponent> = {
    walls: walls[peak],
    windows: windows[peak],
    doors: doors[peak],
    ceilings: ceilings[peak],
    vaultedCeilings: vaulted[peak],
    skylights: skylights[peak],
    floors: env.floorsCool[peak],
    slab: 0,
    foundationWalls: env.foundationWallsCool[peak],
    garageWall: env.garageWallCool[peak],
    infiltration: air.coolingInfiltrationSensibleBtuh[peak],
    ventilation: air.coolingVentilationSensibleBtuh[peak],
    ducts: ducts[peak],
    internal,
  };
  let sensibleBtuh = 0;
  for (let k = 0; k < SENSIBLE_KEYS.length; k++) sensibleBtuh += sensibleByComponent[SENSIBLE_KEYS[k]];

  const infCfm = air.coolingInfiltrationCfm[peak];
  const unbalancedVentCfm =
    p.plan.ventilation.kind === "balanced"
      ? 0
      : Math.sqrt(infCfm * infCfm + air.ventilationProvidedCfm * air.ventilationProvidedCfm) - infCfm;
  const latentByComponent: ComponentLoads<CoolingLatentComponent> = {
    infiltration: site.latentFactor * infCfm * site.latentDeltaGr,
    ventilation: air.balancedVentilationLatentBtuh + site.latentFactor * unbalancedVentCfm * site.latentDeltaGr,
    internal: p.internal.latentBtuh,
    ducts: 0, // no published duct latent gain for these methods (HoF 2021 ch. 17 Table 6 is sensible only)
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

/**
 * The facing-dependent cooling design day of the hourly method: solar on every facade, window and
 * roof, hour by hour over solar hours 1–24, with heat storage by the radiant and conduction time
 * series of HoF 2021 ch. 18 (storage.ts); the peak hour of the total sensible load governs.
 * This is the hot path (it runs for every lot): keep it allocation-light; imported constants are
 * copied to locals because transpiled ES-module bindings are read through getters.
 */
import { atticAirTemperatureF, solAirTemperatureF } from "./attic";
import { ductLoad } from "./ducts";
import { ductRangeError } from "./duct-setup";
import { FACADES, type Facade } from "./input";
import type { PreparedPlan } from "./prepare-plan";
import type { TimeSeries } from "./storage";
import { capacityWithSwingBtuh, DESIGN_TEMPERATURE_SWING_F } from "./temperature-swing";
import {
  convolveDay,
  RADIANT_FRACTION_CONDUCTION_ROOF,
  RADIANT_FRACTION_CONDUCTION_WALLS_FLOORS,
  RADIANT_FRACTION_CONDUCTION_WINDOW_HIGH_SHGC,
  RADIANT_FRACTION_CONDUCTION_WINDOW_LOW_SHGC,
  RADIANT_FRACTION_SOLAR_LIGHT_VENETIAN_BLINDS_EXAMPLE,
} from "./time-series/radiant-time-series";
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
const convolve = convolveDay;
const capacityWithSwing = capacityWithSwingBtuh;
const DESIGN_SWING_F = DESIGN_TEMPERATURE_SWING_F;
const SENSIBLE_KEYS: readonly CoolingSensibleComponent[] = COOLING_SENSIBLE_COMPONENTS;
const LATENT_KEYS: readonly CoolingLatentComponent[] = COOLING_LATENT_COMPONENTS;

export const FACADE_OFFSET_DEG: Record<Facade, number> = { front: 0, left: 90, back: 180, right: 270 };

/**
 * Radiant shares of heat gains, HoF 2021 ch. 18 Table 14 (read): conduction through walls and
 * floors 0.46, roofs 0.60, windows 0.46 (SHGC < 0.5) or 0.33; transmitted solar without interior
 * shading 1 (beam through the solar RTS); behind interior shading 0.54, the one value read for an
 * interior shade (the chapter's example venetian blind; its Table 14 defers to ch. 15 for others).
 */
const RADIANT_WALLS = RADIANT_FRACTION_CONDUCTION_WALLS_FLOORS;
const RADIANT_WINDOW_LOW_SHGC = RADIANT_FRACTION_CONDUCTION_WINDOW_LOW_SHGC;
const RADIANT_WINDOW_HIGH_SHGC = RADIANT_FRACTION_CONDUCTION_WINDOW_HIGH_SHGC;
const RADIANT_ROOF = RADIANT_FRACTION_CONDUCTION_ROOF;
const RADIANT_SHADED_SOLAR = RADIANT_FRACTION_SOLAR_LIGHT_VENETIAN_BLINDS_EXAMPLE;

const row = () => new Float64Array(24);
const SCRATCH = {
  walls: row(),
  windows: row(),
  doors: row(),
  ceilings: row(),
  vaulted: row(),
  skylights: row(),
  floors: row(),
  foundationWalls: row(),
  garageWall: row(),
  ducts: row(),
  rooms: row(),
  total: row(),
  te: row(),
  lagged: row(),
  gain: row(),
  roofIrr: row(),
  atticF: row(),
  doorGain: row(),
  stored: row(),
  storedSolar: row(),
  sumRadNonsolar: row(),
  sumRadSolar: row(),
  windowsByFacade: [row(), row(), row(), row()],
  // Radiant parts of each component's heat gain, convolved with the RTS only in total (the sums are
  // linear) and, for the component breakdown, at the peak hour alone.
  radWalls: row(),
  radDoors: row(),
  radWindows: [row(), row(), row(), row()],
  radWindowsSolar: [row(), row(), row(), row()],
  radCeilings: row(),
  radVaulted: row(),
  radSkylights: row(),
  radSkylightsSolar: row(),
  radFloors: row(),
  radFoundationWalls: row(),
  radGarageWall: row(),
};
const RADIANT_ROWS: Float64Array[] = [
  SCRATCH.radWalls,
  SCRATCH.radDoors,
  ...SCRATCH.radWindows,
  SCRATCH.radCeilings,
  SCRATCH.radVaulted,
  SCRATCH.radSkylights,
  SCRATCH.radFloors,
  SCRATCH.radFoundationWalls,
  SCRATCH.radGarageWall,
];
const SOLAR_RADIANT_ROWS: Float64Array[] = [...SCRATCH.radWindowsSolar, SCRATCH.radSkylightsSolar];

/** A heat gain with radiant share f: its convective part into `out`, its radiant part into `radiant` (for the RTS). */
function addStored(gain: Float64Array, radiantShare: number, out: Float64Array, radiant: Float64Array): void {
  for (let h = 0; h < 24; h++) {
    out[h] += (1 - radiantShare) * gain[h];
    radiant[h] += radiantShare * gain[h];
  }
}

/** The RTS's cooling load at one hour of a radiant gain row: Σ_j r_j · q_r(h − j). */
function storedAt(radiant: Float64Array, rts: TimeSeries, h: number): number {
  let sum = 0;
  const f = rts.factors;
  for (let j = 0; j <= rts.last; j++) sum += f[j] * radiant[(h - j + 24) % 24];
  return sum;
}

/** Duct gain for a room sensible load at hour h, Btu/h (the system is taken as off with no cooling need). */
function ductGainBtuh(p: PreparedPlan, roomLoadBtuh: number, atticF: number, h: number): number {
  const dz = p.ducts;
  if (roomLoadBtuh <= 0) return 0;
  if (dz.factorCool !== null) return dz.factorCool * roomLoadBtuh; // HoF 2021 ch. 17 eq. 19 with the Table 6 cooling factor
  if (!dz.geometry.outsideEnvelope) return 0;
  const site = p.site;
  const tic = site.site.indoorCoolingF;
  const zoneF =
    dz.zone === "attic"
      ? atticF
      : dz.zone === "crawl"
        ? site.dailyMeanOutdoorF
        : dz.zone === "garage"
          ? p.envelope.garageCoolingF[h]
          : tic;
  const d = ductLoad(
    dz.geometry,
    roomLoadBtuh,
    "cooling",
    zoneF,
    tic,
    p.plan.coolingSupplyDeltaF,
    site.sensibleFactor,
    0,
  );
  return d.sensibleBtuh * dz.lossFractionCool;
}

export function hourlyCoolingDay(p: PreparedPlan, facingAzimuthDeg: number): CoolingResult {
  const site = p.site;
  const solar = site.solar;
  const tic = site.site.indoorCoolingF;
  const toArr = site.outdoorF;
  const env = p.envelope;
  const air = p.air;
  const st = p.storage;

  // Scratch rows reused across calls (the function is synchronous and never re-entered).
  const {
    walls,
    windows,
    doors,
    ceilings,
    vaulted,
    skylights,
    floors,
    foundationWalls,
    garageWall,
    ducts,
    rooms,
    total,
  } = SCRATCH;
  const { te, lagged, gain, roofIrr, atticF, doorGain } = SCRATCH;
  const windowsByFacade = SCRATCH.windowsByFacade;
  walls.fill(0);
  windows.fill(0);
  doors.fill(0);
  ceilings.fill(0);
  vaulted.fill(0);
  skylights.fill(0);
  floors.fill(0);
  foundationWalls.fill(0);
  garageWall.fill(0);
  ducts.fill(0);
  roofIrr.fill(0);
  gain.fill(0);
  for (const r of RADIANT_ROWS) r.fill(0);
  for (const r of SOLAR_RADIANT_ROWS) r.fill(0);

  // Walls and doors: conduction of the sol-air difference, through each wall's CTS (ch. 18 eq.
  // 30–31); doors are thin and taken without conduction lag. Their radiant share then through the RTS.
  doorGain.fill(0);
  for (let fi = 0; fi < env.facades.length; fi++) {
    const fc = env.facades[fi];
    const profile: SurfaceProfile = solar.surface(facingAzimuthDeg + FACADE_OFFSET_DEG[fc.facade], 90);
    const totalWm2 = profile.totalWm2;
    for (let h = 0; h < 24; h++)
      te[h] = solAir(toArr[h], p.plan.wallSolarAbsorptance, totalWm2[h] * W_M2_TO_BTUH_FT2, 90);
    const cts = st.walls[fi];
    convolve(te, cts.factors, cts.last, lagged);
    for (let h = 0; h < 24; h++) {
      gain[h] += fc.wallUaCool * (lagged[h] - tic);
      doorGain[h] += fc.doorUaCool * (te[h] - tic);
    }

    // Windows: conduction (radiant 0.46 or 0.33), transmitted beam (solar RTS without interior
    // shade), diffuse and shaded beam (nonsolar RTS).
    const byFacade = windowsByFacade[fi];
    byFacade.fill(0);
    const ws = fc.windows;
    if (ws.length === 0) continue;
    const radN = SCRATCH.radWindows[fi];
    const radS = SCRATCH.radWindowsSolar[fi];
    for (let h = 0; h < 24; h++) {
      const beamBase = profile.beamWm2[h] * W_M2_TO_BTUH_FT2 * shgcRatio(profile.incidenceDeg[h]);
      const diffuse = profile.diffuseAndReflectedWm2[h] * W_M2_TO_BTUH_FT2 * DIFFUSE_RATIO;
      const tanOmega = profile.tanProfileAngle[h];
      let convective = 0;
      let nonsolarRadiant = 0;
      let beamRadiant = 0;
      for (let wi = 0; wi < ws.length; wi++) {
        const w = ws[wi];
        const conduction = w.uaCool * (toArr[h] - tic);
        const conductionRadiant = w.shgc < 0.5 ? RADIANT_WINDOW_LOW_SHGC : RADIANT_WINDOW_HIGH_SHGC;
        convective += (1 - conductionRadiant) * conduction;
        nonsolarRadiant += conductionRadiant * conduction;
        const sunlit = sunlitFraction(
          w.overhangDepthFt,
          w.overhangHeightAboveHeadFt,
          w.windowHeightFt,
          tanOmega,
        );
        const beam = w.areaFt2 * w.attenuation * w.shgc * beamBase * sunlit;
        const diff = w.areaFt2 * w.attenuation * w.shgc * diffuse;
        if (w.interiorShade) {
          convective += (1 - RADIANT_SHADED_SOLAR) * (beam + diff);
          nonsolarRadiant += RADIANT_SHADED_SOLAR * (beam + diff);
        } else {
          nonsolarRadiant += diff;
          beamRadiant += beam;
        }
      }
      byFacade[h] = convective;
      radN[h] = nonsolarRadiant;
      radS[h] = beamRadiant;
    }
    for (let h = 0; h < 24; h++) windows[h] += byFacade[h];
  }
  addStored(gain, RADIANT_WALLS, walls, SCRATCH.radWalls);
  addStored(doorGain, RADIANT_WALLS, doors, SCRATCH.radDoors);

  // Roof planes: a hip roof with one plane toward each facade (equal areas) — average irradiance.
  const at = env.attic;
  const hasAttic = at.kind !== "none";
  if (hasAttic || env.vaulted.uaCool > 0) {
    for (let k = 0; k < 4; k++) {
      const prof = solar.surface(facingAzimuthDeg + FACADE_OFFSET_DEG[FACADE_LIST[k]], env.roofTiltDeg);
      for (let h = 0; h < 24; h++) roofIrr[h] += prof.totalWm2[h] * W_M2_TO_BTUH_FT2 * 0.25;
    }
  }
  if (hasAttic) {
    // Attic air from its heat balance each hour (attic.ts); an encapsulated attic's insulated deck
    // passes the sol-air through its own CTS first. A vented attic's bare deck is taken without lag;
    // the ceiling below it then responds as the whole roof–attic–ceiling stack (storage.ts).
    for (let h = 0; h < 24; h++) te[h] = solAir(toArr[h], at.absorptance, roofIrr[h], env.roofTiltDeg);
    if (at.kind === "encapsulated") {
      convolve(te, st.encapsulatedRoof.factors, st.encapsulatedRoof.last, lagged);
    } else {
      for (let h = 0; h < 24; h++) lagged[h] = te[h];
    }
    for (let h = 0; h < 24; h++) {
      atticF[h] = atticAir({
        roofUA: at.roofUaCool,
        solAirF: lagged[h],
        ceilingUA: at.ceilingUaCool,
        roomF: tic,
        ventilationConductanceBtuhF: at.ventilationConductance,
        outdoorF: toArr[h],
      });
    }
    if (at.kind === "vented") {
      convolve(atticF, st.ventedCeiling.factors, st.ventedCeiling.last, lagged);
    } else {
      for (let h = 0; h < 24; h++) lagged[h] = atticF[h];
    }
    for (let h = 0; h < 24; h++) gain[h] = at.ceilingUaCool * (lagged[h] - tic);
    addStored(gain, RADIANT_ROOF, ceilings, SCRATCH.radCeilings);
  } else {
    for (let h = 0; h < 24; h++) atticF[h] = toArr[h];
  }
  if (env.vaulted.uaCool > 0) {
    for (let h = 0; h < 24; h++)
      te[h] = solAir(toArr[h], env.vaulted.absorptance, roofIrr[h], env.roofTiltDeg);
    convolve(te, st.vaulted.factors, st.vaulted.last, lagged);
    for (let h = 0; h < 24; h++) gain[h] = env.vaulted.uaCool * (lagged[h] - tic);
    addStored(gain, RADIANT_ROOF, vaulted, SCRATCH.radVaulted);
  }
  const sk = env.skylight;
  if (sk.areaFt2 > 0) {
    const prof = solar.surface(facingAzimuthDeg + FACADE_OFFSET_DEG[sk.facade], sk.tiltDeg);
    const radN = SCRATCH.radSkylights;
    const radS = SCRATCH.radSkylightsSolar;
    for (let h = 0; h < 24; h++) {
      const beam =
        sk.areaFt2 *
        sk.attenuation *
        sk.shgc *
        prof.beamWm2[h] *
        W_M2_TO_BTUH_FT2 *
        shgcRatio(prof.incidenceDeg[h]);
      const diffuse =
        sk.areaFt2 *
        sk.attenuation *
        sk.shgc *
        prof.diffuseAndReflectedWm2[h] *
        W_M2_TO_BTUH_FT2 *
        DIFFUSE_RATIO;
      const conduction = sk.uaCool * (toArr[h] - tic);
      skylights[h] = (1 - RADIANT_WINDOW_LOW_SHGC) * conduction;
      radN[h] = RADIANT_WINDOW_LOW_SHGC * conduction + diffuse;
      radS[h] = beam;
    }
  }

  // Surfaces to buffer spaces (ch. 18 eq. 32: no time series; their radiant share still through the RTS).
  for (let h = 0; h < 24; h++) gain[h] = env.floorsCool[h];
  addStored(gain, RADIANT_WALLS, floors, SCRATCH.radFloors);
  for (let h = 0; h < 24; h++) gain[h] = env.foundationWallsCool[h];
  addStored(gain, RADIANT_WALLS, foundationWalls, SCRATCH.radFoundationWalls);
  for (let h = 0; h < 24; h++) gain[h] = env.garageWallCool[h];
  addStored(gain, RADIANT_WALLS, garageWall, SCRATCH.radGarageWall);

  // All radiant gains through the RTS at once (convolution is linear).
  const { sumRadNonsolar, sumRadSolar, stored, storedSolar } = SCRATCH;
  sumRadNonsolar.fill(0);
  sumRadSolar.fill(0);
  for (const r of RADIANT_ROWS) for (let h = 0; h < 24; h++) sumRadNonsolar[h] += r[h];
  for (const r of SOLAR_RADIANT_ROWS) for (let h = 0; h < 24; h++) sumRadSolar[h] += r[h];
  convolve(sumRadNonsolar, st.nonsolar.factors, st.nonsolar.last, stored);
  convolve(sumRadSolar, st.solar.factors, st.solar.last, storedSolar);

  // Ducts, hour by hour, on the room load (the system is taken as off in hours with no cooling need).
  // Internal gains and the slab credit are the same every hour: the RTS gives a constant back.
  const internal = p.internal.sensibleBtuh;
  const slab = env.slab.coolingBtuh;
  let peak = 0;
  try {
    for (let h = 0; h < 24; h++) {
      rooms[h] =
        walls[h] +
        windows[h] +
        doors[h] +
        ceilings[h] +
        vaulted[h] +
        skylights[h] +
        floors[h] +
        slab +
        foundationWalls[h] +
        garageWall[h] +
        stored[h] +
        storedSolar[h] +
        air.coolingInfiltrationSensibleBtuh[h] +
        air.coolingVentilationSensibleBtuh[h] +
        internal;
      ducts[h] = ductGainBtuh(p, rooms[h], atticF[h], h);
      total[h] = rooms[h] + ducts[h];
      if (total[h] > total[peak]) peak = h;
    }
  } catch (error) {
    throw ductRangeError(error);
  }
  // The rooms may drift up to the design swing at the peak (temperature-swing.ts): the capacity the
  // rooms need is below their fixed-set-point peak by the swing credit, and the ducts carry that.
  const conductance =
    st.envelopeConductanceBtuhF +
    site.sensibleFactor * (air.coolingInfiltrationCfm[peak] + air.ventilationProvidedCfm);
  const roomCapacity = capacityWithSwing(rooms, conductance, st.capacitanceBtuF, DESIGN_SWING_F);
  const swingCredit = Math.min(0, roomCapacity - rooms[peak]);
  const peakDucts =
    swingCredit === 0 ? ducts[peak] : ductGainBtuh(p, rooms[peak] + swingCredit, atticF[peak], peak);

  // Each component at the peak: its convective part plus its radiant parts through the RTS at that hour.
  const ns = st.nonsolar;
  const so = st.solar;
  const windowsAtPeak = [0, 0, 0, 0];
  for (let fi = 0; fi < 4; fi++) {
    windowsAtPeak[fi] =
      windowsByFacade[fi][peak] +
      storedAt(SCRATCH.radWindows[fi], ns, peak) +
      storedAt(SCRATCH.radWindowsSolar[fi], so, peak);
  }
  const sensibleByComponent: ComponentLoads<CoolingSensibleComponent> = {
    walls: walls[peak] + storedAt(SCRATCH.radWalls, ns, peak),
    windows: windowsAtPeak[0] + windowsAtPeak[1] + windowsAtPeak[2] + windowsAtPeak[3],
    doors: doors[peak] + storedAt(SCRATCH.radDoors, ns, peak),
    ceilings: ceilings[peak] + storedAt(SCRATCH.radCeilings, ns, peak),
    vaultedCeilings: vaulted[peak] + storedAt(SCRATCH.radVaulted, ns, peak),
    skylights:
      skylights[peak] +
      storedAt(SCRATCH.radSkylights, ns, peak) +
      storedAt(SCRATCH.radSkylightsSolar, so, peak),
    floors: floors[peak] + storedAt(SCRATCH.radFloors, ns, peak),
    slab,
    foundationWalls: foundationWalls[peak] + storedAt(SCRATCH.radFoundationWalls, ns, peak),
    garageWall: garageWall[peak] + storedAt(SCRATCH.radGarageWall, ns, peak),
    infiltration: air.coolingInfiltrationSensibleBtuh[peak],
    ventilation: air.coolingVentilationSensibleBtuh[peak],
    ducts: peakDucts,
    internal,
    temperatureSwing: swingCredit,
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
    ventilation:
      air.balancedVentilationLatentBtuh + site.latentFactor * unbalancedVentCfm * site.latentDeltaGr,
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
      front: windowsAtPeak[0],
      left: windowsAtPeak[1],
      back: windowsAtPeak[2],
      right: windowsAtPeak[3],
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
    airflowCfm: sensibleBtuh / (site.sensibleFactor * p.plan.coolingSupplyDeltaF),
    tons,
    floorAreaPerTonFt2: tons > 0 ? p.plan.conditionedFloorAreaFt2 / tons : Number.POSITIVE_INFINITY,
  };
}

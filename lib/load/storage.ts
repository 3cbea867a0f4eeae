/**
 * Heat storage for the hourly method (HoF 2021 ch. 18 radiant time series method, read): which
 * radiant time series suits the plan's mass, and which conduction time series each opaque
 * surface takes. Chosen once per plan (facing-independent).
 */
import type { PreparedEnvelope } from "./envelope";
import type { PlanInput } from "./input";
import { conductionTimeSeries, printedConductionTimeSeries } from "./time-series/conduction-time-series";
import { checkSeries, radiantTimeSeriesChoice, type ZoneMass } from "./time-series/radiant-time-series";
import { DESIGN_TEMPERATURE_SWING_F, interiorCapacitanceBtuPerF } from "./temperature-swing";

export interface TimeSeries {
  /** 24 factors, index 0 = the current hour, summing to 1. */
  factors: Float64Array;
  /** Index of the last non-zero factor (the sums stop there). */
  last: number;
}

export interface PreparedStorage {
  nonsolar: TimeSeries;
  solar: TimeSeries;
  /** Conduction time series of each facade's wall, in envelope.facades order. */
  walls: TimeSeries[];
  /** The ceiling below a vented attic: the whole roof–attic–ceiling stack's response. */
  ventedCeiling: TimeSeries;
  /** The insulated roof deck over an encapsulated attic (into the attic air). */
  encapsulatedRoof: TimeSeries;
  vaulted: TimeSeries;
  /** Interior heat capacity for the temperature swing, Btu/°F. */
  capacitanceBtuF: number;
  /** Conductance of the envelope surfaces to outdoors (air added per hour), Btu/h·°F. */
  envelopeConductanceBtuhF: number;
  /** What was chosen, for the result notes. */
  description: string;
}

function series(factors: Float64Array, field: string): TimeSeries {
  return { factors, last: checkSeries(field, factors) };
}

/**
 * HoF 2021 ch. 18 Table 17 roofs 7 and 8 (asphalt shingles, wood sheathing, air space, R-3.3 or
 * m²·K/W batt, air space, gypsum; total R 4.26 and 7.62 m²·K/W as printed) are the layers of
 * a shingled roof over an attic over an insulated ceiling. Our choice for a ceiling under a vented
 * attic: their series interpolated by the ceiling's total resistance (linear in R between the two,
 * the nearer one beyond them), so that the ceiling gain is delayed and damped as the roof above it.
 */
const ROOF_7_TOTAL_R_IP = 4.26 * 5.678;
const ROOF_8_TOTAL_R_IP = 7.62 * 5.678;

function ventedCeilingSeries(ceilingUBtuhFt2F: number): Float64Array {
  const r = ceilingUBtuhFt2F > 0 ? 1 / ceilingUBtuhFt2F : ROOF_8_TOTAL_R_IP;
  const t = Math.min(1, Math.max(0, (r - ROOF_7_TOTAL_R_IP) / (ROOF_8_TOTAL_R_IP - ROOF_7_TOTAL_R_IP)));
  const roof7 = printedConductionTimeSeries(17, 7);
  const roof8 = printedConductionTimeSeries(17, 8);
  const out = new Float64Array(24);
  for (let j = 0; j < 24; j++) out[j] = (1 - t) * roof7[j] + t * roof8[j];
  return out;
}

/**
 * The zone's RTS (ch. 18 Tables 19–20, representative zones of Table 21): light, with carpet, for a
 * wood-frame house on a carpeted slab or framed floors; medium for masonry walls or a slab with hard
 * floors (tile, bare), with or without carpet as the slab is covered. Glass: the plan's window area
 * as a share of its gross exterior wall area.
 */
function zoneRts(
  plan: PlanInput,
  envelope: PreparedEnvelope,
): { mass: ZoneMass; carpet: boolean; glassPct: number } {
  const masonry = envelope.facades.some((f) => f.wallMass === "masonry");
  const onSlab = plan.foundation.kind === "slab-on-grade" && plan.foundation.slabPerimeterFt > 0;
  const hardSlab = onSlab && plan.foundation.slabFloorCovering !== "carpet";
  let wallFt2 = 0;
  let glassFt2 = 0;
  for (const f of envelope.facades) {
    wallFt2 += plan.facades[f.facade].grossWallAreaFt2;
    for (const w of f.windows) glassFt2 += w.areaFt2;
  }
  const glassPct = wallFt2 > 0 ? Math.min(100, (100 * glassFt2) / wallFt2) : 0;
  return { mass: masonry || hardSlab ? "medium" : "light", carpet: !hardSlab, glassPct };
}

export function prepareStorage(plan: PlanInput, envelope: PreparedEnvelope): PreparedStorage {
  const zone = zoneRts(plan, envelope);
  const nonsolar = radiantTimeSeriesChoice({ ...zone, solar: false });
  const solar = radiantTimeSeriesChoice({ ...zone, solar: true });
  let envelopeConductanceBtuhF =
    envelope.attic.ceilingUaCool + envelope.vaulted.uaCool + envelope.skylight.uaCool;
  let wallNetFt2 = plan.garage.wallAreaFt2;
  for (const f of envelope.facades) {
    envelopeConductanceBtuhF += f.wallUaCool + f.doorUaCool;
    let openings = plan.facades[f.facade].doorAreaFt2;
    for (const w of f.windows) {
      envelopeConductanceBtuhF += w.uaCool;
      openings += w.areaFt2;
    }
    wallNetFt2 += plan.facades[f.facade].grossWallAreaFt2 - openings;
  }
  const capacitanceBtuF = interiorCapacitanceBtuPerF(
    plan.conditionedFloorAreaFt2,
    envelope.attic.ceilingAreaFt2 + plan.vaultedCeiling.areaFt2,
    wallNetFt2,
  );
  const ceilingU =
    envelope.attic.ceilingAreaFt2 > 0 ? envelope.attic.ceilingUaCool / envelope.attic.ceilingAreaFt2 : 0;
  return {
    nonsolar: series(nonsolar.series, "rts.nonsolar"),
    solar: series(solar.series, "rts.solar"),
    walls: envelope.facades.map((f) => series(conductionTimeSeries(f.wallBaseId), `cts.${f.facade}`)),
    ventedCeiling: series(ventedCeilingSeries(ceilingU), "cts.ceiling"),
    encapsulatedRoof: series(conductionTimeSeries(envelope.attic.roofBaseId), "cts.roofDeck"),
    vaulted: series(conductionTimeSeries(envelope.vaulted.baseId), "cts.vaulted"),
    capacitanceBtuF,
    envelopeConductanceBtuhF,
    description:
      `Heat storage: ${nonsolar.label}; ${solar.label}; wall, roof and ceiling gains through HoF 2021 ch. 18 ` +
      "conduction time series (Tables 16–17) chosen by assembly; capacity sized to hold the rooms within " +
      `${DESIGN_TEMPERATURE_SWING_F.toFixed(1)} °F of the set point (the 1.7 K swing of HoF 2021 ch. 17 Table 1) with an ` +
      `interior heat capacity of ${capacitanceBtuF.toFixed(0)} Btu/°F (linings and furnishings, ch. 18 Tables 18 and 21).`,
  };
}

/**
 * Duct losses and gains, two ways.
 *
 * 1. The default: HoF 2021 ch. 17 eq. 19, q_d = F_dl · q_bl, with F_dl from ch. 17 Table 6 "Typical
 *    duct loss/gain factors" (2021 ASHRAE Handbook—Fundamentals, SI edition, p. 17.8; read from a
 *    Markdown copy of the chapter in the reference store). q_bl is the building's sensible load
 *    (envelope, infiltration/ventilation and internal gains: the subtotal of the chapter's example,
 *    Table 23). See `ductLossFactor` below.
 *
 * 2. A simple physical conduction-and-leakage model of our own, used when chosen
 *    (`ducts.method: "conduction-leakage"`) and for duct locations Table 6 does not cover
 *    (encapsulated attic, garage). All its constants are from memory:
 * - duct surface area outside the envelope: supply 27 % and return 5 % of the conditioned floor
 *   area for one story, 65 % of that for two or more stories (the ASHRAE Standard 152 defaults,
 *   from memory);
 * - duct wall U = 1/(R_insulation + 0.7) Btu/h·ft²·°F (inside and outside films, from memory);
 * - supply air 55 °F cooling (20 °F below a 75 °F room) and 120 °F heating (common practice);
 * - supply leakage loses conditioned air; return leakage draws in the duct zone's air.
 *
 * With Q_env the envelope load and Q_c the conduction gain or loss, the equipment must supply
 * Q = (Q_env + Q_c) / (1 − s − r·ΔT_zone/ΔT_supply), s and r the supply and return leakage
 * fractions, ΔT_zone = |T_zone − T_room| and ΔT_supply the supply-air temperature difference.
 * For ducts in a vented attic it gives about twice the Table 6 factor (it takes the coil-leaving
 * air temperature along the whole duct, counts return leakage of peak-hour attic air at full
 * temperature difference, and gives no regain), so it is no longer the default.
 */
import { LoadInputError } from "./errors";
import type { DuctHeatingSystem, DuctLocation, DuctsInput } from "./input";

export const HEATING_SUPPLY_DELTA_F = 50;
const DUCT_FILMS_R = 0.7;

export interface DuctGeometry {
  supplyAreaFt2: number;
  returnAreaFt2: number;
  uBtuPerHrFt2F: number;
  supplyLeakageFraction: number;
  returnLeakageFraction: number;
  outsideEnvelope: boolean;
}

export function ductGeometry(
  ducts: DuctsInput,
  conditionedFloorAreaFt2: number,
  stories: number,
): DuctGeometry {
  const outsideEnvelope = ductLocationIsOutside(ducts.location);
  const storyFactor = stories >= 2 ? 0.65 : 1;
  return {
    supplyAreaFt2: outsideEnvelope ? 0.27 * conditionedFloorAreaFt2 * storyFactor : 0,
    returnAreaFt2: outsideEnvelope ? 0.05 * conditionedFloorAreaFt2 * storyFactor : 0,
    uBtuPerHrFt2F: 1 / (ducts.insulationR + DUCT_FILMS_R),
    supplyLeakageFraction: outsideEnvelope ? ducts.supplyLeakagePct / 100 : 0,
    returnLeakageFraction: outsideEnvelope ? ducts.returnLeakagePct / 100 : 0,
    outsideEnvelope,
  };
}

/** Ducts in conditioned space (or a conditioned crawlspace) add no load. */
export function ductLocationIsOutside(location: DuctLocation): boolean {
  return location !== "conditioned-space" && location !== "conditioned-crawlspace";
}

export interface DuctLoad {
  /** Added sensible load, Btu/h (conduction + leakage). */
  sensibleBtuh: number;
  /** Added latent load from return leakage (cooling only), Btu/h. */
  latentBtuh: number;
  /** 1 − s − r·ΔT_zone/ΔT_supply, the denominator above. */
  deliveryFraction: number;
}

/**
 * Duct load for one condition.
 * @param envelopeSensibleBtuh the load the rooms need (positive).
 * @param zoneF the duct zone's air temperature.
 * @param roomF the indoor set point.
 * @param supplyDeltaF supply-air temperature difference from the room.
 * @param latentPerCfmDeltaGr 0.69·(P/P0)·Δgrains of the zone air relative to the room (cooling), 0 for heating.
 * @param sensibleFactor 1.10·(P/P0).
 */
export function ductLoad(
  geometry: DuctGeometry,
  envelopeSensibleBtuh: number,
  mode: "heating" | "cooling",
  zoneF: number,
  roomF: number,
  supplyDeltaF: number,
  sensibleFactor: number,
  latentPerCfm: number,
): DuctLoad {
  if (!geometry.outsideEnvelope) return { sensibleBtuh: 0, latentBtuh: 0, deliveryFraction: 1 };
  const supplyF = mode === "cooling" ? roomF - supplyDeltaF : roomF + supplyDeltaF;
  const zoneDeltaF = mode === "cooling" ? zoneF - roomF : roomF - zoneF;
  const supplyConductionBtuh =
    geometry.uBtuPerHrFt2F *
    geometry.supplyAreaFt2 *
    (mode === "cooling" ? zoneF - supplyF : supplyF - zoneF);
  const returnConductionBtuh = geometry.uBtuPerHrFt2F * geometry.returnAreaFt2 * zoneDeltaF;
  const conductionBtuh = supplyConductionBtuh + returnConductionBtuh;
  const deliveryFraction =
    1 - geometry.supplyLeakageFraction - (geometry.returnLeakageFraction * zoneDeltaF) / supplyDeltaF;
  if (deliveryFraction < 0.3) {
    throw new RangeError(
      `duct leakage of ${Math.round(geometry.supplyLeakageFraction * 100)} % supply / ` +
        `${Math.round(geometry.returnLeakageFraction * 100)} % return leaves under 30 % of the supply air useful ` +
        `at a ${zoneF.toFixed(0)} °F duct zone`,
    );
  }
  const totalSensibleBtuh = (envelopeSensibleBtuh + conductionBtuh) / deliveryFraction;
  const cfm = totalSensibleBtuh / (sensibleFactor * supplyDeltaF);
  const latentBtuh =
    mode === "cooling" ? Math.max(0, geometry.returnLeakageFraction * cfm * latentPerCfm) : 0;
  return { sensibleBtuh: totalSensibleBtuh - envelopeSensibleBtuh, latentBtuh, deliveryFraction };
}

// ---------------------------------------------------------------------------------------------
// HoF 2021 ch. 17 Table 6, "Typical duct loss/gain factors" F_dl (fraction of the building load).
//
// Transcribed row by row as printed (SI edition, p. 17.8). Twelve columns in the printed order:
//   1 story:            11 %/11 % supply/return leakage at; then 5 %/5 % at;
//   2 or more stories:  the same six.
// The SI edition prints the insulation as m²·K/W, i.e.
// h·ft²·°F/Btu: the wraps (× 5.678). Rows: C cooling (sensible only), H/F heating with
// a furnace, H/HP heating with a heat pump. Conditioned space: no loss (F_dl = 0).
// Table footnote: values for the ASHRAE Standard 152 default duct surface area with the model of
// Francisco and Palmiter (1999); cooling at t_o 35 °C (95 °F), attic 49 °C (120 °F), basement 20 °C,
// crawlspace 22 °C; heating at t_o 0 °C (32 °F) with attic and crawlspace 0 °C, basement 18 °C.
// "Values are provided as guidance only."

export type DuctTableLocation = "attic" | "basement" | "crawlspace";
export type DuctTableMode = "cooling" | "heating-furnace" | "heating-heat-pump";

export const DUCT_FACTOR_TABLE: Readonly<
  Record<DuctTableLocation, Readonly<Record<DuctTableMode, readonly number[]>>>
> = {
  attic: {
    cooling: [1.26, 0.71, 0.63, 0.68, 0.33, 0.27, 1.02, 0.66, 0.6, 0.53, 0.29, 0.25],
    "heating-furnace": [0.49, 0.29, 0.25, 0.34, 0.16, 0.13, 0.41, 0.26, 0.24, 0.27, 0.14, 0.12],
    "heating-heat-pump": [0.56, 0.37, 0.34, 0.34, 0.19, 0.16, 0.49, 0.35, 0.33, 0.28, 0.17, 0.15],
  },
  basement: {
    cooling: [0.12, 0.09, 0.09, 0.07, 0.05, 0.04, 0.11, 0.09, 0.09, 0.06, 0.04, 0.04],
    "heating-furnace": [0.28, 0.18, 0.16, 0.19, 0.1, 0.08, 0.24, 0.17, 0.15, 0.16, 0.09, 0.08],
    "heating-heat-pump": [0.23, 0.17, 0.16, 0.14, 0.09, 0.08, 0.2, 0.16, 0.15, 0.12, 0.08, 0.07],
  },
  crawlspace: {
    cooling: [0.16, 0.12, 0.11, 0.1, 0.06, 0.05, 0.14, 0.12, 0.11, 0.08, 0.06, 0.05],
    "heating-furnace": [0.49, 0.29, 0.25, 0.34, 0.16, 0.13, 0.41, 0.26, 0.24, 0.27, 0.14, 0.12],
    "heating-heat-pump": [0.56, 0.37, 0.34, 0.34, 0.19, 0.16, 0.49, 0.35, 0.33, 0.28, 0.17, 0.15],
  },
};

/** Table 6 insulation columns, h·ft²·°F/Btu (R-0, R-0.7 and m²·K/W). */
export const DUCT_TABLE_INSULATION_R = [0, 4, 8] as const;
/** Table 6 leakage columns, % of fan flow on each of supply and return. */
export const DUCT_TABLE_LEAKAGE_PCT = [5, 11] as const;
/**
 * Our limit for extrapolating the table beyond its 11 %/11 % column (mean of supply and return,
 * % per side). Leakier ducts are refused by the table method: test them, or use conduction-leakage.
 */
export const DUCT_TABLE_MAX_EXTRAPOLATED_LEAKAGE_PCT = 20;

/** The Table 6 row for a duct location, or null where the table has none (or no loss). */
export function ductTableLocation(location: DuctLocation): DuctTableLocation | null {
  switch (location) {
    case "vented-attic":
      return "attic";
    case "vented-crawlspace":
      return "crawlspace";
    case "unconditioned-basement":
      return "basement";
    default:
      return null;
  }
}

/** Duct locations inside the envelope, where Table 6 gives F_dl = 0. */
export function ductLocationHasNoLoss(location: DuctLocation): boolean {
  return !ductLocationIsOutside(location);
}

/** Duct locations the table method leaves to the conduction-leakage model. */
export function ductLocationNeedsPhysicalModel(location: DuctLocation): boolean {
  return ductLocationIsOutside(location) && ductTableLocation(location) === null;
}

function lerp(x: number, x0: number, x1: number, y0: number, y1: number): number {
  return y0 + ((x - x0) / (x1 - x0)) * (y1 - y0);
}

/** F_dl at one leakage column (0 = 11 %/11 %, 1 = 5 %/5 %), linear in R between. */
function factorAtLeakage(
  row: readonly number[],
  storyOffset: number,
  leakageColumn: 0 | 1,
  insulationR: number,
): number {
  const base = storyOffset + leakageColumn * 3;
  const r = Math.min(insulationR, 8);
  return r <= 4 ? lerp(r, 0, 4, row[base], row[base + 1]) : lerp(r, 4, 8, row[base + 1], row[base + 2]);
}

export interface DuctFactor {
  /** F_dl, the duct loss or gain as a fraction of the building's sensible load. */
  factor: number;
  /** Notes on where the inputs lie outside the table's columns and what was taken. */
  notes: string[];
}

/**
 * Duct loss/gain factor F_dl by HoF 2021 ch. 17 Table 6, for HoF eq. 19 q_d = F_dl · q_bl.
 *
 * Between the printed columns the factor is interpolated linearly in insulation R
 * and in leakage (5 %/5 %, 11 %/11 %; the mean of supply and return is used since the table only
 * has equal ones) — our interpolation, not the handbook's. Outside them (stated in `notes`):
 * insulation above R-8 takes the R-8 column; leakage below 5 % per side takes the 5 % column (both
 * conservative); leakage above 11 % is extrapolated linearly up to
 * DUCT_TABLE_MAX_EXTRAPOLATED_LEAKAGE_PCT and refused beyond it.
 *
 * Example: ducts in a vented attic, R-8, 5 %/5 %, one story: cooling 0.27, furnace heating 0.13
 * (the values the ch. 17 example house uses).
 */
export function ductLossFactor(params: {
  location: DuctTableLocation;
  mode: DuctTableMode;
  stories: number;
  insulationR: number;
  supplyLeakagePct: number;
  returnLeakagePct: number;
}): DuctFactor {
  const { location, mode, stories, insulationR, supplyLeakagePct, returnLeakagePct } = params;
  if (!(insulationR >= 0))
    throw new LoadInputError("ducts.insulationR", `must be 0 or more, got ${insulationR}`, { min: 0 });
  if (!(stories >= 1)) throw new LoadInputError("stories", `must be 1 or more, got ${stories}`, { min: 1 });
  const notes: string[] = [];
  const row = DUCT_FACTOR_TABLE[location][mode];
  const storyOffset = stories >= 2 ? 6 : 0;
  const leakagePct = (supplyLeakagePct + returnLeakagePct) / 2;
  if (!(leakagePct >= 0) || leakagePct > DUCT_TABLE_MAX_EXTRAPOLATED_LEAKAGE_PCT) {
    throw new LoadInputError(
      "ducts.supplyLeakagePct",
      `duct leakage of ${supplyLeakagePct} % supply / ${returnLeakagePct} % return (mean ${leakagePct} % per side) is beyond ` +
        `what the handbook duct-factor table can be stretched to (it covers 5–11 % per side; we extrapolate to ` +
        `${DUCT_TABLE_MAX_EXTRAPOLATED_LEAKAGE_PCT} %); use ducts.method "conduction-leakage" or test the ducts`,
      { min: 0, max: DUCT_TABLE_MAX_EXTRAPOLATED_LEAKAGE_PCT, unit: "% (mean of supply and return)" },
    );
  }
  if (insulationR > 8) {
    notes.push(
      `Duct insulation R-${insulationR} is above the handbook table's R-8 column; the R-8 factor is used (conservative).`,
    );
  }
  const tight = factorAtLeakage(row, storyOffset, 1, insulationR);
  const leaky = factorAtLeakage(row, storyOffset, 0, insulationR);
  let factor: number;
  if (leakagePct <= 5) {
    factor = tight;
    if (leakagePct < 5) {
      notes.push(
        `Duct leakage ${leakagePct} % per side is below the handbook table's 5 %/5 % column; the 5 % factor is used (conservative).`,
      );
    }
  } else {
    factor = lerp(leakagePct, 5, 11, tight, leaky);
    if (leakagePct > 11) {
      notes.push(
        `Duct leakage ${leakagePct} % per side is beyond the handbook table's 11 %/11 % column; the factor is extrapolated (rough).`,
      );
    }
  }
  return { factor, notes };
}

/** Table 6 row for heating with this equipment. */
export function ductHeatingMode(system: DuctHeatingSystem): DuctTableMode {
  return system === "heat-pump" ? "heating-heat-pump" : "heating-furnace";
}

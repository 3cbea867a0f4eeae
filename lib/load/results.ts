/** Result types of the load engine (plain data). */

/**
 * The two procedures the engine runs. residential-load-factor: the handbook's own residential
 * load-factor procedure (HoF 2021 ch. 17); hourly: Platload's hourly design-day method with heat
 * storage (radiant and conduction time series, HoF 2021 ch. 18). An account picks the one that
 * sizes equipment; the other is shown beside it.
 */
export const LOAD_PROCEDURES = ["residential-load-factor", "hourly"] as const;
export type LoadProcedure = (typeof LOAD_PROCEDURES)[number];
export const DEFAULT_LOAD_PROCEDURE: LoadProcedure = "residential-load-factor";
export const LOAD_PROCEDURE_LABELS: Record<LoadProcedure, string> = {
  "residential-load-factor": "Handbook residential load-factor procedure (HoF 2021 ch. 17)",
  hourly: "Hourly design day with heat storage (HoF 2021 ch. 18 time series)",
};

export const HEATING_COMPONENTS = [
  "walls",
  "windows",
  "doors",
  "ceilings",
  "vaultedCeilings",
  "skylights",
  "floors",
  "slab",
  "foundationWalls",
  "garageWall",
  "infiltration",
  "ventilation",
  "ducts",
] as const;
export type HeatingComponent = (typeof HEATING_COMPONENTS)[number];

/**
 * Cooling sensible components. temperatureSwing: the hourly method's credit for letting the rooms
 * drift up to the design swing at the peak (negative or zero; lib/load/temperature-swing.ts).
 */
export const COOLING_SENSIBLE_COMPONENTS = [...HEATING_COMPONENTS, "internal", "temperatureSwing"] as const;
export type CoolingSensibleComponent = (typeof COOLING_SENSIBLE_COMPONENTS)[number];

export const COOLING_LATENT_COMPONENTS = ["infiltration", "ventilation", "internal", "ducts"] as const;
export type CoolingLatentComponent = (typeof COOLING_LATENT_COMPONENTS)[number];

export type ComponentLoads<K extends string> = Record<K, number>;

export interface HeatingResult {
  totalBtuh: number;
  byComponent: ComponentLoads<HeatingComponent>;
  outdoorF: number;
  indoorF: number;
  infiltrationCfm: number;
  /** Temperatures used for buffer spaces, °F. */
  atticF: number | null;
  garageF: number;
  basementF: number | null;
}

export interface CoolingResult {
  sensibleBtuh: number;
  latentBtuh: number;
  totalBtuh: number;
  /** Solar hour 1–24 of the peak total sensible load; null for a procedure that gives the peak only. */
  peakHour: number | null;
  sensibleByComponent: ComponentLoads<CoolingSensibleComponent>;
  latentByComponent: ComponentLoads<CoolingLatentComponent>;
  /** Window solar + conduction at the peak hour by facade, Btu/h. */
  windowsByFacadeBtuh: { front: number; left: number; back: number; right: number };
  /**
   * Total sensible load at the fixed set point for solar hours 1–24 (index 0 = hour 1), Btu/h,
   * before the temperature-swing credit; empty for a procedure that gives the peak only (the
   * residential load-factor procedure).
   */
  hourlySensibleBtuh: number[];
  hourlyOutdoorF: number[];
  outdoorF: number;
  indoorF: number;
  atticF: number | null;
  infiltrationCfm: number;
  /** Outdoor and indoor humidity ratios, grains per lb dry air. */
  outdoorHumidityRatioGr: number;
  indoorHumidityRatioGr: number;
  sensibleHeatRatio: number;
  /** Supply airflow, cfm = sensible / (1.10·(P/P0)·ΔT_supply). */
  airflowCfm: number;
  tons: number;
  floorAreaPerTonFt2: number;
}

export interface FacingLoads {
  engineVersion: string;
  /** The procedure that produced these loads. */
  procedure: LoadProcedure;
  /** Azimuth the front facade faces, degrees clockwise from north. */
  facingAzimuthDeg: number;
  /** Azimuths of the four facades for this facing. */
  facadeAzimuthsDeg: { front: number; left: number; back: number; right: number };
  heating: HeatingResult;
  cooling: CoolingResult;
  ventilation: { requiredCfm: number; providedCfm: number; kind: string };
  effectiveLeakageAreaIn2: number;
  /** Assumptions and defaults applied, for display beside the result. */
  notes: string[];
  caution: string;
}

export const FACING_LABELS = ["N", "E", "S", "W"] as const;
export type FacingLabel = (typeof FACING_LABELS)[number];

export interface PlanFacings {
  engineVersion: string;
  procedure: LoadProcedure;
  /** Front to N, E, S, W (azimuth 0, 90, 180, 270). */
  facings: Array<FacingLoads & { label: FacingLabel }>;
  worst: { label: FacingLabel; facingAzimuthDeg: number; coolingTotalBtuh: number };
  /** Max − min cooling total over the four facings, Btu/h. */
  coolingSpreadBtuh: number;
  caution: string;
}

export const DESIGN_ESTIMATE_CAUTION =
  "Design estimate only, computed with published ASHRAE methods as implemented in Platload; it is not a certified " +
  "or approved implementation of any standard's or code's procedure. Local codes and a licensed professional's review " +
  "govern equipment sizing.";

/**
 * Inputs of the Platload load engine: site and design conditions, and one plan model's
 * envelope. Zod schemas are the single source of truth; the types are inferred from them.
 *
 * Units: IP throughout (ft, ft², ft³, °F, Btu/h, cfm, h·ft²·°F/Btu for R). Facades are named as
 * seen from the street looking at the front door: front, left, back, right.
 *
 * Defaults are those a builder would expect on a typical new house (marked "common practice"
 * or "from memory" where they are not read from a cited source); every default is editable.
 */
import { z } from "zod";
import { LoadInputError, type LoadInputIssue, type ValidRange } from "./errors";
import { DUCT_TABLE_MAX_EXTRAPOLATED_LEAKAGE_PCT, ductTableLocation } from "./ducts";

// ---------------------------------------------------------------------------------------------
// Choice lists (const lists + zod enums) so grids and importers can offer them.

/** Base wall assemblies; the user adds cavity and/or continuous insulation to them. */
export const WALL_BASE_ASSEMBLIES = [
  "wood-2x4-16in-oc",
  "wood-2x4-24in-oc",
  "wood-2x6-16in-oc",
  "wood-2x6-24in-oc",
  "cmu-8in-hollow",
  "cmu-8in-core-filled",
] as const;
export type WallBaseAssembly = (typeof WALL_BASE_ASSEMBLIES)[number];

/** Ceilings under an attic (insulation laid on the ceiling between and over the joists). */
export const CEILING_BASE_ASSEMBLIES = ["attic-joists-24in-oc", "attic-joists-16in-oc"] as const;
export type CeilingBaseAssembly = (typeof CEILING_BASE_ASSEMBLIES)[number];

/** Roof decks on rafters: the roof of an encapsulated attic, or a vaulted ceiling. */
export const ROOF_BASE_ASSEMBLIES = [
  "roof-rafters-2x8-24in-oc",
  "roof-rafters-2x10-24in-oc",
  "roof-rafters-2x12-24in-oc",
] as const;
export type RoofBaseAssembly = (typeof ROOF_BASE_ASSEMBLIES)[number];

/** Framed floors over unconditioned space. */
export const FLOOR_BASE_ASSEMBLIES = ["floor-joists-2x10-16in-oc", "floor-joists-2x10-24in-oc"] as const;
export type FloorBaseAssembly = (typeof FLOOR_BASE_ASSEMBLIES)[number];

/** Every base assembly id, whatever the surface. */
export const BASE_ASSEMBLIES = [
  ...WALL_BASE_ASSEMBLIES,
  ...CEILING_BASE_ASSEMBLIES,
  ...ROOF_BASE_ASSEMBLIES,
  ...FLOOR_BASE_ASSEMBLIES,
] as const;
export type BaseAssembly = (typeof BASE_ASSEMBLIES)[number];

/** vented: insulation on the ceiling, attic vented to outdoors; encapsulated: insulation under the roof deck. */
export const ATTIC_KINDS = ["vented", "encapsulated", "none"] as const;
export type AtticKind = (typeof ATTIC_KINDS)[number];

export const FOUNDATION_KINDS = [
  "slab-on-grade",
  "vented-crawlspace",
  "conditioned-crawlspace",
  "unconditioned-basement",
  "conditioned-basement",
] as const;
export type FoundationKind = (typeof FOUNDATION_KINDS)[number];

export const DUCT_LOCATIONS = [
  "conditioned-space",
  "vented-attic",
  "encapsulated-attic",
  "vented-crawlspace",
  "conditioned-crawlspace",
  "unconditioned-basement",
  "garage",
] as const;
export type DuctLocation = (typeof DUCT_LOCATIONS)[number];

/**
 * How duct losses and gains are estimated. handbook-table: HoF 2021 ch. 17 eq. 19 with the Table 6
 * duct loss/gain factors (vented attic, vented crawlspace, unconditioned basement); ducts in an
 * encapsulated attic or a garage, which the table does not cover, fall back to conduction-leakage.
 * conduction-leakage: our own conduction-and-leakage model (lib/load/ducts.ts).
 */
export const DUCT_METHODS = ["handbook-table", "conduction-leakage"] as const;
export type DuctMethod = (typeof DUCT_METHODS)[number];

/** Heating equipment behind the ducts: picks the H/F or H/HP row of HoF 2021 ch. 17 Table 6. */
export const DUCT_HEATING_SYSTEMS = ["furnace", "heat-pump"] as const;
export type DuctHeatingSystem = (typeof DUCT_HEATING_SYSTEMS)[number];

/** Foundation walls under a slab edge, as HoF 2021 ch. 18 Table 24 lists them (keys of its F_p values in assemblies.ts). */
export const SLAB_EDGE_CONSTRUCTIONS = [
  "block-8in-brick-facing",
  "block-4in-brick-facing",
  "metal-stud-stucco",
  "poured-concrete-perimeter-duct",
] as const;

/** What covers a slab on grade indoors. */
export const SLAB_FLOOR_COVERINGS = ["carpet", "tile", "bare"] as const;
export type SlabFloorCovering = (typeof SLAB_FLOOR_COVERINGS)[number];

export const VENTILATION_KINDS = ["none", "exhaust", "supply", "balanced"] as const;
export type VentilationKind = (typeof VENTILATION_KINDS)[number];

export const FACADES = ["front", "left", "back", "right"] as const;
export type Facade = (typeof FACADES)[number];

/** LBL model shelter classes, HoF 2021 ch. 16 Table 5 (1 = no obstructions or local shielding ... 5 = buildings or other structures closer than one house height). */
export const SHELTER_CLASSES = [1, 2, 3, 4, 5] as const;
export type ShelterClass = (typeof SHELTER_CLASSES)[number];

/**
 * Framing cavity depth of each base assembly, in (nominal lumber actual sizes; block walls: 1½ in
 * interior furring). Cavity insulation is limited to 7 R per inch (about the best closed-cell
 * spray foam, from memory), so R-38 in a 2x4 wall is refused rather than silently accepted.
 */
export const CAVITY_DEPTH_IN: Record<Exclude<BaseAssembly, CeilingBaseAssembly>, number> = {
  "wood-2x4-16in-oc": 3.5,
  "wood-2x4-24in-oc": 3.5,
  "wood-2x6-16in-oc": 5.5,
  "wood-2x6-24in-oc": 5.5,
  "cmu-8in-hollow": 1.5,
  "cmu-8in-core-filled": 1.5,
  "roof-rafters-2x8-24in-oc": 7.25,
  "roof-rafters-2x10-24in-oc": 9.25,
  "roof-rafters-2x12-24in-oc": 11.25,
  "floor-joists-2x10-16in-oc": 9.25,
  "floor-joists-2x10-24in-oc": 9.25,
};
export const MAX_CAVITY_R_PER_IN = 7;

// ---------------------------------------------------------------------------------------------
// Field builders: every number carries its valid range so errors can name it.

function rangeText(min: number, max: number, unit: string): string {
  const u = unit ? ` ${unit}` : "";
  return `valid range ${min} to ${max}${u}`;
}

/** A finite number within [min, max]; the issue carries `params.range` for LoadInputError. */
function ranged(min: number, max: number, unit = "") {
  const range: ValidRange = { min, max, unit: unit || undefined };
  return z
    .number({
      error: (issue) =>
        issue.input === undefined
          ? `required: a number (${rangeText(min, max, unit)})`
          : `must be a number (${rangeText(min, max, unit)}), got ${JSON.stringify(issue.input)}`,
    })
    .superRefine((value, ctx) => {
      if (value < min || value > max) {
        ctx.addIssue({
          code: "custom",
          message: `${value} is out of range (${rangeText(min, max, unit)})`,
          params: { range },
        });
      }
    });
}

/** An integer within [min, max]. */
function rangedInt(min: number, max: number, unit = "") {
  const range: ValidRange = { min, max, unit: unit || undefined };
  return ranged(min, max, unit).superRefine((value, ctx) => {
    if (!Number.isInteger(value)) {
      ctx.addIssue({ code: "custom", message: `must be a whole number, got ${value}`, params: { range } });
    }
  });
}

function choice<const T extends readonly [string, ...string[]]>(values: T, what: string) {
  return z.enum(values, {
    error: (issue) =>
      issue.input === undefined
        ? `required: one of ${values.join(", ")}`
        : `unknown ${what} ${JSON.stringify(issue.input)}; choose one of ${values.join(", ")}`,
  });
}

// Limits shared by many fields.
const MAX_AREA_FT2 = 100_000;
const R_MAX = 100; // h·ft²·°F/Btu, far above any added insulation in practice

// ---------------------------------------------------------------------------------------------
// Constructions: base assembly + added insulation (never a whole-assembly R-value).

const addedInsulation = {
  /** Insulation placed in the framing cavity (batts, blown, cavity foam), R in h·ft²·°F/Btu. */
  cavityR: ranged(0, R_MAX, "h·ft²·°F/Btu").default(0),
  /** Continuous insulation across the framing (rigid board, exterior or interior), R. */
  continuousR: ranged(0, R_MAX, "h·ft²·°F/Btu").default(0),
  /**
   * A whole-assembly U-factor from a rated or separately calculated assembly, Btu/h·ft²·°F. When
   * given it replaces the base assembly plus added insulation in both seasons (the sheet says so).
   */
  uFactor: ranged(0.01, 1.5, "Btu/h·ft²·°F").optional(),
};

export const wallConstructionSchema = z.strictObject({
  baseId: choice(WALL_BASE_ASSEMBLIES, "wall construction"),
  ...addedInsulation,
});
export type WallConstruction = z.output<typeof wallConstructionSchema>;

export const ceilingConstructionSchema = z.strictObject({
  baseId: choice(CEILING_BASE_ASSEMBLIES, "ceiling construction").default("attic-joists-24in-oc"),
  ...addedInsulation,
});
export type CeilingConstruction = z.output<typeof ceilingConstructionSchema>;

export const roofConstructionSchema = z.strictObject({
  baseId: choice(ROOF_BASE_ASSEMBLIES, "roof construction").default("roof-rafters-2x10-24in-oc"),
  ...addedInsulation,
});
export type RoofConstruction = z.output<typeof roofConstructionSchema>;

export const floorConstructionSchema = z.strictObject({
  baseId: choice(FLOOR_BASE_ASSEMBLIES, "floor construction").default("floor-joists-2x10-16in-oc"),
  ...addedInsulation,
});
export type FloorConstruction = z.output<typeof floorConstructionSchema>;

// ---------------------------------------------------------------------------------------------
// Facades, windows, doors.

const windowFields = {
  /** Rough-opening window area on this facade, ft². */
  areaFt2: ranged(0, MAX_AREA_FT2, "ft²").default(0),
  /** NFRC rated whole-window U-factor, Btu/h·ft²·°F. Default 0.30 (typical code window, from memory). */
  uFactor: ranged(0.05, 1.5, "Btu/h·ft²·°F").default(0.3),
  /** NFRC rated whole-window SHGC at normal incidence. Default 0.25 (typical low-e, from memory). */
  shgc: ranged(0, 1, "").default(0.25),
  /** Interior shading coefficient (interior attenuation, IAC): 1 = no interior shade credit. */
  interiorShadingCoefficient: ranged(0.1, 1, "").default(1),
  /**
   * Exterior attenuation of transmitted solar (insect screens, exterior shades; HoF 2021 ch. 17
   * Table 11 gives typical values): 1 = nothing outside the glass.
   */
  exteriorAttenuation: ranged(0.05, 1, "").default(1),
  /** Horizontal projection of the overhang (or porch roof) beyond the wall, ft. */
  overhangDepthFt: ranged(0, 30, "ft").default(0),
  /** Vertical distance from the window head up to the overhang's underside, ft. */
  overhangHeightAboveHeadFt: ranged(0, 30, "ft").default(1),
  /** Height of the glazing, ft (for overhang shadow geometry). */
  windowHeightFt: ranged(0.5, 30, "ft").default(5),
};

/** One group of like windows on a facade (one group per facade is the usual, preferred case). */
export const windowGroupSchema = z.strictObject(windowFields);
export type WindowGroup = z.output<typeof windowGroupSchema>;

export const facadeSchema = z.strictObject({
  /** Gross wall area of the facade including windows and doors, ft². */
  grossWallAreaFt2: ranged(0, MAX_AREA_FT2, "ft²"),
  /** This facade's wall construction when it differs from the plan's `wall`. */
  wall: wallConstructionSchema.optional(),
  /** The facade's window group. */
  window: windowGroupSchema.prefault({}),
  /** Further window groups with other properties or overhangs (optional). */
  extraWindows: z.array(windowGroupSchema.extend({ areaFt2: ranged(0, MAX_AREA_FT2, "ft²") })).default([]),
  /** Opaque exterior door area, ft². */
  doorAreaFt2: ranged(0, MAX_AREA_FT2, "ft²").default(0),
  /** Door U-factor, Btu/h·ft²·°F. Default 0.30 (insulated steel or fiberglass door, from memory). */
  doorUFactor: ranged(0.05, 1.5, "Btu/h·ft²·°F").default(0.3),
});
export type FacadeInput = z.output<typeof facadeSchema>;

// ---------------------------------------------------------------------------------------------
// Attic and roof, skylights.

export const atticSchema = z.strictObject({
  kind: choice(ATTIC_KINDS, "attic kind").default("vented"),
  /**
   * Ceiling area below the attic, ft². Default: conditioned floor area ÷ stories (the top floor's
   * footprint), resolved by the engine.
   */
  ceilingAreaFt2: ranged(0, MAX_AREA_FT2, "ft²").optional(),
  /** Ceiling construction; for a vented attic this carries the insulation (default R-38, common code level, from memory). */
  ceiling: ceilingConstructionSchema.prefault({ cavityR: 38 }),
  /** Roof deck construction; for an encapsulated attic this carries the insulation (spray foam under the deck). */
  roofDeck: roofConstructionSchema.prefault({}),
  /** Roof pitch, inches of rise per 12 in of run (roof area = ceiling area × slope factor). */
  roofPitchRisePer12In: ranged(0, 24, "in/12 in").default(6),
  /**
   * Solar absorptance of the roofing; default 0.92, dark asphalt shingles, HoF 2021 ch. 17 Table 8
   * (read in a stored copy: 0.75 white or light, 0.85 medium, 0.92 dark).
   */
  roofSolarAbsorptance: ranged(0.1, 1, "").default(0.92),
  /** Vented-attic ventilation, cfm per ft² of ceiling (0.30 ≈ 3–4 attic air changes per hour, from memory). */
  ventilationCfmPerFt2: ranged(0, 5, "cfm/ft²").default(0.3),
});
export type AtticInput = z.output<typeof atticSchema>;

/** Ceilings with the roof directly above (cathedral / vaulted), no attic between. */
export const vaultedCeilingSchema = z.strictObject({
  areaFt2: ranged(0, MAX_AREA_FT2, "ft²").default(0),
  construction: roofConstructionSchema.prefault({ cavityR: 30 }),
  /** As the attic's: dark asphalt shingles 0.92 (HoF 2021 ch. 17 Table 8, read). */
  roofSolarAbsorptance: ranged(0.1, 1, "").default(0.92),
});
export type VaultedCeilingInput = z.output<typeof vaultedCeilingSchema>;

export const skylightSchema = z.strictObject({
  areaFt2: ranged(0, MAX_AREA_FT2, "ft²").default(0),
  /** Rated U-factor of the skylight, Btu/h·ft²·°F (default 0.55, from memory). */
  uFactor: ranged(0.05, 2, "Btu/h·ft²·°F").default(0.55),
  shgc: ranged(0, 1, "").default(0.3),
  interiorShadingCoefficient: ranged(0.1, 1, "").default(1),
  /** Tilt of the glazing from horizontal, degrees (default: 6 in 12 roof ≈ 26.6°). */
  tiltDeg: ranged(0, 90, "°").default(26.6),
  /** The facade the skylight's roof plane slopes toward. */
  facade: choice(FACADES, "facade").default("back"),
});
export type SkylightInput = z.output<typeof skylightSchema>;

// ---------------------------------------------------------------------------------------------
// Foundation and framed floors over unconditioned space.

export const foundationSchema = z.strictObject({
  kind: choice(FOUNDATION_KINDS, "foundation kind").default("slab-on-grade"),
  /** Exposed slab-edge perimeter, ft (slab-on-grade; also a basement slab at grade). */
  slabPerimeterFt: ranged(0, 10_000, "ft").default(0),
  /** Slab-edge insulation R (vertical, at the edge). */
  slabEdgeInsulationR: ranged(0, 30, "h·ft²·°F/Btu").default(0),
  /**
   * Depth of the slab-edge insulation, ft, as installed (shown on reports; the F-factor table
   * assumes insulation from the slab edge to the footer).
   */
  slabEdgeInsulationDepthFt: ranged(0, 6, "ft").default(2),
  /** The foundation wall under the slab edge, which sets its F-factor (HoF 2021 ch. 18 Table 24). */
  slabEdgeConstruction: choice(SLAB_EDGE_CONSTRUCTIONS, "slab edge construction").default(
    "block-8in-brick-facing",
  ),
  /** A slab-edge F-factor from a published table, Btu/h·ft·°F; replaces the one from edge insulation. */
  slabFFactor: ranged(0.05, 2, "Btu/h·ft·°F").optional(),
  /** Slab floor area on grade, ft² (default: conditioned floor area ÷ stories when a perimeter is given). */
  slabAreaFt2: ranged(0, MAX_AREA_FT2, "ft²").optional(),
  /** What covers the slab indoors: carpet insulates it from the room, tile or bare concrete less. */
  slabFloorCovering: choice(SLAB_FLOOR_COVERINGS, "slab floor covering").default("carpet"),
  /** Framed floor over a vented crawlspace or an unconditioned basement, ft². */
  floorAreaFt2: ranged(0, MAX_AREA_FT2, "ft²").default(0),
  floor: floorConstructionSchema.prefault({ cavityR: 19 }),
  /** Foundation wall area (basement or conditioned crawlspace walls), ft², above and below grade together. */
  foundationWallAreaFt2: ranged(0, MAX_AREA_FT2, "ft²").default(0),
  /** Part of the foundation wall area that is above grade, ft². */
  foundationWallAboveGradeAreaFt2: ranged(0, MAX_AREA_FT2, "ft²").default(0),
  /** Depth of the foundation wall below grade, ft. */
  foundationWallDepthBelowGradeFt: ranged(0, 12, "ft").default(7),
  /** Continuous insulation on the foundation walls, R. */
  foundationWallInsulationR: ranged(0, 40, "h·ft²·°F/Btu").default(0),
  /** A whole foundation-wall U-factor (soil path included for the part below grade), Btu/h·ft²·°F; replaces the computed ones. */
  foundationWallUFactor: ranged(0.01, 1.5, "Btu/h·ft²·°F").optional(),
  /** Unconditioned-basement air temperature in the heating design hour, °F (default computed). */
  basementHeatingTemperatureF: ranged(-40, 80, "°F").optional(),
});
export type FoundationInput = z.output<typeof foundationSchema>;

export const exposedFloorSchema = z.strictObject({
  areaFt2: ranged(0, MAX_AREA_FT2, "ft²").default(0),
  construction: floorConstructionSchema.prefault({ cavityR: 30 }),
});
export type ExposedFloorInput = z.output<typeof exposedFloorSchema>;

/** The attached garage as a buffer space next to the conditioned envelope. */
export const garageSchema = z.strictObject({
  /** House wall shared with the garage, ft² (built like the plan's `wall`; no sun on it). */
  wallAreaFt2: ranged(0, MAX_AREA_FT2, "ft²").default(0),
  /** Door from the house into the garage, ft². */
  doorAreaFt2: ranged(0, 1000, "ft²").default(0),
  doorUFactor: ranged(0.05, 1.5, "Btu/h·ft²·°F").default(0.3),
  /** Floor over the garage (bonus room), ft². */
  floorOverAreaFt2: ranged(0, MAX_AREA_FT2, "ft²").default(0),
  floorOver: floorConstructionSchema.prefault({ cavityR: 30 }),
  /** Garage air temperature in the heating design hour, °F (default computed by the engine). */
  heatingTemperatureF: ranged(-60, 80, "°F").optional(),
  /** Garage air temperature at the cooling design peak, °F (default computed by the engine). */
  coolingTemperatureF: ranged(60, 140, "°F").optional(),
});
export type GarageInput = z.output<typeof garageSchema>;

// ---------------------------------------------------------------------------------------------
// Air: infiltration and mechanical ventilation.

export const infiltrationSchema = z.strictObject({
  /** Blower-door air changes per hour at 50 Pa. Give this or cfm50. */
  ach50: ranged(0.1, 50, "1/h").optional(),
  /** Blower-door flow at 50 Pa, cfm. Give this or ach50. */
  cfm50: ranged(1, 100_000, "cfm").optional(),
  /** Effective leakage area at 4 Pa, in² (HoF 2021 ch. 16 eq. 40); instead of ach50 or cfm50. */
  effectiveLeakageAreaIn2: ranged(1, 10_000, "in²").optional(),
  /** LBL shelter class 1–5, HoF 2021 ch. 16 Table 5; default 4 ("urban buildings on larger lots", our default for a subdivision lot). */
  shelterClass: rangedInt(1, 5, "").default(4),
  /** Flow exponent of the blower-door curve (HoF 2021 ch. 16, eq. 40: "a typical value for n is about 0.65"). */
  flowExponent: ranged(0.5, 1, "").default(0.65),
});
export type InfiltrationInput = z.output<typeof infiltrationSchema>;

export const ventilationSchema = z.strictObject({
  kind: choice(VENTILATION_KINDS, "ventilation kind").default("exhaust"),
  /** Provided whole-house ventilation flow, cfm. Default: the ASHRAE 62.2-2016 eq. 4.1a rate. */
  cfm: ranged(0, 5000, "cfm").optional(),
  /** Sensible recovery effectiveness of an HRV/ERV (balanced only), 0–0.95. */
  sensibleRecoveryEffectiveness: ranged(0, 0.95, "").default(0),
  /** Latent recovery effectiveness of an ERV (balanced only), 0–0.95. */
  latentRecoveryEffectiveness: ranged(0, 0.95, "").default(0),
});
export type VentilationInput = z.output<typeof ventilationSchema>;

// ---------------------------------------------------------------------------------------------
// Ducts and internal gains.

export const ductsSchema = z
  .strictObject({
    location: choice(DUCT_LOCATIONS, "duct location").default("vented-attic"),
    /** Duct insulation R (R-8 in attics is common code practice, from memory). */
    insulationR: ranged(0, 30, "h·ft²·°F/Btu").default(8),
    /** Supply-side leakage to outside the envelope, % of system airflow. */
    supplyLeakagePct: ranged(0, 50, "%").default(5),
    /** Return-side leakage from outside the envelope, % of system airflow. */
    returnLeakagePct: ranged(0, 50, "%").default(5),
    /** Duct loss method (default: the handbook duct loss/gain factors). */
    method: choice(DUCT_METHODS, "duct method").default("handbook-table"),
    /** Furnace or heat pump (the heat pump's cooler supply air loses a larger share in the ducts). */
    heatingSystem: choice(DUCT_HEATING_SYSTEMS, "duct heating system").default("furnace"),
  })
  .superRefine((ducts, ctx) => {
    // The handbook table covers 5–11 % per side; we extrapolate it only so far (lib/load/ducts.ts).
    const meanPct = (ducts.supplyLeakagePct + ducts.returnLeakagePct) / 2;
    if (
      ducts.method === "handbook-table" &&
      ductTableLocation(ducts.location) !== null &&
      meanPct > DUCT_TABLE_MAX_EXTRAPOLATED_LEAKAGE_PCT
    ) {
      ctx.addIssue({
        code: "custom",
        path: ["supplyLeakagePct"],
        message:
          `duct leakage of ${ducts.supplyLeakagePct} % supply / ${ducts.returnLeakagePct} % return (mean ${meanPct} % per side) ` +
          `is beyond what the handbook duct-factor table can be stretched to (it covers 5–11 % per side; we extrapolate ` +
          `to ${DUCT_TABLE_MAX_EXTRAPOLATED_LEAKAGE_PCT} %); use ducts.method "conduction-leakage" or test the ducts`,
        params: {
          range: {
            min: 0,
            max: DUCT_TABLE_MAX_EXTRAPOLATED_LEAKAGE_PCT,
            unit: "% (mean of supply and return)",
          },
        },
      });
    }
  });
export type DuctsInput = z.output<typeof ductsSchema>;

export const internalGainRowSchema = z.strictObject({
  /** Room or appliance, e.g. "kitchen", "home office". */
  name: z.string().min(1, { error: "required: a name for the gain row" }).max(80),
  sensibleBtuh: ranged(0, 50_000, "Btu/h"),
  latentBtuh: ranged(0, 20_000, "Btu/h").default(0),
});
export type InternalGainRow = z.output<typeof internalGainRowSchema>;

export const internalGainsSchema = z.strictObject({
  /**
   * Explicit gain rows. When absent the engine uses HoF 2021 ch. 17 eq. 30–31 (which include the
   * occupants); when present the rows plus occupants × the per-person gains below are used.
   */
  rows: z.array(internalGainRowSchema).optional(),
  /** Per-person sensible gain with explicit rows, Btu/h (230: seated, light activity, common practice). */
  occupantSensibleBtuh: ranged(0, 1000, "Btu/h").default(230),
  /** Per-person latent gain with explicit rows, Btu/h (200, common practice). */
  occupantLatentBtuh: ranged(0, 1000, "Btu/h").default(200),
});
export type InternalGainsInput = z.output<typeof internalGainsSchema>;

// ---------------------------------------------------------------------------------------------
// The plan model.

const facadesSchema = z.strictObject({
  front: facadeSchema,
  left: facadeSchema,
  back: facadeSchema,
  right: facadeSchema,
});

export const planInputSchema = z
  .strictObject({
    /** Plan model name (informational). */
    name: z.string().max(120).optional(),
    conditionedFloorAreaFt2: ranged(100, 50_000, "ft²"),
    stories: rangedInt(1, 4, "").default(1),
    bedrooms: rangedInt(0, 20, ""),
    /** Occupants; default bedrooms + 1 (common practice). */
    occupants: rangedInt(1, 50, "").optional(),
    /** Average ceiling height, ft, used for volume when `volumeFt3` is absent. */
    ceilingHeightFt: ranged(6, 30, "ft").default(9),
    /** Conditioned volume, ft³; default conditioned floor area × ceiling height. */
    volumeFt3: ranged(500, 1_500_000, "ft³").optional(),
    /** Exterior wall construction for every facade (a facade may override it). */
    wall: wallConstructionSchema.prefault({ baseId: "wood-2x4-16in-oc", cavityR: 13 }),
    /** Solar absorptance of the exterior wall finish (0.6 medium colour, from memory) and doors. */
    wallSolarAbsorptance: ranged(0.1, 1, "").default(0.6),
    facades: facadesSchema,
    attic: atticSchema.prefault({}),
    vaultedCeiling: vaultedCeilingSchema.prefault({}),
    skylights: skylightSchema.prefault({}),
    foundation: foundationSchema.prefault({}),
    /** Framed floor over outdoor air (cantilever, floor over a porch), ft². */
    floorOverOutdoors: exposedFloorSchema.prefault({}),
    garage: garageSchema.prefault({}),
    infiltration: infiltrationSchema,
    ventilation: ventilationSchema.prefault({}),
    ducts: ductsSchema.prefault({}),
    internalGains: internalGainsSchema.prefault({}),
    /** Supply-air temperature difference for cooling airflow, °F (20 °F is common practice). */
    coolingSupplyDeltaF: ranged(10, 35, "°F").default(20),
  })
  .superRefine((plan, ctx) => {
    // Cavity insulation must fit in its cavity.
    const cavities: Array<[Array<string | number>, { baseId: string; cavityR: number } | undefined]> = [
      [["wall"], plan.wall],
      ...FACADES.map((f): [Array<string | number>, { baseId: string; cavityR: number } | undefined] => [
        ["facades", f, "wall"],
        plan.facades[f].wall,
      ]),
      [["attic", "roofDeck"], plan.attic.roofDeck],
      [["vaultedCeiling", "construction"], plan.vaultedCeiling.construction],
      [["foundation", "floor"], plan.foundation.floor],
      [["floorOverOutdoors", "construction"], plan.floorOverOutdoors.construction],
      [["garage", "floorOver"], plan.garage.floorOver],
    ];
    for (const [path, c] of cavities) {
      if (!c) continue;
      const depthIn = CAVITY_DEPTH_IN[c.baseId as keyof typeof CAVITY_DEPTH_IN];
      const maxR = depthIn * MAX_CAVITY_R_PER_IN;
      if (depthIn !== undefined && c.cavityR > maxR) {
        ctx.addIssue({
          code: "custom",
          path: [...path, "cavityR"],
          message: `R-${c.cavityR} does not fit the ${depthIn} in cavity of ${c.baseId} (at most R-${maxR.toFixed(1)}); put the rest in continuousR`,
          params: { range: { min: 0, max: maxR, unit: "h·ft²·°F/Btu" } },
        });
      }
    }
    // Cross-field checks: windows and doors must fit in their wall.
    for (const facade of FACADES) {
      const f = plan.facades[facade];
      const windowAreaFt2 = f.window.areaFt2 + f.extraWindows.reduce((sum, w) => sum + w.areaFt2, 0);
      const openingsFt2 = windowAreaFt2 + f.doorAreaFt2;
      if (openingsFt2 > f.grossWallAreaFt2) {
        ctx.addIssue({
          code: "custom",
          path: ["facades", facade, "window", "areaFt2"],
          message:
            `windows (${windowAreaFt2} ft²) plus doors (${f.doorAreaFt2} ft²) exceed the ${facade} facade's ` +
            `gross wall area (${f.grossWallAreaFt2} ft²)`,
          params: { range: { min: 0, max: Math.max(0, f.grossWallAreaFt2 - f.doorAreaFt2), unit: "ft²" } },
        });
      }
    }
    if (plan.garage.doorAreaFt2 > plan.garage.wallAreaFt2) {
      ctx.addIssue({
        code: "custom",
        path: ["garage", "doorAreaFt2"],
        message: `house-to-garage door (${plan.garage.doorAreaFt2} ft²) exceeds the garage wall (${plan.garage.wallAreaFt2} ft²)`,
        params: { range: { min: 0, max: plan.garage.wallAreaFt2, unit: "ft²" } },
      });
    }
    if (plan.foundation.foundationWallAboveGradeAreaFt2 > plan.foundation.foundationWallAreaFt2) {
      ctx.addIssue({
        code: "custom",
        path: ["foundation", "foundationWallAboveGradeAreaFt2"],
        message: "above-grade foundation wall area exceeds the foundation wall area",
        params: { range: { min: 0, max: plan.foundation.foundationWallAreaFt2, unit: "ft²" } },
      });
    }
    // Air leakage: exactly one leakage figure.
    const { ach50, cfm50, effectiveLeakageAreaIn2 } = plan.infiltration;
    const given = [ach50, cfm50, effectiveLeakageAreaIn2].filter((v) => v !== undefined).length;
    if (given === 0) {
      ctx.addIssue({
        code: "custom",
        path: ["infiltration", "ach50"],
        message:
          "required: ach50 or cfm50 from a blower-door test (or the target), or an effective leakage area",
        params: { range: { min: 0.1, max: 50, unit: "1/h" } },
      });
    } else if (given > 1) {
      ctx.addIssue({
        code: "custom",
        path: ["infiltration", cfm50 !== undefined ? "cfm50" : "effectiveLeakageAreaIn2"],
        message: "give one of ach50, cfm50 or effectiveLeakageAreaIn2, not more",
      });
    }
    // Ducts must be in a space the plan has.
    const duct = plan.ducts.location;
    const needs: Partial<Record<DuctLocation, [boolean, string]>> = {
      "vented-attic": [plan.attic.kind === "vented", "the attic is not vented (attic.kind)"],
      "encapsulated-attic": [
        plan.attic.kind === "encapsulated",
        "the attic is not encapsulated (attic.kind)",
      ],
      "vented-crawlspace": [
        plan.foundation.kind === "vented-crawlspace",
        "the foundation is not a vented crawlspace",
      ],
      "conditioned-crawlspace": [
        plan.foundation.kind === "conditioned-crawlspace",
        "the foundation is not a conditioned crawlspace",
      ],
      "unconditioned-basement": [
        plan.foundation.kind === "unconditioned-basement",
        "the foundation is not an unconditioned basement",
      ],
    };
    const need = needs[duct];
    if (need && !need[0]) {
      ctx.addIssue({
        code: "custom",
        path: ["ducts", "location"],
        message: `ducts are in the ${duct} but ${need[1]}`,
      });
    }
    // Ventilation recovery needs a balanced system.
    const v = plan.ventilation;
    if (v.kind !== "balanced" && (v.sensibleRecoveryEffectiveness > 0 || v.latentRecoveryEffectiveness > 0)) {
      ctx.addIssue({
        code: "custom",
        path: ["ventilation", "sensibleRecoveryEffectiveness"],
        message: `heat or energy recovery needs a balanced system (ventilation.kind is ${v.kind})`,
      });
    }
    if (v.kind === "none" && v.cfm !== undefined && v.cfm > 0) {
      ctx.addIssue({
        code: "custom",
        path: ["ventilation", "cfm"],
        message: "ventilation.kind is none but a flow is given",
      });
    }
  });

/** The raw shape a caller may write (defaults omitted). */
export type PlanInputRaw = z.input<typeof planInputSchema>;
/** A validated plan with every default filled in. */
export type PlanInput = z.output<typeof planInputSchema>;

// ---------------------------------------------------------------------------------------------
// Site and design conditions.

export const siteConditionsSchema = z
  .strictObject({
    name: z.string().max(120).optional(),
    /** Where the conditions come from, or any caveat (informational). */
    note: z.string().max(1000).optional(),
    latitudeDeg: ranged(-66, 66, "°"),
    longitudeDeg: ranged(-180, 180, "°"),
    elevationFt: ranged(-1000, 14_000, "ft"),
    /** Heating outdoor design dry bulb (99 % or 99.6 %), °F. */
    heatingOutdoorDbF: ranged(-60, 70, "°F"),
    /** Cooling outdoor design dry bulb (1 %), °F. */
    coolingOutdoorDbF: ranged(60, 125, "°F"),
    /** Mean coincident wet bulb at the cooling design dry bulb, °F. */
    coolingOutdoorWbF: ranged(40, 95, "°F"),
    /** Mean daily range of dry bulb in the design month, °F. */
    dailyRangeF: ranged(0, 50, "°F"),
    /** Design month 1–12 (default July). */
    designMonth: rangedInt(1, 12, "").default(7),
    /** ASHRAE clear-sky beam optical depth τb (HoF ch. 14); default applied by the engine with a note. */
    tauBeam: ranged(0.1, 1.5, "").optional(),
    /** ASHRAE clear-sky diffuse optical depth τd (HoF ch. 14); default applied by the engine with a note. */
    tauDiffuse: ranged(1, 3.5, "").optional(),
    /** Ground reflectance; default 0.2 (HoF 2021 ch. 14 Table 5). */
    groundReflectance: ranged(0, 1, "").default(0.2),
    indoorHeatingF: ranged(55, 80, "°F").default(70),
    indoorCoolingF: ranged(65, 85, "°F").default(75),
    indoorCoolingRhPct: ranged(20, 70, "%").default(50),
  })
  .superRefine((site, ctx) => {
    if (site.coolingOutdoorWbF > site.coolingOutdoorDbF) {
      ctx.addIssue({
        code: "custom",
        path: ["coolingOutdoorWbF"],
        message: `wet bulb ${site.coolingOutdoorWbF} °F is above the dry bulb ${site.coolingOutdoorDbF} °F`,
        params: { range: { min: 40, max: site.coolingOutdoorDbF, unit: "°F" } },
      });
    }
    if (site.heatingOutdoorDbF >= site.indoorHeatingF) {
      ctx.addIssue({
        code: "custom",
        path: ["heatingOutdoorDbF"],
        message: `heating outdoor design ${site.heatingOutdoorDbF} °F is not below the indoor ${site.indoorHeatingF} °F`,
        params: { range: { min: -60, max: site.indoorHeatingF, unit: "°F" } },
      });
    }
  });
export type SiteConditionsRaw = z.input<typeof siteConditionsSchema>;
export type SiteConditions = z.output<typeof siteConditionsSchema>;

// ---------------------------------------------------------------------------------------------
// Parsing: zod issues → LoadInputError naming field and valid range.

/** Our numeric fields write "(valid range MIN to MAX UNIT)" in every message (see `rangeText`). */
const RANGE_IN_MESSAGE = /valid range (-?[\d.]+) to (-?[\d.]+)(?: ([^)]+))?\)/;

function issueRange(issue: z.core.$ZodIssue): ValidRange | undefined {
  if (issue.code === "custom") {
    const params = issue.params as { range?: ValidRange } | undefined;
    if (params?.range) return params.range;
  }
  const m = RANGE_IN_MESSAGE.exec(issue.message);
  if (m) return { min: Number(m[1]), max: Number(m[2]), unit: m[3] };
  if (issue.code === "too_small") return { min: Number(issue.minimum) };
  if (issue.code === "too_big") return { max: Number(issue.maximum) };
  return undefined;
}

/** Turn zod issues into our field-named issues (paths joined with dots, array indexes as numbers). */
export function toLoadInputIssues(error: z.ZodError, prefix = ""): LoadInputIssue[] {
  return error.issues.map((issue) => {
    const path = issue.path.map(String).join(".");
    const field = prefix && path ? `${prefix}.${path}` : prefix || path || "(input)";
    const message =
      issue.code === "unrecognized_keys" ? `unknown field(s): ${issue.keys.join(", ")}` : issue.message;
    return { field, message, range: issueRange(issue) };
  });
}

export type ParseResult<T> = { ok: true; value: T } | { ok: false; issues: LoadInputIssue[] };

/** Validate a plan without throwing: every problem found is returned. */
export function safeParsePlanInput(raw: unknown): ParseResult<PlanInput> {
  const parsed = planInputSchema.safeParse(raw);
  return parsed.success
    ? { ok: true, value: parsed.data }
    : { ok: false, issues: toLoadInputIssues(parsed.error) };
}

/** Validate a plan; throws LoadInputError (with every issue in `issues`) on bad input. */
export function parsePlanInput(raw: unknown): PlanInput {
  const result = safeParsePlanInput(raw);
  if (!result.ok) throw LoadInputError.fromIssues(result.issues);
  return result.value;
}

/** Validate site and design conditions without throwing. */
export function safeParseSiteConditions(raw: unknown): ParseResult<SiteConditions> {
  const parsed = siteConditionsSchema.safeParse(raw);
  return parsed.success
    ? { ok: true, value: parsed.data }
    : { ok: false, issues: toLoadInputIssues(parsed.error) };
}

/** Validate site and design conditions; throws LoadInputError on bad input. */
export function parseSiteConditions(raw: unknown): SiteConditions {
  const result = safeParseSiteConditions(raw);
  if (!result.ok) throw LoadInputError.fromIssues(result.issues);
  return result.value;
}

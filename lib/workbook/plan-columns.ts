/**
 * The plan library's flat column list: one source of truth for the grid, the importers, the
 * exports, the templates and the command line.
 *
 * Each column has a stable snake_case key (used in cell formulas and JSON), a header with its
 * unit, a column group of our own naming, a quantity kind, required-or-default, choices where
 * the engine has a const list, and the path into the engine's PlanInput.
 *
 * Defaults are read from the engine's own schema (a minimal plan parsed through
 * parsePlanInput), so a blank cell means exactly what the engine would assume. Columns whose
 * engine field is optional with a computed default (occupants, volume, ceiling area, …) have
 * no default: blank leaves the engine to compute it.
 *
 * Two window groups per facade are flattened into columns: the facade's `window` and, when its
 * area is filled, `extraWindows[0]` (whose blank cells take the first group's values). Not
 * flattened (JSON input only): a third or further window group per facade and named
 * internal-gain rows; the table carries one total for entered internal gains.
 *
 * Every construction may carry a direct whole-assembly U-factor (`*_u` columns) that replaces
 * its base assembly plus added insulation in the engine. Air leakage is one of three columns
 * (ACH50, CFM50, effective leakage area); a row that fills more than one is refused, naming them.
 */
import {
  ATTIC_KINDS,
  CEILING_BASE_ASSEMBLIES,
  DUCT_HEATING_SYSTEMS,
  DUCT_LOCATIONS,
  DUCT_METHODS,
  FACADES,
  FLOOR_BASE_ASSEMBLIES,
  FOUNDATION_KINDS,
  ROOF_BASE_ASSEMBLIES,
  SLAB_EDGE_CONSTRUCTIONS,
  SLAB_FLOOR_COVERINGS,
  VENTILATION_KINDS,
  WALL_BASE_ASSEMBLIES,
  safeParsePlanInput,
  type Facade,
  type PlanInput,
} from "../load/input";
import { FACING_LABELS, type FacingLabel, type PlanFacings } from "../load/results";
import {
  readRowCells,
  readTable,
  type CellValue,
  type ColumnDef,
  type ColumnValueType,
  type RawTable,
  type TableCellError,
} from "./columns";
import type { QuantityKind } from "./units";

/** A plan-library column: a generic column plus its path into PlanInput. */
export interface PlanColumnDef extends ColumnDef {
  /** Path into PlanInput (dotted), or null for plan_code, which is the workbook's own key. */
  path: string | null;
}

export const PLAN_COLUMN_GROUPS = [
  "Plan",
  "Walls",
  "Front facade",
  "Left facade",
  "Back facade",
  "Right facade",
  "Ceiling & attic",
  "Vaulted ceiling & skylights",
  "Floors & foundation",
  "Garage",
  "Air & ducts",
  "Internal gains",
] as const;
export type PlanColumnGroup = (typeof PLAN_COLUMN_GROUPS)[number];

const INTERNAL_GAIN_ROW_NAME = "Entered in the plan library (total)";

type Spec = {
  key: string;
  header: string;
  group: PlanColumnGroup;
  value: ColumnValueType;
  path: string | null;
  required?: boolean;
  /** Take the default from the engine's schema (true) or leave blank = engine computes (false). */
  engineDefault?: boolean;
  meaning: string;
  example: string;
};

const num = (
  quantity: QuantityKind,
  extra: { minimum?: number; maximum?: number; integer?: boolean } = {},
): ColumnValueType => ({
  type: "number",
  quantity,
  ...extra,
});
const oneOf = (choices: readonly string[]): ColumnValueType => ({ type: "enum", choices });

const FACADE_LABEL: Record<Facade, string> = { front: "Front", left: "Left", back: "Back", right: "Right" };

function facadeSpecs(facade: Facade): Spec[] {
  const label = FACADE_LABEL[facade];
  const group = `${label} facade` as PlanColumnGroup;
  const base = `facades.${facade}`;
  const side =
    facade === "front" ? "the front (street) facade" : `the ${facade} facade, as seen from the street`;
  return [
    {
      key: `${facade}_wall_ft2`,
      header: `${label} wall gross (ft²)`,
      group,
      value: num("areaFt2"),
      path: `${base}.grossWallAreaFt2`,
      required: true,
      meaning: `Gross wall area of ${side}, windows and doors included.`,
      example: "=38*9-2*15",
    },
    {
      key: `${facade}_window_ft2`,
      header: `${label} windows (ft²)`,
      group,
      value: num("areaFt2"),
      path: `${base}.window.areaFt2`,
      engineDefault: true,
      meaning: `Window area (rough opening) on ${side}.`,
      example: facade === "front" ? "=front_wall_ft2*0.15" : "48 sf",
    },
    {
      key: `${facade}_window_u`,
      header: `${label} window U (Btu/h·ft²·°F)`,
      group,
      value: num("uFactor"),
      path: `${base}.window.uFactor`,
      engineDefault: true,
      meaning: "NFRC-rated whole-window U-factor.",
      example: "0.30 U",
    },
    {
      key: `${facade}_window_shgc`,
      header: `${label} window SHGC`,
      group,
      value: num("shgc"),
      path: `${base}.window.shgc`,
      engineDefault: true,
      meaning: "NFRC-rated solar heat gain coefficient.",
      example: "0.25",
    },
    {
      key: `${facade}_window_shade`,
      header: `${label} interior shading coefficient`,
      group,
      value: num("fraction"),
      path: `${base}.window.interiorShadingCoefficient`,
      engineDefault: true,
      meaning: "Interior shade attenuation (1 = no credit for blinds or drapes).",
      example: "1",
    },
    {
      key: `${facade}_overhang_depth_ft`,
      header: `${label} overhang depth (ft)`,
      group,
      value: num("lengthFt"),
      path: `${base}.window.overhangDepthFt`,
      engineDefault: true,
      meaning: "How far the eave or porch roof projects past the wall above the windows.",
      example: "2'",
    },
    {
      key: `${facade}_overhang_above_head_ft`,
      header: `${label} overhang above window head (ft)`,
      group,
      value: num("lengthFt"),
      path: `${base}.window.overhangHeightAboveHeadFt`,
      engineDefault: true,
      meaning: "Height from the window head up to the underside of the overhang.",
      example: "1 ft",
    },
    {
      key: `${facade}_window_height_ft`,
      header: `${label} window height (ft)`,
      group,
      value: num("lengthFt"),
      path: `${base}.window.windowHeightFt`,
      engineDefault: true,
      meaning: "Height of the glazing, for overhang shading.",
      example: "5'",
    },
    {
      key: `${facade}_window_ext_attenuation`,
      header: `${label} window exterior attenuation (1 = none)`,
      group,
      value: num("fraction"),
      path: `${base}.window.exteriorAttenuation`,
      engineDefault: true,
      meaning:
        "Share of transmitted sun that insect screens or exterior shades let through (1 = nothing outside the glass; typical values: HoF 2021 ch. 17 Table 11).",
      example: "1",
    },
    ...secondWindowGroupSpecs(facade, label, group, base),
    {
      key: `${facade}_door_ft2`,
      header: `${label} doors (ft²)`,
      group,
      value: num("areaFt2"),
      path: `${base}.doorAreaFt2`,
      engineDefault: true,
      meaning: "Opaque exterior door area on this facade.",
      example: facade === "front" ? "20" : "0",
    },
    {
      key: `${facade}_door_u`,
      header: `${label} door U (Btu/h·ft²·°F)`,
      group,
      value: num("uFactor"),
      path: `${base}.doorUFactor`,
      engineDefault: true,
      meaning: "Rated door U-factor.",
      example: "0.30",
    },
    {
      key: `${facade}_wall_base`,
      header: `${label} wall base assembly (blank = plan's)`,
      group,
      value: oneOf(WALL_BASE_ASSEMBLIES),
      path: `${base}.wall.baseId`,
      meaning:
        "Only when this facade is built differently from the plan's walls; blank parts are taken from the plan's walls.",
      example: "",
    },
    {
      key: `${facade}_wall_cavity_r`,
      header: `${label} wall cavity R (blank = plan's)`,
      group,
      value: num("rValue"),
      path: `${base}.wall.cavityR`,
      meaning: "Cavity insulation added to this facade's wall, when it differs from the plan's.",
      example: "",
    },
    {
      key: `${facade}_wall_continuous_r`,
      header: `${label} wall continuous R (blank = plan's)`,
      group,
      value: num("rValue"),
      path: `${base}.wall.continuousR`,
      meaning: "Continuous insulation on this facade's wall, when it differs from the plan's.",
      example: "",
    },
    {
      key: `${facade}_wall_u`,
      header: `${label} wall U-factor (Btu/h·ft²·°F, blank = from its assembly)`,
      group,
      value: num("uFactor"),
      path: `${base}.wall.uFactor`,
      meaning:
        "A whole-wall U-factor for this facade (rated or separately calculated), replacing its base assembly and added R. Blank: a facade built differently is computed from its own assembly; otherwise it is built like the plan's walls.",
      example: "",
    },
  ];
}

/** The second window group of a facade (`extraWindows[0]`): blank area = no second group; other blanks = the first group's value. */
function secondWindowGroupSpecs(facade: Facade, label: string, group: PlanColumnGroup, base: string): Spec[] {
  const path = `${base}.extraWindows.0`;
  const same = "blank = group 1's";
  return [
    {
      key: `${facade}_window2_ft2`,
      header: `${label} windows group 2 (ft², blank = none)`,
      group,
      value: num("areaFt2"),
      path: `${path}.areaFt2`,
      meaning: `A second group of windows on this facade with other properties or shading (a patio door, a clerestory); blank = none. Its other blank cells take the values of the facade's first window group.`,
      example: facade === "back" ? "40" : "",
    },
    {
      key: `${facade}_window2_u`,
      header: `${label} windows group 2 U (Btu/h·ft²·°F, ${same})`,
      group,
      value: num("uFactor"),
      path: `${path}.uFactor`,
      meaning: "NFRC-rated U-factor of the second window group.",
      example: "",
    },
    {
      key: `${facade}_window2_shgc`,
      header: `${label} windows group 2 SHGC (${same})`,
      group,
      value: num("shgc"),
      path: `${path}.shgc`,
      meaning: "NFRC-rated SHGC of the second window group.",
      example: facade === "back" ? "0.30" : "",
    },
    {
      key: `${facade}_window2_shade`,
      header: `${label} windows group 2 interior shading coefficient (${same})`,
      group,
      value: num("fraction"),
      path: `${path}.interiorShadingCoefficient`,
      meaning: "Interior shade attenuation of the second window group.",
      example: "",
    },
    {
      key: `${facade}_window2_ext_attenuation`,
      header: `${label} windows group 2 exterior attenuation (${same})`,
      group,
      value: num("fraction"),
      path: `${path}.exteriorAttenuation`,
      meaning: "Exterior attenuation (screens, exterior shades) of the second window group.",
      example: "",
    },
    {
      key: `${facade}_window2_height_ft`,
      header: `${label} windows group 2 height (ft, ${same})`,
      group,
      value: num("lengthFt"),
      path: `${path}.windowHeightFt`,
      meaning: "Height of the second group's glazing, for overhang shading.",
      example: facade === "back" ? "8'" : "",
    },
    {
      key: `${facade}_window2_overhang_depth_ft`,
      header: `${label} windows group 2 overhang depth (ft, ${same})`,
      group,
      value: num("lengthFt"),
      path: `${path}.overhangDepthFt`,
      meaning: "Projection of the eave or porch roof over the second window group.",
      example: facade === "back" ? "10'" : "",
    },
    {
      key: `${facade}_window2_overhang_above_head_ft`,
      header: `${label} windows group 2 overhang above head (ft, ${same})`,
      group,
      value: num("lengthFt"),
      path: `${path}.overhangHeightAboveHeadFt`,
      meaning: "Height from the second group's window head up to the overhang's underside.",
      example: facade === "back" ? "1'" : "",
    },
  ];
}

/** The window-group fields a second group takes from the first when its cell is blank. */
const SECOND_WINDOW_FIELDS = [
  ["window2_u", "window_u", "uFactor"],
  ["window2_shgc", "window_shgc", "shgc"],
  ["window2_shade", "window_shade", "interiorShadingCoefficient"],
  ["window2_ext_attenuation", "window_ext_attenuation", "exteriorAttenuation"],
  ["window2_height_ft", "window_height_ft", "windowHeightFt"],
  ["window2_overhang_depth_ft", "overhang_depth_ft", "overhangDepthFt"],
  ["window2_overhang_above_head_ft", "overhang_above_head_ft", "overhangHeightAboveHeadFt"],
] as const;

/** The three ways to give air leakage; exactly one per row. */
export const AIR_LEAKAGE_KEYS = [
  "blower_door_ach50",
  "blower_door_cfm50",
  "effective_leakage_area_in2",
] as const;

const SPECS: Spec[] = [
  // Plan
  {
    key: "plan_code",
    header: "Plan code",
    group: "Plan",
    value: {
      type: "text",
      maxLength: 40,
      pattern: /^[A-Za-z0-9][A-Za-z0-9._-]*$/,
      patternHint: "must start with a letter or digit and use only letters, digits, . _ -",
    },
    path: null,
    required: true,
    meaning:
      "The builder's code for the plan model; unique in the library. An import updates the plan with the same code.",
    example: "AS-1650",
  },
  {
    key: "plan_name",
    header: "Plan name",
    group: "Plan",
    value: { type: "text", maxLength: 120 },
    path: "name",
    required: true,
    meaning: "The plan model's marketing name.",
    example: "The Aspen",
  },
  {
    key: "conditioned_area_ft2",
    header: "Conditioned floor area (ft²)",
    group: "Plan",
    value: num("areaFt2"),
    path: "conditionedFloorAreaFt2",
    required: true,
    meaning: "Conditioned floor area of all stories.",
    example: "1,650 sf",
  },
  {
    key: "stories",
    header: "Stories",
    group: "Plan",
    value: num("count"),
    path: "stories",
    engineDefault: true,
    meaning: "Stories above grade.",
    example: "1",
  },
  {
    key: "bedrooms",
    header: "Bedrooms",
    group: "Plan",
    value: num("count"),
    path: "bedrooms",
    required: true,
    meaning: "Bedrooms (sets default occupants and the ventilation rate).",
    example: "3",
  },
  {
    key: "occupants",
    header: "Occupants (blank = bedrooms + 1)",
    group: "Plan",
    value: num("count"),
    path: "occupants",
    meaning: "Occupants for internal gains; blank = bedrooms + 1 (common practice).",
    example: "",
  },
  {
    key: "ceiling_height_ft",
    header: "Average ceiling height (ft)",
    group: "Plan",
    value: num("lengthFt"),
    path: "ceilingHeightFt",
    engineDefault: true,
    meaning: "Average ceiling height, for the conditioned volume when no volume is given.",
    example: "9'",
  },
  {
    key: "volume_ft3",
    header: "Conditioned volume (ft³, blank = area × height)",
    group: "Plan",
    value: num("volumeFt3"),
    path: "volumeFt3",
    meaning: "Conditioned volume; blank = floor area × average ceiling height.",
    example: "",
  },
  // Walls
  {
    key: "wall_base",
    header: "Wall base assembly",
    group: "Walls",
    value: oneOf(WALL_BASE_ASSEMBLIES),
    path: "wall.baseId",
    engineDefault: true,
    meaning:
      "Framing or masonry of the exterior walls (framing, sheathing, siding and films are known to the engine).",
    example: "wood-2x6-16in-oc",
  },
  {
    key: "wall_cavity_r",
    header: "Wall cavity R (added)",
    group: "Walls",
    value: num("rValue"),
    path: "wall.cavityR",
    engineDefault: true,
    meaning: "Insulation added in the wall cavities (batts, blown, foam). Never the whole assembly's R.",
    example: "R-21",
  },
  {
    key: "wall_continuous_r",
    header: "Wall continuous R (added)",
    group: "Walls",
    value: num("rValue"),
    path: "wall.continuousR",
    engineDefault: true,
    meaning: "Continuous insulation added across the framing (rigid board).",
    example: "R-5",
  },
  {
    key: "wall_u",
    header: "Wall U-factor (Btu/h·ft²·°F, blank = from assembly)",
    group: "Walls",
    value: num("uFactor"),
    path: "wall.uFactor",
    meaning:
      "A whole-wall U-factor from a rated or separately calculated assembly; replaces the base assembly and added R (also for the wall to the garage). Blank = computed from the base assembly and added R.",
    example: "",
  },
  ...FACADES.flatMap(facadeSpecs),
  // Ceiling & attic
  {
    key: "attic_kind",
    header: "Attic",
    group: "Ceiling & attic",
    value: oneOf(ATTIC_KINDS),
    path: "attic.kind",
    engineDefault: true,
    meaning:
      "vented: insulation on the ceiling; encapsulated: insulation under the roof deck; none: no attic.",
    example: "vented",
  },
  {
    key: "ceiling_area_ft2",
    header: "Ceiling under attic (ft², blank = area ÷ stories)",
    group: "Ceiling & attic",
    value: num("areaFt2"),
    path: "attic.ceilingAreaFt2",
    meaning: "Ceiling area below the attic; blank = conditioned floor area ÷ stories.",
    example: "",
  },
  {
    key: "ceiling_base",
    header: "Ceiling base assembly",
    group: "Ceiling & attic",
    value: oneOf(CEILING_BASE_ASSEMBLIES),
    path: "attic.ceiling.baseId",
    engineDefault: true,
    meaning: "Attic joists under the insulation.",
    example: "attic-joists-24in-oc",
  },
  {
    key: "ceiling_cavity_r",
    header: "Ceiling insulation R (added)",
    group: "Ceiling & attic",
    value: num("rValue"),
    path: "attic.ceiling.cavityR",
    engineDefault: true,
    meaning: "Insulation laid on the ceiling (vented attic).",
    example: "R-49",
  },
  {
    key: "ceiling_continuous_r",
    header: "Ceiling continuous R (added)",
    group: "Ceiling & attic",
    value: num("rValue"),
    path: "attic.ceiling.continuousR",
    engineDefault: true,
    meaning: "Continuous board at the ceiling, if any.",
    example: "0",
  },
  {
    key: "ceiling_u",
    header: "Ceiling U-factor (Btu/h·ft²·°F, blank = from assembly)",
    group: "Ceiling & attic",
    value: num("uFactor"),
    path: "attic.ceiling.uFactor",
    meaning: "A whole-ceiling U-factor under the attic; replaces the ceiling base assembly and added R.",
    example: "",
  },
  {
    key: "roof_deck_base",
    header: "Roof deck base assembly",
    group: "Ceiling & attic",
    value: oneOf(ROOF_BASE_ASSEMBLIES),
    path: "attic.roofDeck.baseId",
    engineDefault: true,
    meaning: "Rafters under the roof deck.",
    example: "roof-rafters-2x10-24in-oc",
  },
  {
    key: "roof_deck_cavity_r",
    header: "Roof deck cavity R (added)",
    group: "Ceiling & attic",
    value: num("rValue"),
    path: "attic.roofDeck.cavityR",
    engineDefault: true,
    meaning: "Insulation under the roof deck between rafters (encapsulated attic, e.g. spray foam).",
    example: "R-20",
  },
  {
    key: "roof_deck_continuous_r",
    header: "Roof deck continuous R (added)",
    group: "Ceiling & attic",
    value: num("rValue"),
    path: "attic.roofDeck.continuousR",
    engineDefault: true,
    meaning: "Continuous insulation above or below the roof deck.",
    example: "0",
  },
  {
    key: "roof_deck_u",
    header: "Roof deck U-factor (Btu/h·ft²·°F, blank = from assembly)",
    group: "Ceiling & attic",
    value: num("uFactor"),
    path: "attic.roofDeck.uFactor",
    meaning:
      "A whole roof-deck U-factor of an encapsulated attic; replaces the roof deck base assembly and added R (a vented attic's deck is not insulated and does not use it).",
    example: "",
  },
  {
    key: "roof_pitch_in12",
    header: "Roof pitch (in per 12 in)",
    group: "Ceiling & attic",
    value: num("pitchIn12"),
    path: "attic.roofPitchRisePer12In",
    engineDefault: true,
    meaning: "Rise in inches per 12 in of run.",
    example: "6/12",
  },
  {
    key: "roof_absorptance",
    header: "Roof solar absorptance",
    group: "Ceiling & attic",
    value: num("fraction"),
    path: "attic.roofSolarAbsorptance",
    engineDefault: true,
    meaning:
      "Share of sunlight the roofing absorbs (HoF 2021 ch. 17 Table 8: dark asphalt shingle 0.92, light shingle 0.75).",
    example: "0.92",
  },
  // Vaulted ceiling & skylights
  {
    key: "vaulted_ceiling_ft2",
    header: "Vaulted ceiling (ft²)",
    group: "Vaulted ceiling & skylights",
    value: num("areaFt2"),
    path: "vaultedCeiling.areaFt2",
    engineDefault: true,
    meaning: "Ceiling with the roof directly above it (no attic between).",
    example: "0",
  },
  {
    key: "vaulted_base",
    header: "Vaulted ceiling base assembly",
    group: "Vaulted ceiling & skylights",
    value: oneOf(ROOF_BASE_ASSEMBLIES),
    path: "vaultedCeiling.construction.baseId",
    engineDefault: true,
    meaning: "Rafters of the vaulted ceiling.",
    example: "roof-rafters-2x10-24in-oc",
  },
  {
    key: "vaulted_cavity_r",
    header: "Vaulted ceiling cavity R (added)",
    group: "Vaulted ceiling & skylights",
    value: num("rValue"),
    path: "vaultedCeiling.construction.cavityR",
    engineDefault: true,
    meaning: "Insulation between the rafters of the vaulted ceiling.",
    example: "R-30",
  },
  {
    key: "vaulted_continuous_r",
    header: "Vaulted ceiling continuous R (added)",
    group: "Vaulted ceiling & skylights",
    value: num("rValue"),
    path: "vaultedCeiling.construction.continuousR",
    engineDefault: true,
    meaning: "Continuous insulation on the vaulted roof.",
    example: "0",
  },
  {
    key: "vaulted_u",
    header: "Vaulted ceiling U-factor (Btu/h·ft²·°F, blank = from assembly)",
    group: "Vaulted ceiling & skylights",
    value: num("uFactor"),
    path: "vaultedCeiling.construction.uFactor",
    meaning: "A whole U-factor of the vaulted ceiling and roof; replaces its base assembly and added R.",
    example: "",
  },
  {
    key: "vaulted_roof_absorptance",
    header: "Vaulted roof solar absorptance",
    group: "Vaulted ceiling & skylights",
    value: num("fraction"),
    path: "vaultedCeiling.roofSolarAbsorptance",
    engineDefault: true,
    meaning: "Solar absorptance of the roofing over the vaulted ceiling.",
    example: "0.92",
  },
  {
    key: "skylight_ft2",
    header: "Skylights (ft²)",
    group: "Vaulted ceiling & skylights",
    value: num("areaFt2"),
    path: "skylights.areaFt2",
    engineDefault: true,
    meaning: "Skylight glazing area.",
    example: "0",
  },
  {
    key: "skylight_u",
    header: "Skylight U (Btu/h·ft²·°F)",
    group: "Vaulted ceiling & skylights",
    value: num("uFactor"),
    path: "skylights.uFactor",
    engineDefault: true,
    meaning: "Rated skylight U-factor.",
    example: "0.55",
  },
  {
    key: "skylight_shgc",
    header: "Skylight SHGC",
    group: "Vaulted ceiling & skylights",
    value: num("shgc"),
    path: "skylights.shgc",
    engineDefault: true,
    meaning: "Rated skylight SHGC.",
    example: "0.30",
  },
  {
    key: "skylight_shade",
    header: "Skylight interior shading coefficient",
    group: "Vaulted ceiling & skylights",
    value: num("fraction"),
    path: "skylights.interiorShadingCoefficient",
    engineDefault: true,
    meaning: "Interior shade attenuation of the skylights (1 = none).",
    example: "1",
  },
  {
    key: "skylight_tilt_deg",
    header: "Skylight tilt (° from horizontal)",
    group: "Vaulted ceiling & skylights",
    value: num("degrees"),
    path: "skylights.tiltDeg",
    engineDefault: true,
    meaning: "Slope of the skylight glazing.",
    example: "26.6°",
  },
  {
    key: "skylight_facade",
    header: "Skylight slopes toward",
    group: "Vaulted ceiling & skylights",
    value: oneOf(FACADES),
    path: "skylights.facade",
    engineDefault: true,
    meaning: "The facade the skylight's roof plane faces.",
    example: "back",
  },
  // Floors & foundation
  {
    key: "foundation_kind",
    header: "Foundation",
    group: "Floors & foundation",
    value: oneOf(FOUNDATION_KINDS),
    path: "foundation.kind",
    engineDefault: true,
    meaning: "Slab, crawlspace or basement, and whether it is conditioned.",
    example: "slab-on-grade",
  },
  {
    key: "slab_perimeter_ft",
    header: "Slab edge perimeter (ft)",
    group: "Floors & foundation",
    value: num("lengthFt"),
    path: "foundation.slabPerimeterFt",
    engineDefault: true,
    meaning: "Exposed slab-edge length (slab-on-grade).",
    example: "=2*(50+40)",
  },
  {
    key: "slab_edge_r",
    header: "Slab edge insulation R",
    group: "Floors & foundation",
    value: num("rValue"),
    path: "foundation.slabEdgeInsulationR",
    engineDefault: true,
    meaning: "Vertical insulation at the slab edge.",
    example: "R-10",
  },
  {
    key: "slab_edge_depth_ft",
    header: "Slab edge insulation depth (ft)",
    group: "Floors & foundation",
    value: num("lengthFt"),
    path: "foundation.slabEdgeInsulationDepthFt",
    engineDefault: true,
    meaning:
      "How deep the slab-edge insulation reaches, as installed (shown on reports; the F-factor does not use it: its table assumes insulation from the slab edge to the footer).",
    example: "2'",
  },
  {
    key: "slab_edge_construction",
    header: "Foundation wall under the slab edge",
    group: "Floors & foundation",
    value: oneOf(SLAB_EDGE_CONSTRUCTIONS),
    path: "foundation.slabEdgeConstruction",
    engineDefault: true,
    meaning:
      "The wall under the slab edge, which sets the edge's F-factor (HoF 2021 ch. 18 Table 24: block with brick facing, metal studs with stucco, poured concrete with a perimeter duct).",
    example: "block-8in-brick-facing",
  },
  {
    key: "slab_f_factor",
    header: "Slab edge F-factor (Btu/h·ft·°F, blank = from edge insulation)",
    group: "Floors & foundation",
    value: num("fFactor"),
    path: "foundation.slabFFactor",
    meaning:
      "A slab-edge F-factor from a published table, per ft of exposed perimeter; replaces the one the engine finds from the edge insulation.",
    example: "",
  },
  {
    key: "slab_area_ft2",
    header: "Slab area (ft², blank = area ÷ stories)",
    group: "Floors & foundation",
    value: num("areaFt2"),
    path: "foundation.slabAreaFt2",
    meaning:
      "Slab floor area on grade (for the slab's cooling credit); blank = conditioned floor area ÷ stories when a perimeter is given.",
    example: "",
  },
  {
    key: "slab_floor_covering",
    header: "Slab floor covering",
    group: "Floors & foundation",
    value: oneOf(SLAB_FLOOR_COVERINGS),
    path: "foundation.slabFloorCovering",
    engineDefault: true,
    meaning:
      "What covers most of the slab indoors: carpet insulates it from the room, tile or bare concrete much less.",
    example: "carpet",
  },
  {
    key: "foundation_floor_ft2",
    header: "Floor over crawlspace or basement (ft²)",
    group: "Floors & foundation",
    value: num("areaFt2"),
    path: "foundation.floorAreaFt2",
    engineDefault: true,
    meaning: "Framed floor over a vented crawlspace or an unconditioned basement.",
    example: "0",
  },
  {
    key: "foundation_floor_base",
    header: "Floor over foundation base assembly",
    group: "Floors & foundation",
    value: oneOf(FLOOR_BASE_ASSEMBLIES),
    path: "foundation.floor.baseId",
    engineDefault: true,
    meaning: "Floor joists over the crawlspace or basement.",
    example: "floor-joists-2x10-16in-oc",
  },
  {
    key: "foundation_floor_cavity_r",
    header: "Floor over foundation cavity R (added)",
    group: "Floors & foundation",
    value: num("rValue"),
    path: "foundation.floor.cavityR",
    engineDefault: true,
    meaning: "Insulation between the floor joists.",
    example: "R-19",
  },
  {
    key: "foundation_floor_continuous_r",
    header: "Floor over foundation continuous R (added)",
    group: "Floors & foundation",
    value: num("rValue"),
    path: "foundation.floor.continuousR",
    engineDefault: true,
    meaning: "Continuous insulation under the floor joists.",
    example: "0",
  },
  {
    key: "foundation_floor_u",
    header: "Floor over foundation U-factor (Btu/h·ft²·°F, blank = from assembly)",
    group: "Floors & foundation",
    value: num("uFactor"),
    path: "foundation.floor.uFactor",
    meaning:
      "A whole U-factor of the floor over the crawlspace or basement; replaces its base assembly and added R.",
    example: "",
  },
  {
    key: "foundation_wall_ft2",
    header: "Foundation wall (ft²)",
    group: "Floors & foundation",
    value: num("areaFt2"),
    path: "foundation.foundationWallAreaFt2",
    engineDefault: true,
    meaning: "Basement or conditioned-crawlspace wall area, above and below grade together.",
    example: "0",
  },
  {
    key: "foundation_wall_above_grade_ft2",
    header: "Foundation wall above grade (ft²)",
    group: "Floors & foundation",
    value: num("areaFt2"),
    path: "foundation.foundationWallAboveGradeAreaFt2",
    engineDefault: true,
    meaning: "The part of the foundation wall area that is above grade.",
    example: "0",
  },
  {
    key: "foundation_wall_depth_ft",
    header: "Foundation wall depth below grade (ft)",
    group: "Floors & foundation",
    value: num("lengthFt"),
    path: "foundation.foundationWallDepthBelowGradeFt",
    engineDefault: true,
    meaning: "How far the foundation wall reaches below grade.",
    example: "7'",
  },
  {
    key: "foundation_wall_r",
    header: "Foundation wall insulation R",
    group: "Floors & foundation",
    value: num("rValue"),
    path: "foundation.foundationWallInsulationR",
    engineDefault: true,
    meaning: "Continuous insulation on the foundation walls.",
    example: "R-10",
  },
  {
    key: "foundation_wall_u",
    header: "Foundation wall U-factor (Btu/h·ft²·°F, blank = computed)",
    group: "Floors & foundation",
    value: num("uFactor"),
    path: "foundation.foundationWallUFactor",
    meaning:
      "A whole foundation-wall U-factor (soil included for the part below grade), used above and below grade; replaces the one computed from the insulation R and depth.",
    example: "",
  },
  {
    key: "basement_heating_temp_f",
    header: "Unconditioned basement at heating design (°F, blank = computed)",
    group: "Floors & foundation",
    value: num("temperatureF"),
    path: "foundation.basementHeatingTemperatureF",
    meaning:
      "Air temperature of an unconditioned basement in the heating design hour; blank = the engine's estimate.",
    example: "",
  },
  {
    key: "floor_over_outdoors_ft2",
    header: "Floor over outdoors (ft²)",
    group: "Floors & foundation",
    value: num("areaFt2"),
    path: "floorOverOutdoors.areaFt2",
    engineDefault: true,
    meaning: "Framed floor over outdoor air (cantilever, floor over a porch).",
    example: "0",
  },
  {
    key: "floor_over_outdoors_base",
    header: "Floor over outdoors base assembly",
    group: "Floors & foundation",
    value: oneOf(FLOOR_BASE_ASSEMBLIES),
    path: "floorOverOutdoors.construction.baseId",
    engineDefault: true,
    meaning: "Floor joists over outdoor air.",
    example: "floor-joists-2x10-16in-oc",
  },
  {
    key: "floor_over_outdoors_cavity_r",
    header: "Floor over outdoors cavity R (added)",
    group: "Floors & foundation",
    value: num("rValue"),
    path: "floorOverOutdoors.construction.cavityR",
    engineDefault: true,
    meaning: "Insulation between the joists of the floor over outdoors.",
    example: "R-30",
  },
  {
    key: "floor_over_outdoors_continuous_r",
    header: "Floor over outdoors continuous R (added)",
    group: "Floors & foundation",
    value: num("rValue"),
    path: "floorOverOutdoors.construction.continuousR",
    engineDefault: true,
    meaning: "Continuous insulation under the floor over outdoors.",
    example: "0",
  },
  {
    key: "floor_over_outdoors_u",
    header: "Floor over outdoors U-factor (Btu/h·ft²·°F, blank = from assembly)",
    group: "Floors & foundation",
    value: num("uFactor"),
    path: "floorOverOutdoors.construction.uFactor",
    meaning: "A whole U-factor of the floor over outdoor air; replaces its base assembly and added R.",
    example: "",
  },
  // Garage
  {
    key: "garage_wall_ft2",
    header: "Wall to garage (ft²)",
    group: "Garage",
    value: num("areaFt2"),
    path: "garage.wallAreaFt2",
    engineDefault: true,
    meaning: "House wall shared with an attached garage (built like the plan's walls).",
    example: "220",
  },
  {
    key: "garage_door_ft2",
    header: "Door to garage (ft²)",
    group: "Garage",
    value: num("areaFt2"),
    path: "garage.doorAreaFt2",
    engineDefault: true,
    meaning: "Door from the house into the garage.",
    example: "20",
  },
  {
    key: "garage_door_u",
    header: "Door to garage U (Btu/h·ft²·°F)",
    group: "Garage",
    value: num("uFactor"),
    path: "garage.doorUFactor",
    engineDefault: true,
    meaning: "Rated U-factor of the door into the garage.",
    example: "0.30",
  },
  {
    key: "floor_over_garage_ft2",
    header: "Floor over garage (ft²)",
    group: "Garage",
    value: num("areaFt2"),
    path: "garage.floorOverAreaFt2",
    engineDefault: true,
    meaning: "Conditioned floor above the garage (bonus room).",
    example: "0",
  },
  {
    key: "floor_over_garage_base",
    header: "Floor over garage base assembly",
    group: "Garage",
    value: oneOf(FLOOR_BASE_ASSEMBLIES),
    path: "garage.floorOver.baseId",
    engineDefault: true,
    meaning: "Floor joists over the garage.",
    example: "floor-joists-2x10-16in-oc",
  },
  {
    key: "floor_over_garage_cavity_r",
    header: "Floor over garage cavity R (added)",
    group: "Garage",
    value: num("rValue"),
    path: "garage.floorOver.cavityR",
    engineDefault: true,
    meaning: "Insulation between the joists over the garage.",
    example: "R-30",
  },
  {
    key: "floor_over_garage_continuous_r",
    header: "Floor over garage continuous R (added)",
    group: "Garage",
    value: num("rValue"),
    path: "garage.floorOver.continuousR",
    engineDefault: true,
    meaning: "Continuous insulation under the floor over the garage.",
    example: "0",
  },
  {
    key: "floor_over_garage_u",
    header: "Floor over garage U-factor (Btu/h·ft²·°F, blank = from assembly)",
    group: "Garage",
    value: num("uFactor"),
    path: "garage.floorOver.uFactor",
    meaning: "A whole U-factor of the floor over the garage; replaces its base assembly and added R.",
    example: "",
  },
  {
    key: "garage_heating_temp_f",
    header: "Garage at heating design (°F, blank = computed)",
    group: "Garage",
    value: num("temperatureF"),
    path: "garage.heatingTemperatureF",
    meaning: "Garage air temperature in the heating design hour; blank = the engine's estimate.",
    example: "",
  },
  {
    key: "garage_cooling_temp_f",
    header: "Garage at cooling peak (°F, blank = computed)",
    group: "Garage",
    value: num("temperatureF"),
    path: "garage.coolingTemperatureF",
    meaning: "Garage air temperature at the cooling peak; blank = the engine's estimate.",
    example: "",
  },
  // Air & ducts
  {
    key: "blower_door_ach50",
    header: "Air leakage (ACH50)",
    group: "Air & ducts",
    value: num("ach50"),
    path: "infiltration.ach50",
    meaning:
      "Blower-door air changes per hour at 50 Pa (tested or target). Fill exactly one of ACH50, CFM50 and effective leakage area.",
    example: "3 ACH50",
  },
  {
    key: "blower_door_cfm50",
    header: "Air leakage (CFM50)",
    group: "Air & ducts",
    value: num("cfm50"),
    path: "infiltration.cfm50",
    meaning: "Blower-door flow at 50 Pa, instead of ACH50 or the effective leakage area.",
    example: "",
  },
  {
    key: "effective_leakage_area_in2",
    header: "Air leakage (effective leakage area, in²)",
    group: "Air & ducts",
    value: num("leakageAreaIn2"),
    path: "infiltration.effectiveLeakageAreaIn2",
    meaning: "Effective leakage area at 4 Pa (HoF 2021 ch. 16), instead of ACH50 or CFM50.",
    example: "",
  },
  {
    key: "shelter_class",
    header: "Shelter class (1–5)",
    group: "Air & ducts",
    value: num("count"),
    path: "infiltration.shelterClass",
    engineDefault: true,
    meaning: "Wind shelter of the lot, 1 = open country to 5 = very heavy shielding.",
    example: "4",
  },
  {
    key: "leakage_flow_exponent",
    header: "Leakage flow exponent",
    group: "Air & ducts",
    value: num("ratio"),
    path: "infiltration.flowExponent",
    engineDefault: true,
    meaning: "Exponent of the blower-door curve (0.65 typical).",
    example: "0.65",
  },
  {
    key: "ventilation_kind",
    header: "Mechanical ventilation",
    group: "Air & ducts",
    value: oneOf(VENTILATION_KINDS),
    path: "ventilation.kind",
    engineDefault: true,
    meaning: "Whole-house ventilation: none, exhaust, supply or balanced (HRV/ERV).",
    example: "exhaust",
  },
  {
    key: "ventilation_cfm",
    header: "Ventilation flow (cfm, blank = 62.2 rate)",
    group: "Air & ducts",
    value: num("cfm"),
    path: "ventilation.cfm",
    meaning: "Provided ventilation flow; blank = the ASHRAE 62.2-2016 rate for the plan.",
    example: "",
  },
  {
    key: "ventilation_sensible_recovery",
    header: "Ventilation sensible recovery (0–0.95)",
    group: "Air & ducts",
    value: num("fraction"),
    path: "ventilation.sensibleRecoveryEffectiveness",
    engineDefault: true,
    meaning: "Sensible recovery effectiveness of a balanced HRV/ERV.",
    example: "0",
  },
  {
    key: "ventilation_latent_recovery",
    header: "Ventilation latent recovery (0–0.95)",
    group: "Air & ducts",
    value: num("fraction"),
    path: "ventilation.latentRecoveryEffectiveness",
    engineDefault: true,
    meaning: "Latent recovery effectiveness of an ERV.",
    example: "0",
  },
  {
    key: "duct_location",
    header: "Duct location",
    group: "Air & ducts",
    value: oneOf(DUCT_LOCATIONS),
    path: "ducts.location",
    engineDefault: true,
    meaning: "Where the ducts run.",
    example: "vented-attic",
  },
  {
    key: "duct_r",
    header: "Duct insulation R",
    group: "Air & ducts",
    value: num("rValue"),
    path: "ducts.insulationR",
    engineDefault: true,
    meaning: "Insulation on the ducts.",
    example: "R-8",
  },
  {
    key: "duct_supply_leakage_pct",
    header: "Duct supply leakage (%)",
    group: "Air & ducts",
    value: num("percent"),
    path: "ducts.supplyLeakagePct",
    engineDefault: true,
    meaning: "Supply leakage to outside the envelope, % of system airflow.",
    example: "4%",
  },
  {
    key: "duct_return_leakage_pct",
    header: "Duct return leakage (%)",
    group: "Air & ducts",
    value: num("percent"),
    path: "ducts.returnLeakagePct",
    engineDefault: true,
    meaning: "Return leakage from outside the envelope, % of system airflow.",
    example: "4%",
  },
  {
    key: "duct_heating_system",
    header: "Heating by (for duct losses)",
    group: "Air & ducts",
    value: oneOf(DUCT_HEATING_SYSTEMS),
    path: "ducts.heatingSystem",
    engineDefault: true,
    meaning: "furnace or heat-pump: HoF 2021 ch. 17 Table 6 gives different duct loss factors for each.",
    example: "furnace",
  },
  {
    key: "duct_method",
    header: "Duct loss method",
    group: "Air & ducts",
    value: oneOf(DUCT_METHODS),
    path: "ducts.method",
    engineDefault: true,
    meaning:
      "handbook-table: HoF 2021 ch. 17 Table 6 factors; conduction-leakage: Platload's own physical model (used anyway for encapsulated attics and garages).",
    example: "handbook-table",
  },
  {
    key: "cooling_supply_delta_f",
    header: "Cooling supply ΔT (°F)",
    group: "Air & ducts",
    value: num("temperatureDifferenceF"),
    path: "coolingSupplyDeltaF",
    engineDefault: true,
    meaning: "Room-to-supply-air temperature difference, for the cooling airflow.",
    example: "20",
  },
  // Internal gains
  {
    key: "internal_sensible_btuh",
    header: "Appliance & equipment sensible (Btu/h, blank = default)",
    group: "Internal gains",
    value: num("btuh"),
    path: "internalGains.rows.0.sensibleBtuh",
    meaning:
      "Total sensible gain of appliances, lighting and equipment; blank = the default of HoF 2021 ch. 17 eq. 30, occupants included.",
    example: "",
  },
  {
    key: "internal_latent_btuh",
    header: "Appliance & equipment latent (Btu/h)",
    group: "Internal gains",
    value: num("btuh"),
    path: "internalGains.rows.0.latentBtuh",
    meaning: "Total latent gain of appliances and equipment, with an entered sensible total.",
    example: "",
  },
  {
    key: "occupant_sensible_btuh",
    header: "Sensible per occupant (Btu/h)",
    group: "Internal gains",
    value: num("btuh"),
    path: "internalGains.occupantSensibleBtuh",
    engineDefault: true,
    meaning: "Per-person sensible gain, used with entered appliance totals.",
    example: "230",
  },
  {
    key: "occupant_latent_btuh",
    header: "Latent per occupant (Btu/h)",
    group: "Internal gains",
    value: num("btuh"),
    path: "internalGains.occupantLatentBtuh",
    engineDefault: true,
    meaning: "Per-person latent gain, used with entered appliance totals.",
    example: "200",
  },
];

// ---------------------------------------------------------------------------------------------
// Paths into plain objects.

type PlainObject = { [key: string]: unknown };

function isPlainObject(value: unknown): value is PlainObject {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

function getPath(target: unknown, path: string): unknown {
  let current: unknown = target;
  for (const part of path.split(".")) {
    if (Array.isArray(current)) current = current[Number(part)];
    else if (isPlainObject(current)) current = current[part];
    else return undefined;
  }
  return current;
}

function setPath(target: PlainObject, path: string, value: unknown): void {
  const parts = path.split(".");
  let current: PlainObject | unknown[] = target;
  parts.forEach((part, index) => {
    const last = index === parts.length - 1;
    const nextIsIndex = !last && /^\d+$/.test(parts[index + 1]);
    if (Array.isArray(current)) {
      const position = Number(part);
      if (last) current[position] = value;
      else {
        current[position] ??= nextIsIndex ? [] : {};
        current = current[position] as PlainObject | unknown[];
      }
      return;
    }
    if (last) current[part] = value;
    else {
      current[part] ??= nextIsIndex ? [] : {};
      current = current[part] as PlainObject | unknown[];
    }
  });
}

// ---------------------------------------------------------------------------------------------
// Defaults read from the engine's schema.

/** The smallest plan the engine accepts; parsing it fills in every engine default. */
const MINIMAL_RAW_PLAN = {
  conditionedFloorAreaFt2: 1000,
  bedrooms: 2,
  facades: {
    front: { grossWallAreaFt2: 100 },
    left: { grossWallAreaFt2: 100 },
    back: { grossWallAreaFt2: 100 },
    right: { grossWallAreaFt2: 100 },
  },
  infiltration: { ach50: 5 },
};

function engineDefaults(): PlanInput {
  const parsed = safeParsePlanInput(MINIMAL_RAW_PLAN);
  if (!parsed.ok)
    throw new Error(
      `the engine refused the minimal plan: ${parsed.issues.map((i) => `${i.field}: ${i.message}`).join("; ")}`,
    );
  return parsed.value;
}

function buildColumns(): PlanColumnDef[] {
  const defaults = engineDefaults();
  return SPECS.map((spec) => {
    let defaultValue: CellValue | undefined;
    if (spec.engineDefault && spec.path) {
      const found = getPath(defaults, spec.path);
      if (typeof found === "number" || typeof found === "string" || typeof found === "boolean")
        defaultValue = found;
      else throw new Error(`plan column ${spec.key}: the engine has no default at ${spec.path}`);
    }
    return {
      key: spec.key,
      header: spec.header,
      group: spec.group,
      value: spec.value,
      required: spec.required ?? false,
      defaultValue,
      meaning: spec.meaning,
      example: spec.example,
      path: spec.path,
    };
  });
}

/** The plan library's columns, in file order. */
export const PLAN_COLUMNS: readonly PlanColumnDef[] = buildColumns();

export const PLAN_COLUMN_BY_KEY: ReadonlyMap<string, PlanColumnDef> = new Map(
  PLAN_COLUMNS.map((column) => [column.key, column]),
);

/** The engine path → column key, for mapping the engine's errors back onto cells. */
const COLUMN_KEY_BY_PATH = new Map(
  PLAN_COLUMNS.filter((c) => c.path !== null).map((c) => [c.path as string, c.key]),
);

/** The column a field path of PlanInput belongs to (longest matching prefix), if any. */
export function columnForEnginePath(field: string): PlanColumnDef | undefined {
  const parts = field.split(".");
  for (let length = parts.length; length > 0; length -= 1) {
    const key = COLUMN_KEY_BY_PATH.get(parts.slice(0, length).join("."));
    if (key) return PLAN_COLUMN_BY_KEY.get(key);
  }
  // A facade-wide problem goes to the facade's gross wall column.
  const facade = /^facades\.(front|left|back|right)/.exec(field);
  if (facade) return PLAN_COLUMN_BY_KEY.get(`${facade[1]}_wall_ft2`);
  return undefined;
}

// ---------------------------------------------------------------------------------------------
// Row ↔ PlanInput.

/** A bad cell of one row, by column key. */
export interface PlanCellError {
  key: string;
  header: string;
  reason: string;
}

export type PlanRowResult =
  { ok: true; planCode: string; planName: string; input: PlanInput } | { ok: false; errors: PlanCellError[] };

/** Cells of one row as the grid or a file holds them: text (formulas kept) or numbers. */
export type PlanRowCells = Readonly<Record<string, string | number | boolean | null | undefined>>;

function toText(value: string | number | boolean | null | undefined): string {
  if (value === null || value === undefined) return "";
  return String(value);
}

/** Builds the raw engine object from a row's typed values (defaults already filled in). */
function assembleRawPlan(values: Readonly<Record<string, CellValue>>): {
  raw: PlainObject;
  errors: PlanCellError[];
} {
  const raw: PlainObject = {};
  const errors: PlanCellError[] = [];
  for (const column of PLAN_COLUMNS) {
    const value = values[column.key];
    if (value === undefined || column.path === null) continue;
    if (column.path.startsWith("internalGains.rows.")) continue;
    if (/^facades\.\w+\.(wall|extraWindows)\./.test(column.path)) continue;
    setPath(raw, column.path, value);
  }
  for (const facade of FACADES) {
    // A facade built differently takes the plan's wall for any layer left blank. The plan's direct
    // U-factor describes the plan's assembly, so a facade that names its own layers is computed from
    // them unless it has a U-factor of its own.
    const base = values[`${facade}_wall_base`];
    const cavity = values[`${facade}_wall_cavity_r`];
    const continuous = values[`${facade}_wall_continuous_r`];
    const uFactor = values[`${facade}_wall_u`];
    if (base !== undefined || cavity !== undefined || continuous !== undefined || uFactor !== undefined) {
      const wall: PlainObject = {
        baseId: base ?? values.wall_base,
        cavityR: cavity ?? values.wall_cavity_r,
        continuousR: continuous ?? values.wall_continuous_r,
      };
      if (uFactor !== undefined) wall.uFactor = uFactor;
      setPath(raw, `facades.${facade}.wall`, wall);
    }
    // The second window group exists when its area is filled; its blank cells are the first group's.
    const areaKey = `${facade}_window2_ft2`;
    const area = values[areaKey];
    const filledWithoutArea = SECOND_WINDOW_FIELDS.map(([own]) => `${facade}_${own}`).filter(
      (key) => values[key] !== undefined,
    );
    if (area === undefined) {
      for (const key of filledWithoutArea) {
        errors.push({
          key,
          header: headerOf(key),
          reason: `belongs to a second window group, which needs its area in "${headerOf(areaKey)}" (blank area = no second group)`,
        });
      }
    } else {
      const group: PlainObject = { areaFt2: area };
      for (const [own, first, field] of SECOND_WINDOW_FIELDS)
        group[field] = values[`${facade}_${own}`] ?? values[`${facade}_${first}`];
      setPath(raw, `facades.${facade}.extraWindows`, [group]);
    }
  }
  // Air leakage: exactly one figure. The engine refuses more than one too, but only the row knows the columns.
  const leakage = AIR_LEAKAGE_KEYS.filter((key) => values[key] !== undefined);
  if (leakage.length > 1) {
    const named = leakage.map((key) => `"${headerOf(key)}"`);
    const list = `${named.slice(0, -1).join(", ")} and ${named.at(-1)}`;
    for (const key of leakage) {
      errors.push({
        key,
        header: headerOf(key),
        reason: `give one air-leakage figure per plan: ${list} are ${leakage.length > 2 ? "all" : "both"} filled; keep one and clear the other${leakage.length > 2 ? "s" : ""}`,
      });
    }
  }
  // Entered appliance totals become one explicit gain row.
  const sensible = values.internal_sensible_btuh;
  const latent = values.internal_latent_btuh;
  if (sensible !== undefined) {
    setPath(raw, "internalGains.rows", [
      { name: INTERNAL_GAIN_ROW_NAME, sensibleBtuh: sensible, latentBtuh: latent ?? 0 },
    ]);
  } else if (latent !== undefined) {
    errors.push({
      key: "internal_latent_btuh",
      header: headerOf("internal_latent_btuh"),
      reason: "a latent total needs the sensible total beside it (Appliance & equipment sensible)",
    });
  }
  if (!isPlainObject(raw.infiltration)) raw.infiltration = {};
  return { raw, errors };
}

function headerOf(key: string): string {
  return PLAN_COLUMN_BY_KEY.get(key)?.header ?? key;
}

/** Engine issues mapped onto columns. */
function engineIssuesToCells(issues: readonly { field: string; message: string }[]): PlanCellError[] {
  return issues.map((issue) => {
    const column = columnForEnginePath(issue.field);
    return column
      ? { key: column.key, header: column.header, reason: issue.message }
      : { key: "", header: "(plan)", reason: `${issue.field}: ${issue.message}` };
  });
}

function finishRow(values: Readonly<Record<string, CellValue>>, cellErrors: PlanCellError[]): PlanRowResult {
  const assembled = assembleRawPlan(values);
  const errors = [...cellErrors, ...assembled.errors];
  if (errors.length > 0) return { ok: false, errors };
  const parsed = safeParsePlanInput(assembled.raw);
  if (!parsed.ok) return { ok: false, errors: engineIssuesToCells(parsed.issues) };
  return {
    ok: true,
    planCode: String(values.plan_code),
    planName: String(values.plan_name),
    input: parsed.value,
  };
}

/**
 * One row of the plan library → a validated PlanInput (through the engine's parser), or every
 * bad cell with its column. Cells are keyed by column key; formulas and units are read.
 */
export function rowToPlanInput(cells: PlanRowCells): PlanRowResult {
  const entered: Record<string, string> = {};
  for (const column of PLAN_COLUMNS) entered[column.key] = toText(cells[column.key]);
  const unknown = Object.keys(cells).filter((key) => !PLAN_COLUMN_BY_KEY.has(key));
  const read = readRowCells(PLAN_COLUMNS, entered);
  const cellErrors: PlanCellError[] = [
    ...unknown.map((key) => ({ key, header: key, reason: "is not a plan library column" })),
    ...read.errors.map((error) => ({ key: error.key, header: headerOf(error.key), reason: error.reason })),
  ];
  return finishRow(read.values, cellErrors);
}

/**
 * The grid saves one cell at a time and a plan must always hold exactly one air-leakage figure,
 * so a builder could never switch from ACH50 to CFM50 by editing cells one by one. An edit that
 * fills one leakage column therefore clears the row's other filled leakage columns in the same
 * save (the change history lists them). A change that fills two is left alone and refused.
 */
export function withOneAirLeakageFigure<T extends string | number | boolean | null | undefined>(
  current: PlanRowCells,
  change: Readonly<Record<string, T>>,
): Record<string, T | ""> {
  const filled = (value: unknown) => value !== null && value !== undefined && String(value).trim() !== "";
  const entered = AIR_LEAKAGE_KEYS.filter((key) => key in change && filled(change[key]));
  if (entered.length !== 1) return { ...change };
  const next: Record<string, T | ""> = { ...change };
  for (const key of AIR_LEAKAGE_KEYS) {
    if (key !== entered[0] && !(key in change) && filled(current[key])) next[key] = "";
  }
  return next;
}

/** Thrown when a plan holds something the flat table cannot show. */
export class PlanRowError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(`${field}: ${message}`);
    this.name = "PlanRowError";
  }
}

/**
 * A PlanInput → one row of cells by key (numbers as numbers, choices as text, blank = null).
 * A facade's first extra window group goes to its "group 2" columns; a third group cannot be
 * shown in the flat table and raises PlanRowError; several
 * internal-gain rows are written as their totals.
 */
export function planInputToRow(
  plan: PlanInput,
  planCode: string,
  planName: string = plan.name ?? planCode,
): Record<string, CellValue | null> {
  const row: Record<string, CellValue | null> = {};
  for (const facade of FACADES) {
    const groups = plan.facades[facade].extraWindows.length;
    if (groups > 1) {
      throw new PlanRowError(
        `facades.${facade}.extraWindows`,
        `the plan library table holds two window groups per facade and this facade has ${groups + 1}; merge groups with like properties or keep the plan as JSON`,
      );
    }
  }
  for (const column of PLAN_COLUMNS) {
    if (column.key === "plan_code") {
      row[column.key] = planCode;
      continue;
    }
    if (column.key === "plan_name") {
      row[column.key] = planName;
      continue;
    }
    if (column.path === null || column.path.startsWith("internalGains.rows.")) continue;
    const value = getPath(plan, column.path);
    row[column.key] =
      typeof value === "number" || typeof value === "string" || typeof value === "boolean" ? value : null;
  }
  const gainRows = plan.internalGains.rows;
  if (gainRows && gainRows.length > 0) {
    row.internal_sensible_btuh = gainRows.reduce((sum, gain) => sum + gain.sensibleBtuh, 0);
    row.internal_latent_btuh = gainRows.reduce((sum, gain) => sum + gain.latentBtuh, 0);
  } else {
    row.internal_sensible_btuh = null;
    row.internal_latent_btuh = null;
  }
  return row;
}

// ---------------------------------------------------------------------------------------------
// Whole table.

export interface ValidPlanRow {
  rowNumber: number;
  planCode: string;
  planName: string;
  input: PlanInput;
  /** The cells as entered (formulas kept), by column key. */
  entered: Record<string, string>;
}

export type PlanTableResult = { ok: true; plans: ValidPlanRow[] } | { ok: false; errors: TableCellError[] };

/**
 * Validates a whole plan-library table and reports every bad cell: wrong, missing or
 * duplicated columns (row 1), unreadable cells, formulas, duplicated plan codes and the
 * engine's own checks mapped back to their column. A good table gives the plans.
 */
export function validatePlanTable(table: RawTable): PlanTableResult {
  const read = readTable(table, PLAN_COLUMNS, { ignoredColumns: PLAN_RESULT_COLUMNS });
  const errors: TableCellError[] = [...read.errors];
  const plans: ValidPlanRow[] = [];
  const firstRowOfCode = new Map<string, number>();
  const badRows = new Set(read.errors.map((error) => error.row));

  for (const row of read.rows) {
    const code = row.values.plan_code;
    if (typeof code === "string") {
      const normalized = code.toLowerCase();
      const seen = firstRowOfCode.get(normalized);
      if (seen !== undefined) {
        errors.push({
          row: row.rowNumber,
          column: headerOf("plan_code"),
          reason: `plan code "${code}" is already used on row ${seen}; plan codes must be unique`,
        });
      } else firstRowOfCode.set(normalized, row.rowNumber);
    }
    if (badRows.has(row.rowNumber)) continue; // cell errors first; engine checks once the cells read
    const result = finishRow(row.values, []);
    if (result.ok)
      plans.push({
        rowNumber: row.rowNumber,
        planCode: result.planCode,
        planName: result.planName,
        input: result.input,
        entered: row.entered,
      });
    else
      for (const error of result.errors)
        errors.push({ row: row.rowNumber, column: error.header, reason: error.reason });
  }
  if (read.rows.length === 0 && errors.length === 0)
    errors.push({ row: 2, column: headerOf("plan_code"), reason: "the table has no plan rows" });
  errors.sort((a, b) => a.row - b.row);
  return errors.length > 0 ? { ok: false, errors } : { ok: true, plans };
}

/** Headers in file order. */
export const PLAN_HEADERS: readonly string[] = PLAN_COLUMNS.map((column) => column.header);

/** Rows of cells (by key) → the header + cell arrays a CSV/XLSX writer takes. */
export function planRowsToTable(rows: readonly Readonly<Record<string, CellValue | null>>[]): {
  headers: string[];
  rows: (string | number | null)[][];
} {
  return {
    headers: [...PLAN_HEADERS],
    rows: rows.map((row) =>
      PLAN_COLUMNS.map((column) => {
        const value = row[column.key];
        if (value === null || value === undefined) return null;
        if (typeof value === "boolean") return value ? "yes" : "no";
        return value;
      }),
    ),
  };
}

// ---------------------------------------------------------------------------------------------
// Computed (output-only) columns: written by exports beside the inputs, skipped on import.

/** A computed column: shown and exported, never read back. */
export interface PlanResultColumnDef {
  key: string;
  header: string;
  group: "Results";
  unit: string;
  meaning: string;
}

function facingResultColumns(label: FacingLabel): PlanResultColumnDef[] {
  const facing = label.toLowerCase();
  return [
    {
      key: `heating_${facing}_btuh`,
      header: `Heating, front ${label} (Btu/h)`,
      group: "Results",
      unit: "Btu/h",
      meaning: `Heating load with the front facing ${label}.`,
    },
    {
      key: `cooling_total_${facing}_btuh`,
      header: `Cooling total, front ${label} (Btu/h)`,
      group: "Results",
      unit: "Btu/h",
      meaning: `Cooling total (sensible + latent) at the peak hour with the front facing ${label}.`,
    },
    {
      key: `tons_${facing}`,
      header: `Tons, front ${label}`,
      group: "Results",
      unit: "tons",
      meaning: `Cooling total ÷ 12,000 Btu/h with the front facing ${label}.`,
    },
  ];
}

export const PLAN_RESULT_COLUMNS: readonly PlanResultColumnDef[] = [
  ...FACING_LABELS.flatMap(facingResultColumns),
  {
    key: "worst_facing",
    header: "Worst facing",
    group: "Results",
    unit: "N, E, S or W",
    meaning: "The facing with the largest cooling total.",
  },
  {
    key: "cooling_spread_btuh",
    header: "Cooling spread between facings (Btu/h)",
    group: "Results",
    unit: "Btu/h",
    meaning: "Largest minus smallest cooling total over the four facings.",
  },
];

/** The computed cells of one plan, by result column key (loads rounded to whole Btu/h, tons to 0.01). */
export function planResultsToRow(results: PlanFacings): Record<string, number | string> {
  const row: Record<string, number | string> = {};
  for (const facing of results.facings) {
    const label = facing.label.toLowerCase();
    row[`heating_${label}_btuh`] = Math.round(facing.heating.totalBtuh);
    row[`cooling_total_${label}_btuh`] = Math.round(facing.cooling.totalBtuh);
    row[`tons_${label}`] = Math.round(facing.cooling.tons * 100) / 100;
  }
  row.worst_facing = results.worst.label;
  row.cooling_spread_btuh = Math.round(results.coolingSpreadBtuh);
  return row;
}

/**
 * The plan library as an export table: the input columns, then (when any plan has results)
 * the computed columns. Write it with writeCsv / writeXlsx, which escape formula-like text.
 */
export function planLibraryExportTable(
  entries: readonly { cells: Readonly<Record<string, CellValue | null>>; results?: PlanFacings | null }[],
): { headers: string[]; rows: (string | number | null)[][] } {
  const inputs = planRowsToTable(entries.map((entry) => entry.cells));
  if (!entries.some((entry) => entry.results)) return inputs;
  return {
    headers: [...inputs.headers, ...PLAN_RESULT_COLUMNS.map((column) => column.header)],
    rows: inputs.rows.map((row, index) => {
      const results = entries[index].results;
      const computed = results ? planResultsToRow(results) : {};
      return [...row, ...PLAN_RESULT_COLUMNS.map((column) => computed[column.key] ?? null)];
    }),
  };
}

/**
 * Which U-factor the engine uses for each opaque assembly of a plan, and where it comes from:
 * a direct whole-assembly U-factor entered for the plan, or the base assembly plus added
 * insulation. The plan sheet and `npm run calc` show it, so a reviewer sees at a glance
 * whether a number was typed in or computed.
 *
 * The values come from the engine's own U-factor functions (lib/load/assemblies.ts), which
 * return the direct value when one is given, and follow the engine's choices of which
 * assemblies count (lib/load/envelope.ts): a vented attic's roof deck, for example, is never
 * insulated, so a roof-deck U-factor entered for it is listed as not used.
 */
import {
  aboveGradeFoundationWallU,
  belowGradeWallU,
  ceilingU,
  floorU,
  roofU,
  slabFFactor,
  wallU,
} from "../load/assemblies";
import { FACADES, type Facade, type PlanInput } from "../load/input";

export const U_FACTOR_UNIT = "Btu/h·ft²·°F";
export const F_FACTOR_UNIT = "Btu/h·ft·°F";

export interface AssemblyUse {
  /** The assembly in the sheet's words ("Walls", "Ceiling under the attic", …). */
  name: string;
  /** Where the engine uses it ("front, back, right facades; wall to garage"). */
  appliesTo: string;
  /** The plan-library column of its direct U-factor (or F-factor). */
  directKey: string;
  /** direct: the entered whole-assembly value; assembly: computed from the base assembly and added insulation. */
  source: "direct" | "assembly";
  /** The base assembly and added insulation, or "direct U-factor" / "direct F-factor". */
  description: string;
  unit: typeof U_FACTOR_UNIT | typeof F_FACTOR_UNIT;
  /** Value used for heating. */
  heating: number;
  /** Value used for cooling, or null when the engine does not use the assembly in cooling. */
  cooling: number | null;
  /** Set when a direct value was entered for an assembly the engine does not use, with the reason. */
  notUsed?: string;
}

const FACADE_LABEL: Record<Facade, string> = { front: "Front", left: "Left", back: "Back", right: "Right" };

function layers(baseId: string, cavityR: number, continuousR: number, cavityWord: string): string {
  const added = [
    cavityR > 0 ? `R-${cavityR} ${cavityWord}` : "",
    continuousR > 0 ? `R-${continuousR} continuous` : "",
  ].filter(Boolean);
  return added.length > 0 ? `${baseId} + ${added.join(" + ")}` : `${baseId}, no added insulation`;
}

function construction(
  name: string,
  appliesTo: string,
  directKey: string,
  c: { baseId: string; cavityR: number; continuousR: number; uFactor?: number },
  heating: number,
  cooling: number | null,
  cavityWord = "cavity",
): AssemblyUse {
  const direct = c.uFactor !== undefined;
  return {
    name,
    appliesTo,
    directKey,
    source: direct ? "direct" : "assembly",
    description: direct ? "direct U-factor" : layers(c.baseId, c.cavityR, c.continuousR, cavityWord),
    unit: U_FACTOR_UNIT,
    heating,
    cooling,
  };
}

/** A direct value the engine does not use: listed so an entered number never disappears silently. */
function unused(
  name: string,
  directKey: string,
  value: number,
  unit: AssemblyUse["unit"],
  reason: string,
): AssemblyUse {
  return {
    name,
    appliesTo: "—",
    directKey,
    source: "direct",
    description: unit === U_FACTOR_UNIT ? "direct U-factor" : "direct F-factor",
    unit,
    heating: value,
    cooling: null,
    notUsed: reason,
  };
}

/** Every opaque assembly the plan has, with the U-factor (slab: F-factor) the engine uses. */
export function planAssemblies(plan: PlanInput): AssemblyUse[] {
  const rows: AssemblyUse[] = [];

  // Walls: the plan's wall serves every facade without its own wall, and the wall to the garage.
  const ownWall = FACADES.filter((facade) => plan.facades[facade].wall !== undefined);
  const planWallFacades = FACADES.filter((facade) => plan.facades[facade].wall === undefined);
  const planWallUse = [
    planWallFacades.length > 0
      ? `${planWallFacades.join(", ")} ${planWallFacades.length === 1 ? "facade" : "facades"}`
      : "",
    plan.garage.wallAreaFt2 > 0 ? "wall to garage" : "",
  ].filter(Boolean);
  if (planWallUse.length > 0) {
    rows.push(
      construction(
        "Walls",
        planWallUse.join("; "),
        "wall_u",
        plan.wall,
        wallU(plan.wall, "heating"),
        wallU(plan.wall, "cooling"),
      ),
    );
  } else if (plan.wall.uFactor !== undefined) {
    rows.push(
      unused(
        "Walls",
        "wall_u",
        plan.wall.uFactor,
        U_FACTOR_UNIT,
        "every facade has its own wall and there is no wall to a garage",
      ),
    );
  }
  for (const facade of ownWall) {
    const wall = plan.facades[facade].wall!;
    rows.push(
      construction(
        `${FACADE_LABEL[facade]} facade wall`,
        `${facade} facade`,
        `${facade}_wall_u`,
        wall,
        wallU(wall, "heating"),
        wallU(wall, "cooling"),
      ),
    );
  }

  // Attic: the ceiling under it; an encapsulated attic's insulated roof deck.
  const attic = plan.attic;
  if (attic.kind !== "none") {
    rows.push(
      construction(
        "Ceiling under the attic",
        `${attic.kind} attic`,
        "ceiling_u",
        attic.ceiling,
        ceilingU(attic.ceiling, "heating"),
        ceilingU(attic.ceiling, "cooling"),
        "insulation",
      ),
    );
  } else if (attic.ceiling.uFactor !== undefined) {
    rows.push(
      unused(
        "Ceiling under the attic",
        "ceiling_u",
        attic.ceiling.uFactor,
        U_FACTOR_UNIT,
        "the plan has no attic",
      ),
    );
  }
  if (attic.kind === "encapsulated") {
    rows.push(
      construction(
        "Roof deck",
        "encapsulated attic",
        "roof_deck_u",
        attic.roofDeck,
        roofU(attic.roofDeck, { season: "heating", gypsumCeiling: false }),
        roofU(attic.roofDeck, { season: "cooling", gypsumCeiling: false }),
      ),
    );
  } else if (attic.roofDeck.uFactor !== undefined) {
    rows.push(
      unused(
        "Roof deck",
        "roof_deck_u",
        attic.roofDeck.uFactor,
        U_FACTOR_UNIT,
        attic.kind === "vented"
          ? "a vented attic's roof deck is not insulated (the ceiling carries the insulation)"
          : "the plan has no attic",
      ),
    );
  }

  const vaulted = plan.vaultedCeiling;
  if (vaulted.areaFt2 > 0) {
    rows.push(
      construction(
        "Vaulted ceiling",
        `${vaulted.areaFt2} ft²`,
        "vaulted_u",
        vaulted.construction,
        roofU(vaulted.construction, { season: "heating", gypsumCeiling: true }),
        roofU(vaulted.construction, { season: "cooling", gypsumCeiling: true }),
      ),
    );
  } else if (vaulted.construction.uFactor !== undefined) {
    rows.push(
      unused(
        "Vaulted ceiling",
        "vaulted_u",
        vaulted.construction.uFactor,
        U_FACTOR_UNIT,
        "the vaulted ceiling area is 0",
      ),
    );
  }

  // Floors.
  const f = plan.foundation;
  const floorOverFoundation = f.kind === "vented-crawlspace" || f.kind === "unconditioned-basement";
  if (floorOverFoundation && f.floorAreaFt2 > 0) {
    // The engine takes no cooling credit or gain through the floor over an unconditioned basement.
    const cooling = f.kind === "vented-crawlspace" ? floorU(f.floor, "still-air", "cooling") : null;
    rows.push(
      construction(
        "Floor over the foundation",
        `${f.floorAreaFt2} ft² over the ${f.kind}`,
        "foundation_floor_u",
        f.floor,
        floorU(f.floor, "still-air", "heating"),
        cooling,
      ),
    );
  } else if (f.floor.uFactor !== undefined) {
    rows.push(
      unused(
        "Floor over the foundation",
        "foundation_floor_u",
        f.floor.uFactor,
        U_FACTOR_UNIT,
        floorOverFoundation
          ? "the floor area is 0"
          : `a ${f.kind} foundation has no framed floor over unconditioned space`,
      ),
    );
  }
  const outdoors = plan.floorOverOutdoors;
  if (outdoors.areaFt2 > 0) {
    rows.push(
      construction(
        "Floor over outdoors",
        `${outdoors.areaFt2} ft²`,
        "floor_over_outdoors_u",
        outdoors.construction,
        floorU(outdoors.construction, "outdoors", "heating"),
        floorU(outdoors.construction, "outdoors", "cooling"),
      ),
    );
  } else if (outdoors.construction.uFactor !== undefined) {
    rows.push(
      unused(
        "Floor over outdoors",
        "floor_over_outdoors_u",
        outdoors.construction.uFactor,
        U_FACTOR_UNIT,
        "the floor area is 0",
      ),
    );
  }
  const garage = plan.garage;
  if (garage.floorOverAreaFt2 > 0) {
    rows.push(
      construction(
        "Floor over the garage",
        `${garage.floorOverAreaFt2} ft²`,
        "floor_over_garage_u",
        garage.floorOver,
        floorU(garage.floorOver, "still-air", "heating"),
        floorU(garage.floorOver, "still-air", "cooling"),
      ),
    );
  } else if (garage.floorOver.uFactor !== undefined) {
    rows.push(
      unused(
        "Floor over the garage",
        "floor_over_garage_u",
        garage.floorOver.uFactor,
        U_FACTOR_UNIT,
        "the floor area is 0",
      ),
    );
  }

  // Foundation walls: a basement's or a conditioned crawlspace's (not a slab's or a vented crawlspace's).
  const hasFoundationWalls =
    f.kind === "conditioned-basement" ||
    f.kind === "conditioned-crawlspace" ||
    f.kind === "unconditioned-basement";
  const direct = f.foundationWallUFactor;
  const insulation =
    f.foundationWallInsulationR > 0 ? `R-${f.foundationWallInsulationR} continuous` : "uninsulated";
  const aboveArea = f.foundationWallAboveGradeAreaFt2;
  const belowArea = f.foundationWallAreaFt2 - aboveArea;
  const conditioned = f.kind !== "unconditioned-basement";
  // An unconditioned basement's walls only set its temperature, which may be entered instead.
  const basementTemperatureEntered = !conditioned && f.basementHeatingTemperatureF !== undefined;
  if (hasFoundationWalls && f.foundationWallAreaFt2 > 0 && !basementTemperatureEntered) {
    // Cooling through a basement's walls is counted only above grade, and only for a conditioned one.
    const role = conditioned ? "" : " (sets the basement's heating temperature)";
    if (aboveArea > 0) {
      rows.push({
        name: "Foundation wall above grade",
        appliesTo: `${aboveArea} ft²${role}`,
        directKey: "foundation_wall_u",
        source: direct !== undefined ? "direct" : "assembly",
        description: direct !== undefined ? "direct U-factor" : `8 in concrete, ${insulation}`,
        unit: U_FACTOR_UNIT,
        heating: direct ?? aboveGradeFoundationWallU(f.foundationWallInsulationR, "heating"),
        cooling: conditioned
          ? (direct ?? aboveGradeFoundationWallU(f.foundationWallInsulationR, "cooling"))
          : null,
      });
    }
    if (belowArea > 0) {
      rows.push({
        name: "Foundation wall below grade",
        appliesTo: `${belowArea} ft², ${f.foundationWallDepthBelowGradeFt} ft deep${role}`,
        directKey: "foundation_wall_u",
        source: direct !== undefined ? "direct" : "assembly",
        description:
          direct !== undefined
            ? "direct U-factor (soil included)"
            : `8 in concrete, ${insulation}, soil path`,
        unit: U_FACTOR_UNIT,
        heating: direct ?? belowGradeWallU(f.foundationWallInsulationR, f.foundationWallDepthBelowGradeFt),
        cooling: null,
      });
    }
  } else if (direct !== undefined) {
    const reason = !hasFoundationWalls
      ? `a ${f.kind} foundation has no foundation walls in the load`
      : basementTemperatureEntered
        ? "the unconditioned basement's heating temperature is entered, so its walls do not enter the load"
        : "the foundation wall area is 0";
    rows.push(unused("Foundation wall", "foundation_wall_u", direct, U_FACTOR_UNIT, reason));
  }

  // Slab edge: an F-factor per ft of exposed perimeter, for heating (the slab's cooling credit goes by its area and covering).
  if (f.slabPerimeterFt > 0) {
    const edge = `${f.slabEdgeInsulationR > 0 ? `edge R-${f.slabEdgeInsulationR}` : "uninsulated edge"} over ${f.slabEdgeConstruction}`;
    rows.push({
      name: "Slab edge",
      appliesTo: `${f.slabPerimeterFt} ft of perimeter`,
      directKey: "slab_f_factor",
      source: f.slabFFactor !== undefined ? "direct" : "assembly",
      description: f.slabFFactor !== undefined ? "direct F-factor" : edge,
      unit: F_FACTOR_UNIT,
      heating: f.slabFFactor ?? slabFFactor(f.slabEdgeInsulationR, f.slabEdgeConstruction),
      cooling: null,
    });
  } else if (f.slabFFactor !== undefined) {
    rows.push(unused("Slab edge", "slab_f_factor", f.slabFFactor, F_FACTOR_UNIT, "the slab perimeter is 0"));
  }
  return rows;
}

/** How the plan's air leakage was given, for the sheet and the command line. */
export function airLeakageText(plan: PlanInput): string {
  const { ach50, cfm50, effectiveLeakageAreaIn2 } = plan.infiltration;
  if (ach50 !== undefined) return `${ach50} ACH50`;
  if (cfm50 !== undefined) return `${cfm50} CFM50`;
  return `${effectiveLeakageAreaIn2} in² effective leakage area`;
}

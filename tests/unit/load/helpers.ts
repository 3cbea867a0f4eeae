/** Test helpers: small invented plans and sites built for one property each. */
import { LoadInputError } from "../../../lib/load/errors";
import type { PlanInputRaw, SiteConditionsRaw } from "../../../lib/load/input";

export const SEA_LEVEL_SITE: SiteConditionsRaw = {
  name: "test site (invented)",
  latitudeDeg: 32,
  longitudeDeg: -90,
  elevationFt: 0,
  heatingOutdoorDbF: 20,
  coolingOutdoorDbF: 95,
  coolingOutdoorWbF: 76,
  dailyRangeF: 20,
  tauBeam: 0.5,
  tauDiffuse: 2.0,
};

export function symmetricPlan(overrides: Partial<PlanInputRaw> = {}): PlanInputRaw {
  const side = { grossWallAreaFt2: 400, window: { areaFt2: 40, uFactor: 0.3, shgc: 0.3 } };
  return {
    conditionedFloorAreaFt2: 1600,
    stories: 1,
    bedrooms: 3,
    ceilingHeightFt: 9,
    facades: { front: side, left: side, back: side, right: side },
    foundation: { kind: "slab-on-grade", slabPerimeterFt: 160 },
    infiltration: { ach50: 5 },
    ducts: { location: "vented-attic" },
    ...overrides,
  };
}

export function withinTolerance(
  actual: number,
  expected: number,
  tol: { relative?: number; absolute?: number },
): boolean {
  if (tol.relative !== undefined) return Math.abs(actual - expected) <= tol.relative * Math.abs(expected);
  return Math.abs(actual - expected) <= (tol.absolute ?? 0) + 1e-9;
}

/** The LoadInputError that `fn` throws (any other outcome fails the test). */
export function errorOf(fn: () => unknown): LoadInputError {
  try {
    fn();
  } catch (error) {
    if (error instanceof LoadInputError) return error;
    throw error;
  }
  throw new Error("expected a LoadInputError");
}

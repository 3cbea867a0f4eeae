/**
 * The engine's public entry points: one plan at one facing, or the four facings of a plan, by
 * the procedure the caller names. Validation happens here unless the caller says the inputs are
 * already parsed (hot loops).
 */
import { hourlyCoolingDay } from "./cooling-day";
import { LoadInputError } from "./errors";
import { parsePlanInput, parseSiteConditions, type PlanInput, type SiteConditions } from "./input";
import { preparePlan, type PreparedPlan } from "./prepare-plan";
import {
  DEFAULT_LOAD_PROCEDURE,
  DESIGN_ESTIMATE_CAUTION,
  FACING_LABELS,
  LOAD_PROCEDURES,
  type FacingLoads,
  type LoadProcedure,
  type PlanFacings,
} from "./results";
import { prepareSite } from "./site";
import { CM2_PER_IN2 } from "./units";
import { computeResidentialLoadFactorFacing } from "./residential-load-factor/from-plan";
import { facadeAzimuthsDeg, normalizeAzimuth } from "./facing";
import { ENGINE_VERSION } from "./version";

export { ENGINE_VERSION };

export interface ComputeOptions {
  /**
   * Set when plan and site are already the output of parsePlanInput / parseSiteConditions
   * (hot loops: benchmark, bulk lot recompute); validation is then skipped. Such objects are
   * treated as immutable: the prepared plan is reused for the same object, so do not edit a
   * validated plan in place — parse the edited plan again.
   */
  validated?: boolean;
  /** The procedure to run (default: the handbook's residential load-factor procedure). */
  procedure?: LoadProcedure;
}

function validate(
  plan: unknown,
  site: unknown,
  options: ComputeOptions | undefined,
): { plan: PlanInput; site: SiteConditions } {
  if (options?.validated) return { plan: plan as PlanInput, site: site as SiteConditions };
  return { plan: parsePlanInput(plan), site: parseSiteConditions(site) };
}

function procedureOf(options: ComputeOptions | undefined): LoadProcedure {
  const procedure = options?.procedure ?? DEFAULT_LOAD_PROCEDURE;
  if (!LOAD_PROCEDURES.includes(procedure)) {
    throw new LoadInputError(
      "procedure",
      `unknown procedure ${JSON.stringify(procedure)}; choose one of ${LOAD_PROCEDURES.join(", ")}`,
    );
  }
  return procedure;
}

/** The handbook's residential load-factor procedure for one facing, in the engine's result shape. */
function loadFactorResult(plan: PlanInput, site: SiteConditions, facingAzimuthDeg: number): FacingLoads {
  const {
    rlf: _rows,
    applicability: _findings,
    house: _house,
    ...loads
  } = computeResidentialLoadFactorFacing(plan, site, facingAzimuthDeg);
  return loads;
}

function facingResult(p: PreparedPlan, facingAzimuthDeg: number, procedure: LoadProcedure): FacingLoads {
  const az = normalizeAzimuth(facingAzimuthDeg);
  return {
    engineVersion: ENGINE_VERSION,
    procedure,
    facingAzimuthDeg: az,
    facadeAzimuthsDeg: facadeAzimuthsDeg(az),
    heating: p.heating,
    cooling: hourlyCoolingDay(p, az),
    ventilation: {
      requiredCfm: p.air.ventilationRequiredCfm,
      providedCfm: p.air.ventilationProvidedCfm,
      kind: p.plan.ventilation.kind,
    },
    effectiveLeakageAreaIn2: p.air.elaCm2 / CM2_PER_IN2,
    notes: [...p.notes, p.storage.description],
    caution: DESIGN_ESTIMATE_CAUTION,
  };
}

/**
 * Heating and cooling loads of one plan with its front facing `facingAzimuthDeg` (degrees
 * clockwise from north; any real number, taken modulo 360).
 * Throws LoadInputError for bad input (unless `options.validated`).
 */
export function computeFacingLoads(
  plan: unknown,
  site: unknown,
  facingAzimuthDeg: number,
  options?: ComputeOptions,
): FacingLoads {
  if (typeof facingAzimuthDeg !== "number" || !Number.isFinite(facingAzimuthDeg)) {
    throw new LoadInputError(
      "facingAzimuthDeg",
      `must be a finite number of degrees, got ${String(facingAzimuthDeg)}`,
      {
        min: 0,
        max: 360,
        unit: "°",
      },
    );
  }
  const procedure = procedureOf(options);
  const valid = validate(plan, site, options);
  if (procedure === "residential-load-factor")
    return loadFactorResult(valid.plan, valid.site, facingAzimuthDeg);
  return facingResult(preparePlan(valid.plan, prepareSite(valid.site)), facingAzimuthDeg, procedure);
}

/** The four facings (front to N, E, S, W), the worst (largest cooling total) and the spread. */
export function computePlanFacings(plan: unknown, site: unknown, options?: ComputeOptions): PlanFacings {
  const procedure = procedureOf(options);
  const valid = validate(plan, site, options);
  const facingAt =
    procedure === "residential-load-factor"
      ? (az: number) => loadFactorResult(valid.plan, valid.site, az)
      : (
          (prepared) => (az: number) =>
            facingResult(prepared, az, procedure)
        )(preparePlan(valid.plan, prepareSite(valid.site)));
  const facings = FACING_LABELS.map((label, i) => ({ ...facingAt(i * 90), label }));
  let worst = facings[0];
  let min = facings[0].cooling.totalBtuh;
  for (const f of facings) {
    if (f.cooling.totalBtuh > worst.cooling.totalBtuh) worst = f;
    if (f.cooling.totalBtuh < min) min = f.cooling.totalBtuh;
  }
  return {
    engineVersion: ENGINE_VERSION,
    procedure,
    facings,
    worst: {
      label: worst.label,
      facingAzimuthDeg: worst.facingAzimuthDeg,
      coolingTotalBtuh: worst.cooling.totalBtuh,
    },
    coolingSpreadBtuh: worst.cooling.totalBtuh - min,
    caution: DESIGN_ESTIMATE_CAUTION,
  };
}

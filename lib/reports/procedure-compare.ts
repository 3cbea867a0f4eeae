/**
 * The two procedures side by side: for each facing and each component, the load by the
 * procedure that sizes equipment, by the other, and their difference. Plain data (the plan sheet
 * draws it; no React here).
 */
import {
  COOLING_LATENT_COMPONENTS,
  COOLING_SENSIBLE_COMPONENTS,
  HEATING_COMPONENTS,
  type FacingLabel,
  type LoadProcedure,
  type PlanFacings,
} from "../load/results";

/** A load by the sizing procedure and by the other; difference = other − sizing, % of the sizing one (null when that is 0). */
export interface LoadDifference {
  sizingBtuh: number;
  otherBtuh: number;
  differenceBtuh: number;
  differencePct: number | null;
}

export function loadDifference(sizingBtuh: number, otherBtuh: number): LoadDifference {
  const differenceBtuh = otherBtuh - sizingBtuh;
  return {
    sizingBtuh,
    otherBtuh,
    differenceBtuh,
    differencePct: sizingBtuh === 0 ? null : (100 * differenceBtuh) / Math.abs(sizingBtuh),
  };
}

export interface ComponentDifference extends LoadDifference {
  component: string;
}

export interface FacingComparison {
  label: FacingLabel;
  heating: LoadDifference;
  coolingSensible: LoadDifference;
  coolingLatent: LoadDifference;
  coolingTotal: LoadDifference;
  /** By component; components that are zero in both procedures are left out. */
  heatingByComponent: ComponentDifference[];
  coolingSensibleByComponent: ComponentDifference[];
  coolingLatentByComponent: ComponentDifference[];
}

export interface ProcedureComparison {
  sizing: LoadProcedure;
  other: LoadProcedure;
  facings: FacingComparison[];
}

function byComponent<K extends string>(
  keys: readonly K[],
  sizing: Record<K, number>,
  other: Record<K, number>,
): ComponentDifference[] {
  return keys
    .filter((k) => sizing[k] !== 0 || other[k] !== 0)
    .map((k) => ({ component: k, ...loadDifference(sizing[k], other[k]) }));
}

/** Compares two procedures' four facings of one plan (front to N, E, S, W in both). */
export function compareProcedures(sizing: PlanFacings, other: PlanFacings): ProcedureComparison {
  const facings = sizing.facings.map((s): FacingComparison => {
    const o = other.facings.find((f) => f.label === s.label);
    if (!o) throw new Error(`the ${other.procedure} result has no facing ${s.label}`);
    return {
      label: s.label,
      heating: loadDifference(s.heating.totalBtuh, o.heating.totalBtuh),
      coolingSensible: loadDifference(s.cooling.sensibleBtuh, o.cooling.sensibleBtuh),
      coolingLatent: loadDifference(s.cooling.latentBtuh, o.cooling.latentBtuh),
      coolingTotal: loadDifference(s.cooling.totalBtuh, o.cooling.totalBtuh),
      heatingByComponent: byComponent(HEATING_COMPONENTS, s.heating.byComponent, o.heating.byComponent),
      coolingSensibleByComponent: byComponent(
        COOLING_SENSIBLE_COMPONENTS,
        s.cooling.sensibleByComponent,
        o.cooling.sensibleByComponent,
      ),
      coolingLatentByComponent: byComponent(
        COOLING_LATENT_COMPONENTS,
        s.cooling.latentByComponent,
        o.cooling.latentByComponent,
      ),
    };
  });
  return { sizing: sizing.procedure, other: other.procedure, facings };
}

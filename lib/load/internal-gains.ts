/**
 * Internal gains.
 *
 * Default: HoF 2021 ch. 17 eq. 30–31 (residential internal gains, occupants included), read in
 * a stored Markdown copy of the SI chapter (p. 17.10): 136 + 2.2·A_cf + 22·N_oc W sensible and
 * 20 + 0.22·A_cf + 12·N_oc W latent, A_cf in m². In IP, rounded: sensible
 * q = 464 + 0.70·A_cf + 75·N_oc Btu/h, latent q = 68 + 0.07·A_cf + 41·N_oc Btu/h (A_cf in ft²).
 * The chapter derives them from load profiles at 4:00 pm and calls them typical of U.S. homes.
 */
import type { InternalGainsInput } from "./input";

export interface InternalGains {
  sensibleBtuh: number;
  latentBtuh: number;
  method: "handbook-default" | "explicit-rows";
}

export function defaultInternalGains(conditionedFloorAreaFt2: number, occupants: number): InternalGains {
  return {
    sensibleBtuh: 464 + 0.7 * conditionedFloorAreaFt2 + 75 * occupants,
    latentBtuh: 68 + 0.07 * conditionedFloorAreaFt2 + 41 * occupants,
    method: "handbook-default",
  };
}

/** HoF 2021 ch. 17 eq. 30 in SI, W (used by the check against the handbook's example). */
export function defaultInternalSensibleW(conditionedFloorAreaM2: number, occupants: number): number {
  return 136 + 2.2 * conditionedFloorAreaM2 + 22 * occupants;
}

export function internalGains(
  input: InternalGainsInput,
  conditionedFloorAreaFt2: number,
  occupants: number,
): InternalGains {
  if (!input.rows) return defaultInternalGains(conditionedFloorAreaFt2, occupants);
  let sensibleBtuh = occupants * input.occupantSensibleBtuh;
  let latentBtuh = occupants * input.occupantLatentBtuh;
  for (const row of input.rows) {
    sensibleBtuh += row.sensibleBtuh;
    latentBtuh += row.latentBtuh;
  }
  return { sensibleBtuh, latentBtuh, method: "explicit-rows" };
}

/** Occupants: the plan's figure, else bedrooms + 1 (HoF 2021 ch. 17 eq. 30–31: "if unknown, estimate as N_br + 1"; also common practice). */
export function occupantsOf(plan: { occupants?: number; bedrooms: number }): number {
  return plan.occupants ?? plan.bedrooms + 1;
}

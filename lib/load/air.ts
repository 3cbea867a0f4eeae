/**
 * Outdoor air for one plan at one site: blower-door leakage → effective leakage area → LBL
 * infiltration (HoF 2021 ch. 16), mechanical ventilation (ASHRAE 62.2-2016 rate as the default
 * requirement), and their heating and hourly cooling loads. Facing-independent.
 */
import type { PlanInput } from "./input";
import {
  ashrae622VentilationCfm,
  cfm50FromAch50,
  COOLING_WIND_MPH,
  effectiveLeakageAreaCm2,
  HEATING_WIND_MPH,
  lblInfiltrationCfm,
} from "./infiltration";
import type { PreparedSite } from "./site";
import { CM2_PER_IN2, hours24 } from "./units";

export interface PreparedAir {
  elaCm2: number;
  ventilationRequiredCfm: number;
  ventilationProvidedCfm: number;
  heatingInfiltrationCfm: number;
  heatingInfiltrationBtuh: number;
  heatingVentilationBtuh: number;
  /** Cooling infiltration flow at each solar hour, cfm. */
  coolingInfiltrationCfm: number[];
  coolingInfiltrationSensibleBtuh: number[];
  coolingVentilationSensibleBtuh: number[];
  /** Latent load of a balanced system's ventilation air (the same every hour), Btu/h. */
  balancedVentilationLatentBtuh: number;
}

/**
 * Effective leakage area of a plan from its blower-door figure, cm²: directly when entered,
 * else from CFM50 or ACH50 (HoF 2021 ch. 16 eq. 40–41).
 */
export function planLeakageAreaCm2(plan: PlanInput, volumeFt3: number): number {
  const { ach50, cfm50, effectiveLeakageAreaIn2, flowExponent } = plan.infiltration;
  if (effectiveLeakageAreaIn2 !== undefined) return effectiveLeakageAreaIn2 * CM2_PER_IN2;
  return effectiveLeakageAreaCm2(cfm50 ?? cfm50FromAch50(ach50 ?? 0, volumeFt3), flowExponent);
}

/**
 * How outdoor air splits between infiltration and the ventilation component, as cfm multipliers
 * of the sensible and latent air factors. Unbalanced flow combines with infiltration
 * sub-additively: HoF 2021 ch. 16 eq. 51, read (ch. 17 eq. 14 uses max(Q_unbal, Q_i + 0.5·Q_unbal)).
 */
export function ventilationShareCfm(
  plan: PlanInput,
  ventilationProvidedCfm: number,
  infiltrationCfm: number,
): { sensibleCfm: number; latentCfm: number } {
  const v = plan.ventilation;
  if (v.kind === "balanced") {
    return {
      sensibleCfm: ventilationProvidedCfm * (1 - v.sensibleRecoveryEffectiveness),
      latentCfm: ventilationProvidedCfm * (1 - v.latentRecoveryEffectiveness),
    };
  }
  const combined = Math.sqrt(
    infiltrationCfm * infiltrationCfm + ventilationProvidedCfm * ventilationProvidedCfm,
  );
  return { sensibleCfm: combined - infiltrationCfm, latentCfm: combined - infiltrationCfm };
}

export function prepareAir(
  plan: PlanInput,
  site: PreparedSite,
  volumeFt3: number,
  notes: string[],
): PreparedAir {
  const s = site.site;
  const dtHeat = s.indoorHeatingF - s.heatingOutdoorDbF;
  const { shelterClass } = plan.infiltration;
  const elaCm2 = planLeakageAreaCm2(plan, volumeFt3);
  if (plan.stories > 3) notes.push("LBL infiltration coefficients for 3 stories used for a taller house.");
  const heatingInfiltrationCfm = lblInfiltrationCfm(
    elaCm2,
    plan.stories,
    shelterClass,
    dtHeat,
    HEATING_WIND_MPH,
  );

  const ventilationRequiredCfm = ashrae622VentilationCfm(plan.conditionedFloorAreaFt2, plan.bedrooms);
  const v = plan.ventilation;
  const ventilationProvidedCfm = v.kind === "none" ? 0 : (v.cfm ?? ventilationRequiredCfm);
  if (v.kind !== "none" && v.cfm === undefined) {
    notes.push(
      `Ventilation flow not entered: the ASHRAE 62.2-2016 rate of ${ventilationRequiredCfm.toFixed(0)} cfm is assumed.`,
    );
  }
  if (ventilationProvidedCfm < ventilationRequiredCfm) {
    notes.push(
      `Provided ventilation ${ventilationProvidedCfm.toFixed(0)} cfm is below the ASHRAE 62.2-2016 rate of ` +
        `${ventilationRequiredCfm.toFixed(0)} cfm.`,
    );
  }
  const heatVent = ventilationShareCfm(plan, ventilationProvidedCfm, heatingInfiltrationCfm);

  const tic = s.indoorCoolingF;
  const coolingInfiltrationCfm = hours24();
  const coolingInfiltrationSensibleBtuh = hours24();
  const coolingVentilationSensibleBtuh = hours24();
  for (let h = 0; h < 24; h++) {
    const dT = site.outdoorF[h] - tic;
    const inf = lblInfiltrationCfm(elaCm2, plan.stories, shelterClass, Math.abs(dT), COOLING_WIND_MPH);
    coolingInfiltrationCfm[h] = inf;
    coolingInfiltrationSensibleBtuh[h] = site.sensibleFactor * inf * dT;
    coolingVentilationSensibleBtuh[h] =
      site.sensibleFactor * ventilationShareCfm(plan, ventilationProvidedCfm, inf).sensibleCfm * dT;
  }
  const balancedLatentCfm =
    v.kind === "balanced" ? ventilationProvidedCfm * (1 - v.latentRecoveryEffectiveness) : 0;

  return {
    elaCm2,
    ventilationRequiredCfm,
    ventilationProvidedCfm,
    heatingInfiltrationCfm,
    heatingInfiltrationBtuh: site.sensibleFactor * heatingInfiltrationCfm * dtHeat,
    heatingVentilationBtuh: site.sensibleFactor * heatVent.sensibleCfm * dtHeat,
    coolingInfiltrationCfm,
    coolingInfiltrationSensibleBtuh,
    coolingVentilationSensibleBtuh,
    balancedVentilationLatentBtuh: site.latentFactor * balancedLatentCfm * site.latentDeltaGr,
  };
}

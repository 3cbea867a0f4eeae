/**
 * Everything about one plan at one site that does not depend on its facing: the envelope, outdoor
 * air, ducts, internal gains and the whole heating load. Prepared once and reused for every
 * facing (the cache matches plan and site by object identity).
 */
import { prepareAir, type PreparedAir } from "./air";
import { prepareDucts, type PreparedDucts } from "./duct-setup";
import { prepareEnvelope, type PreparedEnvelope } from "./envelope";
import type { PlanInput } from "./input";
import { internalGains, occupantsOf } from "./internal-gains";
import { HEATING_COMPONENTS, type HeatingResult } from "./results";
import type { PreparedSite } from "./site";
import { prepareStorage, type PreparedStorage } from "./storage";

export interface PreparedPlan {
  plan: PlanInput;
  site: PreparedSite;
  occupants: number;
  volumeFt3: number;
  air: PreparedAir;
  envelope: PreparedEnvelope;
  ducts: PreparedDucts;
  storage: PreparedStorage;
  heating: HeatingResult;
  internal: { sensibleBtuh: number; latentBtuh: number };
  notes: string[];
}

/**
 * Recently prepared plans, matched by object identity and site. A small ring (not a WeakMap:
 * WeakMap entries for many short-lived plans cost more in garbage collection than they save).
 */
const RECENT_PLANS = 64;
const recentPlans: Array<PreparedPlan | undefined> = new Array(RECENT_PLANS);
let recentNext = 0;

export function preparePlan(plan: PlanInput, site: PreparedSite): PreparedPlan {
  for (let i = 0; i < RECENT_PLANS; i++) {
    const hit = recentPlans[i];
    if (hit !== undefined && hit.plan === plan && hit.site === site) return hit;
  }
  const notes: string[] = [...site.notes];
  const occupants = occupantsOf(plan);
  const volumeFt3 = plan.volumeFt3 ?? plan.conditionedFloorAreaFt2 * plan.ceilingHeightFt;
  const air = prepareAir(plan, site, volumeFt3, notes);
  const envelope = prepareEnvelope(plan, site, notes);
  const heating = envelope.heating;
  heating.infiltration = air.heatingInfiltrationBtuh;
  heating.ventilation = air.heatingVentilationBtuh;
  let envelopeHeatBtuh = 0;
  for (const c of HEATING_COMPONENTS) if (c !== "ducts") envelopeHeatBtuh += heating[c];
  const ducts = prepareDucts(plan, site, envelope, envelopeHeatBtuh, notes);
  heating.ducts = ducts.heatingBtuh;
  const gains = internalGains(plan.internalGains, plan.conditionedFloorAreaFt2, occupants);
  const storage = prepareStorage(plan, envelope);

  const prepared: PreparedPlan = {
    plan,
    site,
    occupants,
    volumeFt3,
    air,
    envelope,
    ducts,
    storage,
    heating: {
      totalBtuh: envelopeHeatBtuh + heating.ducts,
      byComponent: heating,
      outdoorF: site.site.heatingOutdoorDbF,
      indoorF: site.site.indoorHeatingF,
      infiltrationCfm: air.heatingInfiltrationCfm,
      atticF: envelope.atticHeatingF,
      garageF: envelope.garageHeatingF,
      basementF: envelope.basementHeatingF,
    },
    internal: { sensibleBtuh: gains.sensibleBtuh, latentBtuh: gains.latentBtuh },
    notes,
  };
  recentPlans[recentNext] = prepared;
  recentNext = (recentNext + 1) % RECENT_PLANS;
  return prepared;
}

/**
 * Ducts of one plan: which method applies (HoF 2021 ch. 17 eq. 19 with the Table 6 factors where
 * the table has the location, else our conduction-and-leakage model), the heating duct loss, and
 * what the hourly cooling day needs.
 */
import {
  ductGeometry,
  ductHeatingMode,
  ductLoad,
  ductLossFactor,
  ductTableLocation,
  HEATING_SUPPLY_DELTA_F,
  type DuctGeometry,
} from "./ducts";
import type { PreparedEnvelope } from "./envelope";
import { LoadInputError } from "./errors";
import type { PlanInput } from "./input";
import type { PreparedSite } from "./site";

export type DuctZone = "attic" | "crawl" | "basement" | "garage" | "indoor";

export interface PreparedDucts {
  geometry: DuctGeometry;
  zone: DuctZone;
  heatingBtuh: number;
  /** Share of the duct gain that reaches the rooms (below 1 only for ducts in an encapsulated attic). */
  lossFractionCool: number;
  /**
   * Cooling duct gain factor F_dl of HoF 2021 ch. 17 Table 6 (eq. 19: gain = F_dl × room sensible
   * load), or null when the conduction-leakage model is used.
   */
  factorCool: number | null;
}

function ductZoneOf(plan: PlanInput): DuctZone {
  switch (plan.ducts.location) {
    case "vented-attic":
    case "encapsulated-attic":
      return "attic";
    case "vented-crawlspace":
      return "crawl";
    case "unconditioned-basement":
      return "basement";
    case "garage":
      return "garage";
    default:
      return "indoor";
  }
}

/** The duct model throws RangeError for impossible leakage; report it against the input field. */
export function ductRangeError(error: unknown): unknown {
  return error instanceof RangeError
    ? new LoadInputError("ducts.supplyLeakagePct", error.message, { min: 0, max: 50, unit: "%" })
    : error;
}

function wrapDuctError<T>(fn: () => T): T {
  try {
    return fn();
  } catch (error) {
    throw ductRangeError(error);
  }
}

/**
 * @param envelopeHeatBtuh the building's heating load without ducts (q_bl of ch. 17 eq. 19).
 */
export function prepareDucts(
  plan: PlanInput,
  site: PreparedSite,
  envelope: PreparedEnvelope,
  envelopeHeatBtuh: number,
  notes: string[],
): PreparedDucts {
  const s = site.site;
  const ti = s.indoorHeatingF;
  const to = s.heatingOutdoorDbF;
  const geometry = ductGeometry(plan.ducts, plan.conditionedFloorAreaFt2, plan.stories);
  const zone = ductZoneOf(plan);
  const tableLocation =
    plan.ducts.method === "handbook-table" ? ductTableLocation(plan.ducts.location) : null;
  const ductTable = (mode: "cooling" | "heating-furnace" | "heating-heat-pump") =>
    tableLocation === null
      ? null
      : ductLossFactor({
          location: tableLocation,
          mode,
          stories: plan.stories,
          insulationR: plan.ducts.insulationR,
          supplyLeakagePct: plan.ducts.supplyLeakagePct,
          returnLeakagePct: plan.ducts.returnLeakagePct,
        });
  const tableCool = ductTable("cooling");
  const tableHeat = ductTable(ductHeatingMode(plan.ducts.heatingSystem));
  const heatingZoneF: Record<DuctZone, number> = {
    attic: envelope.atticHeatingF ?? to,
    crawl: to,
    basement: envelope.basementHeatingF ?? ti,
    garage: envelope.garageHeatingF,
    indoor: ti,
  };
  // Ducts in an encapsulated attic lose heat into a space that passes most of it back to the rooms
  // through the ceiling: by the attic's steady balance only roofUA/(roofUA + ceilingUA) of it
  // reaches outdoors (our one-node approximation).
  const at = envelope.attic;
  const encapsulatedDucts = plan.ducts.location === "encapsulated-attic" && at.kind === "encapsulated";
  const lossFractionHeat = encapsulatedDucts ? at.roofUaHeat / (at.roofUaHeat + at.ceilingUaHeat) : 1;
  const lossFractionCool = encapsulatedDucts ? at.roofUaCool / (at.roofUaCool + at.ceilingUaCool) : 1;

  let heatingBtuh: number;
  if (tableHeat !== null && tableCool !== null) {
    // HoF 2021 ch. 17 eq. 19: q_d = F_dl × q_bl, q_bl the building's load without ducts.
    heatingBtuh = tableHeat.factor * envelopeHeatBtuh;
    const system = plan.ducts.heatingSystem === "heat-pump" ? "heat pump" : "furnace";
    notes.push(
      `Ducts: HoF 2021 ch. 17 Table 6 duct loss/gain factors (${tableLocation}, ${plan.stories >= 2 ? "2 or more stories" : "1 story"}): ` +
        `cooling ${tableCool.factor.toFixed(3)}, heating (${system}) ${tableHeat.factor.toFixed(3)} of the building load. ` +
        "Typical factors, guidance only; the table gives no duct latent gain, so none is added.",
    );
    for (const n of tableCool.notes) notes.push(n);
  } else {
    heatingBtuh =
      lossFractionHeat *
      wrapDuctError(() =>
        ductLoad(
          geometry,
          envelopeHeatBtuh,
          "heating",
          heatingZoneF[zone],
          ti,
          HEATING_SUPPLY_DELTA_F,
          site.sensibleFactor,
          0,
        ),
      ).sensibleBtuh;
    if (geometry.outsideEnvelope) {
      notes.push(
        plan.ducts.method === "handbook-table"
          ? `Ducts in the ${plan.ducts.location}: the handbook duct-factor table has no such location, so a simple conduction-and-leakage model is used (see the method notes).`
          : "Duct losses by a simple conduction-and-leakage model (see the method notes), not the handbook duct-factor table.",
      );
    }
  }
  return {
    geometry,
    zone,
    heatingBtuh,
    lossFractionCool,
    factorCool: tableCool === null ? null : tableCool.factor,
  };
}

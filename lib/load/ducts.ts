/**
 * Duct losses and gains: a simple physical conduction-and-leakage model of our own.
 *
 * ENGINE.md names the HoF 2021 ch. 17 Table 6 duct loss/gain factors as the first method; that
 * table could not be read from the reference store during this work, so this model (which
 * ENGINE.md allows to replace it) is used instead. All its constants are from memory:
 * - duct surface area outside the envelope: supply 27 % and return 5 % of the conditioned floor
 *   area for one story, 65 % of that for two or more stories (the ASHRAE Standard 152 defaults,
 *   from memory);
 * - duct wall U = 1/(R_insulation + 0.7) Btu/h·ft²·°F (inside and outside films, from memory);
 * - supply air 55 °F cooling (20 °F below a 75 °F room) and 120 °F heating (common practice);
 * - supply leakage loses conditioned air; return leakage draws in the duct zone's air.
 *
 * With Q_env the envelope load and Q_c the conduction gain or loss, the equipment must supply
 * Q = (Q_env + Q_c) / (1 − s − r·ΔT_zone/ΔT_supply), s and r the supply and return leakage
 * fractions, ΔT_zone = |T_zone − T_room| and ΔT_supply the supply-air temperature difference.
 */
import type { DuctLocation, DuctsInput } from "./input";

export const HEATING_SUPPLY_DELTA_F = 50;
const DUCT_FILMS_R = 0.7;

export interface DuctGeometry {
  supplyAreaFt2: number;
  returnAreaFt2: number;
  uBtuPerHrFt2F: number;
  supplyLeakageFraction: number;
  returnLeakageFraction: number;
  outsideEnvelope: boolean;
}

export function ductGeometry(ducts: DuctsInput, conditionedFloorAreaFt2: number, stories: number): DuctGeometry {
  const outsideEnvelope = ductLocationIsOutside(ducts.location);
  const storyFactor = stories >= 2 ? 0.65 : 1;
  return {
    supplyAreaFt2: outsideEnvelope ? 0.27 * conditionedFloorAreaFt2 * storyFactor : 0,
    returnAreaFt2: outsideEnvelope ? 0.05 * conditionedFloorAreaFt2 * storyFactor : 0,
    uBtuPerHrFt2F: 1 / (ducts.insulationR + DUCT_FILMS_R),
    supplyLeakageFraction: outsideEnvelope ? ducts.supplyLeakagePct / 100 : 0,
    returnLeakageFraction: outsideEnvelope ? ducts.returnLeakagePct / 100 : 0,
    outsideEnvelope,
  };
}

/** Ducts in conditioned space (or a conditioned crawlspace) add no load. */
export function ductLocationIsOutside(location: DuctLocation): boolean {
  return location !== "conditioned-space" && location !== "conditioned-crawlspace";
}

export interface DuctLoad {
  /** Added sensible load, Btu/h (conduction + leakage). */
  sensibleBtuh: number;
  /** Added latent load from return leakage (cooling only), Btu/h. */
  latentBtuh: number;
  /** 1 − s − r·ΔT_zone/ΔT_supply, the denominator above. */
  deliveryFraction: number;
}

/**
 * Duct load for one condition.
 * @param envelopeSensibleBtuh the load the rooms need (positive).
 * @param zoneF the duct zone's air temperature.
 * @param roomF the indoor set point.
 * @param supplyDeltaF supply-air temperature difference from the room.
 * @param latentPerCfmDeltaGr 0.69·(P/P0)·Δgrains of the zone air relative to the room (cooling), 0 for heating.
 * @param sensibleFactor 1.10·(P/P0).
 */
export function ductLoad(
  geometry: DuctGeometry,
  envelopeSensibleBtuh: number,
  mode: "heating" | "cooling",
  zoneF: number,
  roomF: number,
  supplyDeltaF: number,
  sensibleFactor: number,
  latentPerCfm: number,
): DuctLoad {
  if (!geometry.outsideEnvelope) return { sensibleBtuh: 0, latentBtuh: 0, deliveryFraction: 1 };
  const supplyF = mode === "cooling" ? roomF - supplyDeltaF : roomF + supplyDeltaF;
  const zoneDeltaF = mode === "cooling" ? zoneF - roomF : roomF - zoneF;
  const supplyConductionBtuh =
    geometry.uBtuPerHrFt2F * geometry.supplyAreaFt2 * (mode === "cooling" ? zoneF - supplyF : supplyF - zoneF);
  const returnConductionBtuh = geometry.uBtuPerHrFt2F * geometry.returnAreaFt2 * zoneDeltaF;
  const conductionBtuh = supplyConductionBtuh + returnConductionBtuh;
  const deliveryFraction =
    1 - geometry.supplyLeakageFraction - (geometry.returnLeakageFraction * zoneDeltaF) / supplyDeltaF;
  if (deliveryFraction < 0.3) {
    throw new RangeError(
      `duct leakage of ${Math.round(geometry.supplyLeakageFraction * 100)} % supply / ` +
        `${Math.round(geometry.returnLeakageFraction * 100)} % return leaves under 30 % of the supply air useful ` +
        `at a ${zoneF.toFixed(0)} °F duct zone`,
    );
  }
  const totalSensibleBtuh = (envelopeSensibleBtuh + conductionBtuh) / deliveryFraction;
  const cfm = totalSensibleBtuh / (sensibleFactor * supplyDeltaF);
  const latentBtuh = mode === "cooling" ? Math.max(0, geometry.returnLeakageFraction * cfm * latentPerCfm) : 0;
  return { sensibleBtuh: totalSensibleBtuh - envelopeSensibleBtuh, latentBtuh, deliveryFraction };
}

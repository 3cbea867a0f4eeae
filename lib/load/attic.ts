/**
 * Attic air temperature from a steady heat balance of one well-mixed attic node:
 *   UA_roof·(T_sol-air − T_a) + UA_ceiling·(T_room − T_a) + ṁc_p,vent·(T_o − T_a) = 0,
 * so T_a = (UA_roof·T_sa + UA_ceiling·T_room + G_vent·T_o) / (UA_roof + UA_ceiling + G_vent).
 *
 * A vented attic has a bare roof deck and outdoor-air ventilation; an encapsulated attic has the
 * insulation under the deck and no ventilation, so it floats near the indoor temperature.
 * Attic ventilation default: 0.30 cfm per ft² of ceiling (about 3–4 air changes per hour in a
 * typical hip attic with 1:300 venting — from memory).
 */
export function atticAirTemperatureF(params: {
  roofUA: number;
  solAirF: number;
  ceilingUA: number;
  roomF: number;
  ventilationConductanceBtuhF: number;
  outdoorF: number;
}): number {
  const { roofUA, solAirF, ceilingUA, roomF, ventilationConductanceBtuhF, outdoorF } = params;
  const sum = roofUA + ceilingUA + ventilationConductanceBtuhF;
  if (sum <= 0) return outdoorF;
  return (roofUA * solAirF + ceilingUA * roomF + ventilationConductanceBtuhF * outdoorF) / sum;
}

/**
 * Sol-air temperature, HoF 2021 SI ch. 18 eq. 29 (read in a stored copy, p. 18.24):
 * T_e = T_o + α·E_t/h_o − ε·ΔR/h_o, with ε·ΔR/h_o = 4 K (7.2 °F) for horizontal surfaces and
 * 0 for vertical ("common practice", the chapter says); tilted surfaces scale it by cos Σ (our
 * interpolation). h_o = 4.0 Btu/h·ft²·°F, the inverse of the summer 3.4 m/s outside film R-0.25
 * (HoF 2021 ch. 26 Table 10, h 22.7 W/m²·K) that the U-factors use, so that the sol-air and
 * conduction paths agree (ch. 18's 4 K example assumes h_o = 17 W/m²·K ≈ 3.0 Btu/h·ft²·°F).
 */
export const SOL_AIR_HO_BTUH_FT2F = 4.0;
export const SOL_AIR_LONGWAVE_HORIZONTAL_F = 7.2;

export function solAirTemperatureF(
  outdoorF: number,
  absorptance: number,
  irradianceBtuhFt2: number,
  tiltDeg: number,
): number {
  const longwaveF = SOL_AIR_LONGWAVE_HORIZONTAL_F * Math.max(0, Math.cos((tiltDeg * Math.PI) / 180));
  return outdoorF + (absorptance * irradianceBtuhFt2) / SOL_AIR_HO_BTUH_FT2F - longwaveF;
}

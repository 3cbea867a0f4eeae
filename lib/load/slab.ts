/**
 * The cooling credit of a slab on grade, HoF 2021 SI ch. 17 eq. 22–23 (read in a stored copy,
 * p. 17.8): q = A × CF_slab, CF_slab = 1.9 − 1.4·h_srf W/m², with h_srf = 1/(R_cvr + 0.12) W/(m²·K)
 * the slab's effective surface conductance through its floor covering. Both procedures use it (the
 * hourly method as the same credit at every hour: the ground under a slab barely swings in a day).
 */
import { BTUH_FT2_PER_W_M2 } from "./units";
import type { SlabFloorCovering } from "./input";

/**
 * Floor-covering resistance R_cvr, m²·K/W. Carpet: 0.21, the heavy carpet over a rubber pad of the
 * chapter's example house (ch. 17 Table 17, read, citing Chapter 6 of the 2020 HVAC Systems and
 * Equipment volume); tile 0.01 (thin ceramic or vinyl tile, from memory); bare concrete 0.
 */
export const SLAB_FLOOR_COVERING_R_SI: Record<SlabFloorCovering, number> = {
  carpet: 0.21,
  tile: 0.01,
  bare: 0,
};

/** CF_slab of ch. 17 eq. 23 in W/m² (negative: a credit). */
export function slabCoolingFactorWm2(floorCoveringRSi: number): number {
  if (!(floorCoveringRSi >= 0) || floorCoveringRSi > 2) {
    throw new RangeError(`slab floor-covering resistance must be 0 to 2 m²·K/W, got ${floorCoveringRSi}`);
  }
  const hSrf = 1 / (floorCoveringRSi + 0.12);
  return 1.9 - 1.4 * hSrf;
}

/** The slab's cooling load, Btu/h (negative: a credit), for a slab area in ft². */
export function slabCoolingBtuh(slabAreaFt2: number, covering: SlabFloorCovering): number {
  return slabAreaFt2 * slabCoolingFactorWm2(SLAB_FLOOR_COVERING_R_SI[covering]) * BTUH_FT2_PER_W_M2;
}

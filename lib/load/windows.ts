/**
 * Fenestration solar gain helpers.
 *
 * SHGC varies with the incidence angle. The engine scales the rated (normal-incidence) SHGC by
 * a typical angular curve of double-pane low-e glazing, in the shape of HoF 2021 ch. 15
 * Table 10 (values from memory), and uses 0.87 × SHGC for diffuse and ground-reflected light
 * (hemispherical average, from memory).
 */
const ANGLE_DEG = [0, 40, 50, 60, 70, 80, 90] as const;
const SHGC_RATIO = [1.0, 0.97, 0.93, 0.84, 0.64, 0.33, 0] as const;

export const DIFFUSE_SHGC_RATIO = 0.87;

/** SHGC(θ)/SHGC(0) by linear interpolation. */
export function shgcAngleRatio(incidenceDeg: number): number {
  if (incidenceDeg <= 0) return 1;
  if (incidenceDeg >= 90) return 0;
  for (let i = 1; i < ANGLE_DEG.length; i++) {
    if (incidenceDeg <= ANGLE_DEG[i]) {
      const t = (incidenceDeg - ANGLE_DEG[i - 1]) / (ANGLE_DEG[i] - ANGLE_DEG[i - 1]);
      return SHGC_RATIO[i - 1] + t * (SHGC_RATIO[i] - SHGC_RATIO[i - 1]);
    }
  }
  return 0;
}

/**
 * Sunlit fraction of a window under a horizontal overhang that runs well past the window on
 * both sides (HoF 2021 ch. 15 shading geometry, side shadows neglected): the shadow's lower edge
 * lies D·tan Ω below the overhang, with Ω the profile angle.
 */
export function overhangSunlitFraction(
  overhangDepthFt: number,
  heightAboveHeadFt: number,
  windowHeightFt: number,
  tanProfileAngle: number,
): number {
  if (overhangDepthFt <= 0 || tanProfileAngle <= 0) return 1;
  const shadowFt = overhangDepthFt * tanProfileAngle - heightAboveHeadFt;
  if (shadowFt <= 0) return 1;
  if (shadowFt >= windowHeightFt) return 0;
  return 1 - shadowFt / windowHeightFt;
}

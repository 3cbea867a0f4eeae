/**
 * Checks a house against HoF 2021 ch. 17 Table 1 "RLF Limitations" (read in a stored copy of the SI
 * chapter): "The RLF method should not be applied to situations outside the range of underlying
 * cases, as shown in Table 1." Each finding names the limit, the value found, the allowed range and
 * by how much it is exceeded, in plain words.
 *
 * Severity: "outside" — the house lies outside a Table 1 range (the chapter points to its heat
 * balance method, RHB, or to nonresidential procedures); "caution" — within range, but Table 1 or the
 * chapter text warns about this case; "assumption" — a Table 1 condition of the method itself that no
 * house input can show (always listed, so a report can print it).
 */
import { FRACTION_OF_DAILY_RANGE } from "../design-day";
import { M2_PER_FT2, BTUH_PER_W } from "../units";
import { exposureName, type RlfHouse } from "./procedure";
import {
  INTERNAL_GAINS_EQ_30_31,
  M_PER_FT,
  SEA_LEVEL_FACTORS_MAX_ELEVATION_M,
  TABLE_1_LIMITS,
} from "./tables";

export type RlfLimit =
  | "latitude"
  | "date"
  | "elevation"
  | "climate"
  | "construction"
  | "fenestration-area"
  | "fenestration-tilt"
  | "occupancy"
  | "temperature-swing"
  | "distribution-losses";

export interface RlfApplicabilityFinding {
  /** The Table 1 item. */
  limit: RlfLimit;
  severity: "outside" | "caution" | "assumption";
  /** The value found, in `unit` (null where the limit has no number). */
  value: number | null;
  unit: string;
  /** Table 1's range, in words. */
  allowedRange: string;
  /** How far outside the range, in `unit` (null when within it or not a number). */
  exceedsBy: number | null;
  /** One plain sentence for a report. */
  message: string;
}

/** Mean of HoF 2021 ch. 14 Table 6 fractions of the daily range (0.536): design-day mean = t_o − 0.536·DR. */
const MEAN_FRACTION_OF_DAILY_RANGE =
  FRACTION_OF_DAILY_RANGE.reduce((a, b) => a + b, 0) / FRACTION_OF_DAILY_RANGE.length;

const round1 = (x: number) => Math.round(x * 10) / 10;
const pct = (x: number) => `${round1(x * 100)} %`;

function normalizedAzimuth(deg: number): number {
  const a = deg % 360;
  return a < 0 ? a + 360 : a;
}

/** Every Table 1 finding for the house (an empty list never happens: the assumptions are always listed). */
export function checkRlfApplicability(house: RlfHouse): RlfApplicabilityFinding[] {
  const out: RlfApplicabilityFinding[] = [];
  const s = house.site;
  const lim = TABLE_1_LIMITS;

  // Latitude.
  const absLat = Math.abs(s.latitudeDeg);
  const hemi = s.latitudeDeg < 0 ? "S" : "N";
  const latRange = "20 to 60°N (or 20 to 60°S with north and south exposures reversed)";
  if (absLat < lim.latitudeDeg.min || absLat > lim.latitudeDeg.max) {
    const by = absLat < lim.latitudeDeg.min ? lim.latitudeDeg.min - absLat : absLat - lim.latitudeDeg.max;
    out.push({
      limit: "latitude",
      severity: "outside",
      value: absLat,
      unit: "°",
      allowedRange: latRange,
      exceedsBy: round1(by),
      message:
        `Latitude ${round1(absLat)}°${hemi} is ${round1(by)}° ${absLat < lim.latitudeDeg.min ? "nearer the equator than" : "farther from the equator than"} ` +
        `the procedure covers (20 to 60°); the nearest table column is used.`,
    });
  } else if (s.latitudeDeg < 0) {
    out.push({
      limit: "latitude",
      severity: "caution",
      value: absLat,
      unit: "°",
      allowedRange: latRange,
      exceedsBy: null,
      message: `Latitude ${round1(absLat)}°S: the procedure is only approximately valid in the southern hemisphere, with north and south exposures reversed.`,
    });
  }

  // Climate: design-day average outdoor temperature above the indoor design temperature.
  const meanF = s.coolingOutdoorDbF - MEAN_FRACTION_OF_DAILY_RANGE * s.dailyRangeF;
  const warm = meanF > s.indoorCoolingF;
  if (!warm) {
    const by = s.indoorCoolingF - meanF;
    out.push({
      limit: "climate",
      severity: "outside",
      value: round1(meanF),
      unit: "°F",
      allowedRange: `design-day average outdoor temperature above the indoor ${s.indoorCoolingF} °F (warm/hot climate)`,
      exceedsBy: round1(by),
      message:
        `The design-day average outdoor temperature, ${round1(meanF)} °F, is not above the indoor ${s.indoorCoolingF} °F ` +
        `(short by ${round1(by)} °F); the procedure is derived for warm and hot climates where it is above.`,
    });
  }

  // Date: July 21, summer peaking; mild climates with SE/S/SW glazing may peak in fall or winter.
  let equatorFacingFt2 = 0;
  let totalFenFt2 = 0;
  for (const g of house.fenestration) {
    totalFenFt2 += g.areaFt2;
    if (g.orientation.kind !== "vertical") continue;
    let a = normalizedAzimuth(g.orientation.azimuthDeg);
    if (s.latitudeDeg < 0) a = (540 - a) % 360;
    if (a >= 112.5 && a <= 247.5) equatorFacingFt2 += g.areaFt2;
  }
  if (!warm && equatorFacingFt2 > 0) {
    const dir = s.latitudeDeg < 0 ? "NE/N/NW" : "SE/S/SW";
    out.push({
      limit: "date",
      severity: "caution",
      value: round1((100 * equatorFacingFt2) / house.conditionedFloorAreaFt2),
      unit: "% of floor area",
      allowedRange: "July 21 peak (summer-peaking buildings)",
      exceedsBy: null,
      message:
        `${pct(equatorFacingFt2 / Math.max(totalFenFt2, 1e-9))} of the fenestration faces ${dir} in a mild climate: the cooling peak may come ` +
        `in fall or even winter rather than on July 21, which the procedure assumes; where local experience suggests so, use an hourly method.`,
    });
  }

  // Elevation.
  const elevationM = s.elevationFt * M_PER_FT;
  if (elevationM >= lim.elevationMaxM) {
    out.push({
      limit: "elevation",
      severity: "outside",
      value: Math.round(elevationM),
      unit: "m",
      allowedRange: "less than 2000 m (6,560 ft)",
      exceedsBy: Math.round(elevationM - lim.elevationMaxM),
      message: `The site is at ${Math.round(elevationM)} m (${Math.round(s.elevationFt)} ft), ${Math.round(elevationM - lim.elevationMaxM)} m above the 2000 m the procedure covers.`,
    });
  } else if (
    house.options?.airFactorElevationCorrection === false &&
    elevationM > SEA_LEVEL_FACTORS_MAX_ELEVATION_M
  ) {
    out.push({
      limit: "elevation",
      severity: "caution",
      value: Math.round(elevationM),
      unit: "m",
      allowedRange: "less than 2000 m, with elevation-corrected air factors",
      exceedsBy: null,
      message: `The site is at ${Math.round(elevationM)} m and sea-level air factors are used; the chapter corrects them above about 300 m.`,
    });
  }

  // Construction.
  const construction = house.construction ?? "light-frame";
  const constructionRange =
    "lightweight frame (wood or metal framing, wood or stucco siding); masonry veneer over frame is conservative";
  if (construction === "structural-masonry" || construction === "other") {
    out.push({
      limit: "construction",
      severity: "outside",
      value: null,
      unit: "",
      allowedRange: constructionRange,
      exceedsBy: null,
      message: `The walls are ${construction === "other" ? "of an unconventional construction" : "structural masonry"}; the procedure is derived for lightweight frame construction (use an hourly heat balance method).`,
    });
  } else if (construction === "masonry-veneer-over-frame") {
    out.push({
      limit: "construction",
      severity: "caution",
      value: null,
      unit: "",
      allowedRange: constructionRange,
      exceedsBy: null,
      message:
        "Masonry veneer over frame: the procedure may be applied; its wall loads are conservative for this construction.",
    });
  }

  // Fenestration area: per facade and total, as a fraction of floor area.
  const floor = house.conditionedFloorAreaFt2;
  const byFacade = new Map<string, { name: string; areaFt2: number }>();
  for (const g of house.fenestration) {
    if (g.orientation.kind !== "vertical") continue;
    const az = normalizedAzimuth(g.orientation.azimuthDeg);
    const key = g.facade ?? `azimuth ${Math.round(az)}`;
    const name = g.facade ? `${g.facade} (${exposureName(az)})` : exposureName(az);
    const e = byFacade.get(key);
    if (e) e.areaFt2 += g.areaFt2;
    else byFacade.set(key, { name, areaFt2: g.areaFt2 });
  }
  for (const { name, areaFt2 } of byFacade.values()) {
    const frac = areaFt2 / floor;
    if (frac > lim.fenestrationFractionOfFloorAreaMaxPerFacade) {
      out.push({
        limit: "fenestration-area",
        severity: "outside",
        value: round1(frac * 100),
        unit: "% of floor area",
        allowedRange: "0 to 15 % of floor area on any facade",
        exceedsBy: round1((frac - lim.fenestrationFractionOfFloorAreaMaxPerFacade) * 100),
        message: `Fenestration on the ${name} facade is ${pct(frac)} of floor area; the procedure is derived for at most 15 %.`,
      });
    }
  }
  const totalFrac = totalFenFt2 / floor;
  if (totalFrac > lim.fenestrationFractionOfFloorAreaMaxTotal) {
    out.push({
      limit: "fenestration-area",
      severity: "outside",
      value: round1(totalFrac * 100),
      unit: "% of floor area",
      allowedRange: "0 to 30 % of floor area in total",
      exceedsBy: round1((totalFrac - lim.fenestrationFractionOfFloorAreaMaxTotal) * 100),
      message: `Fenestration in total is ${pct(totalFrac)} of floor area; the procedure is derived for at most 30 %.`,
    });
  }

  // Fenestration tilt.
  for (const g of house.fenestration) {
    if (g.orientation.kind !== "horizontal") continue;
    const tilt = g.orientation.tiltDeg ?? 0;
    if (tilt >= lim.skylightMaxTiltForHorizontalDeg) {
      out.push({
        limit: "fenestration-tilt",
        severity: "outside",
        value: tilt,
        unit: "°",
        allowedRange: "vertical, or horizontal (skylights tilted less than 30°)",
        exceedsBy: round1(tilt - lim.skylightMaxTiltForHorizontalDeg),
        message: `${g.label} is tilted ${round1(tilt)}°, ${round1(tilt - lim.skylightMaxTiltForHorizontalDeg)}° more than the 30° up to which sloped glazing counts as horizontal; steeper sloped glazing is not supported (computed here as horizontal).`,
      });
    }
  }

  // Occupancy.
  const occupants = house.occupants ?? house.bedrooms + 1;
  if (occupants > house.bedrooms + 1) {
    out.push({
      limit: "occupancy",
      severity: "caution",
      value: occupants,
      unit: "occupants",
      allowedRange: "residential occupancy (the chapter's default is bedrooms + 1)",
      exceedsBy: occupants - (house.bedrooms + 1),
      message: `${occupants} occupants for ${house.bedrooms} bedrooms is more than the chapter's typical bedrooms + 1; high occupant density calls for an hourly or nonresidential method.`,
    });
  }
  if (house.internalGains !== undefined) {
    const g = INTERNAL_GAINS_EQ_30_31.sensible;
    const typicalBtuh =
      (g.constantW + g.perM2W * floor * M2_PER_FT2 + g.perOccupantW * occupants) * BTUH_PER_W;
    if (house.internalGains.sensibleBtuh > typicalBtuh) {
      const by = house.internalGains.sensibleBtuh - typicalBtuh;
      out.push({
        limit: "occupancy",
        severity: "caution",
        value: Math.round(house.internalGains.sensibleBtuh),
        unit: "Btu/h",
        allowedRange: `typical residential internal gains (eq. 30 gives ${Math.round(typicalBtuh)} Btu/h here)`,
        exceedsBy: Math.round(by),
        message: `Internal sensible gains of ${Math.round(house.internalGains.sensibleBtuh)} Btu/h are ${pct(by / typicalBtuh)} above the chapter's typical-home estimate; high internal gains call for an hourly or nonresidential method.`,
      });
    }
  }

  // Distribution losses: typical.
  const d = house.ducts;
  if (d.method === "table-6") {
    const leak = (d.supplyLeakagePct + d.returnLeakagePct) / 2;
    if (leak > 11) {
      out.push({
        limit: "distribution-losses",
        severity: "caution",
        value: leak,
        unit: "% per side",
        allowedRange: "typical distribution losses (Table 6 covers 5 % to 11 % leakage per side)",
        exceedsBy: round1(leak - 11),
        message: `Duct leakage of ${round1(leak)} % per side is beyond the duct factors' 11 % column; extensive or leaky duct runs outside the envelope call for an hourly method.`,
      });
    }
  }

  // Conditions of the method itself.
  out.push({
    limit: "temperature-swing",
    severity: "assumption",
    value: lim.temperatureSwingK * 1.8,
    unit: "°F",
    allowedRange: "1.7 K (3.1 °F) swing above the cooling set point at the peak",
    exceedsBy: null,
    message:
      "The cooling factors assume the indoor temperature may rise up to 1.7 K (3.1 °F) above the set point at the peak.",
  });
  out.push({
    limit: "distribution-losses",
    severity: "assumption",
    value: null,
    unit: "",
    allowedRange: "typical distribution losses",
    exceedsBy: null,
    message:
      "The duct factors are typical values (guidance only); extensive duct runs in unconditioned spaces call for an hourly method.",
  });
  return out;
}

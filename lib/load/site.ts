/**
 * Site preparation: the design day's outdoor temperatures, clear-sky solar day and air properties,
 * once per set of site conditions (cached by value and by object identity).
 */
import { outdoorDryBulbProfileF } from "./design-day";
import type { SiteConditions } from "./input";
import {
  humidityRatioGrFromRelHum,
  humidityRatioGrFromWetBulb,
  SEA_LEVEL_PRESSURE_PSIA,
  standardPressurePsia,
} from "./psychrometrics";
import { designDayOfYear, SiteSolarDay } from "./solar";

/**
 * Clear-sky optical depths used when a site has none (typical of US sites in July, from memory).
 * HoF 2021 ch. 14 (read) gives no default: τb and τd are location-specific and tabulated by
 * station for the 21st of each month; for scale, its Atlanta July values are 0.515 / 2.066.
 */
export const DEFAULT_TAU_BEAM = 0.5;
export const DEFAULT_TAU_DIFFUSE = 2.0;

/** Sea-level air-side factors (HoF 2021 ch. 17, read: Cs 1.23 W/(L/s·K) = 1.10 Btu/h·cfm·°F; Cl 3010 W/(L/s) → 0.69 Btu/h·cfm·gr). */
const SENSIBLE_AIR_FACTOR_SEA_LEVEL = 1.1;
const LATENT_AIR_FACTOR_SEA_LEVEL = 0.69;

export interface PreparedSite {
  key: string;
  site: SiteConditions;
  solar: SiteSolarDay;
  tauBeam: number;
  tauDiffuse: number;
  outdoorF: number[];
  dailyMeanOutdoorF: number;
  pressurePsia: number;
  /** 1.10·(P/P0), Btu/h per cfm per °F. */
  sensibleFactor: number;
  /** 0.69·(P/P0), Btu/h per cfm per grain/lb. */
  latentFactor: number;
  outdoorHumidityRatioGr: number;
  indoorHumidityRatioGr: number;
  /** Design humidity difference used for latent loads (never negative: dry air is no latent credit). */
  latentDeltaGr: number;
  /** Rough annual-mean ground temperature, °F: the mean of the heating and cooling design dry bulbs. */
  groundF: number;
  notes: string[];
}

const SITE_CACHE_LIMIT = 512;
const siteCache = new Map<string, PreparedSite>();

function siteKey(site: SiteConditions): string {
  return [
    site.latitudeDeg,
    site.longitudeDeg,
    site.elevationFt,
    site.heatingOutdoorDbF,
    site.coolingOutdoorDbF,
    site.coolingOutdoorWbF,
    site.dailyRangeF,
    site.designMonth,
    site.tauBeam ?? "",
    site.tauDiffuse ?? "",
    site.groundReflectance,
    site.indoorHeatingF,
    site.indoorCoolingF,
    site.indoorCoolingRhPct,
  ].join("|");
}

const siteByIdentity = new WeakMap<SiteConditions, PreparedSite>();

export function prepareSite(site: SiteConditions): PreparedSite {
  const byIdentity = siteByIdentity.get(site);
  if (byIdentity) return byIdentity;
  const key = siteKey(site);
  const cached = siteCache.get(key);
  if (cached) {
    siteByIdentity.set(site, cached);
    return cached;
  }
  const notes: string[] = [];
  const tauBeam = site.tauBeam ?? DEFAULT_TAU_BEAM;
  const tauDiffuse = site.tauDiffuse ?? DEFAULT_TAU_DIFFUSE;
  if (site.tauBeam === undefined || site.tauDiffuse === undefined) {
    notes.push(
      `Clear-sky optical depths not entered for the site: τb ${tauBeam}, τd ${tauDiffuse} used — approximate default, verify locally ` +
        "(enter the station's values from the ASHRAE climatic design data for the design month).",
    );
  }
  const dayOfYear = designDayOfYear(site.designMonth);
  const solar = new SiteSolarDay(site.latitudeDeg, dayOfYear, tauBeam, tauDiffuse, site.groundReflectance);
  const outdoorF = outdoorDryBulbProfileF(site.coolingOutdoorDbF, site.dailyRangeF);
  const pressurePsia = standardPressurePsia(site.elevationFt);
  const ratio = pressurePsia / SEA_LEVEL_PRESSURE_PSIA;
  const outdoorHumidityRatioGr = humidityRatioGrFromWetBulb(
    site.coolingOutdoorDbF,
    site.coolingOutdoorWbF,
    pressurePsia,
  );
  const indoorHumidityRatioGr = humidityRatioGrFromRelHum(
    site.indoorCoolingF,
    site.indoorCoolingRhPct,
    pressurePsia,
  );
  const deltaGr = outdoorHumidityRatioGr - indoorHumidityRatioGr;
  if (deltaGr < 0) {
    notes.push(
      "Outdoor design air is drier than indoor air: latent loads from outdoor air are taken as zero.",
    );
  }
  const prepared: PreparedSite = {
    key,
    site,
    solar,
    tauBeam,
    tauDiffuse,
    outdoorF,
    dailyMeanOutdoorF: outdoorF.reduce((a, b) => a + b, 0) / 24,
    pressurePsia,
    sensibleFactor: SENSIBLE_AIR_FACTOR_SEA_LEVEL * ratio,
    latentFactor: LATENT_AIR_FACTOR_SEA_LEVEL * ratio,
    outdoorHumidityRatioGr,
    indoorHumidityRatioGr,
    latentDeltaGr: Math.max(0, deltaGr),
    groundF: (site.heatingOutdoorDbF + site.coolingOutdoorDbF) / 2,
    notes,
  };
  if (siteCache.size >= SITE_CACHE_LIMIT) siteCache.clear();
  siteCache.set(key, prepared);
  siteByIdentity.set(site, prepared);
  return prepared;
}

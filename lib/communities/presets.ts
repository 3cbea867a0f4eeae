import type { SiteConditionsRaw } from "@/lib/load/input";

/**
 * Starting points for a new community's design conditions, by broad US climate region. Every
 * value is approximate and from memory (typical of a representative city in the region, not read
 * from a station table): the screen marks each preset "approximate — verify with your local
 * code's design conditions", and the user enters the values the jurisdiction requires.
 */
export interface ClimatePreset {
  id: string;
  label: string;
  example: string;
  conditions: SiteConditionsRaw;
}

export const PRESET_CAUTION = "Approximate — verify with your local code's design conditions.";

export const CLIMATE_PRESETS: readonly ClimatePreset[] = [
  {
    id: "gulf-hot-humid",
    label: "Gulf coast, hot and humid",
    example: "like the Houston area",
    conditions: {
      latitudeDeg: 29.8,
      longitudeDeg: -95.4,
      elevationFt: 100,
      heatingOutdoorDbF: 33,
      coolingOutdoorDbF: 96,
      coolingOutdoorWbF: 77,
      dailyRangeF: 17,
    },
  },
  {
    id: "central-texas",
    label: "South-central plains, hot",
    example: "like the Austin area",
    conditions: {
      latitudeDeg: 30.3,
      longitudeDeg: -97.7,
      elevationFt: 620,
      heatingOutdoorDbF: 29,
      coolingOutdoorDbF: 98,
      coolingOutdoorWbF: 74,
      dailyRangeF: 20,
    },
  },
  {
    id: "desert-southwest",
    label: "Desert southwest, hot and dry",
    example: "like the Phoenix area",
    conditions: {
      latitudeDeg: 33.4,
      longitudeDeg: -112.0,
      elevationFt: 1100,
      heatingOutdoorDbF: 40,
      coolingOutdoorDbF: 110,
      coolingOutdoorWbF: 70,
      dailyRangeF: 23,
    },
  },
  {
    id: "southeast-mixed-humid",
    label: "Southeast piedmont, mixed and humid",
    example: "like the Atlanta area",
    conditions: {
      latitudeDeg: 33.7,
      longitudeDeg: -84.4,
      elevationFt: 1000,
      heatingOutdoorDbF: 23,
      coolingOutdoorDbF: 93,
      coolingOutdoorWbF: 74,
      dailyRangeF: 18,
    },
  },
  {
    id: "mid-atlantic",
    label: "Mid-Atlantic, mixed",
    example: "like the Washington, DC area",
    conditions: {
      latitudeDeg: 38.9,
      longitudeDeg: -77.0,
      elevationFt: 200,
      heatingOutdoorDbF: 17,
      coolingOutdoorDbF: 93,
      coolingOutdoorWbF: 75,
      dailyRangeF: 18,
    },
  },
  {
    id: "upper-midwest",
    label: "Upper Midwest, cold",
    example: "like the Minneapolis area",
    conditions: {
      latitudeDeg: 44.9,
      longitudeDeg: -93.2,
      elevationFt: 870,
      heatingOutdoorDbF: -11,
      coolingOutdoorDbF: 89,
      coolingOutdoorWbF: 72,
      dailyRangeF: 20,
    },
  },
  {
    id: "front-range",
    label: "Front range, high and dry",
    example: "like the Denver area",
    conditions: {
      latitudeDeg: 39.7,
      longitudeDeg: -105.0,
      elevationFt: 5300,
      heatingOutdoorDbF: 3,
      coolingOutdoorDbF: 93,
      coolingOutdoorWbF: 60,
      dailyRangeF: 27,
    },
  },
  {
    id: "pacific-northwest",
    label: "Pacific Northwest, marine",
    example: "like the Seattle area",
    conditions: {
      latitudeDeg: 47.5,
      longitudeDeg: -122.3,
      elevationFt: 400,
      heatingOutdoorDbF: 26,
      coolingOutdoorDbF: 85,
      coolingOutdoorWbF: 65,
      dailyRangeF: 19,
    },
  },
];

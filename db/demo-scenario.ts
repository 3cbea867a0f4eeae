// The demo scenario: an invented builder, community and plans, for the start command and the
// tests. Design conditions are approximate values for a hot-humid US climate, for the demo only;
// a real community takes the values its jurisdiction requires.
import type { PlanInputRaw, SiteConditionsRaw } from "@/lib/load/input";
import type { Role } from "@/lib/auth/roles";

export const DEMO_PASSWORD = "platload-demo-1";

export interface DemoUser {
  email: string;
  name: string;
  role: Role;
}

/** A facade of a plan: gross wall, window area, door area (ft²); the other window properties take the plan's defaults. */
function facade(grossWallAreaFt2: number, windowAreaFt2: number, doorAreaFt2 = 0, overhangDepthFt = 1.5) {
  return {
    grossWallAreaFt2,
    doorAreaFt2,
    window: {
      areaFt2: windowAreaFt2,
      uFactor: 0.3,
      shgc: 0.23,
      overhangDepthFt,
      overhangHeightAboveHeadFt: 1.5,
      windowHeightFt: 5,
    },
  };
}

export const DEMO_PLANS: { planCode: string; name: string; input: PlanInputRaw }[] = [
  {
    planCode: "AS-1450",
    name: "Aster",
    input: {
      name: "Aster",
      conditionedFloorAreaFt2: 1450,
      stories: 1,
      bedrooms: 3,
      ceilingHeightFt: 9,
      wall: { baseId: "wood-2x4-16in-oc", cavityR: 13, continuousR: 0 },
      facades: {
        front: facade(370, 48, 20, 6),
        left: facade(450, 15),
        back: facade(370, 60),
        right: facade(450, 15),
      },
      attic: { kind: "vented", ceiling: { cavityR: 38 } },
      foundation: { kind: "slab-on-grade", slabPerimeterFt: 164 },
      garage: { wallAreaFt2: 180, doorAreaFt2: 18 },
      infiltration: { ach50: 5 },
      ducts: { location: "vented-attic", insulationR: 8 },
    },
  },
  {
    planCode: "BR-1820",
    name: "Briar",
    input: {
      name: "Briar",
      conditionedFloorAreaFt2: 1820,
      stories: 1,
      bedrooms: 3,
      ceilingHeightFt: 9,
      wall: { baseId: "wood-2x4-16in-oc", cavityR: 15, continuousR: 0 },
      facades: {
        front: facade(420, 55, 20, 8),
        left: facade(500, 20),
        back: facade(420, 90),
        right: facade(500, 20),
      },
      attic: { kind: "vented", ceiling: { cavityR: 38 } },
      foundation: { kind: "slab-on-grade", slabPerimeterFt: 182 },
      garage: { wallAreaFt2: 200, doorAreaFt2: 18 },
      infiltration: { ach50: 4 },
      ducts: { location: "vented-attic", insulationR: 8 },
    },
  },
  {
    planCode: "CO-2360",
    name: "Coral",
    input: {
      name: "Coral",
      conditionedFloorAreaFt2: 2360,
      stories: 2,
      bedrooms: 4,
      ceilingHeightFt: 9,
      wall: { baseId: "wood-2x4-16in-oc", cavityR: 13, continuousR: 0 },
      facades: {
        front: facade(760, 95, 20, 2),
        left: facade(690, 30),
        back: facade(760, 110),
        right: facade(690, 30),
      },
      attic: { kind: "vented", ceiling: { cavityR: 38 } },
      foundation: { kind: "slab-on-grade", slabPerimeterFt: 150 },
      garage: { wallAreaFt2: 240, doorAreaFt2: 18, floorOverAreaFt2: 0 },
      infiltration: { ach50: 5 },
      ducts: { location: "vented-attic", insulationR: 8 },
    },
  },
  {
    planCode: "DU-2940",
    name: "Dunmore",
    input: {
      name: "Dunmore",
      conditionedFloorAreaFt2: 2940,
      stories: 2,
      bedrooms: 4,
      ceilingHeightFt: 9,
      wall: { baseId: "wood-2x6-24in-oc", cavityR: 20, continuousR: 0 },
      facades: {
        front: facade(840, 110, 24, 2),
        left: facade(760, 40),
        back: facade(840, 150),
        right: facade(760, 40),
      },
      attic: { kind: "encapsulated", roofDeck: { cavityR: 20 }, ceiling: { cavityR: 0 } },
      foundation: { kind: "slab-on-grade", slabPerimeterFt: 176 },
      garage: { wallAreaFt2: 260, doorAreaFt2: 18, floorOverAreaFt2: 420 },
      infiltration: { ach50: 3 },
      ducts: { location: "encapsulated-attic", insulationR: 6 },
    },
  },
];

export const DEMO_SITE: SiteConditionsRaw = {
  name: "Cedar Hollow (approximate hot-humid conditions, demo only)",
  latitudeDeg: 30.3,
  longitudeDeg: -97.7,
  elevationFt: 620,
  heatingOutdoorDbF: 29,
  coolingOutdoorDbF: 98,
  coolingOutdoorWbF: 74,
  dailyRangeF: 20,
  designMonth: 7,
  indoorHeatingF: 70,
  indoorCoolingF: 75,
  indoorCoolingRhPct: 50,
};

export const DEMO_ACCOUNT = {
  name: "Marrow & Finch Homes",
  slug: "marrow-finch",
  users: [
    { email: "admin@marrowfinch.test", name: "Avery Holt", role: "admin" },
    { email: "designer@marrowfinch.test", name: "Dana Whitcomb", role: "designer" },
    { email: "reviewer@marrowfinch.test", name: "Rafael Ibarra", role: "reviewer" },
    { email: "purchasing@marrowfinch.test", name: "Priya Lund", role: "purchasing" },
    { email: "viewer@marrowfinch.test", name: "Vic Osei", role: "viewer" },
  ] satisfies DemoUser[],
  community: { name: "Cedar Hollow", locality: "Central Texas (demo)" },
};

/** A consultant who serves both builders: reviewer at one, designer at the other. */
export const DEMO_CONSULTANT = { email: "consultant@loadworks.test", name: "Casey Moreau" };

export const OTHER_ACCOUNT = {
  name: "Bramblewood Residential",
  slug: "bramblewood",
  users: [{ email: "admin@bramblewood.test", name: "Morgan Tate", role: "admin" }] satisfies DemoUser[],
  community: { name: "Heron Flats", locality: "Gulf Coast (demo)" },
  /** The second builder sizes by the hourly method, to show that each account picks its own procedure. */
  loadProcedure: "hourly" as const,
  plan: {
    planCode: "HX-2100",
    name: "Harbor",
    input: { ...DEMO_PLANS[1].input, name: "Harbor", conditionedFloorAreaFt2: 2100 } as PlanInputRaw,
  },
};

const STREETS = ["Quillfeather Lane", "Saltgrass Way", "Tern Hollow Drive", "Juniper Bend"];
const FACINGS_BY_STREET = [
  [0, 180],
  [90, 270],
  [45, 225],
  [135, 315],
];

/** 120 lots on four streets; each street's lots face across it, so two facings per street. */
export function demoLots(planCodes: string[]) {
  return Array.from({ length: 120 }, (_, i) => {
    const street = Math.floor(i / 30);
    const n = (i % 30) + 1;
    return {
      lotNumber: String(i + 1).padStart(3, "0"),
      address: `${100 + n * 4} ${STREETS[street]}`,
      planCode: planCodes[(i * 7 + street) % planCodes.length],
      facingDeg: FACINGS_BY_STREET[street][n % 2],
      // Construction starts street by street, a few lots a month through 2027.
      plannedStart: `2027-${String(1 + street * 3 + Math.floor((n - 1) / 10)).padStart(2, "0")}-01`,
    };
  });
}

/**
 * The demo catalog (invented model numbers): air conditioners with a furnace at close capacity
 * steps, and heat pumps with backup heat. Capacities at design are about 0.96 × nominal for the
 * largest coil match and lower for the smaller coil matches; sensible about 0.84 of total, as with
 * a high-airflow setting for a dry design day (invented for the demo; real data sheets govern). Furnace outputs are after efficiency.
 */
export const DEMO_EQUIPMENT = [
  ["ACF-18", "ac-furnace", "MF-CU18", "MF-AH18", "MF-GF30", 1.5, 17400, 14600, 28800, 1850],
  ["ACF-20", "ac-furnace", "MF-CU24", "MF-AH18", "MF-GF30", 2.0, 19600, 16500, 28800, 1990],
  ["ACF-22", "ac-furnace", "MF-CU24", "MF-AH21", "MF-GF30", 2.0, 21700, 18200, 28800, 2060],
  ["ACF-24", "ac-furnace", "MF-CU24", "MF-AH24", "MF-GF40", 2.0, 23300, 19600, 38400, 2150],
  ["ACF-25", "ac-furnace", "MF-CU24", "MF-AH27", "MF-GF30", 2.0, 24400, 20500, 28800, 2210],
  ["ACF-27", "ac-furnace", "MF-CU30", "MF-AH24", "MF-GF30", 2.5, 26500, 22300, 28800, 2330],
  ["ACF-26", "ac-furnace", "MF-CU30", "MF-AH24", "MF-GF40", 2.5, 25600, 21500, 38400, 2290],
  ["ACF-28", "ac-furnace", "MF-CU30", "MF-AH27", "MF-GF40", 2.5, 27300, 22900, 38400, 2360],
  ["ACF-29", "ac-furnace", "MF-CU30", "MF-AH30", "MF-GF40", 2.5, 29000, 24400, 38400, 2420],
  ["ACF-31", "ac-furnace", "MF-CU30", "MF-AH33", "MF-GF40", 2.5, 30600, 25700, 38400, 2490],
  ["ACF-32", "ac-furnace", "MF-CU36", "MF-AH30", "MF-GF40", 3.0, 31400, 26400, 38400, 2560],
  ["ACF-33", "ac-furnace", "MF-CU36", "MF-AH33", "MF-GF40", 3.0, 32400, 27200, 38400, 2600],
  ["ACF-34", "ac-furnace", "MF-CU36", "MF-AH33", "MF-GF60", 3.0, 33300, 28000, 57600, 2640],
  ["ACF-36", "ac-furnace", "MF-CU36", "MF-AH36", "MF-GF60", 3.0, 34800, 29200, 57600, 2710],
  ["ACF-38", "ac-furnace", "MF-CU42", "MF-AH36", "MF-GF40", 3.5, 37500, 31500, 38400, 2820],
  ["ACF-40", "ac-furnace", "MF-CU42", "MF-AH36", "MF-GF60", 3.5, 38300, 32200, 57600, 2880],
  ["ACF-42", "ac-furnace", "MF-CU42", "MF-AH42", "MF-GF60", 3.5, 40500, 34000, 57600, 2990],
  ["ACF-48", "ac-furnace", "MF-CU48", "MF-AH48", "MF-GF80", 4.0, 46400, 39000, 76800, 3290],
  ["HP-24", "heat-pump-backup", "MF-HP24", "MF-AH24E", "", 2.0, 23100, 19400, 0, 2980],
  ["HP-30", "heat-pump-backup", "MF-HP30", "MF-AH30E", "", 2.5, 28800, 24200, 0, 3310],
  ["HP-36", "heat-pump-backup", "MF-HP36", "MF-AH36E", "", 3.0, 34500, 29000, 0, 3620],
] as const;

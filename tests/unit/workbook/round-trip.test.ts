import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { parsePlanInput, type PlanInput } from "@/lib/load/input";
import {
  PLAN_COLUMNS,
  PlanRowError,
  planInputToRow,
  planRowsToTable,
  rowToPlanInput,
  validatePlanTable,
} from "@/lib/workbook/plan-columns";
import { readCsv, readXlsx, writeCsv, writeXlsx } from "@/lib/workbook/table-io";

const root = path.resolve(__dirname, "../../..");

function examplePlans(): { planCode: string; planName: string; input: PlanInput }[] {
  const result = validatePlanTable(
    readCsv(readFileSync(path.join(root, "templates/example-plans.csv"), "utf8")),
  );
  if (!result.ok) throw new Error("example file does not validate");
  return result.plans;
}

/** A plan that uses the less common columns: facade wall override, entered gains, basement, ERV. */
const UNUSUAL_PLAN: PlanInput = parsePlanInput({
  name: "Test basement plan",
  conditionedFloorAreaFt2: 2400,
  stories: 2,
  bedrooms: 4,
  occupants: 6,
  volumeFt3: 21_000,
  wall: { baseId: "wood-2x6-16in-oc", cavityR: 20, continuousR: 0 },
  facades: {
    front: {
      grossWallAreaFt2: 600,
      window: {
        areaFt2: 90,
        uFactor: 0.28,
        shgc: 0.22,
        overhangDepthFt: 6,
        overhangHeightAboveHeadFt: 2,
        windowHeightFt: 6,
      },
      doorAreaFt2: 21,
      doorUFactor: 0.2,
    },
    left: {
      grossWallAreaFt2: 500,
      wall: { baseId: "cmu-8in-core-filled", cavityR: 0, continuousR: 7.5 },
      window: { areaFt2: 30 },
    },
    back: { grossWallAreaFt2: 600, window: { areaFt2: 110, interiorShadingCoefficient: 0.7 } },
    right: { grossWallAreaFt2: 500, window: { areaFt2: 30 } },
  },
  attic: {
    kind: "vented",
    ceilingAreaFt2: 1200,
    ceiling: { baseId: "attic-joists-16in-oc", cavityR: 60, continuousR: 0 },
    roofPitchRisePer12In: 8,
    roofSolarAbsorptance: 0.75,
  },
  vaultedCeiling: {
    areaFt2: 150,
    construction: { baseId: "roof-rafters-2x12-24in-oc", cavityR: 38, continuousR: 5 },
  },
  skylights: { areaFt2: 12, uFactor: 0.5, shgc: 0.28, tiltDeg: 33.7, facade: "left" },
  foundation: {
    kind: "unconditioned-basement",
    floorAreaFt2: 1200,
    floor: { cavityR: 30 },
    foundationWallAreaFt2: 1100,
    foundationWallAboveGradeAreaFt2: 150,
    foundationWallDepthBelowGradeFt: 8,
    foundationWallInsulationR: 10,
    basementHeatingTemperatureF: 55,
  },
  floorOverOutdoors: { areaFt2: 40 },
  garage: {
    wallAreaFt2: 200,
    doorAreaFt2: 20,
    floorOverAreaFt2: 0,
    heatingTemperatureF: 40,
    coolingTemperatureF: 100,
  },
  infiltration: { cfm50: 1750, shelterClass: 3, flowExponent: 0.67 },
  ventilation: {
    kind: "balanced",
    cfm: 100,
    sensibleRecoveryEffectiveness: 0.7,
    latentRecoveryEffectiveness: 0.5,
  },
  ducts: { location: "unconditioned-basement", insulationR: 6, supplyLeakagePct: 3, returnLeakagePct: 2 },
  internalGains: {
    rows: [{ name: "Entered in the plan library (total)", sensibleBtuh: 2400, latentBtuh: 300 }],
    occupantSensibleBtuh: 250,
    occupantLatentBtuh: 180,
  },
  coolingSupplyDeltaF: 18,
});

describe("plan row ↔ PlanInput", () => {
  it("planInputToRow → rowToPlanInput gives the same plan back (example plans and an unusual plan)", () => {
    for (const plan of [
      ...examplePlans(),
      { planCode: "T-2400", planName: "Test basement plan", input: UNUSUAL_PLAN },
    ]) {
      const row = planInputToRow(plan.input, plan.planCode, plan.planName);
      const back = rowToPlanInput(row);
      expect(back, plan.planCode).toEqual({
        ok: true,
        planCode: plan.planCode,
        planName: plan.planName,
        input: { ...plan.input, name: plan.planName },
      });
    }
  });

  it("round-trips through a written CSV and XLSX file", async () => {
    const plans = [
      ...examplePlans(),
      { planCode: "T-2400", planName: "Test basement plan", input: UNUSUAL_PLAN },
    ];
    const table = planRowsToTable(
      plans.map((plan) => planInputToRow(plan.input, plan.planCode, plan.planName)),
    );
    const fromCsv = validatePlanTable(readCsv(writeCsv(table.headers, table.rows)));
    const fromXlsx = validatePlanTable(await readXlsx(await writeXlsx(table.headers, table.rows)));
    for (const result of [fromCsv, fromXlsx]) {
      expect(result.ok).toBe(true);
      if (result.ok)
        expect(result.plans.map((plan) => plan.input)).toEqual(
          plans.map((plan) => ({ ...plan.input, name: plan.planName })),
        );
    }
  });

  it("a row with only the required cells means exactly what the engine assumes for a minimal plan", () => {
    const required = PLAN_COLUMNS.filter((column) => column.required).map((column) => column.key);
    expect(required.sort()).toEqual(
      [
        "back_wall_ft2",
        "bedrooms",
        "conditioned_area_ft2",
        "front_wall_ft2",
        "left_wall_ft2",
        "plan_code",
        "plan_name",
        "right_wall_ft2",
      ].sort(),
    );
    const fromRow = rowToPlanInput({
      plan_code: "M-1",
      plan_name: "Minimal",
      conditioned_area_ft2: 1500,
      bedrooms: 3,
      front_wall_ft2: 300,
      left_wall_ft2: 300,
      back_wall_ft2: 300,
      right_wall_ft2: 300,
      blower_door_ach50: 5,
    });
    const fromEngine = parsePlanInput({
      name: "Minimal",
      conditionedFloorAreaFt2: 1500,
      bedrooms: 3,
      facades: {
        front: { grossWallAreaFt2: 300 },
        left: { grossWallAreaFt2: 300 },
        back: { grossWallAreaFt2: 300 },
        right: { grossWallAreaFt2: 300 },
      },
      infiltration: { ach50: 5 },
    });
    expect(fromRow).toEqual({ ok: true, planCode: "M-1", planName: "Minimal", input: fromEngine });
  });

  it("a facade wall override takes the plan's wall for the parts left blank", () => {
    const result = rowToPlanInput({
      plan_code: "M-2",
      plan_name: "Override",
      conditioned_area_ft2: 1500,
      bedrooms: 3,
      front_wall_ft2: 300,
      left_wall_ft2: 300,
      back_wall_ft2: 300,
      right_wall_ft2: 300,
      blower_door_ach50: 5,
      wall_base: "wood-2x6-16in-oc",
      wall_cavity_r: "R-20",
      back_wall_continuous_r: "R-5",
    });
    expect(result.ok && result.input.facades.back.wall).toEqual({
      baseId: "wood-2x6-16in-oc",
      cavityR: 20,
      continuousR: 5,
    });
    expect(result.ok && result.input.facades.front.wall).toBeUndefined();
  });

  it("refuses what the flat table cannot hold, and unknown keys, with clear errors", () => {
    // Two window groups per facade fit in the table (group 2 columns); a third does not.
    const withExtra = parsePlanInput({
      ...UNUSUAL_PLAN,
      facades: {
        ...UNUSUAL_PLAN.facades,
        front: { ...UNUSUAL_PLAN.facades.front, extraWindows: [{ areaFt2: 10 }, { areaFt2: 12 }] },
      },
    });
    expect(() => planInputToRow(withExtra, "X-1")).toThrow(PlanRowError);
    expect(() => planInputToRow(withExtra, "X-1")).toThrow(/facades\.front\.extraWindows/);
    const unknown = rowToPlanInput({
      plan_code: "M-3",
      plan_name: "x",
      conditioned_area_ft2: 1500,
      bedrooms: 3,
      front_wall_ft2: 300,
      left_wall_ft2: 300,
      back_wall_ft2: 300,
      right_wall_ft2: 300,
      blower_door_ach50: 5,
      wall_r_total: 19,
    });
    expect(unknown).toEqual({
      ok: false,
      errors: [{ key: "wall_r_total", header: "wall_r_total", reason: "is not a plan library column" }],
    });
  });
});

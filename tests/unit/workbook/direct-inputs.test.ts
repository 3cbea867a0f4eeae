/**
 * The plan library's columns for the engine's direct inputs (whole-assembly U-factors, slab
 * F-factor, slab area and covering, foundation wall U, effective leakage area, exterior
 * attenuation) and for a second window group per facade: reading, refusing, round trips, and
 * what the plan sheet shows of the U-factors used.
 *
 * Expected loads are hand calculations from the inputs (U × A × ΔT), never earlier engine output.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { wallU } from "@/lib/load/assemblies";
import { computePlanFacings } from "@/lib/load/index";
import { parsePlanInput, parseSiteConditions, type PlanInput } from "@/lib/load/input";
import { airLeakageText, planAssemblies } from "@/lib/workbook/plan-assemblies";
import {
  PLAN_COLUMN_BY_KEY,
  PLAN_COLUMNS,
  PLAN_HEADERS,
  PlanRowError,
  planInputToRow,
  planRowsToTable,
  rowToPlanInput,
  validatePlanTable,
  withOneAirLeakageFigure,
  type PlanRowCells,
} from "@/lib/workbook/plan-columns";
import { readCsv, readXlsx, writeCsv, writeXlsx } from "@/lib/workbook/table-io";

const root = path.resolve(__dirname, "../../..");
const site = parseSiteConditions(
  JSON.parse(readFileSync(path.join(root, "templates/example-site.json"), "utf8")),
);
const HEATING_DT_F = site.indoorHeatingF - site.heatingOutdoorDbF; // 70 − 24 = 46 °F

const header = (key: string) => {
  const column = PLAN_COLUMN_BY_KEY.get(key);
  if (!column) throw new Error(`no column ${key}`);
  return column.header;
};

/** A one-story slab ranch, as a builder would fill the required cells. */
const BASE_ROW: PlanRowCells = {
  plan_code: "D-1600",
  plan_name: "Direct inputs ranch",
  conditioned_area_ft2: "1,600 sf",
  bedrooms: "3",
  front_wall_ft2: "360",
  front_window_ft2: "50",
  left_wall_ft2: "400",
  left_window_ft2: "30",
  back_wall_ft2: "360",
  back_window_ft2: "60",
  right_wall_ft2: "400",
  right_window_ft2: "30",
  slab_perimeter_ft: "160",
  blower_door_ach50: "4",
};

function read(cells: PlanRowCells): PlanInput {
  const result = rowToPlanInput(cells);
  if (!result.ok) throw new Error(result.errors.map((e) => `${e.header}: ${e.reason}`).join("; "));
  return result.input;
}

/** A plan that uses every new input: direct U-factors, F-factor, ELA, attenuation, second groups. */
const DIRECT_PLAN: PlanInput = parsePlanInput({
  name: "Every direct input",
  conditionedFloorAreaFt2: 2200,
  stories: 2,
  bedrooms: 4,
  wall: { baseId: "wood-2x6-16in-oc", cavityR: 20, continuousR: 0, uFactor: 0.048 },
  facades: {
    front: {
      grossWallAreaFt2: 600,
      wall: { baseId: "cmu-8in-core-filled", cavityR: 0, continuousR: 7.5, uFactor: 0.11 },
      window: { areaFt2: 80, exteriorAttenuation: 0.8 },
      extraWindows: [
        {
          areaFt2: 24,
          uFactor: 0.27,
          shgc: 0.2,
          interiorShadingCoefficient: 0.9,
          exteriorAttenuation: 0.6,
          windowHeightFt: 2,
          overhangDepthFt: 0.5,
          overhangHeightAboveHeadFt: 0.5,
        },
      ],
    },
    left: { grossWallAreaFt2: 500, window: { areaFt2: 30 } },
    back: {
      grossWallAreaFt2: 600,
      window: { areaFt2: 90 },
      extraWindows: [{ areaFt2: 48, windowHeightFt: 6.67, overhangDepthFt: 10 }],
    },
    right: { grossWallAreaFt2: 500, window: { areaFt2: 30 }, extraWindows: [{ areaFt2: 0 }] },
  },
  attic: {
    kind: "encapsulated",
    ceiling: { cavityR: 0, uFactor: 0.3 },
    roofDeck: { cavityR: 20, uFactor: 0.05 },
  },
  vaultedCeiling: { areaFt2: 120, construction: { cavityR: 30, uFactor: 0.035 } },
  foundation: {
    kind: "conditioned-basement",
    slabPerimeterFt: 40,
    slabFFactor: 0.45,
    slabAreaFt2: 1100,
    slabFloorCovering: "tile",
    foundationWallAreaFt2: 1000,
    foundationWallAboveGradeAreaFt2: 200,
    foundationWallUFactor: 0.07,
  },
  floorOverOutdoors: { areaFt2: 30, construction: { cavityR: 30, uFactor: 0.033 } },
  garage: { wallAreaFt2: 200, floorOverAreaFt2: 250, floorOver: { cavityR: 30, uFactor: 0.031 } },
  infiltration: { effectiveLeakageAreaIn2: 85 },
  ducts: { location: "conditioned-space" },
});

describe("direct U-factors, slab inputs, leakage area and attenuation in the plan library", () => {
  it("every new column is snake_case, has a header with its unit where it has one, and sits in an existing group", () => {
    const added = [
      "wall_u",
      "ceiling_u",
      "roof_deck_u",
      "vaulted_u",
      "foundation_floor_u",
      "floor_over_outdoors_u",
      "floor_over_garage_u",
      "foundation_wall_u",
      "slab_f_factor",
      "slab_area_ft2",
      "slab_floor_covering",
      "slab_edge_construction",
      "effective_leakage_area_in2",
    ];
    for (const facade of ["front", "left", "back", "right"]) {
      added.push(`${facade}_wall_u`, `${facade}_window_ext_attenuation`);
      for (const part of [
        "ft2",
        "u",
        "shgc",
        "shade",
        "ext_attenuation",
        "height_ft",
        "overhang_depth_ft",
        "overhang_above_head_ft",
      ])
        added.push(`${facade}_window2_${part}`);
    }
    for (const key of added) {
      const column = PLAN_COLUMN_BY_KEY.get(key);
      expect(column, key).toBeDefined();
      expect(key).toMatch(/^[a-z][a-z0-9_]*$/);
      expect(column?.required).toBe(false);
    }
    for (const key of added.filter((k) => /_u$/.test(k))) expect(header(key)).toContain("Btu/h·ft²·°F");
    expect(header("slab_f_factor")).toContain("Btu/h·ft·°F");
    expect(header("effective_leakage_area_in2")).toContain("in²");
    expect(new Set(PLAN_COLUMNS.map((c) => c.key)).size).toBe(PLAN_COLUMNS.length);
    expect(new Set(PLAN_HEADERS).size).toBe(PLAN_HEADERS.length);
  });

  it("reads the new cells, with their units, into the engine's fields", () => {
    const input = read({
      ...BASE_ROW,
      blower_door_ach50: "",
      effective_leakage_area_in2: "ELA 85",
      wall_u: "U-0.048",
      ceiling_u: "0.026 U",
      slab_f_factor: "F-0.45",
      slab_area_ft2: "1,500 sf",
      slab_floor_covering: "Tile",
      front_window_ext_attenuation: "80%",
    });
    expect(input.infiltration).toMatchObject({ effectiveLeakageAreaIn2: 85 });
    expect(input.infiltration.ach50).toBeUndefined();
    expect(input.wall.uFactor).toBe(0.048);
    expect(input.attic.ceiling.uFactor).toBe(0.026);
    expect(input.foundation).toMatchObject({
      slabFFactor: 0.45,
      slabAreaFt2: 1500,
      slabFloorCovering: "tile",
    });
    expect(input.facades.front.window.exteriorAttenuation).toBe(0.8);
    // Blank: no direct U anywhere, exterior attenuation 1 (the engine's default).
    const plain = read(BASE_ROW);
    expect(plain.wall.uFactor).toBeUndefined();
    expect(plain.foundation.slabFFactor).toBeUndefined();
    expect(plain.facades.back.window.exteriorAttenuation).toBe(1);
    expect(plain.facades.back.extraWindows).toEqual([]);
  });

  it("a JSON plan with every new input survives row → CSV / XLSX → row unchanged", async () => {
    const row = planInputToRow(DIRECT_PLAN, "D-2200", "Every direct input");
    expect(row).toMatchObject({
      wall_u: 0.048,
      front_wall_u: 0.11,
      effective_leakage_area_in2: 85,
      blower_door_ach50: null,
      back_window2_ft2: 48,
      right_window2_ft2: 0,
      left_window2_ft2: null,
      slab_f_factor: 0.45,
      slab_floor_covering: "tile",
    });
    expect(rowToPlanInput(row)).toEqual({
      ok: true,
      planCode: "D-2200",
      planName: "Every direct input",
      input: DIRECT_PLAN,
    });
    const table = planRowsToTable([row]);
    for (const reread of [
      readCsv(writeCsv(table.headers, table.rows)),
      await readXlsx(await writeXlsx(table.headers, table.rows)),
    ]) {
      const result = validatePlanTable(reread);
      expect(result.ok).toBe(true);
      if (result.ok) expect(result.plans[0].input).toEqual(DIRECT_PLAN);
    }
  });

  it("a facade's own wall: its U-factor is used; without one, a facade that names its own layers is computed from them", () => {
    const onlyU = read({
      ...BASE_ROW,
      wall_base: "wood-2x6-16in-oc",
      wall_cavity_r: "R-20",
      front_wall_u: "0.05",
    });
    expect(onlyU.facades.front.wall).toEqual({
      baseId: "wood-2x6-16in-oc",
      cavityR: 20,
      continuousR: 0,
      uFactor: 0.05,
    });
    // The plan's direct U describes the plan's assembly, not a facade built of block.
    const ownLayers = read({
      ...BASE_ROW,
      wall_u: "0.05",
      left_wall_base: "cmu-8in-core-filled",
      left_wall_cavity_r: "0",
      left_wall_continuous_r: "R-7.5",
    });
    expect(ownLayers.facades.left.wall).toEqual({
      baseId: "cmu-8in-core-filled",
      cavityR: 0,
      continuousR: 7.5,
    });
    expect(ownLayers.facades.front.wall).toBeUndefined();
    expect(ownLayers.wall.uFactor).toBe(0.05);
  });
});

describe("air leakage: exactly one of ACH50, CFM50 and effective leakage area", () => {
  const ach = header("blower_door_ach50");
  const cfm = header("blower_door_cfm50");
  const ela = header("effective_leakage_area_in2");

  function tableWith(rows: PlanRowCells[]) {
    const keys = PLAN_COLUMNS.map((column) => column.key);
    return readCsv(
      writeCsv(
        PLAN_HEADERS,
        rows.map((row) =>
          keys.map((key) => (row[key] === undefined || row[key] === null ? "" : String(row[key]))),
        ),
      ),
    );
  }

  it("a row with two leakage figures is refused on that row, naming both columns; nothing is imported", () => {
    const result = validatePlanTable(
      tableWith([BASE_ROW, { ...BASE_ROW, plan_code: "D-2", blower_door_cfm50: "1,100 CFM50" }]),
    );
    expect(result.ok).toBe(false);
    if (result.ok) return;
    const both = `"${ach}" and "${cfm}" are both filled`;
    expect(result.errors).toEqual([
      { row: 3, column: ach, reason: expect.stringContaining(both) },
      { row: 3, column: cfm, reason: expect.stringContaining(both) },
    ]);
    expect(result.errors[0].reason).toMatch(/give one air-leakage figure per plan/);
  });

  it("three figures name all three columns; none is refused as required", () => {
    const three = rowToPlanInput({
      ...BASE_ROW,
      blower_door_cfm50: "1100",
      effective_leakage_area_in2: "80 in²",
    });
    expect(three.ok).toBe(false);
    if (!three.ok) {
      expect(three.errors.map((e) => e.key)).toEqual([
        "blower_door_ach50",
        "blower_door_cfm50",
        "effective_leakage_area_in2",
      ]);
      expect(three.errors[0].reason).toContain(`"${ach}", "${cfm}" and "${ela}" are all filled`);
    }
    const none = rowToPlanInput({ ...BASE_ROW, blower_door_ach50: "" });
    expect(none).toEqual({
      ok: false,
      errors: [
        {
          key: "blower_door_ach50",
          header: ach,
          reason: expect.stringMatching(/ach50 or cfm50.*effective leakage area/),
        },
      ],
    });
  });

  it("an ELA alone is used by the engine, and the sheet says how leakage was given", () => {
    const input = read({ ...BASE_ROW, blower_door_ach50: "", effective_leakage_area_in2: "85 sq in" });
    expect(airLeakageText(input)).toBe("85 in² effective leakage area");
    expect(computePlanFacings(input, site).facings[0].effectiveLeakageAreaIn2).toBe(85);
    expect(airLeakageText(read(BASE_ROW))).toBe("4 ACH50");
  });

  it("in the grid, entering one figure clears the row's other filled figure in the same save", () => {
    const current = { ...BASE_ROW };
    const change = withOneAirLeakageFigure(current, { blower_door_cfm50: "1100" });
    expect(change).toEqual({ blower_door_cfm50: "1100", blower_door_ach50: "" });
    expect(rowToPlanInput({ ...current, ...change }).ok).toBe(true);
    // Other edits, a blank, and a change that itself fills two are passed on unchanged (the last is refused).
    expect(withOneAirLeakageFigure(current, { wall_cavity_r: "R-15" })).toEqual({ wall_cavity_r: "R-15" });
    expect(withOneAirLeakageFigure(current, { blower_door_ach50: "" })).toEqual({ blower_door_ach50: "" });
    const two = withOneAirLeakageFigure(current, {
      blower_door_cfm50: "1100",
      effective_leakage_area_in2: "80",
    });
    expect(two).toEqual({ blower_door_cfm50: "1100", effective_leakage_area_in2: "80" });
    expect(rowToPlanInput({ ...current, ...two }).ok).toBe(false);
  });
});

describe("a second window group per facade", () => {
  it("blank area = no group; its other blank cells take the first group's values", () => {
    const input = read({
      ...BASE_ROW,
      back_window_u: "0.28",
      back_window_shgc: "0.22",
      back_overhang_depth_ft: "2'",
      back_window2_ft2: "40",
      back_window2_height_ft: "6'8\"",
    });
    expect(input.facades.back.extraWindows).toEqual([
      {
        areaFt2: 40,
        uFactor: 0.28,
        shgc: 0.22,
        interiorShadingCoefficient: 1,
        exteriorAttenuation: 1,
        windowHeightFt: 6 + 8 / 12,
        overhangDepthFt: 2,
        overhangHeightAboveHeadFt: 1,
      },
    ]);
    expect(input.facades.front.extraWindows).toEqual([]);
  });

  it("a group-2 cell filled without its area is an error naming the area column", () => {
    const result = rowToPlanInput({
      ...BASE_ROW,
      left_window2_shgc: "0.4",
      left_window2_overhang_depth_ft: "8'",
    });
    expect(result).toEqual({
      ok: false,
      errors: ["left_window2_shgc", "left_window2_overhang_depth_ft"].map((key) => ({
        key,
        header: header(key),
        reason: expect.stringContaining(`needs its area in "${header("left_window2_ft2")}"`),
      })),
    });
  });

  it("both groups count against the facade's wall, reported on the window column", () => {
    const result = rowToPlanInput({ ...BASE_ROW, front_window2_ft2: "320" }); // 50 + 320 > 360
    expect(result.ok).toBe(false);
    if (!result.ok)
      expect(result.errors).toEqual([
        {
          key: "front_window_ft2",
          header: header("front_window_ft2"),
          reason: expect.stringMatching(
            /windows \(370 ft²\) plus doors \(0 ft²\) exceed the front facade's gross wall area \(360 ft²\)/,
          ),
        },
      ]);
  });

  it("changes the loads of its facade: heating by U × A × ΔT of the group, cooling of that facade's windows only", () => {
    const without = computePlanFacings(read(BASE_ROW), site);
    const withGroup = computePlanFacings(
      read({ ...BASE_ROW, back_window2_ft2: "40", back_window2_u: "0.50", back_window2_shgc: "0.60" }),
      site,
    );
    // Heating, hand calculation: the group adds U·A·ΔT of glass and removes the same area of wall.
    const plan = read(BASE_ROW);
    const heatWithout = without.facings[0].heating.byComponent;
    const heatWith = withGroup.facings[0].heating.byComponent;
    expect(heatWith.windows - heatWithout.windows).toBeCloseTo(0.5 * 40 * HEATING_DT_F, 6);
    expect(heatWithout.walls - heatWith.walls).toBeCloseTo(
      wallU(plan.wall, "heating") * 40 * HEATING_DT_F,
      6,
    );
    for (const [index, facing] of withGroup.facings.entries()) {
      const before = without.facings[index];
      expect(facing.heating.totalBtuh).toBe(withGroup.facings[0].heating.totalBtuh); // heating does not depend on facing
      // More, and more solar-admitting, glass on the back raises the back's window gain at every facing.
      expect(facing.cooling.windowsByFacadeBtuh.back).toBeGreaterThan(
        before.cooling.windowsByFacadeBtuh.back,
      );
      expect(facing.cooling.totalBtuh).toBeGreaterThan(before.cooling.totalBtuh);
      const backRise = facing.cooling.windowsByFacadeBtuh.back / before.cooling.windowsByFacadeBtuh.back - 1;
      expect(backRise).toBeGreaterThan(0.3); // 40 ft² at SHGC 0.60 beside 60 ft² at 0.25
      if (facing.cooling.peakHour === before.cooling.peakHour) {
        // Same peak hour: the other facades' windows move only a little, because the zone's radiant
        // time series is chosen by the plan's share of glass, which the new group raises (well under
        // 1 % here, against the back's 30 % and more).
        for (const other of ["front", "left", "right"] as const) {
          const change = Math.abs(
            facing.cooling.windowsByFacadeBtuh[other] / before.cooling.windowsByFacadeBtuh[other] - 1,
          );
          expect(change).toBeLessThan(0.01);
        }
      }
    }
  });

  it("splitting a facade's glass into two like groups changes nothing; a deep overhang on group 2 lowers cooling only", () => {
    const oneGroup = computePlanFacings(read({ ...BASE_ROW, back_window_ft2: "100" }), site);
    const twoLike = computePlanFacings(
      read({ ...BASE_ROW, back_window_ft2: "60", back_window2_ft2: "40" }),
      site,
    );
    for (const [index, facing] of twoLike.facings.entries()) {
      expect(facing.heating.totalBtuh).toBeCloseTo(oneGroup.facings[index].heating.totalBtuh, 6);
      expect(facing.cooling.totalBtuh).toBeCloseTo(oneGroup.facings[index].cooling.totalBtuh, 6);
    }
    const shaded = computePlanFacings(
      read({
        ...BASE_ROW,
        back_window_ft2: "60",
        back_window2_ft2: "40",
        back_window2_overhang_depth_ft: "10'",
        back_window2_height_ft: "6'8\"",
      }),
      site,
    );
    // Front to N puts the back to the south, where an overhang shades the most.
    const south = (r: typeof shaded) => r.facings.find((f) => f.label === "N")!;
    expect(south(shaded).heating.totalBtuh).toBeCloseTo(south(twoLike).heating.totalBtuh, 6);
    expect(south(shaded).cooling.windowsByFacadeBtuh.back).toBeLessThan(
      south(twoLike).cooling.windowsByFacadeBtuh.back,
    );
  });

  it("an exterior attenuation lowers the solar gain of its own group only", () => {
    const open = computePlanFacings(read({ ...BASE_ROW, back_window2_ft2: "40" }), site);
    const screened = computePlanFacings(
      read({ ...BASE_ROW, back_window2_ft2: "40", back_window2_ext_attenuation: "0.5" }),
      site,
    );
    const n = (r: typeof open) => r.facings.find((f) => f.label === "N")!;
    expect(n(screened).cooling.windowsByFacadeBtuh.back).toBeLessThan(
      n(open).cooling.windowsByFacadeBtuh.back,
    );
    expect(n(screened).heating.totalBtuh).toBeCloseTo(n(open).heating.totalBtuh, 6);
    expect(
      read({ ...BASE_ROW, back_window2_ft2: "40", back_window2_ext_attenuation: "0.5" }).facades.back.window
        .exteriorAttenuation,
    ).toBe(1);
  });

  it("a third group cannot be written to the table and says so", () => {
    const three = parsePlanInput({
      ...DIRECT_PLAN,
      facades: {
        ...DIRECT_PLAN.facades,
        left: { ...DIRECT_PLAN.facades.left, extraWindows: [{ areaFt2: 10 }, { areaFt2: 12 }] },
      },
    });
    expect(() => planInputToRow(three, "X-3")).toThrow(PlanRowError);
    expect(() => planInputToRow(three, "X-3")).toThrow(
      /facades\.left\.extraWindows: the plan library table holds two window groups per facade and this facade has 3/,
    );
  });
});

describe("the U-factors the sheet shows", () => {
  it("a direct wall U-factor is shown as direct, with its value, and is what the heating load uses", () => {
    const input = read({ ...BASE_ROW, wall_u: "0.050", garage_wall_ft2: "200" });
    const walls = planAssemblies(input).find((a) => a.name === "Walls");
    expect(walls).toEqual({
      name: "Walls",
      appliesTo: "front, left, back, right facades; wall to garage",
      directKey: "wall_u",
      source: "direct",
      description: "direct U-factor",
      unit: "Btu/h·ft²·°F",
      heating: 0.05,
      cooling: 0.05,
    });
    // Hand calculation: net wall = gross − windows (1,520 − 170 ft²), × U × ΔT.
    const heating = computePlanFacings(input, site).facings[0].heating.byComponent.walls;
    expect(heating).toBeCloseTo(0.05 * (360 + 400 + 360 + 400 - (50 + 30 + 60 + 30)) * HEATING_DT_F, 6);
  });

  it("without a direct value, the base assembly and added insulation are shown with the U-factor computed from them", () => {
    const input = read({
      ...BASE_ROW,
      wall_base: "wood-2x6-16in-oc",
      wall_cavity_r: "R-20",
      wall_continuous_r: "R-5",
    });
    const walls = planAssemblies(input).find((a) => a.name === "Walls")!;
    expect(walls.source).toBe("assembly");
    expect(walls.description).toBe("wood-2x6-16in-oc + R-20 cavity + R-5 continuous");
    expect(walls.heating).toBe(wallU(input.wall, "heating"));
    expect(walls.cooling).toBe(wallU(input.wall, "cooling"));
    // A 2x6 wall with R-25 of insulation added lies well under U-0.07 and over U-0.03 (parallel paths, framing 25 %).
    expect(walls.heating).toBeGreaterThan(0.03);
    expect(walls.heating).toBeLessThan(0.07);
    const slab = planAssemblies(input).find((a) => a.name === "Slab edge")!;
    expect(slab).toMatchObject({
      source: "assembly",
      description: "uninsulated edge over block-8in-brick-facing",
      unit: "Btu/h·ft·°F",
      cooling: null,
    });
    // HoF 2021 ch. 18 Table 24, uninsulated edge over 8 in block with brick facing: 1.17 W/(m·K) → Btu/h·ft·°F.
    expect(slab.heating).toBeCloseTo(1.17 / 1.730735, 6);
    const metal = planAssemblies(read({ ...BASE_ROW, slab_edge_construction: "metal-stud-stucco" })).find(
      (a) => a.name === "Slab edge",
    )!;
    expect(metal.description).toBe("uninsulated edge over metal-stud-stucco");
    expect(metal.heating).toBeCloseTo(2.07 / 1.730735, 6); // the same table's metal-stud row
  });

  it("every direct value of the plan is listed as direct; one the engine does not use says why", () => {
    const rows = planAssemblies(DIRECT_PLAN);
    const byName = new Map(rows.map((row) => [row.name, row]));
    for (const [name, value] of [
      ["Walls", 0.048],
      ["Front facade wall", 0.11],
      ["Ceiling under the attic", 0.3],
      ["Roof deck", 0.05],
      ["Vaulted ceiling", 0.035],
      ["Floor over outdoors", 0.033],
      ["Floor over the garage", 0.031],
      ["Foundation wall above grade", 0.07],
      ["Foundation wall below grade", 0.07],
      ["Slab edge", 0.45],
    ] as const) {
      expect(byName.get(name), name).toMatchObject({ source: "direct", heating: value });
      expect(byName.get(name)?.notUsed, name).toBeUndefined();
    }
    expect(byName.get("Walls")?.appliesTo).toBe("left, back, right facades; wall to garage");
    const vented = read({ ...BASE_ROW, roof_deck_u: "0.05" });
    expect(planAssemblies(vented).find((a) => a.name === "Roof deck")).toMatchObject({
      source: "direct",
      notUsed: expect.stringMatching(/vented attic's roof deck is not insulated/),
    });
  });
});

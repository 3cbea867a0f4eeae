import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { LOAD_PROCEDURES } from "@/lib/load";
import { PROCEDURE_STATEMENTS } from "@/lib/reports/procedure-text";

const root = path.resolve(__dirname, "../../..");

function calc(...args: string[]): { status: number | null; stdout: string; stderr: string } {
  const result = spawnSync("npx", ["tsx", "scripts/calc.ts", ...args], {
    cwd: root,
    encoding: "utf8",
    timeout: 120_000,
  });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

describe("npm run calc (scripts/calc.ts)", { timeout: 120_000 }, () => {
  for (const procedure of LOAD_PROCEDURES) {
    it(`--procedure ${procedure}: every plan and facing of the example library, the worst facing, the procedure, the engine version and the caution`, () => {
      const { status, stdout, stderr } = calc(
        "templates/example-plans.csv",
        "--site",
        "templates/example-site.json",
        "--procedure",
        procedure,
      );
      expect(stderr).toBe("");
      expect(status).toBe(0);
      for (const code of ["WF-1480", "WF-1860", "WF-2240", "WF-2650", "WF-3150"])
        expect(stdout).toContain(code);
      expect(stdout).toMatch(
        /Facing\s+Heating Btu\/h\s+Cool sens\. Btu\/h\s+Cool lat\. Btu\/h\s+Cool total Btu\/h\s+Tons\s+ft²\/ton/,
      );
      for (const facing of ["N", "E", "S", "W"]) {
        // One aligned row per plan and facing: label then six numbers.
        const rows = stdout
          .split("\n")
          .filter((line) => new RegExp(`^\\s+front ${facing}(\\s+[\\d,.]+){6}\\s*$`).test(line));
        expect(rows).toHaveLength(5);
      }
      expect(
        stdout.match(
          /Worst facing: front [NESW] \(cooling total [\d,]+ Btu\/h\); spread between facings [\d,]+ Btu\/h/g,
        ),
      ).toHaveLength(5);
      expect(stdout.split("\n")[0]).toBe(`Load procedure: ${PROCEDURE_STATEMENTS[procedure]}`);
      expect(stdout).toMatch(new RegExp(`Engine version \\d+\\.\\d+\\.\\d+, load procedure ${procedure}\n`));
      expect(stdout).toMatch(/design estimates.*licensed professional govern/);
    });
  }

  it("without --procedure, the handbook's residential procedure is used and named", () => {
    const { status, stdout } = calc("templates/example-plans.csv", "--site", "templates/example-site.json");
    expect(status).toBe(0);
    expect(stdout.split("\n")[0]).toBe(`Load procedure: ${PROCEDURE_STATEMENTS["residential-load-factor"]}`);
    expect(stdout).toContain("load procedure residential-load-factor");
    const hourly = calc(
      "templates/example-plans.csv",
      "--site",
      "templates/example-site.json",
      "--procedure",
      "hourly",
    );
    expect(hourly.stdout.split("\n").slice(1, -3)).not.toEqual(stdout.split("\n").slice(1, -3));
  });

  it("takes design conditions as flags and prints the full results with --json: the hourly method with its 24-hour profile", () => {
    const { status, stdout } = calc(
      "templates/plan-library-template.csv",
      "--heating-db",
      "24",
      "--cooling-db",
      "99",
      "--cooling-wb",
      "75",
      "--daily-range",
      "20",
      "--latitude",
      "32.9",
      "--elevation",
      "600",
      "--procedure",
      "hourly",
      "--json",
    );
    expect(status).toBe(0);
    const report = JSON.parse(stdout) as {
      engineVersion: string;
      procedure: string;
      caution: string;
      plans: {
        planCode: string;
        results: {
          procedure: string;
          facings: {
            label: string;
            procedure: string;
            heating: { totalBtuh: number };
            cooling: { totalBtuh: number; peakHour: number | null; hourlySensibleBtuh: number[] };
          }[];
        };
      }[];
    };
    expect(report.caution).toMatch(/licensed professional/);
    expect(report.procedure).toBe("hourly");
    expect(report.plans.map((plan) => plan.planCode)).toEqual(["SAMPLE-1500"]);
    expect(report.plans[0].results.procedure).toBe("hourly");
    const facings = report.plans[0].results.facings;
    expect(facings.map((facing) => facing.label)).toEqual(["N", "E", "S", "W"]);
    for (const facing of facings) {
      expect(facing.procedure).toBe("hourly");
      expect(facing.heating.totalBtuh).toBeGreaterThan(0);
      expect(facing.cooling.totalBtuh).toBeGreaterThan(0);
      expect(facing.cooling.hourlySensibleBtuh).toHaveLength(24);
      expect(facing.cooling.peakHour).toBeGreaterThanOrEqual(1);
    }
  });

  it("--json by the load-factor procedure: the peak only, no peak hour and no profile", () => {
    const { status, stdout } = calc(
      "templates/example-plans.csv",
      "--site",
      "templates/example-site.json",
      "--procedure",
      "residential-load-factor",
      "--json",
    );
    expect(status).toBe(0);
    const report = JSON.parse(stdout) as {
      procedure: string;
      plans: {
        results: {
          procedure: string;
          facings: {
            cooling: { totalBtuh: number; peakHour: number | null; hourlySensibleBtuh: number[] };
          }[];
        };
      }[];
    };
    expect(report.procedure).toBe("residential-load-factor");
    for (const plan of report.plans) {
      expect(plan.results.procedure).toBe("residential-load-factor");
      for (const facing of plan.results.facings) {
        expect(facing.cooling.totalBtuh).toBeGreaterThan(0);
        expect(facing.cooling.peakHour).toBeNull();
        expect(facing.cooling.hourlySensibleBtuh).toEqual([]);
      }
    }
  });

  it("an unknown --procedure exits 2 naming the choices, with nothing on stdout", () => {
    const { status, stdout, stderr } = calc(
      "templates/example-plans.csv",
      "--site",
      "templates/example-site.json",
      "--procedure",
      "monthly",
    );
    expect(status).toBe(2);
    expect(stdout).toBe("");
    expect(stderr).toContain(
      "--procedure monthly: not a load procedure; use residential-load-factor or hourly",
    );
    const missing = calc(
      "templates/example-plans.csv",
      "--site",
      "templates/example-site.json",
      "--procedure",
    );
    expect(missing.status).toBe(2);
    expect(missing.stderr).toContain("--procedure needs a value");
  });

  it("a bad plan file: every bad cell by row, column and reason, exit code 2, nothing printed on stdout", () => {
    const { status, stdout, stderr } = calc(
      "tests/fixtures/workbook/bad-plans.csv",
      "--site",
      "templates/example-site.json",
    );
    expect(status).toBe(2);
    expect(stdout).toBe("");
    expect(stderr).toContain(
      'row 2, column "Conditioned floor area (ft²)": "fifteen hundred" is not a number',
    );
    expect(stderr).toContain('row 3, column "Back windows (ft²)": -95 is negative');
    expect(stderr).toContain(
      'row 4, column "Ceiling insulation R (added)": ft² is a unit of area; this column takes R-value',
    );
    expect(stderr).toContain('row 5, column "Plan code": plan code "WF-1480" is already used on row 2');
  });

  it("reads the direct inputs and a second window group from a table, says which U-factors were entered, and refuses two leakage figures", () => {
    const dir = mkdtempSync(path.join(tmpdir(), "platload-calc-"));
    const headers = [
      "Plan code",
      "Plan name",
      "conditioned_area_ft2",
      "bedrooms",
      "front_wall_ft2",
      "left_wall_ft2",
      "back_wall_ft2",
      "right_wall_ft2",
      "back_window_ft2",
      "back_window2_ft2",
      "wall_u",
      "effective_leakage_area_in2",
      "slab_perimeter_ft",
      "slab_f_factor",
    ];
    const good = path.join(dir, "direct.csv");
    writeFileSync(
      good,
      `${headers.join(",")}\r\nD-1,Direct,1600,3,360,400,360,400,60,40,0.050 U,85 in²,160,F-0.45\r\n`,
    );
    const result = calc(good, "--site", "templates/example-site.json");
    expect(result.stderr).toBe("");
    expect(result.status).toBe(0);
    expect(result.stdout).toContain("Air leakage: 85 in² effective leakage area");
    expect(result.stdout).toMatch(
      /Heating U-factors used .*Walls 0\.050 \(direct U-factor\); Ceiling under the attic 0\.\d{3} \(from attic-joists-24in-oc \+ R-38 insulation\); Slab edge 0\.450 \(direct F-factor\)/,
    );
    const twice = path.join(dir, "twice.csv");
    writeFileSync(
      twice,
      `${[...headers, "blower_door_ach50"].join(",")}\r\nD-1,Direct,1600,3,360,400,360,400,60,40,0.050 U,85 in²,160,F-0.45,4\r\n`,
    );
    const refused = calc(twice, "--site", "templates/example-site.json");
    expect(refused.status).toBe(2);
    expect(refused.stdout).toBe("");
    expect(refused.stderr).toContain(
      'row 2, column "Air leakage (ACH50)": give one air-leakage figure per plan: "Air leakage (ACH50)" and "Air leakage (effective leakage area, in²)" are both filled',
    );
    // A JSON plan may carry the command's own planCode beside the engine's strict input.
    const json = path.join(dir, "plan.json");
    const walls = { grossWallAreaFt2: 300 };
    writeFileSync(
      json,
      JSON.stringify({
        plans: [
          {
            planCode: "J-1",
            conditionedFloorAreaFt2: 1500,
            bedrooms: 3,
            facades: { front: walls, left: walls, back: walls, right: walls },
            infiltration: { cfm50: 900 },
          },
        ],
      }),
    );
    const fromJson = calc(json, "--site", "templates/example-site.json");
    expect(fromJson.status).toBe(0);
    expect(fromJson.stdout).toContain("J-1");
    expect(fromJson.stdout).toContain("Air leakage: 900 CFM50");
  });

  it("bad design conditions and bad JSON plans also exit 2 with the field and valid range", () => {
    const badSite = calc(
      "templates/example-plans.csv",
      "--heating-db",
      "24",
      "--cooling-db",
      "99",
      "--cooling-wb",
      "75",
      "--daily-range",
      "20",
      "--latitude",
      "95",
      "--elevation",
      "600",
    );
    expect(badSite.status).toBe(2);
    expect(badSite.stderr).toMatch(
      /--latitude \/ latitudeDeg: 95 is out of range \(valid range -66 to 66 °\)/,
    );
    const dir = mkdtempSync(path.join(tmpdir(), "platload-calc-"));
    const planFile = path.join(dir, "plans.json");
    writeFileSync(planFile, JSON.stringify([{ conditionedFloorAreaFt2: 40, bedrooms: 2 }]));
    const badPlan = calc(planFile, "--site", "templates/example-site.json");
    expect(badPlan.status).toBe(2);
    expect(badPlan.stderr).toMatch(
      /plan 1, field conditionedFloorAreaFt2: 40 is out of range \(valid range 100 to 50000 ft²\)/,
    );
    const noSite = calc("templates/example-plans.csv");
    expect(noSite.status).toBe(2);
    expect(noSite.stderr).toMatch(/design conditions are needed/);
  });
});

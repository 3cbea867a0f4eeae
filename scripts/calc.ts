/**
 * Command-line load calculation:
 *
 *   npm run calc -- FILE [--site site.json] [--heating-db F --cooling-db F --cooling-wb F
 *                   --daily-range F --latitude DEG --elevation FT [--longitude DEG]
 *                   [--design-month N] [--indoor-heating F] [--indoor-cooling F] [--indoor-rh PCT]]
 *                   [--procedure residential-load-factor|hourly] [--json]
 *
 * FILE is a plan library (.csv or .xlsx in the layout of templates/) or JSON of the engine's
 * plan input (one plan, an array of plans, or { "plans": [...] }). Design conditions come from
 * --site (JSON of the engine's site conditions) and/or the flags (flags override the file).
 *
 * --procedure names the load procedure (default: the handbook's residential load-factor
 * procedure, as for a new account).
 *
 * Prints, for every plan and facing (front to N, E, S, W), the heating load, cooling sensible,
 * latent and total, tons and ft² per ton, the worst facing and the spread; per plan the air
 * leakage as given and the heating U-factor of each assembly with where it came from (entered
 * directly or computed from the base assembly and added insulation); the procedure, the engine
 * version and the caution line. --json prints the full results instead. A JSON plan may carry a
 * `planCode` beside the engine's fields (the engine's input is strict, so it is taken off first).
 *
 * Exit codes: 0 done; 2 bad input (every bad cell listed: row, column, reason); 1 unexpected failure.
 */
import { readFile } from "node:fs/promises";
import path from "node:path";
import { LoadInputError } from "../lib/load/errors";
import {
  computePlanFacings,
  DEFAULT_LOAD_PROCEDURE,
  ENGINE_VERSION,
  LOAD_PROCEDURE_LABELS,
  LOAD_PROCEDURES,
  type LoadProcedure,
} from "../lib/load/index";
import { PROCEDURE_STATEMENTS } from "../lib/reports/procedure-text";
import {
  safeParsePlanInput,
  safeParseSiteConditions,
  type PlanInput,
  type SiteConditions,
} from "../lib/load/input";
import { formatTableErrors } from "../lib/workbook/columns";
import { airLeakageText, planAssemblies } from "../lib/workbook/plan-assemblies";
import { columnForEnginePath, validatePlanTable } from "../lib/workbook/plan-columns";
import { readTableFile, TableFileError } from "../lib/workbook/table-io";
import { readQuantity } from "../lib/workbook/units";

const CAUTION =
  "Caution: these are design estimates, by the handbook's published residential load-factor procedure as implemented in Platload or by " +
  "Platload's own hourly method (named above); neither is a certified implementation or any standard's approved procedure. " +
  "Local codes and the review of a licensed professional govern equipment sizing.";

const USAGE = `usage: npm run calc -- FILE [--site site.json] [--heating-db F] [--cooling-db F] [--cooling-wb F]
       [--daily-range F] [--latitude DEG] [--elevation FT] [--longitude DEG] [--design-month N]
       [--indoor-heating F] [--indoor-cooling F] [--indoor-rh PCT] [--procedure ${LOAD_PROCEDURES.join("|")}] [--json]
FILE: a plan library .csv or .xlsx (layout of templates/) or a .json plan input (one, an array, or {"plans": [...]}).
--procedure: the load procedure (default ${DEFAULT_LOAD_PROCEDURE}: ${LOAD_PROCEDURE_LABELS[DEFAULT_LOAD_PROCEDURE]}).`;

/** Bad input: the message is printed as is and the exit code is 2. */
class InputProblem extends Error {}

type SiteFlag = {
  flag: string;
  field: keyof SiteConditions;
  kind: "temperatureF" | "temperatureDifferenceF" | "degrees" | "lengthFt" | "count" | "percent";
};

const SITE_FLAGS: readonly SiteFlag[] = [
  { flag: "--heating-db", field: "heatingOutdoorDbF", kind: "temperatureF" },
  { flag: "--cooling-db", field: "coolingOutdoorDbF", kind: "temperatureF" },
  { flag: "--cooling-wb", field: "coolingOutdoorWbF", kind: "temperatureF" },
  { flag: "--daily-range", field: "dailyRangeF", kind: "temperatureDifferenceF" },
  { flag: "--latitude", field: "latitudeDeg", kind: "degrees" },
  { flag: "--longitude", field: "longitudeDeg", kind: "degrees" },
  { flag: "--elevation", field: "elevationFt", kind: "lengthFt" },
  { flag: "--design-month", field: "designMonth", kind: "count" },
  { flag: "--indoor-heating", field: "indoorHeatingF", kind: "temperatureF" },
  { flag: "--indoor-cooling", field: "indoorCoolingF", kind: "temperatureF" },
  { flag: "--indoor-rh", field: "indoorCoolingRhPct", kind: "percent" },
];

interface Options {
  file: string;
  sitePath?: string;
  siteFlags: Map<SiteFlag, number>;
  procedure: LoadProcedure;
  json: boolean;
}

function parseArgs(argv: readonly string[]): Options {
  let file: string | undefined;
  let sitePath: string | undefined;
  let json = false;
  let procedure: LoadProcedure = DEFAULT_LOAD_PROCEDURE;
  const siteFlags = new Map<SiteFlag, number>();
  for (let index = 0; index < argv.length; index += 1) {
    const arg = argv[index];
    if (arg === "--json") {
      json = true;
      continue;
    }
    if (arg === "--help" || arg === "-h") throw new InputProblem(USAGE);
    const [name, inlineValue] =
      arg.startsWith("--") && arg.includes("=")
        ? [arg.slice(0, arg.indexOf("=")), arg.slice(arg.indexOf("=") + 1)]
        : [arg, undefined];
    const takeValue = (): string => {
      if (inlineValue !== undefined) return inlineValue;
      const next = argv[index + 1];
      if (next === undefined || (next.startsWith("--") && !/^--?\d/.test(next)))
        throw new InputProblem(`${name} needs a value\n${USAGE}`);
      index += 1;
      return next;
    };
    if (name === "--site") {
      sitePath = takeValue();
      continue;
    }
    if (name === "--procedure") {
      const text = takeValue();
      const known = LOAD_PROCEDURES.find((candidate) => candidate === text);
      if (!known)
        throw new InputProblem(
          `--procedure ${text}: not a load procedure; use ${LOAD_PROCEDURES.join(" or ")}\n${USAGE}`,
        );
      procedure = known;
      continue;
    }
    const siteFlag = SITE_FLAGS.find((candidate) => candidate.flag === name);
    if (siteFlag) {
      const text = takeValue();
      const reading = readQuantity(text, siteFlag.kind);
      if (!reading.ok) throw new InputProblem(`${name} ${text}: ${reading.reason}`);
      siteFlags.set(siteFlag, reading.value);
      continue;
    }
    if (name.startsWith("--")) throw new InputProblem(`unknown option ${name}\n${USAGE}`);
    if (file !== undefined) throw new InputProblem(`one FILE only (got ${file} and ${arg})\n${USAGE}`);
    file = arg;
  }
  if (file === undefined) throw new InputProblem(`FILE is missing\n${USAGE}`);
  return { file, sitePath, siteFlags, procedure, json };
}

async function readJsonFile(filePath: string, what: string): Promise<unknown> {
  let text: string;
  try {
    text = await readFile(filePath, "utf8");
  } catch (error) {
    throw new InputProblem(
      `cannot read ${what} ${filePath}: ${error instanceof Error ? error.message : String(error)}`,
    );
  }
  try {
    return JSON.parse(text) as unknown;
  } catch (error) {
    throw new InputProblem(
      `${what} ${filePath} is not valid JSON: ${error instanceof Error ? error.message : String(error)}`,
    );
  }
}

async function loadSite(options: Options): Promise<{ site: SiteConditions; notes: string[] }> {
  const notes: string[] = [];
  let raw: Record<string, unknown> = {};
  if (options.sitePath) {
    const fromFile = await readJsonFile(options.sitePath, "site file");
    if (typeof fromFile !== "object" || fromFile === null || Array.isArray(fromFile)) {
      throw new InputProblem(`site file ${options.sitePath} must hold one JSON object of design conditions`);
    }
    raw = { ...(fromFile as Record<string, unknown>) };
  } else if (options.siteFlags.size === 0) {
    throw new InputProblem(
      `design conditions are needed: --site site.json or the flags --heating-db, --cooling-db, --cooling-wb, --daily-range, --latitude, --elevation\n${USAGE}`,
    );
  }
  for (const [flag, value] of options.siteFlags) raw[flag.field] = value;
  if (raw.longitudeDeg === undefined && !options.sitePath) {
    // The design day is computed in solar time, so the loads do not depend on longitude.
    raw.longitudeDeg = 0;
    notes.push("longitude not given (--longitude): 0 used; the design day is computed in solar time.");
  }
  const parsed = safeParseSiteConditions(raw);
  if (!parsed.ok) {
    const byField = new Map(SITE_FLAGS.map((flag) => [flag.field as string, flag.flag]));
    const lines = parsed.issues.map((issue) => {
      const source =
        options.siteFlags.size > 0 && byField.has(issue.field) ? `${byField.get(issue.field)} / ` : "";
      return `design conditions, ${source}${issue.field}: ${issue.message}`;
    });
    throw new InputProblem(lines.join("\n"));
  }
  return { site: parsed.value, notes };
}

interface NamedPlan {
  planCode: string;
  planName: string;
  input: PlanInput;
  /** Where the plan came from, for messages: "row 3" of a table or "plan 2" of a JSON file. */
  source: string;
}

async function loadPlans(filePath: string): Promise<NamedPlan[]> {
  const extension = path.extname(filePath).toLowerCase();
  if (extension === ".json") {
    const raw = await readJsonFile(filePath, "plan file");
    const list: unknown[] = Array.isArray(raw)
      ? raw
      : typeof raw === "object" && raw !== null && Array.isArray((raw as { plans?: unknown }).plans)
        ? (raw as { plans: unknown[] }).plans
        : [raw];
    const problems: string[] = [];
    const plans: NamedPlan[] = [];
    list.forEach((item, index) => {
      // planCode is this command's own label beside the engine's (strict) plan input.
      const { planCode, ...planFields } =
        typeof item === "object" && item !== null && !Array.isArray(item)
          ? (item as Record<string, unknown>)
          : { planCode: undefined };
      const parsed = safeParsePlanInput(
        typeof item === "object" && item !== null && !Array.isArray(item) ? planFields : item,
      );
      const label = `plan ${index + 1}`;
      if (!parsed.ok) {
        for (const issue of parsed.issues) problems.push(`${label}, field ${issue.field}: ${issue.message}`);
        return;
      }
      const code = typeof planCode === "string" ? planCode : `plan-${index + 1}`;
      plans.push({ planCode: code, planName: parsed.value.name ?? code, input: parsed.value, source: label });
    });
    if (problems.length > 0)
      throw new InputProblem(
        `${filePath}: ${problems.length} bad field(s); nothing was calculated\n${problems.join("\n")}`,
      );
    if (plans.length === 0) throw new InputProblem(`${filePath}: no plans in the file`);
    return plans;
  }
  let bytes: Uint8Array;
  try {
    bytes = new Uint8Array(await readFile(filePath));
  } catch (error) {
    throw new InputProblem(
      `cannot read ${filePath}: ${error instanceof Error ? error.message : String(error)}`,
    );
  }
  let table;
  try {
    table = await readTableFile(filePath, bytes);
  } catch (error) {
    if (error instanceof TableFileError) throw new InputProblem(`${filePath}: ${error.message}`);
    throw error;
  }
  const result = validatePlanTable(table);
  if (!result.ok) {
    throw new InputProblem(
      `${filePath}: ${result.errors.length} bad cell(s); nothing was calculated\n${formatTableErrors(result.errors)}`,
    );
  }
  return result.plans.map(({ planCode, planName, input, rowNumber }) => ({
    planCode,
    planName,
    input,
    source: `row ${rowNumber}`,
  }));
}

const integer = new Intl.NumberFormat("en-US", { maximumFractionDigits: 0 });
const oneDecimal = new Intl.NumberFormat("en-US", { minimumFractionDigits: 1, maximumFractionDigits: 1 });
const twoDecimals = new Intl.NumberFormat("en-US", { minimumFractionDigits: 2, maximumFractionDigits: 2 });

/** Columns right-aligned except the first; widths fitted to the longest cell. */
function alignTable(header: readonly string[], rows: readonly (readonly string[])[]): string[] {
  const widths = header.map((title, column) =>
    Math.max(title.length, ...rows.map((row) => row[column].length)),
  );
  const line = (cells: readonly string[]) =>
    cells
      .map((cell, column) => (column === 0 ? cell.padEnd(widths[column]) : cell.padStart(widths[column])))
      .join("  ");
  return [line(header), widths.map((width) => "-".repeat(width)).join("  "), ...rows.map(line)];
}

function printTable(
  plans: readonly NamedPlan[],
  results: readonly ReturnType<typeof computePlanFacings>[],
  site: SiteConditions,
  notes: readonly string[],
  procedure: LoadProcedure,
): void {
  const out: string[] = [];
  out.push(`Load procedure: ${PROCEDURE_STATEMENTS[procedure]}`);
  out.push(
    `Design conditions: ${site.name ?? "(unnamed site)"}; latitude ${site.latitudeDeg}°, elevation ${integer.format(site.elevationFt)} ft; ` +
      `heating ${site.heatingOutdoorDbF} °F outdoor / ${site.indoorHeatingF} °F indoor; cooling ${site.coolingOutdoorDbF} °F dry bulb, ` +
      `${site.coolingOutdoorWbF} °F wet bulb, daily range ${site.dailyRangeF} °F / ${site.indoorCoolingF} °F, ${site.indoorCoolingRhPct} % RH indoor`,
  );
  for (const note of notes) out.push(`Note: ${note}`);
  out.push("");
  plans.forEach((plan, index) => {
    const result = results[index];
    const input = plan.input;
    out.push(
      `${plan.planCode}  ${plan.planName}  (${integer.format(input.conditionedFloorAreaFt2)} ft², ${input.stories} ${input.stories === 1 ? "story" : "stories"}, ${input.bedrooms} bedrooms)`,
    );
    const rows = result.facings.map((facing) => [
      `front ${facing.label}`,
      integer.format(facing.heating.totalBtuh),
      integer.format(facing.cooling.sensibleBtuh),
      integer.format(facing.cooling.latentBtuh),
      integer.format(facing.cooling.totalBtuh),
      twoDecimals.format(facing.cooling.tons),
      integer.format(facing.cooling.floorAreaPerTonFt2),
    ]);
    out.push(
      ...alignTable(
        [
          "Facing",
          "Heating Btu/h",
          "Cool sens. Btu/h",
          "Cool lat. Btu/h",
          "Cool total Btu/h",
          "Tons",
          "ft²/ton",
        ],
        rows,
      ).map((line) => `  ${line}`),
    );
    const spreadPct =
      result.worst.coolingTotalBtuh > 0
        ? (100 * result.coolingSpreadBtuh) / result.worst.coolingTotalBtuh
        : 0;
    out.push(
      `  Worst facing: front ${result.worst.label} (cooling total ${integer.format(result.worst.coolingTotalBtuh)} Btu/h); ` +
        `spread between facings ${integer.format(result.coolingSpreadBtuh)} Btu/h (${oneDecimal.format(spreadPct)} % of the worst)`,
    );
    // Where each U-factor came from: entered directly or computed from the base assembly and added R.
    out.push(`  Air leakage: ${airLeakageText(input)}`);
    const assemblies = planAssemblies(input).map((a) => {
      const from = a.source === "direct" ? a.description : `from ${a.description}`;
      return `${a.name} ${a.heating.toFixed(3)} (${from}${a.notUsed ? `; entered but not used: ${a.notUsed}` : ""})`;
    });
    out.push(
      `  Heating U-factors used (Btu/h·ft²·°F; slab edge F-factor, Btu/h·ft·°F): ${assemblies.join("; ")}`,
    );
    // The engine's notes on assumed defaults, once per plan.
    const assumptions = [...new Set(result.facings.flatMap((facing) => facing.notes))];
    for (const note of assumptions) out.push(`  Assumed: ${note}`);
    out.push("");
  });
  out.push(`Engine version ${ENGINE_VERSION}, load procedure ${procedure}`);
  out.push(CAUTION);
  console.log(out.join("\n"));
}

async function main(): Promise<number> {
  let options: Options;
  let site: SiteConditions;
  let notes: string[];
  let plans: NamedPlan[];
  try {
    options = parseArgs(process.argv.slice(2));
    ({ site, notes } = await loadSite(options));
    plans = await loadPlans(options.file);
  } catch (error) {
    if (error instanceof InputProblem) {
      console.error(error.message);
      return 2;
    }
    throw error;
  }
  const results: ReturnType<typeof computePlanFacings>[] = [];
  const refused: string[] = [];
  for (const plan of plans) {
    try {
      results.push(computePlanFacings(plan.input, site, { procedure: options.procedure }));
    } catch (error) {
      if (!(error instanceof LoadInputError)) throw error;
      for (const issue of error.issues) {
        const column = columnForEnginePath(issue.field);
        refused.push(
          `${plan.source} (${plan.planCode})${column ? `, column "${column.header}"` : ""}, field ${issue.field}: ${issue.message}`,
        );
      }
    }
  }
  if (refused.length > 0) {
    console.error(
      `${options.file}: the engine refused ${refused.length} input(s); nothing was printed\n${refused.join("\n")}`,
    );
    return 2;
  }
  if (options.json) {
    const report = {
      engineVersion: ENGINE_VERSION,
      procedure: options.procedure,
      procedureLabel: LOAD_PROCEDURE_LABELS[options.procedure],
      caution: CAUTION,
      notes,
      site,
      plans: plans.map((plan, index) => ({
        planCode: plan.planCode,
        planName: plan.planName,
        input: plan.input,
        results: results[index],
      })),
    };
    console.log(JSON.stringify(report, null, 2));
  } else {
    printTable(plans, results, site, notes, options.procedure);
  }
  return 0;
}

main().then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    console.error(`calc failed: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
    process.exitCode = 1;
  },
);

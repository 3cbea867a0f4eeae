/**
 * Permit-packet benchmark: 100 lots of the invented example community (templates/), each
 * computed by the engine, given a system from the example catalog, mapped to a LotReport and
 * rendered into one PDF. Figures are printed, never asserted; the goal is well under 10 s.
 *
 *   npx tsx scripts/bench/packet.ts
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { loadsFromFacing, selectEquipment } from "../../lib/equipment";
import {
  computeFacingLoads,
  LOAD_PROCEDURES,
  LoadInputError,
  parseSiteConditions,
  type LoadProcedure,
} from "../../lib/load";
import {
  lotReportFromResults,
  renderLotReportsPdf,
  systemChoiceFromSelection,
  type LotReport,
} from "../../lib/reports";
import { catalogForHeatingDesign, validateEquipmentTable } from "../../lib/workbook/equipment-columns";
import { validatePlanTable } from "../../lib/workbook/plan-columns";
import { readCsv } from "../../lib/workbook/table-io";

const templatesDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..", "..", "templates");
const readTemplate = (name: string) => readFileSync(path.join(templatesDir, name), "utf8");

export interface PacketBenchResult {
  lots: number;
  buildMs: number;
  renderMs: number;
  bytes: number;
  lines: string[];
}

function msSince(start: bigint): number {
  return Number(process.hrtime.bigint() - start) / 1e6;
}

/** 100 LotReports from engine output (by one procedure) over the example plans at assorted facings. */
export function examplePacketReports(lotCount = 100, procedure: LoadProcedure = "hourly"): LotReport[] {
  const plans = validatePlanTable(readCsv(readTemplate("example-plans.csv")));
  if (!plans.ok) throw new Error("templates/example-plans.csv does not validate");
  const siteRaw: unknown = JSON.parse(readTemplate("example-site.json"));
  const site = parseSiteConditions(siteRaw);
  const catalogTable = validateEquipmentTable(readCsv(readTemplate("example-equipment.csv")));
  if (!catalogTable.ok) throw new Error("templates/example-equipment.csv does not validate");
  const catalog = catalogForHeatingDesign(catalogTable.systems, site.heatingOutdoorDbF);
  const generatedAt = new Date().toISOString();
  return Array.from({ length: lotCount }, (_, i) => {
    const plan = plans.plans[i % plans.plans.length];
    const facingDeg = (i * 45) % 360;
    const loads = computeFacingLoads(plan.input, site, facingDeg, { validated: true, procedure });
    const selection = selectEquipment({ loads: loadsFromFacing(loads), catalog });
    return lotReportFromResults({
      builderAccountName: "Wrenfield Homes (invented)",
      communityName: "Prairie Lantern (invented)",
      lot: { lotNumber: String(1 + i), address: `${100 + 4 * i} Lantern Way` },
      plan: {
        code: plan.planCode,
        name: plan.planName,
        revisionNumber: 1 + (i % 3),
        status: i % 4 === 0 ? "draft" : "approved",
        input: plan.input,
      },
      site: siteRaw,
      loads,
      selection: systemChoiceFromSelection(selection),
      approval:
        i % 4 === 0
          ? null
          : { reviewerName: "Morgan Ellery (invented)", credential: "PE", approvedOn: "2026-11-28" },
      generatedAt,
    });
  });
}

/** The 100-lot packet by each procedure the engine runs (the PDF differs: a peak-only procedure draws no profile). */
export async function benchPacket(): Promise<PacketBenchResult[]> {
  const results: PacketBenchResult[] = [];
  for (const procedure of LOAD_PROCEDURES) {
    try {
      // Warm-up (JIT, font metrics), not timed.
      await renderLotReportsPdf(examplePacketReports(2, procedure));
    } catch (error) {
      if (!(error instanceof LoadInputError)) throw error;
      console.log(`permit packet, ${procedure}: not run, the engine refuses it (${error.message})`);
      continue;
    }
    const lots = 100;
    const buildStart = process.hrtime.bigint();
    const reports = examplePacketReports(lots, procedure);
    const buildMs = msSince(buildStart);
    const renderStart = process.hrtime.bigint();
    const pdf = await renderLotReportsPdf(reports);
    const renderMs = msSince(renderStart);
    const lines = [
      `permit packet, ${procedure} (${lots} lots, one PDF, Node ${process.version})`,
      `  engine + selection + report data : ${buildMs.toFixed(0)} ms`,
      `  renderLotReportsPdf              : ${renderMs.toFixed(0)} ms`,
      `  PDF size                         : ${(pdf.byteLength / 1e6).toFixed(2)} MB`,
      `  target                           : a 100-lot packet well under 10,000 ms`,
    ];
    for (const line of lines) console.log(line);
    results.push({ lots, buildMs, renderMs, bytes: pdf.byteLength, lines });
  }
  return results;
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  benchPacket().catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : String(error));
    process.exit(1);
  });
}

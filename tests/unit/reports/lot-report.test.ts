/**
 * Per-lot load reports: a 3-lot packet rendered from real engine output (the invented example
 * plans and site of templates/), its text read back with pdf-parse (an independent PDF text
 * extractor), and the mapping from engine output to report data.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { PDFParse } from "pdf-parse";
import { beforeAll, describe, expect, it } from "vitest";
import { DEFAULT_SIZING_LIMITS, loadsFromFacing, selectEquipment } from "@/lib/equipment";
import {
  ENGINE_VERSION,
  LOAD_PROCEDURE_LABELS,
  LoadInputError,
  computeFacingLoads,
  parseSiteConditions,
  type FacingLoads,
  type LoadProcedure,
} from "@/lib/load";
import {
  PEAK_ONLY_NOTE,
  PROCEDURE_SHORT_LABELS,
  PROCEDURE_STATEMENTS,
  REPORT_CAUTION,
  ReportInputError,
  compassLabel,
  lotReportFromResults,
  pdfSafeText,
  renderLotReportsPdf,
  systemChoiceFromSelection,
  type LotReport,
  type LotReportSource,
} from "@/lib/reports";
import {
  catalogForHeatingDesign,
  validateEquipmentTable,
  type EquipmentCatalogEntry,
} from "@/lib/workbook/equipment-columns";
import { validatePlanTable, type ValidPlanRow } from "@/lib/workbook/plan-columns";
import { readCsv } from "@/lib/workbook/table-io";

const templates = path.resolve(__dirname, "../../../templates");
const readTemplate = (name: string) => readFileSync(path.join(templates, name), "utf8");

const planTable = validatePlanTable(readCsv(readTemplate("example-plans.csv")));
if (!planTable.ok) throw new Error("templates/example-plans.csv does not validate");
const PLANS: ValidPlanRow[] = planTable.plans;
const SITE_RAW: unknown = JSON.parse(readTemplate("example-site.json"));
const SITE = parseSiteConditions(SITE_RAW);
const catalogTable = validateEquipmentTable(readCsv(readTemplate("example-equipment.csv")));
if (!catalogTable.ok) throw new Error("templates/example-equipment.csv does not validate");
const CATALOG: EquipmentCatalogEntry[] = catalogForHeatingDesign(
  catalogTable.systems,
  SITE.heatingOutdoorDbF,
);

const GENERATED_AT = "2026-12-01T15:30:00.000Z";

function sourceFor(
  index: number,
  overrides: Partial<LotReportSource> = {},
  procedure: LoadProcedure = "hourly",
): LotReportSource {
  const plan = PLANS[index % PLANS.length];
  const facingDeg = [0, 90, 225][index % 3];
  const loads = computeFacingLoads(plan.input, SITE, facingDeg, { procedure });
  const selection = selectEquipment({ loads: loadsFromFacing(loads), catalog: CATALOG });
  return {
    builderAccountName: "Wrenfield Homes (invented)",
    communityName: "Prairie Lantern (invented)",
    lot: { lotNumber: `L-${201 + index}`, address: `${310 + 4 * index} Quillwort Lane` },
    plan: {
      code: plan.planCode,
      name: plan.planName,
      revisionNumber: 3 + index,
      status: index === 0 ? "approved" : "draft",
      input: plan.input,
    },
    site: SITE_RAW,
    loads,
    selection: systemChoiceFromSelection(selection),
    sizingLimits: DEFAULT_SIZING_LIMITS,
    approval:
      index === 0
        ? { reviewerName: "Morgan Ellery (invented)", credential: "PE", approvedOn: "2026-11-28" }
        : null,
    generatedAt: GENERATED_AT,
    ...overrides,
  };
}

const squash = (text: string) => text.replace(/\s+/g, " ");

describe("a 3-lot permit packet from engine output", () => {
  let reports: LotReport[];
  let pages: string[];
  let allText: string;
  let bytes: Uint8Array;

  beforeAll(async () => {
    // Lot 3 gets a purchaser's override (the 3-ton air conditioner) to show it is kept and shown.
    const override = CATALOG.find((system) => system.id === "AC36-F60");
    reports = [
      sourceFor(0),
      sourceFor(1),
      sourceFor(2, {
        selection: {
          system: override as EquipmentCatalogEntry,
          overridden: true,
          overrideNote: "matches the neighbouring lots",
        },
      }),
    ].map(lotReportFromResults);
    bytes = await renderLotReportsPdf(reports);
    // pdf-parse hands its buffer to a worker (the caller's copy is detached): give it a copy.
    const parser = new PDFParse({ data: new Uint8Array(bytes) });
    const result = await parser.getText();
    await parser.destroy();
    pages = result.pages.map((page) => squash(page.text));
    allText = squash(result.text);
  }, 60_000);

  it("is a PDF with a cover page and each lot starting on a new page", () => {
    expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe("%PDF-");
    expect(pages[0]).toMatch(/Permit packet/);
    for (const report of reports) {
      expect(pages[0]).toContain(report.lotNumber); // the cover lists every lot
      const first = pages.findIndex((page) =>
        page.includes(`Heating and cooling load report Lot ${report.lotNumber}`),
      );
      expect(first, report.lotNumber).toBeGreaterThan(0);
      expect(pages[first].indexOf("Heating and cooling load report")).toBeLessThan(5); // at the top of its page
    }
  });

  it("carries the caution on every page", () => {
    expect(pages.length).toBeGreaterThanOrEqual(1 + 2 * reports.length);
    for (const page of pages) expect(page).toContain(squash(REPORT_CAUTION));
    expect(REPORT_CAUTION).toMatch(/design estimates/);
    expect(REPORT_CAUTION).toMatch(/not the approved procedure of any standard/);
    expect(REPORT_CAUTION).toMatch(/Local codes and a licensed professional's review govern/);
  });

  it("states the lot, plan and revision, facing, design conditions and engine version", () => {
    for (const report of reports) {
      expect(allText).toContain(`Lot ${report.lotNumber}`);
      expect(allText).toContain(report.address as string);
      expect(allText).toContain(`${report.plan.code} · ${report.plan.name}`);
      expect(allText).toContain(`Revision ${report.plan.revisionNumber} (${report.plan.status})`);
    }
    expect(allText).toContain("faces N (0° from north"); // lot 1 at 0°
    expect(allText).toContain("faces E (90° from north"); // lot 2 at 90°
    expect(allText).toContain("faces SW (225° from north"); // lot 3 at 225°
    // Design conditions as entered in templates/example-site.json.
    expect(allText).toContain("Heating outdoor dry bulb 24 °F");
    expect(allText).toContain("Cooling outdoor dry bulb 99 °F");
    expect(allText).toContain("Coincident wet bulb 75 °F");
    expect(allText).toContain("Daily range 20 °F");
    expect(allText).toContain("75 °F, 50 % RH");
    expect(allText).toContain("32.9° · 600 ft");
    expect(allText).toContain(`Platload load engine ${ENGINE_VERSION}`);
  });

  it("lists the ADDED insulation values as entered in the plan library", () => {
    // The first lot's plan row in templates/example-plans.csv, read here as input (not engine output).
    const plan = PLANS[0].input;
    const page = pages.find((p) =>
      p.includes(`Heating and cooling load report Lot ${reports[0].lotNumber}`),
    ) as string;
    expect(page).toContain(
      `All facades ${plan.wall.baseId} R-${plan.wall.cavityR} R-${plan.wall.continuousR}`,
    );
    expect(page).toContain(
      `Ceiling under vented attic ${plan.attic.ceiling.baseId} R-${plan.attic.ceiling.cavityR}`,
    );
    expect(page).toContain(`${plan.infiltration.ach50?.toFixed(1)} ACH50`);
    expect(page).toContain(`${plan.ducts.location}, R-${plan.ducts.insulationR}`);
    expect(page).toContain(
      `R-${plan.foundation.slabEdgeInsulationR}, ${plan.foundation.slabEdgeInsulationDepthFt.toFixed(1)} ft deep`,
    );
    // The encapsulated plan (third lot) shows its roof-deck insulation instead.
    const encapsulated = PLANS[2].input;
    expect(encapsulated.attic.kind).toBe("encapsulated");
    expect(allText).toContain(
      `Roof deck of encapsulated attic ${encapsulated.attic.roofDeck.baseId} R-${encapsulated.attic.roofDeck.cavityR}`,
    );
  });

  it("shows loads, the chart's axes, the system or why none fits, the limits used and the approval", () => {
    for (const report of reports) {
      expect(allText).toContain(`HEATING LOAD ${report.heating.totalBtuh.toLocaleString("en-US")}`);
      expect(allText).toContain(`COOLING TOTAL ${report.cooling.totalBtuh.toLocaleString("en-US")}`);
    }
    expect(allText).toContain("24-hour sensible cooling profile");
    expect(allText).toContain("Solar hour of the design day");
    expect(allText).toContain("Sensible cooling (Btu/h)");
    expect(allText).toContain("Sizing limits used cooling 95-115 % of the cooling total load");
    expect(allText).toContain("chosen by purchasing (override)");
    expect(allText).toContain("matches the neighbouring lots");
    expect(allText).toContain("Approved by Morgan Ellery (invented), PE, on 2026-11-28");
    expect(allText).toContain("Not approved");
    for (const report of reports) {
      if (report.equipment.status === "none")
        expect(allText).toContain(squash(report.equipment.reason).slice(0, 60));
      else expect(allText).toContain(`${report.equipment.systemCode} · `);
    }
  });
});

async function textOf(reports: LotReport[]): Promise<{ pages: string[]; all: string }> {
  const parser = new PDFParse({ data: new Uint8Array(await renderLotReportsPdf(reports)) });
  const result = await parser.getText();
  await parser.destroy();
  return { pages: result.pages.map((page) => squash(page.text)), all: squash(result.text) };
}

describe("the report states its load procedure", () => {
  it("the hourly method: named on the lot's pages and the cover, with its peak hour and 24-hour profile", async () => {
    const reports = [sourceFor(0), sourceFor(1)].map(lotReportFromResults);
    for (const report of reports) expect(report.procedure).toBe("hourly");
    const { pages, all } = await textOf(reports);
    expect(pages[0]).toContain(`Load procedure ${PROCEDURE_SHORT_LABELS.hourly}`); // the cover
    expect(all).toContain(squash(`Load procedure ${PROCEDURE_STATEMENTS.hourly}`));
    expect(all.split(`Procedure: ${PROCEDURE_SHORT_LABELS.hourly}`)).toHaveLength(1 + reports.length); // above each lot's loads
    for (const report of reports) {
      expect(report.cooling.peakHour).not.toBeNull();
      expect(all).toContain(
        `COOLING TOTAL ${report.cooling.totalBtuh.toLocaleString("en-US")} Btu/h at solar hour ${report.cooling.peakHour}`,
      );
      expect(all).toContain(`Cooling at hour ${report.cooling.peakHour} (Btu/h)`);
    }
    expect(all.split("24-hour sensible cooling profile")).toHaveLength(1 + reports.length);
    expect(all).not.toContain(PEAK_ONLY_NOTE);
  });

  it("the handbook's load-factor procedure: named as implemented here; no profile chart and no peak-hour text", async () => {
    const report = lotReportFromResults(sourceFor(1, {}, "residential-load-factor"));
    expect(report.procedure).toBe("residential-load-factor");
    expect(report.cooling.peakHour).toBeNull();
    expect(report.cooling.hourlySensibleBtuh).toEqual([]);
    const { all } = await textOf([report]);
    expect(all).toContain(squash(`Load procedure ${PROCEDURE_STATEMENTS["residential-load-factor"]}`));
    expect(PROCEDURE_STATEMENTS["residential-load-factor"]).toMatch(
      /as implemented in Platload, not a certified or approved implementation/,
    );
    expect(all).toContain(`Procedure: ${PROCEDURE_SHORT_LABELS["residential-load-factor"]}`);
    expect(all).toContain(
      `COOLING TOTAL ${report.cooling.totalBtuh.toLocaleString("en-US")} Btu/h at the design peak`,
    );
    expect(all).toContain("Cooling at the design peak (Btu/h)");
    expect(all).toContain(squash(PEAK_ONLY_NOTE));
    expect(all).not.toContain("24-hour sensible cooling profile");
    expect(all).not.toMatch(/solar hour \d|at hour \d/);
  });

  it("a packet of lots by both procedures lists both on the cover", async () => {
    const reports = [
      lotReportFromResults(sourceFor(0)),
      lotReportFromResults(sourceFor(1, {}, "residential-load-factor")),
    ];
    const { pages } = await textOf(reports);
    expect(pages[0]).toContain(
      `Load procedure ${PROCEDURE_SHORT_LABELS.hourly}; ${PROCEDURE_SHORT_LABELS["residential-load-factor"]}`,
    );
  });

  it("a report without a known procedure, or with a profile of the wrong length, is refused by field", async () => {
    const good = lotReportFromResults(sourceFor(0));
    await expect(renderLotReportsPdf([{ ...good, procedure: "monthly" as LoadProcedure }])).rejects.toThrow(
      /reports\.0\.procedure: must be one of residential-load-factor, hourly/,
    );
    const { procedure: _dropped, ...withoutProcedure } = good;
    await expect(renderLotReportsPdf([withoutProcedure as LotReport])).rejects.toThrow(
      /reports\.0\.procedure/,
    );
    await expect(
      renderLotReportsPdf([
        {
          ...good,
          cooling: { ...good.cooling, hourlySensibleBtuh: good.cooling.hourlySensibleBtuh.slice(0, 12) },
        },
      ]),
    ).rejects.toThrow(/reports\.0\.cooling\.hourlySensibleBtuh: must hold 24 hourly values/);
    expect(LOAD_PROCEDURE_LABELS[good.procedure]).toBe(LOAD_PROCEDURE_LABELS.hourly);
  });
});

describe("lotReportFromResults", () => {
  it("sizing ratios are capacity ÷ load, with a heat pump's output at the site's design temperature", () => {
    const hp = CATALOG.find((system) => system.id === "HP30-B10") as EquipmentCatalogEntry;
    const report = lotReportFromResults(sourceFor(1, { selection: { system: hp, overridden: true } }));
    const loads = computeFacingLoads(PLANS[1].input, SITE, 90, { procedure: "hourly" });
    if (report.equipment.status !== "selected") throw new Error("expected a system");
    // By hand: 17,600 + (24 − 17) × (29,000 − 17,600) / 30 = 17,600 + 7 × 380 = 20,260 Btu/h at 24 °F.
    expect(report.equipment.heatingOutputBtuh).toBe(20_260);
    expect(report.equipment.heatingOutputNote).toMatch(/24 °F/);
    expect(report.equipment.coolingRatioPct).toBeCloseTo((100 * 28_700) / loads.cooling.totalBtuh, 1);
    expect(report.equipment.heatingRatioPct).toBeCloseTo(
      (100 * (20_260 + 34_100)) / loads.heating.totalBtuh,
      1,
    );
    expect(report.sizingLimits).toEqual(DEFAULT_SIZING_LIMITS);
  });

  it("an override outside the limits says why", () => {
    const big = CATALOG.find((system) => system.id === "AC48-F80") as EquipmentCatalogEntry;
    const report = lotReportFromResults(sourceFor(0, { selection: { system: big, overridden: true } }));
    if (report.equipment.status !== "selected") throw new Error("expected a system");
    expect(report.equipment.outsideLimits.join(" ")).toMatch(/above 1\d\d %/);
  });

  it("the account's own limits are the ones stated", () => {
    const limits = {
      coolingMinPct: 90,
      coolingMaxPct: 130,
      heatPumpCoolingMaxPct: 140,
      heatingMinPct: 100,
      heatingMaxPct: 200,
    };
    const report = lotReportFromResults(sourceFor(0, { sizingLimits: limits }));
    expect(report.sizingLimits).toEqual(limits);
  });

  it("when nothing fits, the reason names the closest system's shortfall", () => {
    const choice = systemChoiceFromSelection(
      selectEquipment({
        loads: {
          heatingBtuh: 90_000,
          coolingSensibleBtuh: 60_000,
          coolingLatentBtuh: 8_000,
          coolingTotalBtuh: 68_000,
        },
        catalog: CATALOG,
      }),
    );
    expect(choice.system).toBeNull();
    if (choice.system === null)
      expect(choice.reason).toMatch(
        /No catalog system fits within the sizing limits\. Closest: AC48-F80, cooling 46,100 Btu\/h is below 95 %/,
      );
  });

  it("bad input is named by field", async () => {
    expect(() =>
      lotReportFromResults(sourceFor(0, { site: { ...(SITE_RAW as object), latitudeDeg: 95 } })),
    ).toThrow(LoadInputError);
    expect(() =>
      lotReportFromResults(sourceFor(0, { site: { ...(SITE_RAW as object), latitudeDeg: 95 } })),
    ).toThrow(/site\.latitudeDeg/);
    expect(() => lotReportFromResults(sourceFor(0, { lot: { lotNumber: " " } }))).toThrow(
      /lotNumber: required: the lot number/,
    );
    const good = lotReportFromResults(sourceFor(0));
    const broken = {
      ...good,
      cooling: { ...good.cooling, hourlySensibleBtuh: good.cooling.hourlySensibleBtuh.slice(0, 23) },
    };
    await expect(renderLotReportsPdf([good, broken])).rejects.toThrow(ReportInputError);
    await expect(renderLotReportsPdf([good, broken])).rejects.toThrow(
      /reports\.1\.cooling\.hourlySensibleBtuh: must hold 24 hourly values/,
    );
    await expect(renderLotReportsPdf([])).rejects.toThrow(/at least one lot report/);
  });

  it("a single lot renders without a cover page", async () => {
    const bytes = await renderLotReportsPdf([lotReportFromResults(sourceFor(0))]);
    const parser = new PDFParse({ data: bytes });
    const result = await parser.getText();
    await parser.destroy();
    expect(squash(result.pages[0].text)).toMatch(/^Heating and cooling load report Lot L-201/);
  });
});

describe("direct inputs on the report", () => {
  it("a direct wall U-factor and an effective leakage area are stated as entered, not as unused R-values or 'not given'", async () => {
    const base = PLANS[0].input;
    const input = {
      ...base,
      wall: { ...base.wall, uFactor: 0.05 },
      infiltration: { ...base.infiltration, ach50: undefined, cfm50: undefined, effectiveLeakageAreaIn2: 80 },
    };
    const loads = computeFacingLoads(input, SITE, 0, { procedure: "hourly", validated: true });
    const source = sourceFor(0, {
      plan: { code: PLANS[0].planCode, name: PLANS[0].planName, revisionNumber: 3, status: "draft", input },
      loads,
    });
    const bytes = await renderLotReportsPdf([lotReportFromResults(source)]);
    const parser = new PDFParse({ data: bytes });
    const text = squash((await parser.getText()).text);
    await parser.destroy();
    expect(text).toMatch(/U-0\.050 entered \(whole assembly\)/);
    expect(text).toMatch(/80 in² effective leakage area/);
    expect(text).not.toMatch(/Air leakage not given/);
  }, 60_000);
});

describe("small helpers", () => {
  it("compass labels of eight points", () => {
    expect([0, 44, 46, 90, 180, 225, 315, 359, 360, -90].map(compassLabel)).toEqual([
      "N",
      "NE",
      "NE",
      "E",
      "S",
      "SW",
      "NW",
      "N",
      "N",
      "W",
    ]);
  });

  it("text the standard PDF fonts cannot show is spelled out; ° ² × ÷ stay", () => {
    expect(pdfSafeText("τb 0.5 ≤ 1 → ok, 70 °F, ft², 2 × 3 ÷ 4")).toBe(
      "tau b 0.5 <= 1 -> ok, 70 °F, ft², 2 × 3 ÷ 4",
    );
  });

  it("loads from the engine keep their own caution and version", () => {
    const loads: FacingLoads = computeFacingLoads(PLANS[0].input, SITE, 0);
    expect(loads.engineVersion).toBe(ENGINE_VERSION);
    expect(lotReportFromResults(sourceFor(0)).engineVersion).toBe(ENGINE_VERSION);
  });
});

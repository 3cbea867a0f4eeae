/**
 * Per-lot heating and cooling load reports as one PDF (pdfkit, standard Helvetica fonts, no
 * font files or network): a cover page listing the lots when there are several, then one
 * section per lot starting on a new page — lot, plan and revision, facing, design conditions,
 * the envelope with the added insulation as installed, the load procedure, loads by component,
 * the 24-hour sensible cooling profile as a vector chart (when the procedure gives one), the system with its sizing ratios and the
 * limits used, the reviewer's approval, the engine version and the date. Every page's footer
 * carries the caution. The layout is Platload's own.
 */
import PDFDocument from "pdfkit";
import { SYSTEM_TYPE_LABELS, REPORT_CAUTION, parseLotReports, type LotReport } from "./lot-report-data";
import { PEAK_ONLY_NOTE, peakWhen, PROCEDURE_SHORT_LABELS, PROCEDURE_STATEMENTS } from "./procedure-text";

export * from "./lot-report-data";

export interface RenderLotReportsOptions {
  /** Title of the cover page and the PDF's metadata (default "Permit packet: heating and cooling load reports"). */
  title?: string;
  /** Cover page listing the lots: default when there is more than one lot. */
  cover?: boolean;
  /** Date on the cover and in the footer (default: the first report's generatedAt). */
  generatedAt?: Date | string;
}

// ---------------------------------------------------------------------------------------------
// Look: neutral greys, one accent of our own, warm for heating, cool for cooling.

const COLOR = {
  ink: "#1f2328",
  muted: "#5b636e",
  rule: "#cfd5dc",
  band: "#f2f4f6",
  accent: "#2e6b5e",
  heating: "#b4471c",
  heatingTint: "#fbeee8",
  cooling: "#1f5d99",
  coolingTint: "#e9f1fa",
  caution: "#6b4e16",
  cautionTint: "#fbf5e6",
} as const;

const PAGE = { width: 612, height: 792, left: 48, right: 48, top: 48, bottom: 66 } as const; // US Letter, points
const CONTENT_WIDTH = PAGE.width - PAGE.left - PAGE.right;
const CONTENT_BOTTOM = PAGE.height - PAGE.bottom;
const FONT = "Helvetica";
const BOLD = "Helvetica-Bold";

type Doc = PDFKit.PDFDocument;

/**
 * The standard PDF fonts are WinAnsi-encoded: keep °, ², ×, ÷, –, · and replace what they
 * cannot show (engine notes use τ, comparisons ≤ ≥, arrows).
 */
const REPLACEMENTS: Record<string, string> = {
  τ: "tau ",
  "≤": "<=",
  "≥": ">=",
  "→": "->",
  Δ: "delta ",
  "≈": "~",
  "−": "-",
  "′": "'",
  "″": '"',
  ₐ: "a",
  "³": "3",
};
const WIN_ANSI_EXTRA = "€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ";
export function pdfSafeText(value: string): string {
  let out = "";
  for (const char of value) {
    const code = char.codePointAt(0) ?? 0;
    if (
      (code >= 0x20 && code <= 0x7e) ||
      (code >= 0xa0 && code <= 0xff) ||
      WIN_ANSI_EXTRA.includes(char) ||
      char === "\n"
    )
      out += char;
    else out += REPLACEMENTS[char] ?? "?";
  }
  return out;
}

const btuh = (value: number) => Math.round(value).toLocaleString("en-US");
const num = (value: number, places = 0) =>
  value.toLocaleString("en-US", { minimumFractionDigits: places, maximumFractionDigits: places });
const rText = (value: number) => `R-${num(value, Number.isInteger(value) ? 0 : 1)}`;
const MONTHS = [
  "January",
  "February",
  "March",
  "April",
  "May",
  "June",
  "July",
  "August",
  "September",
  "October",
  "November",
  "December",
];

function dateText(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return `${date.toISOString().slice(0, 10)} ${date.toISOString().slice(11, 16)} UTC`;
}

// ---------------------------------------------------------------------------------------------
// Drawing helpers. `y` is managed explicitly; every call stays above CONTENT_BOTTOM so pdfkit
// never adds a page on its own.

interface Cursor {
  doc: Doc;
  y: number;
  /** Footer label of each page, by page index. */
  pageLabels: string[];
  /** Label for pages added by this section (e.g. "Lot 12, Prairie Lantern"). */
  label: string;
  /** Draws a continuation header on a new page of the section. */
  continuation: (() => void) | null;
}

function newPage(cursor: Cursor): void {
  cursor.doc.addPage({
    size: "LETTER",
    margins: { top: PAGE.top, bottom: PAGE.bottom, left: PAGE.left, right: PAGE.right },
  });
  cursor.pageLabels.push(cursor.label);
  cursor.y = PAGE.top;
  cursor.continuation?.();
}

function ensureSpace(cursor: Cursor, heightPt: number): void {
  if (cursor.y + heightPt > CONTENT_BOTTOM) newPage(cursor);
}

function write(
  cursor: Cursor,
  value: string,
  options: {
    x?: number;
    width?: number;
    size?: number;
    bold?: boolean;
    color?: string;
    align?: "left" | "right" | "center";
    advance?: boolean;
    y?: number;
  } = {},
): number {
  const { doc } = cursor;
  const width = options.width ?? CONTENT_WIDTH;
  doc
    .font(options.bold ? BOLD : FONT)
    .fontSize(options.size ?? 9)
    .fillColor(options.color ?? COLOR.ink);
  const safe = pdfSafeText(value);
  const height = doc.heightOfString(safe, { width });
  doc.text(safe, options.x ?? PAGE.left, options.y ?? cursor.y, {
    width,
    align: options.align ?? "left",
    lineBreak: true,
  });
  if (options.advance !== false) cursor.y += height;
  return height;
}

function sectionTitle(cursor: Cursor, title: string, color: string = COLOR.accent): void {
  ensureSpace(cursor, 40);
  cursor.y += 6;
  write(cursor, title, { size: 11, bold: true, color });
  cursor.doc
    .moveTo(PAGE.left, cursor.y + 2)
    .lineTo(PAGE.left + CONTENT_WIDTH, cursor.y + 2)
    .lineWidth(0.75)
    .strokeColor(color)
    .stroke();
  cursor.y += 7;
}

interface TableColumn {
  header: string;
  width: number;
  align?: "left" | "right";
}

/** A table with a tinted header row (repeated on a new page) and thin rules between rows. */
function table(
  cursor: Cursor,
  columns: readonly TableColumn[],
  rows: readonly (readonly string[])[],
  options: {
    x?: number;
    headerTint?: string;
    headerColor?: string;
    boldLastRow?: boolean;
    size?: number;
  } = {},
): void {
  const { doc } = cursor;
  const x0 = options.x ?? PAGE.left;
  const size = options.size ?? 8.5;
  const padding = 3;
  const totalWidth = columns.reduce((sum, column) => sum + column.width, 0);
  const rowHeight = (cells: readonly string[], bold: boolean) => {
    doc.font(bold ? BOLD : FONT).fontSize(size);
    return (
      Math.max(
        ...cells.map((cell, i) =>
          doc.heightOfString(pdfSafeText(cell), { width: columns[i].width - 2 * padding }),
        ),
      ) +
      2 * padding
    );
  };
  const drawRow = (cells: readonly string[], bold: boolean, tint: string | null, color: string) => {
    const height = rowHeight(cells, bold);
    if (tint) doc.rect(x0, cursor.y, totalWidth, height).fill(tint);
    let x = x0;
    cells.forEach((cell, i) => {
      doc
        .font(bold ? BOLD : FONT)
        .fontSize(size)
        .fillColor(color);
      doc.text(pdfSafeText(cell), x + padding, cursor.y + padding, {
        width: columns[i].width - 2 * padding,
        align: columns[i].align ?? "left",
      });
      x += columns[i].width;
    });
    cursor.y += height;
    doc
      .moveTo(x0, cursor.y)
      .lineTo(x0 + totalWidth, cursor.y)
      .lineWidth(0.4)
      .strokeColor(COLOR.rule)
      .stroke();
  };
  const headers = columns.map((column) => column.header);
  const header = () =>
    drawRow(headers, true, options.headerTint ?? COLOR.band, options.headerColor ?? COLOR.ink);
  ensureSpace(cursor, rowHeight(headers, true) + (rows[0] ? rowHeight(rows[0], false) : 0));
  header();
  rows.forEach((row, index) => {
    const bold = options.boldLastRow === true && index === rows.length - 1;
    if (cursor.y + rowHeight(row, bold) > CONTENT_BOTTOM) {
      newPage(cursor);
      header();
    }
    drawRow(row, bold, null, COLOR.ink);
  });
}

/** Label/value pairs in two columns of pairs. */
function facts(
  cursor: Cursor,
  pairs: readonly [string, string][],
  options: { labelWidth?: number; columns?: 1 | 2 } = {},
): void {
  const columns = options.columns ?? 2;
  const columnWidth = CONTENT_WIDTH / columns;
  const labelWidth = options.labelWidth ?? 120;
  const { doc } = cursor;
  for (let i = 0; i < pairs.length; i += columns) {
    const slice = pairs.slice(i, i + columns);
    doc.fontSize(8.5);
    const height =
      Math.max(
        ...slice.map(([label, value]) =>
          Math.max(
            doc.font(BOLD).heightOfString(pdfSafeText(label), { width: labelWidth - 4 }),
            doc.font(FONT).heightOfString(pdfSafeText(value), { width: columnWidth - labelWidth - 8 }),
          ),
        ),
      ) + 3;
    ensureSpace(cursor, height);
    slice.forEach(([label, value], j) => {
      const x = PAGE.left + j * columnWidth;
      write(cursor, label, {
        x,
        width: labelWidth - 4,
        size: 8.5,
        bold: true,
        color: COLOR.muted,
        advance: false,
      });
      write(cursor, value, {
        x: x + labelWidth,
        width: columnWidth - labelWidth - 8,
        size: 8.5,
        advance: false,
      });
    });
    cursor.y += height;
  }
}

/** Round up to 1, 2 or 5 × 10^n. */
function niceCeil(value: number): number {
  if (value <= 0) return 1;
  const power = 10 ** Math.floor(Math.log10(value));
  for (const step of [1, 2, 2.5, 5, 10]) if (step * power >= value) return step * power;
  return 10 * power;
}

/** The 24-hour sensible cooling profile: a vector line chart with axes, gridlines and labels. */
function coolingProfileChart(cursor: Cursor, report: LotReport): void {
  const { doc } = cursor;
  const heightPt = 128;
  ensureSpace(cursor, heightPt + 20);
  const x0 = PAGE.left + 52;
  const y0 = cursor.y + 8;
  const width = CONTENT_WIDTH - 64;
  const plotHeight = heightPt - 44;
  const hourly = report.cooling.hourlySensibleBtuh;
  const maxValue = Math.max(...hourly, 1);
  const minValue = Math.min(...hourly, 0);
  const top = niceCeil(maxValue * 1.05);
  const bottom = minValue < 0 ? -niceCeil(-minValue) : 0;
  const yOf = (value: number) => y0 + plotHeight - ((value - bottom) / (top - bottom)) * plotHeight;
  const xOf = (hour: number) => x0 + ((hour - 1) / 23) * width;

  // Gridlines and y labels.
  const ticks = 5;
  for (let i = 0; i <= ticks; i += 1) {
    const value = bottom + ((top - bottom) * i) / ticks;
    const y = yOf(value);
    doc
      .moveTo(x0, y)
      .lineTo(x0 + width, y)
      .lineWidth(0.4)
      .strokeColor(i === 0 ? COLOR.muted : COLOR.rule)
      .stroke();
    doc
      .font(FONT)
      .fontSize(7)
      .fillColor(COLOR.muted)
      .text(btuh(value), x0 - 50, y - 3.5, { width: 46, align: "right", lineBreak: false });
  }
  // x ticks and labels.
  for (let hour = 1; hour <= 24; hour += 1) {
    const x = xOf(hour);
    doc
      .moveTo(x, y0 + plotHeight)
      .lineTo(x, y0 + plotHeight + 3)
      .lineWidth(0.4)
      .strokeColor(COLOR.muted)
      .stroke();
    if (hour === 1 || hour % 3 === 0)
      doc
        .font(FONT)
        .fontSize(7)
        .fillColor(COLOR.muted)
        .text(String(hour), x - 10, y0 + plotHeight + 5, { width: 20, align: "center", lineBreak: false });
  }
  doc
    .moveTo(x0, y0)
    .lineTo(x0, y0 + plotHeight)
    .lineWidth(0.6)
    .strokeColor(COLOR.muted)
    .stroke();
  // The profile.
  doc.moveTo(xOf(1), yOf(hourly[0]));
  for (let hour = 2; hour <= 24; hour += 1) doc.lineTo(xOf(hour), yOf(hourly[hour - 1]));
  doc.lineWidth(1.6).strokeColor(COLOR.cooling).stroke();
  const peak = report.cooling.peakHour;
  if (peak !== null) {
    doc.circle(xOf(peak), yOf(hourly[peak - 1]), 2.8).fill(COLOR.cooling);
    const labelX = Math.min(xOf(peak) + 6, x0 + width - 150);
    doc
      .font(BOLD)
      .fontSize(7.5)
      .fillColor(COLOR.cooling)
      .text(
        pdfSafeText(`peak ${btuh(hourly[peak - 1])} Btu/h at hour ${peak}`),
        labelX,
        yOf(hourly[peak - 1]) - 12,
        { width: 150, lineBreak: false },
      );
  }
  // Axis titles.
  doc
    .font(FONT)
    .fontSize(7.5)
    .fillColor(COLOR.muted)
    .text("Solar hour of the design day (1-24)", x0, y0 + plotHeight + 16, {
      width,
      align: "center",
      lineBreak: false,
    });
  doc.save();
  doc.rotate(-90, { origin: [PAGE.left + 4, y0 + plotHeight / 2] });
  doc
    .font(FONT)
    .fontSize(7.5)
    .fillColor(COLOR.muted)
    .text("Sensible cooling (Btu/h)", PAGE.left + 4 - 60, y0 + plotHeight / 2 - 4, {
      width: 120,
      align: "center",
      lineBreak: false,
    });
  doc.restore();
  cursor.y = y0 + plotHeight + 26;
}

/** A figure tile: label, big number, unit; tinted warm or cool. */
function tiles(
  cursor: Cursor,
  items: readonly { label: string; value: string; unit: string; tint: string; color: string }[],
): void {
  const { doc } = cursor;
  const gap = 6;
  const width = (CONTENT_WIDTH - gap * (items.length - 1)) / items.length;
  const height = 46;
  ensureSpace(cursor, height + 6);
  items.forEach((item, i) => {
    const x = PAGE.left + i * (width + gap);
    doc.rect(x, cursor.y, width, height).fill(item.tint);
    doc
      .font(BOLD)
      .fontSize(7.5)
      .fillColor(item.color)
      .text(pdfSafeText(item.label), x + 6, cursor.y + 5, { width: width - 12, lineBreak: false });
    doc
      .font(BOLD)
      .fontSize(15)
      .fillColor(item.color)
      .text(pdfSafeText(item.value), x + 6, cursor.y + 17, { width: width - 12, lineBreak: false });
    doc
      .font(FONT)
      .fontSize(7.5)
      .fillColor(COLOR.muted)
      .text(pdfSafeText(item.unit), x + 6, cursor.y + 35, { width: width - 12, lineBreak: false });
  });
  cursor.y += height + 6;
}

// ---------------------------------------------------------------------------------------------
// One lot.

function lotTitle(report: LotReport): string {
  return `Lot ${report.lotNumber}, ${report.communityName}`;
}

function constructionCells(row: {
  where: string;
  baseAssembly: string;
  cavityR: number;
  continuousR: number;
  uFactor: number | null;
  areaFt2: number | null;
}): string[] {
  const area = row.areaFt2 === null ? "" : num(row.areaFt2);
  // A direct U-factor replaces the base assembly and added insulation: say so rather than print unused R-values.
  if (row.uFactor !== null)
    return [row.where, `U-${num(row.uFactor, 3)} entered (whole assembly)`, "—", "—", area];
  return [row.where, row.baseAssembly, rText(row.cavityR), rText(row.continuousR), area];
}

function drawLot(cursor: Cursor, report: LotReport): void {
  const { doc } = cursor;
  cursor.label = lotTitle(report);
  cursor.continuation = null;
  newPage(cursor);

  // Title band.
  doc.rect(PAGE.left, cursor.y, CONTENT_WIDTH, 4).fill(COLOR.accent);
  cursor.y += 10;
  write(cursor, "Heating and cooling load report", { size: 16, bold: true, advance: false });
  write(cursor, `Lot ${report.lotNumber}`, { size: 16, bold: true, color: COLOR.accent, align: "right" });
  write(
    cursor,
    `${report.builderAccountName} · ${report.communityName}${report.address ? ` · ${report.address}` : ""}`,
    { size: 9.5, color: COLOR.muted },
  );
  cursor.y += 4;
  cursor.continuation = () => {
    write(
      cursor,
      `${lotTitle(report)} · plan ${report.plan.code} revision ${report.plan.revisionNumber} (continued)`,
      { size: 8, color: COLOR.muted },
    );
    cursor.y += 6;
  };

  sectionTitle(cursor, "Lot and plan");
  facts(
    cursor,
    [
      ["Builder", report.builderAccountName],
      ["Community", report.communityName],
      ["Lot", report.lotNumber],
      ["Address", report.address ?? "not given"],
      ["Plan", `${report.plan.code} · ${report.plan.name}`],
      ["Revision", `${report.plan.revisionNumber} (${report.plan.status})`],
      [
        "Front of the house faces",
        `${report.facing.label} (${num(report.facing.degrees, Number.isInteger(report.facing.degrees) ? 0 : 1)}° from north, clockwise)`,
      ],
      [
        "Area · stories · bedrooms",
        `${num(report.envelope.conditionedFloorAreaFt2)} ft² · ${report.envelope.stories} · ${report.envelope.bedrooms}`,
      ],
    ],
    { labelWidth: 118 },
  );

  const d = report.designConditions;
  sectionTitle(cursor, "Design conditions");
  facts(cursor, [["Location", d.location]], { labelWidth: 118, columns: 1 });
  facts(
    cursor,
    [
      ["Latitude · elevation", `${num(d.latitudeDeg, 1)}° · ${num(d.elevationFt)} ft`],
      ["Design month", MONTHS[d.designMonth - 1]],
      ["Heating outdoor dry bulb", `${num(d.heatingOutdoorDbF)} °F`],
      ["Heating indoor", `${num(d.indoorHeatingF)} °F`],
      ["Cooling outdoor dry bulb", `${num(d.coolingOutdoorDbF)} °F`],
      ["Coincident wet bulb", `${num(d.coolingOutdoorWbF)} °F`],
      ["Daily range", `${num(d.dailyRangeF)} °F`],
      ["Cooling indoor", `${num(d.indoorCoolingF)} °F, ${num(d.indoorCoolingRhPct)} % RH`],
    ],
    { labelWidth: 118 },
  );

  // Envelope: the ADDED insulation as installed.
  const e = report.envelope;
  sectionTitle(cursor, "Envelope: insulation added, as installed");
  const constructionColumns: TableColumn[] = [
    { header: "Where", width: 150 },
    { header: "Base assembly", width: 152 },
    { header: "Cavity R added", width: 70, align: "right" },
    { header: "Continuous R added", width: 80, align: "right" },
    { header: "Area (ft²)", width: 60, align: "right" },
  ];
  const constructionRows = [
    ...e.walls,
    ...(e.atticInsulation ? [e.atticInsulation] : []),
    ...(e.vaultedCeiling ? [e.vaultedCeiling] : []),
    ...e.floors,
  ].map(constructionCells);
  table(cursor, constructionColumns, constructionRows);
  cursor.y += 4;
  const otherPairs: [string, string][] = [
    [
      "Attic",
      e.atticKind === "vented"
        ? "vented (insulation on the ceiling)"
        : e.atticKind === "encapsulated"
          ? "encapsulated (insulation under the roof deck)"
          : "none",
    ],
    ["Foundation", e.foundationKind],
  ];
  if (e.slabEdge) {
    const fFactor = e.slabEdge.fFactor !== null ? `, F-${num(e.slabEdge.fFactor, 2)} entered` : "";
    otherPairs.push([
      "Slab edge",
      `${rText(e.slabEdge.insulationR)}, ${num(e.slabEdge.depthFt, 1)} ft deep, ${num(e.slabEdge.perimeterFt)} ft of edge${fFactor}`,
    ]);
  }
  if (e.foundationWalls) {
    const u = e.foundationWalls.uFactor !== null ? ` (U-${num(e.foundationWalls.uFactor, 3)} entered)` : "";
    otherPairs.push([
      "Foundation walls",
      `${rText(e.foundationWalls.insulationR)} continuous, ${num(e.foundationWalls.areaFt2)} ft²${u}`,
    ]);
  }
  const leakage =
    e.ach50 !== null
      ? `${num(e.ach50, 1)} ACH50`
      : e.cfm50 !== null
        ? `${num(e.cfm50)} CFM50`
        : e.effectiveLeakageAreaIn2 !== null
          ? `${num(e.effectiveLeakageAreaIn2)} in² effective leakage area`
          : "not given";
  otherPairs.push(["Air leakage", leakage]);
  otherPairs.push([
    "Ducts",
    `${e.ducts.location}, ${rText(e.ducts.insulationR)}, leakage ${num(e.ducts.supplyLeakagePct, 1)} % supply / ${num(e.ducts.returnLeakagePct, 1)} % return`,
  ]);
  const recovery =
    e.ventilation.kind === "balanced" &&
    (e.ventilation.sensibleRecovery > 0 || e.ventilation.latentRecovery > 0)
      ? `, recovery ${num(e.ventilation.sensibleRecovery, 2)} sensible / ${num(e.ventilation.latentRecovery, 2)} latent`
      : "";
  otherPairs.push(["Ventilation", `${e.ventilation.kind}, ${num(e.ventilation.cfm)} cfm${recovery}`]);
  if (e.skylights)
    otherPairs.push([
      "Skylights",
      `${num(e.skylights.areaFt2)} ft², U-${num(e.skylights.uFactor, 2)}, SHGC ${num(e.skylights.shgc, 2)}`,
    ]);
  otherPairs.push(["Conditioned volume", `${num(e.volumeFt3)} ft³`]);
  facts(cursor, otherPairs, { labelWidth: 90 });
  cursor.y += 4;
  table(
    cursor,
    [
      { header: "Facade", width: 70 },
      { header: "Faces", width: 50 },
      { header: "Windows (ft²)", width: 78, align: "right" },
      { header: "U (Btu/h·ft²·°F)", width: 84, align: "right" },
      { header: "SHGC", width: 56, align: "right" },
      { header: "Overhang (ft)", width: 78, align: "right" },
      { header: "Doors (ft²)", width: 96, align: "right" },
    ],
    e.windows.map((w) => [
      w.facade + (w.windowGroups > 1 ? ` (${w.windowGroups} groups)` : ""),
      w.faces,
      num(w.areaFt2),
      num(w.uFactor, 2),
      num(w.shgc, 2),
      num(w.overhangDepthFt, 1),
      num(w.doorAreaFt2),
    ]),
  );

  // Review, version and date close the first page.
  sectionTitle(cursor, "Review and method");
  const a = report.approval;
  facts(
    cursor,
    [
      [
        "Reviewer's approval",
        a
          ? `Approved by ${a.reviewerName}${a.credential ? `, ${a.credential}` : ""}, on ${a.approvedOn}`
          : "Not approved: this plan revision has no reviewer's approval.",
      ],
      ["Load procedure", PROCEDURE_STATEMENTS[report.procedure]],
      ["Engine version", `Platload load engine ${report.engineVersion}`],
      ["Generated", dateText(report.generatedAt)],
    ],
    { columns: 1, labelWidth: 130 },
  );
  // Loads.
  const h = report.heating;
  const c = report.cooling;
  // The loads, chart, system and review make the lot's second page.
  newPage(cursor);
  sectionTitle(cursor, "Design loads");
  write(cursor, `Procedure: ${PROCEDURE_SHORT_LABELS[report.procedure]}`, {
    size: 8.5,
    bold: true,
    color: COLOR.muted,
  });
  cursor.y += 2;
  tiles(cursor, [
    {
      label: "HEATING LOAD",
      value: btuh(h.totalBtuh),
      unit: `Btu/h at ${num(h.outdoorF)} °F outdoors`,
      tint: COLOR.heatingTint,
      color: COLOR.heating,
    },
    {
      label: "COOLING TOTAL",
      value: btuh(c.totalBtuh),
      unit: `Btu/h ${peakWhen(c.peakHour)}`,
      tint: COLOR.coolingTint,
      color: COLOR.cooling,
    },
    {
      label: "SENSIBLE / LATENT",
      value: `${btuh(c.sensibleBtuh)} / ${btuh(c.latentBtuh)}`,
      unit: `Btu/h, sensible heat ratio ${num(c.sensibleHeatRatio, 2)}`,
      tint: COLOR.coolingTint,
      color: COLOR.cooling,
    },
    {
      label: "TONS · FT² PER TON",
      value: `${num(c.tons, 2)} · ${num(c.floorAreaPerTonFt2)}`,
      unit: `${num(c.airflowCfm)} cfm cooling airflow`,
      tint: COLOR.band,
      color: COLOR.ink,
    },
  ]);

  const halfGap = 12;
  const heatingWidth = 184;
  const coolingWidth = CONTENT_WIDTH - heatingWidth - halfGap;
  const heatingRows = [
    ...h.byComponent.map((row) => [row.component, btuh(row.btuh)]),
    ["Total", btuh(h.totalBtuh)],
  ];
  const coolingRows = [
    ...c.byComponent.map((row) => [
      row.component,
      btuh(row.sensibleBtuh),
      btuh(row.latentBtuh),
      btuh(row.sensibleBtuh + row.latentBtuh),
    ]),
    ["Total", btuh(c.sensibleBtuh), btuh(c.latentBtuh), btuh(c.totalBtuh)],
  ];
  const rowsNeeded = Math.max(heatingRows.length, coolingRows.length) + 1;
  ensureSpace(cursor, rowsNeeded * 14 + 4);
  const tableTop = cursor.y;
  table(
    cursor,
    [
      { header: "Heating by component", width: 122 },
      { header: "Btu/h", width: heatingWidth - 122, align: "right" },
    ],
    heatingRows,
    { headerTint: COLOR.heatingTint, headerColor: COLOR.heating, boldLastRow: true },
  );
  const heatingBottom = cursor.y;
  cursor.y = tableTop;
  table(
    cursor,
    [
      {
        header:
          c.peakHour === null
            ? "Cooling at the design peak (Btu/h)"
            : `Cooling at hour ${c.peakHour} (Btu/h)`,
        width: coolingWidth - 3 * 58,
      },
      { header: "Sensible", width: 58, align: "right" },
      { header: "Latent", width: 58, align: "right" },
      { header: "Total", width: 58, align: "right" },
    ],
    coolingRows,
    {
      x: PAGE.left + heatingWidth + halfGap,
      headerTint: COLOR.coolingTint,
      headerColor: COLOR.cooling,
      boldLastRow: true,
    },
  );
  cursor.y = Math.max(cursor.y, heatingBottom) + 4;

  // A peak-only procedure has no profile to draw: say so instead of drawing an empty chart.
  if (c.hourlySensibleBtuh.length === 24) {
    sectionTitle(cursor, "24-hour sensible cooling profile (design day)", COLOR.cooling);
    coolingProfileChart(cursor, report);
  } else {
    write(cursor, PEAK_ONLY_NOTE, { size: 8, color: COLOR.muted });
    cursor.y += 4;
  }

  // Equipment and sizing.
  const limits = report.sizingLimits;
  sectionTitle(cursor, "Selected system and sizing");
  const q = report.equipment;
  if (q.status === "selected") {
    const parts = [
      q.outdoorModel ? `outdoor ${q.outdoorModel}` : null,
      q.indoorModel ? `indoor ${q.indoorModel}` : null,
      q.furnaceModel ? `furnace ${q.furnaceModel}` : null,
    ].filter((part): part is string => part !== null);
    const heatingCapacity =
      q.heatingOutputBtuh + (q.systemType === "heat-pump-backup" ? q.backupHeatBtuh : 0);
    const pairs: [string, string][] = [
      [
        "System",
        `${q.systemCode} · ${SYSTEM_TYPE_LABELS[q.systemType]}${q.overridden ? " · chosen by purchasing (override)" : ""}`,
      ],
      ["Models", parts.length > 0 ? parts.join(", ") : q.modelNumbers],
      ["Nominal size", q.nominalTons === null ? "no cooling" : `${num(q.nominalTons, 1)} tons`],
      [
        "Cooling capacity at design",
        q.coolingTotalBtuh > 0
          ? `${btuh(q.coolingTotalBtuh)} Btu/h total, ${btuh(q.coolingSensibleBtuh)} sensible, ${btuh(q.coolingTotalBtuh - q.coolingSensibleBtuh)} latent`
          : "none",
      ],
      [
        "Heating capacity",
        `${btuh(q.heatingOutputBtuh)} Btu/h${q.heatingOutputNote ? ` (${q.heatingOutputNote})` : ""}${q.systemType === "heat-pump-backup" ? ` + ${btuh(q.backupHeatBtuh)} Btu/h backup` : ""}`,
      ],
      [
        "Cooling ratio",
        q.coolingRatioPct === null
          ? "no cooling load"
          : `${num(q.coolingRatioPct, 1)} % = ${btuh(q.coolingTotalBtuh)} ÷ ${btuh(c.totalBtuh)} Btu/h (cooling capacity ÷ cooling total load)`,
      ],
      [
        "Heating ratio",
        q.heatingRatioPct === null
          ? "no heating load"
          : `${num(q.heatingRatioPct, 1)} % = ${btuh(heatingCapacity)} ÷ ${btuh(h.totalBtuh)} Btu/h (heating output ÷ heating load)`,
      ],
    ];
    if (q.overrideNote) pairs.push(["Override note", q.overrideNote]);
    if (q.outsideLimits.length > 0) pairs.push(["Outside the limits", q.outsideLimits.join("; ")]);
    else pairs.push(["Within the limits", "yes: cooling, sensible, latent and heating checks all pass"]);
    facts(cursor, pairs, { columns: 1, labelWidth: 130 });
  } else {
    facts(
      cursor,
      [
        ["System", "No system fits"],
        ["Why", q.reason],
      ],
      { columns: 1, labelWidth: 130 },
    );
  }
  facts(
    cursor,
    [
      [
        "Sizing limits used",
        `cooling ${limits.coolingMinPct}-${limits.coolingMaxPct} % of the cooling total load (heat pumps up to ${limits.heatPumpCoolingMaxPct} % where the heating load exceeds the cooling load); ` +
          `heating ${limits.heatingMinPct} % minimum, furnaces at most ${limits.heatingMaxPct} % of the heating load; sensible and latent capacity must cover the sensible and latent loads.`,
      ],
    ],
    { columns: 1, labelWidth: 130 },
  );

  if (report.notes.length > 0) {
    ensureSpace(cursor, 30);
    cursor.y += 8;
    write(cursor, "Assumptions the engine applied", { size: 8.5, bold: true, color: COLOR.muted });
    for (const note of report.notes) {
      ensureSpace(cursor, 12);
      write(cursor, `• ${note}`, {
        size: 7.5,
        color: COLOR.muted,
        x: PAGE.left + 6,
        width: CONTENT_WIDTH - 6,
      });
    }
  }
  cursor.continuation = null;
}

// ---------------------------------------------------------------------------------------------
// Cover page.

function drawCover(cursor: Cursor, reports: readonly LotReport[], title: string, generatedAt: string): void {
  const { doc } = cursor;
  cursor.label = "Cover";
  cursor.continuation = null;
  newPage(cursor);
  doc.rect(PAGE.left, cursor.y, CONTENT_WIDTH, 4).fill(COLOR.accent);
  cursor.y += 12;
  write(cursor, title, { size: 18, bold: true });
  cursor.y += 2;
  const communities = [...new Set(reports.map((r) => r.communityName))];
  const builders = [...new Set(reports.map((r) => r.builderAccountName))];
  facts(
    cursor,
    [
      ["Builder", builders.join(", ")],
      ["Community", communities.join(", ")],
      ["Lots", String(reports.length)],
      ["Generated", dateText(generatedAt)],
      ["Engine version", [...new Set(reports.map((r) => r.engineVersion))].join(", ")],
      ["Load procedure", [...new Set(reports.map((r) => PROCEDURE_SHORT_LABELS[r.procedure]))].join("; ")],
      ["Approved plans", `${reports.filter((r) => r.approval !== null).length} of ${reports.length} lots`],
    ],
    { labelWidth: 90 },
  );
  cursor.y += 6;
  doc.rect(PAGE.left, cursor.y, CONTENT_WIDTH, 1).fill(COLOR.rule);
  cursor.y += 8;
  cursor.continuation = () => {
    write(cursor, `${title} (continued)`, { size: 8, color: COLOR.muted });
    cursor.y += 6;
  };
  table(
    cursor,
    [
      { header: "Lot", width: 40 },
      { header: "Address", width: 100 },
      { header: "Plan · revision", width: 78 },
      { header: "Faces", width: 36 },
      { header: "Heating (Btu/h)", width: 74, align: "right" },
      { header: "Cooling total (Btu/h)", width: 66, align: "right" },
      { header: "Tons", width: 34, align: "right" },
      { header: "System", width: 88 },
    ],
    reports.map((r) => [
      r.lotNumber,
      r.address ?? "",
      `${r.plan.code} · ${r.plan.revisionNumber}`,
      r.facing.label,
      btuh(r.heating.totalBtuh),
      btuh(r.cooling.totalBtuh),
      num(r.cooling.tons, 2),
      r.equipment.status === "selected"
        ? `${r.equipment.systemCode}${r.equipment.overridden ? " (override)" : ""}`
        : "no system fits",
    ]),
    { size: 8 },
  );
  cursor.continuation = null;
}

// ---------------------------------------------------------------------------------------------
// Footer on every page.

function drawFooters(
  doc: Doc,
  pageLabels: readonly string[],
  engineVersions: string,
  generatedAt: string,
): void {
  const range = doc.bufferedPageRange();
  for (let index = range.start; index < range.start + range.count; index += 1) {
    doc.switchToPage(index);
    // Writing below the bottom margin must not start a new page.
    const margins = doc.page.margins;
    doc.page.margins = { ...margins, bottom: 0 };
    const top = PAGE.height - PAGE.bottom + 10;
    doc.rect(PAGE.left, top - 4, CONTENT_WIDTH, 26).fill(COLOR.cautionTint);
    doc
      .font(FONT)
      .fontSize(7)
      .fillColor(COLOR.caution)
      .text(pdfSafeText(REPORT_CAUTION), PAGE.left + 5, top - 1, {
        width: CONTENT_WIDTH - 10,
        lineBreak: true,
      });
    doc
      .font(FONT)
      .fontSize(7)
      .fillColor(COLOR.muted)
      .text(
        pdfSafeText(
          `${pageLabels[index - range.start] ?? ""} · Platload engine ${engineVersions} · generated ${dateText(generatedAt)}`,
        ),
        PAGE.left,
        top + 26,
        { width: CONTENT_WIDTH - 80, lineBreak: false },
      );
    doc.text(`Page ${index - range.start + 1} of ${range.count}`, PAGE.left + CONTENT_WIDTH - 80, top + 26, {
      width: 80,
      align: "right",
      lineBreak: false,
    });
    doc.page.margins = margins;
  }
}

/**
 * Renders one PDF for one or more lots: a cover page listing the lots (by default when there
 * are several), then each lot's report starting on a new page; the caution in every page's
 * footer.
 *
 * @throws ReportInputError naming every bad field of the reports (nothing is rendered).
 */
export async function renderLotReportsPdf(
  reports: readonly LotReport[],
  options: RenderLotReportsOptions = {},
): Promise<Uint8Array> {
  const valid = parseLotReports(reports);
  const title = options.title ?? "Permit packet: heating and cooling load reports";
  const generatedAt =
    options.generatedAt === undefined
      ? valid[0].generatedAt
      : typeof options.generatedAt === "string"
        ? options.generatedAt
        : options.generatedAt.toISOString();
  const doc = new PDFDocument({
    autoFirstPage: false,
    bufferPages: true,
    size: "LETTER",
    info: {
      Title: pdfSafeText(title),
      Author: pdfSafeText(valid[0].builderAccountName),
      Creator: "Platload",
      Subject: "Heating and cooling load reports (design estimates)",
    },
  });
  const chunks: Buffer[] = [];
  const done = new Promise<Uint8Array>((resolve, reject) => {
    doc.on("data", (chunk: Buffer) => chunks.push(chunk));
    doc.on("end", () => {
      const joined = Buffer.concat(chunks);
      resolve(new Uint8Array(joined.buffer, joined.byteOffset, joined.byteLength));
    });
    doc.on("error", reject);
  });
  const cursor: Cursor = { doc, y: PAGE.top, pageLabels: [], label: "", continuation: null };
  if (options.cover ?? valid.length > 1) drawCover(cursor, valid, title, generatedAt);
  for (const [index, report] of valid.entries()) {
    drawLot(cursor, report);
    // A long packet is made by a job worker: let it renew its claim on the job between lots.
    if (index % 10 === 9) await new Promise((resolve) => setImmediate(resolve));
  }
  drawFooters(
    doc,
    cursor.pageLabels,
    [...new Set(valid.map((r) => r.engineVersion))].join(", "),
    generatedAt,
  );
  doc.end();
  return done;
}

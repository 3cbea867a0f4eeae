// Generated import files for the fuzz tests: the project's own example files, mutated (cells,
// columns, rows, headers), written as CSV (commas, semicolons, tabs, quotes, BOM) or XLSX, or
// replaced by bytes that are no table at all. Every file is described, so a failure names it.
import { readFileSync } from "node:fs";
import path from "node:path";
import fc from "fast-check";
import type { ImportKind } from "@/lib/imports/pipeline";
import { readCsv, writeXlsx } from "@/lib/workbook/table-io";

const root = path.resolve(__dirname, "../..");
const template = (name: string) => readCsv(readFileSync(path.join(root, "templates", name), "utf8"));

export interface BaseTable {
  headers: string[];
  rows: string[][];
}

/** The plan codes of templates/example-plans.csv, which the lots files name. */
export const EXAMPLE_PLAN_CODES = template("example-plans.csv").rows.map((r) => r.cells[0]);

/** A good file of each importer, from the project's own example files. */
export function baseTables(): Record<ImportKind, BaseTable> {
  const plans = template("example-plans.csv");
  const catalog = template("example-equipment.csv");
  const lots = template("demo-lots.csv");
  const planColumn = lots.headers.indexOf("Plan code");
  // Two plan models: each plan row is checked by the engine's input rules, the costliest check.
  return {
    plans: { headers: plans.headers, rows: plans.rows.slice(0, 2).map((r) => r.cells) },
    equipment: { headers: catalog.headers, rows: catalog.rows.map((r) => r.cells) },
    lots: {
      headers: lots.headers,
      rows: lots.rows.map((r, i) =>
        r.cells.map((c, j) => (j === planColumn ? EXAMPLE_PLAN_CODES[i % EXAMPLE_PLAN_CODES.length] : c)),
      ),
    },
  };
}

/** Cell texts a careless user or an attacker might put anywhere. */
const cellText = fc.oneof(
  { weight: 3, arbitrary: fc.string({ maxLength: 12 }) },
  { weight: 1, arbitrary: fc.string({ unit: "grapheme", maxLength: 8 }) },
  { weight: 2, arbitrary: fc.double({ noNaN: false }).map(String) },
  { weight: 1, arbitrary: fc.integer({ min: -1e9, max: 1e9 }).map(String) },
  {
    weight: 3,
    arbitrary: fc.constantFrom(
      "",
      " ",
      "-45",
      "1-80",
      "=1/0",
      "=A1+1",
      "=bedrooms*",
      "1e309",
      "NaN",
      "Infinity",
      '"',
      "'",
      ";",
      "\t",
      "\n",
      "\r\n",
      "0x10",
      "١٢",
      "12,5",
      "N",
      "sideways",
      "yes",
      "2027-02-30",
      "99999999999999999999",
      "-0",
      "°F",
      "ft²",
      "\u0000",
      "\uFEFF",
      "<script>",
      "%",
      "$-3",
    ),
  },
);

type Mutation =
  | { op: "cell"; row: number; column: number; text: string }
  | { op: "header"; column: number; text: string }
  | { op: "drop-column"; column: number }
  | { op: "duplicate-column"; column: number }
  | { op: "extra-column"; text: string }
  | { op: "drop-rows"; keep: number }
  | { op: "duplicate-row"; row: number }
  | { op: "blank-rows"; count: number }
  | { op: "wide"; columns: number };

const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  {
    weight: 8,
    arbitrary: fc.record({
      op: fc.constant("cell" as const),
      row: fc.nat(60),
      column: fc.nat(140),
      text: cellText,
    }),
  },
  {
    weight: 2,
    arbitrary: fc.record({ op: fc.constant("header" as const), column: fc.nat(140), text: cellText }),
  },
  { weight: 1, arbitrary: fc.record({ op: fc.constant("drop-column" as const), column: fc.nat(140) }) },
  { weight: 1, arbitrary: fc.record({ op: fc.constant("duplicate-column" as const), column: fc.nat(140) }) },
  { weight: 1, arbitrary: fc.record({ op: fc.constant("extra-column" as const), text: cellText }) },
  { weight: 1, arbitrary: fc.record({ op: fc.constant("drop-rows" as const), keep: fc.nat(5) }) },
  { weight: 1, arbitrary: fc.record({ op: fc.constant("duplicate-row" as const), row: fc.nat(60) }) },
  {
    weight: 1,
    arbitrary: fc.record({ op: fc.constant("blank-rows" as const), count: fc.integer({ min: 1, max: 5 }) }),
  },
  {
    weight: 1,
    arbitrary: fc.record({ op: fc.constant("wide" as const), columns: fc.integer({ min: 1, max: 400 }) }),
  },
);

function mutate(base: BaseTable, mutations: Mutation[]): BaseTable {
  let headers = [...base.headers];
  let rows = base.rows.map((r) => [...r]);
  for (const m of mutations) {
    const width = Math.max(1, headers.length);
    switch (m.op) {
      case "cell":
        if (rows.length > 0) rows[m.row % rows.length][m.column % width] = m.text;
        break;
      case "header":
        headers[m.column % width] = m.text;
        break;
      case "drop-column": {
        const c = m.column % width;
        headers = headers.filter((_, i) => i !== c);
        rows = rows.map((r) => r.filter((_, i) => i !== c));
        break;
      }
      case "duplicate-column": {
        const c = m.column % width;
        headers = [...headers, headers[c] ?? ""];
        rows = rows.map((r) => [...r, r[c] ?? ""]);
        break;
      }
      case "extra-column":
        headers = [...headers, m.text];
        rows = rows.map((r) => [...r, m.text]);
        break;
      case "drop-rows":
        rows = rows.slice(0, m.keep);
        break;
      case "duplicate-row":
        if (rows.length > 0) rows = [...rows, [...rows[m.row % rows.length]]];
        break;
      case "blank-rows":
        rows = [...rows, ...Array.from({ length: m.count }, () => headers.map(() => ""))];
        break;
      case "wide":
        headers = [...headers, ...Array.from({ length: m.columns }, (_, i) => `Extra ${i + 1}`)];
        break;
    }
  }
  return { headers, rows };
}

type Encoding =
  | "csv"
  | "csv-crlf-bom"
  | "csv-semicolon"
  | "csv-tab"
  | "csv-unquoted"
  | "xlsx"
  | "csv-named-xlsx"
  | "truncated-csv"
  | "truncated-xlsx";

/** A generated file as a description; `encodeFuzzFile` turns it into bytes. */
export interface FuzzFileSpec {
  kind: "table" | "bytes" | "zip-junk";
  encoding: Encoding;
  mutations: Mutation[];
  bytes: Uint8Array;
  cut: number;
  extension: ".csv" | ".xlsx";
}

export const fuzzFileSpec: fc.Arbitrary<FuzzFileSpec> = fc.record({
  kind: fc.oneof(
    { weight: 17, arbitrary: fc.constant("table" as const) },
    { weight: 2, arbitrary: fc.constant("bytes" as const) },
    { weight: 1, arbitrary: fc.constant("zip-junk" as const) },
  ),
  encoding: fc.oneof(
    { weight: 12, arbitrary: fc.constant("csv" as const) },
    { weight: 2, arbitrary: fc.constant("csv-crlf-bom" as const) },
    { weight: 1, arbitrary: fc.constant("csv-semicolon" as const) },
    { weight: 1, arbitrary: fc.constant("csv-tab" as const) },
    { weight: 1, arbitrary: fc.constant("csv-unquoted" as const) },
    { weight: 1, arbitrary: fc.constant("xlsx" as const) },
    { weight: 1, arbitrary: fc.constant("csv-named-xlsx" as const) },
    { weight: 1, arbitrary: fc.constant("truncated-csv" as const) },
    { weight: 1, arbitrary: fc.constant("truncated-xlsx" as const) },
  ),
  mutations: fc.array(mutation, { minLength: 0, maxLength: 5 }),
  bytes: fc.uint8Array({ maxLength: 600 }),
  cut: fc.double({ min: 0, max: 1, noNaN: true }),
  extension: fc.constantFrom(".csv" as const, ".xlsx" as const),
});

const quote = (c: string) => (/[",;\t\r\n]/.test(c) || /^\s|\s$/.test(c) ? `"${c.replace(/"/g, '""')}"` : c);

/** The bytes and name of a generated file, and a short description of what it is. */
export async function encodeFuzzFile(
  base: BaseTable,
  spec: FuzzFileSpec,
): Promise<{ fileName: string; data: Uint8Array; how: string }> {
  if (spec.kind === "bytes")
    return {
      fileName: `random${spec.extension}`,
      data: spec.bytes,
      how: `${spec.bytes.length} random bytes named ${spec.extension}`,
    };
  if (spec.kind === "zip-junk")
    return {
      fileName: "junk.xlsx",
      data: new Uint8Array([0x50, 0x4b, 0x03, 0x04, ...spec.bytes]),
      how: "zip signature then random bytes",
    };
  const table = mutate(base, spec.mutations);
  const how = `${spec.encoding}, mutations ${JSON.stringify(spec.mutations)}`;
  const text = (separator: string, newline: string, quoting: (c: string) => string) =>
    [table.headers, ...table.rows].map((r) => r.map(quoting).join(separator)).join(newline);
  const utf8 = (s: string) => new TextEncoder().encode(s);
  switch (spec.encoding) {
    case "csv":
      return { fileName: "file.csv", data: utf8(text(",", "\n", quote)), how };
    case "csv-crlf-bom":
      return { fileName: "file.csv", data: utf8(`\uFEFF${text(",", "\r\n", quote)}\r\n`), how };
    case "csv-semicolon":
      return { fileName: "file.csv", data: utf8(text(";", "\n", quote)), how };
    case "csv-tab":
      return { fileName: "file.csv", data: utf8(text("\t", "\n", quote)), how };
    case "csv-unquoted":
      return { fileName: "file.csv", data: utf8(text(",", "\n", (c) => c)), how };
    case "csv-named-xlsx":
      return { fileName: "file.xlsx", data: utf8(text(",", "\n", quote)), how };
    case "truncated-csv": {
      const full = utf8(text(",", "\n", quote));
      return { fileName: "file.csv", data: full.slice(0, Math.floor(full.length * spec.cut)), how };
    }
    case "xlsx":
    case "truncated-xlsx": {
      const full = await writeXlsx(table.headers, table.rows);
      const data =
        spec.encoding === "xlsx" ? full : full.slice(0, Math.max(4, Math.floor(full.length * spec.cut)));
      return { fileName: "file.xlsx", data, how };
    }
  }
}

/** Words that would mean a reader's internals leaked into a message meant for a builder. */
export const INTERNALS =
  /central directory|end of data|jszip|corrupted zip|invalid signature|\bat [\w.]+ \(|\[object Object\]|undefined/i;

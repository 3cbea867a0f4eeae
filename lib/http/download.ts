import { readFile } from "node:fs/promises";
import path from "node:path";
import { writeCsv, writeXlsx, type OutputCell } from "@/lib/workbook/table-io";

export const DOWNLOAD_FORMATS = ["csv", "xlsx"] as const;
export type DownloadFormat = (typeof DOWNLOAD_FORMATS)[number];

const CONTENT_TYPES: Record<DownloadFormat, string> = {
  csv: "text/csv; charset=utf-8",
  xlsx: "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
};

/** A table as a file download; text cells that could run as formulas are escaped by the writers. */
export async function tableDownload({
  format,
  fileBase,
  headers,
  rows,
  sheetName,
}: {
  format: DownloadFormat;
  fileBase: string;
  headers: readonly string[];
  rows: readonly (readonly OutputCell[])[];
  sheetName?: string;
}): Promise<Response> {
  const body = format === "csv" ? writeCsv(headers, rows) : await writeXlsx(headers, rows, { sheetName });
  const safeName = fileBase.replace(/[^A-Za-z0-9._-]+/g, "-");
  return new Response(
    typeof body === "string"
      ? body
      : (body.buffer.slice(body.byteOffset, body.byteOffset + body.byteLength) as ArrayBuffer),
    {
      headers: {
        "content-type": CONTENT_TYPES[format],
        "content-disposition": `attachment; filename="${safeName}.${format}"`,
        "cache-control": "no-store",
      },
    },
  );
}

/** An import template shipped in templates/ (`<baseName>.csv` or `.xlsx`) as a download. */
export async function templateDownload(baseName: string, format: DownloadFormat): Promise<Response> {
  const data = await readFile(path.join(process.cwd(), "templates", `${baseName}.${format}`));
  return new Response(new Uint8Array(data), {
    headers: {
      "content-type": CONTENT_TYPES[format],
      "content-disposition": `attachment; filename="${baseName}.${format}"`,
    },
  });
}

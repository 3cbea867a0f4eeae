import { z } from "zod";
import { apiRoute } from "@/lib/auth/route";
import { DOWNLOAD_FORMATS, tableDownload } from "@/lib/http/download";
import { LOT_COLUMNS, LOT_HEADERS } from "@/lib/workbook/lot-columns";

const querySchema = z.object({ format: z.enum(DOWNLOAD_FORMATS).default("xlsx") });

/** The lots import template: the header and one example row. */
export const GET = apiRoute<{ communityId: string }>({ permission: "read" }, async ({ request }) => {
  const { format } = querySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
  return tableDownload({ format, fileBase: "lots-template", sheetName: "Lots", headers: LOT_HEADERS, rows: [LOT_COLUMNS.map((c) => c.example)] });
});

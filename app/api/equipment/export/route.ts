import { z } from "zod";
import { listCatalog } from "@/db/queries/equipment";
import { apiRoute } from "@/lib/auth/route";
import { DOWNLOAD_FORMATS, tableDownload } from "@/lib/http/download";
import { EQUIPMENT_COLUMNS, EQUIPMENT_HEADERS } from "@/lib/workbook/equipment-columns";

const querySchema = z.object({ format: z.enum(DOWNLOAD_FORMATS).default("xlsx") });

/** The catalog in the template layout (re-importable); formula-like text written as text. */
export const GET = apiRoute({ permission: "read" }, async ({ db, member, request }) => {
  const { format } = querySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
  const systems = await listCatalog({ db, accountId: member.accountId });
  const rows = systems.map((s) => EQUIPMENT_COLUMNS.map((c) => s.cells[c.key] ?? null));
  return tableDownload({
    format,
    fileBase: `equipment-catalog-${new Date().toISOString().slice(0, 10)}`,
    sheetName: "Equipment catalog",
    headers: EQUIPMENT_HEADERS,
    rows,
  });
});

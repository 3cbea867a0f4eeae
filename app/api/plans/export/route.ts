import { listPlanLibrary } from "@/db/queries/plans";
import { apiRoute } from "@/lib/auth/route";
import { tableDownload } from "@/lib/http/download";
import { planLibraryExportTable } from "@/lib/workbook/plan-columns";
import { exportQuerySchema } from "./schema";

/**
 * The plan library as the grid shows it, in the template layout (cells as entered, formulas kept)
 * followed by the computed load columns, which an import skips. Formula-like text is escaped.
 */
export const GET = apiRoute({ permission: "read" }, async ({ db, member, request }) => {
  const query = exportQuerySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
  const library = await listPlanLibrary({
    db,
    accountId: member.accountId,
    communityId: query.communityId,
    full: true,
  });
  const table = planLibraryExportTable(
    library.plans.map((p) => ({ cells: p.cells, results: p.results ?? null })),
  );
  return tableDownload({
    format: query.format,
    fileBase: `plan-library-${new Date().toISOString().slice(0, 10)}`,
    sheetName: "Plan library",
    ...table,
  });
});

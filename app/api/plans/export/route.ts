import { listPlanLibrary } from "@/db/queries/plans";
import { apiRoute } from "@/lib/auth/route";
import { tableDownload } from "@/lib/http/download";
import { DESIGN_ESTIMATE_CAUTION } from "@/lib/load";
import { planRowsToTable } from "@/lib/workbook/plan-columns";
import { exportQuerySchema } from "./schema";

export const GET = apiRoute({ permission: "read" }, async ({ db, member, request }) => {
  const query = exportQuerySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
  const library = await listPlanLibrary({ db, accountId: member.accountId, communityId: query.communityId });
  const date = new Date().toISOString().slice(0, 10);
  if (query.what === "library") {
    const table = planRowsToTable(library.plans.map((p) => p.cells));
    return tableDownload({ format: query.format, fileBase: `plan-library-${date}`, sheetName: "Plan library", ...table });
  }
  const labels = ["N", "E", "S", "W"];
  const headers = [
    "Plan code",
    "Plan name",
    "Revision",
    "Design conditions from",
    ...labels.flatMap((l) => [`Front ${l} heating (Btu/h)`, `Front ${l} cooling total (Btu/h)`, `Front ${l} tons`]),
    "Worst facing",
    "Cooling spread (Btu/h)",
    "Engine version",
    "Note",
  ];
  const rows = library.plans.map((p) => [
    p.planCode,
    p.name,
    `${p.revisionNumber} (${p.revisionStatus})`,
    library.reference.community?.name ?? "",
    ...(p.loads ? p.loads.facings.flatMap((f) => [Math.round(f.heatingBtuh), Math.round(f.coolingTotalBtuh), Number(f.tons.toFixed(2))]) : labels.flatMap(() => [null, null, null])),
    p.loads ? `Front to ${p.loads.worst.label}` : (p.loadsError ?? ""),
    p.loads ? Math.round(p.loads.coolingSpreadBtuh) : null,
    p.loads?.engineVersion ?? "",
    DESIGN_ESTIMATE_CAUTION,
  ]);
  return tableDownload({ format: query.format, fileBase: `plan-loads-${date}`, sheetName: "Plan loads", headers, rows });
});

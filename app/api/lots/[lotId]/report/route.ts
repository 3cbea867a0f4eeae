import { lotReportPdf } from "@/db/queries/packets";
import { apiRoute, idParam } from "@/lib/auth/route";
import { fileResponse } from "@/app/api/packets/file-response";

/** The lot's heating and cooling load report as PDF, shown in the browser; a frozen lot reports its permit snapshot. */
export const GET = apiRoute<{ lotId: string }>({ permission: "read" }, async ({ db, member, params }) => {
  const file = await lotReportPdf({
    db,
    accountId: member.accountId,
    lotId: idParam(params.lotId, "That lot"),
  });
  return fileResponse(file, "inline");
});

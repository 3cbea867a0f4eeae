import { listAudit } from "@/db/queries/records";
import { apiRoute } from "@/lib/auth/route";

export const GET = apiRoute({ permission: "read" }, async ({ db, member }) => ({
  entries: await listAudit({ db, accountId: member.accountId }),
}));

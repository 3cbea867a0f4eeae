import { getLotById } from "@/db/queries/records";
import { apiRoute, idParam } from "@/lib/auth/route";

export const GET = apiRoute<{ lotId: string }>({ permission: "read" }, async ({ db, member, params }) => ({
  lot: await getLotById({ db, accountId: member.accountId, lotId: idParam(params.lotId, "That lot") }),
}));

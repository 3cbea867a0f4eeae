import { listLotsOfCommunity } from "@/db/queries/records";
import { apiRoute, idParam } from "@/lib/auth/route";

export const GET = apiRoute<{ communityId: string }>({ permission: "read" }, async ({ db, member, params }) => ({
  lots: await listLotsOfCommunity({ db, accountId: member.accountId, communityId: idParam(params.communityId, "That community") }),
}));

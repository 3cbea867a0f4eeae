import { createCommunity } from "@/db/queries/communities";
import { listCommunities } from "@/db/queries/records";
import { apiRoute, parseJsonBody } from "@/lib/auth/route";
import { communityBodySchema } from "./schema";

export const GET = apiRoute({ permission: "read" }, async ({ db, member }) => ({
  communities: await listCommunities({ db, accountId: member.accountId }),
}));

export const POST = apiRoute({ permission: "communities.edit" }, async ({ db, member, request }) => {
  const body = await parseJsonBody(request, communityBodySchema);
  return createCommunity({ db, accountId: member.accountId, userId: member.userId, ...body });
});

import { getCommunityById } from "@/db/queries/records";
import { apiRoute, idParam } from "@/lib/auth/route";

export const GET = apiRoute<{ communityId: string }>({ permission: "read" }, async ({ db, member, params }) => ({
  community: await getCommunityById({ db, accountId: member.accountId, communityId: idParam(params.communityId, "That community") }),
}));

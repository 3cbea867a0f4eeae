import { updateCommunity } from "@/db/queries/communities";
import { getCommunityById } from "@/db/queries/records";
import { apiRoute, idParam, parseJsonBody } from "@/lib/auth/route";
import { communityUpdateSchema } from "../schema";

export const GET = apiRoute<{ communityId: string }>(
  { permission: "read" },
  async ({ db, member, params }) => ({
    community: await getCommunityById({
      db,
      accountId: member.accountId,
      communityId: idParam(params.communityId, "That community"),
    }),
  }),
);

/** Saves the community's conditions and recomputes all of its lots. */
export const PATCH = apiRoute<{ communityId: string }>(
  { permission: "communities.edit" },
  async ({ db, member, params, request }) => {
    const body = await parseJsonBody(request, communityUpdateSchema);
    return updateCommunity({
      db,
      accountId: member.accountId,
      userId: member.userId,
      communityId: idParam(params.communityId, "That community"),
      ...body,
    });
  },
);

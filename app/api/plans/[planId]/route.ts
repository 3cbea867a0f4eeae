import { getPlanSheet } from "@/db/queries/plans";
import { apiRoute, idParam } from "@/lib/auth/route";
import { libraryQuerySchema } from "../schema";

export const GET = apiRoute<{ planId: string }>(
  { permission: "read" },
  async ({ db, member, params, request }) => {
    const { communityId } = libraryQuerySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
    return getPlanSheet({
      db,
      accountId: member.accountId,
      planId: idParam(params.planId, "That plan model"),
      communityId,
    });
  },
);

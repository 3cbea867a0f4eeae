import { undoPlanEdit } from "@/db/queries/plans";
import { apiRoute, parseJsonBody } from "@/lib/auth/route";
import { undoSchema } from "./schema";

export const POST = apiRoute({ permission: "plans.edit" }, async ({ db, member, request }) => {
  const { entryId } = await parseJsonBody(request, undoSchema);
  return undoPlanEdit({ db, accountId: member.accountId, userId: member.userId, entryId });
});

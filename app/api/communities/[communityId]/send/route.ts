import { communityOf, sendCommunityFile } from "@/db/queries/packets";
import { apiRoute, idParam, parseJsonBody } from "@/lib/auth/route";
import { sendBodySchema } from "./schema";

/** Generates the permit packet or a schedule, keeps it, and e-mails it as an attachment. */
export const POST = apiRoute<{ communityId: string }>({ permission: "schedules.export" }, async ({ db, member, params, request }) => {
  const communityId = idParam(params.communityId, "That community");
  await communityOf(db, member.accountId, communityId);
  const body = await parseJsonBody(request, sendBodySchema);
  const to = [...new Set(body.to.map((address) => address.toLowerCase()))];
  return sendCommunityFile({ db, accountId: member.accountId, userId: member.userId, senderName: member.name, accountName: member.accountName, communityId, to, what: body.what, lotIds: body.lotIds, statuses: body.statuses });
});

import { communityOf } from "@/db/queries/packets";
import { queuePacket } from "@/db/queries/packet-jobs";
import { apiRoute, idParam, parseJsonBody } from "@/lib/auth/route";
import { sendBodySchema } from "./schema";

/**
 * Asks for the permit packet or a schedule to be made, kept and e-mailed as an attachment:
 * checked and queued (202); progress on GET /api/packets/:id/status.
 */
export const POST = apiRoute<{ communityId: string }>(
  { permission: "schedules.export" },
  async ({ db, member, params, request }) => {
    const communityId = idParam(params.communityId, "That community");
    await communityOf(db, member.accountId, communityId);
    const body = await parseJsonBody(request, sendBodySchema);
    const to = [...new Set(body.to.map((address) => address.toLowerCase()))];
    const queued = await queuePacket({
      db,
      accountId: member.accountId,
      userId: member.userId,
      communityId,
      kind: body.what,
      lotIds: body.lotIds,
      statuses: body.statuses,
      to,
      senderName: member.name,
      accountName: member.accountName,
    });
    return Response.json({ ...queued, sentTo: to }, { status: 202 });
  },
);

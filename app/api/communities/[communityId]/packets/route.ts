import { communityOf, listPackets } from "@/db/queries/packets";
import { queuePacket } from "@/db/queries/packet-jobs";
import { apiRoute, idParam, parseJsonBody } from "@/lib/auth/route";
import { packetBodySchema } from "./schema";

/** The community's stored packets and e-mailed schedules, newest first, with who made them and when. */
export const GET = apiRoute<{ communityId: string }>(
  { permission: "read" },
  async ({ db, member, params }) => ({
    packets: await listPackets({
      db,
      accountId: member.accountId,
      communityId: idParam(params.communityId, "That community"),
    }),
  }),
);

/**
 * Asks for a permit packet (one PDF of the lots' load reports): checked and queued (202); a
 * worker makes it and keeps it, with progress on GET /api/packets/:id/status.
 */
export const POST = apiRoute<{ communityId: string }>(
  { permission: "schedules.export" },
  async ({ db, member, params, request }) => {
    const communityId = idParam(params.communityId, "That community");
    await communityOf(db, member.accountId, communityId);
    const body = await parseJsonBody(request, packetBodySchema);
    const queued = await queuePacket({
      db,
      accountId: member.accountId,
      userId: member.userId,
      communityId,
      kind: "permit-packet",
      lotIds: body.lotIds,
      statuses: body.statuses,
    });
    return Response.json(queued, { status: 202 });
  },
);

import { getPacketStatus } from "@/db/queries/packets";
import { apiRoute, idParam } from "@/lib/auth/route";

/** How far a requested packet has got: queued, rendering, sending, ready or failed (with why). */
export const GET = apiRoute<{ packetId: string }>({ permission: "read" }, async ({ db, member, params }) => ({
  packet: await getPacketStatus({
    db,
    accountId: member.accountId,
    packetId: idParam(params.packetId, "That packet"),
  }),
}));

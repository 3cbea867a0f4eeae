import { communityOf, createPermitPacket, listPackets } from "@/db/queries/packets";
import { apiRoute, idParam, parseJsonBody } from "@/lib/auth/route";
import { packetBodySchema } from "./schema";

/** The community's stored packets and e-mailed schedules, newest first, with who made them and when. */
export const GET = apiRoute<{ communityId: string }>({ permission: "read" }, async ({ db, member, params }) => ({
  packets: await listPackets({ db, accountId: member.accountId, communityId: idParam(params.communityId, "That community") }),
}));

/** Makes a permit packet (one PDF of the lots' load reports), keeps it in object storage and records it. */
export const POST = apiRoute<{ communityId: string }>({ permission: "schedules.export" }, async ({ db, member, params, request }) => {
  const communityId = idParam(params.communityId, "That community");
  await communityOf(db, member.accountId, communityId);
  const body = await parseJsonBody(request, packetBodySchema);
  return createPermitPacket({ db, accountId: member.accountId, userId: member.userId, communityId, lotIds: body.lotIds, statuses: body.statuses });
});

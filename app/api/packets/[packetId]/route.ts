import { getPacketFile } from "@/db/queries/packets";
import { apiRoute, idParam } from "@/lib/auth/route";
import { fileResponse } from "@/app/api/packets/file-response";

/** A stored packet or schedule export, as it was generated; one of another account is not found. */
export const GET = apiRoute<{ packetId: string }>({ permission: "read" }, async ({ db, member, params }) => {
  const { packet, body } = await getPacketFile({
    db,
    accountId: member.accountId,
    packetId: idParam(params.packetId, "That packet"),
  });
  return fileResponse(
    { fileName: packet.fileName, contentType: packet.contentType, body },
    packet.contentType === "application/pdf" ? "inline" : "attachment",
  );
});

import { revokeInvitation } from "@/db/queries/team";
import { apiRoute, idParam } from "@/lib/auth/route";

export const DELETE = apiRoute<{ invitationId: string }>(
  { permission: "team.manage" },
  async ({ db, member, params }) => {
    await revokeInvitation({
      db,
      accountId: member.accountId,
      invitationId: idParam(params.invitationId, "That invitation"),
      actorUserId: member.userId,
    });
    return { ok: true };
  },
);

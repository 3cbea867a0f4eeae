import { changeMemberRole, removeMember } from "@/db/queries/team";
import { apiRoute, idParam, parseJsonBody } from "@/lib/auth/route";
import { changeRoleSchema } from "./schema";

export const PATCH = apiRoute<{ membershipId: string }>(
  { permission: "team.manage" },
  async ({ db, member, params, request }) => {
    const { role } = await parseJsonBody(request, changeRoleSchema);
    await changeMemberRole({
      db,
      accountId: member.accountId,
      membershipId: idParam(params.membershipId, "That member"),
      role,
      actorUserId: member.userId,
    });
    return { ok: true };
  },
);

export const DELETE = apiRoute<{ membershipId: string }>(
  { permission: "team.manage" },
  async ({ db, member, params }) => {
    await removeMember({
      db,
      accountId: member.accountId,
      membershipId: idParam(params.membershipId, "That member"),
      actorUserId: member.userId,
    });
    return { ok: true };
  },
);

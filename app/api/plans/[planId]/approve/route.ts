import { approveRevision } from "@/db/queries/plans";
import { apiRoute, idParam, parseJsonBody } from "@/lib/auth/route";
import { approveSchema } from "./schema";

export const POST = apiRoute<{ planId: string }>(
  { permission: "plans.approve" },
  async ({ db, member, params, request }) => {
    const body = await parseJsonBody(request, approveSchema);
    await approveRevision({
      db,
      accountId: member.accountId,
      userId: member.userId,
      planId: idParam(params.planId, "That plan model"),
      ...body,
    });
    return { ok: true };
  },
);

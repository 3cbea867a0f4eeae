import { setLotStatus } from "@/db/queries/lots";
import { apiRoute, idParam, parseJsonBody } from "@/lib/auth/route";
import { lotStatusSchema } from "./schema";

/** Moves a lot to a status; submitting for permit freezes a snapshot, `refresh` takes a new one. */
export const POST = apiRoute<{ lotId: string }>(
  { permission: "lots.permit" },
  async ({ db, member, params, request }) => {
    const body = await parseJsonBody(request, lotStatusSchema);
    return setLotStatus({
      db,
      accountId: member.accountId,
      userId: member.userId,
      lotId: idParam(params.lotId, "That lot"),
      ...body,
    });
  },
);

import { getSizingLimits, setSizingLimits } from "@/db/queries/equipment";
import { apiRoute, parseJsonBody } from "@/lib/auth/route";
import { z } from "zod";

const bodySchema = z.object({ limits: z.record(z.string(), z.number()) });

export const GET = apiRoute({ permission: "read" }, async ({ db, member }) =>
  getSizingLimits({ db, accountId: member.accountId }),
);

/** An admin sets the sizing limits (checked by lib/equipment's schema); every lot is reselected. */
export const PUT = apiRoute({ permission: "account.settings" }, async ({ db, member, request }) => {
  const { limits } = await parseJsonBody(request, bodySchema);
  return setSizingLimits({ db, accountId: member.accountId, userId: member.userId, limits });
});

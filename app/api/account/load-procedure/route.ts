import { getLoadProcedure, setLoadProcedure } from "@/db/queries/account";
import { apiRoute, parseJsonBody } from "@/lib/auth/route";
import { loadProcedureSchema } from "./schema";

/** Every member may see which procedure sizes the account's equipment. */
export const GET = apiRoute({ permission: "read" }, async ({ db, member }) =>
  getLoadProcedure({ db, accountId: member.accountId }),
);

/** An admin picks the procedure; every lot is recomputed by it (frozen lots keep their snapshot). */
export const PUT = apiRoute({ permission: "account.settings" }, async ({ db, member, request }) => {
  const { procedure, from } = await parseJsonBody(request, loadProcedureSchema);
  return setLoadProcedure({ db, accountId: member.accountId, userId: member.userId, procedure, from });
});

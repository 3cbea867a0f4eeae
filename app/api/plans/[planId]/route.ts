import { getPlanById } from "@/db/queries/records";
import { apiRoute, idParam } from "@/lib/auth/route";

export const GET = apiRoute<{ planId: string }>({ permission: "read" }, async ({ db, member, params }) =>
  getPlanById({ db, accountId: member.accountId, planId: idParam(params.planId, "That plan model") }),
);

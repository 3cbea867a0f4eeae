import { listPlans } from "@/db/queries/records";
import { apiRoute } from "@/lib/auth/route";

export const GET = apiRoute({ permission: "read" }, async ({ db, member }) => ({ plans: await listPlans({ db, accountId: member.accountId }) }));

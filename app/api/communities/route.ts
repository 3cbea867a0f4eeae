import { listCommunities } from "@/db/queries/records";
import { apiRoute } from "@/lib/auth/route";

export const GET = apiRoute({ permission: "read" }, async ({ db, member }) => ({ communities: await listCommunities({ db, accountId: member.accountId }) }));

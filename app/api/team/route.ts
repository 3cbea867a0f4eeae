import { listTeam } from "@/db/queries/team";
import { apiRoute } from "@/lib/auth/route";

export const GET = apiRoute({ permission: "read" }, async ({ db, member }) =>
  listTeam({ db, accountId: member.accountId }),
);

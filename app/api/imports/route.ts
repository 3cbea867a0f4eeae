import { listImports } from "@/db/queries/records";
import { apiRoute } from "@/lib/auth/route";

export const GET = apiRoute({ permission: "imports.read" }, async ({ db, member }) => ({
  imports: await listImports({ db, accountId: member.accountId }),
}));

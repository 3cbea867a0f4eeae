import { listCatalog } from "@/db/queries/equipment";
import { apiRoute } from "@/lib/auth/route";

/** The catalog as the grid shows it: one row of cells per system, by column key. */
export const GET = apiRoute({ permission: "read" }, async ({ db, member }) => ({
  systems: await listCatalog({ db, accountId: member.accountId }),
}));

import { getImportById } from "@/db/queries/records";
import { apiRoute, idParam } from "@/lib/auth/route";

export const GET = apiRoute<{ importId: string }>(
  { permission: "imports.read" },
  async ({ db, member, params }) => ({
    import: await getImportById({
      db,
      accountId: member.accountId,
      importId: idParam(params.importId, "That import"),
    }),
  }),
);

import { editCatalogSystem } from "@/db/queries/equipment";
import { getEquipmentSystemById } from "@/db/queries/records";
import { apiRoute, idParam, parseJsonBody } from "@/lib/auth/route";
import { systemEditSchema } from "./schema";

export const GET = apiRoute<{ systemId: string }>({ permission: "read" }, async ({ db, member, params }) => ({
  system: await getEquipmentSystemById({
    db,
    accountId: member.accountId,
    systemId: idParam(params.systemId, "That equipment system"),
  }),
}));

/** Edits a system's cells (validated like an import row) and reselects every lot. */
export const PATCH = apiRoute<{ systemId: string }>(
  { permission: "equipment.edit" },
  async ({ db, member, params, request }) => {
    const body = await parseJsonBody(request, systemEditSchema);
    return editCatalogSystem({
      db,
      accountId: member.accountId,
      userId: member.userId,
      systemId: idParam(params.systemId, "That equipment system"),
      ...body,
    });
  },
);

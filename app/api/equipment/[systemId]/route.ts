import { getEquipmentSystemById } from "@/db/queries/records";
import { apiRoute, idParam } from "@/lib/auth/route";

export const GET = apiRoute<{ systemId: string }>({ permission: "read" }, async ({ db, member, params }) => ({
  system: await getEquipmentSystemById({ db, accountId: member.accountId, systemId: idParam(params.systemId, "That equipment system") }),
}));

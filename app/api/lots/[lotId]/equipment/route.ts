import { overrideLotSystem } from "@/db/queries/equipment";
import { apiRoute, idParam, parseJsonBody } from "@/lib/auth/route";
import { lotEquipmentSchema } from "./schema";

export const POST = apiRoute<{ lotId: string }>(
  { permission: "equipment.override" },
  async ({ db, member, params, request }) => {
    const body = await parseJsonBody(request, lotEquipmentSchema);
    return overrideLotSystem({
      db,
      accountId: member.accountId,
      userId: member.userId,
      lotId: idParam(params.lotId, "That lot"),
      ...body,
    });
  },
);

import { z } from "zod";
import { communityEquipmentSchedule, equipmentScheduleFile } from "@/db/queries/equipment-schedule";
import { apiRoute, idParam } from "@/lib/auth/route";
import { fileResponse } from "@/app/api/packets/file-response";

const querySchema = z.object({ format: z.enum(["xlsx", "csv", "json"]).default("xlsx") });

/**
 * The community's equipment schedule: counts of each system (and by month of planned start),
 * totals and cost, lots without a system with the reason, the sizing limits used. XLSX (one sheet
 * per table) or CSV (tables one after another), text that could run as a formula written as text;
 * JSON for the Schedules page.
 */
export const GET = apiRoute<{ communityId: string }>(
  { permission: "read" },
  async ({ db, member, params, request }) => {
    const { format } = querySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
    const communityId = idParam(params.communityId, "That community");
    if (format === "json")
      return communityEquipmentSchedule({ db, accountId: member.accountId, communityId });
    const file = await equipmentScheduleFile({ db, accountId: member.accountId, communityId, format });
    return fileResponse(file, "attachment");
  },
);

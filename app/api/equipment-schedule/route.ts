import { z } from "zod";
import { accountEquipmentScheduleFile } from "@/db/queries/equipment-schedule";
import { apiRoute } from "@/lib/auth/route";

const querySchema = z.object({ format: z.enum(["xlsx", "csv"]).default("xlsx") });

/** The equipment schedule across all of the account's communities (counts by community and month, totals, cost). */
export const GET = apiRoute({ permission: "read" }, async ({ db, member, request }) => {
  const { format } = querySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
  const file = await accountEquipmentScheduleFile({ db, accountId: member.accountId, format });
  return new Response(file.body as BlobPart, {
    headers: {
      "content-type": file.contentType,
      "content-disposition": `attachment; filename="${file.fileName}"`,
      "cache-control": "no-store",
    },
  });
});

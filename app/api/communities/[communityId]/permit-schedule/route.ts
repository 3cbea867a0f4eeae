import { z } from "zod";
import { permitScheduleRows } from "@/db/queries/permit-schedule";
import { apiRoute, idParam } from "@/lib/auth/route";
import { DOWNLOAD_FORMATS, tableDownload } from "@/lib/http/download";

const querySchema = z.object({ format: z.enum(DOWNLOAD_FORMATS).default("xlsx") });

/** The permit schedule, one row per lot; text that could run as a formula is written as text. */
export const GET = apiRoute<{ communityId: string }>(
  { permission: "read" },
  async ({ db, member, params, request }) => {
    const { format } = querySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
    const { community, headers, rows } = await permitScheduleRows({
      db,
      accountId: member.accountId,
      communityId: idParam(params.communityId, "That community"),
    });
    return tableDownload({
      format,
      fileBase: `permit-schedule-${community.name}-${new Date().toISOString().slice(0, 10)}`,
      sheetName: "Permit schedule",
      headers,
      rows,
    });
  },
);

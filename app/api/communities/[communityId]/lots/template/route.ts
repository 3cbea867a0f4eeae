import { z } from "zod";
import { getCommunityById } from "@/db/queries/records";
import { apiRoute, idParam } from "@/lib/auth/route";
import { DOWNLOAD_FORMATS, tableDownload } from "@/lib/http/download";
import { LOT_COLUMNS, LOT_HEADERS } from "@/lib/workbook/lot-columns";

const querySchema = z.object({ format: z.enum(DOWNLOAD_FORMATS).default("xlsx") });

/** The lots import template of one of the account's communities: the header and one example row. */
export const GET = apiRoute<{ communityId: string }>(
  { permission: "read" },
  async ({ db, member, params, request }) => {
    // The template is the same for every community, but the address names one: it must be the caller's.
    await getCommunityById({
      db,
      accountId: member.accountId,
      communityId: idParam(params.communityId, "That community"),
    });
    const { format } = querySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
    return tableDownload({
      format,
      fileBase: "lots-template",
      sheetName: "Lots",
      headers: LOT_HEADERS,
      rows: [LOT_COLUMNS.map((c) => c.example)],
    });
  },
);

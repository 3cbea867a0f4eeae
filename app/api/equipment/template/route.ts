import { z } from "zod";
import { apiRoute } from "@/lib/auth/route";
import { DOWNLOAD_FORMATS, templateDownload } from "@/lib/http/download";

const querySchema = z.object({ format: z.enum(DOWNLOAD_FORMATS).default("xlsx") });

/** The equipment catalog import template (templates/equipment-catalog-template.*). */
export const GET = apiRoute({ permission: "read" }, async ({ request }) => {
  const { format } = querySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
  return templateDownload("equipment-catalog-template", format);
});

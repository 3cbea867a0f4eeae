import { z } from "zod";
import { apiRoute } from "@/lib/auth/route";
import { DOWNLOAD_FORMATS, templateDownload } from "@/lib/http/download";

const querySchema = z.object({ format: z.enum(DOWNLOAD_FORMATS).default("xlsx") });

/** The plan library import template (templates/plan-library-template.*). */
export const GET = apiRoute({ permission: "read" }, async ({ request }) => {
  const { format } = querySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
  return templateDownload("plan-library-template", format);
});

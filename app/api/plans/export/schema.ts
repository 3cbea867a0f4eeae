import { z } from "zod";
import { idQueryParam } from "@/lib/http/ids";
import { DOWNLOAD_FORMATS } from "@/lib/http/download";

export const exportQuerySchema = z.object({
  format: z.enum(DOWNLOAD_FORMATS).default("xlsx"),
  communityId: idQueryParam.optional(),
});

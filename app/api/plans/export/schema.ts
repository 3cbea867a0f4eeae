import { z } from "zod";
import { DOWNLOAD_FORMATS } from "@/lib/http/download";

export const exportQuerySchema = z.object({
  format: z.enum(DOWNLOAD_FORMATS).default("xlsx"),
  communityId: z.coerce.number().int().positive().optional(),
});

import { z } from "zod";
import { DOWNLOAD_FORMATS } from "@/lib/http/download";

export const exportQuerySchema = z.object({
  format: z.enum(DOWNLOAD_FORMATS).default("xlsx"),
  /** library: the template layout (re-importable); loads: the computed facing loads. */
  what: z.enum(["library", "loads"]).default("library"),
  communityId: z.coerce.number().int().positive().optional(),
});

import { z } from "zod";
import { LOT_STATUSES } from "@/db/schema";

export const lotStatusSchema = z.object({
  version: z.number().int().positive(),
  status: z.enum(LOT_STATUSES, { message: `Status must be one of ${LOT_STATUSES.join(", ")}` }),
  /** Take a new permit snapshot from the current plan and conditions (explicit action). */
  refresh: z.boolean().default(false),
});

import { z } from "zod";
import { LOT_STATUSES } from "@/db/schema";

const lotIdsSchema = z
  .array(
    z
      .number({ error: "each lot id must be a number" })
      .int({ error: "each lot id must be a whole number" })
      .positive({ error: "each lot id must be positive" }),
    { error: "lotIds must be a list of lot ids" },
  )
  .max(2000, { error: "at most 2,000 lots in one packet" });
const statusesSchema = z
  .array(z.enum(LOT_STATUSES, { error: `each status must be one of ${LOT_STATUSES.join(", ")}` }), {
    error: "statuses must be a list of lot statuses",
  })
  .max(LOT_STATUSES.length);

/** POST /api/communities/:id/packets — which lots go in the packet (default: every lot of the community). */
export const packetBodySchema = z
  .object({ lotIds: lotIdsSchema.optional(), statuses: statusesSchema.optional() })
  .strict();
export type PacketBody = z.infer<typeof packetBodySchema>;

export { lotIdsSchema, statusesSchema };

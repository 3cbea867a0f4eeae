import { z } from "zod";
import { PACKET_KINDS } from "@/db/queries/packets";
import { lotIdsSchema, statusesSchema } from "../packets/schema";

export const MAX_RECIPIENTS = 20;

/** POST /api/communities/:id/send — what to send, to whom. */
export const sendBodySchema = z
  .object({
    to: z
      .array(
        z
          .string({ error: "each address must be text" })
          .trim()
          .pipe(z.email({ error: (issue) => `"${String(issue.input)}" is not an e-mail address` })),
        { error: "to must be a list of e-mail addresses" },
      )
      .min(1, { error: "at least one e-mail address is needed" })
      .max(MAX_RECIPIENTS, { error: `at most ${MAX_RECIPIENTS} addresses at a time` }),
    what: z.enum(PACKET_KINDS, { error: `what must be one of ${PACKET_KINDS.join(", ")}` }),
    lotIds: lotIdsSchema.optional(),
    statuses: statusesSchema.optional(),
  })
  .strict();
export type SendBody = z.infer<typeof sendBodySchema>;

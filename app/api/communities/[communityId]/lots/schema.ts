import { z } from "zod";

export const lotEditSchema = z.object({
  changes: z
    .array(
      z.object({
        lotId: z.number().int().positive(),
        version: z.number().int().positive(),
        planId: z.number().int().positive().optional(),
        /** A compass point (N, NE, …) or degrees from north. */
        facing: z.union([z.string().max(20), z.number()]).optional(),
        address: z.string().max(200).optional(),
        optionsNote: z.string().max(300).optional(),
        plannedStart: z.iso.date("Planned start must be a date written YYYY-MM-DD").nullable().optional(),
      }),
    )
    .min(1, "There is nothing to save.")
    .max(10_000),
});

import { z } from "zod";

export const systemEditSchema = z.object({
  version: z.number().int().positive(),
  cells: z.record(z.string().max(60), z.union([z.string().max(200), z.number(), z.null()])),
});

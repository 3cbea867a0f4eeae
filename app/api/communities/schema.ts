import { z } from "zod";

/** Conditions are checked by the engine's own schema (lib/load/input.ts) in the query; here only the shape. */
export const communityBodySchema = z.object({
  name: z.string().trim().min(1, "Enter the community's name").max(160),
  locality: z.string().trim().max(160).default(""),
  conditions: z.record(z.string(), z.unknown()),
});

export const communityUpdateSchema = communityBodySchema.extend({ version: z.number().int().positive() });

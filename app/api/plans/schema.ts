import { z } from "zod";
import { idQueryParam } from "@/lib/http/ids";

const cellValue = z.union([z.string().max(500), z.number(), z.boolean(), z.null()]);

export const planEditSchema = z.object({
  action: z.enum(["edit", "bulk_edit", "paste"]).default("edit"),
  changes: z
    .array(
      z.object({
        planId: z.number().int().positive(),
        version: z.number().int().positive(),
        cells: z.record(z.string().max(80), cellValue),
      }),
    )
    .min(1, "There is nothing to save.")
    .max(2000),
});

export const libraryQuerySchema = z.object({ communityId: idQueryParam.optional() });

export const copyPlanSchema = z.object({
  fromPlanId: z.number().int().positive(),
  planCode: z.string().trim().min(1, "Enter a plan code for the new model").max(40),
  name: z.string().trim().min(1, "Enter a name for the new model").max(120),
});

import { z } from "zod";

export const lotEquipmentSchema = z.object({
  version: z.number().int().positive(),
  /** The system chosen by hand, or null to go back to the best fit. */
  systemId: z.number().int().positive().nullable(),
});

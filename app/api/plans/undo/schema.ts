import { z } from "zod";

export const undoSchema = z.object({ entryId: z.number().int().positive() });

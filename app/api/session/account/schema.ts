import { z } from "zod";

export const chooseAccountSchema = z.object({ accountId: z.number().int().positive() });

import { z } from "zod";

export const acceptInvitationSchema = z.object({
  name: z.string().trim().max(160).default(""),
  password: z.string().max(200),
});

import { z } from "zod";
import { ROLES } from "@/db/schema";

export const inviteSchema = z.object({
  email: z.string().trim().toLowerCase().email("Enter an e-mail address like name@example.com"),
  name: z.string().trim().min(1, "Enter the person's name").max(160),
  role: z.enum(ROLES, { message: `Role must be one of ${ROLES.join(", ")}` }),
});

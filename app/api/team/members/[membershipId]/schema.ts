import { z } from "zod";
import { ROLES } from "@/db/schema";

export const changeRoleSchema = z.object({
  role: z.enum(ROLES, { message: `Role must be one of ${ROLES.join(", ")}` }),
});

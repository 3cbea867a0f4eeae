import { z } from "zod";
import { LOAD_PROCEDURES } from "@/lib/load/results";

const procedure = z.enum(LOAD_PROCEDURES, { error: `must be one of ${LOAD_PROCEDURES.join(", ")}` });

/** The procedure to use, and the one the admin saw (a stale one is refused). */
export const loadProcedureSchema = z.object({ procedure, from: procedure }).strict();

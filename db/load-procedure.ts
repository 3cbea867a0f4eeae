// The account's load procedure: the one that sizes equipment and goes on the permit papers. No
// "server-only" guard: recomputeLots (used by the seed and the benchmark) reads it too.
import { eq } from "drizzle-orm";
import { DEFAULT_LOAD_PROCEDURE, LOAD_PROCEDURES, type LoadProcedure } from "@/lib/load/results";
import type { Database } from "./index";
import { accounts } from "./schema";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

/**
 * Results stored before procedures were named (lot results, permit snapshots) came from the
 * hourly method, the only one the engine ran then.
 */
export const PROCEDURE_OF_UNNAMED_RESULTS: LoadProcedure = "hourly";

export function isLoadProcedure(value: unknown): value is LoadProcedure {
  return typeof value === "string" && (LOAD_PROCEDURES as readonly string[]).includes(value);
}

/** The procedure a stored result names, or the one unnamed results were made by. */
export function procedureOfStored(stored: { procedure?: unknown } | null | undefined): LoadProcedure {
  return isLoadProcedure(stored?.procedure) ? stored.procedure : PROCEDURE_OF_UNNAMED_RESULTS;
}

/** The account's chosen procedure (the column's default when the account is not found). */
export async function loadProcedureOf(db: Database | Tx, accountId: number): Promise<LoadProcedure> {
  const [account] = await db
    .select({ procedure: accounts.loadProcedure })
    .from(accounts)
    .where(eq(accounts.id, accountId));
  return account?.procedure ?? DEFAULT_LOAD_PROCEDURE;
}

import "server-only";
import type { Database } from "@/db";
import { auditLog } from "@/db/schema";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

/** One history entry: who, when, what, before and after. Written in the same transaction as the change. */
export async function recordAudit(
  tx: Tx | Database,
  entry: {
    accountId: number;
    userId: number | null;
    action: string;
    entityType: string;
    entityId: number | null;
    summary: string;
    before?: unknown;
    after?: unknown;
  },
): Promise<number> {
  const [{ id }] = await tx
    .insert(auditLog)
    .values({ ...entry, before: entry.before ?? null, after: entry.after ?? null })
    .$returningId();
  return id;
}

import "server-only";
import { and, eq } from "drizzle-orm";
import type { Database } from "@/db";
import { communities } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { AppError, notFound } from "@/lib/errors";
import { safeParseSiteConditions } from "@/lib/load/input";
import { recomputeLots } from "../recompute";

function validConditions(raw: unknown) {
  const parsed = safeParseSiteConditions(raw);
  if (!parsed.ok) {
    throw new AppError(
      "invalid_input",
      "Some design conditions are not valid; nothing was saved.",
      parsed.issues.map((i) => ({ field: `conditions.${i.field}`, message: i.message })),
    );
  }
  return parsed.value;
}

async function assertNameFree(
  db: Pick<Database, "select">,
  accountId: number,
  name: string,
  exceptId?: number,
) {
  const [clash] = await db
    .select({ id: communities.id })
    .from(communities)
    .where(and(eq(communities.accountId, accountId), eq(communities.name, name)));
  if (clash && clash.id !== exceptId)
    throw new AppError("conflict", `A community named "${name}" exists already.`, [
      { field: "name", message: "Already used" },
    ]);
}

export async function createCommunity({
  db,
  accountId,
  userId,
  name,
  locality,
  conditions,
}: {
  db: Database;
  accountId: number;
  userId: number;
  name: string;
  locality: string;
  conditions: unknown;
}) {
  const site = validConditions(conditions);
  return db.transaction(async (tx) => {
    await assertNameFree(tx, accountId, name);
    const [{ id }] = await tx
      .insert(communities)
      .values({ accountId, name, locality, conditions: site })
      .$returningId();
    await recordAudit(tx, {
      accountId,
      userId,
      action: "community_create",
      entityType: "community",
      entityId: id,
      summary: `Created community ${name}`,
      after: { name, locality, conditions: site },
    });
    return { id };
  });
}

/** Saves a community's name and design conditions (version-checked) and recomputes all its lots. */
export async function updateCommunity({
  db,
  accountId,
  userId,
  communityId,
  version,
  name,
  locality,
  conditions,
}: {
  db: Database;
  accountId: number;
  userId: number;
  communityId: number;
  version: number;
  name: string;
  locality: string;
  conditions: unknown;
}) {
  return db.transaction(async (tx) => {
    const [current] = await tx
      .select()
      .from(communities)
      .where(and(eq(communities.id, communityId), eq(communities.accountId, accountId)))
      .for("update");
    if (!current) throw notFound("That community");
    const site = validConditions(conditions);
    if (current.version !== version)
      throw new AppError(
        "conflict",
        `${current.name} was changed by someone else since you loaded it. Nothing was saved; reload to see the current values.`,
      );
    await assertNameFree(tx, accountId, name, communityId);
    await tx
      .update(communities)
      .set({ name, locality, conditions: site, version: current.version + 1 })
      .where(eq(communities.id, communityId));
    const recomputed = await recomputeLots(tx, { accountId, communityId });
    await recordAudit(tx, {
      accountId,
      userId,
      action: "community_update",
      entityType: "community",
      entityId: communityId,
      summary: `Saved ${name}'s design conditions; ${recomputed.recomputed} lots recomputed, ${recomputed.changed} changed`,
      before: { name: current.name, locality: current.locality, conditions: current.conditions },
      after: { name, locality, conditions: site },
    });
    return { version: current.version + 1, ...recomputed };
  });
}

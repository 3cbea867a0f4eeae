import "server-only";
import { and, asc, desc, eq } from "drizzle-orm";
import type { Database } from "@/db";
import { auditLog, communities, equipmentSystems, imports, lots, users } from "@/db/schema";
import { notFound } from "@/lib/errors";

// Read queries for the account's records. Every one takes the account id, so none can forget it;
// a record of another account is simply not found.

export async function listCommunities({ db, accountId }: { db: Database; accountId: number }) {
  return db
    .select()
    .from(communities)
    .where(eq(communities.accountId, accountId))
    .orderBy(asc(communities.name));
}

export async function getCommunityById({
  db,
  accountId,
  communityId,
}: {
  db: Database;
  accountId: number;
  communityId: number;
}) {
  const [community] = await db
    .select()
    .from(communities)
    .where(and(eq(communities.id, communityId), eq(communities.accountId, accountId)));
  if (!community) throw notFound("That community");
  return community;
}

export async function getLotById({
  db,
  accountId,
  lotId,
}: {
  db: Database;
  accountId: number;
  lotId: number;
}) {
  const [lot] = await db
    .select()
    .from(lots)
    .where(and(eq(lots.id, lotId), eq(lots.accountId, accountId)));
  if (!lot) throw notFound("That lot");
  return lot;
}

export async function getEquipmentSystemById({
  db,
  accountId,
  systemId,
}: {
  db: Database;
  accountId: number;
  systemId: number;
}) {
  const [system] = await db
    .select()
    .from(equipmentSystems)
    .where(and(eq(equipmentSystems.id, systemId), eq(equipmentSystems.accountId, accountId)));
  if (!system) throw notFound("That equipment system");
  return system;
}

export async function listImports({ db, accountId }: { db: Database; accountId: number }) {
  return db
    .select({
      id: imports.id,
      kind: imports.kind,
      fileName: imports.fileName,
      fileSizeBytes: imports.fileSizeBytes,
      state: imports.state,
      progressPct: imports.progressPct,
      createdCount: imports.createdCount,
      updatedCount: imports.updatedCount,
      errors: imports.errors,
      errorCount: imports.errorCount,
      createdAt: imports.createdAt,
      finishedAt: imports.finishedAt,
      userName: users.name,
      communityId: imports.communityId,
      communityName: communities.name,
    })
    .from(imports)
    .innerJoin(users, eq(users.id, imports.userId))
    .leftJoin(communities, eq(communities.id, imports.communityId))
    .where(eq(imports.accountId, accountId))
    .orderBy(desc(imports.createdAt));
}

export async function getImportById({
  db,
  accountId,
  importId,
}: {
  db: Database;
  accountId: number;
  importId: number;
}) {
  const [record] = await db
    .select()
    .from(imports)
    .where(and(eq(imports.id, importId), eq(imports.accountId, accountId)));
  if (!record) throw notFound("That import");
  return record;
}

export async function listAudit({
  db,
  accountId,
  limit = 200,
}: {
  db: Database;
  accountId: number;
  limit?: number;
}) {
  return db
    .select({
      id: auditLog.id,
      action: auditLog.action,
      entityType: auditLog.entityType,
      entityId: auditLog.entityId,
      summary: auditLog.summary,
      createdAt: auditLog.createdAt,
      userName: users.name,
    })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.userId))
    .where(eq(auditLog.accountId, accountId))
    .orderBy(desc(auditLog.createdAt), desc(auditLog.id))
    .limit(limit);
}

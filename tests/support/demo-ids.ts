import { eq } from "drizzle-orm";
import type { Database } from "@/db";
import {
  accounts,
  communities,
  equipmentSystems,
  imports,
  lots,
  memberships,
  plans,
  users,
} from "@/db/schema";
import { seedDatabase } from "@/db/seed";
import { DEMO_ACCOUNT, OTHER_ACCOUNT } from "@/db/demo-scenario";

/** Seeds (idempotently) and returns the ids the tests need. */
export async function seededIds(db: Database) {
  await seedDatabase(db);
  const accountId = async (slug: string) =>
    (await db.select().from(accounts).where(eq(accounts.slug, slug)))[0].id;
  const userId = async (email: string) => (await db.select().from(users).where(eq(users.email, email)))[0].id;
  const demo = await accountId(DEMO_ACCOUNT.slug);
  const other = await accountId(OTHER_ACCOUNT.slug);
  const roleUsers = Object.fromEntries(
    await Promise.all(DEMO_ACCOUNT.users.map(async (u) => [u.role, await userId(u.email)] as const)),
  );
  const firstOf = async <T extends { id: unknown; accountId: unknown }>(
    table: any,
    account: number,
  ): Promise<number> =>
    (
      (await db.select().from(table).where(eq(table.accountId, account)).limit(1)) as unknown as {
        id: number;
      }[]
    )[0]?.id;
  const recordsOf = async (account: number) => {
    let importId = await firstOf(imports, account);
    if (!importId) {
      const [m] = await db.select().from(memberships).where(eq(memberships.accountId, account)).limit(1);
      [{ id: importId }] = await db
        .insert(imports)
        .values({
          accountId: account,
          userId: m.userId,
          kind: "lots",
          fileName: "lots.csv",
          fileSizeBytes: 10,
          state: "failed",
          errors: [],
        })
        .$returningId();
    }
    const [membership] = await db
      .select()
      .from(memberships)
      .where(eq(memberships.accountId, account))
      .limit(1);
    return {
      planId: await firstOf(plans, account),
      communityId: await firstOf(communities, account),
      lotId: await firstOf(lots, account),
      systemId: await firstOf(equipmentSystems, account),
      importId,
      membershipId: membership.id,
    };
  };
  return {
    demoAccountId: demo,
    otherAccountId: other,
    roleUsers: roleUsers as Record<"admin" | "designer" | "reviewer" | "purchasing" | "viewer", number>,
    otherAdminId: await userId(OTHER_ACCOUNT.users[0].email),
    demoRecords: await recordsOf(demo),
    otherRecords: await recordsOf(other),
  };
}

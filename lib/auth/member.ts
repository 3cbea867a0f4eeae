import "server-only";
import { and, asc, eq } from "drizzle-orm";
import type { Database } from "@/db";
import { accounts, memberships, users, type Role } from "@/db/schema";
import { AppError } from "@/lib/errors";
import { can, type Permission } from "./permissions";

export interface Member {
  userId: number;
  email: string;
  name: string;
  accountId: number;
  accountName: string;
  role: Role;
}

/** Every account a user belongs to, with the role there. */
export async function listMembershipsOfUser({ db, userId }: { db: Database; userId: number }) {
  return db
    .select({ accountId: accounts.id, accountName: accounts.name, role: memberships.role })
    .from(memberships)
    .innerJoin(accounts, eq(accounts.id, memberships.accountId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(accounts.name));
}

/**
 * The one authorisation check: the user must belong to the account and the role must allow the
 * permission. With no account chosen, a user of exactly one account gets that account.
 */
export async function authorizeMember({
  db,
  userId,
  accountId,
  permission,
}: {
  db: Database;
  userId: number | null;
  accountId: number | null;
  permission: Permission;
}): Promise<Member> {
  if (!userId) throw new AppError("unauthenticated", "Sign in to continue.");
  const rows = await db
    .select({
      userId: users.id,
      email: users.email,
      name: users.name,
      accountId: accounts.id,
      accountName: accounts.name,
      role: memberships.role,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .innerJoin(accounts, eq(accounts.id, memberships.accountId))
    .where(
      accountId
        ? and(eq(memberships.userId, userId), eq(memberships.accountId, accountId))
        : eq(memberships.userId, userId),
    );
  if (rows.length === 0) {
    throw new AppError(
      "forbidden",
      accountId ? "You are not a member of this account." : "You are not a member of any account.",
    );
  }
  if (rows.length > 1) throw new AppError("forbidden", "Choose an account first.");
  const member = rows[0];
  if (!can(member.role, permission)) {
    throw new AppError(
      "forbidden",
      `Your role (${member.role}) may not do this: it needs the "${permission}" permission.`,
    );
  }
  return member;
}

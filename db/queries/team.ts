import "server-only";
import { createHash, randomBytes } from "node:crypto";
import { and, asc, count, eq, gt, isNull } from "drizzle-orm";
import type { Database } from "@/db";
import { accounts, invitations, memberships, users, type Role } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { hashPassword, PASSWORD_MIN_LENGTH, verifyPassword } from "@/lib/auth/password";
import { AppError, notFound } from "@/lib/errors";

export const INVITATION_DAYS = 7;

export const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

export async function listTeam({ db, accountId }: { db: Database; accountId: number }) {
  const members = await db
    .select({
      membershipId: memberships.id,
      userId: users.id,
      name: users.name,
      email: users.email,
      role: memberships.role,
      since: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.accountId, accountId))
    .orderBy(asc(users.name));
  const pending = await db
    .select({
      invitationId: invitations.id,
      name: invitations.name,
      email: invitations.email,
      role: invitations.role,
      expiresAt: invitations.expiresAt,
      createdAt: invitations.createdAt,
    })
    .from(invitations)
    .where(
      and(
        eq(invitations.accountId, accountId),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
        gt(invitations.expiresAt, new Date()),
      ),
    )
    .orderBy(asc(invitations.createdAt));
  return { members, invitations: pending };
}

/** Creates an invitation and returns the one-time token for the e-mailed link. */
export async function createInvitation({
  db,
  accountId,
  invitedByUserId,
  email,
  name,
  role,
}: {
  db: Database;
  accountId: number;
  invitedByUserId: number;
  email: string;
  name: string;
  role: Role;
}): Promise<{ token: string; invitationId: number; accountName: string }> {
  const token = randomBytes(32).toString("base64url");
  return db.transaction(async (tx) => {
    const [already] = await tx
      .select({ id: memberships.id })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.accountId, accountId), eq(users.email, email)));
    if (already)
      throw new AppError("conflict", `${email} is already a member of this account.`, [
        { field: "email", message: "Already a member" },
      ]);
    const [account] = await tx
      .select({ name: accounts.name })
      .from(accounts)
      .where(eq(accounts.id, accountId));
    const [{ id }] = await tx
      .insert(invitations)
      .values({
        accountId,
        email,
        name,
        role,
        tokenHash: hashToken(token),
        invitedByUserId,
        expiresAt: new Date(Date.now() + INVITATION_DAYS * 86_400_000),
      })
      .$returningId();
    await recordAudit(tx, {
      accountId,
      userId: invitedByUserId,
      action: "invite",
      entityType: "invitation",
      entityId: id,
      summary: `Invited ${email} as ${role}`,
      after: { email, name, role },
    });
    return { token, invitationId: id, accountName: account.name };
  });
}

export async function revokeInvitation({
  db,
  accountId,
  invitationId,
  actorUserId,
}: {
  db: Database;
  accountId: number;
  invitationId: number;
  actorUserId: number;
}) {
  await db.transaction(async (tx) => {
    const [inv] = await tx
      .select()
      .from(invitations)
      .where(and(eq(invitations.id, invitationId), eq(invitations.accountId, accountId)));
    if (!inv || inv.acceptedAt || inv.revokedAt) throw notFound("That invitation");
    await tx.update(invitations).set({ revokedAt: new Date() }).where(eq(invitations.id, invitationId));
    await recordAudit(tx, {
      accountId,
      userId: actorUserId,
      action: "revoke_invitation",
      entityType: "invitation",
      entityId: invitationId,
      summary: `Withdrew the invitation to ${inv.email}`,
      before: { email: inv.email, role: inv.role },
    });
  });
}

async function adminCount(tx: Pick<Database, "select">, accountId: number): Promise<number> {
  const [row] = await tx
    .select({ n: count() })
    .from(memberships)
    .where(and(eq(memberships.accountId, accountId), eq(memberships.role, "admin")));
  return row.n;
}

export async function changeMemberRole({
  db,
  accountId,
  membershipId,
  role,
  actorUserId,
}: {
  db: Database;
  accountId: number;
  membershipId: number;
  role: Role;
  actorUserId: number;
}) {
  await db.transaction(async (tx) => {
    const [m] = await tx
      .select()
      .from(memberships)
      .where(and(eq(memberships.id, membershipId), eq(memberships.accountId, accountId)))
      .for("update");
    if (!m) throw notFound("That member");
    if (m.role === role) return;
    if (m.role === "admin" && (await adminCount(tx, accountId)) <= 1) {
      throw new AppError("conflict", "This is the account's only admin; make someone else admin first.", [
        { field: "role", message: "Last admin" },
      ]);
    }
    await tx.update(memberships).set({ role }).where(eq(memberships.id, membershipId));
    await recordAudit(tx, {
      accountId,
      userId: actorUserId,
      action: "change_role",
      entityType: "membership",
      entityId: membershipId,
      summary: `Changed a role from ${m.role} to ${role}`,
      before: { role: m.role },
      after: { role },
    });
  });
}

export async function removeMember({
  db,
  accountId,
  membershipId,
  actorUserId,
}: {
  db: Database;
  accountId: number;
  membershipId: number;
  actorUserId: number;
}) {
  await db.transaction(async (tx) => {
    const [m] = await tx
      .select()
      .from(memberships)
      .where(and(eq(memberships.id, membershipId), eq(memberships.accountId, accountId)))
      .for("update");
    if (!m) throw notFound("That member");
    if (m.role === "admin" && (await adminCount(tx, accountId)) <= 1) {
      throw new AppError("conflict", "This is the account's only admin and cannot be removed.");
    }
    await tx.delete(memberships).where(eq(memberships.id, membershipId));
    await recordAudit(tx, {
      accountId,
      userId: actorUserId,
      action: "remove_member",
      entityType: "membership",
      entityId: membershipId,
      summary: `Removed a member (${m.role})`,
      before: { userId: m.userId, role: m.role },
    });
  });
}

export async function findOpenInvitation({ db, token }: { db: Database; token: string }) {
  const [inv] = await db
    .select({
      id: invitations.id,
      email: invitations.email,
      name: invitations.name,
      role: invitations.role,
      accountName: accounts.name,
      expiresAt: invitations.expiresAt,
      acceptedAt: invitations.acceptedAt,
      revokedAt: invitations.revokedAt,
    })
    .from(invitations)
    .innerJoin(accounts, eq(accounts.id, invitations.accountId))
    .where(eq(invitations.tokenHash, hashToken(token)));
  if (!inv || inv.acceptedAt || inv.revokedAt || inv.expiresAt < new Date()) return null;
  return inv;
}

/**
 * Accepts an invitation: a new person sets a password; a person who already has a Platload sign-in
 * joins the account with the password they have (it must match).
 */
export async function acceptInvitation({
  db,
  token,
  password,
  name,
}: {
  db: Database;
  token: string;
  password: string;
  name: string;
}) {
  if (password.length < PASSWORD_MIN_LENGTH) {
    throw new AppError(
      "invalid_input",
      `The password must have at least ${PASSWORD_MIN_LENGTH} characters.`,
      [{ field: "password", message: `At least ${PASSWORD_MIN_LENGTH} characters` }],
    );
  }
  // The token is looked up before any password work: a made-up link costs one indexed read, not a hash.
  if (!(await findOpenInvitation({ db, token })))
    throw new AppError(
      "not_found",
      "This invitation link is not valid any more. Ask your admin for a new one.",
    );
  const passwordHash = await hashPassword(password);
  return db.transaction(async (tx) => {
    const [inv] = await tx
      .select()
      .from(invitations)
      .where(eq(invitations.tokenHash, hashToken(token)))
      .for("update");
    if (!inv || inv.acceptedAt || inv.revokedAt || inv.expiresAt < new Date()) {
      throw new AppError(
        "not_found",
        "This invitation link is not valid any more. Ask your admin for a new one.",
      );
    }
    let [user] = await tx.select().from(users).where(eq(users.email, inv.email));
    if (user?.passwordHash) {
      // Someone who serves several builders keeps one sign-in: they confirm it with their password.
      if (!(await verifyPassword(password, user.passwordHash))) {
        throw new AppError(
          "invalid_input",
          "This e-mail already has a Platload sign-in: enter that password to join this account.",
          [{ field: "password", message: "Enter your existing password" }],
        );
      }
    } else if (!user) {
      const [{ id }] = await tx
        .insert(users)
        .values({ email: inv.email, name: name || inv.name, passwordHash })
        .$returningId();
      [user] = await tx.select().from(users).where(eq(users.id, id));
    } else {
      await tx
        .update(users)
        .set({ passwordHash, name: name || user.name })
        .where(eq(users.id, user.id));
    }
    const [member] = await tx
      .select({ id: memberships.id })
      .from(memberships)
      .where(and(eq(memberships.userId, user.id), eq(memberships.accountId, inv.accountId)));
    if (member) throw new AppError("conflict", "You are already a member of this account.");
    await tx.insert(memberships).values({ userId: user.id, accountId: inv.accountId, role: inv.role });
    await tx.update(invitations).set({ acceptedAt: new Date() }).where(eq(invitations.id, inv.id));
    await recordAudit(tx, {
      accountId: inv.accountId,
      userId: user.id,
      action: "accept_invitation",
      entityType: "membership",
      entityId: null,
      summary: `${inv.email} joined as ${inv.role}`,
      after: { email: inv.email, role: inv.role },
    });
    return { email: inv.email };
  });
}

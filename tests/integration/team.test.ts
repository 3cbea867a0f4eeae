import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as acceptRoute from "@/app/api/invitations/[token]/route";
import * as memberRoute from "@/app/api/team/members/[membershipId]/route";
import * as invitationsRoute from "@/app/api/team/invitations/route";
import { getDb } from "@/db";
import { auditLog, memberships, users } from "@/db/schema";
import { verifyPassword } from "@/lib/auth/password";
import { seededIds } from "../support/demo-ids";
import { callRoute, sessionCookie } from "../support/requests";
import { TEST_MAILBOX_DIR } from "../support/test-env";

function findInvitationMail(to: string): { subject: string; text: string } | undefined {
  const messages = readdirSync(TEST_MAILBOX_DIR)
    .filter((n) => n.endsWith(".json"))
    .map(
      (n) =>
        JSON.parse(readFileSync(path.join(TEST_MAILBOX_DIR, n), "utf8")) as {
          to: string[];
          subject: string;
          text: string;
          receivedAt: string;
        },
    )
    .filter((m) => m.to.includes(to))
    .sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
  return messages[0];
}

async function waitForMail(to: string) {
  for (let i = 0; i < 50; i++) {
    const m = findInvitationMail(to);
    if (m) return m;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no message to ${to} in the mailbox`);
}

describe("team management", () => {
  let ids: Awaited<ReturnType<typeof seededIds>>;
  beforeAll(async () => {
    ids = await seededIds(getDb());
  });

  it("an admin invites by e-mail; the link sets a password and makes a member", async () => {
    const email = `new.designer.${Date.now()}@marrowfinch.test`;
    const cookie = await sessionCookie({ userId: ids.roleUsers.admin, accountId: ids.demoAccountId });
    const res = await callRoute(invitationsRoute.POST, {
      path: "/api/team/invitations",
      method: "POST",
      cookie,
      body: { email, name: "New Designer", role: "designer" },
    });
    expect(res.status).toBe(200);
    const mail = await waitForMail(email);
    expect(mail.subject).toContain("Marrow & Finch Homes");
    const token = /\/invitation\/([A-Za-z0-9_-]+)/.exec(mail.text)?.[1];
    expect(token).toBeTruthy();

    const short = await callRoute(acceptRoute.POST, {
      path: "/api/invitations/x",
      method: "POST",
      params: { token: token! },
      body: { password: "short" },
    });
    expect(short.status).toBe(400);
    expect(short.json.error.fieldErrors[0].field).toBe("password");

    const ok = await callRoute(acceptRoute.POST, {
      path: "/api/invitations/x",
      method: "POST",
      params: { token: token! },
      body: { name: "Nia Designer", password: "a-long-enough-pw" },
    });
    expect(ok.status).toBe(200);
    const [user] = await getDb().select().from(users).where(eq(users.email, email));
    expect(await verifyPassword("a-long-enough-pw", user.passwordHash!)).toBe(true);
    const [m] = await getDb().select().from(memberships).where(eq(memberships.userId, user.id));
    expect(m).toMatchObject({ accountId: ids.demoAccountId, role: "designer" });

    const again = await callRoute(acceptRoute.POST, {
      path: "/api/invitations/x",
      method: "POST",
      params: { token: token! },
      body: { password: "a-long-enough-pw" },
    });
    expect(again.status).toBe(404);
  });

  it("a bad invitation names the bad fields and writes nothing", async () => {
    const cookie = await sessionCookie({ userId: ids.roleUsers.admin, accountId: ids.demoAccountId });
    const before = (await getDb().select().from(auditLog)).length;
    const res = await callRoute(invitationsRoute.POST, {
      path: "/api/team/invitations",
      method: "POST",
      cookie,
      body: { email: "not-an-address", name: "", role: "owner" },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fieldErrors.map((f: { field: string }) => f.field).sort()).toEqual([
      "email",
      "name",
      "role",
    ]);
    expect((await getDb().select().from(auditLog)).length).toBe(before);
  });

  it("a viewer cannot change roles or invite (403), and nothing changes", async () => {
    const cookie = await sessionCookie({ userId: ids.roleUsers.viewer, accountId: ids.demoAccountId });
    const [designerMembership] = await getDb()
      .select()
      .from(memberships)
      .where(eq(memberships.userId, ids.roleUsers.designer));
    const res = await callRoute(memberRoute.PATCH, {
      path: "/api/x",
      method: "PATCH",
      cookie,
      params: { membershipId: String(designerMembership.id) },
      body: { role: "admin" },
    });
    expect(res.status).toBe(403);
    expect(res.json.error.message).toMatch(/viewer/);
    const [after] = await getDb().select().from(memberships).where(eq(memberships.id, designerMembership.id));
    expect(after.role).toBe("designer");
    const invite = await callRoute(invitationsRoute.POST, {
      path: "/api/x",
      method: "POST",
      cookie,
      body: { email: "x@y.test", name: "X", role: "viewer" },
    });
    expect(invite.status).toBe(403);
  });

  it("an admin changes a role, and the change is in the history with before and after", async () => {
    const cookie = await sessionCookie({ userId: ids.roleUsers.admin, accountId: ids.demoAccountId });
    const [purchasing] = await getDb()
      .select()
      .from(memberships)
      .where(eq(memberships.userId, ids.roleUsers.purchasing));
    const res = await callRoute(memberRoute.PATCH, {
      path: "/api/x",
      method: "PATCH",
      cookie,
      params: { membershipId: String(purchasing.id) },
      body: { role: "viewer" },
    });
    expect(res.status).toBe(200);
    const entries = await getDb().select().from(auditLog).where(eq(auditLog.entityId, purchasing.id));
    expect(entries.at(-1)).toMatchObject({
      action: "change_role",
      before: { role: "purchasing" },
      after: { role: "viewer" },
    });
    await callRoute(memberRoute.PATCH, {
      path: "/api/x",
      method: "PATCH",
      cookie,
      params: { membershipId: String(purchasing.id) },
      body: { role: "purchasing" },
    });
  });

  it("the account's only admin cannot be demoted or removed", async () => {
    const cookie = await sessionCookie({ userId: ids.roleUsers.admin, accountId: ids.demoAccountId });
    const [admin] = await getDb()
      .select()
      .from(memberships)
      .where(eq(memberships.userId, ids.roleUsers.admin));
    const res = await callRoute(memberRoute.PATCH, {
      path: "/api/x",
      method: "PATCH",
      cookie,
      params: { membershipId: String(admin.id) },
      body: { role: "viewer" },
    });
    expect(res.status).toBe(409);
    const del = await callRoute(memberRoute.DELETE, {
      path: "/api/x",
      method: "DELETE",
      cookie,
      params: { membershipId: String(admin.id) },
    });
    expect(del.status).toBe(409);
  });
});

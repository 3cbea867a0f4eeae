import { count, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as acceptRoute from "@/app/api/invitations/[token]/route";
import { getDb } from "@/db";
import { createInvitation } from "@/db/queries/team";
import { invitations, memberships, users } from "@/db/schema";
import { seededIds } from "../support/demo-ids";
import { callRoute } from "../support/requests";

// An invitation link makes a member with the invitation's role: it must work once, and not after
// it expires (db/queries/team.ts INVITATION_DAYS) or is withdrawn.
describe("invitation links", () => {
  let ids: Awaited<ReturnType<typeof seededIds>>;
  const stamp = Date.now();
  beforeAll(async () => {
    ids = await seededIds(getDb());
  });

  const invite = (email: string) =>
    createInvitation({
      db: getDb(),
      accountId: ids.demoAccountId,
      invitedByUserId: ids.roleUsers.admin,
      email,
      name: "Link Check",
      role: "designer",
    });
  const accept = (token: string) =>
    callRoute(acceptRoute.POST, {
      path: "/api/invitations/x",
      method: "POST",
      params: { token },
      body: { name: "Link Check", password: "a-long-enough-pw" },
    });
  const look = (token: string) =>
    callRoute(acceptRoute.GET, { path: "/api/invitations/x", params: { token } });
  const userCount = async (email: string) =>
    (await getDb().select({ n: count() }).from(users).where(eq(users.email, email)))[0].n;

  it("expire: a link past its date is refused on opening and on accepting, and makes no one", async () => {
    const email = `expired.${stamp}@example.test`;
    const { token, invitationId } = await invite(email);
    expect((await look(token)).status).toBe(200);
    await getDb()
      .update(invitations)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(invitations.id, invitationId));
    const opened = await look(token);
    expect(opened.status).toBe(404);
    expect(opened.json.error.message).toMatch(/not valid any more/);
    expect((await accept(token)).status).toBe(404);
    expect(await userCount(email)).toBe(0);
  });

  it("new links expire after 7 days", async () => {
    const { invitationId } = await invite(`week.${stamp}@example.test`);
    const [row] = await getDb().select().from(invitations).where(eq(invitations.id, invitationId));
    const days = (row.expiresAt.getTime() - row.createdAt.getTime()) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThan(7.01);
  });

  it("single use: of two acceptances at the same moment one makes the member, the other is refused; the link is dead after", async () => {
    const email = `once.${stamp}@example.test`;
    const { token } = await invite(email);
    const results = await Promise.all([accept(token), accept(token)]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 404]);
    const [user] = await getDb().select().from(users).where(eq(users.email, email));
    expect(
      (await getDb().select({ n: count() }).from(memberships).where(eq(memberships.userId, user.id)))[0].n,
    ).toBe(1);
    expect((await look(token)).status).toBe(404);
    expect((await accept(token)).status).toBe(404);
  });

  it("a token that was never issued, or a withdrawn one, is refused", async () => {
    expect((await look("not-a-token")).status).toBe(404);
    const email = `withdrawn.${stamp}@example.test`;
    const { token, invitationId } = await invite(email);
    await getDb().update(invitations).set({ revokedAt: new Date() }).where(eq(invitations.id, invitationId));
    expect((await accept(token)).status).toBe(404);
    expect(await userCount(email)).toBe(0);
  });
});

import { PHASE_DEVELOPMENT_SERVER, PHASE_PRODUCTION_BUILD } from "next/constants";
import { createValidFileMatcher } from "next/dist/server/lib/find-page-file";
import { beforeAll, describe, expect, it } from "vitest";
import * as mailboxRoute from "@/app/api/dev/mailbox/route.dev";
import * as invitationsRoute from "@/app/api/team/invitations/route";
import { getDb } from "@/db";
import { mailboxAllowed } from "@/lib/mail/mailbox";
import { pageExtensionsFor } from "@/next.config";
import { seededIds } from "../support/demo-ids";
import { callRoute, sessionCookie } from "../support/requests";
import { routeFiles } from "../support/routes";

async function waitForMessage(cookie: string, to: string) {
  for (let i = 0; i < 50; i++) {
    const res = await callRoute(mailboxRoute.GET, { path: "/api/dev/mailbox", cookie });
    const found = res.json?.messages?.find((m: { to: string[] }) => m.to.includes(to));
    if (found) return found as { to: string[]; subject: string; text: string; accountId: string };
    await new Promise((r) => setTimeout(r, 100));
  }
  return null;
}

describe("the development mailbox", () => {
  let ids: Awaited<ReturnType<typeof seededIds>>;
  let demoAdmin: string;
  let otherAdmin: string;
  const stamp = Date.now();
  const toDemoInvitee = `mailbox.demo.${stamp}@example.test`;
  const toOtherInvitee = `mailbox.other.${stamp}@example.test`;

  beforeAll(async () => {
    ids = await seededIds(getDb());
    demoAdmin = await sessionCookie({ userId: ids.roleUsers.admin, accountId: ids.demoAccountId });
    otherAdmin = await sessionCookie({ userId: ids.otherAdminId, accountId: ids.otherAccountId });
    for (const [cookie, email] of [
      [demoAdmin, toDemoInvitee],
      [otherAdmin, toOtherInvitee],
    ]) {
      const res = await callRoute(invitationsRoute.POST, {
        path: "/api/team/invitations",
        method: "POST",
        cookie,
        body: { email, name: "Mailbox Check", role: "viewer" },
      });
      expect(res.status).toBe(200);
    }
  });

  it("refuses a signed-out caller (401) and every role but admin (403)", async () => {
    const anonymous = await callRoute(mailboxRoute.GET, { path: "/api/dev/mailbox" });
    expect(anonymous.status).toBe(401);
    expect(anonymous.text).not.toContain("/invitation/");
    for (const role of ["designer", "reviewer", "purchasing", "viewer"] as const) {
      const cookie = await sessionCookie({ userId: ids.roleUsers[role], accountId: ids.demoAccountId });
      const res = await callRoute(mailboxRoute.GET, { path: "/api/dev/mailbox", cookie });
      expect(res.status, role).toBe(403);
      expect(res.text, role).not.toContain("/invitation/");
    }
  });

  it("shows an admin the mail of their own account only", async () => {
    const mine = await waitForMessage(demoAdmin, toDemoInvitee);
    expect(mine?.subject).toContain("Marrow & Finch Homes");
    expect(mine?.accountId).toBe(String(ids.demoAccountId));
    const theirs = await waitForMessage(otherAdmin, toOtherInvitee);
    expect(theirs?.subject).toContain("Bramblewood Residential");
    // each admin's list holds none of the other account's messages
    const demoList = (await callRoute(mailboxRoute.GET, { path: "/api/dev/mailbox", cookie: demoAdmin })).json
      .messages as { to: string[]; accountId: string }[];
    expect(demoList.some((m) => m.to.includes(toOtherInvitee))).toBe(false);
    expect(demoList.every((m) => m.accountId === String(ids.demoAccountId))).toBe(true);
    const otherList = (await callRoute(mailboxRoute.GET, { path: "/api/dev/mailbox", cookie: otherAdmin }))
      .json.messages as { to: string[] }[];
    expect(otherList.some((m) => m.to.includes(toDemoInvitee))).toBe(false);
  });

  it("is on only with a mailbox folder and an app address on loopback", () => {
    expect(mailboxAllowed({ mailboxDir: "mail-folder", appUrl: "http://127.0.0.1:3710" })).toBe(true);
    expect(mailboxAllowed({ mailboxDir: "mail-folder", appUrl: "http://localhost:3710" })).toBe(true);
    expect(mailboxAllowed({ mailboxDir: "mail-folder", appUrl: "http://[::1]:3710" })).toBe(true);
    expect(mailboxAllowed({ mailboxDir: undefined, appUrl: "http://127.0.0.1:3710" })).toBe(false);
    expect(mailboxAllowed({ mailboxDir: "mail-folder", appUrl: undefined })).toBe(false);
    expect(mailboxAllowed({ mailboxDir: "mail-folder", appUrl: "https://platload.example.com" })).toBe(false);
    expect(mailboxAllowed({ mailboxDir: "mail-folder", appUrl: "http://10.0.0.5:3710" })).toBe(false);
    expect(mailboxAllowed({ mailboxDir: "mail-folder", appUrl: "http://127.0.0.1.example.com" })).toBe(false);
  });

  it("is not a route of a production build, whatever the environment; only of next dev and the demo and test builds", () => {
    const mailboxFiles = ["app/dev/mailbox/page.dev.tsx", "app/api/dev/mailbox/route.dev.ts"];
    expect(routeFiles()).toContain("app/api/dev/mailbox/route.dev.ts");
    // Next's own test for "is this file a page or route", with the extensions each build uses
    const isRoute = (phase: string, demoBuild: string | undefined) => {
      const matcher = createValidFileMatcher(pageExtensionsFor(phase, demoBuild), "app");
      return mailboxFiles.map((f) => matcher.isAppRouterPage(f));
    };
    expect(isRoute(PHASE_PRODUCTION_BUILD, undefined)).toEqual([false, false]);
    expect(isRoute(PHASE_PRODUCTION_BUILD, "true")).toEqual([false, false]);
    expect(isRoute(PHASE_PRODUCTION_BUILD, "1")).toEqual([true, true]);
    expect(isRoute(PHASE_DEVELOPMENT_SERVER, undefined)).toEqual([true, true]);
    // and every other page and route stays a page or route in a production build
    const production = createValidFileMatcher(pageExtensionsFor(PHASE_PRODUCTION_BUILD, undefined), "app");
    for (const file of routeFiles().filter((f) => !mailboxFiles.includes(f)))
      expect(production.isAppRouterPage(file), file).toBe(true);
  });
});

import { beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db";
import * as communityRoute from "@/app/api/communities/[communityId]/route";
import * as communityLotsRoute from "@/app/api/communities/[communityId]/lots/route";
import * as communitiesRoute from "@/app/api/communities/route";
import * as equipmentItemRoute from "@/app/api/equipment/[systemId]/route";
import * as equipmentRoute from "@/app/api/equipment/route";
import * as importItemRoute from "@/app/api/imports/[importId]/route";
import * as importsRoute from "@/app/api/imports/route";
import * as lotRoute from "@/app/api/lots/[lotId]/route";
import * as planRoute from "@/app/api/plans/[planId]/route";
import * as plansRoute from "@/app/api/plans/route";
import * as invitationItemRoute from "@/app/api/team/invitations/[invitationId]/route";
import * as memberRoute from "@/app/api/team/members/[membershipId]/route";
import * as approveRoute from "@/app/api/plans/[planId]/approve/route";
import * as lotImportRoute from "@/app/api/communities/[communityId]/lots/import/route";
import * as permitScheduleRoute from "@/app/api/communities/[communityId]/permit-schedule/route";
import * as lotStatusRoute from "@/app/api/lots/[lotId]/status/route";
import * as plansRoute2 from "@/app/api/plans/route";
import * as undoRoute from "@/app/api/plans/undo/route";
import { accounts, auditLog, users } from "@/db/schema";
import { and, eq } from "drizzle-orm";
import * as teamRoute from "@/app/api/team/route";
import * as loadProcedureRoute from "@/app/api/account/load-procedure/route";
import { createInvitation } from "@/db/queries/team";
import { seededIds } from "../support/demo-ids";
import { callRoute, sessionCookie } from "../support/requests";

describe("account isolation", () => {
  let ids: Awaited<ReturnType<typeof seededIds>>;
  let otherAdminCookie: string;
  let demoInvitationId: number;

  beforeAll(async () => {
    ids = await seededIds(getDb());
    otherAdminCookie = await sessionCookie({ userId: ids.otherAdminId, accountId: ids.otherAccountId });
    ({ invitationId: demoInvitationId } = await createInvitation({ db: getDb(), accountId: ids.demoAccountId, invitedByUserId: ids.roleUsers.admin, email: "pending@marrowfinch.test", name: "Pending Person", role: "viewer" }));
  });

  it("gives 404 for every record of the other account on every record route", async () => {
    const r = ids.demoRecords;
    const attempts: [string, unknown, Record<string, string>, string, unknown?][] = [
      ["GET plan", planRoute.GET, { planId: String(r.planId) }, "GET"],
      ["GET community", communityRoute.GET, { communityId: String(r.communityId) }, "GET"],
      ["GET community lots", communityLotsRoute.GET, { communityId: String(r.communityId) }, "GET"],
      ["GET lot", lotRoute.GET, { lotId: String(r.lotId) }, "GET"],
      ["GET equipment system", equipmentItemRoute.GET, { systemId: String(r.systemId) }, "GET"],
      ["GET import", importItemRoute.GET, { importId: String(r.importId) }, "GET"],
      ["PATCH member role", memberRoute.PATCH, { membershipId: String(r.membershipId) }, "PATCH", { role: "viewer" }],
      ["DELETE member", memberRoute.DELETE, { membershipId: String(r.membershipId) }, "DELETE"],
      ["DELETE invitation", invitationItemRoute.DELETE, { invitationId: String(demoInvitationId) }, "DELETE"],
      ["PATCH community", communityRoute.PATCH, { communityId: String(r.communityId) }, "PATCH", { name: "X", locality: "", version: 1, conditions: {} }],
      ["PATCH community lots", communityLotsRoute.PATCH, { communityId: String(r.communityId) }, "PATCH", { changes: [{ lotId: r.lotId, version: 1, facing: "N" }] }],
      ["GET permit schedule", permitScheduleRoute.GET, { communityId: String(r.communityId) }, "GET"],
      ["POST lot status", lotStatusRoute.POST, { lotId: String(r.lotId) }, "POST", { version: 1, status: "permit_submitted" }],
      ["PATCH plan cells", plansRoute2.PATCH, {}, "PATCH", { changes: [{ planId: r.planId, version: 1, cells: { bedrooms: "2" } }] }],
    ];
    for (const [label, handler, params, method, body] of attempts) {
      const res = await callRoute(handler, { path: "/api/x", method, params, body, cookie: otherAdminCookie });
      expect(res.status, label).toBe(404);
      expect(res.json.error.code, label).toBe("not_found");
    }
  });

  it("a consultant reviewing for one builder cannot approve the other builder's plan (404)", async () => {
    const [consultant] = await getDb().select().from(users).where(eq(users.email, "consultant@loadworks.test"));
    const cookie = await sessionCookie({ userId: consultant.id, accountId: ids.demoAccountId });
    const res = await callRoute(approveRoute.POST, { path: "/x", method: "POST", params: { planId: String(ids.otherRecords.planId) }, body: { revisionId: 1, approverName: "Casey Moreau", approverCredential: "none", approvedOn: "2026-12-01" }, cookie });
    expect(res.status).toBe(404);
  });

  it("an upload into the other account's community and an undo of its history are not found", async () => {
    const form = new FormData();
    form.append("file", new File(["Lot,Plan code,Facing\n1,AS-1450,N\n"], "lots.csv"));
    const upload = await callRoute(lotImportRoute.POST, { path: "/x", method: "POST", params: { communityId: String(ids.demoRecords.communityId) }, form, cookie: otherAdminCookie });
    expect(upload.status).toBe(404);
    const [entry] = await getDb().select().from(auditLog).where(and(eq(auditLog.accountId, ids.demoAccountId))).limit(1);
    const undo = await callRoute(undoRoute.POST, { path: "/x", method: "POST", body: { entryId: entry.id }, cookie: otherAdminCookie });
    expect(undo.status).toBe(404);
  });

  it("the same routes answer 200 for the account's own records", async () => {
    const r = ids.otherRecords;
    for (const [handler, params] of [
      [planRoute.GET, { planId: String(r.planId) }],
      [communityRoute.GET, { communityId: String(r.communityId) }],
      [communityLotsRoute.GET, { communityId: String(r.communityId) }],
      [lotRoute.GET, { lotId: String(r.lotId) }],
      [equipmentItemRoute.GET, { systemId: String(r.systemId) }],
      [importItemRoute.GET, { importId: String(r.importId) }],
    ] as const) {
      expect((await callRoute(handler, { path: "/api/x", params, cookie: otherAdminCookie })).status).toBe(200);
    }
  });

  it("list routes return only the account's own records", async () => {
    const plans = await callRoute(plansRoute.GET, { path: "/api/plans", cookie: otherAdminCookie });
    expect(plans.json.plans.map((p: { id: number }) => p.id)).toEqual([ids.otherRecords.planId]);
    const communities = await callRoute(communitiesRoute.GET, { path: "/api/communities", cookie: otherAdminCookie });
    expect(communities.json.communities.every((c: { accountId: number }) => c.accountId === ids.otherAccountId)).toBe(true);
    const systems = await callRoute(equipmentRoute.GET, { path: "/api/equipment", cookie: otherAdminCookie });
    expect(systems.json.systems.map((s: { id: number }) => s.id)).toEqual([ids.otherRecords.systemId]);
    const importsList = await callRoute(importsRoute.GET, { path: "/api/imports", cookie: otherAdminCookie });
    expect(importsList.json.imports.map((i: { id: number }) => i.id)).toEqual([ids.otherRecords.importId]);
    const team = await callRoute(teamRoute.GET, { path: "/api/team", cookie: otherAdminCookie });
    expect(team.json.members.map((m: { email: string }) => m.email)).not.toContain("admin@marrowfinch.test");
  });

  it("the account settings routes read and write the caller's own account only", async () => {
    const own = await callRoute(loadProcedureRoute.GET, { path: "/api/account/load-procedure", cookie: otherAdminCookie });
    expect(own.status).toBe(200);
    const [demo] = await getDb().select({ procedure: accounts.loadProcedure }).from(accounts).where(eq(accounts.id, ids.demoAccountId));
    const [other] = await getDb().select({ procedure: accounts.loadProcedure }).from(accounts).where(eq(accounts.id, ids.otherAccountId));
    expect(own.json.procedure).toBe(other.procedure);
    // Choosing the other account in the cookie does not reach it: not a member there.
    const cookie = await sessionCookie({ userId: ids.otherAdminId, accountId: ids.demoAccountId });
    const refused = await callRoute(loadProcedureRoute.PUT, { path: "/x", method: "PUT", cookie, body: { procedure: demo.procedure === "hourly" ? "residential-load-factor" : "hourly", from: demo.procedure } });
    expect(refused.status).toBe(403);
    expect((await getDb().select({ procedure: accounts.loadProcedure }).from(accounts).where(eq(accounts.id, ids.demoAccountId)))[0].procedure).toBe(demo.procedure);
  });

  it("choosing an account one does not belong to is refused", async () => {
    const cookie = await sessionCookie({ userId: ids.otherAdminId, accountId: ids.demoAccountId });
    const res = await callRoute(plansRoute.GET, { path: "/api/plans", cookie });
    expect(res.status).toBe(403);
  });

  it("no session is 401 with the error shape", async () => {
    const res = await callRoute(plansRoute.GET, { path: "/api/plans" });
    expect(res.status).toBe(401);
    expect(res.json.error).toMatchObject({ code: "unauthenticated" });
  });
});

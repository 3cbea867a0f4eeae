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
import * as teamRoute from "@/app/api/team/route";
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
    ];
    for (const [label, handler, params, method, body] of attempts) {
      const res = await callRoute(handler, { path: "/api/x", method, params, body, cookie: otherAdminCookie });
      expect(res.status, label).toBe(404);
      expect(res.json.error.code, label).toBe("not_found");
    }
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
    expect(systems.json.systems.every((s: { accountId: number }) => s.accountId === ids.otherAccountId)).toBe(true);
    const importsList = await callRoute(importsRoute.GET, { path: "/api/imports", cookie: otherAdminCookie });
    expect(importsList.json.imports.map((i: { id: number }) => i.id)).toEqual([ids.otherRecords.importId]);
    const team = await callRoute(teamRoute.GET, { path: "/api/team", cookie: otherAdminCookie });
    expect(team.json.members.map((m: { email: string }) => m.email)).not.toContain("admin@marrowfinch.test");
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

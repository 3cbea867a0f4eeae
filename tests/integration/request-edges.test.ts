import { and, count, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as authRoute from "@/app/api/auth/[...nextauth]/route";
import * as lotsRoute from "@/app/api/communities/[communityId]/lots/route";
import * as lotsTemplateRoute from "@/app/api/communities/[communityId]/lots/template/route";
import * as acceptRoute from "@/app/api/invitations/[token]/route";
import * as planRoute from "@/app/api/plans/[planId]/route";
import * as exportRoute from "@/app/api/plans/export/route";
import * as plansRoute from "@/app/api/plans/route";
import * as undoRoute from "@/app/api/plans/undo/route";
import * as sessionRoute from "@/app/api/session/account/route";
import { getDb } from "@/db";
import { auditLog, lots, plans, users } from "@/db/schema";
import { DEMO_CONSULTANT } from "@/db/demo-scenario";
import { seededIds } from "../support/demo-ids";
import { APP_ORIGIN, callRoute, sessionCookie } from "../support/requests";

// The edges of finding 7 and the facings of finding 4, through the route handlers.
describe("request edges", () => {
  let ids: Awaited<ReturnType<typeof seededIds>>;
  let designer: string;
  let viewer: string;
  let plan: { id: number; planCode: string; version: number };

  beforeAll(async () => {
    ids = await seededIds(getDb());
    designer = await sessionCookie({ userId: ids.roleUsers.designer, accountId: ids.demoAccountId });
    viewer = await sessionCookie({ userId: ids.roleUsers.viewer, accountId: ids.demoAccountId });
    [plan] = await getDb()
      .select({ id: plans.id, planCode: plans.planCode, version: plans.version })
      .from(plans)
      .where(eq(plans.id, ids.demoRecords.planId));
  });

  const auditCount = async () =>
    (await getDb().select({ n: count() }).from(auditLog).where(eq(auditLog.accountId, ids.demoAccountId)))[0]
      .n;

  describe("undoing a history entry that is not a cell edit", () => {
    // The entries as approveRevision and importPlanLibrary write them (db/queries): no cells.
    const entries = () => [
      {
        action: "plan_approve",
        summary: `Approved ${plan.planCode} revision 1 (Rafael Ibarra, PE 12345, 2026-12-01)`,
        before: [{ planId: plan.id, planCode: plan.planCode, status: "draft" }],
        after: [{ planId: plan.id, planCode: plan.planCode, status: "approved", revision: 1 }],
      },
      {
        action: "plan_import",
        summary: "Imported plans.csv: 0 created, 1 updated",
        before: null,
        after: [{ planId: plan.id, planCode: plan.planCode, cells: { bedrooms: "3" } }],
      },
      {
        action: "plan_copy",
        summary: `Created ZZ-1 as a copy of ${plan.planCode}`,
        before: null,
        after: [{ planId: plan.id, planCode: "ZZ-1", cells: { bedrooms: "3" } }],
      },
    ];
    for (const index of [0, 1, 2]) {
      it(`is a clear 409 that writes nothing (${["an approval", "an import", "a copy"][index]}), not a server error`, async () => {
        const e = entries()[index];
        const [{ id: entryId }] = await getDb()
          .insert(auditLog)
          .values({
            accountId: ids.demoAccountId,
            userId: ids.roleUsers.reviewer,
            entityType: "plan",
            entityId: plan.id,
            ...e,
          })
          .$returningId();
        const before = await auditCount();
        const res = await callRoute(undoRoute.POST, {
          path: "/api/plans/undo",
          method: "POST",
          cookie: designer,
          body: { entryId },
        });
        expect(res.status, res.text).toBe(409);
        expect(res.json.error.message).toContain("only cell edits can be undone");
        expect(res.json.error.fieldErrors).toEqual([{ field: "entryId", message: "Not a cell edit" }]);
        expect(await auditCount()).toBe(before);
        const [after] = await getDb()
          .select({ version: plans.version })
          .from(plans)
          .where(eq(plans.id, plan.id));
        expect(after.version).toBe(plan.version);
      });
    }
  });

  it("the lots template is only for one of the caller's communities", async () => {
    const own = await callRoute(lotsTemplateRoute.GET, {
      path: "/x?format=csv",
      params: { communityId: String(ids.demoRecords.communityId) },
      cookie: viewer,
    });
    expect(own.status).toBe(200);
    expect(own.text).toContain("Facing");
    for (const communityId of [String(ids.otherRecords.communityId), "999999999", "0", "abc"]) {
      const res = await callRoute(lotsTemplateRoute.GET, {
        path: "/x?format=csv",
        params: { communityId },
        cookie: viewer,
      });
      expect(res.status, communityId).toBe(404);
      expect(res.json.error.code).toBe("not_found");
    }
  });

  it("ids are read strictly: 1e0, 0x1, 01 and ' 1' are not record 1", async () => {
    const id = plan.id;
    expect(
      (await callRoute(planRoute.GET, { path: "/x", params: { planId: String(id) }, cookie: viewer })).status,
    ).toBe(200);
    for (const spelling of [`${id}e0`, `0x${id.toString(16)}`, `0${id}`, ` ${id}`, `${id}.0`, `+${id}`]) {
      const res = await callRoute(planRoute.GET, {
        path: "/x",
        params: { planId: spelling },
        cookie: viewer,
      });
      expect(res.status, spelling).toBe(404);
    }
    const query = await callRoute(plansRoute.GET, {
      path: `/api/plans?communityId=0x${ids.demoRecords.communityId.toString(16)}`,
      cookie: viewer,
    });
    expect(query.status).toBe(400);
    expect(query.json.error.fieldErrors).toEqual([
      expect.objectContaining({ field: "communityId", message: expect.stringContaining("record id") }),
    ]);
    expect(
      (
        await callRoute(exportRoute.GET, {
          path: `/api/plans/export?format=csv&communityId=${ids.demoRecords.communityId}e0`,
          cookie: viewer,
        })
      ).status,
    ).toBe(400);
    // the account cookie too: for a member of two accounts, "<id>e0" chooses no account
    const [consultant] = await getDb()
      .select({ id: users.id })
      .from(users)
      .where(eq(users.email, DEMO_CONSULTANT.email));
    const cookie = `${await sessionCookie({ userId: consultant.id })}; platload_account=${ids.demoAccountId}e0`;
    const res = await callRoute(plansRoute.GET, { path: "/api/plans", cookie });
    expect(res.status).toBe(403);
    expect(res.json.error.message).toBe("Choose an account first.");
    expect(
      (
        await callRoute(plansRoute.GET, {
          path: "/api/plans",
          cookie: `${await sessionCookie({ userId: consultant.id })}; platload_account=${ids.demoAccountId}`,
        })
      ).status,
    ).toBe(200);
  });

  describe("the Origin check on writes", () => {
    const badEdit = { changes: [] }; // refused as invalid (400) once past the Origin check: nothing can be written

    it("refuses a write from another origin with 403 before anything else, and writes nothing", async () => {
      const before = await auditCount();
      for (const origin of [
        "http://127.0.0.1:9999",
        "http://localhost:3720",
        "https://127.0.0.1:3720",
        "null",
        "http://evil.example",
      ]) {
        const res = await callRoute(plansRoute.PATCH, {
          path: "/api/plans",
          method: "PATCH",
          cookie: designer,
          origin,
          body: { changes: [{ planId: plan.id, version: plan.version, cells: { bedrooms: "5" } }] },
        });
        expect(res.status, origin).toBe(403);
        expect(res.json.error.message, origin).toContain("must come from Platload's own pages");
      }
      expect(await auditCount()).toBe(before);
      const [after] = await getDb()
        .select({ version: plans.version })
        .from(plans)
        .where(eq(plans.id, plan.id));
      expect(after.version).toBe(plan.version);
    });

    it("lets a write from the app's own origin through, and one with no Origin unless the browser says it is cross-site", async () => {
      expect(
        (
          await callRoute(plansRoute.PATCH, {
            path: "/api/plans",
            method: "PATCH",
            cookie: designer,
            origin: APP_ORIGIN,
            body: badEdit,
          })
        ).status,
      ).toBe(400);
      expect(
        (
          await callRoute(plansRoute.PATCH, {
            path: "/api/plans",
            method: "PATCH",
            cookie: designer,
            origin: null,
            body: badEdit,
          })
        ).status,
      ).toBe(400);
      expect(
        (
          await callRoute(plansRoute.PATCH, {
            path: "/api/plans",
            method: "PATCH",
            cookie: designer,
            origin: null,
            headers: { "sec-fetch-site": "same-origin" },
            body: badEdit,
          })
        ).status,
      ).toBe(400);
      const crossSite = await callRoute(plansRoute.PATCH, {
        path: "/api/plans",
        method: "PATCH",
        cookie: designer,
        origin: null,
        headers: { "sec-fetch-site": "cross-site" },
        body: badEdit,
      });
      expect(crossSite.status).toBe(403);
    });

    it("reads are not refused for their Origin (a link from elsewhere may open a page's data)", async () => {
      expect(
        (
          await callRoute(plansRoute.GET, {
            path: "/api/plans",
            cookie: viewer,
            origin: "http://evil.example",
          })
        ).status,
      ).toBe(200);
    });

    it("covers the routes outside apiRoute too: invitation acceptance, the account picker and next-auth's sign-in", async () => {
      const accept = await callRoute(acceptRoute.POST, {
        path: "/api/invitations/x",
        method: "POST",
        params: { token: "whatever" },
        origin: "http://evil.example",
        body: { password: "a-long-enough-pw" },
      });
      expect(accept.status).toBe(403);
      const choose = await callRoute(sessionRoute.POST, {
        path: "/api/session/account",
        method: "POST",
        cookie: designer,
        origin: "http://evil.example",
        body: { accountId: ids.demoAccountId },
      });
      expect(choose.status).toBe(403);
      const signIn = await callRoute(authRoute.POST, {
        path: "/api/auth/callback/credentials",
        method: "POST",
        params: { nextauth: ["callback", "credentials"] } as never,
        origin: "http://evil.example",
        body: {},
      });
      expect(signIn.status).toBe(403);
    });
  });

  it("every API answer says Cache-Control: no-store, refusals included", async () => {
    const answers = [
      await callRoute(plansRoute.GET, { path: "/api/plans", cookie: viewer }),
      await callRoute(plansRoute.GET, { path: "/api/plans" }),
      await callRoute(planRoute.GET, { path: "/x", params: { planId: "999999999" }, cookie: viewer }),
      await callRoute(exportRoute.GET, { path: "/api/plans/export?format=csv", cookie: viewer }),
      await callRoute(plansRoute.PATCH, {
        path: "/api/plans",
        method: "PATCH",
        cookie: viewer,
        body: { changes: [] },
      }),
      await callRoute(sessionRoute.GET, { path: "/api/session/account", cookie: viewer }),
      await callRoute(acceptRoute.GET, { path: "/api/invitations/x", params: { token: "none" } }),
    ];
    expect(answers.map((a) => a.status)).toEqual([200, 401, 404, 200, 403, 200, 404]);
    for (const a of answers) expect(a.headers.get("cache-control")).toBe("no-store");
  });

  describe("facings through the lots API", () => {
    for (const facing of ["-45", "1-80", -45, "45e0", 400]) {
      it(`refuses ${JSON.stringify(facing)} naming the lot and the field, and changes nothing`, async () => {
        const [lot] = await getDb()
          .select()
          .from(lots)
          .where(and(eq(lots.communityId, ids.demoRecords.communityId), eq(lots.status, "planned")))
          .limit(1);
        const res = await callRoute(lotsRoute.PATCH, {
          path: "/x",
          method: "PATCH",
          cookie: designer,
          params: { communityId: String(lot.communityId) },
          body: { changes: [{ lotId: lot.id, version: lot.version, facing }] },
        });
        expect(res.status).toBe(400);
        expect(res.json.error.fieldErrors).toEqual([
          expect.objectContaining({
            field: "changes.0.facing",
            row: lot.id,
            column: "Facing",
            message: expect.stringMatching(/0 to 360/),
          }),
        ]);
        const [after] = await getDb().select().from(lots).where(eq(lots.id, lot.id));
        expect([after.version, after.facingDeg]).toEqual([lot.version, lot.facingDeg]);
      });
    }
  });
});

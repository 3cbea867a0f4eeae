import { and, count, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as communityRoute from "@/app/api/communities/[communityId]/route";
import * as lotsRoute from "@/app/api/communities/[communityId]/lots/route";
import * as importRoute from "@/app/api/communities/[communityId]/lots/import/route";
import * as scheduleRoute from "@/app/api/communities/[communityId]/permit-schedule/route";
import * as communitiesRoute from "@/app/api/communities/route";
import * as statusRoute from "@/app/api/lots/[lotId]/status/route";
import * as plansRoute from "@/app/api/plans/route";
import { getDb } from "@/db";
import { DEMO_SITE } from "@/db/demo-scenario";
import { imports, lots, plans } from "@/db/schema";
import { getObject } from "@/lib/storage/object-store";
import { writeXlsx } from "@/lib/workbook/table-io";
import { LOT_HEADERS } from "@/lib/workbook/lot-columns";
import { seededIds } from "../support/demo-ids";
import { waitForImport } from "../support/jobs";
import { callRoute, sessionCookie } from "../support/requests";

const COMPASS = ["N", "NE", "E", "SE", "S", "SW", "W", "NW"];
function lotsCsv(rows: string[][]) {
  return [
    LOT_HEADERS.join(","),
    ...rows.map((r) => r.map((c) => (/[",]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c)).join(",")),
  ].join("\n");
}
const lotRow = (n: number, planCode: string, facing = COMPASS[n % 8]) => [
  `B-${String(n).padStart(4, "0")}`,
  `${n} Larch Loop`,
  planCode,
  facing,
  "",
  "planned",
  "",
];

describe("communities and lots", () => {
  let ids: Awaited<ReturnType<typeof seededIds>>;
  let designer: string;
  let communityId: number;
  let planCodes: string[];

  beforeAll(async () => {
    ids = await seededIds(getDb());
    designer = await sessionCookie({ userId: ids.roleUsers.designer, accountId: ids.demoAccountId });
    const created = await callRoute(communitiesRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: designer,
      body: { name: `Larch Meadow ${Date.now()}`, locality: "test", conditions: DEMO_SITE },
    });
    expect(created.status, JSON.stringify(created.json)).toBe(200);
    communityId = created.json.id;
    planCodes = (
      await getDb().select({ code: plans.planCode }).from(plans).where(eq(plans.accountId, ids.demoAccountId))
    ).map((p) => p.code);
  });

  const postLots = async (fileName: string, data: Uint8Array | string) => {
    const form = new FormData();
    form.append("file", new File([data as BlobPart], fileName));
    return callRoute(importRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: designer,
      params: { communityId: String(communityId) },
      form,
    });
  };

  const lotCount = async () =>
    (await getDb().select({ n: count() }).from(lots).where(eq(lots.communityId, communityId)))[0].n;

  it("refuses bad design conditions with the field named, and writes nothing", async () => {
    const res = await callRoute(communitiesRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: designer,
      body: { name: "Bad", conditions: { ...DEMO_SITE, coolingOutdoorWbF: 120 } },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fieldErrors.map((f: { field: string }) => f.field)).toContain(
      "conditions.coolingOutdoorWbF",
    );
  });

  it("imports 2,000 lots in one transaction through the route (202, then progress to succeeded), keeping the original file", async () => {
    const rows = Array.from({ length: 2000 }, (_, i) => lotRow(i + 1, planCodes[i % planCodes.length]));
    const xlsx = await writeXlsx(LOT_HEADERS, rows);
    const form = new FormData();
    form.append("file", new File([xlsx as BlobPart], "larch-lots.xlsx"));
    const res = await callRoute(importRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: designer,
      params: { communityId: String(communityId) },
      form,
    });
    expect(res.status, JSON.stringify(res.json)).toBe(202);
    const done = await waitForImport(designer, res.json.importId);
    expect(done.state, JSON.stringify(done.errors)).toBe("succeeded");
    expect(done.createdCount).toBe(2000);
    expect(await lotCount()).toBe(2000);
    const grid = await callRoute(lotsRoute.GET, {
      path: "/x",
      params: { communityId: String(communityId) },
      cookie: designer,
    });
    expect(grid.json.lots).toHaveLength(2000);
    expect(
      grid.json.lots.every(
        (l: { loads: { coolingTotalBtuh: number } | null }) => l.loads && l.loads.coolingTotalBtuh > 0,
      ),
    ).toBe(true);
    const [record] = await getDb().select().from(imports).where(eq(imports.id, res.json.importId));
    expect((await getObject(record.fileKey!)).byteLength).toBe(xlsx.byteLength);
  });

  it("a 2,000-lot file with one bad row writes nothing and names row and column", async () => {
    const rows = Array.from({ length: 2000 }, (_, i) => lotRow(i + 5001, planCodes[i % planCodes.length]));
    rows[1234][3] = "sideways";
    rows[1500][0] = rows[10][0];
    const before = await lotCount();
    const res = await postLots("bad.csv", lotsCsv(rows));
    expect(res.status, res.text).toBe(202);
    const done = await waitForImport(designer, res.json.importId);
    expect(done.state).toBe("failed");
    expect(await lotCount()).toBe(before);
    const [record] = await getDb().select().from(imports).where(eq(imports.id, res.json.importId));
    expect(record.state).toBe("failed");
    expect(record.errors).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ row: 1236, column: "Facing" }),
        expect.objectContaining({
          row: 1502,
          column: "Lot",
          reason: expect.stringMatching(/already on row 12/),
        }),
      ]),
    );
    // a file that failed is not kept in object storage
    expect(record.fileKey).toBeNull();
  });

  it("refuses a lot import naming another account's plan code", async () => {
    const [otherPlan] = await getDb().select().from(plans).where(eq(plans.accountId, ids.otherAccountId));
    const res = await postLots("other.csv", lotsCsv([lotRow(9001, otherPlan.planCode)]));
    expect(res.status, res.text).toBe(202);
    const done = await waitForImport(designer, res.json.importId);
    expect(done.state).toBe("failed");
    expect(done.errors).toEqual([
      expect.objectContaining({
        row: 2,
        column: "Plan code",
        reason: expect.stringContaining(otherPlan.planCode),
      }),
    ]);
  });

  it("an upload over the size limit is refused with a clear message, and nothing is recorded", async () => {
    const importsBefore = (await getDb().select({ n: count() }).from(imports))[0].n;
    const res = await postLots(
      "big.csv",
      new Uint8Array(Number(process.env.PLATLOAD_MAX_UPLOAD_BYTES) + 1).fill(65),
    );
    expect(res.status).toBe(413);
    expect(res.json.error.message).toMatch(/larger than .* MB, the limit/);
    expect((await getDb().select({ n: count() }).from(imports))[0].n).toBe(importsBefore);
  });

  it("a plan edit recomputes unfrozen lots and leaves frozen lots' snapshots as they were", async () => {
    const grid = (
      await callRoute(lotsRoute.GET, {
        path: "/x",
        params: { communityId: String(communityId) },
        cookie: designer,
      })
    ).json.lots;
    const code = planCodes[0];
    const [frozenLot, openLot] = grid.filter((l: { planCode: string }) => l.planCode === code);
    const frozen = await callRoute(statusRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: designer,
      params: { lotId: String(frozenLot.id) },
      body: { version: frozenLot.version, status: "permit_submitted" },
    });
    expect(frozen.status, JSON.stringify(frozen.json)).toBe(200);
    const library = (await callRoute(plansRoute.GET, { path: "/api/plans", cookie: designer })).json;
    const plan = library.plans.find((p: { planCode: string }) => p.planCode === code);
    const edit = await callRoute(plansRoute.PATCH, {
      path: "/api/plans",
      method: "PATCH",
      cookie: designer,
      body: { changes: [{ planId: plan.id, version: plan.version, cells: { blower_door_ach50: "9" } }] },
    });
    expect(edit.status, JSON.stringify(edit.json)).toBe(200);
    expect(edit.json.lotsRecomputed).toBeGreaterThan(0);
    const after = (
      await callRoute(lotsRoute.GET, {
        path: "/x",
        params: { communityId: String(communityId) },
        cookie: designer,
      })
    ).json.lots;
    const frozenAfter = after.find((l: { id: number }) => l.id === frozenLot.id);
    const openAfter = after.find((l: { id: number }) => l.id === openLot.id);
    expect(frozenAfter.loads.coolingTotalBtuh).toBe(frozenLot.loads.coolingTotalBtuh);
    expect(frozenAfter.currentDiffers).toBe(true);
    expect(openAfter.loads.coolingTotalBtuh).toBeGreaterThan(openLot.loads.coolingTotalBtuh);
    expect(openAfter.loads.changed).toBe(true);
    // a frozen lot's plan and facing cannot change
    const turn = await callRoute(lotsRoute.PATCH, {
      path: "/x",
      method: "PATCH",
      cookie: designer,
      params: { communityId: String(communityId) },
      body: { changes: [{ lotId: frozenLot.id, version: frozenAfter.version, facing: "W" }] },
    });
    expect(turn.status).toBe(409);
    // an explicit new snapshot takes the current plan
    const refresh = await callRoute(statusRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: designer,
      params: { lotId: String(frozenLot.id) },
      body: { version: frozenAfter.version, status: "permit_submitted", refresh: true },
    });
    expect(refresh.status).toBe(200);
    const refreshed = (
      await callRoute(lotsRoute.GET, {
        path: "/x",
        params: { communityId: String(communityId) },
        cookie: designer,
      })
    ).json.lots.find((l: { id: number }) => l.id === frozenLot.id);
    expect(refreshed.currentDiffers).toBe(false);
    expect(refreshed.loads.coolingTotalBtuh).toBeGreaterThan(frozenLot.loads.coolingTotalBtuh);
  });

  it("turning lots to another facing recomputes them; a bad facing is refused", async () => {
    const grid = (
      await callRoute(lotsRoute.GET, {
        path: "/x",
        params: { communityId: String(communityId) },
        cookie: designer,
      })
    ).json.lots;
    const three = grid
      .filter((l: { frozen: boolean; facingDeg: number }) => !l.frozen && l.facingDeg === 0)
      .slice(0, 3);
    const res = await callRoute(lotsRoute.PATCH, {
      path: "/x",
      method: "PATCH",
      cookie: designer,
      params: { communityId: String(communityId) },
      body: {
        changes: three.map((l: { id: number; version: number }) => ({
          lotId: l.id,
          version: l.version,
          facing: "W",
        })),
      },
    });
    expect(res.status, JSON.stringify(res.json)).toBe(200);
    const after = (
      await callRoute(lotsRoute.GET, {
        path: "/x",
        params: { communityId: String(communityId) },
        cookie: designer,
      })
    ).json.lots;
    for (const l of three) {
      const now = after.find((x: { id: number }) => x.id === l.id);
      expect(now.facingDeg).toBe(270);
      expect(now.loads.coolingTotalBtuh).not.toBe(l.loads.coolingTotalBtuh);
      expect(now.loads.heatingBtuh).toBeCloseTo(l.loads.heatingBtuh, 6); // heating does not depend on facing
    }
    const bad = await callRoute(lotsRoute.PATCH, {
      path: "/x",
      method: "PATCH",
      cookie: designer,
      params: { communityId: String(communityId) },
      body: { changes: [{ lotId: three[0].id, version: 99, facing: "upward" }] },
    });
    expect(bad.status).toBe(400);
  });

  it("saving a community's conditions recomputes all of its lots", async () => {
    const { community } = (
      await callRoute(communityRoute.GET, {
        path: "/x",
        params: { communityId: String(communityId) },
        cookie: designer,
      })
    ).json;
    const before = (
      await callRoute(lotsRoute.GET, {
        path: "/x",
        params: { communityId: String(communityId) },
        cookie: designer,
      })
    ).json.lots.find((l: { frozen: boolean }) => !l.frozen);
    const res = await callRoute(communityRoute.PATCH, {
      path: "/x",
      method: "PATCH",
      cookie: designer,
      params: { communityId: String(communityId) },
      body: {
        name: community.name,
        locality: community.locality,
        version: community.version,
        conditions: { ...community.conditions, heatingOutdoorDbF: 15 },
      },
    });
    expect(res.status, JSON.stringify(res.json)).toBe(200);
    expect(res.json.recomputed).toBe(2000);
    const after = (
      await callRoute(lotsRoute.GET, {
        path: "/x",
        params: { communityId: String(communityId) },
        cookie: designer,
      })
    ).json.lots.find((l: { id: number }) => l.id === before.id);
    expect(after.loads.heatingBtuh).toBeGreaterThan(before.loads.heatingBtuh);
    const stale = await callRoute(communityRoute.PATCH, {
      path: "/x",
      method: "PATCH",
      cookie: designer,
      params: { communityId: String(communityId) },
      body: {
        name: community.name,
        locality: "",
        version: community.version,
        conditions: community.conditions,
      },
    });
    expect(stale.status).toBe(409);
  });

  it("the permit schedule has one row per lot and writes formula-like text as text", async () => {
    const [lot] = await getDb()
      .select()
      .from(lots)
      .where(and(eq(lots.communityId, communityId), eq(lots.status, "planned")))
      .limit(1);
    await callRoute(lotsRoute.PATCH, {
      path: "/x",
      method: "PATCH",
      cookie: designer,
      params: { communityId: String(communityId) },
      body: {
        changes: [{ lotId: lot.id, version: lot.version, address: '=HYPERLINK("http://example.test")' }],
      },
    });
    const res = await callRoute(scheduleRoute.GET, {
      path: "/x?format=csv",
      params: { communityId: String(communityId) },
      cookie: designer,
    });
    expect(res.status).toBe(200);
    const lines = res.text
      .replace(/^\uFEFF/, "")
      .trim()
      .split(/\r?\n/);
    expect(lines).toHaveLength(1 + 2000);
    expect(res.text).toContain(`"'=HYPERLINK(""http://example.test"")"`);
    expect(lines[0]).toContain("Cooling total (Btu/h)");
    expect(res.text).toContain("licensed professional");
  });

  it("a viewer cannot edit lots or change a status", async () => {
    const viewer = await sessionCookie({ userId: ids.roleUsers.viewer, accountId: ids.demoAccountId });
    const [lot] = await getDb().select().from(lots).where(eq(lots.communityId, communityId)).limit(1);
    expect(
      (
        await callRoute(lotsRoute.PATCH, {
          path: "/x",
          method: "PATCH",
          cookie: viewer,
          params: { communityId: String(communityId) },
          body: { changes: [{ lotId: lot.id, version: lot.version, facing: "S" }] },
        })
      ).status,
    ).toBe(403);
    expect(
      (
        await callRoute(statusRoute.POST, {
          path: "/x",
          method: "POST",
          cookie: viewer,
          params: { lotId: String(lot.id) },
          body: { version: lot.version, status: "permit_submitted" },
        })
      ).status,
    ).toBe(403);
  });
});

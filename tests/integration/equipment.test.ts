import { readFileSync } from "node:fs";
import path from "node:path";
import { and, count, desc, eq, isNotNull } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as sizingRoute from "@/app/api/account/sizing-limits/route";
import * as lotsRoute from "@/app/api/communities/[communityId]/lots/route";
import * as systemRoute from "@/app/api/equipment/[systemId]/route";
import * as importRoute from "@/app/api/equipment/import/route";
import * as lotEquipmentRoute from "@/app/api/lots/[lotId]/equipment/route";
import * as plansRoute from "@/app/api/plans/route";
import { getDb } from "@/db";
import { auditLog, equipmentSystems, lots } from "@/db/schema";
import ExcelJS from "exceljs";
import { readCsv } from "@/lib/workbook/table-io";
import { seededIds } from "../support/demo-ids";
import { waitForImport } from "../support/jobs";
import { callRoute, sessionCookie } from "../support/requests";

const exampleCatalog = readFileSync(path.resolve(__dirname, "../../templates/example-equipment.csv"), "utf8");
const form = (name: string, text: string) => {
  const f = new FormData();
  f.append("file", new File([text], name));
  return f;
};

describe("equipment catalog and selection", () => {
  let ids: Awaited<ReturnType<typeof seededIds>>;
  let purchasing: string;
  let admin: string;
  const gridLots = async () =>
    (
      await callRoute(lotsRoute.GET, {
        path: "/x",
        params: { communityId: String(ids.demoRecords.communityId) },
        cookie: purchasing,
      })
    ).json.lots;

  beforeAll(async () => {
    ids = await seededIds(getDb());
    purchasing = await sessionCookie({ userId: ids.roleUsers.purchasing, accountId: ids.demoAccountId });
    admin = await sessionCookie({ userId: ids.roleUsers.admin, accountId: ids.demoAccountId });
  });

  it("every demo lot has a selection: a fitting system or the reason none fits", async () => {
    const lots = await gridLots();
    expect(lots.length).toBeGreaterThan(0);
    for (const l of lots)
      expect(
        l.systemCode !== null || (typeof l.noFitReason === "string" && l.noFitReason.length > 0),
        `lot ${l.lotNumber}`,
      ).toBe(true);
    const fitted = lots.filter((l: { systemCode: string | null }) => l.systemCode);
    expect(fitted.length).toBeGreaterThan(lots.length / 2);
    // the chosen system's cooling capacity is within the default 95–115 % of the load (from memory)
    for (const l of fitted) expect(l.coolingPctOfLoad).toBeGreaterThanOrEqual(95);
  });

  it("a catalog file with a bad row writes nothing and names row and column", async () => {
    const before = (
      await getDb()
        .select({ n: count() })
        .from(equipmentSystems)
        .where(eq(equipmentSystems.accountId, ids.demoAccountId))
    )[0].n;
    const table = readCsv(exampleCatalog);
    const lines = exampleCatalog
      .replace(/^\uFEFF/, "")
      .trim()
      .split(/\r?\n/);
    const col = table.headers.findIndex((h) => /cooling total/i.test(h));
    const cells = [...table.rows[2].cells];
    cells[col] = "lots";
    lines[3] = cells.map((c) => (/[",]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c)).join(",");
    const res = await callRoute(importRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: purchasing,
      form: form("bad-catalog.csv", lines.join("\n")),
    });
    expect(res.status).toBe(202);
    const done = await waitForImport(purchasing, res.json.importId);
    expect(done.state).toBe("failed");
    expect(done.errors).toEqual(
      expect.arrayContaining([expect.objectContaining({ row: 4, column: table.headers[col] })]),
    );
    expect(
      (
        await getDb()
          .select({ n: count() })
          .from(equipmentSystems)
          .where(eq(equipmentSystems.accountId, ids.demoAccountId))
      )[0].n,
    ).toBe(before);
  });

  it("an override is kept through a recompute, and shown as chosen by hand", async () => {
    const lots = await gridLots();
    const lot = lots.find((l: { frozen: boolean; systemCode: string | null }) => !l.frozen && l.systemCode);
    const [other] = await getDb()
      .select()
      .from(equipmentSystems)
      .where(
        and(eq(equipmentSystems.accountId, ids.demoAccountId), eq(equipmentSystems.systemCode, "ACF-48")),
      );
    const res = await callRoute(lotEquipmentRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: purchasing,
      params: { lotId: String(lot.id) },
      body: { version: lot.version, systemId: other.id },
    });
    expect(res.status, JSON.stringify(res.json)).toBe(200);
    // a plan edit recomputes the lot's loads and selection
    const designer = await sessionCookie({ userId: ids.roleUsers.designer, accountId: ids.demoAccountId });
    const plan = (await callRoute(plansRoute.GET, { path: "/api/plans", cookie: designer })).json.plans.find(
      (p: { planCode: string }) => p.planCode === lot.planCode,
    );
    const edit = await callRoute(plansRoute.PATCH, {
      path: "/x",
      method: "PATCH",
      cookie: designer,
      body: { changes: [{ planId: plan.id, version: plan.version, cells: { blower_door_ach50: "4.5" } }] },
    });
    expect(edit.status, JSON.stringify(edit.json)).toBe(200);
    const after = (await gridLots()).find((l: { id: number }) => l.id === lot.id);
    expect(after.systemCode).toBe("ACF-48");
    expect(after.equipmentOverride).toBe(true);
    expect(after.systemFits).toBe(false);
    expect(after.systemReasons.join(" ")).toMatch(/above 115 %/);
    // back to the best fit
    const back = await callRoute(lotEquipmentRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: purchasing,
      params: { lotId: String(lot.id) },
      body: { version: after.version, systemId: null },
    });
    expect(back.status).toBe(200);
    expect((await gridLots()).find((l: { id: number }) => l.id === lot.id).equipmentOverride).toBe(false);
  });

  it("the account's sizing limits are used: narrowing the cooling limit leaves fewer lots fitting", async () => {
    const fitting = async () =>
      (
        await getDb()
          .select({ n: count() })
          .from(lots)
          .where(and(eq(lots.accountId, ids.demoAccountId), isNotNull(lots.equipmentSystemId)))
      )[0].n;
    const before = await fitting();
    const viewer = await sessionCookie({ userId: ids.roleUsers.viewer, accountId: ids.demoAccountId });
    expect(
      (
        await callRoute(sizingRoute.PUT, {
          path: "/x",
          method: "PUT",
          cookie: viewer,
          body: { limits: { coolingMaxPct: 130 } },
        })
      ).status,
    ).toBe(403);
    const bad = await callRoute(sizingRoute.PUT, {
      path: "/x",
      method: "PUT",
      cookie: admin,
      body: { limits: { coolingMinPct: 120, coolingMaxPct: 110 } },
    });
    expect(bad.status).toBe(400);
    const res = await callRoute(sizingRoute.PUT, {
      path: "/x",
      method: "PUT",
      cookie: admin,
      body: {
        limits: {
          coolingMinPct: 95,
          coolingMaxPct: 101,
          heatPumpCoolingMaxPct: 101,
          heatingMinPct: 100,
          heatingMaxPct: 140,
        },
      },
    });
    expect(res.status, JSON.stringify(res.json)).toBe(200);
    expect(await fitting()).toBeLessThan(before);
    const lot = (await gridLots()).find((l: { frozen: boolean }) => !l.frozen);
    const [row] = await getDb().select().from(lots).where(eq(lots.id, lot.id));
    expect((row.selection as { limitsUsed: { coolingMaxPct: number } }).limitsUsed.coolingMaxPct).toBe(101);
    await callRoute(sizingRoute.PUT, { path: "/x", method: "PUT", cookie: admin, body: { limits: {} } });
  });

  it("editing a system's cell is validated like an import row; a viewer may not", async () => {
    const [system] = await getDb()
      .select()
      .from(equipmentSystems)
      .where(eq(equipmentSystems.accountId, ids.demoAccountId))
      .limit(1);
    const bad = await callRoute(systemRoute.PATCH, {
      path: "/x",
      method: "PATCH",
      cookie: purchasing,
      params: { systemId: String(system.id) },
      body: { version: system.version, cells: { cooling_sensible_btuh: "999999" } },
    });
    expect(bad.status).toBe(400);
    const ok = await callRoute(systemRoute.PATCH, {
      path: "/x",
      method: "PATCH",
      cookie: purchasing,
      params: { systemId: String(system.id) },
      body: { version: system.version, cells: { price_usd: "1999" } },
    });
    expect(ok.status, JSON.stringify(ok.json)).toBe(200);
    const viewer = await sessionCookie({ userId: ids.roleUsers.viewer, accountId: ids.demoAccountId });
    expect(
      (
        await callRoute(systemRoute.PATCH, {
          path: "/x",
          method: "PATCH",
          cookie: viewer,
          params: { systemId: String(system.id) },
          body: { version: system.version + 1, cells: { price_usd: "1" } },
        })
      ).status,
    ).toBe(403);
  });

  it("imports a good catalog file: systems created by code and lots reselected", async () => {
    const res = await callRoute(importRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: purchasing,
      form: form("example-equipment.csv", exampleCatalog),
    });
    expect(res.status, JSON.stringify(res.json)).toBe(202);
    const done = await waitForImport(purchasing, res.json.importId);
    expect(done.state, JSON.stringify(done.errors)).toBe("succeeded");
    expect(done.createdCount).toBeGreaterThan(0);
    const [entry] = await getDb()
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.accountId, ids.demoAccountId), eq(auditLog.action, "equipment_import")))
      .orderBy(desc(auditLog.id))
      .limit(1);
    expect(Number(/(\d+) lots reselected/.exec(entry.summary)?.[1])).toBeGreaterThan(0);
  });
});

describe("the account-wide equipment schedule", () => {
  it("counts every lot of every community under its system, and only the account's own", async () => {
    const { NextRequest } = await import("next/server");
    const { GET } = await import("@/app/api/equipment-schedule/route");
    const ids = await seededIds(getDb());
    const cookie = await sessionCookie({ userId: ids.roleUsers.viewer, accountId: ids.demoAccountId });
    const csv = await callRoute(GET, { path: "/api/equipment-schedule?format=csv", cookie });
    expect(csv.status).toBe(200);
    expect(csv.text).toContain("All communities");
    expect(csv.text).not.toContain("BW-30"); // the other account's system
    const response = await GET(
      new NextRequest("http://127.0.0.1/api/equipment-schedule?format=xlsx", { headers: { cookie } }),
      { params: Promise.resolve({}) },
    );
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(Buffer.from(await response.arrayBuffer()) as unknown as ExcelJS.Buffer);
    // every sheet's numbers are written as numbers; the lots with a system, counted here from the database,
    // equal the sum of the per-community counts in the by-community sheet
    const [{ n }] = await getDb()
      .select({ n: count() })
      .from(lots)
      .where(and(eq(lots.accountId, ids.demoAccountId), isNotNull(lots.equipmentSystemId)));
    const sheet = workbook.worksheets.find((w) => /communit/i.test(w.name))!;
    expect(sheet, workbook.worksheets.map((w) => w.name).join(", ")).toBeTruthy();
    const header = (sheet.getRow(1).values as unknown[]).map(String);
    const countCol = header.findIndex((h) => /^count$/i.test(h));
    let sum = 0;
    let grandTotal = 0;
    sheet.eachRow((row, i) => {
      if (i === 1) return;
      const value = row.getCell(countCol).value;
      if (typeof value !== "number") return;
      if (row.getCell(2).value === "Total") {
        if (row.getCell(1).value === "All communities") grandTotal = value;
      } else sum += value;
    });
    expect(sum).toBe(n);
    expect(grandTotal).toBe(n);
  });
});

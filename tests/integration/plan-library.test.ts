import { readFileSync } from "node:fs";
import path from "node:path";
import { and, count, eq, inArray } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as approveRoute from "@/app/api/plans/[planId]/approve/route";
import * as exportRoute from "@/app/api/plans/export/route";
import * as importRoute from "@/app/api/plans/import/route";
import * as plansRoute from "@/app/api/plans/route";
import * as undoRoute from "@/app/api/plans/undo/route";
import { getDb } from "@/db";
import { auditLog, imports, planRevisions, plans } from "@/db/schema";
import { readCsv } from "@/lib/workbook/table-io";
import { seededIds } from "../support/demo-ids";
import { waitForImport } from "../support/jobs";
import { callRoute, sessionCookie } from "../support/requests";

const root = path.resolve(__dirname, "../..");
const exampleCsv = readFileSync(path.join(root, "templates/example-plans.csv"), "utf8");

function csvForm(name: string, content: string) {
  const form = new FormData();
  form.append("file", new File([content], name, { type: "text/csv" }));
  return form;
}

/** Edits one data row's cell of a CSV by header, keeping everything else. */
function editCsv(csv: string, edit: (header: string[], rows: string[][]) => void): string {
  const table = readCsv(csv);
  const rows = table.rows.map((r) => [...r.cells]);
  edit(table.headers, rows);
  const quote = (c: string) => (/[",\n]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c);
  return [table.headers, ...rows].map((r) => r.map(quote).join(",")).join("\n");
}

describe("plan library", () => {
  let ids: Awaited<ReturnType<typeof seededIds>>;
  let designer: string;
  const planCount = async () =>
    (await getDb().select({ n: count() }).from(plans).where(eq(plans.accountId, ids.demoAccountId)))[0].n;

  beforeAll(async () => {
    ids = await seededIds(getDb());
    designer = await sessionCookie({ userId: ids.roleUsers.designer, accountId: ids.demoAccountId });
  });

  it("imports a good file: creates plans by code in one go and records the import; the same file again changes nothing", async () => {
    const before = await planCount();
    const res = await callRoute(importRoute.POST, {
      path: "/api/plans/import",
      method: "POST",
      cookie: designer,
      form: csvForm("example-plans.csv", exampleCsv),
    });
    expect(res.status, JSON.stringify(res.json)).toBe(202);
    expect(await waitForImport(designer, res.json.importId)).toMatchObject({
      state: "succeeded",
      createdCount: 5,
      updatedCount: 0,
    });
    expect(await planCount()).toBe(before + 5);
    const [record] = await getDb().select().from(imports).where(eq(imports.id, res.json.importId));
    expect(record).toMatchObject({
      kind: "plans",
      state: "succeeded",
      createdCount: 5,
      fileName: "example-plans.csv",
    });
    const again = await callRoute(importRoute.POST, {
      path: "/api/plans/import",
      method: "POST",
      cookie: designer,
      form: csvForm("example-plans.csv", exampleCsv),
    });
    expect(await waitForImport(designer, again.json.importId)).toMatchObject({
      state: "succeeded",
      createdCount: 0,
      updatedCount: 0,
    });
  });

  const badFiles: [string, () => string, { row: number; column: RegExp }][] = [
    [
      "a wrong column",
      () => exampleCsv.replace("Bedrooms,", "Bedroom count,"),
      { row: 1, column: /Bedroom/ },
    ],
    [
      "a text in a number cell",
      () => editCsv(exampleCsv, (h, rows) => (rows[1][h.indexOf("Bedrooms")] = "three")),
      { row: 3, column: /^Bedrooms$/ },
    ],
    [
      "a negative area",
      () => editCsv(exampleCsv, (h, rows) => (rows[2][h.indexOf("Front wall gross (ft²)")] = "-200")),
      { row: 4, column: /Front wall gross/ },
    ],
    [
      "a duplicated plan code",
      () =>
        editCsv(exampleCsv, (h, rows) => (rows[3][h.indexOf("Plan code")] = rows[0][h.indexOf("Plan code")])),
      { row: 5, column: /^Plan code$/ },
    ],
  ];
  for (const [label, make, where] of badFiles) {
    it(`refuses a file with ${label}, names row and column, and writes nothing`, async () => {
      const before = await planCount();
      const revisionsBefore = (await getDb().select({ n: count() }).from(planRevisions))[0].n;
      const res = await callRoute(importRoute.POST, {
        path: "/api/plans/import",
        method: "POST",
        cookie: designer,
        form: csvForm("bad.csv", make()),
      });
      expect(res.status).toBe(202);
      const done = await waitForImport(designer, res.json.importId);
      expect(done.state).toBe("failed");
      const hit = done.errors.find((f) => f.row === where.row && where.column.test(f.column));
      expect(hit, JSON.stringify(done.errors)).toBeTruthy();
      expect(await planCount()).toBe(before);
      expect((await getDb().select({ n: count() }).from(planRevisions))[0].n).toBe(revisionsBefore);
      const [failed] = await getDb()
        .select()
        .from(imports)
        .where(and(eq(imports.accountId, ids.demoAccountId), eq(imports.fileName, "bad.csv")))
        .orderBy(imports.id);
      expect(failed.state).toBe("failed");
    });
  }

  it("a bulk edit changes every selected model in one transaction and one history entry, recomputes them, and can be undone", async () => {
    const list = (await callRoute(plansRoute.GET, { path: "/api/plans", cookie: designer })).json;
    const three = list.plans
      .filter(
        (p: { cells: Record<string, unknown> }) =>
          p.cells.attic_kind === "vented" || p.cells.attic_kind === "",
      )
      .slice(0, 3);
    expect(three).toHaveLength(3);
    const auditBefore = (await getDb().select({ n: count() }).from(auditLog))[0].n;
    const res = await callRoute(plansRoute.PATCH, {
      path: "/api/plans",
      method: "PATCH",
      cookie: designer,
      body: {
        action: "bulk_edit",
        changes: three.map((p: { id: number; version: number }) => ({
          planId: p.id,
          version: p.version,
          cells: { ceiling_cavity_r: "R-60" },
        })),
      },
    });
    expect(res.status, JSON.stringify(res.json)).toBe(200);
    expect(res.json.changed).toBe(3);
    expect((await getDb().select({ n: count() }).from(auditLog))[0].n).toBe(auditBefore + 1);
    const after = (await callRoute(plansRoute.GET, { path: "/api/plans", cookie: designer })).json;
    for (const p of three) {
      const now = after.plans.find((x: { id: number }) => x.id === p.id);
      expect(now.cells.ceiling_cavity_r).toBe("R-60");
      expect(now.version).toBe(p.version + 1);
      // more ceiling insulation lowers the heating load of a vented-attic house (common practice)
      expect(now.loads.facings[0].heatingBtuh).toBeLessThan(p.loads.facings[0].heatingBtuh);
    }
    const undo = await callRoute(undoRoute.POST, {
      path: "/api/plans/undo",
      method: "POST",
      cookie: designer,
      body: { entryId: res.json.entryId },
    });
    expect(undo.status, JSON.stringify(undo.json)).toBe(200);
    const restored = (await callRoute(plansRoute.GET, { path: "/api/plans", cookie: designer })).json;
    for (const p of three)
      expect(restored.plans.find((x: { id: number }) => x.id === p.id).cells.ceiling_cavity_r).toBe(
        p.cells.ceiling_cavity_r,
      );
  });

  it("a bulk edit with one bad cell writes nothing and names the plan and column", async () => {
    const list = (await callRoute(plansRoute.GET, { path: "/api/plans", cookie: designer })).json;
    const [a, b] = list.plans;
    const res = await callRoute(plansRoute.PATCH, {
      path: "/api/plans",
      method: "PATCH",
      cookie: designer,
      body: {
        action: "paste",
        changes: [
          { planId: a.id, version: a.version, cells: { bedrooms: "4" } },
          { planId: b.id, version: b.version, cells: { front_window_shgc: "1.4" } },
        ],
      },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fieldErrors).toEqual([
      expect.objectContaining({
        field: `${b.planCode}.front_window_shgc`,
        row: b.id,
        column: expect.stringMatching(/SHGC/),
      }),
    ]);
    const [stillA] = await getDb().select().from(plans).where(eq(plans.id, a.id));
    expect(stillA.version).toBe(a.version);
  });

  it("a second air-leakage figure is refused naming both columns; a switch of figure, a direct U and a second window group are saved", async () => {
    const list = (await callRoute(plansRoute.GET, { path: "/api/plans", cookie: designer })).json;
    // From the end of the list: the approval test below edits the ACH50 of the third plan.
    const p = [...list.plans]
      .reverse()
      .find(
        (x: { cells: Record<string, unknown> }) =>
          x.cells.blower_door_ach50 !== null && x.cells.blower_door_ach50 !== "",
      );
    expect(p).toBeDefined();
    expect(p.id).not.toBe(list.plans[2].id);
    const twice = await callRoute(plansRoute.PATCH, {
      path: "/api/plans",
      method: "PATCH",
      cookie: designer,
      body: { changes: [{ planId: p.id, version: p.version, cells: { blower_door_cfm50: "1,100 CFM50" } }] },
    });
    expect(twice.status).toBe(400);
    expect(twice.json.error.fieldErrors).toEqual([
      expect.objectContaining({
        field: `${p.planCode}.blower_door_ach50`,
        column: "Air leakage (ACH50)",
        message: expect.stringContaining('"Air leakage (ACH50)" and "Air leakage (CFM50)" are both filled'),
      }),
      expect.objectContaining({ field: `${p.planCode}.blower_door_cfm50`, column: "Air leakage (CFM50)" }),
    ]);
    const cells = {
      blower_door_cfm50: "1,100 CFM50",
      blower_door_ach50: "",
      wall_u: "0.05 U",
      back_window2_ft2: "30",
      back_window2_overhang_depth_ft: "8'",
    };
    const saved = await callRoute(plansRoute.PATCH, {
      path: "/api/plans",
      method: "PATCH",
      cookie: designer,
      body: { changes: [{ planId: p.id, version: p.version, cells }] },
    });
    expect(saved.status, JSON.stringify(saved.json)).toBe(200);
    const [row] = await getDb()
      .select({ revision: planRevisions })
      .from(plans)
      .innerJoin(planRevisions, eq(planRevisions.id, plans.currentRevisionId))
      .where(eq(plans.id, p.id));
    const input = row.revision.input as {
      infiltration: Record<string, unknown>;
      wall: { uFactor?: number };
      facades: { back: { extraWindows: { areaFt2: number; overhangDepthFt: number }[] } };
    };
    expect(input.infiltration.cfm50).toBe(1100);
    expect(input.infiltration.ach50).toBeUndefined();
    expect(input.wall.uFactor).toBe(0.05);
    expect(input.facades.back.extraWindows).toEqual([
      expect.objectContaining({ areaFt2: 30, overhangDepthFt: 8 }),
    ]);
  });

  it("a formula cell is kept as entered and its value is used", async () => {
    const list = (await callRoute(plansRoute.GET, { path: "/api/plans", cookie: designer })).json;
    const p = list.plans[0];
    const res = await callRoute(plansRoute.PATCH, {
      path: "/api/plans",
      method: "PATCH",
      cookie: designer,
      body: { changes: [{ planId: p.id, version: p.version, cells: { front_wall_ft2: "=38*9-2*15" } }] },
    });
    expect(res.status, JSON.stringify(res.json)).toBe(200);
    const [row] = await getDb()
      .select({ revision: planRevisions })
      .from(plans)
      .innerJoin(planRevisions, eq(planRevisions.id, plans.currentRevisionId))
      .where(eq(plans.id, p.id));
    expect((row.revision.cells as Record<string, unknown>).front_wall_ft2).toBe("=38*9-2*15");
    expect(
      (row.revision.input as { facades: { front: { grossWallAreaFt2: number } } }).facades.front
        .grossWallAreaFt2,
    ).toBe(38 * 9 - 2 * 15);
    const bad = await callRoute(plansRoute.PATCH, {
      path: "/api/plans",
      method: "PATCH",
      cookie: designer,
      body: { changes: [{ planId: p.id, version: p.version + 1, cells: { front_wall_ft2: "=38*/9" } }] },
    });
    expect(bad.status).toBe(400);
  });

  it("a save against a stale version is refused and nothing is overwritten", async () => {
    const list = (await callRoute(plansRoute.GET, { path: "/api/plans", cookie: designer })).json;
    const p = list.plans[1];
    const first = await callRoute(plansRoute.PATCH, {
      path: "/api/plans",
      method: "PATCH",
      cookie: designer,
      body: { changes: [{ planId: p.id, version: p.version, cells: { bedrooms: "5" } }] },
    });
    expect(first.status).toBe(200);
    const second = await callRoute(plansRoute.PATCH, {
      path: "/api/plans",
      method: "PATCH",
      cookie: designer,
      body: { changes: [{ planId: p.id, version: p.version, cells: { bedrooms: "2" } }] },
    });
    expect(second.status).toBe(409);
    expect(second.json.error.message).toMatch(/changed by someone else/);
    const [row] = await getDb()
      .select({ revision: planRevisions })
      .from(plans)
      .innerJoin(planRevisions, eq(planRevisions.id, plans.currentRevisionId))
      .where(eq(plans.id, p.id));
    expect((row.revision.cells as Record<string, unknown>).bedrooms).toBe("5");
  });

  it("a viewer's and a purchaser's writes are refused", async () => {
    const list = (await callRoute(plansRoute.GET, { path: "/api/plans", cookie: designer })).json;
    const p = list.plans[0];
    for (const role of ["viewer", "purchasing", "reviewer"] as const) {
      const cookie = await sessionCookie({ userId: ids.roleUsers[role], accountId: ids.demoAccountId });
      const res = await callRoute(plansRoute.PATCH, {
        path: "/api/plans",
        method: "PATCH",
        cookie,
        body: { changes: [{ planId: p.id, version: p.version, cells: { bedrooms: "6" } }] },
      });
      expect(res.status, role).toBe(403);
      const imp = await callRoute(importRoute.POST, {
        path: "/api/plans/import",
        method: "POST",
        cookie,
        form: csvForm("x.csv", exampleCsv),
      });
      expect(imp.status, role).toBe(403);
    }
  });

  it("a reviewer approves a revision; it is locked and the next edit starts a new draft", async () => {
    const list = (await callRoute(plansRoute.GET, { path: "/api/plans", cookie: designer })).json;
    const p = list.plans[2];
    const reviewer = await sessionCookie({ userId: ids.roleUsers.reviewer, accountId: ids.demoAccountId });
    const byDesigner = await callRoute(approveRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: designer,
      params: { planId: String(p.id) },
      body: {
        revisionId: p.revisionId,
        approverName: "D",
        approverCredential: "none",
        approvedOn: "2026-12-01",
      },
    });
    expect(byDesigner.status).toBe(403);
    const badDate = await callRoute(approveRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: reviewer,
      params: { planId: String(p.id) },
      body: {
        revisionId: p.revisionId,
        approverName: "Rafael Ibarra",
        approverCredential: "PE 12345",
        approvedOn: "yesterday",
      },
    });
    expect(badDate.status).toBe(400);
    const ok = await callRoute(approveRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: reviewer,
      params: { planId: String(p.id) },
      body: {
        revisionId: p.revisionId,
        approverName: "Rafael Ibarra",
        approverCredential: "PE 12345",
        approvedOn: "2026-12-01",
      },
    });
    expect(ok.status, JSON.stringify(ok.json)).toBe(200);
    const approved = (
      await callRoute(plansRoute.GET, { path: "/api/plans", cookie: designer })
    ).json.plans.find((x: { id: number }) => x.id === p.id);
    expect(approved.revisionStatus).toBe("approved");
    const edit = await callRoute(plansRoute.PATCH, {
      path: "/api/plans",
      method: "PATCH",
      cookie: designer,
      body: { changes: [{ planId: p.id, version: approved.version, cells: { blower_door_ach50: "3" } }] },
    });
    expect(edit.status, JSON.stringify(edit.json)).toBe(200);
    const revisions = await getDb()
      .select()
      .from(planRevisions)
      .where(eq(planRevisions.planId, p.id))
      .orderBy(planRevisions.number);
    expect(revisions.map((r) => [r.number, r.status])).toEqual([
      [p.revisionNumber, "approved"],
      [p.revisionNumber + 1, "draft"],
    ]);
    expect(revisions[0].cells).toEqual(approved.cells);
    expect(revisions[0].approverCredential).toBe("PE 12345");
  });

  it("exports the library with computed loads, escapes formula-like text, and the export imports back", async () => {
    const list = (await callRoute(plansRoute.GET, { path: "/api/plans", cookie: designer })).json;
    const p = list.plans[3];
    await callRoute(plansRoute.PATCH, {
      path: "/api/plans",
      method: "PATCH",
      cookie: designer,
      body: { changes: [{ planId: p.id, version: p.version, cells: { plan_name: "+Harbor @ east" } }] },
    });
    const res = await callRoute(exportRoute.GET, { path: "/api/plans/export?format=csv", cookie: designer });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-disposition")).toMatch(/attachment; filename="plan-library-.*\.csv"/);
    expect(res.text).toContain("'+Harbor @ east");
    expect(res.text).toContain("'=38*9-2*15");
    expect(res.text).toMatch(/Heating, front N \(Btu\/h\)/);
    const back = await callRoute(importRoute.POST, {
      path: "/api/plans/import",
      method: "POST",
      cookie: designer,
      form: csvForm("export.csv", res.text),
    });
    expect(back.status, back.text).toBe(202);
    const done = await waitForImport(designer, back.json.importId);
    expect(done, JSON.stringify(done.errors?.slice(0, 3))).toMatchObject({
      state: "succeeded",
      createdCount: 0,
      updatedCount: 0,
    });
  });

  it("another account's plans are not reachable for editing", async () => {
    const other = await sessionCookie({ userId: ids.otherAdminId, accountId: ids.otherAccountId });
    const [p] = await getDb()
      .select()
      .from(plans)
      .where(inArray(plans.id, [ids.demoRecords.planId]));
    const res = await callRoute(plansRoute.PATCH, {
      path: "/api/plans",
      method: "PATCH",
      cookie: other,
      body: { changes: [{ planId: p.id, version: p.version, cells: { bedrooms: "1" } }] },
    });
    expect(res.status).toBe(404);
  });
});

describe("copying a plan model", () => {
  it("creates a draft copy under a new code; a used code is refused and nothing is created", async () => {
    const ids = await seededIds(getDb());
    const designer = await sessionCookie({ userId: ids.roleUsers.designer, accountId: ids.demoAccountId });
    const [source] = await getDb().select().from(plans).where(eq(plans.id, ids.demoRecords.planId));
    const res = await callRoute(plansRoute.POST, {
      path: "/api/plans",
      method: "POST",
      cookie: designer,
      body: { fromPlanId: source.id, planCode: "COPY-1", name: "Copy one" },
    });
    expect(res.status, JSON.stringify(res.json)).toBe(200);
    const library = (await callRoute(plansRoute.GET, { path: "/api/plans", cookie: designer })).json.plans;
    const copy = library.find((p: { planCode: string }) => p.planCode === "COPY-1");
    const original = library.find((p: { id: number }) => p.id === source.id);
    expect(copy).toMatchObject({ name: "Copy one", revisionNumber: 1, revisionStatus: "draft" });
    expect(copy.cells.bedrooms).toBe(original.cells.bedrooms);
    expect(copy.loads.facings[0].coolingTotalBtuh).toBeCloseTo(original.loads.facings[0].coolingTotalBtuh, 6);
    const again = await callRoute(plansRoute.POST, {
      path: "/api/plans",
      method: "POST",
      cookie: designer,
      body: { fromPlanId: source.id, planCode: "COPY-1", name: "Copy two" },
    });
    expect(again.status).toBe(409);
    const bad = await callRoute(plansRoute.POST, {
      path: "/api/plans",
      method: "POST",
      cookie: designer,
      body: { fromPlanId: source.id, planCode: "has space", name: "x" },
    });
    expect(bad.status).toBe(400);
    const viewer = await sessionCookie({ userId: ids.roleUsers.viewer, accountId: ids.demoAccountId });
    expect(
      (
        await callRoute(plansRoute.POST, {
          path: "/api/plans",
          method: "POST",
          cookie: viewer,
          body: { fromPlanId: source.id, planCode: "V-1", name: "v" },
        })
      ).status,
    ).toBe(403);
  });
});

describe("import templates", () => {
  it("serve the files in templates/ as downloads", async () => {
    const { GET: planTemplate } = await import("@/app/api/plans/template/route");
    const { GET: catalogTemplate } = await import("@/app/api/equipment/template/route");
    const ids = await seededIds(getDb());
    const cookie = await sessionCookie({ userId: ids.roleUsers.viewer, accountId: ids.demoAccountId });
    const csv = await callRoute(planTemplate, { path: "/api/plans/template?format=csv", cookie });
    expect(csv.status).toBe(200);
    expect(csv.headers.get("content-disposition")).toBe('attachment; filename="plan-library-template.csv"');
    // Response.text() drops the byte-order mark the file starts with
    expect(csv.text).toBe(
      readFileSync(path.join(root, "templates/plan-library-template.csv"), "utf8").replace(/^\uFEFF/, ""),
    );
    const xlsx = await callRoute(catalogTemplate, { path: "/api/equipment/template?format=xlsx", cookie });
    expect(xlsx.status).toBe(200);
    expect(xlsx.headers.get("content-type")).toContain("spreadsheetml");
    expect((await callRoute(planTemplate, { path: "/api/plans/template?format=pdf", cookie })).status).toBe(
      400,
    );
  });
});

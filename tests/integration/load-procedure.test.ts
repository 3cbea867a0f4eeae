/**
 * The account's load procedure: every member sees it, only an admin changes it; a change
 * recomputes every lot of the account in one transaction with one history entry, and lots
 * frozen for permit keep their snapshot, its procedure included. The lots grid, the plan
 * library and sheet, the permit schedule, the equipment schedule and the lot report name it.
 */
import { and, count, eq, isNotNull } from "drizzle-orm";
import { PDFParse } from "pdf-parse";
import { NextRequest } from "next/server";
import { beforeAll, describe, expect, it } from "vitest";
import * as procedureRoute from "@/app/api/account/load-procedure/route";
import * as equipmentScheduleRoute from "@/app/api/communities/[communityId]/equipment-schedule/route";
import * as lotsRoute from "@/app/api/communities/[communityId]/lots/route";
import * as scheduleRoute from "@/app/api/communities/[communityId]/permit-schedule/route";
import * as reportRoute from "@/app/api/lots/[lotId]/report/route";
import * as statusRoute from "@/app/api/lots/[lotId]/status/route";
import * as planRoute from "@/app/api/plans/[planId]/route";
import * as plansRoute from "@/app/api/plans/route";
import { getDb } from "@/db";
import type { LotResults, PermitSnapshot } from "@/db/recompute";
import { accounts, auditLog, lots } from "@/db/schema";
import { LOAD_PROCEDURE_LABELS, LOAD_PROCEDURES, type LoadProcedure } from "@/lib/load";
import { PROCEDURE_STATEMENTS } from "@/lib/reports/procedure-text";
import { readCsv } from "@/lib/workbook/table-io";
import { seededIds } from "../support/demo-ids";
import { callRoute, sessionCookie } from "../support/requests";

const squash = (text: string) => text.replace(/\s+/g, " ");
const otherThan = (p: LoadProcedure): LoadProcedure => LOAD_PROCEDURES.find((q) => q !== p)!;

async function pdfText(bytes: Uint8Array): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  const result = await parser.getText();
  await parser.destroy();
  return squash(result.text);
}

describe("the account's load procedure", () => {
  let ids: Awaited<ReturnType<typeof seededIds>>;
  let cookies: Record<"admin" | "designer" | "reviewer" | "purchasing" | "viewer", string>;
  let otherAdmin: string;

  const accountProcedure = async (accountId: number) =>
    (await getDb().select({ p: accounts.loadProcedure }).from(accounts).where(eq(accounts.id, accountId)))[0]
      .p;
  const put = (cookie: string, body: unknown) =>
    callRoute(procedureRoute.PUT, { path: "/api/account/load-procedure", method: "PUT", cookie, body });
  const accountLots = () => getDb().select().from(lots).where(eq(lots.accountId, ids.demoAccountId));
  /** The report route's PDF bytes (callRoute reads bodies as text). */
  const reportBytes = async (lotId: number) => {
    const response = await reportRoute.GET(
      new NextRequest(new URL(`/api/lots/${lotId}/report`, "http://127.0.0.1:3720"), {
        headers: { cookie: cookies.viewer },
      }),
      { params: Promise.resolve({ lotId: String(lotId) }) },
    );
    expect(response.status, `report of lot ${lotId}`).toBe(200);
    return new Uint8Array(await response.arrayBuffer());
  };

  beforeAll(async () => {
    ids = await seededIds(getDb());
    cookies = Object.fromEntries(
      await Promise.all(
        Object.entries(ids.roleUsers).map(async ([role, userId]) => [
          role,
          await sessionCookie({ userId, accountId: ids.demoAccountId }),
        ]),
      ),
    ) as typeof cookies;
    otherAdmin = await sessionCookie({ userId: ids.otherAdminId, accountId: ids.otherAccountId });
  });

  it("every role sees which procedure is in use; a new account starts on the handbook's residential procedure", async () => {
    for (const role of ["admin", "designer", "reviewer", "purchasing", "viewer"] as const) {
      const res = await callRoute(procedureRoute.GET, { path: "/x", cookie: cookies[role] });
      expect(res.status, role).toBe(200);
      expect(res.json.procedure, role).toBe(await accountProcedure(ids.demoAccountId));
      expect(res.json.choices.map((c: { procedure: string }) => c.procedure)).toEqual([...LOAD_PROCEDURES]);
    }
    // The seed leaves the demo builder on the column's default.
    expect(await accountProcedure(ids.demoAccountId)).toBe("residential-load-factor");
  });

  it("only an admin may change it: every other role gets 403 and nothing is written", async () => {
    const before = await accountProcedure(ids.demoAccountId);
    const historyLength = async () =>
      (
        await getDb().select({ n: count() }).from(auditLog).where(eq(auditLog.accountId, ids.demoAccountId))
      )[0].n;
    const entriesBefore = await historyLength();
    for (const role of ["designer", "reviewer", "purchasing", "viewer"] as const) {
      const res = await put(cookies[role], { procedure: otherThan(before), from: before });
      expect(res.status, role).toBe(403);
      expect(res.json.error.code, role).toBe("forbidden");
    }
    expect(await accountProcedure(ids.demoAccountId)).toBe(before);
    expect(await historyLength()).toBe(entriesBefore);
  });

  it("a bad body names the field; a stale 'from' is a conflict; neither writes anything", async () => {
    const before = await accountProcedure(ids.demoAccountId);
    const bad = await put(cookies.admin, { procedure: "monthly", from: before });
    expect(bad.status).toBe(400);
    expect(bad.json.error.fieldErrors.map((f: { field: string }) => f.field)).toContain("procedure");
    const unknownKey = await put(cookies.admin, {
      procedure: otherThan(before),
      from: before,
      recompute: false,
    });
    expect(unknownKey.status).toBe(400);
    const stale = await put(cookies.admin, { procedure: before, from: otherThan(before) });
    expect(stale.status).toBe(409);
    expect(stale.json.error.message).toMatch(/changed by someone else/);
    expect(await accountProcedure(ids.demoAccountId)).toBe(before);
  });

  it("a change recomputes every lot by the new procedure in one step with one history entry; frozen lots keep their snapshot", async () => {
    const db = getDb();
    const before = await accountProcedure(ids.demoAccountId);
    const after = otherThan(before);

    // Freeze one lot for permit under the current procedure: its snapshot keeps the procedure.
    const grid = (
      await callRoute(lotsRoute.GET, {
        path: "/x",
        params: { communityId: String(ids.demoRecords.communityId) },
        cookie: cookies.designer,
      })
    ).json;
    expect(grid.accountProcedure).toBe(before);
    const target = grid.lots.find((l: { frozen: boolean; planId: number | null }) => !l.frozen && l.planId);
    const frozen = await callRoute(statusRoute.POST, {
      path: "/x",
      method: "POST",
      params: { lotId: String(target.id) },
      cookie: cookies.designer,
      body: { version: target.version, status: "permit_submitted" },
    });
    expect(frozen.status, JSON.stringify(frozen.json)).toBe(200);
    const [frozenRow] = await db.select().from(lots).where(eq(lots.id, target.id));
    const snapshot = frozenRow.permitSnapshot as PermitSnapshot;
    expect(snapshot.procedure).toBe(before);
    expect(snapshot.result.procedure).toBe(before);
    expect(snapshot.summary.procedure).toBe(before);

    const frozenBefore = await db
      .select({
        id: lots.id,
        permitSnapshot: lots.permitSnapshot,
        selection: lots.selection,
        equipmentSystemId: lots.equipmentSystemId,
      })
      .from(lots)
      .where(and(eq(lots.accountId, ids.demoAccountId), isNotNull(lots.permitSnapshot)));
    expect(frozenBefore.length).toBeGreaterThan(0);
    const otherAccountBefore = await db
      .select({ id: lots.id, results: lots.results })
      .from(lots)
      .where(eq(lots.accountId, ids.otherAccountId));
    const allLots = await accountLots();

    const res = await put(cookies.admin, { procedure: after, from: before });
    expect(res.status, JSON.stringify(res.json)).toBe(200);
    expect(res.json).toMatchObject({ procedure: after, changed: true, lotsRecomputed: allLots.length });
    expect(await accountProcedure(ids.demoAccountId)).toBe(after);

    // Every lot's live results are by the new procedure; frozen lots' snapshots are untouched.
    const now = await accountLots();
    for (const lot of now) expect((lot.results as LotResults).procedure, `lot ${lot.lotNumber}`).toBe(after);
    for (const f of frozenBefore) {
      const lot = now.find((l) => l.id === f.id)!;
      expect(lot.permitSnapshot, `lot ${lot.lotNumber}`).toEqual(f.permitSnapshot);
      expect((lot.permitSnapshot as PermitSnapshot).procedure).toBe(before);
    }
    // The two procedures give different loads, so the recompute moved them.
    const liveOfTarget = now.find((l) => l.id === target.id)!.results as LotResults;
    expect(Math.round(liveOfTarget.coolingTotalBtuh)).not.toBe(Math.round(snapshot.summary.coolingTotalBtuh));
    // The other account is not touched.
    expect(
      await db
        .select({ id: lots.id, results: lots.results })
        .from(lots)
        .where(eq(lots.accountId, ids.otherAccountId)),
    ).toEqual(otherAccountBefore);

    // One history entry, naming both procedures.
    const entries = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.accountId, ids.demoAccountId), eq(auditLog.action, "load_procedure")));
    expect(entries).toHaveLength(1);
    expect(entries[0].before).toEqual({ procedure: before });
    expect(entries[0].after).toMatchObject({ procedure: after, lotsRecomputed: allLots.length });
    expect(entries[0].summary).toContain(LOAD_PROCEDURE_LABELS[before]);
    expect(entries[0].summary).toContain(LOAD_PROCEDURE_LABELS[after]);

    // The lots grid: live lots by the new procedure, the frozen lot by its snapshot's, and it says the current plan differs.
    const gridAfter = (
      await callRoute(lotsRoute.GET, {
        path: "/x",
        params: { communityId: String(ids.demoRecords.communityId) },
        cookie: cookies.viewer,
      })
    ).json;
    expect(gridAfter.accountProcedure).toBe(after);
    const frozenInGrid = gridAfter.lots.find((l: { id: number }) => l.id === target.id);
    expect(frozenInGrid).toMatchObject({
      frozen: true,
      procedure: before,
      liveProcedure: after,
      currentDiffers: true,
    });
    expect(frozenInGrid.loads.coolingTotalBtuh).toBe(snapshot.summary.coolingTotalBtuh);
    for (const l of gridAfter.lots.filter((x: { frozen: boolean; loads: unknown }) => !x.frozen && x.loads))
      expect(l.procedure).toBe(after);

    // The permit schedule's procedure column: the snapshot's for the frozen lot, the account's for the others.
    const csv = await callRoute(scheduleRoute.GET, {
      path: "/x?format=csv",
      params: { communityId: String(ids.demoRecords.communityId) },
      cookie: cookies.viewer,
    });
    const table = readCsv(csv.text);
    const column = table.headers.indexOf("Load procedure");
    expect(column).toBeGreaterThan(-1);
    expect(table.rows).toHaveLength(gridAfter.lots.length);
    for (const row of table.rows) {
      const lot = gridAfter.lots.find((l: { lotNumber: string }) => l.lotNumber === row.cells[0]);
      const expected = lot.procedure === null ? "" : LOAD_PROCEDURE_LABELS[lot.frozen ? before : after];
      expect(row.cells[column], `lot ${row.cells[0]}`).toBe(expected);
    }
    expect(table.rows.find((r) => r.cells[0] === target.lotNumber)!.cells[column]).toBe(
      LOAD_PROCEDURE_LABELS[before],
    );

    // The equipment schedule counts the lots by the procedure they were sized by.
    const equipment = await callRoute(equipmentScheduleRoute.GET, {
      path: "/x?format=json",
      params: { communityId: String(ids.demoRecords.communityId) },
      cookie: cookies.viewer,
    });
    expect(equipment.status).toBe(200);
    expect(equipment.json.accountProcedure).toBe(after);
    const counts = Object.fromEntries(
      equipment.json.procedures.map((p: { procedure: string; lotCount: number }) => [
        p.procedure,
        p.lotCount,
      ]),
    );
    const withLoads = gridAfter.lots.filter((l: { loads: unknown }) => l.loads);
    expect(counts[before]).toBe(withLoads.filter((l: { frozen: boolean }) => l.frozen).length);
    expect(counts[after]).toBe(withLoads.filter((l: { frozen: boolean }) => !l.frozen).length);

    // The lot reports state the procedure: the frozen lot its snapshot's, a live lot the account's.
    const liveLot = gridAfter.lots.find(
      (l: { frozen: boolean; planId: number | null }) => !l.frozen && l.planId,
    );
    expect(await pdfText(await reportBytes(target.id))).toContain(
      squash(`Load procedure ${PROCEDURE_STATEMENTS[before]}`),
    );
    expect(await pdfText(await reportBytes(liveLot.id))).toContain(
      squash(`Load procedure ${PROCEDURE_STATEMENTS[after]}`),
    );

    // The plan library computes by the new procedure; the plan sheet shows both, the new one sizing equipment.
    const library = (await callRoute(plansRoute.GET, { path: "/api/plans", cookie: cookies.viewer })).json;
    expect(library.procedure).toBe(after);
    for (const plan of library.plans.filter((p: { loads: unknown }) => p.loads))
      expect(plan.loads.procedure).toBe(after);
    const sheet = (
      await callRoute(planRoute.GET, {
        path: `/api/plans/${target.planId}`,
        params: { planId: String(target.planId) },
        cookie: cookies.viewer,
      })
    ).json;
    expect(sheet.accountProcedure).toBe(after);
    expect(sheet.result.procedure).toBe(after);
    expect(
      sheet.procedures.map((p: { procedure: string; sizesEquipment: boolean }) => [
        p.procedure,
        p.sizesEquipment,
      ]),
    ).toEqual(LOAD_PROCEDURES.map((p) => [p, p === after]));
    for (const p of sheet.procedures) {
      expect(p.error, p.procedure).toBeNull();
      expect(p.result.procedure).toBe(p.procedure);
      expect(p.result.facings).toHaveLength(4);
    }

    // A new snapshot, taken explicitly, is by the procedure in force now.
    const [refreshed] = await db.select().from(lots).where(eq(lots.id, target.id));
    const retake = await callRoute(statusRoute.POST, {
      path: "/x",
      method: "POST",
      params: { lotId: String(target.id) },
      cookie: cookies.reviewer,
      body: { version: refreshed.version, status: refreshed.status, refresh: true },
    });
    expect(retake.status, JSON.stringify(retake.json)).toBe(200);
    const [retaken] = await db.select().from(lots).where(eq(lots.id, target.id));
    expect((retaken.permitSnapshot as PermitSnapshot).procedure).toBe(after);

    // Back to the first procedure: the lots follow again; the same procedure twice changes nothing.
    const back = await put(cookies.admin, { procedure: before, from: after });
    expect(back.status, JSON.stringify(back.json)).toBe(200);
    for (const lot of await accountLots()) expect((lot.results as LotResults).procedure).toBe(before);
    const again = await put(cookies.admin, { procedure: before, from: before });
    expect(again.json).toMatchObject({ changed: false, lotsRecomputed: 0 });
    expect(
      await db
        .select()
        .from(auditLog)
        .where(and(eq(auditLog.accountId, ids.demoAccountId), eq(auditLog.action, "load_procedure"))),
    ).toHaveLength(2);
  });

  it("an admin of another account changes only that account's procedure", async () => {
    const demoBefore = await accountProcedure(ids.demoAccountId);
    const otherBefore = await accountProcedure(ids.otherAccountId);
    const demoLotsBefore = await getDb()
      .select({ id: lots.id, results: lots.results })
      .from(lots)
      .where(eq(lots.accountId, ids.demoAccountId));
    const res = await put(otherAdmin, { procedure: otherThan(otherBefore), from: otherBefore });
    expect(res.status, JSON.stringify(res.json)).toBe(200);
    expect(await accountProcedure(ids.otherAccountId)).toBe(otherThan(otherBefore));
    expect(await accountProcedure(ids.demoAccountId)).toBe(demoBefore);
    expect(
      await getDb()
        .select({ id: lots.id, results: lots.results })
        .from(lots)
        .where(eq(lots.accountId, ids.demoAccountId)),
    ).toEqual(demoLotsBefore);
    await put(otherAdmin, { procedure: otherBefore, from: otherThan(otherBefore) });
  });
});

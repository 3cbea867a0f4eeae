/**
 * Schedules: the equipment schedule's counts against the lots' systems counted in the database,
 * permit packets stored and read back (text extracted with pdf-parse, an independent PDF text
 * extractor), e-mail with the file attached in the fake SMTP mailbox, the lot report, roles and
 * account isolation.
 */
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import ExcelJS from "exceljs";
import { and, count, eq, isNotNull, isNull } from "drizzle-orm";
import { PDFParse } from "pdf-parse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as scheduleRoute from "@/app/api/communities/[communityId]/equipment-schedule/route";
import * as packetsRoute from "@/app/api/communities/[communityId]/packets/route";
import * as sendRoute from "@/app/api/communities/[communityId]/send/route";
import * as reportRoute from "@/app/api/lots/[lotId]/report/route";
import * as packetRoute from "@/app/api/packets/[packetId]/route";
import * as packetStatusRoute from "@/app/api/packets/[packetId]/status/route";
import { getDb } from "@/db";
import { setLotStatus } from "@/db/queries/lots";
import { DEMO_SITE } from "@/db/demo-scenario";
import { auditLog, communities, equipmentSystems, lots, packets } from "@/db/schema";
import { REPORT_CAUTION } from "@/lib/reports";
import { seededIds } from "../support/demo-ids";
import { waitForPacket } from "../support/jobs";
import { callRoute, sessionCookie } from "../support/requests";
import { TEST_MAILBOX_DIR } from "../support/test-env";

const squash = (text: string) => text.replace(/\s+/g, " ").trim();

async function pdfText(bytes: Uint8Array): Promise<string> {
  // pdf-parse hands its buffer to a worker (the caller's copy is detached): give it a copy.
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  const result = await parser.getText();
  await parser.destroy();
  return squash(result.text);
}

async function callBinary(handler: unknown, args: Parameters<typeof callRoute>[1]) {
  const { NextRequest } = await import("next/server");
  const request = new NextRequest(new URL(args.path, "http://127.0.0.1:3720"), {
    method: args.method ?? "GET",
    headers: args.cookie ? { cookie: args.cookie } : {},
  });
  const response = await (
    handler as (r: typeof request, c: { params: Promise<Record<string, string>> }) => Promise<Response>
  )(request, { params: Promise.resolve(args.params ?? {}) });
  return {
    status: response.status,
    headers: response.headers,
    bytes: new Uint8Array(await response.arrayBuffer()),
  };
}

type MailboxMessage = {
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
  attachments: { filename: string; contentType: string; size: number; contentBase64?: string }[];
};
async function waitForMail(to: string): Promise<MailboxMessage> {
  for (let i = 0; i < 100; i++) {
    const found = readdirSync(TEST_MAILBOX_DIR)
      .filter((n) => n.endsWith(".json"))
      .map((n) => JSON.parse(readFileSync(path.join(TEST_MAILBOX_DIR, n), "utf8")) as MailboxMessage)
      .find((m) => m.to.includes(to));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no message to ${to} in the mailbox`);
}

describe("schedules, packets and sending", () => {
  let ids: Awaited<ReturnType<typeof seededIds>>;
  let purchasing: string;
  let viewer: string;
  let otherAdmin: string;
  let communityId: string;
  let lotNumbers: string[];
  let frozeLotId: number | null = null;

  afterAll(async () => {
    // put back the lot this file froze, so other test files see the seeded statuses
    if (frozeLotId === null) return;
    const db = getDb();
    const [lot] = await db.select().from(lots).where(eq(lots.id, frozeLotId));
    await setLotStatus({
      db,
      accountId: ids.demoAccountId,
      userId: ids.roleUsers.designer,
      lotId: lot.id,
      version: lot.version,
      status: "planned",
    });
  });

  beforeAll(async () => {
    ids = await seededIds(getDb());
    purchasing = await sessionCookie({ userId: ids.roleUsers.purchasing, accountId: ids.demoAccountId });
    viewer = await sessionCookie({ userId: ids.roleUsers.viewer, accountId: ids.demoAccountId });
    otherAdmin = await sessionCookie({ userId: ids.otherAdminId, accountId: ids.otherAccountId });
    communityId = String(ids.demoRecords.communityId);
    lotNumbers = (
      await getDb()
        .select({ n: lots.lotNumber })
        .from(lots)
        .where(eq(lots.communityId, ids.demoRecords.communityId))
    ).map((r) => r.n);
  });

  it("the equipment schedule counts each system as many times as lots carry it in the database (JSON and XLSX)", async () => {
    const db = getDb();
    const counted = await db
      .select({ systemCode: equipmentSystems.systemCode, n: count() })
      .from(lots)
      .innerJoin(equipmentSystems, eq(equipmentSystems.id, lots.equipmentSystemId))
      .where(and(eq(lots.communityId, ids.demoRecords.communityId), isNotNull(lots.equipmentSystemId)))
      .groupBy(equipmentSystems.systemCode);
    const expected = Object.fromEntries(counted.map((r) => [r.systemCode, r.n]));
    const [{ n: lotTotal }] = await db
      .select({ n: count() })
      .from(lots)
      .where(eq(lots.communityId, ids.demoRecords.communityId));
    const [{ n: withoutSystem }] = await db
      .select({ n: count() })
      .from(lots)
      .where(and(eq(lots.communityId, ids.demoRecords.communityId), isNull(lots.equipmentSystemId)));
    expect(
      Object.keys(expected).length,
      "the seeded lots should carry systems once the selection has run",
    ).toBeGreaterThan(0);

    const res = await callRoute(scheduleRoute.GET, {
      path: "/x?format=json",
      params: { communityId },
      cookie: viewer,
    });
    expect(res.status, res.text).toBe(200);
    const got = Object.fromEntries(
      res.json.schedule.systemTotals.map((l: { systemCode: string; count: number }) => [
        l.systemCode,
        l.count,
      ]),
    );
    expect(got).toEqual(expected);
    expect(res.json.schedule.totals.lotCount).toBe(lotTotal);
    expect(res.json.schedule.totals.lotsWithSystem).toBe(Object.values(expected).reduce((a, b) => a + b, 0));
    expect(res.json.schedule.lotsWithoutSystem.length).toBe(withoutSystem);
    expect(res.json.limits.coolingMaxPct).toBeGreaterThan(0);

    const xlsx = await callBinary(scheduleRoute.GET, {
      path: "/x?format=xlsx",
      params: { communityId },
      cookie: viewer,
    });
    expect(xlsx.status).toBe(200);
    expect(xlsx.headers.get("content-disposition")).toMatch(
      /attachment; filename="equipment-schedule-.*\.xlsx"/,
    );
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(xlsx.bytes.buffer as ArrayBuffer);
    const totalsSheet = workbook.getWorksheet("System totals")!;
    const fromSheet: Record<string, number> = {};
    totalsSheet.eachRow((row, n) => {
      if (n > 1 && row.getCell(1).value !== "Total")
        fromSheet[String(row.getCell(1).value)] = Number(row.getCell(5).value);
    });
    expect(fromSheet).toEqual(expected);
    const notes = workbook.getWorksheet("Notes")!;
    const noteText: string[] = [];
    notes.eachRow((row) => noteText.push(`${row.getCell(1).value} ${row.getCell(2).value}`));
    expect(
      noteText.some((t) =>
        t.startsWith("Sizing limit used: Cooling capacity, most % of the cooling total load"),
      ),
    ).toBe(true);
    expect(noteText.some((t) => /licensed professional/.test(t))).toBe(true);
  });

  it("a lot without a system is listed with its reason, and formula-like text is written as text (CSV quote-escaped, XLSX plain string)", async () => {
    const db = getDb();
    const [{ id: oddCommunity }] = await db
      .insert(communities)
      .values({ accountId: ids.demoAccountId, name: `Formula Flats ${Date.now()}`, conditions: DEMO_SITE })
      .$returningId();
    await db.insert(lots).values({
      accountId: ids.demoAccountId,
      communityId: oddCommunity,
      lotNumber: "=1+2",
      address: "@SUM(A1)",
    });
    const csv = await callRoute(scheduleRoute.GET, {
      path: "/x?format=csv",
      params: { communityId: String(oddCommunity) },
      cookie: purchasing,
    });
    expect(csv.status).toBe(200);
    expect(csv.text).toContain("'=1+2");
    expect(csv.text).not.toMatch(/(^|,)=1\+2/m);
    expect(csv.text).toMatch(/not selected yet/);
    const xlsx = await callBinary(scheduleRoute.GET, {
      path: "/x?format=xlsx",
      params: { communityId: String(oddCommunity) },
      cookie: purchasing,
    });
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(xlsx.bytes.buffer as ArrayBuffer);
    const cell = workbook.getWorksheet("Lots without a system")!.getRow(2).getCell(2);
    expect(cell.type).toBe(ExcelJS.ValueType.String);
    expect(cell.value).toBe("=1+2");
    // a packet of a lot without a plan is refused by name, and nothing is stored
    const before = (await db.select({ n: count() }).from(packets))[0].n;
    const refused = await callRoute(packetsRoute.POST, {
      path: "/x",
      method: "POST",
      params: { communityId: String(oddCommunity) },
      cookie: purchasing,
      body: {},
    });
    expect(refused.status).toBe(409);
    expect(refused.json.error.message).toContain("=1+2");
    expect((await db.select({ n: count() }).from(packets))[0].n).toBe(before);
    // leave the account as the other test files expect it: every lot with a plan
    await db.delete(lots).where(eq(lots.communityId, oddCommunity));
    await db.delete(communities).where(eq(communities.id, oddCommunity));
  });

  it("a permit packet is stored, listed with who and when, downloadable, and its PDF carries the caution and every lot number", async () => {
    const res = await callRoute(packetsRoute.POST, {
      path: "/x",
      method: "POST",
      params: { communityId },
      cookie: purchasing,
      body: {},
    });
    expect(res.status, res.text).toBe(202);
    expect(res.json.lotCount).toBe(lotNumbers.length);
    expect(await waitForPacket(purchasing, res.json.packetId)).toMatchObject({
      state: "ready",
      lotCount: lotNumbers.length,
    });
    const list = await callRoute(packetsRoute.GET, { path: "/x", params: { communityId }, cookie: viewer });
    const listed = list.json.packets.find((p: { id: number }) => p.id === res.json.packetId);
    expect(listed).toMatchObject({
      kind: "permit-packet",
      lotCount: lotNumbers.length,
      createdByName: "Priya Lund",
    });
    expect(Date.now() - new Date(listed.createdAt).getTime()).toBeLessThan(10 * 60_000);

    const file = await callBinary(packetRoute.GET, {
      path: "/x",
      params: { packetId: String(res.json.packetId) },
      cookie: viewer,
    });
    expect(file.status).toBe(200);
    expect(file.headers.get("content-type")).toBe("application/pdf");
    expect(new TextDecoder().decode(file.bytes.slice(0, 5))).toBe("%PDF-");
    const text = await pdfText(file.bytes);
    expect(text).toContain(squash(REPORT_CAUTION));
    for (const lotNumber of lotNumbers)
      expect(text, `lot ${lotNumber}`).toMatch(new RegExp(`Lot ${lotNumber}\\b`));
    const [audit] = await getDb()
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entityType, "packet"), eq(auditLog.entityId, res.json.packetId)));
    expect(audit.action).toBe("packet_generate");
    expect(audit.userId).toBe(ids.roleUsers.purchasing);
  });

  it("a packet of the permit-submitted lots holds just those, and a frozen lot's report is its permit snapshot", async () => {
    const db = getDb();
    const [lot] = await db
      .select()
      .from(lots)
      .where(eq(lots.communityId, ids.demoRecords.communityId))
      .limit(1);
    if (lot.status === "planned") {
      await setLotStatus({
        db,
        accountId: ids.demoAccountId,
        userId: ids.roleUsers.designer,
        lotId: lot.id,
        version: lot.version,
        status: "permit_submitted",
      });
      frozeLotId = lot.id;
    }
    const res = await callRoute(packetsRoute.POST, {
      path: "/x",
      method: "POST",
      params: { communityId },
      cookie: purchasing,
      body: { statuses: ["permit_submitted"] },
    });
    expect(res.status, res.text).toBe(202);
    expect((await waitForPacket(purchasing, res.json.packetId)).state).toBe("ready");
    const [{ n: submitted }] = await db
      .select({ n: count() })
      .from(lots)
      .where(and(eq(lots.communityId, ids.demoRecords.communityId), eq(lots.status, "permit_submitted")));
    expect(res.json.lotCount).toBe(submitted);

    const report = await callBinary(reportRoute.GET, {
      path: "/x",
      params: { lotId: String(lot.id) },
      cookie: viewer,
    });
    expect(report.status).toBe(200);
    expect(report.headers.get("content-disposition")).toMatch(/^inline/);
    const text = await pdfText(report.bytes);
    expect(text).toMatch(new RegExp(`Lot ${lot.lotNumber}\\b`));
    expect(text).toMatch(/permit snapshot/);
    expect(text).toContain(squash(REPORT_CAUTION));
  });

  it("sending the permit packet puts a message with the PDF attached in the mailbox, and records the addresses", async () => {
    const to = `permits.${Date.now()}@county-office.test`;
    const res = await callRoute(sendRoute.POST, {
      path: "/x",
      method: "POST",
      params: { communityId },
      cookie: purchasing,
      body: { to: [to], what: "permit-packet" },
    });
    expect(res.status, res.text).toBe(202);
    expect(await waitForPacket(purchasing, res.json.packetId)).toMatchObject({
      state: "ready",
      sentTo: [to],
    });
    const mail = await waitForMail(to);
    expect(mail.subject).toContain("Cedar Hollow");
    expect(mail.text).toMatch(/licensed professional/);
    const attachment = mail.attachments.find((a) => a.filename.endsWith(".pdf"))!;
    expect(attachment.contentType).toBe("application/pdf");
    const text = await pdfText(new Uint8Array(Buffer.from(attachment.contentBase64!, "base64")));
    expect(text).toContain(squash(REPORT_CAUTION));
    const [packet] = await getDb().select().from(packets).where(eq(packets.id, res.json.packetId));
    expect(packet.sentTo).toEqual([to]);
    expect(packet.kind).toBe("permit-packet");
    const [audit] = await getDb()
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entityType, "packet"), eq(auditLog.entityId, packet.id)));
    expect(audit.action).toBe("packet_send");
    expect(audit.summary).toContain(to);
  });

  it("sending the equipment schedule attaches the XLSX and stores it as a packet", async () => {
    const to = `supplier.${Date.now()}@ductworks.test`;
    const res = await callRoute(sendRoute.POST, {
      path: "/x",
      method: "POST",
      params: { communityId },
      cookie: purchasing,
      body: { to: [to], what: "equipment-schedule" },
    });
    expect(res.status, res.text).toBe(202);
    expect((await waitForPacket(purchasing, res.json.packetId)).state).toBe("ready");
    const mail = await waitForMail(to);
    expect(mail.attachments[0].filename).toMatch(/^equipment-schedule-.*\.xlsx$/);
    const list = await callRoute(packetsRoute.GET, {
      path: "/x",
      params: { communityId },
      cookie: purchasing,
    });
    expect(list.json.packets.find((p: { id: number }) => p.id === res.json.packetId)).toMatchObject({
      kind: "equipment-schedule",
      sentTo: [to],
    });
  });

  it("bad addresses are refused by field, and nothing is sent or stored", async () => {
    const before = (await getDb().select({ n: count() }).from(packets))[0].n;
    const bad = await callRoute(sendRoute.POST, {
      path: "/x",
      method: "POST",
      params: { communityId },
      cookie: purchasing,
      body: { to: ["ok@example.test", "not-an-address"], what: "permit-schedule" },
    });
    expect(bad.status).toBe(400);
    expect(bad.json.error.fieldErrors).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ field: "to.1", message: expect.stringContaining("not-an-address") }),
      ]),
    );
    const tooMany = await callRoute(sendRoute.POST, {
      path: "/x",
      method: "POST",
      params: { communityId },
      cookie: purchasing,
      body: { to: Array.from({ length: 21 }, (_, i) => `a${i}@example.test`), what: "permit-packet" },
    });
    expect(tooMany.status).toBe(400);
    expect(tooMany.json.error.fieldErrors[0].field).toBe("to");
    const badWhat = await callRoute(sendRoute.POST, {
      path: "/x",
      method: "POST",
      params: { communityId },
      cookie: purchasing,
      body: { to: ["ok@example.test"], what: "everything" },
    });
    expect(badWhat.status).toBe(400);
    expect(badWhat.json.error.fieldErrors[0].field).toBe("what");
    const badLots = await callRoute(packetsRoute.POST, {
      path: "/x",
      method: "POST",
      params: { communityId },
      cookie: purchasing,
      body: { lotIds: [ids.otherRecords.lotId] },
    });
    expect(badLots.status).toBe(400);
    expect(badLots.json.error.fieldErrors[0].field).toBe("lotIds");
    expect((await getDb().select({ n: count() }).from(packets))[0].n).toBe(before);
  });

  it("a viewer reads the schedule and packets but may not generate or send (403)", async () => {
    expect(
      (
        await callRoute(scheduleRoute.GET, {
          path: "/x?format=json",
          params: { communityId },
          cookie: viewer,
        })
      ).status,
    ).toBe(200);
    expect(
      (await callRoute(packetsRoute.GET, { path: "/x", params: { communityId }, cookie: viewer })).status,
    ).toBe(200);
    expect(
      (
        await callRoute(packetsRoute.POST, {
          path: "/x",
          method: "POST",
          params: { communityId },
          cookie: viewer,
          body: {},
        })
      ).status,
    ).toBe(403);
    expect(
      (
        await callRoute(sendRoute.POST, {
          path: "/x",
          method: "POST",
          params: { communityId },
          cookie: viewer,
          body: { to: ["a@example.test"], what: "permit-packet" },
        })
      ).status,
    ).toBe(403);
  });

  it("another account's community, lot and packet are not found (404)", async () => {
    const made = await callRoute(packetsRoute.POST, {
      path: "/x",
      method: "POST",
      params: { communityId },
      cookie: purchasing,
      body: { lotIds: [ids.demoRecords.lotId] },
    });
    expect(made.status).toBe(202);
    expect((await waitForPacket(purchasing, made.json.packetId)).state).toBe("ready");
    const asOther = { cookie: otherAdmin };
    expect(
      (await callRoute(scheduleRoute.GET, { path: "/x?format=json", params: { communityId }, ...asOther }))
        .status,
    ).toBe(404);
    expect(
      (await callRoute(packetsRoute.GET, { path: "/x", params: { communityId }, ...asOther })).status,
    ).toBe(404);
    expect(
      (
        await callRoute(packetsRoute.POST, {
          path: "/x",
          method: "POST",
          params: { communityId },
          body: {},
          ...asOther,
        })
      ).status,
    ).toBe(404);
    expect(
      (
        await callRoute(sendRoute.POST, {
          path: "/x",
          method: "POST",
          params: { communityId },
          body: { to: ["a@example.test"], what: "permit-packet" },
          ...asOther,
        })
      ).status,
    ).toBe(404);
    expect(
      (
        await callRoute(reportRoute.GET, {
          path: "/x",
          params: { lotId: String(ids.demoRecords.lotId) },
          ...asOther,
        })
      ).status,
    ).toBe(404);
    expect(
      (
        await callRoute(packetRoute.GET, {
          path: "/x",
          params: { packetId: String(made.json.packetId) },
          ...asOther,
        })
      ).status,
    ).toBe(404);
    expect(
      (
        await callRoute(packetStatusRoute.GET, {
          path: "/x",
          params: { packetId: String(made.json.packetId) },
          ...asOther,
        })
      ).status,
    ).toBe(404);
    // and the other account's own lot report works for its admin
    expect(
      (
        await callBinary(reportRoute.GET, {
          path: "/x",
          params: { lotId: String(ids.otherRecords.lotId) },
          cookie: otherAdmin,
        })
      ).status,
    ).toBe(200);
  });
});

/**
 * Worker crashes: a worker is killed outright (SIGKILL, as a crash or an OOM kill would) in the
 * middle of a lots import — once while it computes, once inside the save transaction with lots
 * already written but not committed — and in the middle of a permit packet (and of one to be
 * e-mailed). New workers, two sharing the queue, pick the job up when the dead worker's claim
 * runs out and finish it: every lot is written exactly once (version 1, one history entry), none
 * half-written, and the import row shows the right state throughout (never succeeded early,
 * never failed). These workers use a queue prefix of their own, so the run's worker stays out.
 */
import type { ChildProcess } from "node:child_process";
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { and, count, eq, max, min } from "drizzle-orm";
import mysql from "mysql2/promise";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as importItemRoute from "@/app/api/imports/[importId]/route";
import * as packetRoute from "@/app/api/packets/[packetId]/route";
import * as planImportRoute from "@/app/api/plans/import/route";
import { getDb } from "@/db";
import { queueImport, receiveImport } from "@/db/queries/imports";
import { requestPacket } from "@/db/queries/packets";
import { auditLog, communities, lots, packets } from "@/db/schema";
import { DEMO_SITE } from "@/db/demo-scenario";
import { createJobQueue, enqueueJob } from "@/lib/jobs/queue";
import { LOT_HEADERS } from "@/lib/workbook/lot-columns";
import { waitForImport, waitForPacket } from "../support/jobs";
import { EXAMPLE_PLANS_CSV, privateAccount } from "../support/private-account";
import { killWorkerHard, startWorkerProcess, stopWorkerProcess } from "../support/queue";
import { callRoute } from "../support/requests";
import { EXAMPLE_PLAN_CODES } from "../support/import-fuzz";
import {
  INTEGRATION_DATABASE,
  serviceEnv,
  TEST_MAILBOX_DIR,
  TEST_REDIS_URL,
  testDatabaseUrl,
} from "../support/test-env";

const LOTS = 6000;
const PREFIX = `platload-crash-${process.pid}`;
// A short claim (3 s) and a check every second, so a dead worker's job is picked up in seconds.
const WORKER_ENV = {
  ...serviceEnv(INTEGRATION_DATABASE, PREFIX),
  PLATLOAD_JOB_LOCK_MS: "3000",
  PLATLOAD_JOB_STALLED_CHECK_MS: "1000",
  PLATLOAD_WORKER_CONCURRENCY: "1",
};
const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
const COMPASS = ["N", "NE", "E", "SE", "S", "SW", "W", "NW"];

function lotsCsv(prefix: string, n = LOTS) {
  const rows = Array.from({ length: n }, (_, i) => [
    `${prefix}-${String(i + 1).padStart(5, "0")}`,
    `${i + 1} Crash Lane`,
    EXAMPLE_PLAN_CODES[i % EXAMPLE_PLAN_CODES.length],
    COMPASS[i % 8],
    "",
    "planned",
    "",
  ]);
  return new TextEncoder().encode([LOT_HEADERS.join(","), ...rows.map((r) => r.join(","))].join("\n"));
}

describe("a worker killed mid-job", () => {
  let account: Awaited<ReturnType<typeof privateAccount>>;
  const queue = createJobQueue({ url: TEST_REDIS_URL, prefix: PREFIX });
  const workers: ChildProcess[] = [];
  let dirty: mysql.Connection;

  const start = async (label: string) => {
    const worker = await startWorkerProcess(WORKER_ENV, { label, quiet: true });
    workers.push(worker);
    return worker;
  };
  const state = async (importId: number) =>
    (
      await callRoute(importItemRoute.GET, {
        path: "/x",
        params: { importId: String(importId) },
        cookie: account.cookie,
      })
    ).json.import as { state: string; progressPct: number };
  const committedLots = async (communityId: number) =>
    (await getDb().select({ n: count() }).from(lots).where(eq(lots.communityId, communityId)))[0].n;
  /** Lots written but not committed yet, as another transaction's own uncommitted rows are seen. */
  const uncommittedLots = async (communityId: number) =>
    Number(
      (
        (await dirty.query("SELECT COUNT(*) AS n FROM lots WHERE community_id = ?", [
          communityId,
        ])) as unknown as [{ n: number }[]]
      )[0][0].n,
    );

  beforeAll(async () => {
    await queue.obliterate({ force: true });
    account = await privateAccount(getDb(), "crash");
    const form = new FormData();
    form.append("file", new File([EXAMPLE_PLANS_CSV], "example-plans.csv"));
    const res = await callRoute(planImportRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: account.cookie,
      form,
    });
    expect((await waitForImport(account.cookie, res.json.importId)).state).toBe("succeeded");
    dirty = await mysql.createConnection({ uri: testDatabaseUrl(INTEGRATION_DATABASE) });
    await dirty.query("SET SESSION TRANSACTION ISOLATION LEVEL READ UNCOMMITTED");
  });

  afterAll(async () => {
    for (const worker of workers) await stopWorkerProcess(worker);
    await dirty?.end();
    await queue.obliterate({ force: true });
    await queue.close();
  });

  /** Queues a 6,000-lot import into a new community of the account, on the crash-test queue. */
  async function queueLotImport(label: string) {
    const [{ id: communityId }] = await getDb()
      .insert(communities)
      .values({ accountId: account.accountId, name: `Crash ${label} ${Date.now()}`, conditions: DEMO_SITE })
      .$returningId();
    const { importId, jobId } = await receiveImport({
      db: getDb(),
      accountId: account.accountId,
      userId: account.userId,
      kind: "lots",
      communityId,
      fileName: `${label}.csv`,
      data: lotsCsv(label),
    });
    await enqueueJob("import", { importId }, { jobId, queue });
    return { communityId, importId, jobId };
  }

  /** After the import finished: every lot there once, whole, and one history entry for it. */
  async function expectWrittenOnce(communityId: number, importId: number) {
    const [written] = await getDb()
      .select({ n: count(), minVersion: min(lots.version), maxVersion: max(lots.version) })
      .from(lots)
      .where(eq(lots.communityId, communityId));
    expect(written).toEqual({ n: LOTS, minVersion: 1, maxVersion: 1 });
    const withoutResults = (
      await getDb()
        .select({ id: lots.id, results: lots.results })
        .from(lots)
        .where(eq(lots.communityId, communityId))
    ).filter((l) => !l.results);
    expect(withoutResults).toHaveLength(0);
    const entries = (
      await getDb()
        .select()
        .from(auditLog)
        .where(and(eq(auditLog.accountId, account.accountId), eq(auditLog.action, "lot_import")))
    ).filter((e) => (e.after as { importId?: number }).importId === importId);
    expect(entries).toHaveLength(1);
  }

  it("killed while computing: the import stays 'computing' with no lot written; two new workers sharing the queue finish it once", async () => {
    const first = await start("worker A");
    const { communityId, importId, jobId } = await queueLotImport("compute");
    const seen: string[] = [];
    for (let i = 0; i < 3000; i++) {
      const now = await state(importId);
      if (seen.at(-1) !== now.state) seen.push(now.state);
      if (now.state === "computing") break;
      expect(["received", "validating"]).toContain(now.state);
      await pause(10);
    }
    await killWorkerHard(first);
    const atKill = await state(importId);
    expect(atKill.state).toBe("computing");
    expect(await committedLots(communityId)).toBe(0);
    await pause(1500);
    expect((await state(importId)).state).toBe("computing"); // nobody is on it, and it does not pretend otherwise

    await Promise.all([start("worker B"), start("worker C")]);
    for (let i = 0; i < 900; i++) {
      const now = await state(importId);
      if (seen.at(-1) !== now.state) seen.push(now.state);
      if (now.state === "succeeded" || now.state === "failed") break;
      await pause(50);
    }
    expect(seen.at(-1)).toBe("succeeded");
    expect(seen).not.toContain("failed");
    await expectWrittenOnce(communityId, importId);
    const done = await waitForImport(account.cookie, importId);
    expect(done.createdCount).toBe(LOTS);
    const job = await queue.getJob(jobId);
    console.log(
      `crash while computing: states ${seen.join(" → ")}; job stalled ${job?.stalledCounter ?? "?"} time(s), finished by a second worker`,
    );
    expect(job?.stalledCounter ?? 0).toBeGreaterThanOrEqual(1);
    for (const worker of workers.splice(0)) await stopWorkerProcess(worker);
  }, 120_000);

  it("killed inside the save transaction with lots written but not committed: they vanish; a new worker writes each lot once", async () => {
    const first = await start("worker D");
    const { communityId, importId } = await queueLotImport("save");
    let uncommittedAtKill = 0;
    for (let i = 0; i < 6000; i++) {
      const now = await state(importId);
      expect(now.state, "not finished before the kill").not.toMatch(/succeeded|failed/);
      if (now.state === "saving") {
        uncommittedAtKill = await uncommittedLots(communityId);
        if (uncommittedAtKill > 0) break;
      }
      await pause(5);
    }
    expect(uncommittedAtKill, "killed mid-transaction").toBeGreaterThan(0);
    await killWorkerHard(first);
    expect(await committedLots(communityId)).toBe(0);
    // MariaDB rolls the dead connection's transaction back: the half-written lots are gone.
    for (let i = 0; i < 100 && (await uncommittedLots(communityId)) > 0; i++) await pause(100);
    expect(await uncommittedLots(communityId)).toBe(0);
    expect((await state(importId)).state).toBe("saving");

    await start("worker E");
    const done = await waitForImport(account.cookie, importId);
    expect(done.state, JSON.stringify(done.errors)).toBe("succeeded");
    expect(done.createdCount).toBe(LOTS);
    await expectWrittenOnce(communityId, importId);
    console.log(
      `crash inside the save: killed with ${uncommittedAtKill} of ${LOTS} lots written uncommitted; after it 0; a new worker wrote ${LOTS} lots once`,
    );
    for (const worker of workers.splice(0)) await stopWorkerProcess(worker);
  }, 120_000);

  it("killed while rendering a permit packet (one to keep, one to e-mail): a new worker makes each once and sends the message once", async () => {
    // 120 lots, imported by the run's own worker
    const [{ id: communityId }] = await getDb()
      .insert(communities)
      .values({ accountId: account.accountId, name: `Crash packets ${Date.now()}`, conditions: DEMO_SITE })
      .$returningId();
    const community = { id: communityId };
    const { importId } = await queueImport({
      db: getDb(),
      accountId: account.accountId,
      userId: account.userId,
      kind: "lots",
      communityId,
      fileName: "packet-lots.csv",
      data: lotsCsv("packet", 120),
    });
    expect((await waitForImport(account.cookie, importId)).state).toBe("succeeded");
    const lotIds = (
      await getDb().select({ id: lots.id }).from(lots).where(eq(lots.communityId, community.id))
    ).map((l) => l.id);
    const to = `crash.${Date.now()}@county-office.test`;
    const results: string[] = [];
    for (const sentTo of [undefined, [to]]) {
      const first = await start("worker F");
      const { packetId, jobId } = await requestPacket({
        db: getDb(),
        accountId: account.accountId,
        userId: account.userId,
        communityId: community.id,
        kind: "permit-packet",
        lotIds,
        to: sentTo,
        senderName: "Crash Tester",
        accountName: "Test builder",
      });
      await enqueueJob("packet", { packetId }, { jobId, queue });
      for (let i = 0; i < 3000; i++) {
        const [row] = await getDb()
          .select({ state: packets.state })
          .from(packets)
          .where(eq(packets.id, packetId));
        if (row.state === "rendering") break;
        expect(row.state).toBe("queued");
        await pause(10);
      }
      await killWorkerHard(first);
      const [atKill] = await getDb().select().from(packets).where(eq(packets.id, packetId));
      expect(atKill.state).toBe("rendering");
      expect(atKill.fileKey).toBeNull();
      expect(atKill.sentAt).toBeNull();

      await start("worker G");
      const done = await waitForPacket(account.cookie, packetId);
      expect(done).toMatchObject({ state: "ready", lotCount: lotIds.length });
      const entries = await getDb()
        .select()
        .from(auditLog)
        .where(and(eq(auditLog.entityType, "packet"), eq(auditLog.entityId, packetId)));
      expect(entries).toHaveLength(1);
      const file = await callRoute(packetRoute.GET, {
        path: "/x",
        params: { packetId: String(packetId) },
        cookie: account.cookie,
      });
      expect(file.status).toBe(200);
      expect(file.text.startsWith("%PDF-")).toBe(true);
      results.push(
        `${sentTo ? "e-mailed" : "kept"} packet: killed while rendering, made once by a new worker`,
      );
      for (const worker of workers.splice(0)) await stopWorkerProcess(worker);
    }
    // the e-mailed one reached the mailbox exactly once
    await pause(500);
    const messages = readdirSync(TEST_MAILBOX_DIR)
      .filter((n) => n.endsWith(".json"))
      .map((n) => JSON.parse(readFileSync(path.join(TEST_MAILBOX_DIR, n), "utf8")) as { to: string[] })
      .filter((m) => m.to.includes(to));
    expect(messages).toHaveLength(1);
    console.log(`crash while rendering: ${results.join("; ")}; the message was sent once`);
  }, 180_000);
});

/**
 * The worker's sweep: a failed import whose file could not be deleted when it failed has it
 * deleted now; an import whose job was never queued (the web process died in between) is queued
 * again; one whose job gave up is marked failed, so no row says "running" forever. Run against
 * a queue prefix of its own, with no worker on it.
 */
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db";
import { LOST_AFTER_MS, sweep } from "@/db/queries/sweep";
import { imports } from "@/db/schema";
import { createJobQueue } from "@/lib/jobs/queue";
import { workJobId } from "@/lib/jobs/types";
import { startJobWorker, UnrecoverableError } from "@/lib/jobs/worker";
import { getObject, objectKey, putObject } from "@/lib/storage/object-store";
import { privateAccount } from "../support/private-account";
import { TEST_REDIS_URL } from "../support/test-env";

describe("the sweep", () => {
  const queue = createJobQueue({ url: TEST_REDIS_URL, prefix: `platload-sweep-${process.pid}` });
  let account: Awaited<ReturnType<typeof privateAccount>>;

  beforeAll(async () => {
    await queue.obliterate({ force: true });
    account = await privateAccount(getDb(), "sweep");
  });
  afterAll(async () => {
    await queue.obliterate({ force: true });
    await queue.close();
  });

  const storedFile = async (name: string) => {
    const key = objectKey({ accountId: account.accountId, kind: "plans-imports", fileName: name });
    await putObject({ key, body: "Plan code\nX\n", contentType: "text/csv" });
    return key;
  };

  it("deletes files failed imports still hold, re-queues lost work and fails work whose job gave up", async () => {
    const db = getDb();
    const old = new Date(Date.now() - LOST_AFTER_MS - 60_000);
    const leftKey = await storedFile("left.csv");
    const [{ id: failedId }] = await db
      .insert(imports)
      .values({
        accountId: account.accountId,
        userId: account.userId,
        kind: "plans",
        fileName: "left.csv",
        fileSizeBytes: 12,
        fileKey: leftKey,
        state: "failed",
        errors: [],
      })
      .$returningId();
    const [{ id: lostId }] = await db
      .insert(imports)
      .values({
        accountId: account.accountId,
        userId: account.userId,
        kind: "plans",
        fileName: "lost.csv",
        fileSizeBytes: 12,
        fileKey: await storedFile("lost.csv"),
        state: "received",
        createdAt: old,
      })
      .$returningId();
    const [{ id: gaveUpId }] = await db
      .insert(imports)
      .values({
        accountId: account.accountId,
        userId: account.userId,
        kind: "plans",
        fileName: "gave-up.csv",
        fileSizeBytes: 12,
        fileKey: await storedFile("gave-up.csv"),
        state: "computing",
        createdAt: old,
      })
      .$returningId();
    const [{ id: recentId }] = await db
      .insert(imports)
      .values({
        accountId: account.accountId,
        userId: account.userId,
        kind: "plans",
        fileName: "recent.csv",
        fileSizeBytes: 12,
        state: "received",
      })
      .$returningId();
    // the job of "gave up" failed for good without its row being told (as when it stalls too often)
    const [gaveUp] = await db.select().from(imports).where(eq(imports.id, gaveUpId));
    await queue.add("import", { importId: gaveUpId }, { jobId: workJobId("import", gaveUp), attempts: 1 });
    const failing = startJobWorker({
      url: TEST_REDIS_URL,
      prefix: queue.opts.prefix,
      handlers: {
        import: async () => Promise.reject(new UnrecoverableError("stalled more than allowable limit")),
        packet: async () => undefined,
        mail: async () => undefined,
        sweep: async () => undefined,
      },
      onFinalFailure: async () => undefined,
    });
    for (let i = 0; i < 100 && (await queue.getFailedCount()) === 0; i++)
      await new Promise((r) => setTimeout(r, 100));
    await failing.close();
    expect(await queue.getFailedCount()).toBe(1);

    const result = await sweep({ db, queue });
    expect(result.filesDeleted).toBeGreaterThanOrEqual(1);
    const [failed] = await db.select().from(imports).where(eq(imports.id, failedId));
    expect(failed.fileKey).toBeNull();
    await expect(getObject(leftKey)).rejects.toThrow();

    const [lost] = await db.select().from(imports).where(eq(imports.id, lostId));
    const requeued = await queue.getJob(workJobId("import", lost));
    expect(requeued?.data).toEqual({ importId: lostId });
    // a recent import is left to its own job
    const [recent] = await db.select().from(imports).where(eq(imports.id, recentId));
    expect(await queue.getJob(workJobId("import", recent))).toBeUndefined();
    const [stopped] = await db.select().from(imports).where(eq(imports.id, gaveUpId));
    expect(stopped.state).toBe("failed");
    expect(JSON.stringify(stopped.errors)).toContain("stalled more than allowable limit");
    expect(result).toMatchObject({ failed: 1 });
    // sweeping again queues nothing twice
    await sweep({ db, queue });
    expect(
      (await queue.getJobs(["wait", "delayed", "prioritized"])).filter((j) => j.data.importId === lostId),
    ).toHaveLength(1);
  });
});

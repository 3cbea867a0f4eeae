import "server-only";
import type { Queue } from "bullmq";
import type { Database } from "@/db";
import { enqueueJob } from "@/lib/jobs/queue";
import { workJobId } from "@/lib/jobs/types";
import { markImportStopped, sweepFailedImportFiles, unfinishedImports } from "./imports";
import { failPacket, unfinishedPackets } from "./packets";

/** Work older than this with no job in the queue lost its job (the web process died before queueing it). */
export const LOST_AFTER_MS = 10 * 60_000;

/**
 * The `sweep` job, run by the workers every few minutes: deletes the files failed imports still
 * hold, queues again any import or packet whose job was lost, and fails those whose job gave up
 * without saying so (a job that stalled too often), so no row says "running" forever.
 */
export async function sweep({ db, queue, now = new Date() }: { db: Database; queue: Queue; now?: Date }) {
  const before = new Date(now.getTime() - LOST_AFTER_MS);
  const filesDeleted = await sweepFailedImportFiles(db);
  let requeued = 0;
  let failed = 0;
  for (const row of await unfinishedImports(db, before)) {
    const { id } = row;
    const jobId = workJobId("import", row);
    const job = await queue.getJob(jobId);
    if (!job) {
      await enqueueJob("import", { importId: id }, { jobId, queue });
      requeued++;
    } else if (await job.isFailed()) {
      await markImportStopped(db, id, job.failedReason || "its job failed");
      failed++;
    }
  }
  for (const row of await unfinishedPackets(db, before)) {
    const { id } = row;
    const jobId = workJobId("packet", row);
    const job = await queue.getJob(jobId);
    if (!job) {
      await enqueueJob("packet", { packetId: id }, { jobId, queue });
      requeued++;
    } else if (await job.isFailed()) {
      await failPacket(db, id, `it could not be made: ${job.failedReason || "its job failed"}`);
      failed++;
    }
  }
  return { filesDeleted, requeued, failed };
}

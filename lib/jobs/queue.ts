import { Queue } from "bullmq";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { redisConnection } from "./connection";
import { JOB_ATTEMPTS, JOB_BACKOFF, jobPayloadSchemas, type JobName, type JobPayload } from "./types";

/** The one queue every kind of job goes through; any number of workers on any machine share it. */
export const QUEUE_NAME = "platload-jobs";

const globalForQueue = globalThis as unknown as { platloadQueue?: Queue };

export function createJobQueue({
  url = env().REDIS_URL,
  prefix = env().PLATLOAD_QUEUE_PREFIX,
  kind = "web" as "web" | "worker",
} = {}): Queue {
  return new Queue(QUEUE_NAME, {
    connection: redisConnection(kind, url),
    prefix,
    defaultJobOptions: {
      attempts: JOB_ATTEMPTS,
      backoff: JOB_BACKOFF,
      // Finished jobs are kept a while for inspection; the database rows are the lasting record.
      removeOnComplete: { age: 24 * 3600, count: 1000 },
      removeOnFail: { age: 7 * 24 * 3600 },
    },
  });
}

/** This process's queue (the web process only ever adds to it). */
export function jobQueue(): Queue {
  if (!globalForQueue.platloadQueue) globalForQueue.platloadQueue = createJobQueue();
  return globalForQueue.platloadQueue;
}

/**
 * Queues a job. A job given an id (an import, a packet: workJobId) is queued once however often
 * it is added while the queue knows it. Redis not answering is a 503 that says nothing ran.
 */
export async function enqueueJob<N extends JobName>(
  name: N,
  payload: JobPayload<N>,
  { jobId, queue = jobQueue() }: { jobId?: string; queue?: Queue } = {},
): Promise<string> {
  const data = jobPayloadSchemas[name].parse(payload);
  try {
    const job = await queue.add(name, data, { jobId });
    return job.id ?? "";
  } catch (error) {
    console.error("could not queue a job:", error);
    throw new AppError(
      "unavailable",
      "The job queue is not answering, so the work could not be started. Try again in a minute.",
    );
  }
}

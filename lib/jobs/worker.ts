import { UnrecoverableError, Worker, type Job } from "bullmq";
import { env } from "@/lib/env";
import { redisConnection } from "./connection";
import { QUEUE_NAME } from "./queue";
import { jobPayloadSchemas, type JobName, type JobPayload } from "./types";

export type JobHandlers = { [N in JobName]: (payload: JobPayload<N>, job: Job) => Promise<unknown> };

/** What a worker does when a job has used its last attempt: mark its row failed, say why. */
export type FinalFailureHandler = (name: JobName, payload: unknown, error: Error) => Promise<void>;

/** Thrown by a handler for work that no retry can do (its row is gone): fails the job at once. */
export { UnrecoverableError };

/**
 * A worker on the one queue. Several may run, on one machine or many: each job is claimed by one
 * worker at a time (BullMQ's lock), and a job whose worker dies goes back to the queue when its
 * lock runs out. Handlers are idempotent, so running a job again after a crash is safe.
 */
export function startJobWorker({
  handlers,
  onFinalFailure,
  url = env().REDIS_URL,
  prefix = env().PLATLOAD_QUEUE_PREFIX,
  concurrency = env().PLATLOAD_WORKER_CONCURRENCY,
  lockDuration = env().PLATLOAD_JOB_LOCK_MS,
  stalledInterval = env().PLATLOAD_JOB_STALLED_CHECK_MS,
}: {
  handlers: JobHandlers;
  onFinalFailure: FinalFailureHandler;
  url?: string;
  prefix?: string;
  concurrency?: number;
  lockDuration?: number;
  stalledInterval?: number;
}): Worker {
  const worker = new Worker(
    QUEUE_NAME,
    async (job: Job) => {
      const name = job.name as JobName;
      const schema = jobPayloadSchemas[name];
      if (!schema) throw new UnrecoverableError(`unknown job "${job.name}"`);
      const payload = schema.safeParse(job.data);
      if (!payload.success)
        throw new UnrecoverableError(`job ${job.id} (${job.name}) has a malformed payload`);
      return (handlers[name] as (p: unknown, j: Job) => Promise<unknown>)(payload.data, job);
    },
    {
      connection: redisConnection("worker", url),
      prefix,
      concurrency,
      lockDuration,
      stalledInterval,
      // A worker killed mid-job is normal here (deploys, crashes): allow a few before giving up.
      maxStalledCount: 3,
    },
  );
  worker.on("failed", (job, error) => {
    if (!job) return;
    const final = !!job.finishedOn || error.name === "UnrecoverableError";
    console.error(
      `job ${job.id} (${job.name}) attempt ${job.attemptsMade} failed${final ? " for the last time" : ", will retry"}: ${error.message}`,
    );
    if (final)
      onFinalFailure(job.name as JobName, job.data, error).catch((e: unknown) =>
        console.error("could not record a failed job:", e),
      );
  });
  worker.on("error", (error) => console.error("job worker error:", error.message));
  return worker;
}

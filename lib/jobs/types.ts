import { z } from "zod";

/**
 * The durable jobs: each names the database row it works on (the row holds the request and
 * reports progress), so a job carries no more than an id and any worker can pick it up.
 */
export const JOB_NAMES = ["import", "packet", "mail", "sweep"] as const;
export type JobName = (typeof JOB_NAMES)[number];

export const jobPayloadSchemas = {
  /** Read, validate, compute and save one uploaded file (imports row). */
  import: z.object({ importId: z.number().int().positive() }),
  /** Render a permit packet or a schedule, keep it, and e-mail it when asked (packets row). */
  packet: z.object({ packetId: z.number().int().positive() }),
  /** Send one message (invitations); the message itself is the payload. */
  mail: z.object({
    accountId: z.number().int().positive(),
    to: z.array(z.string()).min(1),
    subject: z.string(),
    text: z.string(),
  }),
  /** Housekeeping: files of failed imports, work whose job was lost before it was queued. */
  sweep: z.object({}),
} satisfies Record<JobName, z.ZodType>;

export type JobPayload<N extends JobName> = z.infer<(typeof jobPayloadSchemas)[N]>;

/**
 * One job id per piece of work, so adding it twice (a retried request, the sweep) queues it once.
 * The row's creation time is part of it: ids restart when a database is recreated, and a job
 * id already known to the queue would otherwise swallow the new row's job.
 */
export function workJobId(name: "import" | "packet", row: { id: number; createdAt: Date }): string {
  return `${name}-${row.id}-${row.createdAt.getTime()}`;
}

/** Retries with backoff: 5 attempts, 2 s, 4 s, 8 s, 16 s apart. */
export const JOB_ATTEMPTS = 5;
export const JOB_BACKOFF = { type: "exponential" as const, delay: 2000 };

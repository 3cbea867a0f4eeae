import { z } from "zod";

// Environment read once and validated; a missing or malformed value stops the app with a clear message.
const envSchema = z.object({
  DATABASE_URL: z.string().regex(/^mysql:\/\//, "DATABASE_URL must be a mysql:// URL"),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().positive().default(3712),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  SMTP_SECURE: z.enum(["true", "false"]).default("false"),
  MAIL_FROM: z.string().default("Platload <no-reply@platload.test>"),
  /** Folder of the local fake SMTP server's messages: the development mailbox (lib/mail/mailbox.ts says when it is on). */
  PLATLOAD_MAILBOX_DIR: z.string().optional(),
  /**
   * Reverse proxies in front of the app that append to X-Forwarded-For (lib/http/client-address.ts).
   * 0: the client's address is the socket's and X-Forwarded-For is ignored.
   */
  PLATLOAD_TRUSTED_PROXIES: z.coerce
    .number()
    .int("PLATLOAD_TRUSTED_PROXIES must be a whole number")
    .min(0)
    .max(10)
    .default(0),
  NEXTAUTH_URL: z.string().url().optional(),
  /** Object storage (S3 API): a local fake in development and tests, a real bucket in production. */
  S3_ENDPOINT: z.string().url().optional(),
  S3_REGION: z.string().default("us-east-1"),
  S3_BUCKET: z.string().default("platload"),
  S3_ACCESS_KEY_ID: z.string().default("S3RVER"),
  S3_SECRET_ACCESS_KEY: z.string().default("S3RVER"),
  S3_FORCE_PATH_STYLE: z.enum(["true", "false"]).default("true"),
  /** Largest upload accepted by every importer, bytes (enforced while the upload streams in). */
  PLATLOAD_MAX_UPLOAD_BYTES: z.coerce
    .number()
    .int()
    .positive()
    .default(20 * 1024 * 1024),
  /** Largest JSON (or form) body any route reads, bytes. */
  PLATLOAD_MAX_JSON_BYTES: z.coerce
    .number()
    .int()
    .positive()
    .default(1024 * 1024),
  /** The job queue's Redis (BullMQ): imports, permit packets and e-mail run as durable jobs. */
  REDIS_URL: z.string().regex(/^rediss?:\/\/[^\s]+$/, "REDIS_URL must be a redis:// (or rediss://) URL"),
  /** Key prefix of the job queue in Redis; two deployments may share one Redis under different prefixes. */
  PLATLOAD_QUEUE_PREFIX: z
    .string()
    .regex(/^[A-Za-z0-9_-]{1,40}$/, "PLATLOAD_QUEUE_PREFIX must be 1-40 letters, digits, - or _")
    .default("platload"),
  /** Jobs one worker process runs at once. */
  PLATLOAD_WORKER_CONCURRENCY: z.coerce.number().int().min(1).max(16).default(2),
  /**
   * How long a worker's claim on a job lasts without renewal, ms: a worker that dies loses its
   * jobs to another worker after about this long (plus one stalled-job check).
   */
  PLATLOAD_JOB_LOCK_MS: z.coerce.number().int().min(1000).default(30_000),
  /** How often each worker looks for jobs whose worker died, ms. */
  PLATLOAD_JOB_STALLED_CHECK_MS: z.coerce.number().int().min(500).default(30_000),
});

export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;

export function env(): Env {
  if (!cached) {
    const parsed = envSchema.safeParse(process.env);
    if (!parsed.success) {
      const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
      throw new Error(`Platload environment is not valid:\n${lines.join("\n")}`);
    }
    cached = parsed.data;
  }
  return cached;
}

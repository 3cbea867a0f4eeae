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
  PLATLOAD_TRUSTED_PROXIES: z.coerce.number().int("PLATLOAD_TRUSTED_PROXIES must be a whole number").min(0).max(10).default(0),
  NEXTAUTH_URL: z.string().url().optional(),
  /** Object storage (S3 API): a local fake in development and tests, a real bucket in production. */
  S3_ENDPOINT: z.string().url().optional(),
  S3_REGION: z.string().default("us-east-1"),
  S3_BUCKET: z.string().default("platload"),
  S3_ACCESS_KEY_ID: z.string().default("S3RVER"),
  S3_SECRET_ACCESS_KEY: z.string().default("S3RVER"),
  S3_FORCE_PATH_STYLE: z.enum(["true", "false"]).default("true"),
  /** Largest upload accepted, bytes. */
  PLATLOAD_MAX_UPLOAD_BYTES: z.coerce.number().int().positive().default(20 * 1024 * 1024),
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

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
  /** Folder of the local fake SMTP server's messages; when set, the development mailbox page is on. */
  PLATLOAD_MAILBOX_DIR: z.string().optional(),
  NEXTAUTH_URL: z.string().url().optional(),
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

import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/lib/env";

export interface OutgoingMail {
  /** The account the message is sent for: the development mailbox shows it to that account's admins only. */
  accountId: number;
  to: string[];
  subject: string;
  text: string;
  attachments?: { filename: string; content: Buffer; contentType?: string }[];
  /** A stable Message-ID for a message a retried job may send again. */
  messageId?: string;
}

const globalForMail = globalThis as unknown as { platloadMail?: Transporter };

function transport(): Transporter {
  if (!globalForMail.platloadMail) {
    const e = env();
    globalForMail.platloadMail = nodemailer.createTransport({
      host: e.SMTP_HOST,
      port: e.SMTP_PORT,
      secure: e.SMTP_SECURE === "true",
      // The local fake speaks plain SMTP; a real server's settings come from the environment.
      ignoreTLS: !e.SMTP_USER,
      auth: e.SMTP_USER ? { user: e.SMTP_USER, pass: e.SMTP_PASSWORD ?? "" } : undefined,
    });
  }
  return globalForMail.platloadMail;
}

/** The header that names the sending account (read back by the local fake SMTP server, scripts/mail-server.ts). */
export const ACCOUNT_HEADER = "X-Platload-Account";

export async function sendMail({ accountId, ...mail }: OutgoingMail): Promise<void> {
  await transport().sendMail({
    from: env().MAIL_FROM,
    ...mail,
    headers: { [ACCOUNT_HEADER]: String(accountId) },
  });
}

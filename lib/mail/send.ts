import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/lib/env";

export interface OutgoingMail {
  to: string[];
  subject: string;
  text: string;
  attachments?: { filename: string; content: Buffer; contentType?: string }[];
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

export async function sendMail(mail: OutgoingMail): Promise<void> {
  await transport().sendMail({ from: env().MAIL_FROM, ...mail });
}

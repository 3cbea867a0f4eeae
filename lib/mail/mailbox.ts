import "server-only";
import { readdir, readFile } from "node:fs/promises";
import path from "node:path";
import { env } from "@/lib/env";

/**
 * The development mailbox: the messages the local fake SMTP server (scripts/mail-server.ts) caught.
 * Invitation links are in it, so it must never reach a real deployment. It exists only when
 *
 * 1. the app is built for development or tests: `next dev`, Vitest, or a build made by the demo
 *    and test commands (they set PLATLOAD_DEMO_BUILD=1 for `next build`); a plain `npm run build`
 *    leaves the mailbox's page and route out of the build (next.config.ts pageExtensions: their
 *    files end in .dev.tsx / .dev.ts), whatever the environment says when it runs, and
 * 2. at run time PLATLOAD_MAILBOX_DIR is set and NEXTAUTH_URL, the address browsers use, is a
 *    loopback address (127.0.0.1, localhost, [::1]): a deployment that people reach over a network
 *    cannot switch it on by accident, even from a demo build.
 *
 * Even then it answers only a signed-in admin ("mailbox.read"), with the mail their account sent.
 */
export interface MailboxMessage {
  id: string;
  receivedAt: string;
  /** The sending account, from the X-Platload-Account header (lib/mail/send.ts). */
  accountId: string | null;
  from: string;
  to: string[];
  subject: string;
  text: string;
  attachments: { filename: string; contentType: string; size: number; contentBase64?: string }[];
}

const LOOPBACK_HOSTS = new Set(["127.0.0.1", "localhost", "[::1]"]);

/** Rule 2 above, as a pure function of the settings (rule 1 is decided by the build). */
export function mailboxAllowed({
  mailboxDir,
  appUrl,
}: {
  mailboxDir: string | undefined;
  appUrl: string | undefined;
}): boolean {
  if (!mailboxDir || !appUrl) return false;
  try {
    return LOOPBACK_HOSTS.has(new URL(appUrl).hostname);
  } catch {
    return false;
  }
}

export function mailboxEnabled(): boolean {
  const e = env();
  return mailboxAllowed({ mailboxDir: e.PLATLOAD_MAILBOX_DIR, appUrl: e.NEXTAUTH_URL });
}

/** The account's messages, newest first; nothing when the mailbox is off. */
export async function listMailbox({
  accountId,
  withContent = false,
}: {
  accountId: number;
  withContent?: boolean;
}): Promise<MailboxMessage[]> {
  const dir = env().PLATLOAD_MAILBOX_DIR;
  if (!mailboxEnabled() || !dir) return [];
  let names: string[];
  try {
    names = (await readdir(dir)).filter((n) => n.endsWith(".json"));
  } catch {
    return [];
  }
  const all = await Promise.all(
    names.map(async (n) => JSON.parse(await readFile(path.join(dir, n), "utf8")) as MailboxMessage),
  );
  const messages = all.filter((m) => m.accountId === String(accountId));
  if (!withContent) for (const m of messages) for (const a of m.attachments) delete a.contentBase64;
  return messages.sort((a, b) => b.receivedAt.localeCompare(a.receivedAt) || b.id.localeCompare(a.id));
}

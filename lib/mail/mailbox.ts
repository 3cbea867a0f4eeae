import "server-only";
import { readdir, readFile } from "node:fs/promises";
import path from "node:path";
import { env } from "@/lib/env";

/** A message kept by the local fake SMTP server (scripts/mail-server.ts). */
export interface MailboxMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  attachments: { filename: string; contentType: string; size: number; contentBase64?: string }[];
}

export function mailboxEnabled(): boolean {
  return !!env().PLATLOAD_MAILBOX_DIR;
}

/** Newest first. Only where the development mailbox is switched on (PLATLOAD_MAILBOX_DIR). */
export async function listMailbox({ withContent = false }: { withContent?: boolean } = {}): Promise<MailboxMessage[]> {
  const dir = env().PLATLOAD_MAILBOX_DIR;
  if (!dir) return [];
  let names: string[];
  try {
    names = (await readdir(dir)).filter((n) => n.endsWith(".json"));
  } catch {
    return [];
  }
  const messages = await Promise.all(names.map(async (n) => JSON.parse(await readFile(path.join(dir, n), "utf8")) as MailboxMessage));
  if (!withContent) for (const m of messages) for (const a of m.attachments) delete a.contentBase64;
  return messages.sort((a, b) => b.receivedAt.localeCompare(a.receivedAt) || b.id.localeCompare(a.id));
}

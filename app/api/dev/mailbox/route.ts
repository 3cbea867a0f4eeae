import { NextResponse } from "next/server";
import { listMailbox, mailboxEnabled } from "@/lib/mail/mailbox";

/** Development mailbox: only where PLATLOAD_MAILBOX_DIR is set (demo and test runs, never production). */
export async function GET() {
  if (!mailboxEnabled()) return NextResponse.json({ error: { code: "not_found", message: "The development mailbox is off." } }, { status: 404 });
  return NextResponse.json({ messages: await listMailbox() });
}

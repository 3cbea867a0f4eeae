import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getPageContext } from "@/lib/auth/page";
import { listMailbox, mailboxEnabled } from "@/lib/mail/mailbox";

export const metadata: Metadata = { title: "Development mailbox" };
export const dynamic = "force-dynamic";

/**
 * Messages caught by the local fake SMTP server, for a signed-in admin: the mail their account sent.
 * When it exists at all is lib/mail/mailbox.ts's rule; this file ends in .dev.tsx, so a production
 * build does not contain the page.
 */
export default async function MailboxPage() {
  if (!mailboxEnabled()) notFound();
  const { member, permissions } = await getPageContext();
  if (!permissions.includes("mailbox.read")) {
    return (
      <main className="mx-auto max-w-4xl px-4 py-6" data-testid="mailbox-refused">
        <h1 className="mb-1 text-lg font-semibold">Development mailbox</h1>
        <p className="text-zinc-600">
          Only an admin of {member.accountName} can read the account&apos;s development mailbox.
        </p>
      </main>
    );
  }
  const messages = await listMailbox({ accountId: member.accountId });
  return (
    <main className="mx-auto max-w-4xl px-4 py-6">
      <h1 className="mb-1 text-lg font-semibold">Development mailbox</h1>
      <p className="mb-4 text-zinc-600">
        Every message Platload sent for {member.accountName} through the local fake SMTP server, newest first.
        Nothing here left this machine.
      </p>
      {messages.length === 0 ? <p className="text-zinc-500">No messages yet.</p> : null}
      <ul className="space-y-3" data-testid="mailbox">
        {messages.map((m) => (
          <li key={m.id} className="rounded border border-zinc-200 bg-white p-3" data-testid="mail-message">
            <div className="flex justify-between text-xs text-zinc-500">
              <span>
                To {m.to.join(", ")} · from {m.from}
              </span>
              <time dateTime={m.receivedAt}>{m.receivedAt.replace("T", " ").slice(0, 19)} UTC</time>
            </div>
            <h2 className="mt-1 font-medium" data-testid="mail-subject">
              {m.subject}
            </h2>
            <pre className="mt-2 whitespace-pre-wrap font-sans text-zinc-700" data-testid="mail-body">
              {m.text}
            </pre>
            {m.attachments.length > 0 ? (
              <p className="mt-2 text-xs text-zinc-600">
                Attachments:{" "}
                {m.attachments.map((a) => `${a.filename} (${Math.round(a.size / 1024)} KB)`).join(", ")}
              </p>
            ) : null}
          </li>
        ))}
      </ul>
    </main>
  );
}

import { apiRoute } from "@/lib/auth/route";
import { AppError } from "@/lib/errors";
import { listMailbox, mailboxEnabled } from "@/lib/mail/mailbox";

/**
 * The development mailbox (lib/mail/mailbox.ts says when it exists): the mail the admin's own
 * account sent. The file ends in .dev.ts, so a production build does not contain this route.
 */
export const GET = apiRoute({ permission: "mailbox.read" }, async ({ member }) => {
  if (!mailboxEnabled()) throw new AppError("not_found", "The development mailbox is off.");
  return { messages: await listMailbox({ accountId: member.accountId }) };
});

import { createInvitation } from "@/db/queries/team";
import { apiRoute, parseJsonBody } from "@/lib/auth/route";
import { enqueueJob } from "@/lib/jobs/queue";
import { invitationMessage } from "@/lib/mail/messages";
import { inviteSchema } from "./schema";

/** Invites someone: the invitation is recorded and its e-mail queued (a worker sends it, retrying on failure). */
export const POST = apiRoute({ permission: "team.manage" }, async ({ db, member, request }) => {
  const body = await parseJsonBody(request, inviteSchema);
  const { token, invitationId, accountName } = await createInvitation({
    db,
    accountId: member.accountId,
    invitedByUserId: member.userId,
    ...body,
  });
  const origin = process.env.NEXTAUTH_URL ?? request.nextUrl.origin;
  const message = invitationMessage({
    accountId: member.accountId,
    to: body.email,
    name: body.name,
    role: body.role,
    accountName,
    inviterName: member.name,
    link: `${origin}/invitation/${token}`,
  });
  await enqueueJob("mail", {
    accountId: message.accountId,
    to: message.to,
    subject: message.subject,
    text: message.text,
  });
  return { invitationId };
});

import { createInvitation } from "@/db/queries/team";
import { apiRoute, parseJsonBody } from "@/lib/auth/route";
import { sendMail } from "@/lib/mail/send";
import { invitationMessage } from "@/lib/mail/messages";
import { inviteSchema } from "./schema";

export const POST = apiRoute({ permission: "team.manage" }, async ({ db, member, request }) => {
  const body = await parseJsonBody(request, inviteSchema);
  const { token, invitationId, accountName } = await createInvitation({ db, accountId: member.accountId, invitedByUserId: member.userId, ...body });
  const origin = process.env.NEXTAUTH_URL ?? request.nextUrl.origin;
  await sendMail(invitationMessage({ accountId: member.accountId, to: body.email, name: body.name, role: body.role, accountName, inviterName: member.name, link: `${origin}/invitation/${token}` }));
  return { invitationId };
});

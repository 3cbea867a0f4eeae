import type { Role } from "@/db/schema";
import { ROLE_LABELS } from "@/lib/auth/permissions";
import { INVITATION_DAYS } from "@/db/queries/team";
import type { OutgoingMail } from "./send";

export function invitationMessage(p: {
  accountId: number;
  to: string;
  name: string;
  role: Role;
  accountName: string;
  inviterName: string;
  link: string;
}): OutgoingMail {
  return {
    accountId: p.accountId,
    to: [p.to],
    subject: `${p.inviterName} invited you to ${p.accountName} on Platload`,
    text: [
      `Hello ${p.name},`,
      "",
      `${p.inviterName} invited you to join ${p.accountName} on Platload as ${ROLE_LABELS[p.role]}.`,
      "Open this link to set your password and sign in:",
      "",
      p.link,
      "",
      `The link works once and expires in ${INVITATION_DAYS} days.`,
    ].join("\n"),
  };
}

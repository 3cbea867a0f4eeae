import type { Metadata } from "next";
import { getDb } from "@/db";
import { findOpenInvitation } from "@/db/queries/team";
import { ROLE_LABELS } from "@/lib/auth/permissions";
import { AcceptInvitationForm } from "./accept-form";

export const metadata: Metadata = { title: "Join your team" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = await findOpenInvitation({ db: getDb(), token });
  if (!invitation) {
    return (
      <div data-testid="invitation-invalid">
        <h1 className="mb-2 text-base font-semibold">This link is not valid any more</h1>
        <p className="text-zinc-600">
          It was used already, withdrawn or expired. Ask your admin for a new invitation.
        </p>
      </div>
    );
  }
  return (
    <div>
      <h1 className="mb-1 text-base font-semibold">Join {invitation.accountName}</h1>
      <p className="mb-4 text-zinc-600">
        You are invited as <strong>{ROLE_LABELS[invitation.role]}</strong> with the e-mail {invitation.email}.
        Set a password to finish.
      </p>
      <AcceptInvitationForm token={token} email={invitation.email} defaultName={invitation.name} />
    </div>
  );
}

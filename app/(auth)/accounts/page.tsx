import type { Metadata } from "next";
import { getServerSession } from "next-auth";
import { redirect } from "next/navigation";
import { getDb } from "@/db";
import { listMembershipsOfUser } from "@/lib/auth/member";
import { authOptions } from "@/lib/auth/options";
import { AccountPicker } from "./account-picker";

export const metadata: Metadata = { title: "Choose an account" };

export default async function AccountsPage() {
  const session = await getServerSession(authOptions);
  const userId = (session?.user as { id?: number } | undefined)?.id;
  if (!userId) redirect("/sign-in");
  const memberships = await listMembershipsOfUser({ db: getDb(), userId });
  if (memberships.length === 1) redirect("/plans");
  return (
    <div>
      <h1 className="mb-1 text-base font-semibold">Choose an account</h1>
      {memberships.length === 0 ? (
        <p className="text-zinc-600">
          You are not a member of any builder account yet. Ask an admin for an invitation.
        </p>
      ) : (
        <>
          <p className="mb-4 text-zinc-600">
            You work for more than one builder. Pick the one to open; you can switch later.
          </p>
          <AccountPicker accounts={memberships} />
        </>
      )}
    </div>
  );
}

import type { Metadata } from "next";
import Link from "next/link";
import { LoadProcedureForm } from "@/components/account/load-procedure-form";
import { PageHeader } from "@/components/layout/page-header";
import { Caution } from "@/components/ui/caution";
import { getPageContext } from "@/lib/auth/page";

export const metadata: Metadata = { title: "Account settings" };

export default async function AccountSettingsPage() {
  const { member, permissions } = await getPageContext();
  const canEdit = permissions.includes("account.settings");
  return (
    <div className="flex max-w-4xl flex-col gap-4">
      <PageHeader
        title="Account settings"
        description={
          canEdit
            ? `Settings that apply to everything in ${member.accountName}.`
            : `Settings that apply to everything in ${member.accountName}. Only an admin can change them.`
        }
      />
      <LoadProcedureForm canEdit={canEdit} />
      <p className="text-xs text-zinc-600">
        The equipment sizing limits are with the catalog on the{" "}
        <Link href="/equipment" className="text-accent-700 underline-offset-2 hover:underline">
          Equipment
        </Link>{" "}
        page.
      </p>
      <Caution />
    </div>
  );
}

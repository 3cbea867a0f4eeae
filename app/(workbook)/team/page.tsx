import type { Metadata } from "next";
import { PageHeader } from "@/components/layout/page-header";
import { TeamPanel } from "@/components/team/team-panel";
import { getPageContext } from "@/lib/auth/page";

export const metadata: Metadata = { title: "Team" };

export default async function TeamPage() {
  const { member, permissions } = await getPageContext();
  const canManage = permissions.includes("team.manage");
  return (
    <div className="max-w-5xl">
      <PageHeader
        title="Team"
        description={
          canManage
            ? `Who works in ${member.accountName}, and what each role may do.`
            : `Who works in ${member.accountName}. Only an admin can invite people or change roles.`
        }
      />
      <TeamPanel canManage={canManage} currentUserId={member.userId} />
    </div>
  );
}

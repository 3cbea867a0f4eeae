import type { Metadata } from "next";
import { PlanSheet } from "@/components/plans/plan-sheet";
import { getPageContext } from "@/lib/auth/page";

export const metadata: Metadata = { title: "Plan sheet" };

export default async function PlanSheetPage({ params, searchParams }: { params: Promise<{ planId: string }>; searchParams: Promise<{ communityId?: string }> }) {
  const { member, permissions } = await getPageContext();
  const { planId } = await params;
  const { communityId } = await searchParams;
  return (
    <PlanSheet
      planId={Number(planId)}
      canEdit={permissions.includes("plans.edit")}
      canApprove={permissions.includes("plans.approve")}
      memberName={member.name}
      initialCommunityId={communityId ? Number(communityId) || null : null}
    />
  );
}

import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { PlanSheet } from "@/components/plans/plan-sheet";
import { getPageContext } from "@/lib/auth/page";
import { parseId } from "@/lib/http/ids";

export const metadata: Metadata = { title: "Plan sheet" };

export default async function PlanSheetPage({
  params,
  searchParams,
}: {
  params: Promise<{ planId: string }>;
  searchParams: Promise<{ communityId?: string }>;
}) {
  const { member, permissions } = await getPageContext();
  const { planId } = await params;
  const { communityId } = await searchParams;
  const id = parseId(planId);
  if (id === null) notFound();
  return (
    <PlanSheet
      planId={id}
      canEdit={permissions.includes("plans.edit")}
      canApprove={permissions.includes("plans.approve")}
      memberName={member.name}
      initialCommunityId={parseId(communityId)}
    />
  );
}

import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { CommunityWorkspace } from "@/components/communities/community-workspace";
import { getPageContext } from "@/lib/auth/page";
import { parseId } from "@/lib/http/ids";

export const metadata: Metadata = { title: "Community" };

export default async function CommunityPage({ params }: { params: Promise<{ communityId: string }> }) {
  const { permissions } = await getPageContext();
  const { communityId } = await params;
  const id = parseId(communityId);
  if (id === null) notFound();
  return (
    <CommunityWorkspace
      communityId={id}
      canEditCommunity={permissions.includes("communities.edit")}
      canEditLots={permissions.includes("lots.edit")}
      canPermit={permissions.includes("lots.permit")}
      canOverride={permissions.includes("equipment.override")}
    />
  );
}

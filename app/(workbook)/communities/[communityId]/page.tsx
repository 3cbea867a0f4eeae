import type { Metadata } from "next";
import { CommunityWorkspace } from "@/components/communities/community-workspace";
import { getPageContext } from "@/lib/auth/page";

export const metadata: Metadata = { title: "Community" };

export default async function CommunityPage({ params }: { params: Promise<{ communityId: string }> }) {
  const { permissions } = await getPageContext();
  const { communityId } = await params;
  return (
    <CommunityWorkspace
      communityId={Number(communityId)}
      canEditCommunity={permissions.includes("communities.edit")}
      canEditLots={permissions.includes("lots.edit")}
      canPermit={permissions.includes("lots.permit")}
      canOverride={permissions.includes("equipment.override")}
    />
  );
}

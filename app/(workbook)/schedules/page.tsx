import type { Metadata } from "next";
import { PageHeader } from "@/components/layout/page-header";
import { SchedulesWorkspace } from "@/components/schedules/schedules-workspace";
import { getPageContext } from "@/lib/auth/page";

export const metadata: Metadata = { title: "Schedules" };

export default async function SchedulesPage({
  searchParams,
}: {
  searchParams: Promise<{ community?: string }>;
}) {
  const { permissions } = await getPageContext();
  const raw = Number((await searchParams).community);
  return (
    <div className="max-w-6xl">
      <PageHeader
        title="Schedules"
        description="Per community: the equipment schedule for purchasing, the permit schedule, load reports per lot, permit packets, and sending them by e-mail."
      />
      <SchedulesWorkspace
        initialCommunityId={Number.isSafeInteger(raw) && raw > 0 ? raw : null}
        canExport={permissions.includes("schedules.export")}
      />
    </div>
  );
}

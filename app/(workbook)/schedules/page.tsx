import type { Metadata } from "next";
import { PageHeader } from "@/components/layout/page-header";
import { Caution } from "@/components/ui/caution";
import { getPageContext } from "@/lib/auth/page";

export const metadata: Metadata = { title: "Schedules" };

export default async function SchedulesPage() {
  await getPageContext();
  return (
    <div className="max-w-4xl">
      <PageHeader title="Schedules" description="Permit schedules, equipment schedules and per-lot load reports, per community." />
      <div className="rounded border border-dashed border-zinc-300 bg-white p-4 text-zinc-600" data-testid="schedules-not-yet">
        <p className="mb-2 font-medium text-zinc-800">Not built yet.</p>
        <p>
          This page will export the permit schedule (one row per lot: loads, design conditions, equipment, reviewer), the equipment schedule (counts per
          system per community) and per-lot PDF reports, and send them by e-mail. Until then no schedule can be exported.
        </p>
      </div>
      <Caution className="mt-4" />
    </div>
  );
}

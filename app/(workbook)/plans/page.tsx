import type { Metadata } from "next";
import { PageHeader } from "@/components/layout/page-header";
import { DataTable } from "@/components/ui/data-table";
import { getDb } from "@/db";
import { listPlans } from "@/db/queries/records";
import { getPageContext } from "@/lib/auth/page";
import type { PlanInput } from "@/lib/load/input";

export const metadata: Metadata = { title: "Plans" };

export default async function PlansPage() {
  const { member } = await getPageContext();
  const rows = await listPlans({ db: getDb(), accountId: member.accountId });
  return (
    <div className="max-w-6xl">
      <PageHeader title="Plan library" description="The builder's plan models with their envelope. Each model is computed for four facings." />
      <DataTable
        testId="plans-table"
        rows={rows}
        rowKey={(p) => p.id}
        empty="No plan models yet."
        columns={[
          { header: "Plan code", cell: (p) => <span className="font-medium">{p.planCode}</span> },
          { header: "Name", cell: (p) => p.name },
          { header: "Floor area (ft²)", numeric: true, cell: (p) => (p.input as PlanInput | null)?.conditionedFloorAreaFt2.toLocaleString() ?? "" },
          { header: "Stories", numeric: true, cell: (p) => (p.input as PlanInput | null)?.stories ?? "" },
          { header: "Bedrooms", numeric: true, cell: (p) => (p.input as PlanInput | null)?.bedrooms ?? "" },
          { header: "Revision", numeric: true, cell: (p) => p.revisionNumber ?? "" },
          { header: "State", cell: (p) => p.revisionStatus ?? "" },
        ]}
      />
    </div>
  );
}

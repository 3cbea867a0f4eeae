import type { Metadata } from "next";
import { PageHeader } from "@/components/layout/page-header";
import { DataTable } from "@/components/ui/data-table";
import { getDb } from "@/db";
import { listEquipment } from "@/db/queries/records";
import { getPageContext } from "@/lib/auth/page";

export const metadata: Metadata = { title: "Equipment" };

const TYPE_LABELS = { "ac-furnace": "AC + furnace", "heat-pump": "Heat pump", "heat-pump-backup": "Heat pump + backup heat", furnace: "Furnace only" } as const;
const num = (v: number | string | null) => (v === null || v === "" ? "" : Number(v).toLocaleString());

export default async function EquipmentPage() {
  const { member } = await getPageContext();
  const systems = await listEquipment({ db: getDb(), accountId: member.accountId });
  return (
    <div className="max-w-7xl">
      <PageHeader title="Equipment catalog" description="The builder's systems, with capacities at design conditions. Selection per lot uses the account's sizing limits." />
      <DataTable
        testId="equipment-table"
        rows={systems}
        rowKey={(s) => s.id}
        empty="No systems in the catalog yet."
        columns={[
          { header: "System", cell: (s) => <span className="font-medium">{s.systemCode}</span> },
          { header: "Type", cell: (s) => TYPE_LABELS[s.systemType] },
          { header: "Outdoor / indoor / furnace models", cell: (s) => [s.outdoorModel, s.indoorModel, s.furnaceModel].filter(Boolean).join(" · ") },
          { header: "Nominal tons", numeric: true, cell: (s) => s.nominalTons ?? "" },
          { header: "Cooling total (Btu/h)", numeric: true, cell: (s) => num(s.coolingTotalBtuh) },
          { header: "Cooling sensible (Btu/h)", numeric: true, cell: (s) => num(s.coolingSensibleBtuh) },
          { header: "Heating output (Btu/h)", numeric: true, cell: (s) => num(s.heatingOutputBtuh ?? s.heatPump47Btuh) },
          { header: "Price (USD)", numeric: true, cell: (s) => num(s.priceUsd) },
        ]}
      />
    </div>
  );
}

import type { Metadata } from "next";
import { PageHeader } from "@/components/layout/page-header";
import { CatalogGrid } from "@/components/equipment/catalog-grid";
import { SizingLimitsForm } from "@/components/equipment/sizing-limits-form";
import { Caution } from "@/components/ui/caution";
import { getPageContext } from "@/lib/auth/page";

export const metadata: Metadata = { title: "Equipment" };

export default async function EquipmentPage() {
  const { permissions } = await getPageContext();
  return (
    <div className="flex flex-col gap-4">
      <PageHeader
        title="Equipment catalog"
        description="The builder's systems with their capacities at design conditions. Every lot gets the smallest system that fits its loads within the sizing limits; purchasing may choose another by hand in a community's lots grid."
      />
      <CatalogGrid canEdit={permissions.includes("equipment.edit")} />
      <SizingLimitsForm canEdit={permissions.includes("account.settings")} />
      <Caution />
    </div>
  );
}

import type { Metadata } from "next";
import { count, eq } from "drizzle-orm";
import { PageHeader } from "@/components/layout/page-header";
import { DataTable } from "@/components/ui/data-table";
import { getDb } from "@/db";
import { listCommunities } from "@/db/queries/records";
import { lots } from "@/db/schema";
import { getPageContext } from "@/lib/auth/page";

export const metadata: Metadata = { title: "Communities" };

interface Conditions {
  latitudeDeg?: number;
  elevationFt?: number;
  heatingOutdoorDbF?: number;
  coolingOutdoorDbF?: number;
  coolingOutdoorWbF?: number;
}

export default async function CommunitiesPage() {
  const { member } = await getPageContext();
  const db = getDb();
  const communities = await listCommunities({ db, accountId: member.accountId });
  const counts = await db.select({ communityId: lots.communityId, n: count() }).from(lots).where(eq(lots.accountId, member.accountId)).groupBy(lots.communityId);
  const lotCount = new Map(counts.map((c) => [c.communityId, c.n]));
  return (
    <div className="max-w-6xl">
      <PageHeader title="Communities" description="Each community has a location and design conditions; its lots take a plan model and a facing." />
      <DataTable
        testId="communities-table"
        rows={communities}
        rowKey={(c) => c.id}
        empty="No communities yet."
        columns={[
          { header: "Community", cell: (c) => <span className="font-medium">{c.name}</span> },
          { header: "Locality", cell: (c) => c.locality },
          { header: "Lots", numeric: true, cell: (c) => (lotCount.get(c.id) ?? 0).toLocaleString() },
          { header: "Latitude (°)", numeric: true, cell: (c) => (c.conditions as Conditions).latitudeDeg?.toFixed(2) ?? "" },
          { header: "Elevation (ft)", numeric: true, cell: (c) => (c.conditions as Conditions).elevationFt?.toLocaleString() ?? "" },
          { header: "Heating DB (°F)", numeric: true, cell: (c) => (c.conditions as Conditions).heatingOutdoorDbF ?? "" },
          { header: "Cooling DB / WB (°F)", numeric: true, cell: (c) => `${(c.conditions as Conditions).coolingOutdoorDbF ?? ""} / ${(c.conditions as Conditions).coolingOutdoorWbF ?? ""}` },
        ]}
      />
    </div>
  );
}

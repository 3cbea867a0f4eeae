import type { Metadata } from "next";
import Link from "next/link";
import { count, eq } from "drizzle-orm";
import { NewCommunity } from "@/components/communities/new-community";
import { PageHeader } from "@/components/layout/page-header";
import { DataTable } from "@/components/ui/data-table";
import { getDb } from "@/db";
import { listCommunities } from "@/db/queries/records";
import { lots } from "@/db/schema";
import { getPageContext } from "@/lib/auth/page";
import type { SiteConditions } from "@/lib/load/input";

export const metadata: Metadata = { title: "Communities" };

export default async function CommunitiesPage() {
  const { member, permissions } = await getPageContext();
  const db = getDb();
  const communities = await listCommunities({ db, accountId: member.accountId });
  const counts = await db
    .select({ communityId: lots.communityId, n: count() })
    .from(lots)
    .where(eq(lots.accountId, member.accountId))
    .groupBy(lots.communityId);
  const lotCount = new Map(counts.map((c) => [c.communityId, c.n]));
  const c = (x: { conditions: unknown }) => x.conditions as SiteConditions;
  return (
    <div className="max-w-6xl">
      <PageHeader
        title="Communities"
        description="Each community has a location and design conditions; its lots take a plan model and a facing."
      />
      <DataTable
        testId="communities-table"
        rows={communities}
        rowKey={(x) => x.id}
        empty="No communities yet."
        columns={[
          {
            header: "Community",
            cell: (x) => (
              <Link className="font-medium text-accent-700 hover:underline" href={`/communities/${x.id}`}>
                {x.name}
              </Link>
            ),
          },
          { header: "Locality", cell: (x) => x.locality },
          { header: "Lots", numeric: true, cell: (x) => (lotCount.get(x.id) ?? 0).toLocaleString() },
          { header: "Latitude (°)", numeric: true, cell: (x) => c(x).latitudeDeg.toFixed(2) },
          { header: "Elevation (ft)", numeric: true, cell: (x) => c(x).elevationFt.toLocaleString() },
          { header: "Heating DB (°F)", numeric: true, cell: (x) => c(x).heatingOutdoorDbF },
          {
            header: "Cooling DB / WB (°F)",
            numeric: true,
            cell: (x) => `${c(x).coolingOutdoorDbF} / ${c(x).coolingOutdoorWbF}`,
          },
          { header: "Daily range (°F)", numeric: true, cell: (x) => c(x).dailyRangeF },
        ]}
      />
      {permissions.includes("communities.edit") ? (
        <div className="mt-4">
          <NewCommunity />
        </div>
      ) : null}
    </div>
  );
}

import type { Metadata } from "next";
import { PageHeader } from "@/components/layout/page-header";
import { DataTable } from "@/components/ui/data-table";
import { getDb } from "@/db";
import { listAudit } from "@/db/queries/records";
import { getPageContext } from "@/lib/auth/page";

export const metadata: Metadata = { title: "History" };

export default async function HistoryPage() {
  const { member } = await getPageContext();
  const entries = await listAudit({ db: getDb(), accountId: member.accountId });
  return (
    <div className="max-w-5xl">
      <PageHeader
        title="History"
        description="Every change in this account: who, when, and what. The newest 200 entries."
      />
      <DataTable
        testId="history-table"
        rows={entries}
        rowKey={(e) => e.id}
        empty="Nothing has changed yet."
        columns={[
          { header: "When", cell: (e) => e.createdAt.toISOString().slice(0, 19).replace("T", " ") + " UTC" },
          { header: "Who", cell: (e) => e.userName ?? "system" },
          { header: "What", cell: (e) => e.summary },
          { header: "Record", cell: (e) => `${e.entityType}${e.entityId ? ` #${e.entityId}` : ""}` },
        ]}
      />
    </div>
  );
}

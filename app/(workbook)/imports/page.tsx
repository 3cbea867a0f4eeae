import type { Metadata } from "next";
import { PageHeader } from "@/components/layout/page-header";
import { DataTable } from "@/components/ui/data-table";
import { getDb } from "@/db";
import { listImports } from "@/db/queries/records";
import { getPageContext } from "@/lib/auth/page";

export const metadata: Metadata = { title: "Imports" };

export default async function ImportsPage() {
  const { member } = await getPageContext();
  const rows = await listImports({ db: getDb(), accountId: member.accountId });
  return (
    <div className="max-w-6xl">
      <PageHeader title="Imports" description="Every uploaded file: who, when, what it changed, and its row-level errors. An import is all or nothing." />
      <DataTable
        testId="imports-table"
        rows={rows}
        rowKey={(r) => r.id}
        empty="No files imported yet."
        columns={[
          { header: "When", cell: (r) => r.createdAt.toISOString().slice(0, 16).replace("T", " ") + " UTC" },
          { header: "Who", cell: (r) => r.userName },
          { header: "Kind", cell: (r) => r.kind },
          { header: "File", cell: (r) => r.fileName },
          { header: "State", cell: (r) => r.state },
          { header: "Created", numeric: true, cell: (r) => r.createdCount },
          { header: "Updated", numeric: true, cell: (r) => r.updatedCount },
          { header: "Errors", numeric: true, cell: (r) => (Array.isArray(r.errors) ? r.errors.length : 0) },
        ]}
      />
    </div>
  );
}

import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/layout/page-header";
import { DataTable } from "@/components/ui/data-table";
import { getDb } from "@/db";
import { listImports } from "@/db/queries/records";
import { getPageContext } from "@/lib/auth/page";

export const metadata: Metadata = { title: "Imports" };
export const dynamic = "force-dynamic";

const KIND_LABELS = { plans: "Plan library", lots: "Lots", equipment: "Equipment catalog" } as const;
const STATE_LABELS = {
  received: "received",
  validating: "validating",
  computing: "computing",
  saving: "saving",
  succeeded: "done",
  failed: "failed — nothing written",
} as const;

export default async function ImportsPage() {
  const { member } = await getPageContext();
  const rows = await listImports({ db: getDb(), accountId: member.accountId });
  return (
    <div className="max-w-6xl">
      <PageHeader
        title="Imports"
        description="Every uploaded file: who, when, what it changed, and its row-level errors. An import is all or nothing. Imports run in the background: reload to follow one that is still running."
      />
      <DataTable
        testId="imports-table"
        rows={rows}
        rowKey={(r) => r.id}
        empty="No files imported yet."
        columns={[
          { header: "When (UTC)", cell: (r) => r.createdAt.toISOString().slice(0, 16).replace("T", " ") },
          { header: "Who", cell: (r) => r.userName },
          {
            header: "What",
            cell: (r) =>
              r.communityId ? (
                <Link
                  className="text-accent-700 hover:underline"
                  href={`/communities/${r.communityId}`}
                >{`${KIND_LABELS[r.kind]} · ${r.communityName}`}</Link>
              ) : (
                KIND_LABELS[r.kind]
              ),
          },
          {
            header: "File",
            cell: (r) =>
              `${r.fileName} (${Math.max(1, Math.round(r.fileSizeBytes / 1024)).toLocaleString()} KB)`,
          },
          {
            header: "State",
            cell: (r) => (
              <span
                className={
                  r.state === "failed" ? "text-red-700" : r.state === "succeeded" ? "text-accent-700" : ""
                }
                data-testid={`import-state-${r.id}`}
              >
                {STATE_LABELS[r.state]}
                {r.state !== "succeeded" && r.state !== "failed" ? ` (${r.progressPct} %)` : ""}
              </span>
            ),
          },
          { header: "Created", numeric: true, cell: (r) => r.createdCount.toLocaleString() },
          { header: "Updated", numeric: true, cell: (r) => r.updatedCount.toLocaleString() },
          {
            header: "Errors",
            cell: (r) => {
              const errors = Array.isArray(r.errors)
                ? (r.errors as { row: number; column: string; reason: string }[])
                : [];
              if (errors.length === 0) return "";
              const total = Math.max(r.errorCount, errors.length);
              return (
                <details>
                  <summary className="cursor-pointer text-red-700">
                    {total.toLocaleString("en-US")} problem(s)
                  </summary>
                  <ul className="mt-1 max-h-64 overflow-y-auto text-xs">
                    {errors.map((e, i) => (
                      <li key={i}>
                        row {e.row}, {e.column}: {e.reason}
                      </li>
                    ))}
                  </ul>
                  {total > errors.length ? (
                    <p className="mt-1 text-xs">
                      … and {(total - errors.length).toLocaleString("en-US")} more (the first {errors.length}{" "}
                      are kept).
                    </p>
                  ) : null}
                </details>
              );
            },
          },
        ]}
      />
    </div>
  );
}

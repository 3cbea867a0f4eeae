"use client";

import { FileImportPanel } from "@/components/ui/file-import-panel";

/** Upload a plan library file; every bad cell is listed (row, column, reason) and nothing is written. */
export function PlanImportPanel({ onImported }: { onImported: () => void }) {
  return (
    <FileImportPanel
      title="Import plan models"
      description="A CSV or XLSX file in the template layout. Plans are created or updated by plan code. The whole file is checked first: if any cell is wrong, nothing is imported and every bad cell is listed."
      endpoint="/api/plans/import"
      inputId="plan-import-file"
      testId="plan-import"
      describeResult={(r) =>
        `Imported: ${r.createdCount} created, ${r.updatedCount} updated. The import is listed on the Imports page.`
      }
      onImported={onImported}
    />
  );
}

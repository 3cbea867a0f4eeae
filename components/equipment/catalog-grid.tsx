"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { ColDef, ColGroupDef } from "ag-grid-community";
import { AgGridReact } from "ag-grid-react";
import { useMemo, useState } from "react";
import { fmtNum, gridTheme } from "@/components/grid/grid-theme";
import { FileImportPanel } from "@/components/ui/file-import-panel";
import { TableFileLinks } from "@/components/ui/table-file-links";
import { api } from "@/lib/client/api";
import { EQUIPMENT_COLUMN_GROUPS, EQUIPMENT_COLUMNS } from "@/lib/workbook/equipment-columns";

interface CatalogRow {
  id: number;
  version: number;
  cells: Record<string, string | number | null>;
}

/** The builder's equipment catalog: edited cell by cell or imported as a whole file (all or nothing). */
export function CatalogGrid({ canEdit }: { canEdit: boolean }) {
  const queryClient = useQueryClient();
  const catalog = useQuery({
    queryKey: ["equipment"],
    queryFn: () => api<{ systems: CatalogRow[] }>("/api/equipment"),
  });
  const [banner, setBanner] = useState<{ kind: "error" | "info"; text: string } | null>(null);
  const save = useMutation({
    mutationFn: (v: { id: number; version: number; cells: Record<string, string | null> }) =>
      api<{ lotsReselected: number }>(`/api/equipment/${v.id}`, {
        method: "PATCH",
        body: { version: v.version, cells: v.cells },
      }),
    onSuccess: (r) => setBanner({ kind: "info", text: `Saved; ${r.lotsReselected} lots reselected.` }),
    onError: (e: Error) => setBanner({ kind: "error", text: e.message }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["equipment"] }),
  });

  const columnDefs = useMemo<ColGroupDef<CatalogRow>[]>(
    () =>
      EQUIPMENT_COLUMN_GROUPS.map((group) => ({
        headerName: group,
        children: EQUIPMENT_COLUMNS.filter((c) => c.group === group).map((c): ColDef<CatalogRow> => ({
          colId: c.key,
          headerName: c.header,
          headerTooltip: c.meaning,
          width: c.key === "system_code" ? 110 : c.value.type === "enum" ? 150 : 120,
          pinned: c.key === "system_code" ? "left" : undefined,
          editable: canEdit,
          valueGetter: (p) => (p.data ? p.data.cells[c.key] : null),
          valueFormatter: (p) => (typeof p.value === "number" ? fmtNum(p.value, 2) : String(p.value ?? "")),
          valueSetter: (p) => {
            if (!p.data || String(p.newValue ?? "") === String(p.oldValue ?? "")) return false;
            save.mutate({
              id: p.data.id,
              version: p.data.version,
              cells: { [c.key]: p.newValue === "" || p.newValue === null ? null : String(p.newValue) },
            });
            return false;
          },
          cellEditor: c.value.type === "enum" ? "agSelectCellEditor" : "agTextCellEditor",
          cellEditorParams: c.value.type === "enum" ? { values: [...c.value.choices] } : undefined,
          cellClass: c.value.type === "number" ? "num" : undefined,
        })),
      })),
    [canEdit, save],
  );

  return (
    <div className="flex flex-col gap-2">
      {banner ? (
        <p
          data-testid={banner.kind === "error" ? "catalog-error" : "catalog-notice"}
          className={`rounded border px-3 py-2 text-xs ${banner.kind === "error" ? "border-red-200 bg-red-50 text-red-800" : "border-accent-100 bg-accent-50 text-accent-800"}`}
        >
          {banner.text}
        </p>
      ) : null}
      <div style={{ height: 420 }} data-testid="catalog-grid">
        <AgGridReact<CatalogRow>
          theme={gridTheme}
          rowData={catalog.data?.systems ?? []}
          loading={catalog.isPending}
          columnDefs={columnDefs}
          getRowId={(p) => String(p.data.id)}
          defaultColDef={{ sortable: true, filter: true, resizable: true }}
          enterNavigatesVertically
          enterNavigatesVerticallyAfterEdit
          stopEditingWhenCellsLoseFocus
          tooltipShowDelay={300}
        />
      </div>
      <TableFileLinks base="/api/equipment" />
      {canEdit ? (
        <CatalogImport onDone={() => void queryClient.invalidateQueries({ queryKey: ["equipment"] })} />
      ) : null}
    </div>
  );
}

function CatalogImport({ onDone }: { onDone: () => void }) {
  return (
    <FileImportPanel
      title="Import the catalog"
      description="CSV or XLSX in the template layout. Systems are created or updated by system code; if any cell is wrong, nothing is imported and every bad cell is listed."
      endpoint="/api/equipment/import"
      inputId="catalog-import-file"
      testId="catalog-import"
      describeResult={(r) =>
        `Imported: ${r.createdCount} systems created, ${r.updatedCount} updated; every lot's equipment was selected again.`
      }
      onImported={onDone}
    />
  );
}

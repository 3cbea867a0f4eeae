"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { ColDef, ColGroupDef } from "ag-grid-community";
import { AgGridReact } from "ag-grid-react";
import { useMemo, useState } from "react";
import { fmtNum, gridTheme } from "@/components/grid/grid-theme";
import { Button } from "@/components/ui/field";
import { api } from "@/lib/client/api";
import type { ErrorBody, FieldError } from "@/lib/errors";
import { EQUIPMENT_COLUMN_GROUPS, EQUIPMENT_COLUMNS } from "@/lib/workbook/equipment-columns";

interface CatalogRow {
  id: number;
  version: number;
  cells: Record<string, string | number | null>;
}

/** The builder's equipment catalog: edited cell by cell or imported as a whole file (all or nothing). */
export function CatalogGrid({ canEdit }: { canEdit: boolean }) {
  const queryClient = useQueryClient();
  const catalog = useQuery({ queryKey: ["equipment"], queryFn: () => api<{ systems: CatalogRow[] }>("/api/equipment") });
  const [banner, setBanner] = useState<{ kind: "error" | "info"; text: string } | null>(null);
  const save = useMutation({
    mutationFn: (v: { id: number; version: number; cells: Record<string, string | null> }) => api<{ lotsReselected: number }>(`/api/equipment/${v.id}`, { method: "PATCH", body: { version: v.version, cells: v.cells } }),
    onSuccess: (r) => setBanner({ kind: "info", text: `Saved; ${r.lotsReselected} lots reselected.` }),
    onError: (e: Error) => setBanner({ kind: "error", text: e.message }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["equipment"] }),
  });

  const columnDefs = useMemo<ColGroupDef<CatalogRow>[]>(
    () =>
      EQUIPMENT_COLUMN_GROUPS.map((group) => ({
        headerName: group,
        children: EQUIPMENT_COLUMNS.filter((c) => c.group === group).map(
          (c): ColDef<CatalogRow> => ({
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
              save.mutate({ id: p.data.id, version: p.data.version, cells: { [c.key]: p.newValue === "" || p.newValue === null ? null : String(p.newValue) } });
              return false;
            },
            cellEditor: c.value.type === "enum" ? "agSelectCellEditor" : "agTextCellEditor",
            cellEditorParams: c.value.type === "enum" ? { values: [...c.value.choices] } : undefined,
            cellClass: c.value.type === "number" ? "num" : undefined,
          }),
        ),
      })),
    [canEdit, save],
  );

  return (
    <div className="flex flex-col gap-2">
      {banner ? (
        <p data-testid={banner.kind === "error" ? "catalog-error" : "catalog-notice"} className={`rounded border px-3 py-2 text-xs ${banner.kind === "error" ? "border-red-200 bg-red-50 text-red-800" : "border-accent-100 bg-accent-50 text-accent-800"}`}>
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
      <div className="flex gap-3 text-xs">
        <a className="text-accent-700 hover:underline" href="/api/equipment/export?format=xlsx">
          Export XLSX
        </a>
        <a className="text-accent-700 hover:underline" href="/api/equipment/export?format=csv">
          Export CSV
        </a>
        <a className="text-accent-700 hover:underline" href="/api/equipment/template?format=xlsx">
          Template XLSX
        </a>
        <a className="text-accent-700 hover:underline" href="/api/equipment/template?format=csv">
          Template CSV
        </a>
      </div>
      {canEdit ? <CatalogImport onDone={() => void queryClient.invalidateQueries({ queryKey: ["equipment"] })} /> : null}
    </div>
  );
}

function CatalogImport({ onDone }: { onDone: () => void }) {
  const [file, setFile] = useState<File | null>(null);
  const [busy, setBusy] = useState(false);
  const [result, setResult] = useState<string | null>(null);
  const [error, setError] = useState<{ message: string; fields: FieldError[] } | null>(null);
  async function upload() {
    if (!file) return;
    setBusy(true);
    setError(null);
    setResult(null);
    const form = new FormData();
    form.append("file", file);
    const response = await fetch("/api/equipment/import", { method: "POST", body: form });
    const body = (await response.json().catch(() => null)) as (Partial<ErrorBody> & { created?: number; updated?: number; lotsReselected?: number }) | null;
    setBusy(false);
    if (!response.ok) {
      setError({ message: body?.error?.message ?? `The server answered ${response.status}.`, fields: body?.error?.fieldErrors ?? [] });
      return;
    }
    setResult(`Imported: ${body?.created ?? 0} systems created, ${body?.updated ?? 0} updated; ${body?.lotsReselected ?? 0} lots reselected.`);
    onDone();
  }
  return (
    <section className="rounded border border-zinc-200 bg-white p-3" data-testid="catalog-import" aria-labelledby="catalog-import-heading">
      <h2 id="catalog-import-heading" className="mb-1 text-sm font-semibold">
        Import the catalog
      </h2>
      <p className="mb-2 text-xs text-zinc-600">CSV or XLSX in the template layout. Systems are created or updated by system code; if any cell is wrong, nothing is imported and every bad cell is listed.</p>
      <div className="flex items-center gap-2">
        <label htmlFor="catalog-import-file" className="sr-only">
          Catalog file
        </label>
        <input id="catalog-import-file" type="file" accept=".csv,.xlsx" className="text-xs" onChange={(e) => setFile(e.target.files?.[0] ?? null)} />
        <Button type="button" onClick={upload} disabled={!file || busy}>
          {busy ? "Importing…" : "Import"}
        </Button>
      </div>
      {result ? (
        <p className="mt-2 text-xs text-accent-800" data-testid="catalog-import-result">
          {result}
        </p>
      ) : null}
      {error ? (
        <div className="mt-2 rounded border border-red-200 bg-red-50 p-2 text-xs text-red-800" data-testid="catalog-import-errors">
          <p className="font-medium">{error.message}</p>
          <ul className="mt-1 list-disc pl-5">
            {error.fields.slice(0, 100).map((f, i) => (
              <li key={i}>
                row {f.row}, {f.column}: {f.message}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </section>
  );
}

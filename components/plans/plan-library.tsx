"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type {
  CellKeyDownEvent,
  ColDef,
  ColGroupDef,
  GridApi,
  GridReadyEvent,
  ValueFormatterParams,
  ValueGetterParams,
  ValueSetterParams,
} from "ag-grid-community";
import { AgGridReact } from "ag-grid-react";
import Link from "next/link";
import { useCallback, useMemo, useRef, useState } from "react";
import { fmtInt, fmtNum, gridTheme } from "@/components/grid/grid-theme";
import { Caution } from "@/components/ui/caution";
import type { LoadProcedure } from "@/lib/load/results";
import { PROCEDURE_SHORT_LABELS } from "@/lib/reports/procedure-text";
import { TableFileLinks } from "@/components/ui/table-file-links";
import { Button, FormError } from "@/components/ui/field";
import type { FacingSummary } from "@/db/queries/plans";
import { api, ApiError } from "@/lib/client/api";
import { isFormula } from "@/lib/workbook/formula";
import { readRowCells } from "@/lib/workbook/columns";
import {
  AIR_LEAKAGE_KEYS,
  PLAN_COLUMN_BY_KEY,
  PLAN_COLUMN_GROUPS,
  PLAN_COLUMNS,
  withOneAirLeakageFigure,
  type PlanColumnDef,
} from "@/lib/workbook/plan-columns";
import { parsePastedBlock, placePastedBlock } from "@/lib/workbook/table-io";
import { PlanImportPanel } from "./plan-import-panel";

type Cells = Record<string, string | number | boolean | null>;

export interface LibraryPlan {
  id: number;
  planCode: string;
  name: string;
  version: number;
  revisionNumber: number;
  revisionStatus: "draft" | "approved";
  cells: Cells;
  /** The route's facing summary (a type-only import: nothing of the server module reaches the browser). */
  loads: FacingSummary | null;
  loadsError: string | null;
}

interface Library {
  reference: { communities: { id: number; name: string }[]; community: { id: number; name: string } | null };
  /** The account's procedure: the computed columns use it. */
  procedure: LoadProcedure;
  procedureLabel: string;
  plans: LibraryPlan[];
}

interface CellChange {
  planId: number;
  version: number;
  cells: Cells;
}

type EditAction = "edit" | "bulk_edit" | "paste";

const FACINGS = ["N", "E", "S", "W"] as const;
const text = (v: unknown) => (v === null || v === undefined ? "" : String(v));
const errorKey = (planId: number, key: string) => `${planId}:${key}`;

/** Cell values as the grid shows them (formulas evaluated, units read), from the row's entered text. */
function displayValues(plan: LibraryPlan) {
  const entered: Record<string, string> = {};
  for (const c of PLAN_COLUMNS) entered[c.key] = text(plan.cells[c.key]);
  return readRowCells(PLAN_COLUMNS, entered);
}

export function PlanLibrary({ canEdit }: { canEdit: boolean }) {
  const queryClient = useQueryClient();
  const [communityId, setCommunityId] = useState<number | null>(null);
  const queryKey = useMemo(() => ["plans", communityId ?? "default"], [communityId]);
  const library = useQuery({
    queryKey,
    queryFn: () => api<Library>(`/api/plans${communityId ? `?communityId=${communityId}` : ""}`),
  });
  const gridApi = useRef<GridApi<LibraryPlan> | null>(null);
  const [banner, setBanner] = useState<{ kind: "error" | "info"; text: string; details?: string[] } | null>(
    null,
  );
  const [cellErrors, setCellErrors] = useState<Map<string, { text: string; reason: string }>>(new Map());
  const [undoStack, setUndoStack] = useState<number[]>([]);
  const [selectedIds, setSelectedIds] = useState<number[]>([]);
  const [bulkKey, setBulkKey] = useState("ceiling_cavity_r");
  const [bulkValue, setBulkValue] = useState("");
  // All four facings pinned right take about 800 px: on narrower screens start with the worst facing only.
  const [allFacings, setAllFacings] = useState(
    () => typeof window === "undefined" || window.innerWidth >= 1600,
  );

  const save = useMutation({
    mutationFn: ({ changes, action }: { changes: CellChange[]; action: EditAction }) =>
      api<{ changed: number; entryId: number | null }>("/api/plans", {
        method: "PATCH",
        body: { changes, action },
      }),
    onMutate: async ({ changes }) => {
      await queryClient.cancelQueries({ queryKey });
      const previous = queryClient.getQueryData<Library>(queryKey);
      if (previous) {
        queryClient.setQueryData<Library>(queryKey, {
          ...previous,
          plans: previous.plans.map((p) => {
            const change = changes.find((c) => c.planId === p.id);
            return change ? { ...p, cells: { ...p.cells, ...change.cells } } : p;
          }),
        });
      }
      return { previous };
    },
    onError: (error: Error, { changes }, context) => {
      if (context?.previous) queryClient.setQueryData(queryKey, context.previous);
      const apiError = error instanceof ApiError ? error : null;
      const next = new Map(cellErrors);
      for (const fe of apiError?.fieldErrors ?? []) {
        const key = fe.field.slice(fe.field.lastIndexOf(".") + 1);
        const planId = fe.row ?? 0;
        const change = changes.find((c) => c.planId === planId);
        if (change && key in change.cells)
          next.set(errorKey(planId, key), { text: text(change.cells[key]), reason: fe.message });
      }
      setCellErrors(next);
      setBanner({
        kind: "error",
        text: error.message,
        details: apiError?.fieldErrors.map(
          (f) => `${f.field.replace(/\.[^.]+$/, "")} · ${f.column ?? f.field}: ${f.message}`,
        ),
      });
    },
    onSuccess: (result, { changes }) => {
      const next = new Map(cellErrors);
      for (const c of changes) for (const key of Object.keys(c.cells)) next.delete(errorKey(c.planId, key));
      setCellErrors(next);
      // The server bumps each saved plan's version by one; follow it at once so the next edit is not refused as stale.
      const current = queryClient.getQueryData<Library>(queryKey);
      if (current && result.changed > 0) {
        const ids = new Set(changes.map((c) => c.planId));
        queryClient.setQueryData<Library>(queryKey, {
          ...current,
          plans: current.plans.map((p) => (ids.has(p.id) ? { ...p, version: p.version + 1 } : p)),
        });
      }
      if (result.entryId) setUndoStack((s) => [...s, result.entryId!]);
      setBanner(
        result.changed > 0
          ? {
              kind: "info",
              text: `Saved ${result.changed} plan model${result.changed === 1 ? "" : "s"}; loads recomputed.`,
            }
          : null,
      );
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["plans"] }),
  });

  const undo = useMutation({
    mutationFn: (entryId: number) =>
      api<{ changed: number }>("/api/plans/undo", { method: "POST", body: { entryId } }),
    onSuccess: () => {
      setUndoStack((s) => s.slice(0, -1));
      setBanner({ kind: "info", text: "The last change was undone." });
    },
    onError: (error: Error) => setBanner({ kind: "error", text: error.message }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["plans"] }),
  });

  const [copyCode, setCopyCode] = useState("");
  const [copyName, setCopyName] = useState("");
  const copyModel = useMutation({
    mutationFn: (fromPlanId: number) =>
      api<{ planId: number }>("/api/plans", {
        method: "POST",
        body: { fromPlanId, planCode: copyCode, name: copyName },
      }),
    onSuccess: () => {
      setBanner({ kind: "info", text: `Created ${copyCode} as a copy; edit its cells in the grid.` });
      setCopyCode("");
      setCopyName("");
    },
    onError: (error: Error) =>
      setBanner({
        kind: "error",
        text:
          error.message +
          (error instanceof ApiError && error.fieldErrors.length
            ? ` ${error.fieldErrors.map((f) => `${f.column ?? f.field}: ${f.message}`).join("; ")}`
            : ""),
      }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["plans"] }),
  });

  const saveCells = useCallback(
    (changes: CellChange[], action: EditAction) => {
      if (changes.length > 0) save.mutate({ changes, action });
    },
    [save],
  );

  const columnDefs = useMemo<(ColDef<LibraryPlan> | ColGroupDef<LibraryPlan>)[]>(() => {
    const entered = (c: PlanColumnDef): ColDef<LibraryPlan> => ({
      colId: c.key,
      headerName: c.header,
      headerTooltip: `${c.meaning}${(AIR_LEAKAGE_KEYS as readonly string[]).includes(c.key) ? " Entering a figure here clears the row's other air-leakage column." : ""} Formula name: ${c.key}`,
      width: c.value.type === "enum" ? 170 : c.key === "plan_name" ? 130 : 118,
      editable: canEdit,
      pinned: c.key === "plan_code" ? "left" : undefined,
      valueGetter: (p: ValueGetterParams<LibraryPlan>) =>
        p.data ? (cellErrors.get(errorKey(p.data.id, c.key))?.text ?? text(p.data.cells[c.key])) : "",
      valueFormatter: (p: ValueFormatterParams<LibraryPlan>) => {
        if (!p.data) return "";
        if (cellErrors.has(errorKey(p.data.id, c.key))) return String(p.value ?? "");
        const shown = displayValues(p.data).values[c.key];
        if (shown === undefined) return "";
        return typeof shown === "number" ? fmtNum(shown, 3) : String(shown);
      },
      valueSetter: (p: ValueSetterParams<LibraryPlan>) => {
        if (!p.data) return false;
        const next = text(p.newValue);
        if (next === text(p.oldValue)) return false;
        saveCells(
          [
            {
              planId: p.data.id,
              version: p.data.version,
              cells: withOneAirLeakageFigure(p.data.cells, { [c.key]: next }),
            },
          ],
          "edit",
        );
        return false;
      },
      cellEditor: c.value.type === "enum" ? "agSelectCellEditor" : "agTextCellEditor",
      cellEditorParams:
        c.value.type === "enum"
          ? { values: c.required ? [...c.value.choices] : ["", ...c.value.choices] }
          : undefined,
      tooltipValueGetter: (p) => {
        if (!p.data) return undefined;
        const err = cellErrors.get(errorKey(p.data.id, c.key));
        if (err) return `Not saved: ${err.reason}`;
        const raw = text(p.data.cells[c.key]);
        return isFormula(raw) ? raw : undefined;
      },
      cellClass: (p) => {
        const classes: string[] = [];
        if (c.value.type === "number") classes.push("num");
        if (p.data && cellErrors.has(errorKey(p.data.id, c.key))) classes.push("cell-error");
        else if (p.data && isFormula(text(p.data.cells[c.key]))) classes.push("cell-formula");
        return classes;
      },
    });
    const groups: ColGroupDef<LibraryPlan>[] = PLAN_COLUMN_GROUPS.map((group) => ({
      headerName: group,
      children: PLAN_COLUMNS.filter((c) => c.group === group).map(entered),
    }));
    const computed = (facing: (typeof FACINGS)[number]): ColGroupDef<LibraryPlan> => {
      const f = (p: { data?: LibraryPlan }) => p.data?.loads?.facings.find((x) => x.label === facing);
      const worst = (p: { data?: LibraryPlan }) => p.data?.loads?.worst.label === facing;
      return {
        headerName: `Front to ${facing} (Btu/h)`,
        children: [
          {
            colId: `heat_${facing}`,
            headerName: "Heat",
            headerTooltip: `Heating load with the front facing ${facing}, Btu/h`,
            width: 68,
            pinned: "right",
            editable: false,
            filter: false,
            suppressHeaderMenuButton: true,
            valueGetter: (p) => f(p)?.heatingBtuh ?? null,
            valueFormatter: (p) => fmtInt(p.value),
            cellClass: "num cell-computed cell-heat",
          },
          {
            colId: `cool_${facing}`,
            headerName: "Cool",
            headerTooltip: `Cooling total (sensible + latent) at the design peak with the front facing ${facing}, Btu/h`,
            width: 68,
            pinned: "right",
            editable: false,
            filter: false,
            suppressHeaderMenuButton: true,
            valueGetter: (p) => f(p)?.coolingTotalBtuh ?? null,
            valueFormatter: (p) => fmtInt(p.value),
            cellClass: (p) => ["num", "cell-computed", "cell-cool", ...(worst(p) ? ["cell-worst"] : [])],
          },
          {
            colId: `tons_${facing}`,
            headerName: "Tons",
            headerTooltip: "Cooling total ÷ 12,000 Btu/h",
            width: 52,
            pinned: "right",
            editable: false,
            filter: false,
            suppressHeaderMenuButton: true,
            valueGetter: (p) => f(p)?.tons ?? null,
            valueFormatter: (p) => (p.value === null ? "" : Number(p.value).toFixed(2)),
            cellClass: "num cell-computed",
          },
        ],
      };
    };
    const worstOf = (p: { data?: LibraryPlan }) =>
      p.data?.loads?.facings.find((x) => x.label === p.data?.loads?.worst.label);
    const worstGroup: ColGroupDef<LibraryPlan> = {
      headerName: "Worst facing (Btu/h)",
      children: [
        {
          colId: "heat_worst",
          headerName: "Heat",
          headerTooltip: "Heating load (the same for every facing), Btu/h",
          width: 68,
          pinned: "right",
          editable: false,
          filter: false,
          valueGetter: (p) => worstOf(p)?.heatingBtuh ?? null,
          valueFormatter: (p) => fmtInt(p.value),
          cellClass: "num cell-computed cell-heat",
        },
        {
          colId: "cool_worst",
          headerName: "Cool",
          headerTooltip: "Cooling total at the worst facing, Btu/h",
          width: 68,
          pinned: "right",
          editable: false,
          filter: false,
          valueGetter: (p) => worstOf(p)?.coolingTotalBtuh ?? null,
          valueFormatter: (p) => fmtInt(p.value),
          cellClass: "num cell-computed cell-cool cell-worst",
        },
        {
          colId: "tons_worst",
          headerName: "Tons",
          width: 52,
          pinned: "right",
          editable: false,
          filter: false,
          valueGetter: (p) => worstOf(p)?.tons ?? null,
          valueFormatter: (p) => (p.value === null ? "" : Number(p.value).toFixed(2)),
          cellClass: "num cell-computed",
        },
      ],
    };
    return [
      {
        colId: "open",
        headerName: "",
        width: 58,
        pinned: "left",
        editable: false,
        sortable: false,
        filter: false,
        cellRenderer: (p: { data?: LibraryPlan }) =>
          p.data ? (
            <Link
              href={`/plans/${p.data.id}${communityId ? `?communityId=${communityId}` : ""}`}
              className="text-accent-700 hover:underline"
              data-testid={`open-${p.data.planCode}`}
            >
              Sheet
            </Link>
          ) : null,
      },
      {
        colId: "revision",
        headerName: "Rev.",
        width: 76,
        pinned: "left",
        editable: false,
        valueGetter: (p) =>
          p.data ? `${p.data.revisionNumber} ${p.data.revisionStatus === "approved" ? "✓" : "draft"}` : "",
        headerTooltip: "Revision number; ✓ approved (locked: an edit starts a new draft)",
      },
      ...groups,
      ...(allFacings ? FACINGS.map(computed) : [worstGroup]),
      {
        headerName: "All facings (Btu/h)",
        children: [
          {
            colId: "worst",
            headerName: "Worst",
            headerTooltip: "The facing with the largest cooling total",
            width: 62,
            pinned: "right",
            editable: false,
            filter: false,
            suppressHeaderMenuButton: true,
            valueGetter: (p) =>
              p.data?.loads ? p.data.loads.worst.label : p.data?.loadsError ? "error" : "",
            tooltipValueGetter: (p) => p.data?.loadsError ?? undefined,
            cellClass: "cell-computed",
          },
          {
            colId: "spread",
            headerName: "Spread",
            headerTooltip: "Largest minus smallest cooling total over the four facings, Btu/h",
            width: 66,
            pinned: "right",
            editable: false,
            filter: false,
            suppressHeaderMenuButton: true,
            valueGetter: (p) => p.data?.loads?.coolingSpreadBtuh ?? null,
            valueFormatter: (p) => fmtInt(p.value),
            cellClass: "num cell-computed",
          },
        ],
      },
    ];
  }, [allFacings, canEdit, cellErrors, communityId, saveCells]);

  const onCellKeyDown = useCallback(
    (event: CellKeyDownEvent<LibraryPlan>) => {
      const e = event.event as KeyboardEvent | null;
      if (!e || !event.data) return;
      if ((e.ctrlKey || e.metaKey) && e.key.toLowerCase() === "c" && !event.api.getEditingCells().length) {
        // AG Grid Community has no clipboard module: copy the selected rows' visible cells (as entered,
        // formulas kept) as tab-separated lines, or the focused cell alone, for pasting into a spreadsheet.
        const keys = event.api
          .getAllDisplayedColumns()
          .map((c) => c.getColId())
          .filter((k) => PLAN_COLUMN_BY_KEY.has(k));
        const rows = event.api.getSelectedRows();
        const key = event.column.getColId();
        const textOut =
          rows.length > 0
            ? rows.map((r) => keys.map((k) => text(r.cells[k])).join("\t")).join("\n")
            : PLAN_COLUMN_BY_KEY.has(key)
              ? text(event.data.cells[key])
              : String(event.value ?? "");
        void navigator.clipboard?.writeText(textOut).then(
          () =>
            setBanner({
              kind: "info",
              text:
                rows.length > 0
                  ? `Copied ${rows.length} model(s) × ${keys.length} columns.`
                  : "Copied the cell.",
            }),
          () => setBanner({ kind: "error", text: "The browser did not allow copying to the clipboard." }),
        );
        return;
      }
      if ((e.ctrlKey || e.metaKey) && e.key.toLowerCase() === "z") {
        e.preventDefault();
        const last = undoStack.at(-1);
        if (last) undo.mutate(last);
        return;
      }
      const key = event.column.getColId();
      if (
        e.key === "Delete" &&
        canEdit &&
        PLAN_COLUMN_BY_KEY.has(key) &&
        !event.api.getEditingCells().length
      ) {
        const column = PLAN_COLUMN_BY_KEY.get(key)!;
        if (column.required) {
          setBanner({ kind: "error", text: `${column.header} is required and cannot be cleared.` });
          return;
        }
        saveCells([{ planId: event.data.id, version: event.data.version, cells: { [key]: "" } }], "edit");
      }
    },
    [canEdit, saveCells, undo, undoStack],
  );

  /** A block copied from a spreadsheet lands in the focused cell's block (AG Grid Community has no clipboard module). */
  const onPaste = useCallback(
    (event: React.ClipboardEvent) => {
      const grid = gridApi.current;
      if (!grid || !canEdit || grid.getEditingCells().length > 0) return;
      const focused = grid.getFocusedCell();
      if (!focused) return;
      const block = parsePastedBlock(event.clipboardData.getData("text/plain"));
      if (block.length === 0) return;
      event.preventDefault();
      const visibleKeys = grid.getAllDisplayedColumns().map((c) => c.getColId());
      let placed;
      try {
        placed = placePastedBlock(
          block,
          visibleKeys,
          focused.column.getColId(),
          new Set(PLAN_COLUMNS.map((c) => c.key)),
        );
      } catch (error) {
        setBanner({ kind: "error", text: (error as Error).message });
        return;
      }
      const byPlan = new Map<number, CellChange>();
      let rowsPastEnd = 0;
      for (const cell of placed.cells) {
        const node = grid.getDisplayedRowAtIndex(focused.rowIndex + cell.rowOffset);
        if (!node?.data) {
          rowsPastEnd++;
          continue;
        }
        const change = byPlan.get(node.data.id) ?? {
          planId: node.data.id,
          version: node.data.version,
          cells: {},
        };
        change.cells[cell.key] = cell.text;
        byPlan.set(node.data.id, change);
      }
      const skipped = placed.droppedCells + placed.readOnlyCells + rowsPastEnd;
      if (skipped > 0 && byPlan.size === 0) {
        setBanner({
          kind: "error",
          text: `Nothing pasted: all ${skipped} cells fall outside the editable grid.`,
        });
        return;
      }
      const pasted = [...byPlan.values()].map((change) => {
        const plan = library.data?.plans.find((p) => p.id === change.planId);
        return plan ? { ...change, cells: withOneAirLeakageFigure(plan.cells, change.cells) } : change;
      });
      saveCells(pasted, "paste");
      if (skipped > 0)
        setBanner({
          kind: "info",
          text: `${skipped} pasted cell(s) fell outside the editable grid and were left out.`,
        });
    },
    [canEdit, saveCells, library.data],
  );

  const applyBulk = () => {
    const plans = library.data?.plans.filter((p) => selectedIds.includes(p.id)) ?? [];
    if (plans.length === 0) {
      setBanner({ kind: "error", text: "Select the plan models to change first (tick their boxes)." });
      return;
    }
    saveCells(
      plans.map((p) => ({
        planId: p.id,
        version: p.version,
        cells: withOneAirLeakageFigure(p.cells, { [bulkKey]: bulkValue }),
      })),
      "bulk_edit",
    );
  };

  if (library.isPending) return <p className="text-zinc-500">Loading the plan library…</p>;
  if (library.isError) return <FormError message={library.error.message} />;
  const data = library.data;

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-4 rounded border border-zinc-200 bg-white px-3 py-2">
        <div>
          <label htmlFor="reference-community" className="block text-xs font-medium text-zinc-600">
            Design conditions from
          </label>
          <select
            id="reference-community"
            className="rounded border border-zinc-300 bg-white px-2 py-1"
            value={data.reference.community?.id ?? ""}
            onChange={(e) => setCommunityId(Number(e.target.value) || null)}
          >
            {data.reference.communities.length === 0 ? <option value="">No community yet</option> : null}
            {data.reference.communities.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </select>
        </div>
        <p
          className="max-w-64 text-xs text-zinc-600"
          data-testid="library-procedure"
          title={data.procedureLabel}
        >
          Computed columns by{" "}
          <span className="font-medium text-zinc-800">{PROCEDURE_SHORT_LABELS[data.procedure]}</span>, the
          account&apos;s procedure (open a sheet to compare both)
        </p>
        <div>
          <label htmlFor="jump-column" className="block text-xs font-medium text-zinc-600">
            Go to column
          </label>
          <select
            id="jump-column"
            className="max-w-56 rounded border border-zinc-300 bg-white px-2 py-1"
            value=""
            onChange={(e) => {
              const key = e.target.value;
              const grid = gridApi.current;
              if (!key || !grid) return;
              grid.ensureColumnVisible(key, "middle");
              const first = grid.getDisplayedRowAtIndex(0);
              if (first) grid.setFocusedCell(0, key);
            }}
          >
            <option value="">Choose…</option>
            {PLAN_COLUMN_GROUPS.map((g) => (
              <optgroup key={g} label={g}>
                {PLAN_COLUMNS.filter((c) => c.group === g).map((c) => (
                  <option key={c.key} value={c.key}>
                    {c.header}
                  </option>
                ))}
              </optgroup>
            ))}
          </select>
        </div>
        {canEdit ? (
          <div className="flex items-end gap-2" data-testid="bulk-edit">
            <div>
              <label htmlFor="bulk-column" className="block text-xs font-medium text-zinc-600">
                Set on {selectedIds.length} selected
              </label>
              <select
                id="bulk-column"
                className="max-w-64 rounded border border-zinc-300 bg-white px-2 py-1"
                value={bulkKey}
                onChange={(e) => setBulkKey(e.target.value)}
              >
                {PLAN_COLUMN_GROUPS.map((g) => (
                  <optgroup key={g} label={g}>
                    {PLAN_COLUMNS.filter((c) => c.group === g && c.key !== "plan_code").map((c) => (
                      <option key={c.key} value={c.key}>
                        {c.header}
                      </option>
                    ))}
                  </optgroup>
                ))}
              </select>
            </div>
            <div>
              <label htmlFor="bulk-value" className="block text-xs font-medium text-zinc-600">
                Value or formula
              </label>
              <input
                id="bulk-value"
                className="w-32 rounded border border-zinc-300 px-2 py-1"
                value={bulkValue}
                onChange={(e) => setBulkValue(e.target.value)}
                placeholder="R-49"
              />
            </div>
            <Button type="button" onClick={applyBulk} disabled={save.isPending}>
              Apply
            </Button>
            <Button
              type="button"
              variant="secondary"
              disabled={undoStack.length === 0 || undo.isPending}
              onClick={() => undo.mutate(undoStack.at(-1)!)}
              title="Ctrl+Z in the grid"
            >
              Undo last change
            </Button>
          </div>
        ) : null}
        {canEdit && selectedIds.length === 1 ? (
          <div className="flex items-end gap-2" data-testid="copy-model">
            <div>
              <label htmlFor="copy-code" className="block text-xs font-medium text-zinc-600">
                New model from the selected one: code
              </label>
              <input
                id="copy-code"
                className="w-28 rounded border border-zinc-300 px-2 py-1"
                value={copyCode}
                onChange={(e) => setCopyCode(e.target.value)}
                placeholder="AS-1450X"
              />
            </div>
            <div>
              <label htmlFor="copy-name" className="block text-xs font-medium text-zinc-600">
                name
              </label>
              <input
                id="copy-name"
                className="w-32 rounded border border-zinc-300 px-2 py-1"
                value={copyName}
                onChange={(e) => setCopyName(e.target.value)}
                placeholder="Aster with loft"
              />
            </div>
            <Button
              type="button"
              variant="secondary"
              disabled={copyModel.isPending}
              onClick={() => copyModel.mutate(selectedIds[0])}
            >
              Create copy
            </Button>
          </div>
        ) : null}
        <label className="flex items-center gap-1.5 text-xs text-zinc-700">
          <input
            type="checkbox"
            checked={allFacings}
            onChange={(e) => setAllFacings(e.target.checked)}
            data-testid="toggle-facings"
          />
          Show all four facings
        </label>
        <div className="ml-auto">
          <TableFileLinks base="/api/plans" query={communityId ? `&communityId=${communityId}` : ""} />
        </div>
      </div>

      {banner ? (
        <div
          data-testid={banner.kind === "error" ? "grid-error" : "grid-notice"}
          className={`rounded border px-3 py-2 text-xs ${banner.kind === "error" ? "border-red-200 bg-red-50 text-red-800" : "border-accent-100 bg-accent-50 text-accent-800"}`}
        >
          <p>{banner.text}</p>
          {banner.details && banner.details.length > 0 ? (
            <ul className="mt-1 list-disc pl-5">
              {banner.details.slice(0, 20).map((d) => (
                <li key={d}>{d}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}

      <div onPaste={onPaste} data-testid="plan-grid" style={{ height: "min(70vh, 760px)" }}>
        <AgGridReact<LibraryPlan>
          theme={gridTheme}
          rowData={data.plans}
          columnDefs={columnDefs}
          getRowId={(p) => String(p.data.id)}
          defaultColDef={{ sortable: true, filter: true, resizable: true, suppressHeaderMenuButton: false }}
          rowSelection={{
            mode: "multiRow",
            checkboxes: true,
            headerCheckbox: true,
            enableClickSelection: false,
          }}
          selectionColumnDef={{ pinned: "left", width: 40 }}
          onSelectionChanged={(e) => setSelectedIds(e.api.getSelectedRows().map((r) => r.id))}
          onGridReady={(e: GridReadyEvent<LibraryPlan>) => {
            gridApi.current = e.api;
          }}
          onCellKeyDown={onCellKeyDown}
          enterNavigatesVertically
          enterNavigatesVerticallyAfterEdit
          stopEditingWhenCellsLoseFocus
          tooltipShowDelay={300}
          undoRedoCellEditing={false}
          suppressColumnVirtualisation
        />
      </div>
      <p className="text-xs text-zinc-500">
        Enter edits and moves down, Tab moves right, Escape cancels, Delete clears, Ctrl+C copies the selected
        models (or the cell), Ctrl+Z undoes the last saved change. Cells take numbers with units
        (&quot;R-19&quot;, &quot;1,250 sf&quot;) or formulas (<code>=38*9-2*15</code>,{" "}
        <code>=front_wall_ft2*0.15</code>; hover a header for its formula name). Computed columns (tinted) are
        read-only. Paste a block copied from a spreadsheet into the focused cell.
      </p>
      {canEdit ? (
        <PlanImportPanel onImported={() => queryClient.invalidateQueries({ queryKey: ["plans"] })} />
      ) : null}
      <Caution />
    </div>
  );
}

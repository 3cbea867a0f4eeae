"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { ColDef, GridApi, IRowNode } from "ag-grid-community";
import { AgGridReact } from "ag-grid-react";
import { useCallback, useMemo, useRef, useState } from "react";
import { fmtInt, gridTheme } from "@/components/grid/grid-theme";
import { Button } from "@/components/ui/field";
import type { LotResults } from "@/db/recompute";
import { api, ApiError } from "@/lib/client/api";
import type { LoadProcedure } from "@/lib/load/results";
import { PROCEDURE_SHORT_LABELS } from "@/lib/reports/procedure-text";
import { facingLabel, parseFacing } from "@/lib/workbook/facing";
import { LOT_STATUSES } from "@/lib/workbook/lot-columns";

/** The loads a lot keeps (db/recompute.ts); a type-only import, nothing of the database reaches the browser. */
type LotLoads = LotResults;

export interface GridLot {
  id: number;
  lotNumber: string;
  address: string;
  planId: number | null;
  planCode: string | null;
  facingDeg: number;
  optionsNote: string;
  status: (typeof LOT_STATUSES)[number];
  plannedStart: string | null;
  loads: LotLoads | null;
  frozen: boolean;
  currentDiffers: boolean;
  snapshotRevisionNumber: number | null;
  liveLoads: LotLoads | null;
  /** The procedure of the loads shown (a frozen lot's snapshot's), and of the live results. */
  procedure: LoadProcedure | null;
  liveProcedure: LoadProcedure | null;
  equipmentSystemId: number | null;
  equipmentOverride: boolean;
  systemCode: string | null;
  systemFits: boolean | null;
  systemReasons: string[];
  noFitReason: string | null;
  bestFitCode: string | null;
  coolingPctOfLoad: number | null;
  version: number;
}

interface GroupRow {
  kind: "group";
  id: string;
  planCode: string;
  count: number;
  minCool: number;
  maxCool: number;
}

type Row = GridLot | GroupRow;
const isGroup = (r: Row | undefined): r is GroupRow => !!r && (r as GroupRow).kind === "group";

const STATUS_LABELS: Record<string, string> = {
  planned: "Planned",
  permit_submitted: "Permit submitted",
  permitted: "Permitted",
  built: "Built",
};

const BEST_FIT = "(best fit)";

export function LotsGrid({
  communityId,
  canEdit,
  canPermit,
  canOverride,
}: {
  communityId: number;
  canEdit: boolean;
  canPermit: boolean;
  canOverride: boolean;
}) {
  const queryClient = useQueryClient();
  const key = useMemo(() => ["lots", communityId], [communityId]);
  const lotsQuery = useQuery({
    queryKey: key,
    queryFn: () =>
      api<{ lots: GridLot[]; accountProcedure: LoadProcedure }>(`/api/communities/${communityId}/lots`),
  });
  const plansQuery = useQuery({
    queryKey: ["plan-codes"],
    queryFn: () => api<{ plans: { id: number; planCode: string; name: string }[] }>("/api/plans/codes"),
  });
  const systemsQuery = useQuery({
    queryKey: ["equipment"],
    queryFn: () =>
      api<{ systems: { id: number; cells: Record<string, string | number | null> }[] }>("/api/equipment"),
  });
  const gridApi = useRef<GridApi<Row> | null>(null);
  const [banner, setBanner] = useState<{ kind: "error" | "info"; text: string } | null>(null);
  const [selected, setSelected] = useState<GridLot[]>([]);
  const [grouped, setGrouped] = useState(false);
  const [collapsed, setCollapsed] = useState<Set<string>>(new Set());
  const [bulkFacing, setBulkFacing] = useState("");
  const [bulkPlanId, setBulkPlanId] = useState("");

  const onError = (e: Error) =>
    setBanner({
      kind: "error",
      text:
        e.message +
        (e instanceof ApiError && e.fieldErrors.length
          ? ` ${e.fieldErrors.map((f) => f.message).join("; ")}`
          : ""),
    });
  const refresh = () => queryClient.invalidateQueries({ queryKey: key });

  const edit = useMutation({
    mutationFn: (
      changes: {
        lotId: number;
        version: number;
        planId?: number;
        facing?: string;
        address?: string;
        optionsNote?: string;
        plannedStart?: string | null;
      }[],
    ) =>
      api<{ edited: number; recomputed: number; loadsChanged: number }>(
        `/api/communities/${communityId}/lots`,
        { method: "PATCH", body: { changes } },
      ),
    onSuccess: (r) =>
      setBanner({
        kind: "info",
        text: `Saved ${r.edited} lot${r.edited === 1 ? "" : "s"}; ${r.loadsChanged} with changed loads.`,
      }),
    onError,
    onSettled: refresh,
  });
  const status = useMutation({
    mutationFn: (v: { lotId: number; version: number; status: string; refresh?: boolean }) =>
      api<{ frozen: boolean }>(`/api/lots/${v.lotId}/status`, { method: "POST", body: v }),
    onSuccess: (r, v) =>
      setBanner({
        kind: "info",
        text: v.refresh
          ? "A new permit snapshot was taken from the current plan."
          : r.frozen
            ? "Submitted for permit: the lot's inputs and results are frozen."
            : "Status saved.",
      }),
    onError,
    onSettled: refresh,
  });

  const override = useMutation({
    mutationFn: (v: { lotId: number; version: number; systemId: number | null }) =>
      api(`/api/lots/${v.lotId}/equipment`, { method: "POST", body: v }),
    onSuccess: (_r, v) =>
      setBanner({
        kind: "info",
        text: v.systemId
          ? "System set by hand; it is kept when loads change."
          : "Back to the best-fitting system.",
      }),
    onError,
    onSettled: refresh,
  });

  const planCodes = plansQuery.data?.plans ?? [];
  const systemCodes = (systemsQuery.data?.systems ?? []).map((x) => ({
    id: x.id,
    code: String(x.cells.system_code),
  }));
  const columnDefs = useMemo<ColDef<Row>[]>(() => {
    const lot = (p: { data?: Row }) => (isGroup(p.data) ? undefined : p.data);
    const loads = (p: { data?: Row }) => lot(p)?.loads ?? null;
    const num = (field: keyof LotLoads, header: string, cls: string, width = 96): ColDef<Row> => ({
      colId: field,
      headerName: header,
      width,
      editable: false,
      valueGetter: (p) => (loads(p)?.[field] as number | undefined) ?? null,
      valueFormatter: (p) => fmtInt(p.value),
      cellClass: `num cell-computed ${cls}`,
      filter: "agNumberColumnFilter",
    });
    return [
      {
        colId: "lot",
        headerName: "Lot",
        width: 90,
        pinned: "left",
        valueGetter: (p) => lot(p)?.lotNumber,
        editable: false,
      },
      {
        colId: "report",
        headerName: "",
        width: 64,
        pinned: "left",
        editable: false,
        sortable: false,
        filter: false,
        headerTooltip: "The lot's load report (PDF)",
        cellRenderer: (p: { data?: Row }) => {
          const l = lot(p);
          return l && l.loads ? (
            <a
              href={`/api/lots/${l.id}/report`}
              target="_blank"
              rel="noreferrer"
              className="text-accent-700 hover:underline"
              data-testid={`report-${l.lotNumber}`}
            >
              Report
            </a>
          ) : null;
        },
      },
      {
        colId: "address",
        headerName: "Address",
        width: 180,
        editable: (p) => canEdit && !!lot(p),
        valueGetter: (p) => lot(p)?.address,
        valueSetter: (p) => save(p.data, { address: String(p.newValue ?? "") }),
      },
      {
        colId: "plan",
        headerName: "Plan",
        width: 110,
        editable: (p) => canEdit && !!lot(p) && !lot(p)!.frozen,
        valueGetter: (p) => lot(p)?.planCode ?? "",
        cellEditor: "agSelectCellEditor",
        cellEditorParams: { values: planCodes.map((p) => p.planCode) },
        valueSetter: (p) => {
          const plan = planCodes.find((x) => x.planCode === p.newValue);
          return plan ? save(p.data, { planId: plan.id }) : false;
        },
      },
      {
        colId: "revision",
        headerName: "Rev.",
        width: 64,
        editable: false,
        valueGetter: (p) =>
          (lot(p)?.frozen ? lot(p)?.snapshotRevisionNumber : loads(p)?.revisionNumber) ?? "",
      },
      {
        colId: "facing",
        headerName: "Facing",
        width: 100,
        editable: (p) => canEdit && !!lot(p) && !lot(p)!.frozen,
        valueGetter: (p) => (lot(p) ? facingLabel(lot(p)!.facingDeg) : ""),
        comparator: (_a, _b, na, nb) =>
          ((na.data as GridLot)?.facingDeg ?? 0) - ((nb.data as GridLot)?.facingDeg ?? 0),
        headerTooltip: "Where the front door faces: N, NE, … or degrees from north",
        valueSetter: (p) => {
          const read = parseFacing(String(p.newValue ?? ""));
          if (!read.ok) {
            setBanner({ kind: "error", text: `Facing ${read.reason}. Nothing was saved.` });
            return false;
          }
          return save(p.data, { facing: String(read.deg) });
        },
      },
      {
        colId: "options",
        headerName: "Options note",
        width: 150,
        editable: (p) => canEdit && !!lot(p),
        valueGetter: (p) => lot(p)?.optionsNote,
        valueSetter: (p) => save(p.data, { optionsNote: String(p.newValue ?? "") }),
      },
      {
        colId: "status",
        headerName: "Status",
        width: 140,
        editable: (p) => canPermit && !!lot(p),
        valueGetter: (p) => (lot(p) ? STATUS_LABELS[lot(p)!.status] : ""),
        cellEditor: "agSelectCellEditor",
        cellEditorParams: { values: Object.values(STATUS_LABELS) },
        valueSetter: (p) => {
          const target = Object.entries(STATUS_LABELS).find(([, label]) => label === p.newValue)?.[0];
          const l = lot(p);
          if (!l || !target || target === l.status) return false;
          status.mutate({ lotId: l.id, version: l.version, status: target });
          return false;
        },
      },
      {
        colId: "snapshot",
        headerName: "Permit copy",
        width: 130,
        editable: false,
        valueGetter: (p) =>
          lot(p)?.frozen ? (lot(p)!.currentDiffers ? "frozen · plan differs" : "frozen") : "",
        tooltipValueGetter: (p) => {
          const l = lot(p);
          if (!l?.frozen) return undefined;
          const byOther =
            l.liveProcedure && l.procedure && l.liveProcedure !== l.procedure
              ? ` by ${PROCEDURE_SHORT_LABELS[l.liveProcedure]} (the snapshot's loads are by ${PROCEDURE_SHORT_LABELS[l.procedure]})`
              : "";
          return l.currentDiffers && l.liveLoads
            ? `Frozen at permit submission. The current plan would give cooling ${fmtInt(l.liveLoads.coolingTotalBtuh)} Btu/h and heating ${fmtInt(l.liveLoads.heatingBtuh)} Btu/h${byOther}; take a new snapshot to use it.`
            : "Frozen at permit submission; later plan edits do not change it.";
        },
        cellClass: (p) => (lot(p)?.currentDiffers ? "cell-error" : ""),
      },
      num("heatingBtuh", "Heating (Btu/h)", "cell-heat"),
      num("coolingSensibleBtuh", "Cool sens. (Btu/h)", "cell-cool"),
      num("coolingLatentBtuh", "Cool lat. (Btu/h)", "cell-cool"),
      num("coolingTotalBtuh", "Cool total (Btu/h)", "cell-cool"),
      {
        colId: "tons",
        headerName: "Tons",
        width: 66,
        editable: false,
        valueGetter: (p) => loads(p)?.tons ?? null,
        valueFormatter: (p) => (p.value === null ? "" : Number(p.value).toFixed(2)),
        cellClass: "num cell-computed",
      },
      num("floorAreaPerTonFt2", "ft²/ton", "", 76),
      {
        colId: "procedure",
        headerName: "Procedure",
        width: 150,
        editable: false,
        headerTooltip: "The load procedure of the loads shown: the account's, or a frozen lot's snapshot's",
        valueGetter: (p) => {
          const procedure = lot(p)?.procedure;
          return procedure ? PROCEDURE_SHORT_LABELS[procedure] : "";
        },
        cellClass: "cell-computed",
      },
      {
        colId: "rank",
        headerName: "Facing rank",
        width: 88,
        editable: false,
        headerTooltip: "1–4: where this facing's cooling falls among the plan's four facings (1 = highest)",
        valueGetter: (p) => loads(p)?.facingRank ?? null,
        cellClass: "num cell-computed",
      },
      {
        colId: "changed",
        headerName: "Changed",
        width: 84,
        editable: false,
        valueGetter: (p) => (loads(p)?.changed && !lot(p)?.frozen ? "changed" : ""),
        tooltipValueGetter: (p) => {
          const l = loads(p);
          const procedureChange =
            l?.previous?.procedure && l.procedure && l.previous.procedure !== l.procedure
              ? ` (procedure ${PROCEDURE_SHORT_LABELS[l.previous.procedure]} → ${PROCEDURE_SHORT_LABELS[l.procedure]})`
              : "";
          return l?.changed && l.previous
            ? `Last recompute changed this lot: cooling ${fmtInt(l.previous.coolingTotalBtuh)} → ${fmtInt(l.coolingTotalBtuh)} Btu/h, heating ${fmtInt(l.previous.heatingBtuh)} → ${fmtInt(l.heatingBtuh)} Btu/h${procedureChange}.`
            : undefined;
        },
        cellClass: "cell-computed",
      },
      {
        colId: "equipment",
        headerName: "System",
        width: 150,
        pinned: "right",
        editable: (p) => canOverride && !!lot(p) && !lot(p)!.frozen,
        valueGetter: (p) => {
          const l = lot(p);
          if (!l) return "";
          if (!l.systemCode) return l.noFitReason ? "none fits" : "";
          return `${l.systemCode}${l.equipmentOverride ? " (by hand)" : ""}`;
        },
        cellEditor: "agSelectCellEditor",
        cellEditorParams: { values: [BEST_FIT, ...systemCodes.map((x) => x.code)] },
        valueSetter: (p) => {
          const l = lot(p);
          if (!l) return false;
          const systemId =
            p.newValue === BEST_FIT ? null : (systemCodes.find((x) => x.code === p.newValue)?.id ?? null);
          if (p.newValue !== BEST_FIT && systemId === null) return false;
          override.mutate({ lotId: l.id, version: l.version, systemId });
          return false;
        },
        tooltipValueGetter: (p) => {
          const l = lot(p);
          if (!l) return undefined;
          if (!l.systemCode)
            return l.noFitReason
              ? `No system in the catalog fits: ${l.noFitReason}`
              : "Not selected yet (no catalog?)";
          const ratio = l.coolingPctOfLoad
            ? ` Cooling capacity ${Math.round(l.coolingPctOfLoad)} % of the load.`
            : "";
          if (l.systemFits === false)
            return `Chosen by hand but outside the sizing limits: ${l.systemReasons.join("; ")}.${ratio}`;
          return `${l.equipmentOverride ? `Chosen by hand (best fit would be ${l.bestFitCode ?? "none"}).` : "Best fit within the account's sizing limits."}${ratio}`;
        },
        cellClass: (p) => {
          const l = lot(p);
          return l && (!l.systemCode || l.systemFits === false) && (l.noFitReason || l.systemCode)
            ? "cell-error"
            : "";
        },
      },
      {
        colId: "start",
        headerName: "Planned start",
        width: 116,
        editable: (p) => canEdit && !!lot(p),
        valueGetter: (p) => lot(p)?.plannedStart ?? "",
        valueSetter: (p) => save(p.data, { plannedStart: String(p.newValue ?? "").trim() || null }),
      },
    ];
    function save(row: Row | undefined, change: Record<string, unknown>) {
      if (!row || isGroup(row)) return false;
      edit.mutate([{ lotId: row.id, version: row.version, ...change }]);
      return false;
    }
  }, [canEdit, canOverride, canPermit, edit, override, planCodes, status, systemCodes]);

  const rowData = useMemo<Row[]>(() => {
    const all = lotsQuery.data?.lots ?? [];
    if (!grouped) return all;
    const byPlan = new Map<string, GridLot[]>();
    for (const l of all)
      byPlan.set(l.planCode ?? "(no plan)", [...(byPlan.get(l.planCode ?? "(no plan)") ?? []), l]);
    const out: Row[] = [];
    for (const [planCode, items] of [...byPlan.entries()].sort(([a], [b]) => a.localeCompare(b))) {
      const cools = items.map((l) => l.loads?.coolingTotalBtuh ?? 0);
      out.push({
        kind: "group",
        id: `group-${planCode}`,
        planCode,
        count: items.length,
        minCool: Math.min(...cools),
        maxCool: Math.max(...cools),
      });
      if (!collapsed.has(planCode)) out.push(...items);
    }
    return out;
  }, [collapsed, grouped, lotsQuery.data]);

  const applyBulk = useCallback(() => {
    const lots = selected.filter((l) => !l.frozen);
    if (lots.length === 0) {
      setBanner({ kind: "error", text: "Select lots that are not frozen for permit first." });
      return;
    }
    const change: { facing?: string; planId?: number } = {};
    if (bulkFacing.trim()) {
      const read = parseFacing(bulkFacing);
      if (!read.ok) {
        setBanner({ kind: "error", text: `Facing ${read.reason}. Nothing was saved.` });
        return;
      }
      change.facing = String(read.deg);
    }
    if (bulkPlanId) change.planId = Number(bulkPlanId);
    if (!change.facing && !change.planId) {
      setBanner({ kind: "error", text: "Enter a facing or choose a plan to set on the selected lots." });
      return;
    }
    edit.mutate(lots.map((l) => ({ lotId: l.id, version: l.version, ...change })));
  }, [bulkFacing, bulkPlanId, edit, selected]);

  if (lotsQuery.isPending) return <p className="text-zinc-500">Loading lots…</p>;
  if (lotsQuery.isError) return <p className="text-red-700">{lotsQuery.error.message}</p>;
  const frozenSelected = selected.filter((l) => l.frozen);

  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-end gap-3">
        <label className="flex items-center gap-1.5 text-xs text-zinc-700">
          <input
            type="checkbox"
            checked={grouped}
            onChange={(e) => setGrouped(e.target.checked)}
            data-testid="group-by-plan"
          />
          Group by plan model
        </label>
        {canEdit ? (
          <div className="flex items-end gap-2" data-testid="lots-bulk">
            <div>
              <label htmlFor="bulk-facing" className="block text-xs font-medium text-zinc-600">
                Set facing on {selected.length} selected
              </label>
              <input
                id="bulk-facing"
                value={bulkFacing}
                onChange={(e) => setBulkFacing(e.target.value)}
                placeholder="SE or 135"
                className="w-28 rounded border border-zinc-300 px-2 py-1"
              />
            </div>
            <div>
              <label htmlFor="bulk-plan" className="block text-xs font-medium text-zinc-600">
                Set plan
              </label>
              <select
                id="bulk-plan"
                value={bulkPlanId}
                onChange={(e) => setBulkPlanId(e.target.value)}
                className="rounded border border-zinc-300 bg-white px-2 py-1"
              >
                <option value="">(keep)</option>
                {planCodes.map((p) => (
                  <option key={p.id} value={p.id}>
                    {p.planCode} {p.name}
                  </option>
                ))}
              </select>
            </div>
            <Button type="button" onClick={applyBulk} disabled={edit.isPending}>
              Apply to selected
            </Button>
          </div>
        ) : null}
        {canPermit && frozenSelected.length === 1 ? (
          <Button
            type="button"
            variant="secondary"
            onClick={() =>
              status.mutate({
                lotId: frozenSelected[0].id,
                version: frozenSelected[0].version,
                status: frozenSelected[0].status,
                refresh: true,
              })
            }
          >
            Take a new permit snapshot of lot {frozenSelected[0].lotNumber}
          </Button>
        ) : null}
        <span className="ml-auto text-xs text-zinc-600" data-testid="lots-procedure">
          Loads by {PROCEDURE_SHORT_LABELS[lotsQuery.data.accountProcedure]}
          {lotsQuery.data.lots.some(
            (l) => l.frozen && l.procedure !== null && l.procedure !== lotsQuery.data.accountProcedure,
          )
            ? "; frozen lots keep their snapshot's"
            : ""}
        </span>
        <span className="text-xs text-zinc-500" data-testid="lot-count">
          {lotsQuery.data.lots.length.toLocaleString()} lots
        </span>
      </div>
      {banner ? (
        <p
          data-testid={banner.kind === "error" ? "lots-error" : "lots-notice"}
          className={`rounded border px-3 py-2 text-xs ${banner.kind === "error" ? "border-red-200 bg-red-50 text-red-800" : "border-accent-100 bg-accent-50 text-accent-800"}`}
        >
          {banner.text}
        </p>
      ) : null}
      <div style={{ height: "min(68vh, 720px)" }} data-testid="lots-grid">
        <AgGridReact<Row>
          theme={gridTheme}
          rowData={rowData}
          columnDefs={columnDefs}
          getRowId={(p) => String(isGroup(p.data) ? p.data.id : p.data.id)}
          defaultColDef={{ sortable: !grouped, filter: true, resizable: true }}
          rowSelection={{
            mode: "multiRow",
            checkboxes: (p) => !isGroup(p.data),
            headerCheckbox: true,
            enableClickSelection: false,
            isRowSelectable: (n: IRowNode<Row>) => !isGroup(n.data),
          }}
          selectionColumnDef={{ pinned: "left", width: 40 }}
          onSelectionChanged={(e) =>
            setSelected(e.api.getSelectedRows().filter((r): r is GridLot => !isGroup(r)))
          }
          onGridReady={(e) => {
            gridApi.current = e.api;
          }}
          isFullWidthRow={(p) => isGroup(p.rowNode.data)}
          fullWidthCellRenderer={(p: { data?: Row }) => {
            const g = p.data as GroupRow;
            return (
              <button
                type="button"
                className="flex h-full w-full items-center gap-3 bg-zinc-100 px-3 text-left text-xs font-medium"
                onClick={() =>
                  setCollapsed((s) =>
                    s.has(g.planCode)
                      ? new Set([...s].filter((x) => x !== g.planCode))
                      : new Set([...s, g.planCode]),
                  )
                }
                data-testid={`group-${g.planCode}`}
              >
                <span>{collapsed.has(g.planCode) ? "▸" : "▾"}</span>
                <span>{g.planCode}</span>
                <span className="text-zinc-500">
                  {g.count} lots · cooling {fmtInt(g.minCool)}–{fmtInt(g.maxCool)} Btu/h
                </span>
              </button>
            );
          }}
          enterNavigatesVertically
          enterNavigatesVerticallyAfterEdit
          stopEditingWhenCellsLoseFocus
          tooltipShowDelay={300}
          suppressColumnVirtualisation
        />
      </div>
    </div>
  );
}

import { DataTable } from "@/components/ui/data-table";
import type { LoadProcedure } from "@/lib/load/results";
import { PROCEDURE_SHORT_LABELS } from "@/lib/reports/procedure-text";

interface SystemCount {
  systemCode: string;
  systemType: string;
  modelNumber: string;
  nominalTons: number | null;
  count: number;
  unitPriceUsd: number | null;
  extendedCostUsd: number | null;
}

/** What GET /api/communities/:id/equipment-schedule?format=json answers. */
export interface ScheduleData {
  community: { id: number; name: string };
  schedule: {
    systemTotals: SystemCount[];
    byMonth: (SystemCount & { month: string | null })[];
    totals: {
      lotCount: number;
      lotsWithSystem: number;
      lotsWithoutSystem: number;
      costUsd: number;
      unpricedSystemCount: number;
    };
    lotsWithoutSystem: { lotNumber: string; plannedStart: string | null; reason: string }[];
    caution: string;
  };
  limits: {
    coolingMinPct: number;
    coolingMaxPct: number;
    heatPumpCoolingMaxPct: number;
    heatingMinPct: number;
    heatingMaxPct: number;
  };
  lots: {
    lotId: number;
    lotNumber: string;
    status: string;
    plannedStart: string | null;
    systemCode: string | null;
    overridden: boolean;
    reason: string | null;
    procedure: LoadProcedure | null;
  }[];
  accountProcedure: LoadProcedure;
  procedures: { procedure: LoadProcedure; label: string; lotCount: number }[];
}

const SYSTEM_TYPE_LABELS: Record<string, string> = {
  "ac-furnace": "Air conditioner with furnace",
  "heat-pump": "Heat pump",
  "heat-pump-backup": "Heat pump with backup heat",
  furnace: "Furnace only",
};

const usd = (value: number | null) =>
  value === null ? "no price" : value.toLocaleString("en-US", { style: "currency", currency: "USD" });
const int = (value: number) => value.toLocaleString("en-US");

/** Counts per system, by month of planned start, totals and cost, lots without a system, the limits used. */
export function EquipmentScheduleView({ data }: { data: ScheduleData }) {
  const { schedule, limits } = data;
  const months = [...new Set(schedule.byMonth.map((l) => l.month ?? "no date"))];
  const codes = schedule.systemTotals.map((s) => s.systemCode);
  const monthCount = (month: string, code: string) =>
    schedule.byMonth.find((l) => (l.month ?? "no date") === month && l.systemCode === code)?.count ?? 0;

  return (
    <section className="flex flex-col gap-4" data-testid="equipment-schedule">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 className="text-sm font-semibold">Equipment schedule — {data.community.name}</h2>
        <p className="text-xs text-zinc-600" data-testid="schedule-totals">
          {int(schedule.totals.lotCount)} lots · {int(schedule.totals.lotsWithSystem)} with a system ·{" "}
          {int(schedule.totals.lotsWithoutSystem)} without · total cost {usd(schedule.totals.costUsd)}
          {schedule.totals.unpricedSystemCount > 0
            ? ` (${schedule.totals.unpricedSystemCount} systems without a price not included)`
            : ""}
        </p>
      </div>

      <DataTable
        testId="system-counts"
        rows={schedule.systemTotals}
        rowKey={(s) => s.systemCode}
        empty="No lot has a system yet."
        columns={[
          {
            header: "System",
            cell: (s) => <span data-testid={`system-code-${s.systemCode}`}>{s.systemCode}</span>,
          },
          { header: "Type", cell: (s) => SYSTEM_TYPE_LABELS[s.systemType] ?? s.systemType },
          { header: "Model numbers", cell: (s) => s.modelNumber },
          {
            header: "Nominal tons",
            numeric: true,
            cell: (s) => (s.nominalTons === null ? "—" : s.nominalTons.toFixed(1)),
          },
          {
            header: "Count",
            numeric: true,
            cell: (s) => <span data-testid={`system-count-${s.systemCode}`}>{int(s.count)}</span>,
          },
          { header: "Unit price", numeric: true, cell: (s) => usd(s.unitPriceUsd) },
          { header: "Extended cost", numeric: true, cell: (s) => usd(s.extendedCostUsd) },
        ]}
      />

      {months.length > 0 ? (
        <div>
          <h3 className="mb-1 text-xs font-semibold text-zinc-700">By month of planned start</h3>
          <DataTable
            testId="month-counts"
            rows={months}
            rowKey={(m) => m}
            empty=""
            columns={[
              { header: "Month", cell: (m) => m },
              ...codes.map((code) => ({
                header: code,
                numeric: true,
                cell: (m: string) => int(monthCount(m, code)),
              })),
              {
                header: "Lots",
                numeric: true,
                cell: (m: string) => int(codes.reduce((sum, code) => sum + monthCount(m, code), 0)),
              },
            ]}
          />
        </div>
      ) : null}

      <div>
        <h3 className="mb-1 text-xs font-semibold text-zinc-700">Lots without a system</h3>
        <DataTable
          testId="lots-without-system"
          rows={schedule.lotsWithoutSystem}
          rowKey={(l) => l.lotNumber}
          empty="Every lot has a system."
          columns={[
            { header: "Lot", cell: (l) => l.lotNumber },
            { header: "Planned start", cell: (l) => l.plannedStart ?? "no date" },
            { header: "Why", cell: (l) => l.reason },
          ]}
        />
      </div>

      <p className="text-xs text-zinc-600" data-testid="schedule-procedures">
        Systems chosen for loads by{" "}
        {data.procedures.length === 0
          ? "no procedure yet (no lot has loads)"
          : data.procedures
              .map(
                (p) =>
                  `${PROCEDURE_SHORT_LABELS[p.procedure]} (${int(p.lotCount)} lot${p.lotCount === 1 ? "" : "s"})`,
              )
              .join("; ")}
        . The account sizes equipment by {PROCEDURE_SHORT_LABELS[data.accountProcedure]}
        {data.procedures.some((p) => p.procedure !== data.accountProcedure)
          ? "; lots frozen for permit keep the procedure of their snapshot"
          : ""}
        .
      </p>
      <p className="text-xs text-zinc-600" data-testid="limits-used">
        Sizing limits used: cooling capacity {limits.coolingMinPct}–{limits.coolingMaxPct} % of the cooling
        total load (a heat pump where the heating load is the larger, up to {limits.heatPumpCoolingMaxPct} %);
        heating capacity at least {limits.heatingMinPct} % of the heating load, furnace output at most{" "}
        {limits.heatingMaxPct} %.
      </p>
      <p className="text-xs text-zinc-500">{schedule.caution}</p>
    </section>
  );
}

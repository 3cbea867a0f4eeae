"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import {
  Bar,
  BarChart,
  CartesianGrid,
  Legend,
  Line,
  LineChart,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import { fmtInt } from "@/components/grid/grid-theme";
import { ProcedureComparison, type ProcedureFacings } from "@/components/plans/procedure-comparison";
import { Caution } from "@/components/ui/caution";
import { Button, FormError, TextField } from "@/components/ui/field";
import { api, ApiError } from "@/lib/client/api";
import type { LoadProcedure, PlanFacings } from "@/lib/load/results";
import { PEAK_ONLY_NOTE, PROCEDURE_SHORT_LABELS } from "@/lib/reports/procedure-text";
import { readRowCells } from "@/lib/workbook/columns";
import { isFormula } from "@/lib/workbook/formula";
import { PLAN_COLUMN_BY_KEY, PLAN_COLUMN_GROUPS, PLAN_COLUMNS } from "@/lib/workbook/plan-columns";
import { PlanAssemblies } from "./plan-assemblies";

interface Sheet {
  plan: { id: number; planCode: string; name: string; version: number; updatedAt: string };
  reference: { communities: { id: number; name: string }[]; community: { id: number; name: string } | null };
  current: {
    id: number;
    number: number;
    status: "draft" | "approved";
    cells: Record<string, string | number | boolean | null>;
  };
  revisions: {
    id: number;
    number: number;
    status: string;
    createdAt: string;
    createdBy: string | null;
    approverName: string | null;
    approverCredential: string | null;
    approvedOn: string | null;
  }[];
  history: {
    id: number;
    action: string;
    summary: string;
    before: unknown;
    after: unknown;
    createdAt: string;
    userName: string | null;
  }[];
  /** The account's procedure's result: the one that sizes equipment. */
  result: PlanFacings | null;
  loadsError: string | null;
  accountProcedure: LoadProcedure;
  procedures: ProcedureFacings[];
}

const HEAT = "#b4441c";
const COOL = "#2360a8";
const FACING_COLORS: Record<string, string> = { N: "#2360a8", E: "#1f6f68", S: "#8a6d1f", W: "#b4441c" };
const COMPONENT_LABELS: Record<string, string> = {
  walls: "Walls",
  windows: "Windows",
  doors: "Doors",
  ceilings: "Ceilings",
  vaultedCeilings: "Vaulted ceilings",
  skylights: "Skylights",
  floors: "Floors",
  slab: "Slab",
  foundationWalls: "Foundation walls",
  garageWall: "Garage wall",
  infiltration: "Infiltration",
  ventilation: "Ventilation",
  ducts: "Ducts",
  internal: "Internal gains",
  temperatureSwing: "Indoor swing credit",
};

export function PlanSheet({
  planId,
  canEdit,
  canApprove,
  memberName,
  initialCommunityId,
}: {
  planId: number;
  canEdit: boolean;
  canApprove: boolean;
  memberName: string;
  initialCommunityId: number | null;
}) {
  const [communityId, setCommunityId] = useState<number | null>(initialCommunityId);
  const sheet = useQuery({
    queryKey: ["plan", planId, communityId ?? "default"],
    queryFn: () => api<Sheet>(`/api/plans/${planId}${communityId ? `?communityId=${communityId}` : ""}`),
  });
  if (sheet.isPending) return <p className="text-zinc-500">Loading the plan sheet…</p>;
  if (sheet.isError) return <FormError message={sheet.error.message} />;
  const s = sheet.data;
  const result = s.result;
  const worst = result?.facings.find((f) => f.label === result.worst.label) ?? null;
  // The 24-hour profile comes from a procedure that gives one: the account's, else the other one's for comparison.
  const hasProfile = (p: ProcedureFacings) =>
    !!p.result && p.result.facings.every((f) => f.cooling.hourlySensibleBtuh.length === 24);
  const profileSource =
    s.procedures.find((p) => p.sizesEquipment && hasProfile(p)) ?? s.procedures.find(hasProfile) ?? null;

  return (
    <div className="flex flex-col gap-5" data-testid="plan-sheet">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <Link href="/plans" className="text-xs text-accent-700 hover:underline">
            ← Plan library
          </Link>
          <h1 className="text-lg font-semibold tracking-tight">
            {s.plan.planCode} · {s.plan.name}
          </h1>
          <p className="text-zinc-600" data-testid="revision-state">
            Revision {s.current.number} —{" "}
            {s.current.status === "approved" ? "approved (locked; an edit starts a new draft)" : "draft"}
          </p>
        </div>
        <div>
          <label htmlFor="sheet-community" className="block text-xs font-medium text-zinc-600">
            Design conditions from
          </label>
          <select
            id="sheet-community"
            className="rounded border border-zinc-300 bg-white px-2 py-1"
            value={s.reference.community?.id ?? ""}
            onChange={(e) => setCommunityId(Number(e.target.value) || null)}
          >
            {s.reference.communities.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </select>
        </div>
      </div>

      {s.loadsError ? <FormError message={s.loadsError} /> : null}

      {result ? (
        <section aria-labelledby="facing-heading" className="rounded border border-zinc-200 bg-white p-3">
          <h2 id="facing-heading" className="mb-2 text-sm font-semibold">
            Loads by facing —{" "}
            <span data-testid="facing-procedure">{PROCEDURE_SHORT_LABELS[result.procedure]}</span>, the
            procedure that sizes equipment
          </h2>
          <table className="w-full border-collapse text-sm" data-testid="facing-matrix">
            <thead className="bg-zinc-100 text-xs text-zinc-600">
              <tr>
                <th className="px-2 py-1.5 text-left font-medium">Front faces</th>
                <th className="px-2 py-1.5 text-right font-medium">Heating (Btu/h)</th>
                <th className="px-2 py-1.5 text-right font-medium">Cooling sensible (Btu/h)</th>
                <th className="px-2 py-1.5 text-right font-medium">Cooling latent (Btu/h)</th>
                <th className="px-2 py-1.5 text-right font-medium">Cooling total (Btu/h)</th>
                <th className="px-2 py-1.5 text-right font-medium">Tons</th>
                <th className="px-2 py-1.5 text-right font-medium">ft² per ton</th>
                <th className="px-2 py-1.5 text-right font-medium">SHR</th>
                <th className="px-2 py-1.5 text-right font-medium">Peak hour (solar)</th>
                <th className="px-2 py-1.5 text-right font-medium">Airflow (cfm)</th>
              </tr>
            </thead>
            <tbody>
              {result.facings.map((f) => (
                <tr
                  key={f.label}
                  className={`border-t border-zinc-200 ${f.label === result.worst.label ? "font-semibold" : ""}`}
                  data-testid={`facing-${f.label}`}
                >
                  <td className="px-2 py-1">
                    {f.label}
                    {f.label === result.worst.label ? (
                      <span className="ml-1 text-xs font-normal text-zinc-500">(worst)</span>
                    ) : null}
                  </td>
                  <td className="num px-2 py-1 text-heat-700">{fmtInt(f.heating.totalBtuh)}</td>
                  <td className="num px-2 py-1 text-cool-700">{fmtInt(f.cooling.sensibleBtuh)}</td>
                  <td className="num px-2 py-1 text-cool-700">{fmtInt(f.cooling.latentBtuh)}</td>
                  <td className="num px-2 py-1 text-cool-700">{fmtInt(f.cooling.totalBtuh)}</td>
                  <td className="num px-2 py-1">{f.cooling.tons.toFixed(2)}</td>
                  <td className="num px-2 py-1">{fmtInt(f.cooling.floorAreaPerTonFt2)}</td>
                  <td className="num px-2 py-1">{f.cooling.sensibleHeatRatio.toFixed(2)}</td>
                  <td
                    className="num px-2 py-1"
                    title={f.cooling.peakHour === null ? PEAK_ONLY_NOTE : undefined}
                  >
                    {f.cooling.peakHour === null ? "peak only" : `${f.cooling.peakHour}:00`}
                  </td>
                  <td className="num px-2 py-1">{fmtInt(f.cooling.airflowCfm)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="mt-2 text-xs text-zinc-600">
            Spread between facings: {fmtInt(result.coolingSpreadBtuh)} Btu/h of cooling. Engine{" "}
            {result.engineVersion}.
          </p>
        </section>
      ) : null}

      <ProcedureComparison
        procedures={s.procedures}
        componentLabels={COMPONENT_LABELS}
        initialFacing={result?.worst.label ?? null}
      />

      {result && worst ? (
        <div className="grid gap-4 xl:grid-cols-3">
          <ChartCard title="Load by facing" testId="chart-facing">
            <BarChart
              data={result.facings.map((f) => ({
                facing: `Front ${f.label}`,
                Heating: Math.round(f.heating.totalBtuh),
                Cooling: Math.round(f.cooling.totalBtuh),
              }))}
            >
              <CartesianGrid strokeDasharray="3 3" vertical={false} />
              <XAxis dataKey="facing" fontSize={11} />
              <YAxis fontSize={11} tickFormatter={(v: number) => `${Math.round(v / 1000)}k`} />
              <Tooltip formatter={(v) => `${fmtInt(Number(v))} Btu/h`} />
              <Legend />
              <Bar dataKey="Heating" fill={HEAT} />
              <Bar dataKey="Cooling" fill={COOL} />
            </BarChart>
          </ChartCard>
          <ChartCard
            title={`Load by component (front ${worst.label}, the worst facing)`}
            testId="chart-component"
          >
            <BarChart
              layout="vertical"
              data={Object.keys(COMPONENT_LABELS)
                .map((k) => ({
                  component: COMPONENT_LABELS[k],
                  Heating: Math.round((worst.heating.byComponent as Record<string, number>)[k] ?? 0),
                  "Cooling sensible": Math.round(
                    (worst.cooling.sensibleByComponent as Record<string, number>)[k] ?? 0,
                  ),
                }))
                .filter((r) => r.Heating !== 0 || r["Cooling sensible"] !== 0)}
            >
              <CartesianGrid strokeDasharray="3 3" horizontal={false} />
              <XAxis type="number" fontSize={11} tickFormatter={(v: number) => `${Math.round(v / 1000)}k`} />
              <YAxis type="category" dataKey="component" width={110} fontSize={11} interval={0} />
              <Tooltip formatter={(v) => `${fmtInt(Number(v))} Btu/h`} />
              <Legend />
              <Bar dataKey="Heating" fill={HEAT} />
              <Bar dataKey="Cooling sensible" fill={COOL} />
            </BarChart>
          </ChartCard>
          {profileSource?.result ? (
            <ProfileChart source={profileSource.result} sizing={profileSource.sizesEquipment} />
          ) : null}
        </div>
      ) : null}

      {result && worst && worst.notes.length > 0 ? (
        <section className="rounded border border-zinc-200 bg-white p-3 text-xs text-zinc-600">
          <h2 className="mb-1 text-sm font-semibold text-zinc-800">Assumptions applied</h2>
          <ul className="list-disc pl-5">
            {worst.notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </section>
      ) : null}

      <InputsSection cells={s.current.cells} />
      <PlanAssemblies cells={s.current.cells} />

      <div className="grid gap-4 lg:grid-cols-2">
        <section className="rounded border border-zinc-200 bg-white p-3" aria-labelledby="revisions-heading">
          <h2 id="revisions-heading" className="mb-2 text-sm font-semibold">
            Revisions
          </h2>
          <table className="w-full text-xs" data-testid="revisions">
            <thead className="text-left text-zinc-600">
              <tr>
                <th className="py-1 font-medium">No.</th>
                <th className="py-1 font-medium">State</th>
                <th className="py-1 font-medium">Started</th>
                <th className="py-1 font-medium">Approved by</th>
              </tr>
            </thead>
            <tbody>
              {s.revisions.map((r) => (
                <tr key={r.id} className="border-t border-zinc-100">
                  <td className="py-1">{r.number}</td>
                  <td className="py-1">{r.status}</td>
                  <td className="py-1">
                    {r.createdAt.slice(0, 10)} {r.createdBy ? `· ${r.createdBy}` : ""}
                  </td>
                  <td
                    className="py-1"
                    data-testid={r.status === "approved" ? `approval-${r.number}` : undefined}
                  >
                    {r.approverName ? `${r.approverName}, ${r.approverCredential}, ${r.approvedOn}` : "—"}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          {canApprove && s.current.status === "draft" ? (
            <ApproveForm
              planId={s.plan.id}
              revisionId={s.current.id}
              revisionNumber={s.current.number}
              memberName={memberName}
            />
          ) : null}
          {!canApprove && s.current.status === "draft" ? (
            <p className="mt-2 text-xs text-zinc-500">A reviewer approves revisions.</p>
          ) : null}
          {canEdit && s.current.status === "approved" ? (
            <p className="mt-2 text-xs text-zinc-500">
              Editing this plan in the library starts revision {s.current.number + 1} as a draft.
            </p>
          ) : null}
        </section>
        <section className="rounded border border-zinc-200 bg-white p-3" aria-labelledby="history-heading">
          <h2 id="history-heading" className="mb-2 text-sm font-semibold">
            Change history
          </h2>
          {s.history.length === 0 ? (
            <p className="text-xs text-zinc-500">No changes since the plan was created.</p>
          ) : null}
          <ul className="max-h-80 space-y-2 overflow-y-auto text-xs" data-testid="plan-history">
            {s.history.map((h) => (
              <li key={h.id} className="border-t border-zinc-100 pt-1">
                <p>
                  <span className="text-zinc-500">
                    {h.createdAt.slice(0, 16).replace("T", " ")} UTC · {h.userName ?? "system"}
                  </span>{" "}
                  — {h.summary}
                </p>
                <ChangeDetail planId={s.plan.id} before={h.before} after={h.after} />
              </li>
            ))}
          </ul>
        </section>
      </div>
      <Caution />
    </div>
  );
}

/** The 24-hour sensible profile of each facing, from a procedure that gives one (named when it is not the sizing one). */
function ProfileChart({ source, sizing }: { source: PlanFacings; sizing: boolean }) {
  const title = `24-hour cooling profile (sensible, Btu/h) — ${PROCEDURE_SHORT_LABELS[source.procedure]}${sizing ? "" : ", for comparison: the sizing procedure gives the peak only"}`;
  return (
    <ChartCard title={title} testId="chart-profile">
      <LineChart
        data={Array.from({ length: 24 }, (_, h) =>
          Object.fromEntries([
            ["hour", h + 1],
            ...source.facings.map((f) => [`Front ${f.label}`, Math.round(f.cooling.hourlySensibleBtuh[h])]),
          ]),
        )}
      >
        <CartesianGrid strokeDasharray="3 3" />
        <XAxis
          dataKey="hour"
          fontSize={11}
          label={{ value: "solar hour", position: "insideBottomRight", offset: -2, fontSize: 11 }}
        />
        <YAxis fontSize={11} tickFormatter={(v: number) => `${Math.round(v / 1000)}k`} />
        <Tooltip formatter={(v) => `${fmtInt(Number(v))} Btu/h`} />
        <Legend />
        {source.facings.map((f) => (
          <Line
            key={f.label}
            type="monotone"
            dataKey={`Front ${f.label}`}
            stroke={FACING_COLORS[f.label]}
            dot={false}
            strokeWidth={f.label === source.worst.label ? 2.5 : 1.5}
          />
        ))}
      </LineChart>
    </ChartCard>
  );
}

function ChartCard({
  title,
  testId,
  children,
}: {
  title: string;
  testId: string;
  children: React.ReactElement;
}) {
  return (
    <section className="rounded border border-zinc-200 bg-white p-3" data-testid={testId}>
      <h2 className="mb-2 text-sm font-semibold">{title}</h2>
      <div style={{ height: 260 }}>
        <ResponsiveContainer width="100%" height="100%">
          {children}
        </ResponsiveContainer>
      </div>
    </section>
  );
}

function ChangeDetail({ planId, before, after }: { planId: number; before: unknown; after: unknown }) {
  const pick = (v: unknown) =>
    Array.isArray(v)
      ? (v as { planId: number; cells?: Record<string, unknown> }[]).find((e) => e.planId === planId)?.cells
      : undefined;
  const b = pick(before);
  const a = pick(after);
  if (!a) return null;
  const keys = Object.keys(a).slice(0, 8);
  return (
    <ul className="ml-3 text-zinc-600">
      {keys.map((k) => (
        <li key={k}>
          {PLAN_COLUMN_BY_KEY.get(k)?.header ?? k}:{" "}
          {b ? <span className="line-through">{String(b[k] ?? "blank") || "blank"}</span> : null} →{" "}
          {String(a[k] ?? "") || "blank"}
        </li>
      ))}
      {Object.keys(a).length > keys.length ? (
        <li>… and {Object.keys(a).length - keys.length} more cells</li>
      ) : null}
    </ul>
  );
}

function InputsSection({ cells }: { cells: Record<string, string | number | boolean | null> }) {
  const entered = Object.fromEntries(
    PLAN_COLUMNS.map((c) => [
      c.key,
      cells[c.key] === null || cells[c.key] === undefined ? "" : String(cells[c.key]),
    ]),
  );
  const { values } = readRowCells(PLAN_COLUMNS, entered);
  return (
    <section
      className="rounded border border-zinc-200 bg-white p-3"
      aria-labelledby="inputs-heading"
      data-testid="plan-inputs"
    >
      <h2 id="inputs-heading" className="mb-2 text-sm font-semibold">
        Envelope and inputs
      </h2>
      <p className="mb-2 text-xs text-zinc-500">
        Insulation values are the R-values added to the base assembly, as they are to be installed; a direct
        U-factor replaces both (see the assemblies below). Grey values are defaults.
      </p>
      <div className="grid gap-x-6 gap-y-3 md:grid-cols-2 xl:grid-cols-4">
        {PLAN_COLUMN_GROUPS.map((group) => (
          <div key={group}>
            <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-zinc-500">{group}</h3>
            <dl className="text-xs">
              {PLAN_COLUMNS.filter((c) => c.group === group).map((c) => {
                const raw = entered[c.key];
                const shown = values[c.key];
                if (shown === undefined && raw === "") return null;
                return (
                  <div key={c.key} className="flex justify-between gap-2 border-b border-zinc-100 py-0.5">
                    <dt className="text-zinc-600">{c.header}</dt>
                    <dd
                      className={raw === "" ? "text-zinc-400" : "font-medium"}
                      title={isFormula(raw) ? raw : undefined}
                    >
                      {typeof shown === "number"
                        ? shown.toLocaleString("en-US", { maximumFractionDigits: 3 })
                        : String(shown ?? "")}
                    </dd>
                  </div>
                );
              })}
            </dl>
          </div>
        ))}
      </div>
    </section>
  );
}

function ApproveForm({
  planId,
  revisionId,
  revisionNumber,
  memberName,
}: {
  planId: number;
  revisionId: number;
  revisionNumber: number;
  memberName: string;
}) {
  const queryClient = useQueryClient();
  const [name, setName] = useState(memberName);
  const [credential, setCredential] = useState("");
  const [date, setDate] = useState(new Date().toISOString().slice(0, 10));
  const [error, setError] = useState<ApiError | null>(null);
  const approve = useMutation({
    mutationFn: () =>
      api(`/api/plans/${planId}/approve`, {
        method: "POST",
        body: { revisionId, approverName: name, approverCredential: credential, approvedOn: date },
      }),
    onSuccess: () => {
      setError(null);
      void queryClient.invalidateQueries({ queryKey: ["plan", planId] });
      void queryClient.invalidateQueries({ queryKey: ["plans"] });
    },
    onError: (e: ApiError) => setError(e),
  });
  const fieldError = (f: string) => error?.fieldErrors.find((x) => x.field === f)?.message;
  return (
    <form
      className="mt-3 rounded border border-accent-100 bg-accent-50 p-3"
      data-testid="approve-form"
      onSubmit={(e) => {
        e.preventDefault();
        approve.mutate();
      }}
      noValidate
    >
      <h3 className="mb-2 text-xs font-semibold">Approve revision {revisionNumber}</h3>
      <p className="mb-2 text-xs text-zinc-600">
        Approval records who checked this calculation. The approved revision is locked.
      </p>
      <FormError message={error && error.fieldErrors.length === 0 ? error.message : null} />
      <TextField
        label="Approver name"
        name="approver-name"
        value={name}
        onChange={setName}
        error={fieldError("approverName")}
      />
      <TextField
        label="Credential"
        name="approver-credential"
        value={credential}
        onChange={setCredential}
        error={fieldError("approverCredential")}
      />
      <TextField
        label="Date"
        name="approved-on"
        type="date"
        value={date}
        onChange={setDate}
        error={fieldError("approvedOn")}
      />
      <Button type="submit" disabled={approve.isPending}>
        Approve revision {revisionNumber}
      </Button>
    </form>
  );
}

"use client";

import { useState } from "react";
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { fmtInt } from "@/components/grid/grid-theme";
import { FormError } from "@/components/ui/field";
import type { LoadProcedure, PlanFacings } from "@/lib/load/results";
import {
  compareProcedures,
  type ComponentDifference,
  type LoadDifference,
} from "@/lib/reports/procedure-compare";

/** One procedure's four facings as the plan sheet route answers them. */
export interface ProcedureFacings {
  procedure: LoadProcedure;
  label: string;
  sizesEquipment: boolean;
  result: PlanFacings | null;
  error: string | null;
}

/** Column tags: short, so the side-by-side tables stay readable. */
const TAG: Record<LoadProcedure, string> = { "residential-load-factor": "Load-factor", hourly: "Hourly" };
const SIZING_COLOR = "#2360a8";
const OTHER_COLOR = "#8a6d1f";

const signed = (v: number) => `${v > 0 ? "+" : v < 0 ? "−" : ""}${fmtInt(Math.abs(v))}`;
const pct = (v: number | null) =>
  v === null ? "—" : `${v > 0 ? "+" : v < 0 ? "−" : ""}${Math.abs(v).toFixed(1)} %`;

/**
 * Both procedures side by side, per facing and per component, with their difference (the other
 * procedure minus the one that sizes equipment, in Btu/h and in % of the sizing one).
 */
export function ProcedureComparison({
  procedures,
  componentLabels,
  initialFacing,
}: {
  procedures: ProcedureFacings[];
  componentLabels: Record<string, string>;
  initialFacing: string | null;
}) {
  const sizing = procedures.find((p) => p.sizesEquipment);
  const other = procedures.find((p) => !p.sizesEquipment);
  const [facing, setFacing] = useState<string | null>(initialFacing);
  if (!sizing || !other) return null;
  const comparison = sizing.result && other.result ? compareProcedures(sizing.result, other.result) : null;
  const shownFacing = comparison?.facings.find((f) => f.label === facing) ?? comparison?.facings[0] ?? null;
  const a = TAG[sizing.procedure];
  const b = TAG[other.procedure];

  return (
    <section
      aria-labelledby="compare-heading"
      className="rounded border border-zinc-200 bg-white p-3"
      data-testid="procedure-comparison"
    >
      <h2 id="compare-heading" className="mb-1 text-sm font-semibold">
        Both procedures side by side
      </h2>
      <p className="mb-2 text-xs text-zinc-600">
        <span className="font-medium text-zinc-800" data-testid="sizing-procedure">
          {sizing.label}
        </span>{" "}
        sizes equipment (the account&apos;s procedure); shown beside it: {other.label}. Difference = {b} − {a}
        , in Btu/h and in % of {a}.
      </p>
      {procedures
        .filter((p) => p.error)
        .map((p) => (
          <FormError
            key={p.procedure}
            testId={`procedure-error-${p.procedure}`}
            message={`${p.label}: not computed. ${p.error}`}
          />
        ))}
      {comparison && shownFacing ? (
        <div className="flex flex-col gap-4">
          <div className="overflow-x-auto">
            <table className="w-full border-collapse text-xs" data-testid="compare-facings">
              <caption className="mb-1 text-left text-xs font-semibold text-zinc-700">By facing</caption>
              <thead className="bg-zinc-100 text-zinc-600">
                <tr>
                  <th scope="col" rowSpan={2} className="px-2 py-1 text-left font-medium">
                    Front faces
                  </th>
                  {["Heating", "Cooling sensible", "Cooling latent", "Cooling total"].map((h) => (
                    <th
                      key={h}
                      scope="colgroup"
                      colSpan={4}
                      className="border-l border-zinc-200 px-2 py-1 text-center font-medium"
                    >
                      {h} (Btu/h)
                    </th>
                  ))}
                </tr>
                <tr>
                  {[0, 1, 2, 3].map((i) => (
                    <DifferenceHeaders key={i} a={a} b={b} />
                  ))}
                </tr>
              </thead>
              <tbody>
                {comparison.facings.map((f) => (
                  <tr
                    key={f.label}
                    className="border-t border-zinc-200"
                    data-testid={`compare-facing-${f.label}`}
                  >
                    <th scope="row" className="px-2 py-1 text-left font-medium">
                      {f.label}
                    </th>
                    <DifferenceCells d={f.heating} heat />
                    <DifferenceCells d={f.coolingSensible} />
                    <DifferenceCells d={f.coolingLatent} />
                    <DifferenceCells d={f.coolingTotal} />
                  </tr>
                ))}
              </tbody>
            </table>
          </div>

          <div>
            <div className="mb-1 flex flex-wrap items-end gap-3">
              <h3 className="text-xs font-semibold text-zinc-700">By component</h3>
              <div>
                <label htmlFor="compare-facing" className="block text-xs text-zinc-600">
                  Front facing
                </label>
                <select
                  id="compare-facing"
                  className="rounded border border-zinc-300 bg-white px-2 py-0.5 text-xs"
                  value={shownFacing.label}
                  onChange={(e) => setFacing(e.target.value)}
                >
                  {comparison.facings.map((f) => (
                    <option key={f.label} value={f.label}>
                      {f.label}
                    </option>
                  ))}
                </select>
              </div>
            </div>
            <div className="grid gap-4 xl:grid-cols-3">
              <ComponentTable
                testId="compare-heating-components"
                title="Heating"
                rows={shownFacing.heatingByComponent}
                total={shownFacing.heating}
                a={a}
                b={b}
                labels={componentLabels}
                heat
              />
              <ComponentTable
                testId="compare-sensible-components"
                title="Cooling sensible"
                rows={shownFacing.coolingSensibleByComponent}
                total={shownFacing.coolingSensible}
                a={a}
                b={b}
                labels={componentLabels}
              />
              <ComponentTable
                testId="compare-latent-components"
                title="Cooling latent"
                rows={shownFacing.coolingLatentByComponent}
                total={shownFacing.coolingLatent}
                a={a}
                b={b}
                labels={componentLabels}
              />
            </div>
          </div>

          <div className="grid gap-4 xl:grid-cols-2">
            <CompareChart
              title="Cooling total by facing"
              testId="chart-compare-facing"
              a={a}
              b={b}
              data={comparison.facings.map((f) => ({
                name: `Front ${f.label}`,
                [a]: Math.round(f.coolingTotal.sizingBtuh),
                [b]: Math.round(f.coolingTotal.otherBtuh),
              }))}
            />
            <CompareChart
              title={`Cooling sensible by component (front ${shownFacing.label})`}
              testId="chart-compare-component"
              a={a}
              b={b}
              vertical
              data={shownFacing.coolingSensibleByComponent.map((c) => ({
                name: componentLabels[c.component] ?? c.component,
                [a]: Math.round(c.sizingBtuh),
                [b]: Math.round(c.otherBtuh),
              }))}
            />
          </div>
        </div>
      ) : null}
    </section>
  );
}

function DifferenceHeaders({ a, b }: { a: string; b: string }) {
  return (
    <>
      <th scope="col" className="border-l border-zinc-200 px-2 py-1 text-right font-medium">
        {a}
      </th>
      <th scope="col" className="px-2 py-1 text-right font-medium">
        {b}
      </th>
      <th scope="col" className="px-2 py-1 text-right font-medium">
        Δ
      </th>
      <th scope="col" className="px-2 py-1 text-right font-medium">
        Δ %
      </th>
    </>
  );
}

function DifferenceCells({ d, heat = false }: { d: LoadDifference; heat?: boolean }) {
  const tone = heat ? "text-heat-700" : "text-cool-700";
  return (
    <>
      <td className={`num border-l border-zinc-200 px-2 py-1 font-semibold ${tone}`}>
        {fmtInt(d.sizingBtuh)}
      </td>
      <td className={`num px-2 py-1 ${tone}`}>{fmtInt(d.otherBtuh)}</td>
      <td className="num px-2 py-1 text-zinc-700">{signed(d.differenceBtuh)}</td>
      <td className="num px-2 py-1 text-zinc-700">{pct(d.differencePct)}</td>
    </>
  );
}

function ComponentTable({
  testId,
  title,
  rows,
  total,
  a,
  b,
  labels,
  heat = false,
}: {
  testId: string;
  title: string;
  rows: ComponentDifference[];
  total: LoadDifference;
  a: string;
  b: string;
  labels: Record<string, string>;
  heat?: boolean;
}) {
  return (
    <table className="w-full border-collapse text-xs" data-testid={testId}>
      <caption className="mb-1 text-left text-xs font-medium text-zinc-700">{title} (Btu/h)</caption>
      <thead className="bg-zinc-100 text-zinc-600">
        <tr>
          <th scope="col" className="px-2 py-1 text-left font-medium">
            Component
          </th>
          <DifferenceHeaders a={a} b={b} />
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.component} className="border-t border-zinc-100">
            <th scope="row" className="px-2 py-0.5 text-left font-normal">
              {labels[r.component] ?? r.component}
            </th>
            <DifferenceCells d={r} heat={heat} />
          </tr>
        ))}
        <tr className="border-t border-zinc-300 font-semibold">
          <th scope="row" className="px-2 py-1 text-left">
            Total
          </th>
          <DifferenceCells d={total} heat={heat} />
        </tr>
      </tbody>
    </table>
  );
}

function CompareChart({
  title,
  testId,
  a,
  b,
  data,
  vertical = false,
}: {
  title: string;
  testId: string;
  a: string;
  b: string;
  data: Record<string, string | number>[];
  vertical?: boolean;
}) {
  return (
    <div data-testid={testId}>
      <h3 className="mb-1 text-xs font-semibold text-zinc-700">{title}</h3>
      <div style={{ height: vertical ? Math.max(200, 26 * data.length + 60) : 240 }}>
        <ResponsiveContainer width="100%" height="100%">
          {vertical ? (
            <BarChart layout="vertical" data={data}>
              <CartesianGrid strokeDasharray="3 3" horizontal={false} />
              <XAxis type="number" fontSize={11} tickFormatter={(v: number) => `${Math.round(v / 1000)}k`} />
              <YAxis type="category" dataKey="name" width={110} fontSize={11} interval={0} />
              <Tooltip formatter={(v) => `${fmtInt(Number(v))} Btu/h`} />
              <Legend />
              <Bar dataKey={a} fill={SIZING_COLOR} />
              <Bar dataKey={b} fill={OTHER_COLOR} />
            </BarChart>
          ) : (
            <BarChart data={data}>
              <CartesianGrid strokeDasharray="3 3" vertical={false} />
              <XAxis dataKey="name" fontSize={11} />
              <YAxis fontSize={11} tickFormatter={(v: number) => `${Math.round(v / 1000)}k`} />
              <Tooltip formatter={(v) => `${fmtInt(Number(v))} Btu/h`} />
              <Legend />
              <Bar dataKey={a} fill={SIZING_COLOR} />
              <Bar dataKey={b} fill={OTHER_COLOR} />
            </BarChart>
          )}
        </ResponsiveContainer>
      </div>
    </div>
  );
}

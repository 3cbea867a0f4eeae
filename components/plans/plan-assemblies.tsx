"use client";

import { airLeakageText, planAssemblies } from "@/lib/workbook/plan-assemblies";
import { rowToPlanInput, type PlanRowCells } from "@/lib/workbook/plan-columns";

const fmtU = (value: number) => value.toFixed(3);

/**
 * The U-factor the engine uses for each opaque assembly, and whether it was entered directly or
 * computed from the base assembly and added insulation (the reviewer's first question when a
 * number looks off).
 */
export function PlanAssemblies({ cells }: { cells: PlanRowCells }) {
  const row = rowToPlanInput(cells);
  // A plan whose cells do not read has no loads either; the sheet shows that error above.
  if (!row.ok) return null;
  const assemblies = planAssemblies(row.input);
  return (
    <section
      className="rounded border border-zinc-200 bg-white p-3"
      aria-labelledby="assemblies-heading"
      data-testid="plan-assemblies"
    >
      <h2 id="assemblies-heading" className="mb-1 text-sm font-semibold">
        Assemblies and the U-factors used
      </h2>
      <p className="mb-2 text-xs text-zinc-500">
        A direct U-factor (or slab F-factor) entered for the plan replaces the base assembly and added
        insulation in both seasons. Air leakage as entered:{" "}
        <span className="font-medium text-zinc-700" data-testid="air-leakage-used">
          {airLeakageText(row.input)}
        </span>
        .
      </p>
      <table className="w-full border-collapse text-xs">
        <thead className="bg-zinc-100 text-zinc-600">
          <tr>
            <th className="px-2 py-1 text-left font-medium">Assembly</th>
            <th className="px-2 py-1 text-left font-medium">Where</th>
            <th className="px-2 py-1 text-left font-medium">U-factor from</th>
            <th className="px-2 py-1 text-left font-medium">Construction</th>
            <th className="px-2 py-1 text-right font-medium">Heating</th>
            <th className="px-2 py-1 text-right font-medium">Cooling</th>
            <th className="px-2 py-1 text-left font-medium">Unit</th>
          </tr>
        </thead>
        <tbody>
          {assemblies.map((a) => (
            <tr
              key={`${a.name}-${a.directKey}`}
              className="border-t border-zinc-100"
              data-testid={`assembly-${a.directKey}`}
              data-source={a.source}
            >
              <td className="px-2 py-1">{a.name}</td>
              <td className="px-2 py-1 text-zinc-600">{a.appliesTo}</td>
              <td className="px-2 py-1">
                {a.source === "direct" ? (
                  <span className="rounded bg-accent-50 px-1 font-medium text-accent-800">
                    direct {a.unit.includes("ft²") ? "U-factor" : "F-factor"}
                  </span>
                ) : (
                  "base assembly + added insulation"
                )}
                {a.notUsed ? (
                  <span className="ml-1 text-red-700">— entered but not used: {a.notUsed}</span>
                ) : null}
              </td>
              <td className="px-2 py-1 text-zinc-600">{a.description}</td>
              <td className="num px-2 py-1">{fmtU(a.heating)}</td>
              <td className="num px-2 py-1">{a.cooling === null ? "—" : fmtU(a.cooling)}</td>
              <td className="px-2 py-1 text-zinc-500">{a.unit}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}

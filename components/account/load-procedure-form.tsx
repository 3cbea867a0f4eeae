"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button, FormError } from "@/components/ui/field";
import { api, type ApiError } from "@/lib/client/api";
import type { LoadProcedure } from "@/lib/load/results";
import { PROCEDURE_STATEMENTS } from "@/lib/reports/procedure-text";

interface ProcedureSetting {
  procedure: LoadProcedure;
  choices: { procedure: LoadProcedure; label: string }[];
  frozenLots: number;
}

/** What each procedure means for the people who pick it, in our own words. */
const EXPLANATIONS: Record<LoadProcedure, string> = {
  "residential-load-factor":
    "The peak load by the handbook's residential load-factor tables and equations. Gives the design peak only: no peak hour and no 24-hour profile. The default.",
  hourly:
    "Every solar hour of the design day with heat storage in the walls, roof and furnishings; the peak is the largest hour. Gives the peak hour and the 24-hour profile.",
};

/**
 * The procedure that sizes equipment and goes on the permit papers. An admin changes it (every
 * lot is recomputed; frozen lots keep their snapshot); every other role sees which is in use.
 */
export function LoadProcedureForm({ canEdit }: { canEdit: boolean }) {
  const queryClient = useQueryClient();
  const query = useQuery({
    queryKey: ["load-procedure"],
    queryFn: () => api<ProcedureSetting>("/api/account/load-procedure"),
  });
  const [picked, setPicked] = useState<LoadProcedure | null>(null);
  const [error, setError] = useState<ApiError | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const save = useMutation({
    mutationFn: (body: { procedure: LoadProcedure; from: LoadProcedure }) =>
      api<{ procedure: LoadProcedure; changed: boolean; lotsRecomputed: number; lotsChanged: number }>(
        "/api/account/load-procedure",
        { method: "PUT", body },
      ),
    onSuccess: (r) => {
      setError(null);
      setPicked(null);
      setNotice(
        r.changed
          ? `Saved. ${r.lotsRecomputed} lots recomputed by the new procedure (${r.lotsChanged} with changed loads); lots frozen for permit keep their snapshot.`
          : "Nothing to change: that procedure is already in use.",
      );
      // Every load on every page may have moved.
      for (const key of ["load-procedure", "plans", "plan", "lots", "equipment-schedule"])
        void queryClient.invalidateQueries({ queryKey: [key] });
    },
    onError: (e: ApiError) => setError(e),
  });
  if (query.isError) return <FormError message={query.error.message} />;
  if (!query.data) return <p className="text-xs text-zinc-500">Loading the load procedure…</p>;
  const current = query.data.procedure;
  const chosen = picked ?? current;
  const currentLabel = query.data.choices.find((c) => c.procedure === current)?.label ?? current;

  return (
    <section
      className="rounded border border-zinc-200 bg-white p-3"
      aria-labelledby="procedure-heading"
      data-testid="load-procedure"
    >
      <h2 id="procedure-heading" className="mb-1 text-sm font-semibold">
        Load procedure
      </h2>
      <p className="mb-2 text-xs text-zinc-600">
        The procedure that sizes equipment and goes on the permit papers: lots, the plan library, load reports
        and schedules use it. The plan sheet shows both procedures side by side.
      </p>
      <p className="mb-2 text-sm" data-testid="procedure-in-use">
        In use: <span className="font-semibold">{currentLabel}</span>
      </p>
      {canEdit ? (
        <form
          onSubmit={(e) => {
            e.preventDefault();
            setNotice(null);
            save.mutate({ procedure: chosen, from: current });
          }}
        >
          <FormError
            message={
              error
                ? `${error.message}${error.fieldErrors.length > 0 ? ` ${error.fieldErrors.map((f) => `${f.field}: ${f.message}`).join("; ")}` : ""}`
                : null
            }
          />
          <fieldset className="mb-2">
            <legend className="mb-1 text-xs font-medium text-zinc-700">Choose the procedure</legend>
            {query.data.choices.map((c) => (
              <div key={c.procedure} className="mb-1.5 flex items-start gap-2">
                <input
                  type="radio"
                  id={`procedure-${c.procedure}`}
                  name="load-procedure"
                  value={c.procedure}
                  checked={chosen === c.procedure}
                  onChange={() => setPicked(c.procedure)}
                  aria-describedby={`procedure-${c.procedure}-help`}
                  className="mt-1"
                />
                <div>
                  <label htmlFor={`procedure-${c.procedure}`} className="text-sm font-medium text-zinc-800">
                    {c.label}
                    {c.procedure === current ? (
                      <span className="ml-1 text-xs font-normal text-zinc-600">(in use)</span>
                    ) : null}
                  </label>
                  <p id={`procedure-${c.procedure}-help`} className="text-xs text-zinc-600">
                    {EXPLANATIONS[c.procedure]}
                  </p>
                </div>
              </div>
            ))}
          </fieldset>
          <p className="mb-2 text-xs text-zinc-600">
            Saving recomputes every lot of the account by the chosen procedure and reselects its equipment, in
            one step with one history entry.{" "}
            {query.data.frozenLots > 0
              ? `The ${query.data.frozenLots} lots frozen for permit keep the procedure and loads of their snapshot.`
              : "Lots frozen for permit would keep their snapshot."}
          </p>
          <Button type="submit" disabled={save.isPending || chosen === current}>
            {save.isPending ? "Recomputing lots…" : "Use this procedure and recompute lots"}
          </Button>
        </form>
      ) : (
        <p className="text-xs text-zinc-600">{PROCEDURE_STATEMENTS[current]}. Only an admin can change it.</p>
      )}
      {notice ? (
        <p className="mt-2 text-xs text-accent-800" role="status" data-testid="procedure-notice">
          {notice}
        </p>
      ) : null}
    </section>
  );
}

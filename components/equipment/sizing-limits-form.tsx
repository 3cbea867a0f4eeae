"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/field";
import { api, type ApiError } from "@/lib/client/api";

const FIELDS = [
  { key: "coolingMinPct", label: "Cooling capacity at least (% of cooling total)" },
  { key: "coolingMaxPct", label: "Cooling capacity at most, air conditioners (%)" },
  {
    key: "heatPumpCoolingMaxPct",
    label: "Cooling capacity at most, heat pumps where heating exceeds cooling (%)",
  },
  { key: "heatingMinPct", label: "Heating output at least (% of heating load)" },
  { key: "heatingMaxPct", label: "Furnace output at most (% of heating load)" },
] as const;

/** The account's equipment sizing limits: defaults (from memory and common practice); an admin may change them. */
export function SizingLimitsForm({ canEdit }: { canEdit: boolean }) {
  const queryClient = useQueryClient();
  const query = useQuery({
    queryKey: ["sizing-limits"],
    queryFn: () => api<{ limits: Record<string, number>; custom: boolean }>("/api/account/sizing-limits"),
  });
  const [values, setValues] = useState<Record<string, string> | null>(null);
  const [error, setError] = useState<ApiError | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const save = useMutation({
    mutationFn: (limits: Record<string, number>) =>
      api<{ lotsReselected: number }>("/api/account/sizing-limits", { method: "PUT", body: { limits } }),
    onSuccess: (r) => {
      setError(null);
      setNotice(`Saved; ${r.lotsReselected} lots reselected with the new limits.`);
      void queryClient.invalidateQueries({ queryKey: ["sizing-limits"] });
    },
    onError: (e: ApiError) => setError(e),
  });
  if (!query.data) return <p className="text-xs text-zinc-500">Loading the sizing limits…</p>;
  const shown = values ?? Object.fromEntries(FIELDS.map((f) => [f.key, String(query.data.limits[f.key])]));
  return (
    <form
      className="rounded border border-zinc-200 bg-white p-3"
      data-testid="sizing-limits"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate(Object.fromEntries(FIELDS.map((f) => [f.key, Number(shown[f.key])])));
      }}
    >
      <h2 className="mb-1 text-sm font-semibold">Sizing limits</h2>
      <p className="mb-2 text-xs text-zinc-600">
        A system fits when its capacities fall within these limits and its sensible and latent capacities
        cover the loads.{" "}
        {query.data.custom ? "Set for this account." : "Approximate defaults — verify locally."} Reports state
        the limits they used.
      </p>
      {error ? (
        <p className="mb-2 rounded border border-red-200 bg-red-50 px-2 py-1 text-xs text-red-800">
          {error.message} {error.fieldErrors.map((f) => `${f.field}: ${f.message}`).join("; ")}
        </p>
      ) : null}
      {notice ? <p className="mb-2 text-xs text-accent-800">{notice}</p> : null}
      <div className="grid gap-2 sm:grid-cols-2 lg:grid-cols-5">
        {FIELDS.map((f) => (
          <div key={f.key}>
            <label htmlFor={`limit-${f.key}`} className="mb-1 block text-xs text-zinc-700">
              {f.label}
            </label>
            <input
              id={`limit-${f.key}`}
              className="num w-full rounded border border-zinc-300 px-2 py-1"
              value={shown[f.key]}
              disabled={!canEdit}
              inputMode="decimal"
              onChange={(e) => setValues({ ...shown, [f.key]: e.target.value })}
            />
          </div>
        ))}
      </div>
      {canEdit ? (
        <Button type="submit" className="mt-2" disabled={save.isPending}>
          Save limits and reselect lots
        </Button>
      ) : null}
    </form>
  );
}

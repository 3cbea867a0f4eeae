"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useCallback, useState } from "react";
import { Caution } from "@/components/ui/caution";
import { api, type ApiError } from "@/lib/client/api";
import { ConditionsForm, type Conditions } from "./conditions-form";
import { LotImportPanel } from "./lot-import-panel";
import { LotsGrid } from "./lots-grid";

interface Community {
  id: number;
  name: string;
  locality: string;
  conditions: Conditions;
  version: number;
}

export function CommunityWorkspace({
  communityId,
  canEditCommunity,
  canEditLots,
  canPermit,
  canOverride,
}: {
  communityId: number;
  canEditCommunity: boolean;
  canEditLots: boolean;
  canPermit: boolean;
  canOverride: boolean;
}) {
  const queryClient = useQueryClient();
  const community = useQuery({
    queryKey: ["community", communityId],
    queryFn: () => api<{ community: Community }>(`/api/communities/${communityId}`),
  });
  const [showConditions, setShowConditions] = useState(false);
  const [error, setError] = useState<ApiError | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const save = useMutation({
    mutationFn: (v: { name: string; locality: string; conditions: Conditions }) =>
      api<{ recomputed: number; changed: number }>(`/api/communities/${communityId}`, {
        method: "PATCH",
        body: { ...v, version: community.data!.community.version },
      }),
    onSuccess: (r) => {
      setError(null);
      setNotice(`Saved. ${r.recomputed} lots recomputed, ${r.changed} with changed loads.`);
      void queryClient.invalidateQueries({ queryKey: ["community", communityId] });
      void queryClient.invalidateQueries({ queryKey: ["lots", communityId] });
    },
    onError: (e: ApiError) => setError(e),
  });
  const onImported = useCallback(
    () => void queryClient.invalidateQueries({ queryKey: ["lots", communityId] }),
    [communityId, queryClient],
  );

  if (community.isPending) return <p className="text-zinc-500">Loading the community…</p>;
  if (community.isError) return <p className="text-red-700">{community.error.message}</p>;
  const c = community.data.community;
  const k = c.conditions;
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <Link href="/communities" className="text-xs text-accent-700 hover:underline">
            ← Communities
          </Link>
          <h1 className="text-lg font-semibold tracking-tight" data-testid="community-name">
            {c.name}
          </h1>
          <p className="text-zinc-600" data-testid="conditions-summary">
            {c.locality ? `${c.locality} · ` : ""}lat {k.latitudeDeg}°, {k.elevationFt} ft · heating{" "}
            {k.heatingOutdoorDbF} °F · cooling {k.coolingOutdoorDbF} / {k.coolingOutdoorWbF} °F WB · daily
            range {k.dailyRangeF} °F · indoor {k.indoorHeatingF} / {k.indoorCoolingF} °F
          </p>
        </div>
        <div className="flex gap-3 text-xs">
          <a
            className="text-accent-700 hover:underline"
            href={`/api/communities/${communityId}/permit-schedule?format=xlsx`}
            data-testid="permit-schedule-xlsx"
          >
            Permit schedule XLSX
          </a>
          <a
            className="text-accent-700 hover:underline"
            href={`/api/communities/${communityId}/permit-schedule?format=csv`}
          >
            Permit schedule CSV
          </a>
          <button
            type="button"
            className="text-accent-700 hover:underline"
            onClick={() => setShowConditions((s) => !s)}
            aria-expanded={showConditions}
          >
            {showConditions
              ? "Hide design conditions"
              : canEditCommunity
                ? "Edit design conditions"
                : "Design conditions"}
          </button>
        </div>
      </div>
      {notice ? (
        <p
          className="rounded border border-accent-100 bg-accent-50 px-3 py-2 text-xs text-accent-800"
          data-testid="community-notice"
        >
          {notice}
        </p>
      ) : null}
      {showConditions ? (
        <section className="rounded border border-zinc-200 bg-white p-4">
          <p className="mb-3 text-xs text-zinc-600">
            Nothing changes until you save; saving recomputes every lot of the community (lots frozen for
            permit keep their snapshot).
          </p>
          <ConditionsForm
            key={c.version}
            initial={{ name: c.name, locality: c.locality, conditions: c.conditions }}
            submitLabel="Save and recompute lots"
            busy={save.isPending}
            error={error}
            disabled={!canEditCommunity}
            onSubmit={(v) => save.mutate(v)}
          />
        </section>
      ) : null}
      <LotsGrid
        communityId={communityId}
        canEdit={canEditLots}
        canPermit={canPermit}
        canOverride={canOverride}
      />
      {canEditLots ? <LotImportPanel communityId={communityId} onDone={onImported} /> : null}
      <Caution />
    </div>
  );
}

"use client";

import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useEffect, useState } from "react";
import { Caution } from "@/components/ui/caution";
import { DataTable } from "@/components/ui/data-table";
import { api } from "@/lib/client/api";
import { EquipmentScheduleView, type ScheduleData } from "./equipment-schedule-view";
import { PacketList } from "./packet-list";
import { PacketMaker } from "./packet-maker";
import { SendForm } from "./send-form";

interface CommunityItem {
  id: number;
  name: string;
  locality: string;
}

const STATUS_LABELS: Record<string, string> = {
  planned: "Planned",
  permit_submitted: "Permit submitted",
  permitted: "Permitted",
  built: "Built",
};

/** The Schedules page: one community at a time; generate and send controls only for roles that may. */
export function SchedulesWorkspace({
  initialCommunityId,
  canExport,
}: {
  initialCommunityId: number | null;
  canExport: boolean;
}) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const list = useQuery({
    queryKey: ["communities"],
    queryFn: () => api<{ communities: CommunityItem[] }>("/api/communities"),
  });
  const [communityId, setCommunityId] = useState<number | null>(initialCommunityId);

  useEffect(() => {
    if (communityId === null && list.data && list.data.communities.length > 0)
      setCommunityId(list.data.communities[0].id);
  }, [communityId, list.data]);

  const schedule = useQuery({
    queryKey: ["equipment-schedule", communityId],
    queryFn: () => api<ScheduleData>(`/api/communities/${communityId}/equipment-schedule?format=json`),
    enabled: communityId !== null,
  });
  const refreshPackets = () => void queryClient.invalidateQueries({ queryKey: ["packets", communityId] });

  if (list.isPending) return <p className="text-zinc-500">Loading the communities…</p>;
  if (list.isError) return <p className="text-red-700">{list.error.message}</p>;
  if (list.data.communities.length === 0) {
    return (
      <>
        <p className="rounded border border-dashed border-zinc-300 bg-white px-4 py-6 text-center text-zinc-500">
          There are no communities yet; add one on the Communities page.
        </p>
        <Caution className="mt-4" />
      </>
    );
  }

  const choose = (id: number) => {
    setCommunityId(id);
    router.replace(`/schedules?community=${id}`);
  };
  const data = schedule.data;
  const permitLotCount = data ? data.lots.filter((l) => l.status !== "planned").length : 0;

  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap items-end gap-4">
        <div>
          <label htmlFor="schedule-community" className="mb-1 block text-xs font-medium text-zinc-700">
            Community
          </label>
          <select
            id="schedule-community"
            data-testid="schedule-community"
            value={communityId ?? ""}
            onChange={(e) => choose(Number(e.target.value))}
            className="min-w-64 rounded border border-zinc-300 bg-white px-2 py-1.5"
          >
            {list.data.communities.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
                {c.locality ? ` — ${c.locality}` : ""}
              </option>
            ))}
          </select>
        </div>
        {communityId !== null ? (
          <div className="flex flex-wrap gap-x-4 gap-y-1 text-xs" data-testid="schedule-exports">
            <span className="font-medium text-zinc-700">Export:</span>
            <a
              className="text-accent-700 hover:underline"
              data-testid="equipment-schedule-xlsx"
              href={`/api/communities/${communityId}/equipment-schedule?format=xlsx`}
            >
              Equipment schedule XLSX
            </a>
            <a
              className="text-accent-700 hover:underline"
              data-testid="equipment-schedule-csv"
              href={`/api/communities/${communityId}/equipment-schedule?format=csv`}
            >
              Equipment schedule CSV
            </a>
            <a
              className="text-accent-700 hover:underline"
              data-testid="permit-schedule-xlsx"
              href={`/api/communities/${communityId}/permit-schedule?format=xlsx`}
            >
              Permit schedule XLSX
            </a>
            <a
              className="text-accent-700 hover:underline"
              data-testid="permit-schedule-csv"
              href={`/api/communities/${communityId}/permit-schedule?format=csv`}
            >
              Permit schedule CSV
            </a>
            <a
              className="text-accent-700 hover:underline"
              data-testid="account-equipment-schedule"
              href="/api/equipment-schedule?format=xlsx"
            >
              Equipment schedule, all communities XLSX
            </a>
          </div>
        ) : null}
      </div>

      <Caution />

      {schedule.isPending ? <p className="text-zinc-500">Loading the equipment schedule…</p> : null}
      {schedule.isError ? <p className="text-red-700">{schedule.error.message}</p> : null}
      {data ? <EquipmentScheduleView data={data} /> : null}

      {data && communityId !== null && canExport ? (
        <div className="grid gap-4 lg:grid-cols-2">
          <PacketMaker
            key={`packet-${communityId}`}
            communityId={communityId}
            lotCount={data.lots.length}
            permitLotCount={permitLotCount}
            onMade={refreshPackets}
          />
          <SendForm
            key={`send-${communityId}`}
            communityId={communityId}
            lotCount={data.lots.length}
            permitLotCount={permitLotCount}
            onSent={refreshPackets}
          />
        </div>
      ) : null}
      {!canExport ? (
        <p className="text-xs text-zinc-600" data-testid="schedules-read-only">
          Your role reads the schedules; making permit packets and sending files is for admins, designers,
          reviewers and purchasing.
        </p>
      ) : null}

      {communityId !== null ? <PacketList communityId={communityId} /> : null}

      {data ? (
        <section>
          <h2 className="mb-2 text-sm font-semibold">Load report per lot</h2>
          <DataTable
            testId="lot-reports"
            rows={data.lots}
            rowKey={(l) => l.lotId}
            empty="This community has no lots."
            columns={[
              { header: "Lot", cell: (l) => l.lotNumber },
              { header: "Status", cell: (l) => STATUS_LABELS[l.status] ?? l.status },
              { header: "Planned start", cell: (l) => l.plannedStart ?? "—" },
              {
                header: "System",
                cell: (l) =>
                  l.systemCode ? (
                    `${l.systemCode}${l.overridden ? " (override)" : ""}`
                  ) : (
                    <span className="text-zinc-500">none — {l.reason}</span>
                  ),
              },
              {
                header: "Report",
                cell: (l) => (
                  <a
                    className="text-accent-700 hover:underline"
                    href={`/api/lots/${l.lotId}/report`}
                    target="_blank"
                    rel="noopener"
                    data-testid={`lot-report-${l.lotNumber}`}
                  >
                    PDF
                  </a>
                ),
              },
            ]}
          />
        </section>
      ) : null}
    </div>
  );
}

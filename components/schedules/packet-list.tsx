"use client";

import { useQuery } from "@tanstack/react-query";
import { DataTable } from "@/components/ui/data-table";
import { api } from "@/lib/client/api";

interface PacketRow {
  id: number;
  kind: "permit-packet" | "equipment-schedule" | "permit-schedule";
  fileName: string;
  sizeBytes: number;
  lotCount: number;
  sentTo: string[] | null;
  state: "queued" | "rendering" | "sending" | "ready" | "failed";
  error: string | null;
  createdAt: string;
  createdByName: string;
}

const KIND_LABELS: Record<PacketRow["kind"], string> = {
  "permit-packet": "Permit packet",
  "equipment-schedule": "Equipment schedule",
  "permit-schedule": "Permit schedule",
};

const when = (iso: string) =>
  new Date(iso).toLocaleString("en-US", { dateStyle: "medium", timeStyle: "short" });

/** The files kept for a community: permit packets and e-mailed schedules, with who made them and when. */
export function PacketList({ communityId }: { communityId: number }) {
  const list = useQuery({
    queryKey: ["packets", communityId],
    queryFn: () => api<{ packets: PacketRow[] }>(`/api/communities/${communityId}/packets`),
  });
  return (
    <section>
      <h2 className="mb-2 text-sm font-semibold">Kept files</h2>
      {list.isPending ? <p className="text-zinc-500">Loading…</p> : null}
      {list.isError ? <p className="text-red-700">{list.error.message}</p> : null}
      {list.data ? (
        <DataTable
          testId="packet-list"
          rows={list.data.packets}
          rowKey={(p) => p.id}
          empty="No packet has been made or sent for this community yet."
          columns={[
            { header: "Made", cell: (p) => when(p.createdAt) },
            { header: "By", cell: (p) => p.createdByName },
            { header: "What", cell: (p) => KIND_LABELS[p.kind] },
            { header: "Lots", numeric: true, cell: (p) => p.lotCount.toLocaleString("en-US") },
            { header: "Sent to", cell: (p) => (p.sentTo && p.sentTo.length > 0 ? p.sentTo.join(", ") : "—") },
            {
              header: "Size",
              numeric: true,
              cell: (p) => (p.state === "ready" ? `${(p.sizeBytes / 1e6).toFixed(2)} MB` : ""),
            },
            {
              header: "File",
              cell: (p) =>
                p.state === "failed" ? (
                  <span className="text-red-700">not made: {p.error}</span>
                ) : p.state !== "ready" ? (
                  <span className="text-zinc-500">
                    {p.state === "queued"
                      ? "waiting to be made…"
                      : p.state === "sending"
                        ? "sending…"
                        : "being made…"}
                  </span>
                ) : (
                  <a
                    className="text-accent-700 hover:underline"
                    href={`/api/packets/${p.id}`}
                    target="_blank"
                    rel="noopener"
                    data-testid={`packet-download-${p.id}`}
                  >
                    {p.fileName}
                  </a>
                ),
            },
          ]}
        />
      ) : null}
    </section>
  );
}

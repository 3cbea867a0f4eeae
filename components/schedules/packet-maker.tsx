"use client";

import { useMutation } from "@tanstack/react-query";
import { useEffect, useRef, useState } from "react";
import { Button, FormError } from "@/components/ui/field";
import { api, type ApiError } from "@/lib/client/api";
import { packetFinished, usePolled, type PacketProgress } from "@/lib/client/poll";
import { PACKET_STATE_WORDS, PERMIT_STATUS_VALUES, WorkingBar } from "./working-bar";

/** "Make permit packet": all lots or the lots handed in for permit, as one PDF kept with the community. */
export function PacketMaker({
  communityId,
  lotCount,
  permitLotCount,
  onMade,
}: {
  communityId: number;
  lotCount: number;
  permitLotCount: number;
  onMade: () => void;
}) {
  const [which, setWhich] = useState<"all" | "permit">("all");
  const [packetId, setPacketId] = useState<number | null>(null);
  const make = useMutation({
    mutationFn: (scope: "all" | "permit") =>
      api<{ packetId: number; lotCount: number }>(`/api/communities/${communityId}/packets`, {
        method: "POST",
        body: scope === "permit" ? { statuses: PERMIT_STATUS_VALUES } : {},
      }),
    onMutate: () => setPacketId(null),
    onSuccess: (queued) => {
      setPacketId(queued.packetId);
      onMade();
    },
  });
  // The packet is made by a worker: follow it until it is ready (or failed), then list it again.
  const progress = usePolled<{ packet: PacketProgress }>(
    packetId ? `/api/packets/${packetId}/status` : null,
    packetFinished,
  );
  const packet = progress.data?.packet ?? null;
  const reported = useRef<number | null>(null);
  useEffect(() => {
    if (packet && packetFinished({ packet }) && reported.current !== packet.id) {
      reported.current = packet.id;
      onMade();
    }
  }, [packet, onMade]);
  const working = make.isPending || (packetId !== null && (!packet || !packetFinished({ packet })));
  const chosenCount = which === "all" ? lotCount : permitLotCount;
  const made = packet?.state === "ready" ? packet : null;

  return (
    <section className="rounded border border-zinc-200 bg-white p-4" data-testid="packet-maker">
      <h2 className="mb-2 text-sm font-semibold">Make permit packet</h2>
      <p className="mb-3 text-xs text-zinc-600">
        One PDF with a cover page and a load report per lot; it is kept below with who made it and when. Lots
        handed in for permit report their frozen snapshot.
      </p>
      <fieldset className="mb-3 flex flex-col gap-1 text-sm">
        <legend className="sr-only">Which lots</legend>
        <label className="flex items-center gap-2">
          <input type="radio" name="packet-lots" checked={which === "all"} onChange={() => setWhich("all")} />
          All lots ({lotCount})
        </label>
        <label className="flex items-center gap-2">
          <input
            type="radio"
            name="packet-lots"
            checked={which === "permit"}
            onChange={() => setWhich("permit")}
          />
          Lots submitted for permit, permitted or built ({permitLotCount})
        </label>
      </fieldset>
      <FormError
        message={
          make.isError
            ? (make.error as ApiError).message
            : packet?.state === "failed"
              ? `The packet could not be made: ${packet.error ?? "unknown reason"}`
              : null
        }
        testId="packet-error"
      />
      {working ? (
        <WorkingBar
          label={`${packet ? PACKET_STATE_WORDS[packet.state] : "Asking for"} the packet of ${chosenCount} lot${chosenCount === 1 ? "" : "s"}…`}
          testId="packet-progress"
        />
      ) : null}
      {made && !working ? (
        <p
          className="mb-3 rounded border border-accent-100 bg-accent-50 px-3 py-2 text-xs text-accent-800"
          data-testid="packet-made"
        >
          Made {made.fileName}: {made.lotCount} lots, {(made.sizeBytes / 1e6).toFixed(2)} MB.{" "}
          <a
            className="font-medium underline"
            href={`/api/packets/${made.id}`}
            target="_blank"
            rel="noopener"
          >
            Open the PDF
          </a>
        </p>
      ) : null}
      <Button type="button" disabled={working || chosenCount === 0} onClick={() => make.mutate(which)}>
        Make permit packet
      </Button>
    </section>
  );
}

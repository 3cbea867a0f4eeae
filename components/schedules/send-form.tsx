"use client";

import { useMutation } from "@tanstack/react-query";
import { useEffect, useRef, useState } from "react";
import { Button, FormError } from "@/components/ui/field";
import { api, type ApiError } from "@/lib/client/api";
import { packetFinished, usePolled, type PacketProgress } from "@/lib/client/poll";
import { PACKET_STATE_WORDS, PERMIT_STATUS_VALUES, WorkingBar } from "./working-bar";

type Choice = "permit-packet-all" | "permit-packet-permit" | "equipment-schedule" | "permit-schedule";

const CHOICES: { value: Choice; label: (n: { all: number; permit: number }) => string }[] = [
  { value: "permit-packet-all", label: (n) => `Permit packet, all lots (PDF, ${n.all} lots)` },
  {
    value: "permit-packet-permit",
    label: (n) => `Permit packet, lots submitted for permit (PDF, ${n.permit} lots)`,
  },
  { value: "equipment-schedule", label: () => "Equipment schedule (XLSX)" },
  { value: "permit-schedule", label: () => "Permit schedule (XLSX)" },
];

/** Splits what was typed into addresses: commas, semicolons, spaces or new lines between them. */
export function splitAddresses(text: string): string[] {
  return text
    .split(/[\s,;]+/)
    .map((a) => a.trim())
    .filter(Boolean);
}

/** E-mail a packet or a schedule; the server checks every address and keeps the file with who sent it. */
export function SendForm({
  communityId,
  lotCount,
  permitLotCount,
  onSent,
}: {
  communityId: number;
  lotCount: number;
  permitLotCount: number;
  onSent: () => void;
}) {
  const [addresses, setAddresses] = useState("");
  const [choice, setChoice] = useState<Choice>("permit-packet-all");
  const [packetId, setPacketId] = useState<number | null>(null);
  const send = useMutation({
    mutationFn: (v: { to: string[]; choice: Choice }) =>
      api<{ packetId: number; sentTo: string[] }>(`/api/communities/${communityId}/send`, {
        method: "POST",
        body: {
          to: v.to,
          what: v.choice.startsWith("permit-packet") ? "permit-packet" : v.choice,
          ...(v.choice === "permit-packet-permit" ? { statuses: PERMIT_STATUS_VALUES } : {}),
        },
      }),
    onSuccess: (r) => {
      setPacketId(r.packetId);
      onSent();
    },
  });
  // A worker makes and sends the file: follow it until it is sent (or failed), then list it again.
  const progress = usePolled<{ packet: PacketProgress }>(
    packetId ? `/api/packets/${packetId}/status` : null,
    packetFinished,
  );
  const packet = progress.data?.packet ?? null;
  const reported = useRef<number | null>(null);
  useEffect(() => {
    if (packet && packetFinished({ packet }) && reported.current !== packet.id) {
      reported.current = packet.id;
      onSent();
    }
  }, [packet, onSent]);
  const working = send.isPending || (packetId !== null && (!packet || !packetFinished({ packet })));
  const sentTo = packet?.state === "ready" ? packet.sentTo : null;

  const error = send.isError ? (send.error as ApiError) : null;
  const addressErrors = error?.fieldErrors.filter((f) => f.field === "to" || f.field.startsWith("to.")) ?? [];
  const typed = splitAddresses(addresses);

  return (
    <section className="rounded border border-zinc-200 bg-white p-4" data-testid="send-form">
      <h2 className="mb-2 text-sm font-semibold">Send by e-mail</h2>
      <form
        onSubmit={(e) => {
          e.preventDefault();
          setPacketId(null);
          send.mutate({ to: typed, choice });
        }}
      >
        <div className="mb-3">
          <label htmlFor="send-to" className="mb-1 block text-xs font-medium text-zinc-700">
            To (up to 20 addresses, separated by commas or new lines)
          </label>
          <textarea
            id="send-to"
            name="to"
            rows={2}
            value={addresses}
            onChange={(e) => setAddresses(e.target.value)}
            aria-invalid={addressErrors.length > 0 ? true : undefined}
            aria-describedby={addressErrors.length > 0 ? "send-to-error" : undefined}
            className={`w-full rounded border px-2.5 py-1.5 text-sm outline-none focus:border-accent-600 ${addressErrors.length > 0 ? "border-red-600" : "border-zinc-300"}`}
          />
          {addressErrors.length > 0 ? (
            <ul id="send-to-error" className="mt-1 text-xs text-red-700" data-testid="send-to-error">
              {addressErrors.map((f) => (
                <li key={f.field + f.message}>
                  {f.field.startsWith("to.") ? `Address ${Number(f.field.slice(3)) + 1}: ` : ""}
                  {f.message}
                </li>
              ))}
            </ul>
          ) : null}
        </div>
        <div className="mb-3">
          <label htmlFor="send-what" className="mb-1 block text-xs font-medium text-zinc-700">
            What to send
          </label>
          <select
            id="send-what"
            value={choice}
            onChange={(e) => setChoice(e.target.value as Choice)}
            className="w-full rounded border border-zinc-300 bg-white px-2 py-1.5"
          >
            {CHOICES.map((c) => (
              <option key={c.value} value={c.value}>
                {c.label({ all: lotCount, permit: permitLotCount })}
              </option>
            ))}
          </select>
        </div>
        <FormError
          message={
            error && addressErrors.length === 0
              ? error.message
              : packet?.state === "failed"
                ? `Nothing was sent: ${packet.error ?? "unknown reason"}`
                : null
          }
          testId="send-error"
        />
        {working ? (
          <WorkingBar
            label={`${packet ? PACKET_STATE_WORDS[packet.state] : "Asking for"} the file…`}
            testId="send-progress"
          />
        ) : null}
        {sentTo && !working ? (
          <p
            className="mb-3 rounded border border-accent-100 bg-accent-50 px-3 py-2 text-xs text-accent-800"
            data-testid="send-result"
          >
            Sent to {sentTo.join(", ")}. The file is kept in the list below.
          </p>
        ) : null}
        <Button type="submit" disabled={working || typed.length === 0}>
          Send
        </Button>
      </form>
    </section>
  );
}

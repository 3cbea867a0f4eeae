"use client";

import { useQuery } from "@tanstack/react-query";
import { api } from "./api";

/**
 * Follows work a worker is doing (an import, a packet): reads `path` every half second until
 * `finished` says it is done, then stops. Nothing to follow while `path` is null.
 */
export function usePolled<T>(path: string | null, finished: (value: T) => boolean) {
  return useQuery({
    queryKey: ["polled", path],
    queryFn: () => api<T>(path!),
    enabled: path !== null,
    refetchInterval: (query) => (query.state.data && finished(query.state.data) ? false : 500),
    refetchOnWindowFocus: false,
  });
}

/** An import as GET /api/imports/:id answers it. */
export interface ImportProgress {
  id: number;
  state: "received" | "validating" | "computing" | "saving" | "succeeded" | "failed";
  progressPct: number;
  createdCount: number;
  updatedCount: number;
  errors: { row: number; column: string; reason: string }[] | null;
  errorCount: number;
}

export const importFinished = ({ import: record }: { import: ImportProgress }) =>
  record.state === "succeeded" || record.state === "failed";

/** A packet as GET /api/packets/:id/status answers it. */
export interface PacketProgress {
  id: number;
  kind: string;
  state: "queued" | "rendering" | "sending" | "ready" | "failed";
  fileName: string;
  lotCount: number;
  sizeBytes: number;
  sentTo: string[] | null;
  error: string | null;
}

export const packetFinished = ({ packet }: { packet: PacketProgress }) =>
  packet.state === "ready" || packet.state === "failed";

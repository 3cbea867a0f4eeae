"use client";

import { useEffect, useState } from "react";

/** The statuses of lots handed in for permit (they carry a frozen snapshot). */
export const PERMIT_STATUS_VALUES = ["permit_submitted", "permitted", "built"] as const;

/** What a packet's state says to the person waiting for it. */
export const PACKET_STATE_WORDS = {
  queued: "Waiting to make",
  rendering: "Making",
  sending: "Sending",
  ready: "Made",
  failed: "Could not make",
} as const;

/**
 * Progress while a worker makes a file: a packet reports its stage, not a percentage, so the
 * bar is indeterminate and shows the time gone by.
 */
export function WorkingBar({ label, testId }: { label: string; testId: string }) {
  const [seconds, setSeconds] = useState(0);
  useEffect(() => {
    const started = Date.now();
    const timer = setInterval(() => setSeconds(Math.floor((Date.now() - started) / 1000)), 500);
    return () => clearInterval(timer);
  }, []);
  return (
    <div className="mb-3" data-testid={testId}>
      <div className="mb-1 flex justify-between text-xs text-zinc-600">
        <span>{label}</span>
        <span className="num">{seconds} s</span>
      </div>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuetext={`working, ${seconds} seconds`}
        className="h-2 overflow-hidden rounded bg-zinc-200"
      >
        <div className="h-full w-1/3 animate-pulse rounded bg-accent-600" />
      </div>
    </div>
  );
}

"use client";

import Link from "next/link";
import { useEffect, useState } from "react";
import { Button } from "@/components/ui/field";
import { ImportErrors } from "@/components/ui/import-errors";
import type { ErrorBody } from "@/lib/errors";

interface ImportState {
  state: "received" | "validating" | "computing" | "saving" | "succeeded" | "failed";
  progressPct: number;
  createdCount: number;
  updatedCount: number;
  errors: { row: number; column: string; reason: string }[] | null;
  errorCount: number;
}

const STAGES = [
  { key: "upload", label: "Upload" },
  { key: "validating", label: "Validate" },
  { key: "computing", label: "Compute" },
  { key: "saving", label: "Save" },
] as const;

/**
 * Upload a lots file with a progress bar through upload, validate, compute and save. The import
 * is a job a worker runs after the upload: leaving the page is fine, the result is on the Imports page.
 */
export function LotImportPanel({ communityId, onDone }: { communityId: number; onDone: () => void }) {
  const [file, setFile] = useState<File | null>(null);
  const [uploadPct, setUploadPct] = useState<number | null>(null);
  const [importId, setImportId] = useState<number | null>(null);
  const [status, setStatus] = useState<ImportState | null>(null);
  const [error, setError] = useState<string | null>(null);

  useEffect(() => {
    if (!importId) return;
    let stopped = false;
    const poll = async () => {
      const response = await fetch(`/api/imports/${importId}`);
      if (!response.ok || stopped) return;
      const { import: record } = (await response.json()) as { import: ImportState };
      setStatus(record);
      if (record.state === "succeeded" || record.state === "failed") {
        if (record.state === "succeeded") onDone();
        return;
      }
      setTimeout(poll, 400);
    };
    void poll();
    return () => {
      stopped = true;
    };
  }, [importId, onDone]);

  function upload() {
    if (!file) return;
    setError(null);
    setStatus(null);
    setImportId(null);
    setUploadPct(0);
    const form = new FormData();
    form.append("file", file);
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api/communities/${communityId}/lots/import`);
    xhr.upload.onprogress = (e) => e.lengthComputable && setUploadPct(Math.round((100 * e.loaded) / e.total));
    xhr.onload = () => {
      setUploadPct(100);
      const body = JSON.parse(xhr.responseText || "null") as
        (Partial<ErrorBody> & { importId?: number }) | null;
      if (xhr.status === 202 && body?.importId) setImportId(body.importId);
      else setError(body?.error?.message ?? `The server answered ${xhr.status}.`);
    };
    xhr.onerror = () => setError("The upload did not reach the server; nothing was imported.");
    xhr.send(form);
  }

  const stageIndex = status
    ? Math.max(
        1,
        STAGES.findIndex((s) => s.key === status.state),
      )
    : uploadPct !== null
      ? 0
      : -1;
  const overall = status
    ? status.state === "succeeded" || status.state === "failed"
      ? 100
      : status.progressPct
    : uploadPct !== null
      ? Math.round(uploadPct * 0.05)
      : 0;
  const busy = uploadPct !== null && !error && status?.state !== "succeeded" && status?.state !== "failed";

  return (
    <section
      className="rounded border border-zinc-200 bg-white p-3"
      aria-labelledby="lot-import-heading"
      data-testid="lot-import"
    >
      <h2 id="lot-import-heading" className="mb-1 text-sm font-semibold">
        Import lots
      </h2>
      <p className="mb-2 text-xs text-zinc-600">
        CSV or XLSX with the columns Lot, Address, Plan code, Facing, Options note, Status, Planned start (
        <a
          className="text-accent-700 hover:underline"
          href={`/api/communities/${communityId}/lots/template?format=xlsx`}
        >
          template XLSX
        </a>
        ,{" "}
        <a
          className="text-accent-700 hover:underline"
          href={`/api/communities/${communityId}/lots/template?format=csv`}
        >
          CSV
        </a>
        ). Lots are created or updated by lot number and every lot of the community is recomputed. The whole
        file is checked first; if any cell is wrong, nothing is written.
      </p>
      <div className="flex items-center gap-2">
        <label htmlFor="lot-import-file" className="sr-only">
          Lots file
        </label>
        <input
          id="lot-import-file"
          type="file"
          accept=".csv,.xlsx"
          className="text-xs"
          onChange={(e) => setFile(e.target.files?.[0] ?? null)}
        />
        <Button type="button" onClick={upload} disabled={!file || busy}>
          Import
        </Button>
      </div>
      {uploadPct !== null && !error ? (
        <div className="mt-3" data-testid="import-progress">
          <div className="mb-1 flex gap-4 text-xs">
            {STAGES.map((s, i) => (
              <span
                key={s.key}
                className={
                  i < stageIndex || status?.state === "succeeded"
                    ? "text-accent-700"
                    : i === stageIndex
                      ? "font-semibold text-zinc-900"
                      : "text-zinc-400"
                }
              >
                {i + 1}. {s.label}
              </span>
            ))}
          </div>
          <div
            className="h-2 w-full overflow-hidden rounded bg-zinc-200"
            role="progressbar"
            aria-label="Import progress"
            aria-valuenow={overall}
            aria-valuemin={0}
            aria-valuemax={100}
          >
            <div
              className={`h-full ${status?.state === "failed" ? "bg-red-600" : "bg-accent-600"}`}
              style={{ width: `${overall}%` }}
            />
          </div>
          {busy ? (
            <p className="mt-1 text-xs text-zinc-500">
              You may leave this page; the import goes on and its result will be on the{" "}
              <Link href="/imports" className="text-accent-700 hover:underline">
                Imports
              </Link>{" "}
              page.
            </p>
          ) : null}
        </div>
      ) : null}
      {status?.state === "succeeded" ? (
        <p className="mt-2 text-xs text-accent-800" data-testid="lot-import-result">
          Imported: {status.createdCount} lots created, {status.updatedCount} updated; every lot recomputed.
        </p>
      ) : null}
      {error ? (
        <p
          className="mt-2 rounded border border-red-200 bg-red-50 p-2 text-xs text-red-800"
          data-testid="lot-import-errors"
        >
          {error}
        </p>
      ) : null}
      {status?.state === "failed" ? (
        <ImportErrors
          message={`${status.errorCount.toLocaleString("en-US")} problem(s) in the file; nothing was imported.`}
          errors={status.errors ?? []}
          total={status.errorCount}
          testId="lot-import-errors"
        />
      ) : null}
    </section>
  );
}

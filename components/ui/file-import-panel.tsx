"use client";

import Link from "next/link";
import { useEffect, useRef, useState } from "react";
import { Button } from "@/components/ui/field";
import type { ErrorBody } from "@/lib/errors";
import { importFinished, usePolled, type ImportProgress } from "@/lib/client/poll";
import { ImportErrors } from "./import-errors";

const STATE_WORDS: Record<ImportProgress["state"], string> = {
  received: "Queued",
  validating: "Checking the file",
  computing: "Computing",
  saving: "Saving",
  succeeded: "Done",
  failed: "Refused",
};

/**
 * Upload one CSV/XLSX file to an all-or-nothing importer. The upload is kept and queued; a worker
 * checks and saves it while this panel follows its progress: the result on success, or every bad
 * cell (row, column, reason) when the file was refused.
 */
export function FileImportPanel({
  title,
  description,
  endpoint,
  inputId,
  testId,
  describeResult,
  onImported,
}: {
  title: string;
  description: string;
  endpoint: string;
  inputId: string;
  testId: string;
  describeResult: (record: ImportProgress) => string;
  onImported: () => void;
}) {
  const [file, setFile] = useState<File | null>(null);
  const [sending, setSending] = useState(false);
  const [importId, setImportId] = useState<number | null>(null);
  const [refused, setRefused] = useState<{
    message: string;
    errors: { row?: number; column?: string; reason: string }[];
  } | null>(null);
  const progress = usePolled<{ import: ImportProgress }>(
    importId ? `/api/imports/${importId}` : null,
    importFinished,
  );
  const record = progress.data?.import ?? null;
  const reported = useRef<number | null>(null);

  useEffect(() => {
    if (record?.state === "succeeded" && reported.current !== record.id) {
      reported.current = record.id;
      onImported();
    }
  }, [record, onImported]);

  async function upload() {
    if (!file) return;
    setSending(true);
    setRefused(null);
    setImportId(null);
    const form = new FormData();
    form.append("file", file);
    const response = await fetch(endpoint, { method: "POST", body: form }).catch(() => null);
    const body = response
      ? ((await response.json().catch(() => null)) as (Partial<ErrorBody> & { importId?: number }) | null)
      : null;
    setSending(false);
    if (!response || response.status !== 202 || !body?.importId) {
      setRefused({
        message:
          body?.error?.message ??
          (response
            ? `The server answered ${response.status}.`
            : "The upload did not reach the server; nothing was imported."),
        errors: (body?.error?.fieldErrors ?? []).map((f) => ({
          row: f.row,
          column: f.column,
          reason: f.message,
        })),
      });
      return;
    }
    setImportId(body.importId);
  }

  const running =
    sending ||
    (record !== null && record.state !== "succeeded" && record.state !== "failed") ||
    (importId !== null && !record);

  return (
    <section
      className="rounded border border-zinc-200 bg-white p-3"
      aria-labelledby={`${inputId}-heading`}
      data-testid={testId}
    >
      <h2 id={`${inputId}-heading`} className="mb-1 text-sm font-semibold">
        {title}
      </h2>
      <p className="mb-2 text-xs text-zinc-600">{description}</p>
      <div className="flex items-center gap-2">
        <label htmlFor={inputId} className="sr-only">
          Choose a .csv or .xlsx file
        </label>
        <input
          id={inputId}
          type="file"
          accept=".csv,.xlsx"
          onChange={(e) => setFile(e.target.files?.[0] ?? null)}
          className="text-xs"
        />
        <Button type="button" onClick={upload} disabled={!file || running}>
          {running ? "Importing…" : "Import"}
        </Button>
      </div>
      {running && record ? (
        <p className="mt-2 text-xs text-zinc-600" data-testid={`${testId}-progress`}>
          {STATE_WORDS[record.state]} ({record.progressPct} %). You may leave this page; the result will be on
          the{" "}
          <Link href="/imports" className="text-accent-700 hover:underline">
            Imports
          </Link>{" "}
          page.
        </p>
      ) : null}
      {record?.state === "succeeded" ? (
        <p className="mt-2 text-xs text-accent-800" data-testid={`${testId}-result`}>
          {describeResult(record)}
        </p>
      ) : null}
      {refused ? (
        <ImportErrors message={refused.message} errors={refused.errors} testId={`${testId}-errors`} />
      ) : null}
      {record?.state === "failed" ? (
        <ImportErrors
          message={`${record.errorCount.toLocaleString("en-US")} problem(s) in the file; nothing was imported.`}
          errors={record.errors ?? []}
          total={record.errorCount}
          testId={`${testId}-errors`}
        />
      ) : null}
    </section>
  );
}

"use client";

import { useState } from "react";
import { Button } from "@/components/ui/field";
import type { ErrorBody } from "@/lib/errors";
import { ImportErrors } from "./import-errors";

/**
 * Upload one CSV/XLSX file to an all-or-nothing import route: the result on success, or every bad
 * cell (row, column, reason) when the file was refused.
 */
export function FileImportPanel<T>({
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
  describeResult: (body: T) => string;
  onImported: () => void;
}) {
  const [file, setFile] = useState<File | null>(null);
  const [busy, setBusy] = useState(false);
  const [result, setResult] = useState<string | null>(null);
  const [error, setError] = useState<{ message: string; errors: { row?: number; column?: string; reason: string }[] } | null>(null);

  async function upload() {
    if (!file) return;
    setBusy(true);
    setError(null);
    setResult(null);
    const form = new FormData();
    form.append("file", file);
    const response = await fetch(endpoint, { method: "POST", body: form });
    const body = (await response.json().catch(() => null)) as (Partial<ErrorBody> & T) | null;
    setBusy(false);
    if (!response.ok || !body) {
      setError({ message: body?.error?.message ?? `The server answered ${response.status}.`, errors: (body?.error?.fieldErrors ?? []).map((f) => ({ row: f.row, column: f.column, reason: f.message })) });
      return;
    }
    setResult(describeResult(body));
    onImported();
  }

  return (
    <section className="rounded border border-zinc-200 bg-white p-3" aria-labelledby={`${inputId}-heading`} data-testid={testId}>
      <h2 id={`${inputId}-heading`} className="mb-1 text-sm font-semibold">
        {title}
      </h2>
      <p className="mb-2 text-xs text-zinc-600">{description}</p>
      <div className="flex items-center gap-2">
        <label htmlFor={inputId} className="sr-only">
          Choose a .csv or .xlsx file
        </label>
        <input id={inputId} type="file" accept=".csv,.xlsx" onChange={(e) => setFile(e.target.files?.[0] ?? null)} className="text-xs" />
        <Button type="button" onClick={upload} disabled={!file || busy}>
          {busy ? "Importing…" : "Import"}
        </Button>
      </div>
      {result ? (
        <p className="mt-2 text-xs text-accent-800" data-testid={`${testId}-result`}>
          {result}
        </p>
      ) : null}
      {error ? <ImportErrors message={error.message} errors={error.errors} testId={`${testId}-errors`} /> : null}
    </section>
  );
}

"use client";

import { useState } from "react";
import { Button } from "@/components/ui/field";
import type { ErrorBody, FieldError } from "@/lib/errors";

/** Upload a plan library file; every bad cell is listed (row, column, reason) and nothing is written. */
export function PlanImportPanel({ onImported }: { onImported: () => void }) {
  const [file, setFile] = useState<File | null>(null);
  const [busy, setBusy] = useState(false);
  const [result, setResult] = useState<{ created: number; updated: number } | null>(null);
  const [error, setError] = useState<{ message: string; fields: FieldError[] } | null>(null);

  async function upload() {
    if (!file) return;
    setBusy(true);
    setError(null);
    setResult(null);
    const form = new FormData();
    form.append("file", file);
    const response = await fetch("/api/plans/import", { method: "POST", body: form });
    const body = (await response.json().catch(() => null)) as (Partial<ErrorBody> & { created?: number; updated?: number }) | null;
    setBusy(false);
    if (!response.ok) {
      setError({ message: body?.error?.message ?? `The server answered ${response.status}.`, fields: body?.error?.fieldErrors ?? [] });
      return;
    }
    setResult({ created: body?.created ?? 0, updated: body?.updated ?? 0 });
    onImported();
  }

  return (
    <section className="rounded border border-zinc-200 bg-white p-3" aria-labelledby="plan-import-heading" data-testid="plan-import">
      <h2 id="plan-import-heading" className="mb-2 text-sm font-semibold">
        Import plan models
      </h2>
      <p className="mb-2 text-xs text-zinc-600">
        A CSV or XLSX file in the template layout. Plans are created or updated by plan code. The whole file is checked first: if any cell is
        wrong, nothing is imported and every bad cell is listed.
      </p>
      <div className="flex items-center gap-2">
        <label htmlFor="plan-import-file" className="sr-only">
          Plan library file
        </label>
        <input id="plan-import-file" type="file" accept=".csv,.xlsx" onChange={(e) => setFile(e.target.files?.[0] ?? null)} className="text-xs" />
        <Button type="button" onClick={upload} disabled={!file || busy}>
          {busy ? "Importing…" : "Import"}
        </Button>
      </div>
      {result ? (
        <p className="mt-2 text-xs text-accent-800" data-testid="import-result">
          Imported: {result.created} created, {result.updated} updated. The import is listed on the Imports page.
        </p>
      ) : null}
      {error ? (
        <div className="mt-2 rounded border border-red-200 bg-red-50 p-2 text-xs text-red-800" data-testid="import-errors">
          <p className="font-medium">{error.message}</p>
          {error.fields.length > 0 ? (
            <table className="mt-1 w-full text-left">
              <thead>
                <tr>
                  <th className="pr-3 font-medium">Row</th>
                  <th className="pr-3 font-medium">Column</th>
                  <th className="font-medium">Problem</th>
                </tr>
              </thead>
              <tbody>
                {error.fields.slice(0, 200).map((f, i) => (
                  <tr key={i}>
                    <td className="pr-3 align-top">{f.row}</td>
                    <td className="pr-3 align-top">{f.column}</td>
                    <td>{f.message}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          ) : null}
        </div>
      ) : null}
    </section>
  );
}

"use client";

import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/field";
import { api, type ApiError } from "@/lib/client/api";
import { ConditionsForm, DEFAULT_CONDITIONS, type Conditions } from "./conditions-form";

export function NewCommunity() {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [error, setError] = useState<ApiError | null>(null);
  const create = useMutation({
    mutationFn: (body: { name: string; locality: string; conditions: Conditions }) =>
      api<{ id: number }>("/api/communities", { method: "POST", body }),
    onSuccess: ({ id }) => router.push(`/communities/${id}`),
    onError: (e: ApiError) => setError(e),
  });
  if (!open) {
    return (
      <Button type="button" onClick={() => setOpen(true)}>
        New community
      </Button>
    );
  }
  return (
    <section className="rounded border border-zinc-200 bg-white p-4" aria-labelledby="new-community-heading">
      <h2 id="new-community-heading" className="mb-3 text-sm font-semibold">
        New community
      </h2>
      <ConditionsForm
        initial={{ name: "", locality: "", conditions: DEFAULT_CONDITIONS }}
        submitLabel="Create community"
        busy={create.isPending}
        error={error}
        onSubmit={(v) => create.mutate(v)}
        showPresets
      />
    </section>
  );
}

"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormError } from "@/components/ui/field";
import { api } from "@/lib/client/api";

export function AccountPicker({
  accounts,
}: {
  accounts: { accountId: number; accountName: string; role: string }[];
}) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);

  async function choose(accountId: number) {
    try {
      await api("/api/session/account", { method: "POST", body: { accountId } });
      router.push("/plans");
      router.refresh();
    } catch (e) {
      setError((e as Error).message);
    }
  }

  return (
    <div>
      <FormError message={error} />
      <ul className="divide-y divide-zinc-200 rounded border border-zinc-200">
        {accounts.map((a) => (
          <li key={a.accountId}>
            <button
              type="button"
              onClick={() => choose(a.accountId)}
              className="flex w-full items-center justify-between px-3 py-2.5 text-left hover:bg-accent-50"
            >
              <span className="font-medium">{a.accountName}</span>
              <span className="text-xs capitalize text-zinc-500">{a.role}</span>
            </button>
          </li>
        ))}
      </ul>
    </div>
  );
}

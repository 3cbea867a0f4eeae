"use client";

import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button, FormError, TextField } from "@/components/ui/field";
import { api, ApiError } from "@/lib/client/api";

export function AcceptInvitationForm({
  token,
  email,
  defaultName,
}: {
  token: string;
  email: string;
  defaultName: string;
}) {
  const router = useRouter();
  const [name, setName] = useState(defaultName);
  const [password, setPassword] = useState("");
  const [confirm, setConfirm] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    if (password !== confirm) {
      setError("The two passwords are not the same.");
      return;
    }
    setBusy(true);
    setError(null);
    try {
      await api(`/api/invitations/${encodeURIComponent(token)}`, {
        method: "POST",
        body: { name, password },
      });
      const result = await signIn("credentials", { email, password, redirect: false });
      if (result?.error) throw new Error(result.error);
      router.push("/accounts");
      router.refresh();
    } catch (e) {
      setError(e instanceof ApiError || e instanceof Error ? e.message : "Could not accept the invitation.");
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} noValidate>
      <FormError message={error} />
      <TextField label="Your name" name="name" value={name} onChange={setName} autoComplete="name" />
      <TextField
        label="Password (at least 10 characters)"
        name="password"
        type="password"
        value={password}
        onChange={setPassword}
        autoComplete="new-password"
        required
      />
      <TextField
        label="Password again"
        name="confirm"
        type="password"
        value={confirm}
        onChange={setConfirm}
        autoComplete="new-password"
        required
      />
      <Button type="submit" disabled={busy} className="mt-2 w-full">
        {busy ? "Joining…" : "Set password and join"}
      </Button>
    </form>
  );
}

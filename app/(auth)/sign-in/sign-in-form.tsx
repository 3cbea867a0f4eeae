"use client";

import { signIn } from "next-auth/react";
import { useRouter, useSearchParams } from "next/navigation";
import { useState } from "react";
import { Button, FormError, TextField } from "@/components/ui/field";

export function SignInForm() {
  const router = useRouter();
  const params = useSearchParams();
  const [email, setEmail] = useState("");
  const [password, setPassword] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    setBusy(true);
    setError(null);
    const result = await signIn("credentials", { email, password, redirect: false });
    setBusy(false);
    if (!result || result.error) {
      setError(
        result?.error && result.error !== "CredentialsSignin"
          ? result.error
          : "That e-mail and password do not match an account.",
      );
      return;
    }
    const next = params.get("callbackUrl");
    router.push(next && next.startsWith("/") ? next : "/accounts");
    router.refresh();
  }

  return (
    <form onSubmit={submit} noValidate>
      <h1 className="mb-4 text-base font-semibold">Sign in</h1>
      <FormError message={error} testId="sign-in-error" />
      <TextField
        label="E-mail"
        name="email"
        type="email"
        autoComplete="username"
        value={email}
        onChange={setEmail}
        required
      />
      <TextField
        label="Password"
        name="password"
        type="password"
        autoComplete="current-password"
        value={password}
        onChange={setPassword}
        required
      />
      <Button type="submit" disabled={busy} className="mt-2 w-full">
        {busy ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}

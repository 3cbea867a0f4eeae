"use client";

import { signOut } from "next-auth/react";
import { Button } from "@/components/ui/field";

export default function SignOutPage() {
  return (
    <div>
      <h1 className="mb-2 text-base font-semibold">Sign out</h1>
      <p className="mb-4 text-zinc-600">You will need your e-mail and password to come back.</p>
      <Button className="w-full" onClick={() => signOut({ callbackUrl: "/sign-in" })}>
        Sign out
      </Button>
    </div>
  );
}

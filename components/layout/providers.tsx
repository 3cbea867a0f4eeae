"use client";

import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { SessionProvider } from "next-auth/react";
import { useState } from "react";
import { z } from "zod";

// The pages' content security policy allows no eval (lib/http/security-headers.ts); zod would try
// `new Function` once to see whether it may compile its parsers, and the browser reports that as
// a violation. Parsing without compiling is zod's own fallback.
z.config({ jitless: true });

export function Providers({ children }: { children: React.ReactNode }) {
  const [client] = useState(
    () =>
      new QueryClient({
        defaultOptions: { queries: { staleTime: 15_000, retry: 1, refetchOnWindowFocus: false } },
      }),
  );
  return (
    <SessionProvider>
      <QueryClientProvider client={client}>{children}</QueryClientProvider>
    </SessionProvider>
  );
}

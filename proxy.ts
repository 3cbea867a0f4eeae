import { NextResponse, type NextRequest } from "next/server";
import { pageContentSecurityPolicy } from "@/lib/http/security-headers";

/**
 * Every page gets a content security policy with a fresh nonce. Next reads the nonce from the
 * request's policy header and puts it on the scripts it renders, so pages must render per request
 * (app/layout.tsx waits for the request). API routes are left out: they render no HTML and carry
 * their own policy (next.config.ts).
 */
export function proxy(request: NextRequest) {
  const nonce = Buffer.from(crypto.getRandomValues(new Uint8Array(18))).toString("base64");
  const policy = pageContentSecurityPolicy({ nonce, development: process.env.NODE_ENV === "development" });
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("content-security-policy", policy);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set("content-security-policy", policy);
  return response;
}

export const config = {
  matcher: [
    {
      source: "/((?!api/|_next/static/|_next/image|favicon.ico).*)",
      missing: [
        { type: "header", key: "next-router-prefetch" },
        { type: "header", key: "purpose", value: "prefetch" },
      ],
    },
  ],
};

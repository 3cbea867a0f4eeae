import { PHASE_PRODUCTION_SERVER } from "next/constants";
import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";
import nextConfig from "@/next.config";
import { config as proxyConfig, proxy } from "@/proxy";

const directives = (policy: string) =>
  new Map(
    policy
      .split(";")
      .map((d) => d.trim().split(/\s+/))
      .map(([name, ...values]) => [name, values]),
  );

describe("security headers", () => {
  it("every answer: no MIME sniffing, no framing, no referrer to other sites; API answers: no caching and no framing", async () => {
    const rules = await nextConfig(PHASE_PRODUCTION_SERVER).headers!();
    const all = rules.find((r) => r.source === "/:path*")!.headers;
    expect(Object.fromEntries(all.map((h) => [h.key, h.value]))).toMatchObject({
      "X-Content-Type-Options": "nosniff",
      "X-Frame-Options": "DENY",
      "Referrer-Policy": "same-origin",
    });
    const api = Object.fromEntries(
      rules.find((r) => r.source === "/api/:path*")!.headers.map((h) => [h.key, h.value]),
    );
    expect(api["Cache-Control"]).toBe("no-store");
    expect(directives(api["Content-Security-Policy"]).get("frame-ancestors")).toEqual(["'none'"]);
  });

  it("pages get a policy with a fresh nonce, scripts only by nonce, no framing, no plugins", () => {
    const answer = () => proxy(new NextRequest("http://127.0.0.1:3720/plans"));
    const first = answer().headers.get("content-security-policy")!;
    const second = answer().headers.get("content-security-policy")!;
    const d = directives(first);
    const nonce = d.get("script-src")!.find((v) => v.startsWith("'nonce-"))!;
    expect(nonce).toMatch(/^'nonce-[A-Za-z0-9+/]{24}'$/);
    expect(second).not.toContain(nonce);
    expect(d.get("script-src")).toEqual(["'self'", nonce, "'strict-dynamic'"]); // no 'unsafe-inline', no 'unsafe-eval' outside development
    expect(d.get("frame-ancestors")).toEqual(["'none'"]);
    expect(d.get("object-src")).toEqual(["'none'"]);
    expect(d.get("default-src")).toEqual(["'self'"]);
    // AG Grid's theme and React's style attributes are inline styles
    expect(d.get("style-src")).toEqual(["'self'", "'unsafe-inline'"]);
  });

  it("Next reads the nonce from the request: the proxy passes the policy on to the page render", () => {
    const response = proxy(new NextRequest("http://127.0.0.1:3720/plans"));
    // NextResponse.next({ request: { headers } }) hands changed request headers to Next this way
    expect(response.headers.get("x-middleware-request-content-security-policy")).toBe(
      response.headers.get("content-security-policy"),
    );
  });

  it("runs for pages, not for API routes or built assets", () => {
    const source = proxyConfig.matcher[0].source;
    const matches = (path: string) => new RegExp(`^${source}$`).test(path);
    expect(matches("/plans")).toBe(true);
    expect(matches("/sign-in")).toBe(true);
    expect(matches("/")).toBe(true);
    expect(matches("/api/plans")).toBe(false);
    expect(matches("/_next/static/chunks/main.js")).toBe(false);
  });
});

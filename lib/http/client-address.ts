import type { IncomingMessage } from "node:http";
import ipaddr from "ipaddr.js";
import proxyaddr from "proxy-addr";

/**
 * The client's address, for the sign-in limits. Route handlers in Next.js never see the socket, and
 * `next start` keeps any X-Forwarded-For a client sends, so the address is decided at the edge:
 * scripts/serve.ts (the web server of `npm start`, `npm run dev`, the demo and the tests) computes
 * it from the socket and, behind PLATLOAD_TRUSTED_PROXIES proxies, from the last that many
 * X-Forwarded-For entries (proxy-addr), and writes it into this header after removing whatever
 * the client sent under that name. With 0 trusted proxies (the default) X-Forwarded-For is ignored.
 */
export const CLIENT_ADDRESS_HEADER = "x-platload-client-address";

const STAMPED = Symbol.for("platload.clientAddressStamped");
type Marked = { [STAMPED]?: boolean };

/** The edge says it stamps every request of this process (scripts/serve.ts; tests stand in for it). */
export function markClientAddressesStamped(on = true): void {
  (globalThis as Marked)[STAMPED] = on;
}

/** The client's address as proxy-addr finds it: the closest address not among the trusted hops. */
export function resolveClientAddress(
  request: Pick<IncomingMessage, "headers" | "socket">,
  trustedProxies: number,
): string {
  const found = proxyaddr(request as IncomingMessage, (_address, hop) => hop < trustedProxies);
  return normalizeAddress(found) ?? "unknown";
}

/** Run by the edge on every request before Next sees it. */
export function stampClientAddress(
  request: Pick<IncomingMessage, "headers" | "socket">,
  trustedProxies: number,
): void {
  // Node lowercases header names, so this removes the header in any spelling the client used.
  delete request.headers[CLIENT_ADDRESS_HEADER];
  request.headers[CLIENT_ADDRESS_HEADER] = resolveClientAddress(request, trustedProxies);
}

/** IPv4-mapped IPv6 becomes IPv4; anything that is not an address is null. */
export function normalizeAddress(text: string | undefined | null): string | null {
  if (!text || !ipaddr.isValid(text)) return null;
  return ipaddr.process(text).toString();
}

/**
 * The key an address is limited by: an IPv4 address itself, an IPv6 address by its /64 network
 * (one subscriber usually holds a whole /64 and could otherwise change address at every try).
 */
export function addressLimitKey(address: string): string {
  const normalized = normalizeAddress(address);
  if (!normalized) return "unknown";
  const parsed = ipaddr.parse(normalized);
  if (parsed.kind() === "ipv4") return normalized;
  return `${(parsed as ipaddr.IPv6).parts
    .slice(0, 4)
    .map((p) => p.toString(16))
    .join(":")}::/64`;
}

/**
 * The address the edge stamped on a request (headers as next-auth hands them to authorize). A
 * process not started by the edge has no trustworthy address: sign-in refuses rather than trust a
 * header any client can send.
 */
export function stampedClientAddress(headers: Record<string, unknown> | Headers | undefined): string {
  if (!(globalThis as Marked)[STAMPED]) {
    throw new Error(
      "Sign-in is unavailable: Platload must be started with its own web server (npm start, scripts/serve.ts) so it can tell clients apart.",
    );
  }
  const value =
    headers instanceof Headers ? headers.get(CLIENT_ADDRESS_HEADER) : headers?.[CLIENT_ADDRESS_HEADER];
  return (typeof value === "string" && normalizeAddress(value)) || "unknown";
}

import { afterEach, describe, expect, it } from "vitest";
import {
  addressLimitKey,
  CLIENT_ADDRESS_HEADER,
  markClientAddressesStamped,
  normalizeAddress,
  stampClientAddress,
  stampedClientAddress,
} from "@/lib/http/client-address";

// A request as Node's HTTP server hands it to scripts/serve.ts: lowercased headers and a socket.
const request = (remoteAddress: string, headers: Record<string, string> = {}) => ({
  headers: { ...headers } as Record<string, string | string[] | undefined>,
  socket: { remoteAddress } as never,
});

describe("the client address", () => {
  afterEach(() => markClientAddressesStamped(false));

  it("with no trusted proxy is the socket's, whatever X-Forwarded-For and our own header say", () => {
    const r = request("198.51.100.20", {
      "x-forwarded-for": "10.9.9.9",
      [CLIENT_ADDRESS_HEADER]: "10.8.8.8",
      "x-real-ip": "10.7.7.7",
    });
    stampClientAddress(r, 0);
    expect(r.headers[CLIENT_ADDRESS_HEADER]).toBe("198.51.100.20");
  });

  it("behind one proxy is the last X-Forwarded-For entry (the one the proxy added), not the client's own entries", () => {
    const r = request("10.0.0.2", { "x-forwarded-for": "1.2.3.4, 203.0.113.7" });
    stampClientAddress(r, 1);
    expect(r.headers[CLIENT_ADDRESS_HEADER]).toBe("203.0.113.7");
  });

  it("behind two proxies skips both proxies' hops", () => {
    const r = request("10.0.0.3", { "x-forwarded-for": "6.6.6.6, 203.0.113.7, 10.0.0.2" });
    stampClientAddress(r, 2);
    expect(r.headers[CLIENT_ADDRESS_HEADER]).toBe("203.0.113.7");
  });

  it("IPv4-mapped IPv6 sockets read as IPv4; non-addresses are not addresses", () => {
    const r = request("::ffff:127.0.0.1");
    stampClientAddress(r, 0);
    expect(r.headers[CLIENT_ADDRESS_HEADER]).toBe("127.0.0.1");
    expect(normalizeAddress("not an address")).toBeNull();
    expect(normalizeAddress("1.2.3.4, 5.6.7.8")).toBeNull();
  });

  it("limits IPv6 by its /64 network and IPv4 by the address", () => {
    expect(addressLimitKey("2001:db8:7:8::1")).toBe(addressLimitKey("2001:0db8:0007:0008:ffff:1:2:3"));
    expect(addressLimitKey("2001:db8:7:8::1")).not.toBe(addressLimitKey("2001:db8:7:9::1"));
    expect(addressLimitKey("203.0.113.7")).toBe("203.0.113.7");
  });

  it("is read from the stamped header only in a process the edge marked; elsewhere sign-in refuses", () => {
    const headers = { [CLIENT_ADDRESS_HEADER]: "203.0.113.7" };
    expect(() => stampedClientAddress(headers)).toThrow(/started with its own web server/);
    markClientAddressesStamped();
    expect(stampedClientAddress(headers)).toBe("203.0.113.7");
    expect(stampedClientAddress(new Headers(headers))).toBe("203.0.113.7");
    expect(stampedClientAddress({ [CLIENT_ADDRESS_HEADER]: "<script>" })).toBe("unknown");
  });
});

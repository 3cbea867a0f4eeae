import bcrypt from "bcryptjs";
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { getDb, getPool } from "@/db";
import { users } from "@/db/schema";
import { authorizeSignIn } from "@/lib/auth/options";
import { hashPassword } from "@/lib/auth/password";
import { ADDRESS, EMAIL, PAIR, SignInLimiter } from "@/lib/auth/rate-limit";
import { markClientAddressesStamped, stampClientAddress } from "@/lib/http/client-address";

// The sign-in as next-auth runs it (authorizeSignIn), on the shared MariaDB store, with each
// request's headers made by the edge's own stamping (scripts/serve.ts) from a socket address and
// whatever headers the client sent. Waits are skipped by moving the clock (Date only: the store
// compares its expiry times with Date.now()). The same through the real server, with real
// sockets, is tests/e2e/security.spec.ts.
const PASSWORD = "limit-owner-pass";
const stamp = Date.now();
const owner = `limit.owner.${stamp}@marrowfinch.test`;
const attacker = "203.0.113.7";
const ownerAddress = "198.51.100.20";

/** Headers of one request as route handlers see them after the edge. */
function headersFrom(socketAddress: string, sent: Record<string, string> = {}): Record<string, unknown> {
  const request = {
    headers: { ...sent } as Record<string, string | string[] | undefined>,
    socket: { remoteAddress: socketAddress } as never,
  };
  stampClientAddress(request, 0);
  return request.headers;
}

async function signIn(
  email: string,
  password: string,
  headers: Record<string, unknown>,
): Promise<{ ok: true } | { ok: false; message: string }> {
  try {
    await authorizeSignIn({ email, password }, headers);
    return { ok: true };
  } catch (error) {
    return { ok: false, message: (error as Error).message };
  }
}

let clock = Date.now();
const wait = (seconds: number) => {
  clock += seconds * 1000 + 1;
  vi.setSystemTime(clock);
};

describe("sign-in limits on the shared store", () => {
  beforeAll(async () => {
    await getDb()
      .insert(users)
      .values({ email: owner, name: "Limit Owner", passwordHash: await hashPassword(PASSWORD) });
    vi.useFakeTimers({ toFake: ["Date"] });
    vi.setSystemTime(clock);
    markClientAddressesStamped(); // what scripts/serve.ts does at start
  });
  afterEach(() => vi.restoreAllMocks());
  afterAll(() => {
    markClientAddressesStamped(false);
    vi.useRealTimers();
  });

  it("a forged X-Forwarded-For or client-address header gives no new tries, and the right password from another address still signs in", async () => {
    for (let i = 0; i < PAIR.failures; i++) {
      wait(EMAIL.maxWaitS);
      const forged = {
        "x-forwarded-for": `10.0.${i}.1`,
        "x-real-ip": `10.1.${i}.1`,
        "x-platload-client-address": `10.2.${i}.1`,
      };
      expect(await signIn(owner, `guess-${i}`, headersFrom(attacker, forged))).toEqual({
        ok: false,
        message: "That e-mail and password do not match an account.",
      });
    }
    wait(EMAIL.maxWaitS);
    // the attacker's socket is blocked for this e-mail, whatever it claims, even with the right password
    const again = await signIn(
      owner,
      PASSWORD,
      headersFrom(attacker, { "x-forwarded-for": "10.99.0.1", "x-platload-client-address": "10.99.0.2" }),
    );
    expect(again).toEqual({
      ok: false,
      message: expect.stringMatching(
        /^Too many failed sign-ins from this address\. Wait 1[45] minutes and try again\.$/,
      ),
    });
    // the owner, elsewhere, is not locked out
    expect(await signIn(owner, PASSWORD, headersFrom(ownerAddress))).toEqual({ ok: true });
  });

  it("after failures from everywhere an e-mail is slowed down (a wait of at most a minute), never locked", async () => {
    const email = `limit.slow.${stamp}@marrowfinch.test`;
    await getDb()
      .insert(users)
      .values({ email, name: "Slow Owner", passwordHash: await hashPassword(PASSWORD) });
    for (let i = 0; i < EMAIL.freeFailures + 3; i++) {
      wait(EMAIL.maxWaitS);
      await signIn(email, `guess-${i}`, headersFrom(`192.0.2.${i + 1}`));
    }
    const right = await signIn(email, PASSWORD, headersFrom(ownerAddress));
    expect(right.ok).toBe(false);
    expect(right.ok ? "" : right.message).toMatch(
      /^Too many failed sign-ins for this e-mail\. Wait \d+ seconds and try again\.$/,
    );
    const seconds = Number(/Wait (\d+) seconds/.exec(right.ok ? "" : right.message)?.[1]);
    expect(seconds).toBeLessThanOrEqual(EMAIL.maxWaitS);
    wait(seconds);
    expect(await signIn(email, PASSWORD, headersFrom(ownerAddress))).toEqual({ ok: true });
  });

  it(`blocks an address after ${ADDRESS.failures} failures for any e-mails; other addresses go on`, async () => {
    const sprayer = "203.0.113.99";
    for (let i = 0; i < ADDRESS.failures; i++)
      await signIn(`nobody.${stamp}.${i}@example.test`, "guess", headersFrom(sprayer));
    expect(await signIn(owner, PASSWORD, headersFrom(sprayer))).toEqual({
      ok: false,
      message: "Too many failed sign-ins from this address. Wait 15 minutes and try again.",
    });
    wait(EMAIL.maxWaitS);
    expect(await signIn(owner, PASSWORD, headersFrom("198.51.100.77"))).toEqual({ ok: true });
  });

  it("the counters are shared: another app instance on its own pool sees the block", async () => {
    const database = (getPool().pool as unknown as { config: { connectionConfig: { database: string } } })
      .config.connectionConfig.database;
    const { createPool } = await import("@/db");
    const otherPool = createPool(process.env.DATABASE_URL!);
    try {
      const otherInstance = SignInLimiter.onPool(otherPool, database);
      wait(EMAIL.maxWaitS);
      expect(await otherInstance.check({ email: owner, clientAddress: attacker })).toMatchObject({
        refused: true,
        by: "pair",
      });
      expect(await otherInstance.check({ email: owner, clientAddress: ownerAddress })).toMatchObject({
        refused: false,
      });
    } finally {
      await otherPool.end();
    }
  });

  it("an unknown e-mail costs one bcrypt compare, like a wrong password for a real one", async () => {
    const compare = vi.spyOn(bcrypt, "compare");
    await signIn(`no.such.person.${stamp}@example.test`, "whatever-1", headersFrom("192.0.2.200"));
    expect(compare).toHaveBeenCalledTimes(1);
    // against a hash of the same cost as real ones
    expect(String(compare.mock.calls[0][1])).toMatch(/^\$2[aby]\$10\$/);
    compare.mockClear();
    wait(EMAIL.maxWaitS);
    await signIn(owner, "wrong-password", headersFrom("192.0.2.201"));
    expect(compare).toHaveBeenCalledTimes(1);
  });

  it("in a process not started by Platload's server, sign-in refuses instead of trusting headers", async () => {
    markClientAddressesStamped(false);
    try {
      const res = await signIn(owner, PASSWORD, { "x-platload-client-address": "198.51.100.20" });
      expect(res).toEqual({
        ok: false,
        message: expect.stringContaining("must be started with its own web server"),
      });
    } finally {
      markClientAddressesStamped();
    }
  });
});

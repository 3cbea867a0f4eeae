import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { ADDRESS, EMAIL, emailWaitSeconds, PAIR, refusalMessage, SignInLimiter } from "@/lib/auth/rate-limit";

// The limiter's policy on the library's memory store, with the clock under the test's control.
// The shared MariaDB store, the real sign-in and forged headers are in
// tests/integration/sign-in-limit.test.ts.
const email = "owner@example.test";
const attacker = "203.0.113.7";
const owner = "198.51.100.20";

describe("sign-in limits", () => {
  let limiter: SignInLimiter;
  beforeEach(() => {
    vi.useFakeTimers();
    limiter = SignInLimiter.inMemory();
  });
  afterEach(() => vi.useRealTimers());

  /** A failed attempt as the sign-in makes it: checked first, counted only when it went ahead. */
  async function fail(address: string, who = email) {
    const check = await limiter.check({ email: who, clientAddress: address });
    if (!check.refused) await limiter.recordFailure({ email: who, clientAddress: address });
    return check;
  }

  it(`lets ${EMAIL.freeFailures} failures through without waiting, then slows the e-mail down step by step, from any address`, async () => {
    // a different address at every try: the e-mail's own count is what slows it down
    const from = (n: number) => `203.0.113.${n + 1}`;
    for (let i = 0; i < EMAIL.freeFailures; i++)
      expect((await fail(from(i))).refused, `failure ${i + 1}`).toBe(false);
    const waits: number[] = [];
    for (let n = EMAIL.freeFailures; n < EMAIL.freeFailures + 7; n++) {
      const refused = await limiter.check({ email, clientAddress: from(n) });
      expect(refused).toMatchObject({ refused: true, by: "email" });
      waits.push(refused.refused ? refused.retryAfterS : 0);
      vi.advanceTimersByTime(emailWaitSeconds(n) * 1000);
      expect((await fail(from(n))).refused, `after the wait ${n}`).toBe(false);
    }
    // 2 s after the 5th failure, doubling, never more than a minute
    expect(waits).toEqual([2, 4, 8, 16, 32, 60, 60]);
    expect(emailWaitSeconds(100)).toBe(EMAIL.maxWaitS);
  });

  it("while an e-mail is slowed down, only one of several attempts at once goes ahead", async () => {
    for (let i = 0; i < EMAIL.freeFailures; i++) await fail(attacker);
    vi.advanceTimersByTime(emailWaitSeconds(EMAIL.freeFailures) * 1000);
    const checks = await Promise.all(
      Array.from({ length: 5 }, (_, i) => limiter.check({ email, clientAddress: `203.0.113.${i + 10}` })),
    );
    expect(checks.filter((c) => !c.refused)).toHaveLength(1);
  });

  it(`blocks an (e-mail, address) pair after ${PAIR.failures} failures, but the owner signs in from another address`, async () => {
    for (let n = 0; n < PAIR.failures; n++) {
      vi.advanceTimersByTime(emailWaitSeconds(n) * 1000);
      expect((await fail(attacker)).refused).toBe(false);
    }
    vi.advanceTimersByTime(EMAIL.maxWaitS * 1000);
    expect(await limiter.check({ email, clientAddress: attacker })).toMatchObject({
      refused: true,
      by: "pair",
    });
    // the owner, elsewhere: at most the e-mail's wait, never the pair's block
    const fromOwner = await limiter.check({ email, clientAddress: owner });
    expect(fromOwner.refused).toBe(false);
    await limiter.recordSuccess({ email, clientAddress: owner });
    // the block of the attacker's pair holds for its whole time, then lifts
    vi.advanceTimersByTime((PAIR.blockS - EMAIL.maxWaitS - 1) * 1000);
    expect(await limiter.check({ email, clientAddress: attacker })).toMatchObject({
      refused: true,
      by: "pair",
    });
    vi.advanceTimersByTime(2000);
    expect((await limiter.check({ email, clientAddress: attacker })).refused).toBe(false);
  });

  it(`blocks an address after ${ADDRESS.failures} failures across e-mails, and only that address`, async () => {
    for (let i = 0; i < ADDRESS.failures; i++)
      expect((await fail(attacker, `person${i}@example.test`)).refused).toBe(false);
    expect(
      await limiter.check({ email: "someone.else@example.test", clientAddress: attacker }),
    ).toMatchObject({ refused: true, by: "address" });
    expect((await limiter.check({ email: "someone.else@example.test", clientAddress: owner })).refused).toBe(
      false,
    );
  });

  it("keys IPv6 clients by their /64, so changing the last 64 bits does not reset the count", async () => {
    for (let i = 0; i < PAIR.failures; i++) {
      vi.advanceTimersByTime(EMAIL.maxWaitS * 1000);
      await fail(`2001:db8:7:8::${(i + 1).toString(16)}`);
    }
    vi.advanceTimersByTime(EMAIL.maxWaitS * 1000);
    expect(await limiter.check({ email, clientAddress: "2001:db8:7:8:ffff::1" })).toMatchObject({
      refused: true,
      by: "pair",
    });
    expect((await limiter.check({ email, clientAddress: "2001:db8:7:9::1" })).refused).toBe(false);
  });

  it("a success forgets the owner's own typos from that address", async () => {
    for (let i = 0; i < 3; i++) await fail(owner);
    await limiter.recordSuccess({ email, clientAddress: owner });
    for (let n = 3; n < 3 + PAIR.failures - 1; n++) {
      vi.advanceTimersByTime(EMAIL.maxWaitS * 1000);
      await fail(owner);
    }
    vi.advanceTimersByTime(EMAIL.maxWaitS * 1000);
    expect((await limiter.check({ email, clientAddress: owner })).refused).toBe(false);
  });

  it("says what to wait for", () => {
    expect(refusalMessage({ refused: true, by: "email", retryAfterS: 8 })).toBe(
      "Too many failed sign-ins for this e-mail. Wait 8 seconds and try again.",
    );
    expect(refusalMessage({ refused: true, by: "pair", retryAfterS: 900 })).toBe(
      "Too many failed sign-ins from this address. Wait 15 minutes and try again.",
    );
  });
});

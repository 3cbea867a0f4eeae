import { describe, expect, it } from "vitest";
import { getDb } from "@/db";
import { isSignInBlocked, MAX_FAILURES_PER_EMAIL, recordSignInAttempt } from "@/lib/auth/rate-limit";

describe("sign-in rate limit", () => {
  it(`blocks an e-mail after ${MAX_FAILURES_PER_EMAIL} failures within the window, and not before`, async () => {
    const db = getDb();
    const email = `locked.${Date.now()}@example.test`;
    const clientAddress = `10.0.0.${Date.now() % 200}`;
    for (let i = 0; i < MAX_FAILURES_PER_EMAIL - 1; i++) await recordSignInAttempt({ db, email, clientAddress, succeeded: false });
    expect(await isSignInBlocked({ db, email, clientAddress })).toBe(false);
    await recordSignInAttempt({ db, email, clientAddress, succeeded: false });
    expect(await isSignInBlocked({ db, email, clientAddress })).toBe(true);
    // the window is 15 minutes: an hour later the same failures no longer count
    expect(await isSignInBlocked({ db, email, clientAddress, now: new Date(Date.now() + 60 * 60_000) })).toBe(false);
  });
});

import "server-only";
import { createHash } from "node:crypto";
import type { Pool } from "mysql2/promise";
import {
  RateLimiterMemory,
  RateLimiterMySQL,
  RateLimiterRes,
  type RateLimiterAbstract,
  type RateLimiterStoreAbstract,
} from "rate-limiter-flexible";
import { getPool } from "@/db";
import { env } from "@/lib/env";
import { addressLimitKey } from "@/lib/http/client-address";
import { ADDRESS, EMAIL, emailWaitSeconds, PAIR, type SignInCheck } from "./sign-in-limits";

// The sign-in counters, on rate-limiter-flexible. The policy, its numbers and its messages are in
// ./sign-in-limits.ts; here they are kept in MariaDB (table rate_limits, through the app's own pool)
// so that every app instance counts the same failures, or in memory for unit tests.
export {
  ADDRESS,
  EMAIL,
  emailWaitSeconds,
  PAIR,
  refusalMessage,
  type SignInCheck,
  type SignInRefusal,
} from "./sign-in-limits";

const hash = (...parts: string[]) => createHash("sha256").update(parts.join("\u0000")).digest("base64url");

interface Stores {
  pair: RateLimiterAbstract;
  address: RateLimiterAbstract;
  emailFailures: RateLimiterAbstract;
  /** One attempt per second per e-mail while it is slowed down; a failure blocks it for the wait. */
  emailGate: RateLimiterAbstract;
}

const LIMITERS = {
  pair: { keyPrefix: "signin_pair", points: PAIR.failures, duration: PAIR.windowS },
  address: { keyPrefix: "signin_address", points: ADDRESS.failures, duration: ADDRESS.windowS },
  // Counted with penalty(), which never refuses: the points are only a ceiling for the library.
  emailFailures: { keyPrefix: "signin_email", points: 1_000_000, duration: EMAIL.windowS },
  emailGate: { keyPrefix: "signin_email_gate", points: 1, duration: 1 },
} as const;

/** A refusal of consume() is a RateLimiterRes; anything else (the store failed) is an error. */
function refusalOf(error: unknown): RateLimiterRes {
  if (error instanceof RateLimiterRes) return error;
  throw error;
}

const retryAfter = (res: RateLimiterRes) => Math.max(1, Math.ceil(res.msBeforeNext / 1000));

export class SignInLimiter {
  constructor(private readonly stores: Stores) {}

  /** On a MariaDB pool (the library speaks mysql2's callback API: the promise pool's inner pool). */
  static onPool(pool: Pool, database: string): SignInLimiter {
    const make = (
      options: (typeof LIMITERS)[keyof typeof LIMITERS],
      clearExpired: boolean,
    ): RateLimiterStoreAbstract =>
      new RateLimiterMySQL({
        ...options,
        storeClient: pool.pool,
        storeType: "pool",
        dbName: database,
        tableName: "rate_limits",
        tableCreated: true,
        clearExpiredByTimeout: clearExpired,
      });
    return new SignInLimiter({
      pair: make(LIMITERS.pair, true),
      address: make(LIMITERS.address, false),
      emailFailures: make(LIMITERS.emailFailures, false),
      emailGate: make(LIMITERS.emailGate, false),
    });
  }

  /** In process memory: for unit tests only (one process does not see another's counters). */
  static inMemory(): SignInLimiter {
    return new SignInLimiter({
      pair: new RateLimiterMemory(LIMITERS.pair),
      address: new RateLimiterMemory(LIMITERS.address),
      emailFailures: new RateLimiterMemory(LIMITERS.emailFailures),
      emailGate: new RateLimiterMemory(LIMITERS.emailGate),
    });
  }

  private keys(email: string, clientAddress: string) {
    const address = addressLimitKey(clientAddress);
    return { pair: hash(email, address), address: hash(address), email: hash(email) };
  }

  /** Before the password is checked: may this attempt go ahead? */
  async check({ email, clientAddress }: { email: string; clientAddress: string }): Promise<SignInCheck> {
    const keys = this.keys(email, clientAddress);
    const [pair, address, failures] = await Promise.all([
      this.stores.pair.get(keys.pair),
      this.stores.address.get(keys.address),
      this.stores.emailFailures.get(keys.email),
    ]);
    if (pair && pair.consumedPoints >= PAIR.failures)
      return { refused: true, by: "pair", retryAfterS: retryAfter(pair) };
    if (address && address.consumedPoints >= ADDRESS.failures)
      return { refused: true, by: "address", retryAfterS: retryAfter(address) };
    if ((failures?.consumedPoints ?? 0) >= EMAIL.freeFailures) {
      try {
        // Atomic in the store: of attempts arriving together, one passes.
        await this.stores.emailGate.consume(keys.email);
      } catch (error) {
        return { refused: true, by: "email", retryAfterS: retryAfter(refusalOf(error)) };
      }
    }
    return { refused: false };
  }

  async recordFailure({ email, clientAddress }: { email: string; clientAddress: string }): Promise<void> {
    const keys = this.keys(email, clientAddress);
    const [pair, address, failures] = await Promise.all([
      this.stores.pair.penalty(keys.pair),
      this.stores.address.penalty(keys.address),
      this.stores.emailFailures.penalty(keys.email),
    ]);
    const blocks: Promise<unknown>[] = [];
    if (pair.consumedPoints >= PAIR.failures) blocks.push(this.stores.pair.block(keys.pair, PAIR.blockS));
    if (address.consumedPoints >= ADDRESS.failures)
      blocks.push(this.stores.address.block(keys.address, ADDRESS.blockS));
    const wait = emailWaitSeconds(failures.consumedPoints);
    if (wait > 0) blocks.push(this.stores.emailGate.block(keys.email, wait));
    await Promise.all(blocks);
  }

  /** The owner's own earlier typos from this address stop counting; the other counters run on. */
  async recordSuccess({ email, clientAddress }: { email: string; clientAddress: string }): Promise<void> {
    await this.stores.pair.delete(this.keys(email, clientAddress).pair);
  }
}

const globalForLimiter = globalThis as unknown as { platloadSignInLimiter?: SignInLimiter };

/** The limiter on the app's database (DATABASE_URL), made once per process. */
export function signInLimiter(): SignInLimiter {
  globalForLimiter.platloadSignInLimiter ??= SignInLimiter.onPool(
    getPool(),
    decodeURIComponent(new URL(env().DATABASE_URL).pathname.slice(1)),
  );
  return globalForLimiter.platloadSignInLimiter;
}

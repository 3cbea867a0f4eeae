/**
 * The sign-in limits: their numbers and words, without the store (lib/auth/rate-limit.ts applies
 * them with rate-limiter-flexible; the end-to-end tests read them too). Failures are counted three ways:
 *
 * - per (e-mail, address): after PAIR.failures failures in PAIR.windowS that pair is refused for
 *   PAIR.blockS. A guesser is stopped where it stands; the owner signs in from anywhere else.
 * - per address: after ADDRESS.failures failures for any e-mails, the address is refused for
 *   ADDRESS.blockS (one address trying many e-mails).
 * - per e-mail alone, never a block: after EMAIL.freeFailures failures from anywhere within
 *   EMAIL.windowS, each attempt must wait (2 s, 4 s, 8 s … at most EMAIL.maxWaitS) after the
 *   previous failure, and only one attempt at a time passes. Guessing from many addresses slows to
 *   about one guess a minute, while the owner waits a minute at worst.
 *
 * The counters live in MariaDB (table rate_limits) so all app instances share them; unit tests use
 * the library's memory store. Keys are SHA-256 hashes: no e-mail or address is stored.
 */
export const PAIR = { failures: 10, windowS: 15 * 60, blockS: 15 * 60 } as const;
export const ADDRESS = { failures: 50, windowS: 15 * 60, blockS: 15 * 60 } as const;
export const EMAIL = { freeFailures: 5, windowS: 60 * 60, firstWaitS: 2, maxWaitS: 60 } as const;

export type SignInRefusal = { refused: true; by: "pair" | "address" | "email"; retryAfterS: number };
export type SignInCheck = { refused: false } | SignInRefusal;

/** Seconds to wait after the n-th failure for an e-mail (n counted within EMAIL.windowS). */
export function emailWaitSeconds(failures: number): number {
  if (failures < EMAIL.freeFailures) return 0;
  return Math.min(EMAIL.firstWaitS * 2 ** (failures - EMAIL.freeFailures), EMAIL.maxWaitS);
}

export function refusalMessage(refusal: SignInRefusal): string {
  const wait =
    refusal.retryAfterS >= 120
      ? `${Math.ceil(refusal.retryAfterS / 60)} minutes`
      : `${refusal.retryAfterS} seconds`;
  if (refusal.by === "email") return `Too many failed sign-ins for this e-mail. Wait ${wait} and try again.`;
  return `Too many failed sign-ins from this address. Wait ${wait} and try again.`;
}

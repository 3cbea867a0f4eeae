import "server-only";
import { and, count, eq, gte, lt } from "drizzle-orm";
import type { Database } from "@/db";
import { signInAttempts } from "@/db/schema";

// Failed sign-ins are counted in the database so the limit holds across app instances.
export const SIGN_IN_WINDOW_MINUTES = 15;
export const MAX_FAILURES_PER_EMAIL = 5;
export const MAX_FAILURES_PER_ADDRESS = 30;

export async function isSignInBlocked({ db, email, clientAddress, now = new Date() }: { db: Database; email: string; clientAddress: string; now?: Date }) {
  const since = new Date(now.getTime() - SIGN_IN_WINDOW_MINUTES * 60_000);
  const [byEmail] = await db
    .select({ n: count() })
    .from(signInAttempts)
    .where(and(eq(signInAttempts.email, email), eq(signInAttempts.succeeded, false), gte(signInAttempts.createdAt, since)));
  const [byAddress] = await db
    .select({ n: count() })
    .from(signInAttempts)
    .where(and(eq(signInAttempts.clientAddress, clientAddress), eq(signInAttempts.succeeded, false), gte(signInAttempts.createdAt, since)));
  return byEmail.n >= MAX_FAILURES_PER_EMAIL || byAddress.n >= MAX_FAILURES_PER_ADDRESS;
}

export async function recordSignInAttempt({ db, email, clientAddress, succeeded }: { db: Database; email: string; clientAddress: string; succeeded: boolean }) {
  await db.insert(signInAttempts).values({ email, clientAddress, succeeded });
  // Keep the table small: attempts older than a day no longer matter.
  await db.delete(signInAttempts).where(lt(signInAttempts.createdAt, new Date(Date.now() - 24 * 3600_000)));
}

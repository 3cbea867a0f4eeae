import "server-only";
import { eq } from "drizzle-orm";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { z } from "zod";
import { getDb } from "@/db";
import { users } from "@/db/schema";
import { stampedClientAddress } from "@/lib/http/client-address";
import { checkSignInPassword } from "./password";
import { refusalMessage, signInLimiter } from "./rate-limit";

const credentialsSchema = z.object({
  email: z.string().trim().toLowerCase().email(),
  password: z.string().min(1),
});

export const SIGN_IN_MESSAGES = {
  invalid: "That e-mail and password do not match an account.",
} as const;

/**
 * Checks a sign-in: the limits first (lib/auth/rate-limit.ts), then the password (one bcrypt
 * compare whether or not the e-mail has a sign-in). `headers` are the request's, as next-auth
 * hands them over; only the client address the edge stamped is read from them.
 */
export async function authorizeSignIn(raw: unknown, headers: Record<string, unknown> | undefined) {
  const parsed = credentialsSchema.safeParse(raw);
  if (!parsed.success) throw new Error(SIGN_IN_MESSAGES.invalid);
  const { email, password } = parsed.data;
  const db = getDb();
  // The address the edge read from the socket (lib/http/client-address.ts), never a header the client set.
  const clientAddress = stampedClientAddress(headers);
  const limiter = signInLimiter();
  const check = await limiter.check({ email, clientAddress });
  if (check.refused) throw new Error(refusalMessage(check));
  const [user] = await db.select().from(users).where(eq(users.email, email));
  const ok = await checkSignInPassword(password, user?.passwordHash);
  if (!ok || !user) {
    await limiter.recordFailure({ email, clientAddress });
    throw new Error(SIGN_IN_MESSAGES.invalid);
  }
  await limiter.recordSuccess({ email, clientAddress });
  return { id: String(user.id), email: user.email, name: user.name };
}

export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: 12 * 3600 },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "Platload",
      credentials: {
        email: { label: "E-mail", type: "email" },
        password: { label: "Password", type: "password" },
      },
      authorize: (raw, req) => authorizeSignIn(raw, req?.headers as Record<string, unknown> | undefined),
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) token.uid = Number(user.id);
      return token;
    },
    async session({ session, token }) {
      if (session.user) (session.user as { id?: number }).id = token.uid as number;
      return session;
    },
  },
};

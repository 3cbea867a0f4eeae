import "server-only";
import { eq } from "drizzle-orm";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { z } from "zod";
import { getDb } from "@/db";
import { users } from "@/db/schema";
import { verifyPassword } from "./password";
import { isSignInBlocked, recordSignInAttempt, SIGN_IN_WINDOW_MINUTES } from "./rate-limit";

const credentialsSchema = z.object({ email: z.string().trim().toLowerCase().email(), password: z.string().min(1) });

export const SIGN_IN_MESSAGES = {
  invalid: "That e-mail and password do not match an account.",
  blocked: `Too many failed sign-ins. Wait ${SIGN_IN_WINDOW_MINUTES} minutes and try again.`,
} as const;

function clientAddressOf(headers: Record<string, unknown> | undefined): string {
  const forwarded = headers?.["x-forwarded-for"];
  if (typeof forwarded === "string" && forwarded) return forwarded.split(",")[0].trim().slice(0, 64);
  const real = headers?.["x-real-ip"];
  return typeof real === "string" && real ? real.slice(0, 64) : "local";
}

export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: 12 * 3600 },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "Platload",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(raw, req) {
        const parsed = credentialsSchema.safeParse(raw);
        if (!parsed.success) throw new Error(SIGN_IN_MESSAGES.invalid);
        const { email, password } = parsed.data;
        const db = getDb();
        const clientAddress = clientAddressOf(req?.headers as Record<string, unknown> | undefined);
        if (await isSignInBlocked({ db, email, clientAddress })) throw new Error(SIGN_IN_MESSAGES.blocked);
        const [user] = await db.select().from(users).where(eq(users.email, email));
        const ok = !!user?.passwordHash && (await verifyPassword(password, user.passwordHash));
        await recordSignInAttempt({ db, email, clientAddress, succeeded: ok });
        if (!ok || !user) throw new Error(SIGN_IN_MESSAGES.invalid);
        return { id: String(user.id), email: user.email, name: user.name };
      },
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

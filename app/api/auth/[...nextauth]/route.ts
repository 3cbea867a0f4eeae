import NextAuth from "next-auth";
import { authOptions } from "@/lib/auth/options";
import { nextAuthRoute } from "@/lib/auth/route";

const handler = nextAuthRoute(NextAuth(authOptions));
export { handler as GET, handler as POST };

import "server-only";
import { getServerSession } from "next-auth";
import { cookies } from "next/headers";
import { redirect } from "next/navigation";
import { getDb } from "@/db";
import { parseId } from "@/lib/http/ids";
import { authorizeMember, listMembershipsOfUser, type Member } from "./member";
import { authOptions } from "./options";
import { permissionsOf, type Permission } from "./permissions";
import { ACCOUNT_COOKIE } from "./route";

export interface PageContext {
  member: Member;
  permissions: Permission[];
  accountCount: number;
}

/**
 * For server-rendered pages: the signed-in member of the chosen account, or a redirect to sign-in
 * or to the account picker. Pages use it to hide what a role cannot do; the API refuses it anyway.
 */
export async function getPageContext(): Promise<PageContext> {
  const session = await getServerSession(authOptions);
  const userId = (session?.user as { id?: number } | undefined)?.id;
  if (!userId) redirect("/sign-in");
  const db = getDb();
  const memberships = await listMembershipsOfUser({ db, userId });
  if (memberships.length === 0) redirect("/accounts");
  const raw = parseId((await cookies()).get(ACCOUNT_COOKIE)?.value);
  const chosen =
    memberships.find((m) => m.accountId === raw) ?? (memberships.length === 1 ? memberships[0] : null);
  if (!chosen) redirect("/accounts");
  const member = await authorizeMember({ db, userId, accountId: chosen.accountId, permission: "read" });
  return { member, permissions: permissionsOf(member.role), accountCount: memberships.length };
}

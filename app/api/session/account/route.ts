import { NextResponse, type NextRequest } from "next/server";
import { getDb } from "@/db";
import { listMembershipsOfUser } from "@/lib/auth/member";
import { ACCOUNT_COOKIE, chosenAccountId, errorResponse, parseJsonBody, sessionUserId } from "@/lib/auth/route";
import { AppError } from "@/lib/errors";
import { chooseAccountSchema } from "./schema";

/** The accounts the signed-in person belongs to, and which one is chosen. */
export async function GET(request: NextRequest) {
  try {
    const userId = await sessionUserId(request);
    if (!userId) throw new AppError("unauthenticated", "Sign in to continue.");
    const accounts = await listMembershipsOfUser({ db: getDb(), userId });
    const chosen = chosenAccountId(request);
    return NextResponse.json({ accounts, chosenAccountId: accounts.some((a) => a.accountId === chosen) ? chosen : accounts.length === 1 ? accounts[0].accountId : null });
  } catch (error) {
    return errorResponse(error);
  }
}

/** Chooses the account to work in; only an account the person belongs to can be chosen. */
export async function POST(request: NextRequest) {
  try {
    const userId = await sessionUserId(request);
    if (!userId) throw new AppError("unauthenticated", "Sign in to continue.");
    const { accountId } = await parseJsonBody(request, chooseAccountSchema);
    const accounts = await listMembershipsOfUser({ db: getDb(), userId });
    if (!accounts.some((a) => a.accountId === accountId)) throw new AppError("not_found", "That account was not found among yours.");
    const response = NextResponse.json({ chosenAccountId: accountId });
    response.cookies.set(ACCOUNT_COOKIE, String(accountId), { httpOnly: true, sameSite: "lax", path: "/", secure: request.nextUrl.protocol === "https:" });
    return response;
  } catch (error) {
    return errorResponse(error);
  }
}

import { NextResponse } from "next/server";
import { listMembershipsOfUser } from "@/lib/auth/member";
import { ACCOUNT_COOKIE, chosenAccountId, parseJsonBody, sessionRoute } from "@/lib/auth/route";
import { AppError } from "@/lib/errors";
import { chooseAccountSchema } from "./schema";

/** The accounts the signed-in person belongs to, and which one is chosen. */
export const GET = sessionRoute(async ({ db, request, userId }) => {
  const accounts = await listMembershipsOfUser({ db, userId });
  const chosen = chosenAccountId(request);
  return {
    accounts,
    chosenAccountId: accounts.some((a) => a.accountId === chosen)
      ? chosen
      : accounts.length === 1
        ? accounts[0].accountId
        : null,
  };
});

/** Chooses the account to work in; only an account the person belongs to can be chosen. */
export const POST = sessionRoute(async ({ db, request, userId }) => {
  const { accountId } = await parseJsonBody(request, chooseAccountSchema);
  const accounts = await listMembershipsOfUser({ db, userId });
  if (!accounts.some((a) => a.accountId === accountId))
    throw new AppError("not_found", "That account was not found among yours.");
  const response = NextResponse.json({ chosenAccountId: accountId });
  response.cookies.set(ACCOUNT_COOKIE, String(accountId), {
    httpOnly: true,
    sameSite: "lax",
    path: "/",
    secure: request.nextUrl.protocol === "https:",
  });
  return response;
});

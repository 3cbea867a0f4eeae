import "server-only";
import { getToken } from "next-auth/jwt";
import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { getDb, type Database } from "@/db";
import { AppError, type FieldError } from "@/lib/errors";
import { parseId } from "@/lib/http/ids";
import { authorizeMember, type Member } from "./member";
import type { Permission } from "./permissions";

/** Cookie holding the account the user chose; membership is checked on every request anyway. */
export const ACCOUNT_COOKIE = "platload_account";

export interface RouteContext<P> {
  request: NextRequest;
  params: P;
  member: Member;
  db: Database;
}

type Handler<P> = (ctx: RouteContext<P>) => Promise<unknown>;

export function errorResponse(error: unknown): NextResponse {
  if (error instanceof AppError) return NextResponse.json(error.toBody(), { status: error.status });
  if (error instanceof z.ZodError) {
    return NextResponse.json(new AppError("invalid_input", "Some values in the request are not valid.", zodFieldErrors(error)).toBody(), { status: 400 });
  }
  console.error(error);
  return NextResponse.json({ error: { code: "server_error", message: "Something went wrong on the server; nothing was saved." } }, { status: 500 });
}

export async function sessionUserId(request: NextRequest): Promise<number | null> {
  const token = await getToken({ req: request, secret: process.env.NEXTAUTH_SECRET });
  return typeof token?.uid === "number" ? token.uid : null;
}

export function chosenAccountId(request: NextRequest): number | null {
  return parseId(request.cookies.get(ACCOUNT_COOKIE)?.value);
}

/**
 * Every API route handler goes through here: session, account and role are checked once, errors
 * become the one error shape, and a handler's return value becomes JSON.
 */
export function apiRoute<P = Record<string, never>>(options: { permission: Permission }, handler: Handler<P>) {
  return async (request: NextRequest, context: { params: Promise<P> }): Promise<Response> => {
    try {
      const db = getDb();
      const member = await authorizeMember({
        db,
        userId: await sessionUserId(request),
        accountId: chosenAccountId(request),
        permission: options.permission,
      });
      const result = await handler({ request, params: await context.params, member, db });
      return result instanceof Response ? result : NextResponse.json(result);
    } catch (error) {
      return errorResponse(error);
    }
  };
}

/** A route anyone may call (sign-up by invitation): same error handling, no session. */
export function publicRoute<P = Record<string, never>>(handler: (ctx: { request: NextRequest; params: P; db: Database }) => Promise<unknown>) {
  return async (request: NextRequest, context: { params: Promise<P> }): Promise<Response> => {
    try {
      const result = await handler({ request, params: await context.params, db: getDb() });
      return result instanceof Response ? result : NextResponse.json(result);
    } catch (error) {
      return errorResponse(error);
    }
  };
}

export function zodFieldErrors(error: z.ZodError): FieldError[] {
  return error.issues.map((issue) => ({ field: issue.path.join(".") || "(body)", message: issue.message }));
}

/** Parses a JSON body with a zod schema; a bad body is a 400 naming every bad field. */
export async function parseJsonBody<T extends z.ZodType>(request: Request, schema: T): Promise<z.infer<T>> {
  let raw: unknown;
  try {
    raw = await request.json();
  } catch {
    throw new AppError("invalid_input", "The request body is not valid JSON.");
  }
  const parsed = schema.safeParse(raw);
  if (!parsed.success) throw new AppError("invalid_input", "Some fields are not valid.", zodFieldErrors(parsed.error));
  return parsed.data;
}

/** A record id from the URL (lib/ids.ts: digits only); anything else is simply not found. */
export function idParam(value: string, what: string): number {
  const id = parseId(value);
  if (id === null) throw new AppError("not_found", `${what} was not found in this account.`);
  return id;
}

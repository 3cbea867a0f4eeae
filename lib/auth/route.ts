import "server-only";
import { getToken } from "next-auth/jwt";
import { NextRequest, NextResponse } from "next/server";
import { z } from "zod";
import { getDb, type Database } from "@/db";
import { env } from "@/lib/env";
import { AppError, type FieldError } from "@/lib/errors";
import { jsonBodyLimit, readBodyLimited } from "@/lib/http/body";
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
    return NextResponse.json(
      new AppError(
        "invalid_input",
        "Some values in the request are not valid.",
        zodFieldErrors(error),
      ).toBody(),
      { status: 400 },
    );
  }
  console.error(error);
  return NextResponse.json(
    { error: { code: "server_error", message: "Something went wrong on the server; nothing was saved." } },
    { status: 500 },
  );
}

export async function sessionUserId(request: NextRequest): Promise<number | null> {
  const token = await getToken({ req: request, secret: process.env.NEXTAUTH_SECRET });
  return typeof token?.uid === "number" ? token.uid : null;
}

export function chosenAccountId(request: NextRequest): number | null {
  return parseId(request.cookies.get(ACCOUNT_COOKIE)?.value);
}

/**
 * How a route handler is guarded, tagged on the handler itself so the route-coverage test can read
 * it from every route.ts: "member" (apiRoute: session, account and permission), "session"
 * (signed in, before an account is chosen), "public" (no session: invitation links), "next-auth"
 * (next-auth's own handler: its CSRF token guards its writes).
 */
export type RouteGuard =
  | { kind: "member"; permission: Permission }
  | { kind: "session" }
  | { kind: "public" }
  | { kind: "next-auth" };

const ROUTE_GUARD = Symbol.for("platload.routeGuard");

type NextHandler<P> = (request: NextRequest, context: { params: Promise<P> }) => Promise<Response>;

export function routeGuardOf(handler: unknown): RouteGuard | undefined {
  return typeof handler === "function"
    ? (handler as unknown as { [ROUTE_GUARD]?: RouteGuard })[ROUTE_GUARD]
    : undefined;
}

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/** The app's own origin: NEXTAUTH_URL (the address browsers use), else the address the request was sent to. */
export function appOrigin(request: NextRequest): string {
  const configured = process.env.NEXTAUTH_URL;
  return configured ? new URL(configured).origin : request.nextUrl.origin;
}

/**
 * A write must come from the app's own pages. Browsers send Origin with every POST, PUT, PATCH and
 * DELETE, so a page on another origin (another local port included) is refused whatever its
 * cookies. A request without Origin is not from a page of another site (a browser that hides it
 * still says so in Sec-Fetch-Site), so scripts and tests that call the API directly still work.
 */
export function checkOrigin(request: NextRequest): void {
  if (SAFE_METHODS.has(request.method)) return;
  const expected = appOrigin(request);
  const origin = request.headers.get("origin");
  if (origin === null) {
    const site = request.headers.get("sec-fetch-site");
    if (site === null || site === "same-origin" || site === "none") return;
    throw new AppError(
      "forbidden",
      `A change must come from Platload's own pages (${expected}); this one came from another site (${site}). Nothing was changed.`,
    );
  }
  if (origin !== expected) {
    throw new AppError(
      "forbidden",
      `A change must come from Platload's own pages (${expected}); this one came from ${origin}. Nothing was changed.`,
    );
  }
}

/** API answers hold account data: never kept by the browser or a shared cache. */
function noStore(response: Response): Response {
  try {
    response.headers.set("cache-control", "no-store");
    return response;
  } catch {
    // Response.redirect() and fetched responses have read-only headers: copy them.
    const copy = new Response(response.body, response);
    copy.headers.set("cache-control", "no-store");
    return copy;
  }
}

/**
 * A body declared larger than any route reads is refused before the handler runs (413): an
 * upload may be as large as the upload limit, anything else as large as the JSON limit. Bodies
 * without a declared length are limited while they are read (readBodyLimited).
 */
function checkDeclaredLength(request: NextRequest): void {
  const declared = request.headers.get("content-length");
  if (declared === null) return;
  const upload = (request.headers.get("content-type") ?? "").toLowerCase().startsWith("multipart/form-data");
  const limit = upload ? env().PLATLOAD_MAX_UPLOAD_BYTES + 64 * 1024 : jsonBodyLimit();
  if (Number(declared) > limit) {
    throw new AppError(
      "payload_too_large",
      `The request body is larger than ${Number((limit / 1048576).toFixed(1))} MB, the limit. Nothing was saved.`,
    );
  }
}

/** The edge every route shares: the Origin check, the body limit, the one error shape, JSON answers, no caching. */
function guarded<P>(
  guard: RouteGuard,
  run: (request: NextRequest, params: P) => Promise<unknown>,
): NextHandler<P> {
  const handler: NextHandler<P> = async (request, context) => {
    try {
      checkOrigin(request);
      checkDeclaredLength(request);
      const result = await run(request, await context.params);
      return noStore(result instanceof Response ? result : NextResponse.json(result));
    } catch (error) {
      return noStore(errorResponse(error));
    }
  };
  return Object.assign(handler, { [ROUTE_GUARD]: guard });
}

/**
 * Every API route handler goes through here: session, account and role are checked once, errors
 * become the one error shape, and a handler's return value becomes JSON.
 */
export function apiRoute<P = Record<string, never>>(
  options: { permission: Permission },
  handler: Handler<P>,
) {
  return guarded<P>({ kind: "member", permission: options.permission }, async (request, params) => {
    const db = getDb();
    const member = await authorizeMember({
      db,
      userId: await sessionUserId(request),
      accountId: chosenAccountId(request),
      permission: options.permission,
    });
    return handler({ request, params, member, db });
  });
}

/** A route for a signed-in person before an account is chosen (the account picker). */
export function sessionRoute<P = Record<string, never>>(
  handler: (ctx: { request: NextRequest; params: P; db: Database; userId: number }) => Promise<unknown>,
) {
  return guarded<P>({ kind: "session" }, async (request, params) => {
    const userId = await sessionUserId(request);
    if (!userId) throw new AppError("unauthenticated", "Sign in to continue.");
    return handler({ request, params, db: getDb(), userId });
  });
}

/** A route anyone may call (sign-up by invitation): same edge, no session. */
export function publicRoute<P = Record<string, never>>(
  handler: (ctx: { request: NextRequest; params: P; db: Database }) => Promise<unknown>,
) {
  return guarded<P>({ kind: "public" }, (request, params) => handler({ request, params, db: getDb() }));
}

/**
 * next-auth's own handler behind the same edge (Origin check, body limit, no caching); its CSRF
 * token guards sign-in. A posted form is read here, at most PLATLOAD_MAX_JSON_BYTES counted as it
 * streams, before next-auth sees it.
 */
export function nextAuthRoute(
  handler: (request: NextRequest, context: { params: Promise<{ nextauth: string[] }> }) => Promise<Response>,
) {
  const wrapped: NextHandler<{ nextauth: string[] }> = async (request, context) => {
    try {
      checkOrigin(request);
      checkDeclaredLength(request);
      if (request.method === "POST") {
        const body = await readBodyLimited(request, jsonBodyLimit(), "The sign-in request");
        request = new NextRequest(request.url, {
          method: "POST",
          headers: request.headers,
          body: body as BodyInit,
        });
      }
      return noStore(await handler(request, context));
    } catch (error) {
      return noStore(errorResponse(error));
    }
  };
  return Object.assign(wrapped, { [ROUTE_GUARD]: { kind: "next-auth" } as RouteGuard });
}

export function zodFieldErrors(error: z.ZodError): FieldError[] {
  return error.issues.map((issue) => ({ field: issue.path.join(".") || "(body)", message: issue.message }));
}

/** Parses a JSON body (at most PLATLOAD_MAX_JSON_BYTES) with a zod schema; a bad body is a 400 naming every bad field. */
export async function parseJsonBody<T extends z.ZodType>(request: Request, schema: T): Promise<z.infer<T>> {
  const bytes = await readBodyLimited(request, jsonBodyLimit(), "The request body");
  let raw: unknown;
  try {
    raw = JSON.parse(new TextDecoder("utf-8", { fatal: true }).decode(bytes));
  } catch {
    throw new AppError("invalid_input", "The request body is not valid JSON.");
  }
  const parsed = schema.safeParse(raw);
  if (!parsed.success)
    throw new AppError("invalid_input", "Some fields are not valid.", zodFieldErrors(parsed.error));
  return parsed.data;
}

/** A record id from the URL (lib/ids.ts: digits only); anything else is simply not found. */
export function idParam(value: string, what: string): number {
  const id = parseId(value);
  if (id === null) throw new AppError("not_found", `${what} was not found in this account.`);
  return id;
}

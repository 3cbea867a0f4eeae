// Every API route of the app, read from the files under app/api (route.ts, and route.dev.ts for the
// development mailbox), with each exported HTTP handler and the guard its wrapper tagged on it
// (lib/auth/route.ts). The route-coverage test and the isolation matrix are generated from this.
import { readdirSync } from "node:fs";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { routeGuardOf, type RouteGuard } from "@/lib/auth/route";

const root = path.resolve(__dirname, "../..");
export const HTTP_METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"] as const;
export type HttpMethod = (typeof HTTP_METHODS)[number];
/** Route segment settings a route file may export besides handlers. */
const SEGMENT_SETTINGS = new Set([
  "dynamic",
  "dynamicParams",
  "revalidate",
  "fetchCache",
  "runtime",
  "preferredRegion",
  "maxDuration",
]);

export interface RouteHandler {
  /** "/api/plans/[planId]" */
  path: string;
  /** Project-relative file, e.g. "app/api/plans/[planId]/route.ts" */
  file: string;
  method: HttpMethod;
  handler: unknown;
  guard: RouteGuard | undefined;
}

export interface RouteFile {
  path: string;
  file: string;
  handlers: RouteHandler[];
  /** Exports that are neither handlers nor segment settings. */
  strayExports: string[];
}

export function routeFiles(): string[] {
  const found: string[] = [];
  const walk = (dir: string) => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (/^route(\.dev)?\.(ts|tsx|js)$/.test(entry.name)) found.push(path.relative(root, full));
    }
  };
  walk(path.join(root, "app/api"));
  return found.sort();
}

export function routePathOf(file: string): string {
  return `/${path.dirname(file).split(path.sep).slice(1).join("/")}`;
}

/** Params named in a route path, e.g. ["planId"]; the catch-all [...nextauth] is "nextauth". */
export function routeParams(routePath: string): string[] {
  return [...routePath.matchAll(/\[(?:\.\.\.)?([A-Za-z]+)\]/g)].map((m) => m[1]);
}

export async function loadRoutes(): Promise<RouteFile[]> {
  const loaded: RouteFile[] = [];
  for (const file of routeFiles()) {
    const mod = (await import(/* @vite-ignore */ pathToFileURL(path.join(root, file)).href)) as Record<
      string,
      unknown
    >;
    const routePath = routePathOf(file);
    const handlers: RouteHandler[] = [];
    const strayExports: string[] = [];
    for (const [name, value] of Object.entries(mod)) {
      if ((HTTP_METHODS as readonly string[]).includes(name))
        handlers.push({
          path: routePath,
          file,
          method: name as HttpMethod,
          handler: value,
          guard: routeGuardOf(value),
        });
      else if (!SEGMENT_SETTINGS.has(name) && name !== "default") strayExports.push(name);
    }
    loaded.push({ path: routePath, file, handlers, strayExports });
  }
  return loaded;
}

/**
 * The handlers that do not go through apiRoute (session, account and permission), each with why.
 * Everything else under app/api must be an apiRoute handler with a known permission.
 */
export const NOT_MEMBER_ROUTES: Record<string, { kind: Exclude<RouteGuard["kind"], "member">; why: string }> =
  {
    "GET /api/auth/[...nextauth]": {
      kind: "next-auth",
      why: "next-auth's session, CSRF-token and provider endpoints",
    },
    "POST /api/auth/[...nextauth]": {
      kind: "next-auth",
      why: "sign-in and sign-out, guarded by next-auth's CSRF token and the sign-in limits",
    },
    "GET /api/invitations/[token]": {
      kind: "public",
      why: "an invitation link opened by someone without a sign-in yet; the token is the secret",
    },
    "POST /api/invitations/[token]": {
      kind: "public",
      why: "accepting an invitation sets the first password; the token is the secret",
    },
    "GET /api/session/account": {
      kind: "session",
      why: "the account picker: signed in, before an account is chosen",
    },
    "POST /api/session/account": {
      kind: "session",
      why: "choosing an account: only one of the person's own memberships",
    },
  };

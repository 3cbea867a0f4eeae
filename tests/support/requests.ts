// Calls route handlers the way Next does, with a real signed session cookie (next-auth's own
// encode) and the account cookie, so the tests go through the same checks as the browser.
import { encode } from "next-auth/jwt";
import { NextRequest } from "next/server";
import { ACCOUNT_COOKIE } from "@/lib/auth/route";
import { TEST_NEXTAUTH_SECRET } from "./test-env";

export async function sessionCookie({
  userId,
  accountId,
}: {
  userId: number;
  accountId?: number;
}): Promise<string> {
  const token = await encode({ token: { uid: userId, sub: String(userId) }, secret: TEST_NEXTAUTH_SECRET });
  return [`next-auth.session-token=${token}`, accountId ? `${ACCOUNT_COOKIE}=${accountId}` : ""]
    .filter(Boolean)
    .join("; ");
}

type Handler = (
  request: NextRequest,
  context: { params: Promise<Record<string, string>> },
) => Promise<Response>;

/** The app's address in the integration tests (tests/vitest.config.mts sets NEXTAUTH_URL). */
export const APP_ORIGIN = new URL(process.env.NEXTAUTH_URL ?? "http://127.0.0.1:3720").origin;

/**
 * A write carries Origin: APP_ORIGIN, as a browser on the app's own page sends it; pass `origin`
 * to send another (or null for none, as a script would).
 */
export async function callRoute(
  handler: unknown,
  {
    path,
    method = "GET",
    params = {},
    body,
    form,
    cookie,
    origin,
    headers = {},
  }: {
    path: string;
    method?: string;
    params?: Record<string, string>;
    body?: unknown;
    form?: FormData;
    cookie?: string;
    origin?: string | null;
    headers?: Record<string, string>;
  },
): Promise<{ status: number; json: any; text: string; headers: Headers }> {
  const sentOrigin = origin === undefined ? (["GET", "HEAD"].includes(method) ? null : APP_ORIGIN) : origin;
  const request = new NextRequest(new URL(path, APP_ORIGIN), {
    method,
    headers: {
      ...(cookie ? { cookie } : {}),
      ...(body !== undefined ? { "content-type": "application/json" } : {}),
      ...(sentOrigin ? { origin: sentOrigin } : {}),
      ...headers,
    },
    body: form ?? (body !== undefined ? JSON.stringify(body) : undefined),
  });
  const response = await (handler as Handler)(request, { params: Promise.resolve(params) });
  const text = await response.text();
  const isJson = (response.headers.get("content-type") ?? "").includes("json");
  return {
    status: response.status,
    json: text && isJson ? JSON.parse(text) : null,
    text,
    headers: response.headers,
  };
}

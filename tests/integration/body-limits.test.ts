/**
 * Upload and body limits: the one upload limit (PLATLOAD_MAX_UPLOAD_BYTES, 2 MB in these tests)
 * on every importer, enforced while the body streams in — a chunked upload with no
 * Content-Length is cut off once past the limit, not buffered whole; a small JSON limit
 * (PLATLOAD_MAX_JSON_BYTES, 1 MB) on every route, signed-out ones included; and the invitation
 * route looks its token up before it reads the body or hashes a password.
 */
import { count } from "drizzle-orm";
import { NextRequest } from "next/server";
import { beforeAll, describe, expect, it } from "vitest";
import * as nextAuthRoute from "@/app/api/auth/[...nextauth]/route";
import * as lotImportRoute from "@/app/api/communities/[communityId]/lots/import/route";
import * as catalogImportRoute from "@/app/api/equipment/import/route";
import * as acceptRoute from "@/app/api/invitations/[token]/route";
import * as planImportRoute from "@/app/api/plans/import/route";
import * as plansRoute from "@/app/api/plans/route";
import { getDb } from "@/db";
import { createInvitation } from "@/db/queries/team";
import { imports } from "@/db/schema";
import { privateAccount } from "../support/private-account";

const MB = 1024 * 1024;

/** A body that streams `total` bytes in 64 KB chunks and counts how many were pulled. */
function countingStream(total: number, chunk: (i: number) => Uint8Array) {
  const counter = { pulled: 0 };
  let i = 0;
  const stream = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (counter.pulled >= total) return controller.close();
      const piece = chunk(i++);
      counter.pulled += piece.byteLength;
      controller.enqueue(piece);
    },
  });
  return { stream, counter };
}

async function send(
  handler: unknown,
  {
    method = "POST",
    headers,
    body,
    params = {},
  }: {
    method?: string;
    headers: Record<string, string>;
    body: BodyInit | ReadableStream<Uint8Array>;
    params?: Record<string, string | string[]>;
  },
) {
  // duplex "half" lets a request body be a stream (fetch's rule for streamed uploads).
  const init = {
    method,
    headers,
    body: body as BodyInit,
    duplex: "half",
  } as unknown as ConstructorParameters<typeof NextRequest>[1];
  const request = new NextRequest(new URL("/api/x", "http://127.0.0.1:3720"), init);
  const response = await (
    handler as (
      r: NextRequest,
      c: { params: Promise<Record<string, string | string[]>> },
    ) => Promise<Response>
  )(request, { params: Promise.resolve(params) });
  const text = await response.text();
  return { status: response.status, json: text.startsWith("{") ? JSON.parse(text) : null };
}

describe("upload and body limits", () => {
  let account: Awaited<ReturnType<typeof privateAccount>>;

  beforeAll(async () => {
    account = await privateAccount(getDb(), "limits");
  });

  const importers = [
    ["plans", planImportRoute.POST],
    ["lots", lotImportRoute.POST],
    ["catalog", catalogImportRoute.POST],
  ] as const;

  for (const [name, handler] of importers) {
    it(`the ${name} importer cuts off a chunked upload with no Content-Length once it passes the limit (413), and records nothing`, async () => {
      const importsBefore = (await getDb().select({ n: count() }).from(imports))[0].n;
      const boundary = "----platload-limit-test";
      const head = new TextEncoder().encode(
        `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="big.csv"\r\nContent-Type: text/csv\r\n\r\nLot,Plan code,Facing\r\n`,
      );
      const line = new TextEncoder().encode("1,WF-1480,N\r\n".repeat(5000));
      const total = 60 * MB;
      const { stream, counter } = countingStream(total, (i) => (i === 0 ? head : line));
      const res = await send(handler, {
        headers: { cookie: account.cookie, "content-type": `multipart/form-data; boundary=${boundary}` },
        body: stream,
        params: { communityId: String(account.communityId) },
      });
      expect(res.status).toBe(413);
      expect(res.json.error.code).toBe("payload_too_large");
      expect(res.json.error.message).toMatch(/2 MB, the limit/);
      // read up to the limit and a chunk past it, never the whole 60 MB
      expect(counter.pulled).toBeLessThan(3 * MB);
      expect((await getDb().select({ n: count() }).from(imports))[0].n).toBe(importsBefore);
    });

    it(`the ${name} importer refuses a declared length over the limit before reading (413)`, async () => {
      const res = await send(handler, {
        headers: {
          cookie: account.cookie,
          "content-type": "multipart/form-data; boundary=x",
          "content-length": String(3 * MB),
        },
        body: "x",
        params: { communityId: String(account.communityId) },
      });
      expect(res.status).toBe(413);
    });
  }

  it("a JSON body over 1 MB is refused (413), declared or chunked", async () => {
    const big = JSON.stringify({
      changes: [{ planId: 1, version: 1, cells: { plan_name: "x".repeat(2 * MB) } }],
    });
    const declared = await send(plansRoute.PATCH, {
      method: "PATCH",
      headers: {
        cookie: account.cookie,
        "content-type": "application/json",
        "content-length": String(big.length),
      },
      body: big,
    });
    expect(declared.status).toBe(413);
    const { stream, counter } = countingStream(50 * MB, () =>
      new TextEncoder().encode(" ".repeat(64 * 1024)),
    );
    const chunked = await send(plansRoute.PATCH, {
      method: "PATCH",
      headers: { cookie: account.cookie, "content-type": "application/json" },
      body: stream,
    });
    expect(chunked.status).toBe(413);
    expect(counter.pulled).toBeLessThan(2 * MB);
  });

  it("signed-out routes have the same limit: invitation acceptance and sign-in (413)", async () => {
    const { token } = await createInvitation({
      db: getDb(),
      accountId: account.accountId,
      invitedByUserId: account.userId,
      email: `limits.${Date.now()}@builder.test`,
      name: "Limit Tester",
      role: "viewer",
    });
    const { stream, counter } = countingStream(50 * MB, () =>
      new TextEncoder().encode(" ".repeat(64 * 1024)),
    );
    const accept = await send(acceptRoute.POST, {
      headers: { "content-type": "application/json" },
      body: stream,
      params: { token },
    });
    expect(accept.status).toBe(413);
    expect(counter.pulled).toBeLessThan(2 * MB);
    const signIn = countingStream(50 * MB, () => new TextEncoder().encode("a".repeat(64 * 1024)));
    const auth = await send(nextAuthRoute.POST, {
      headers: { "content-type": "application/x-www-form-urlencoded" },
      body: signIn.stream,
      params: { nextauth: ["callback", "credentials"] },
    });
    expect(auth.status).toBe(413);
    expect(signIn.counter.pulled).toBeLessThan(2 * MB);
  });

  it("an unknown invitation token is refused before the body is read or any password hashed (404)", async () => {
    const { stream, counter } = countingStream(10 * MB, () =>
      new TextEncoder().encode("{".repeat(64 * 1024)),
    );
    const res = await send(acceptRoute.POST, {
      headers: { "content-type": "application/json" },
      body: stream,
      params: { token: "made-up-token-that-was-never-sent" },
    });
    expect(res.status).toBe(404);
    expect(counter.pulled).toBeLessThanOrEqual(64 * 1024 * 2);
  });
});

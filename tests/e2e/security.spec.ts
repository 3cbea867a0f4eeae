import { request as httpRequest } from "node:http";
import { expect, test, type Page } from "@playwright/test";
import { users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password";
import { ADDRESS } from "@/lib/auth/sign-in-limits";
import { connect } from "../support/database";
import { E2E_DATABASE, TEST_APP_PORT } from "../support/test-env";
import { signInAs } from "./fixtures";

const base = `http://127.0.0.1:${TEST_APP_PORT}`;

/** Counts what the browser refused under the page's content security policy. */
async function watchPolicy(page: Page): Promise<string[]> {
  const refused: string[] = [];
  page.on("console", (m) => {
    if (/Content Security Policy/i.test(m.text())) refused.push(m.text());
  });
  await page.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) =>
      console.error(
        `Content Security Policy violation: ${e.violatedDirective} ${e.blockedURI} at ${location.pathname} in ${e.sourceFile}:${e.lineNumber}:${e.columnNumber}`,
      ),
    );
  });
  return refused;
}

test("the pages work under their content security policy: sign-in, plan grid, plan sheet charts, lots grid, equipment catalog", async ({
  page,
}) => {
  const refused = await watchPolicy(page);
  const signInPage = await page.goto("/sign-in");
  const policy = signInPage!.headers()["content-security-policy"];
  expect(policy).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/]+' 'strict-dynamic'/);
  expect(policy).toContain("frame-ancestors 'none'");
  expect(signInPage!.headers()["x-content-type-options"]).toBe("nosniff");
  expect(signInPage!.headers()["referrer-policy"]).toBe("same-origin");
  expect(signInPage!.headers()["x-frame-options"]).toBe("DENY");
  // a fresh nonce for every page view
  const again = await page.request.get("/sign-in");
  expect(again.headers()["content-security-policy"]).not.toBe(policy);

  await signInAs(page, "designer@marrowfinch.test"); // scripts ran: the form signed in
  await expect(page.locator(".ag-row").first()).toBeVisible(); // AG Grid and its theme styles
  const plans = ((await (await page.request.get("/api/plans")).json()) as { plans: { id: number }[] }).plans;
  await page.goto(`/plans/${plans[0].id}`);
  await expect(page.getByTestId("chart-profile").locator("svg").first()).toBeVisible(); // recharts
  const communities = (
    (await (await page.request.get("/api/communities")).json()) as {
      communities: { id: number; name: string }[];
    }
  ).communities;
  await page.goto(`/communities/${communities.find((c) => c.name === "Cedar Hollow")!.id}`);
  await expect(page.getByTestId("lots-grid").locator(".ag-row").first()).toBeVisible();
  await page.goto("/equipment");
  await expect(page.locator(".ag-row").first()).toBeVisible();
  expect(refused).toEqual([]);
});

test("API answers are not cached and carry the headers", async ({ page }) => {
  await signInAs(page, "viewer@marrowfinch.test");
  const res = await page.request.get("/api/plans");
  expect(res.headers()["cache-control"]).toBe("no-store");
  expect(res.headers()["x-content-type-options"]).toBe("nosniff");
  expect(res.headers()["content-security-policy"]).toContain("frame-ancestors 'none'");
  const signedOut = await page.request.get("/api/auth/session", { headers: { cookie: "" } });
  expect(signedOut.headers()["cache-control"]).toBe("no-store");
});

test("a write from another origin is refused with 403", async ({ page }) => {
  await signInAs(page, "designer@marrowfinch.test");
  const res = await page.request.patch("/api/plans", {
    data: { changes: [] },
    headers: { origin: "http://127.0.0.1:9" },
  });
  expect(res.status()).toBe(403);
  const own = await page.request.patch("/api/plans", { data: { changes: [] }, headers: { origin: base } });
  expect(own.status()).toBe(400); // past the Origin check; an empty edit is refused as such
});

test("the development mailbox refuses signed-out callers and non-admins", async ({ page }) => {
  const api = await page.request.get("/api/dev/mailbox");
  expect(api.status()).toBe(401);
  expect(await api.text()).not.toContain("/invitation/");
  await page.goto("/dev/mailbox");
  await expect(page).toHaveURL(/\/sign-in/);
  await signInAs(page, "viewer@marrowfinch.test");
  await page.goto("/dev/mailbox");
  await expect(page.getByTestId("mailbox-refused")).toBeVisible();
  await expect(page.getByTestId("mail-message")).toHaveCount(0);
  expect((await page.request.get("/api/dev/mailbox")).status()).toBe(403);
});

/** A raw HTTP request from a chosen loopback address (the server listens on 127.0.0.1; all of 127/8 is this machine). */
function send(
  from: string,
  method: string,
  path: string,
  { headers = {}, body }: { headers?: Record<string, string>; body?: string } = {},
): Promise<{ status: number; headers: Record<string, string | string[] | undefined>; text: string }> {
  return new Promise((resolve, reject) => {
    const req = httpRequest(
      `${base}${path}`,
      {
        method,
        localAddress: from,
        headers: { ...headers, ...(body ? { "content-length": String(Buffer.byteLength(body)) } : {}) },
      },
      (res) => {
        let text = "";
        res.setEncoding("utf8");
        res.on("data", (chunk) => (text += chunk));
        res.on("end", () => resolve({ status: res.statusCode ?? 0, headers: res.headers, text }));
      },
    );
    req.on("error", reject);
    if (body) req.write(body);
    req.end();
  });
}

/** next-auth's credentials sign-in as the browser form makes it: CSRF token, then the form post. */
async function signInFrom(
  from: string,
  email: string,
  password: string,
  forged: Record<string, string> = {},
): Promise<string> {
  const csrf = await send(from, "GET", "/api/auth/csrf");
  const cookie = ([] as string[])
    .concat(csrf.headers["set-cookie"] ?? [])
    .map((c) => c.split(";")[0])
    .join("; ");
  const { csrfToken } = JSON.parse(csrf.text) as { csrfToken: string };
  const body = new URLSearchParams({
    email,
    password,
    csrfToken,
    callbackUrl: `${base}/accounts`,
    json: "true",
  }).toString();
  const res = await send(from, "POST", "/api/auth/callback/credentials", {
    headers: { cookie, origin: base, "content-type": "application/x-www-form-urlencoded", ...forged },
    body,
  });
  const url = new URL((JSON.parse(res.text) as { url: string }).url);
  return url.searchParams.get("error") ?? "signed in";
}

test("the sign-in limit counts the real client address: forged headers do not spread it, and the right password works from another address", async () => {
  test.setTimeout(120_000);
  const email = `limit.e2e.${Date.now()}@marrowfinch.test`;
  const { db, close } = connect(E2E_DATABASE);
  try {
    await db
      .insert(users)
      .values({ email, name: "Limit Owner", passwordHash: await hashPassword("limit-owner-pass") });
  } finally {
    await close();
  }
  const attacker = "127.0.0.2";
  // one failure for each of many e-mails (no e-mail is slowed down), each claiming another address
  for (let i = 0; i < ADDRESS.failures; i++) {
    const forged = {
      "x-forwarded-for": `10.20.${i}.1`,
      "x-real-ip": `10.21.${i}.1`,
      "x-platload-client-address": `10.22.${i}.1`,
    };
    expect(await signInFrom(attacker, `nobody.${i}.${Date.now()}@example.test`, "guess", forged)).toBe(
      "That e-mail and password do not match an account.",
    );
  }
  // all of them were counted on the socket's address: it is blocked now, whatever it claims
  expect(
    await signInFrom(attacker, email, "limit-owner-pass", {
      "x-forwarded-for": "10.99.0.1",
      "x-platload-client-address": "10.99.0.2",
    }),
  ).toMatch(/^Too many failed sign-ins from this address\./);
  // another address is not locked out
  expect(await signInFrom("127.0.0.3", email, "limit-owner-pass")).toBe("signed in");
});

import { describe, expect, it } from "vitest";
import { apiRoute, publicRoute } from "@/lib/auth/route";
import { PERMISSIONS } from "@/lib/auth/permissions";
import { loadRoutes, NOT_MEMBER_ROUTES, routeFiles, type RouteHandler } from "../../support/routes";

/** What is wrong with each handler: not wrapped, wrapped as something its entry does not say, or an unknown permission. */
function coverageProblems(handlers: RouteHandler[], allowed: typeof NOT_MEMBER_ROUTES): string[] {
  const problems: string[] = [];
  for (const h of handlers) {
    const key = `${h.method} ${h.path}`;
    const listed = allowed[key];
    if (!h.guard)
      problems.push(
        `${key} (${h.file}) does not go through apiRoute or another wrapper of lib/auth/route.ts`,
      );
    else if (listed && h.guard.kind !== listed.kind)
      problems.push(`${key} is listed as ${listed.kind} but is wrapped as ${h.guard.kind}`);
    else if (!listed && h.guard.kind !== "member")
      problems.push(`${key} is a ${h.guard.kind} route but not on the list of routes without a member check`);
    else if (h.guard.kind === "member" && !(h.guard.permission in PERMISSIONS))
      problems.push(`${key} names an unknown permission`);
  }
  const present = new Set(handlers.map((h) => `${h.method} ${h.path}`));
  for (const key of Object.keys(allowed))
    if (!present.has(key)) problems.push(`${key} is on the list but no such handler exists`);
  return problems;
}

describe("route coverage", () => {
  it("finds every route file under app/api, the development mailbox's included", () => {
    const files = routeFiles();
    expect(files.length).toBeGreaterThan(30);
    expect(files).toContain("app/api/dev/mailbox/route.dev.ts");
    expect(files).toContain("app/api/plans/[planId]/route.ts");
  });

  it("every handler goes through the authorising wrapper, or is on the explicit list with its reason", async () => {
    const routes = await loadRoutes();
    const handlers = routes.flatMap((r) => r.handlers);
    expect(handlers.length).toBeGreaterThan(45);
    expect(coverageProblems(handlers, NOT_MEMBER_ROUTES)).toEqual([]);
    expect(routes.filter((r) => r.handlers.length === 0).map((r) => r.file)).toEqual([]);
    expect(routes.flatMap((r) => r.strayExports.map((name) => `${r.file}: ${name}`))).toEqual([]);
  }, 60_000); // loading every route module (exceljs, pdfkit, next-auth) takes a few seconds

  it("the check itself catches a bare handler, a mislabelled one and a stale list entry", () => {
    const bare = {
      path: "/api/x",
      file: "app/api/x/route.ts",
      method: "POST" as const,
      handler: async () => new Response(),
      guard: undefined,
    };
    const open = {
      path: "/api/y",
      file: "app/api/y/route.ts",
      method: "GET" as const,
      handler: publicRoute(async () => ({})),
      guard: { kind: "public" as const },
    };
    const fine = {
      path: "/api/z",
      file: "app/api/z/route.ts",
      method: "GET" as const,
      handler: apiRoute({ permission: "read" }, async () => ({})),
      guard: { kind: "member" as const, permission: "read" as const },
    };
    const problems = coverageProblems([bare, open, fine], {
      "DELETE /api/gone": { kind: "public", why: "" },
    });
    expect(problems).toHaveLength(3);
    expect(problems[0]).toContain("POST /api/x");
    expect(problems[1]).toContain("GET /api/y");
    expect(problems[2]).toContain("DELETE /api/gone");
  });
});

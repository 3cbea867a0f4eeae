/**
 * Generated files through the import routes and the job worker (a smaller sample than the unit
 * fuzzing of the read-and-check stage, tests/unit/imports/fuzz.test.ts): every answer is a clear
 * 4xx or a 202, never a 5xx; every queued import ends succeeded or failed (never stuck); and a
 * failed import writes no row: the importer's rows and the history are counted before and after.
 * Runs in an account of its own.
 */
import { and, count, eq } from "drizzle-orm";
import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import * as lotImportRoute from "@/app/api/communities/[communityId]/lots/import/route";
import * as catalogImportRoute from "@/app/api/equipment/import/route";
import * as planImportRoute from "@/app/api/plans/import/route";
import { getDb } from "@/db";
import { auditLog, equipmentSystems, imports, lots, planRevisions, plans } from "@/db/schema";
import type { ImportKind } from "@/lib/imports/pipeline";
import { baseTables, encodeFuzzFile, fuzzFileSpec } from "../support/import-fuzz";
import { waitForImport } from "../support/jobs";
import { EXAMPLE_PLANS_CSV, privateAccount } from "../support/private-account";
import { callRoute } from "../support/requests";

const PER_IMPORTER = 25;
const SEED = 20261203;

describe("import fuzzing through the routes and the worker", () => {
  let account: Awaited<ReturnType<typeof privateAccount>>;
  const bases = baseTables();

  beforeAll(async () => {
    account = await privateAccount(getDb(), "fuzz");
    // the plans the lots files name
    const form = new FormData();
    form.append("file", new File([EXAMPLE_PLANS_CSV], "example-plans.csv"));
    const res = await callRoute(planImportRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: account.cookie,
      form,
    });
    expect((await waitForImport(account.cookie, res.json.importId)).state).toBe("succeeded");
  });

  const rowsOf = async (kind: ImportKind) => {
    const db = getDb();
    const n = async (q: Promise<{ n: number }[]>) => (await q)[0].n;
    const history = await n(
      db.select({ n: count() }).from(auditLog).where(eq(auditLog.accountId, account.accountId)),
    );
    if (kind === "plans")
      return [
        history,
        await n(db.select({ n: count() }).from(plans).where(eq(plans.accountId, account.accountId))),
        await n(
          db.select({ n: count() }).from(planRevisions).where(eq(planRevisions.accountId, account.accountId)),
        ),
      ];
    if (kind === "lots")
      return [
        history,
        await n(db.select({ n: count() }).from(lots).where(eq(lots.communityId, account.communityId))),
      ];
    return [
      history,
      await n(
        db
          .select({ n: count() })
          .from(equipmentSystems)
          .where(eq(equipmentSystems.accountId, account.accountId)),
      ),
    ];
  };

  const routes = {
    plans: planImportRoute.POST,
    lots: lotImportRoute.POST,
    equipment: catalogImportRoute.POST,
  };

  for (const kind of ["plans", "lots", "equipment"] as ImportKind[]) {
    it(`${kind}: ${PER_IMPORTER} generated files answer 202 or a clear 4xx, finish, and a failure writes nothing`, async () => {
      const outcomes: Record<string, number> = {};
      for (const spec of fc.sample(fuzzFileSpec, { numRuns: PER_IMPORTER, seed: SEED })) {
        const file = await encodeFuzzFile(bases[kind], spec);
        const before = await rowsOf(kind);
        const form = new FormData();
        form.append("file", new File([file.data as BlobPart], file.fileName));
        const res = await callRoute(routes[kind], {
          path: "/x",
          method: "POST",
          cookie: account.cookie,
          params: { communityId: String(account.communityId) },
          form,
        });
        expect(res.status, `${file.how}: ${res.text}`).toBeLessThan(500);
        if (res.status !== 202) {
          expect(res.status, file.how).toBeGreaterThanOrEqual(400);
          expect(res.json.error.message, file.how).toMatch(/\w/);
          expect(await rowsOf(kind), file.how).toEqual(before);
          outcomes[res.status] = (outcomes[res.status] ?? 0) + 1;
          continue;
        }
        const done = await waitForImport(account.cookie, res.json.importId);
        outcomes[done.state] = (outcomes[done.state] ?? 0) + 1;
        expect(["succeeded", "failed"], file.how).toContain(done.state);
        if (done.state === "failed") {
          expect(done.errorCount, file.how).toBeGreaterThan(0);
          expect(done.errors.length, file.how).toBeLessThanOrEqual(200);
          expect(await rowsOf(kind), file.how).toEqual(before);
          const [record] = await getDb()
            .select({ fileKey: imports.fileKey })
            .from(imports)
            .where(and(eq(imports.id, res.json.importId)));
          expect(record.fileKey, `${file.how}: a failed file is deleted`).toBeNull();
        }
      }
      console.log(`route fuzz ${kind}: ${PER_IMPORTER} files, ${JSON.stringify(outcomes)}`);
    }, 180_000);
  }
});

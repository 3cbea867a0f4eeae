/**
 * Lost updates: 50 writers at once on the same plan, and on the same three lots, each sending the
 * version it read. For every version exactly one writer wins and every other gets 409; a writer
 * refused reads again and retries until its write lands, so in the end every writer has won once,
 * the versions count every write, and the history holds one entry per write whose "before" is
 * the previous writer's "after" — no write was lost or silently overwritten. Own account.
 */
import { and, asc, eq, gt, inArray, max } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as lotImportRoute from "@/app/api/communities/[communityId]/lots/import/route";
import * as lotsRoute from "@/app/api/communities/[communityId]/lots/route";
import * as planImportRoute from "@/app/api/plans/import/route";
import * as plansRoute from "@/app/api/plans/route";
import { getDb } from "@/db";
import { auditLog, lots, plans } from "@/db/schema";
import { EXAMPLE_PLAN_CODES } from "../support/import-fuzz";
import { waitForImport } from "../support/jobs";
import { EXAMPLE_PLANS_CSV, privateAccount } from "../support/private-account";
import { callRoute } from "../support/requests";

const WRITERS = 50;

interface Tally {
  /** version read → writers whose write with it was accepted */
  winners: Map<string, number[]>;
  refused: number;
  other: number[];
  firstRound: { won: number; refused: number };
}

/**
 * Runs the writers at once. Each reads, writes with what it read, and on 409 reads again, until
 * its write is accepted (at most WRITERS + 5 tries).
 */
async function race(
  read: () => Promise<string>,
  write: (writer: number, version: string) => Promise<number>,
): Promise<Tally> {
  const tally: Tally = { winners: new Map(), refused: 0, other: [], firstRound: { won: 0, refused: 0 } };
  const firstReads = await Promise.all(Array.from({ length: WRITERS }, () => read()));
  await Promise.all(
    Array.from({ length: WRITERS }, async (_, writer) => {
      let version = firstReads[writer];
      for (let attempt = 0; attempt < WRITERS + 5; attempt++) {
        const status = await write(writer, version);
        if (attempt === 0) tally.firstRound[status === 200 ? "won" : "refused"]++;
        if (status === 200) {
          tally.winners.set(version, [...(tally.winners.get(version) ?? []), writer]);
          return;
        }
        if (status === 409) tally.refused++;
        else tally.other.push(status);
        version = await read();
      }
      throw new Error(`writer ${writer} never got its write in`);
    }),
  );
  return tally;
}

describe("lost updates", () => {
  let account: Awaited<ReturnType<typeof privateAccount>>;

  beforeAll(async () => {
    account = await privateAccount(getDb(), "lost-update");
    const form = new FormData();
    form.append("file", new File([EXAMPLE_PLANS_CSV], "example-plans.csv"));
    const res = await callRoute(planImportRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: account.cookie,
      form,
    });
    expect((await waitForImport(account.cookie, res.json.importId)).state).toBe("succeeded");
    const lotsCsv = [
      "Lot,Plan code,Facing",
      ...Array.from({ length: 3 }, (_, i) => `LU-${i + 1},${EXAMPLE_PLAN_CODES[i]},S`),
    ].join("\n");
    const lotForm = new FormData();
    lotForm.append("file", new File([lotsCsv], "lots.csv"));
    const lotRes = await callRoute(lotImportRoute.POST, {
      path: "/x",
      method: "POST",
      cookie: account.cookie,
      params: { communityId: String(account.communityId) },
      form: lotForm,
    });
    expect((await waitForImport(account.cookie, lotRes.json.importId)).state).toBe("succeeded");
  });

  function expectNoLostUpdate(tally: Tally, label: string) {
    const versions = [...tally.winners.keys()];
    console.log(
      `${label}: ${WRITERS} writers; first round ${tally.firstRound.won} won, ${tally.firstRound.refused} got 409; in all ${WRITERS} writes accepted over ${versions.length} versions, ${tally.refused} refusals (409), ${tally.other.length} other answers`,
    );
    expect(tally.firstRound).toEqual({ won: 1, refused: WRITERS - 1 });
    expect(tally.other).toEqual([]);
    expect(versions).toHaveLength(WRITERS);
    for (const version of versions) expect(tally.winners.get(version), `version ${version}`).toHaveLength(1);
    expect([...tally.winners.values()].flat().sort((a, b) => a - b)).toEqual(
      Array.from({ length: WRITERS }, (_, i) => i),
    );
  }

  it("50 writers on one plan: one wins per version, the rest get 409, nothing is lost", async () => {
    const [plan] = await getDb()
      .select()
      .from(plans)
      .where(and(eq(plans.accountId, account.accountId), eq(plans.planCode, EXAMPLE_PLAN_CODES[0])));
    const lastEntry =
      (
        await getDb()
          .select({ id: max(auditLog.id) })
          .from(auditLog)
      )[0].id ?? 0;
    const read = async () =>
      String(
        (await getDb().select({ version: plans.version }).from(plans).where(eq(plans.id, plan.id)))[0]
          .version,
      );
    const tally = await race(read, async (writer, version) => {
      const res = await callRoute(plansRoute.PATCH, {
        path: "/api/plans",
        method: "PATCH",
        cookie: account.cookie,
        body: {
          changes: [
            { planId: plan.id, version: Number(version), cells: { plan_name: `Written by ${writer}` } },
          ],
        },
      });
      return res.status;
    });
    expectNoLostUpdate(tally, "plan");
    const [after] = await getDb().select().from(plans).where(eq(plans.id, plan.id));
    expect(after.version).toBe(plan.version + WRITERS);
    // one history entry per accepted write, each one starting from the one before
    const entries = (
      await getDb()
        .select()
        .from(auditLog)
        .where(
          and(
            eq(auditLog.accountId, account.accountId),
            eq(auditLog.entityId, plan.id),
            eq(auditLog.action, "plan_edit"),
            gt(auditLog.id, lastEntry),
          ),
        )
        .orderBy(asc(auditLog.id))
    ).map((e) => ({
      before: (e.before as { cells: { plan_name: string } }[])[0].cells.plan_name,
      after: (e.after as { cells: { plan_name: string } }[])[0].cells.plan_name,
    }));
    expect(entries).toHaveLength(WRITERS);
    expect(entries[0].before).toBe(plan.name);
    for (let i = 1; i < entries.length; i++) expect(entries[i].before).toBe(entries[i - 1].after);
    expect(after.name).toBe(entries.at(-1)!.after);
  }, 120_000);

  it("50 writers on the same three lots: one wins per version, the rest get 409, nothing is lost", async () => {
    const lotRows = await getDb()
      .select()
      .from(lots)
      .where(eq(lots.communityId, account.communityId))
      .orderBy(asc(lots.lotNumber));
    expect(lotRows).toHaveLength(3);
    const ids = lotRows.map((l) => l.id);
    const read = async () =>
      JSON.stringify(
        (
          await getDb()
            .select({ id: lots.id, version: lots.version })
            .from(lots)
            .where(inArray(lots.id, ids))
            .orderBy(asc(lots.id))
        ).map((l) => l.version),
      );
    const tally = await race(read, async (writer, versions) => {
      const v = JSON.parse(versions) as number[];
      const res = await callRoute(lotsRoute.PATCH, {
        path: "/x",
        method: "PATCH",
        cookie: account.cookie,
        params: { communityId: String(account.communityId) },
        body: {
          changes: [...ids]
            .sort((a, b) => a - b)
            .map((lotId, i) => ({ lotId, version: v[i], optionsNote: `note of writer ${writer}` })),
        },
      });
      return res.status;
    });
    expectNoLostUpdate(tally, "three lots");
    const after = await getDb().select().from(lots).where(inArray(lots.id, ids));
    for (const lot of after)
      expect(lot.version).toBe(lotRows.find((l) => l.id === lot.id)!.version + WRITERS);
    const entries = (
      await getDb()
        .select()
        .from(auditLog)
        .where(and(eq(auditLog.accountId, account.accountId), eq(auditLog.action, "lot_bulk_edit")))
        .orderBy(asc(auditLog.id))
    ).map((e) => ({
      before: (e.before as { optionsNote: string }[]).map((l) => l.optionsNote),
      after: (e.after as { optionsNote: string }[]).map((l) => l.optionsNote),
    }));
    expect(entries).toHaveLength(WRITERS);
    for (let i = 1; i < entries.length; i++) expect(entries[i].before).toEqual(entries[i - 1].after);
    expect(after.map((l) => l.optionsNote)).toEqual(entries.at(-1)!.after);
  }, 120_000);
});

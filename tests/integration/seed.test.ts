import { count } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { accounts, communities, equipmentSystems, lots, memberships, plans, users } from "@/db/schema";
import { seedDatabase } from "@/db/seed";
import { connect, freshDatabase } from "../support/database";

const NAME = "platload_test_seed";

describe("seed", () => {
  const handle = { close: async () => {} };
  afterAll(() => handle.close());

  it("creates the demo scenario and is idempotent", async () => {
    await freshDatabase(NAME);
    const { db, close } = connect(NAME);
    handle.close = close;
    const counts = async () => {
      const out: Record<string, number> = {};
      for (const [name, table] of Object.entries({
        accounts,
        users,
        memberships,
        plans,
        communities,
        lots,
        equipmentSystems,
      })) {
        const [row] = await db.select({ n: count() }).from(table);
        out[name] = row.n;
      }
      return out;
    };
    const first = await seedDatabase(db);
    expect(first.accountsCreated).toHaveLength(2);
    const after1 = await counts();
    expect(after1.accounts).toBe(2);
    expect(after1.plans).toBeGreaterThanOrEqual(4 + 1);
    expect(after1.lots).toBeGreaterThanOrEqual(120);
    // one user per role in the demo account, plus the consultant in both accounts
    expect(after1.memberships).toBe(5 + 1 + 1 + 1);

    const second = await seedDatabase(db);
    expect(second.accountsCreated).toHaveLength(0);
    expect(await counts()).toEqual(after1);
  });
});

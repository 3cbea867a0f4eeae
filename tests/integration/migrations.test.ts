import { afterAll, describe, expect, it } from "vitest";
import { connect, freshDatabase } from "../support/database";
import { sql } from "drizzle-orm";

const EMPTY = "platload_test_empty";

describe("migrations", () => {
  const handle = { close: async () => {} };
  afterAll(() => handle.close());

  it("apply to an empty database and create every table", async () => {
    await freshDatabase(EMPTY);
    const { db, close } = connect(EMPTY);
    handle.close = close;
    const [rows] = (await db.execute(
      sql`SELECT table_name AS t FROM information_schema.tables WHERE table_schema = ${EMPTY} ORDER BY t`,
    )) as unknown as [{ t: string }[]];
    const tables = rows.map((r) => r.t);
    for (const t of [
      "accounts",
      "users",
      "memberships",
      "invitations",
      "plans",
      "plan_revisions",
      "communities",
      "lots",
      "equipment_systems",
      "imports",
      "audit_log",
      "rate_limits",
    ]) {
      expect(tables).toContain(t);
    }
  });
});

// An account of a test file's own (with an admin, who holds every permission), so a test that
// imports or edits freely leaves the seeded accounts the other files rely on as they were.
import { readFileSync } from "node:fs";
import path from "node:path";
import type { Database } from "@/db";
import { DEMO_SITE } from "@/db/demo-scenario";
import { accounts, communities, memberships, users } from "@/db/schema";
import { sessionCookie } from "./requests";

export async function privateAccount(db: Database, label: string) {
  const slug = `${label}-${Date.now()}-${Math.floor(Math.random() * 1e6)}`;
  const [{ id: accountId }] = await db
    .insert(accounts)
    .values({ name: `Test builder ${label}`, slug })
    .$returningId();
  const [{ id: userId }] = await db
    .insert(users)
    .values({ email: `${slug}@builder.test`, name: `Admin ${label}` })
    .$returningId();
  await db.insert(memberships).values({ userId, accountId, role: "admin" });
  const [{ id: communityId }] = await db
    .insert(communities)
    .values({ accountId, name: `Community ${label}`, conditions: DEMO_SITE })
    .$returningId();
  return { accountId, userId, communityId, cookie: await sessionCookie({ userId, accountId }) };
}

/** The example plan library, which the generated lots files name. */
export const EXAMPLE_PLANS_CSV = readFileSync(
  path.resolve(__dirname, "../../templates/example-plans.csv"),
  "utf8",
);

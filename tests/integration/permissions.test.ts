import { beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db";
import { authorizeMember } from "@/lib/auth/member";
import { PERMISSIONS, type Permission } from "@/lib/auth/permissions";
import { AppError } from "@/lib/errors";
import { seededIds } from "../support/demo-ids";

// What each role may do, written out from the product's role table (README and DEVELOPERS.md), not read from the code:
// admin runs the account; designer keeps plans and lots; reviewer approves; purchasing keeps the
// catalog; viewer reads only. The development mailbox (demo and test runs only) holds invitation
// links, so only an admin reads it.
const MAY: Record<string, Permission[]> = {
  admin: [
    "read",
    "team.manage",
    "account.settings",
    "plans.edit",
    "communities.edit",
    "lots.edit",
    "lots.permit",
    "equipment.edit",
    "equipment.override",
    "schedules.export",
    "imports.read",
    "mailbox.read",
  ],
  designer: [
    "read",
    "plans.edit",
    "communities.edit",
    "lots.edit",
    "lots.permit",
    "schedules.export",
    "imports.read",
  ],
  reviewer: ["read", "plans.approve", "lots.permit", "schedules.export", "imports.read"],
  purchasing: ["read", "equipment.edit", "equipment.override", "schedules.export", "imports.read"],
  viewer: ["read", "imports.read"],
};
const ALL: Permission[] = [
  "read",
  "team.manage",
  "account.settings",
  "plans.edit",
  "plans.approve",
  "communities.edit",
  "lots.edit",
  "lots.permit",
  "equipment.edit",
  "equipment.override",
  "schedules.export",
  "imports.read",
  "mailbox.read",
];

describe("the permission helper", () => {
  let ids: Awaited<ReturnType<typeof seededIds>>;
  beforeAll(async () => {
    ids = await seededIds(getDb());
  });

  it("the list above names every permission the code has", () => {
    expect(Object.keys(PERMISSIONS).sort()).toEqual([...ALL].sort());
  });

  for (const role of Object.keys(MAY)) {
    it(`refuses the ${role} exactly what the role may not do`, async () => {
      const db = getDb();
      for (const permission of ALL) {
        const attempt = authorizeMember({
          db,
          userId: ids.roleUsers[role as keyof typeof ids.roleUsers],
          accountId: ids.demoAccountId,
          permission,
        });
        if (MAY[role].includes(permission)) {
          await expect(attempt, `${role} may ${permission}`).resolves.toMatchObject({
            role,
            accountId: ids.demoAccountId,
          });
        } else {
          await expect(attempt, `${role} may not ${permission}`).rejects.toMatchObject({ code: "forbidden" });
        }
      }
    });
  }

  it("refuses a person who is not signed in", async () => {
    await expect(
      authorizeMember({ db: getDb(), userId: null, accountId: ids.demoAccountId, permission: "read" }),
    ).rejects.toMatchObject({ code: "unauthenticated" });
  });

  it("refuses a member of one account in another account", async () => {
    const attempt = authorizeMember({
      db: getDb(),
      userId: ids.otherAdminId,
      accountId: ids.demoAccountId,
      permission: "read",
    });
    await expect(attempt).rejects.toBeInstanceOf(AppError);
    await expect(attempt).rejects.toMatchObject({ code: "forbidden" });
  });
});

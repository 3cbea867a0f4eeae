import { asc, eq } from "drizzle-orm";
import { plans } from "@/db/schema";
import { apiRoute } from "@/lib/auth/route";

/** Plan codes and names only (for choosing a lot's plan), without computing loads. */
export const GET = apiRoute({ permission: "read" }, async ({ db, member }) => ({
  plans: await db
    .select({ id: plans.id, planCode: plans.planCode, name: plans.name })
    .from(plans)
    .where(eq(plans.accountId, member.accountId))
    .orderBy(asc(plans.planCode)),
}));

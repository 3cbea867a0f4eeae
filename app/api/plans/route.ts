import { applyPlanEdits, copyPlan, listPlanLibrary } from "@/db/queries/plans";
import { apiRoute, parseJsonBody } from "@/lib/auth/route";
import { copyPlanSchema, libraryQuerySchema, planEditSchema } from "./schema";

/** The plan library with each model's four-facing loads for the chosen community's design conditions. */
export const GET = apiRoute({ permission: "read" }, async ({ db, member, request }) => {
  const { communityId } = libraryQuerySchema.parse(Object.fromEntries(request.nextUrl.searchParams));
  return listPlanLibrary({ db, accountId: member.accountId, communityId });
});

/** Saves cell edits of one or many models (an edit, a bulk set, a paste) in one transaction. */
export const PATCH = apiRoute({ permission: "plans.edit" }, async ({ db, member, request }) => {
  const { action, changes } = await parseJsonBody(request, planEditSchema);
  return applyPlanEdits({ db, accountId: member.accountId, userId: member.userId, changes, action });
});

/** A new plan model, copied from an existing one under a new code and name. */
export const POST = apiRoute({ permission: "plans.edit" }, async ({ db, member, request }) => {
  const body = await parseJsonBody(request, copyPlanSchema);
  return copyPlan({ db, accountId: member.accountId, userId: member.userId, ...body });
});

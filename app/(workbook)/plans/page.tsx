import type { Metadata } from "next";
import { PageHeader } from "@/components/layout/page-header";
import { PlanLibrary } from "@/components/plans/plan-library";
import { getPageContext } from "@/lib/auth/page";

export const metadata: Metadata = { title: "Plans" };

export default async function PlansPage() {
  const { permissions } = await getPageContext();
  return (
    <div>
      <PageHeader
        title="Plan library"
        description="One row per plan model with its whole envelope; each model is computed with its front facing N, E, S and W."
      />
      <PlanLibrary canEdit={permissions.includes("plans.edit")} />
    </div>
  );
}

import "server-only";
import { and, asc, eq } from "drizzle-orm";
import type { Database } from "@/db";
import { communities, lots, planRevisions, plans } from "@/db/schema";
import { notFound } from "@/lib/errors";
import { LOAD_PROCEDURE_LABELS, parseSiteConditions, type SiteConditions } from "@/lib/load";
import { REPORT_CAUTION } from "@/lib/reports/lot-report-data";
import { facingLabel } from "@/lib/workbook/facing";
import { procedureOfStored, type LotResults, type PermitSnapshot } from "../recompute";

export const PERMIT_SCHEDULE_HEADERS = [
  "Lot",
  "Address",
  "Plan code",
  "Plan name",
  "Revision",
  "Facing",
  "Status",
  "Heating design outdoor (°F)",
  "Cooling design outdoor DB / WB (°F)",
  "Daily range (°F)",
  "Indoor heating / cooling (°F)",
  "Heating load (Btu/h)",
  "Cooling sensible (Btu/h)",
  "Cooling latent (Btu/h)",
  "Cooling total (Btu/h)",
  "Tons",
  "Reviewer",
  "Approved on",
  "Loads from",
  "Load procedure",
  "Engine version",
  "Caution",
] as const;

const conditionsCells = (site: SiteConditions) => [
  site.heatingOutdoorDbF,
  `${site.coolingOutdoorDbF} / ${site.coolingOutdoorWbF}`,
  site.dailyRangeF,
  `${site.indoorHeatingF} / ${site.indoorCoolingF}`,
];

/**
 * The permit schedule of a community: one row per lot. A lot frozen for permit shows its snapshot
 * (inputs, results, procedure and engine version as submitted); the others show the current plan's
 * results, by the account's procedure.
 */
export async function permitScheduleRows({
  db,
  accountId,
  communityId,
}: {
  db: Database;
  accountId: number;
  communityId: number;
}) {
  const [community] = await db
    .select()
    .from(communities)
    .where(and(eq(communities.id, communityId), eq(communities.accountId, accountId)));
  if (!community) throw notFound("That community");
  const site = parseSiteConditions(community.conditions);
  const rows = await db
    .select({ lot: lots, plan: plans, revision: planRevisions })
    .from(lots)
    .leftJoin(plans, eq(plans.id, lots.planId))
    .leftJoin(planRevisions, eq(planRevisions.id, plans.currentRevisionId))
    .where(and(eq(lots.accountId, accountId), eq(lots.communityId, communityId)))
    .orderBy(asc(lots.lotNumber));
  const table = rows.map(({ lot, plan, revision }) => {
    const snapshot = lot.permitSnapshot as PermitSnapshot | null;
    const live = lot.results as LotResults | null;
    const loads = snapshot?.summary ?? live;
    const approval = snapshot
      ? snapshot.approval
      : {
          name: revision?.approverName ?? null,
          credential: revision?.approverCredential ?? null,
          date: revision?.approvedOn ?? null,
        };
    return [
      lot.lotNumber,
      lot.address,
      snapshot?.planCode ?? plan?.planCode ?? "",
      snapshot?.planName ?? plan?.name ?? "",
      snapshot
        ? `${snapshot.revisionNumber} (${snapshot.revisionStatus})`
        : revision
          ? `${revision.number} (${revision.status})`
          : "",
      facingLabel(Number(lot.facingDeg)),
      lot.status.replace("_", " "),
      ...conditionsCells(snapshot?.site ?? site),
      loads ? Math.round(loads.heatingBtuh) : null,
      loads ? Math.round(loads.coolingSensibleBtuh) : null,
      loads ? Math.round(loads.coolingLatentBtuh) : null,
      loads ? Math.round(loads.coolingTotalBtuh) : null,
      loads ? Math.round(loads.tons * 100) / 100 : null,
      approval.name ? `${approval.name}, ${approval.credential ?? ""}` : "not approved",
      approval.date ?? "",
      snapshot ? `permit snapshot ${snapshot.frozenAt.slice(0, 10)}` : "current plan",
      snapshot
        ? LOAD_PROCEDURE_LABELS[procedureOfStored(snapshot)]
        : loads
          ? LOAD_PROCEDURE_LABELS[procedureOfStored(loads)]
          : "",
      snapshot?.engineVersion ?? loads?.engineVersion ?? "",
      REPORT_CAUTION,
    ];
  });
  return { community, headers: [...PERMIT_SCHEDULE_HEADERS], rows: table };
}

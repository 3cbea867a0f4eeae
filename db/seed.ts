// Seeds the invented demo scenario (db/demo-scenario.ts). Idempotent: an account that exists
// already (by slug) is left as it is, and users are matched by e-mail.
import { eq } from "drizzle-orm";
import { hashPassword } from "@/lib/auth/password";
import { parsePlanInput, parseSiteConditions } from "@/lib/load/input";
import { planInputToRow } from "@/lib/workbook/plan-columns";
import type { Role } from "@/lib/auth/roles";
import { createPool, databaseFor, type Database } from "./index";
import { recomputeLots } from "./recompute";
import {
  accounts,
  communities,
  equipmentSystems,
  lots,
  memberships,
  planRevisions,
  plans,
  users,
} from "./schema";
import {
  DEMO_ACCOUNT,
  DEMO_CONSULTANT,
  DEMO_EQUIPMENT,
  DEMO_PASSWORD,
  DEMO_PLANS,
  DEMO_SITE,
  demoLots,
  OTHER_ACCOUNT,
  type DemoUser,
} from "./demo-scenario";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

async function ensureUser(
  tx: Tx,
  user: { email: string; name: string },
  passwordHash: string,
): Promise<number> {
  const [existing] = await tx.select({ id: users.id }).from(users).where(eq(users.email, user.email));
  if (existing) return existing.id;
  const [{ id }] = await tx
    .insert(users)
    .values({ email: user.email, name: user.name, passwordHash })
    .$returningId();
  return id;
}

async function addMembers(
  tx: Tx,
  accountId: number,
  members: (DemoUser & { role: Role })[],
  passwordHash: string,
) {
  for (const m of members) {
    const userId = await ensureUser(tx, m, passwordHash);
    await tx.insert(memberships).values({ userId, accountId, role: m.role });
  }
}

async function addPlan(
  tx: Tx,
  accountId: number,
  createdByUserId: number,
  p: { planCode: string; name: string; input: unknown },
): Promise<number> {
  const input = parsePlanInput(p.input);
  const [{ id: planId }] = await tx
    .insert(plans)
    .values({ accountId, planCode: p.planCode, name: p.name })
    .$returningId();
  const cells = planInputToRow(input, p.planCode, p.name);
  const [{ id: revisionId }] = await tx
    .insert(planRevisions)
    .values({ accountId, planId, number: 1, cells, input, createdByUserId })
    .$returningId();
  await tx.update(plans).set({ currentRevisionId: revisionId }).where(eq(plans.id, planId));
  return planId;
}

export interface SeedSummary {
  accountsCreated: string[];
  accountsKept: string[];
}

export async function seedDatabase(db: Database): Promise<SeedSummary> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const summary: SeedSummary = { accountsCreated: [], accountsKept: [] };
  const site = parseSiteConditions(DEMO_SITE);

  await db.transaction(async (tx) => {
    const [demo] = await tx
      .select({ id: accounts.id })
      .from(accounts)
      .where(eq(accounts.slug, DEMO_ACCOUNT.slug));
    if (demo) {
      summary.accountsKept.push(DEMO_ACCOUNT.name);
    } else {
      const [{ id: accountId }] = await tx
        .insert(accounts)
        .values({ name: DEMO_ACCOUNT.name, slug: DEMO_ACCOUNT.slug })
        .$returningId();
      await addMembers(
        tx,
        accountId,
        [...DEMO_ACCOUNT.users, { ...DEMO_CONSULTANT, role: "reviewer" }],
        passwordHash,
      );
      const designerId = await ensureUser(tx, DEMO_ACCOUNT.users[1], passwordHash);
      const planIds = new Map<string, number>();
      for (const p of DEMO_PLANS) planIds.set(p.planCode, await addPlan(tx, accountId, designerId, p));
      const [{ id: communityId }] = await tx
        .insert(communities)
        .values({ accountId, ...DEMO_ACCOUNT.community, conditions: site })
        .$returningId();
      await tx.insert(lots).values(
        demoLots([...planIds.keys()]).map((l) => ({
          accountId,
          communityId,
          lotNumber: l.lotNumber,
          address: l.address,
          planId: planIds.get(l.planCode)!,
          facingDeg: String(l.facingDeg),
          plannedStart: l.plannedStart,
        })),
      );
      await tx.insert(equipmentSystems).values(
        DEMO_EQUIPMENT.map(
          ([
            systemCode,
            systemType,
            outdoorModel,
            indoorModel,
            furnaceModel,
            tons,
            total,
            sensible,
            heating,
            price,
          ]) => ({
            accountId,
            systemCode,
            systemType,
            outdoorModel,
            indoorModel,
            furnaceModel,
            nominalTons: tons.toFixed(2),
            coolingTotalBtuh: total,
            coolingSensibleBtuh: sensible,
            heatingOutputBtuh: heating || null,
            heatPump47Btuh: systemType === "heat-pump-backup" ? Math.round(tons * 12000) : null,
            heatPump17Btuh: systemType === "heat-pump-backup" ? Math.round(tons * 12000 * 0.62) : null,
            backupHeatBtuh: systemType === "heat-pump-backup" ? 34100 : null,
            seer2: systemType === "heat-pump-backup" ? "15.2" : "14.3",
            hspf2: systemType === "heat-pump-backup" ? "7.8" : null,
            afuePct: systemType === "ac-furnace" ? "96.0" : null,
            priceUsd: price.toFixed(2),
          }),
        ),
      );
      await recomputeLots(tx, { accountId, communityId });
      summary.accountsCreated.push(DEMO_ACCOUNT.name);
    }

    const [other] = await tx
      .select({ id: accounts.id })
      .from(accounts)
      .where(eq(accounts.slug, OTHER_ACCOUNT.slug));
    if (other) {
      summary.accountsKept.push(OTHER_ACCOUNT.name);
    } else {
      const [{ id: accountId }] = await tx
        .insert(accounts)
        .values({
          name: OTHER_ACCOUNT.name,
          slug: OTHER_ACCOUNT.slug,
          loadProcedure: OTHER_ACCOUNT.loadProcedure,
        })
        .$returningId();
      await addMembers(
        tx,
        accountId,
        [...OTHER_ACCOUNT.users, { ...DEMO_CONSULTANT, role: "designer" }],
        passwordHash,
      );
      const adminId = await ensureUser(tx, OTHER_ACCOUNT.users[0], passwordHash);
      const planId = await addPlan(tx, accountId, adminId, OTHER_ACCOUNT.plan);
      const [{ id: communityId }] = await tx
        .insert(communities)
        .values({
          accountId,
          ...OTHER_ACCOUNT.community,
          conditions: parseSiteConditions({
            ...DEMO_SITE,
            name: "Heron Flats (demo)",
            latitudeDeg: 29.5,
            longitudeDeg: -95.1,
            elevationFt: 30,
            heatingOutdoorDbF: 32,
            coolingOutdoorDbF: 96,
            coolingOutdoorWbF: 77,
            dailyRangeF: 16,
          }),
        })
        .$returningId();
      await tx.insert(lots).values(
        [1, 2, 3].map((n) => ({
          accountId,
          communityId,
          lotNumber: `H${n}`,
          address: `${n * 10} Egret Court`,
          planId,
          facingDeg: String(n * 90),
        })),
      );
      await tx.insert(equipmentSystems).values({
        accountId,
        systemCode: "BW-30",
        systemType: "ac-furnace",
        outdoorModel: "BW-C30",
        indoorModel: "BW-A30",
        furnaceModel: "BW-F60",
        nominalTons: "2.50",
        coolingTotalBtuh: 28800,
        coolingSensibleBtuh: 21300,
        heatingOutputBtuh: 60000,
        priceUsd: "2400.00",
      });
      await recomputeLots(tx, { accountId, communityId });
      summary.accountsCreated.push(OTHER_ACCOUNT.name);
    }
  });
  return summary;
}

async function main() {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set");
  const pool = createPool(url);
  try {
    const s = await seedDatabase(databaseFor(pool));
    console.log(
      `seed: created ${s.accountsCreated.join(", ") || "nothing"}; kept ${s.accountsKept.join(", ") || "nothing"}`,
    );
  } finally {
    await pool.end();
  }
}

if (process.argv[1]?.endsWith("seed.ts")) {
  main().catch((error: Error) => {
    console.error("seed failed:", error.message);
    process.exit(1);
  });
}

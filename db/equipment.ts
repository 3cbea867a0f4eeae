// The equipment catalog as stored (equipment_systems rows) ↔ the catalog entries the selection
// and the catalog table use (lib/workbook/equipment-columns.ts), and the selection kept per lot.
// No "server-only" guard: the seed and the benchmark use it too.
import { eq } from "drizzle-orm";
import {
  DEFAULT_SIZING_LIMITS,
  parseCatalog,
  selectFromParsed,
  sizingLimitsSchema,
  type CatalogSystem,
  type SizingLimits,
} from "@/lib/equipment";
import {
  catalogForHeatingDesign,
  joinModelNumbers,
  type EquipmentCatalogEntry,
} from "@/lib/workbook/equipment-columns";
import type { Database } from "./index";
import { accounts, equipmentSystems, type EquipmentSystem } from "./schema";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

const num = (v: string | number | null | undefined) =>
  v === null || v === undefined || v === "" ? undefined : Number(v);
const text = (v: string | null | undefined) => (v ? v : undefined);

export function catalogEntryFromRow(row: EquipmentSystem): EquipmentCatalogEntry {
  const entry: EquipmentCatalogEntry = {
    id: row.systemCode,
    modelNumber:
      joinModelNumbers({
        outdoorModel: row.outdoorModel,
        indoorModel: row.indoorModel,
        furnaceModel: row.furnaceModel,
      }) || row.systemCode,
    type: row.systemType,
    nominalTons: num(row.nominalTons),
    coolingTotalBtuh: row.coolingTotalBtuh ?? 0,
    coolingSensibleBtuh: row.coolingSensibleBtuh ?? 0,
    heatingOutputBtuh: row.heatingOutputBtuh ?? row.heatPump17Btuh ?? 0,
    backupHeatBtuh: row.backupHeatBtuh ?? 0,
    priceUsd: num(row.priceUsd),
    outdoorModel: text(row.outdoorModel),
    indoorModel: text(row.indoorModel),
    furnaceModel: text(row.furnaceModel),
    furnaceOutputBtuh: row.heatingOutputBtuh ?? undefined,
    heatPump47FBtuh: row.heatPump47Btuh ?? undefined,
    heatPump17FBtuh: row.heatPump17Btuh ?? undefined,
    seer2: num(row.seer2),
    hspf2: num(row.hspf2),
    afuePct: num(row.afuePct),
  };
  return entry;
}

export function rowValuesFromEntry(entry: EquipmentCatalogEntry, accountId: number) {
  const dec = (v: number | undefined, digits: number) => (v === undefined ? null : v.toFixed(digits));
  return {
    accountId,
    systemCode: entry.id,
    systemType: entry.type,
    outdoorModel: entry.outdoorModel ?? "",
    indoorModel: entry.indoorModel ?? "",
    furnaceModel: entry.furnaceModel ?? "",
    nominalTons: dec(entry.nominalTons, 2),
    coolingTotalBtuh: entry.coolingTotalBtuh ? Math.round(entry.coolingTotalBtuh) : null,
    coolingSensibleBtuh: entry.coolingSensibleBtuh ? Math.round(entry.coolingSensibleBtuh) : null,
    heatingOutputBtuh: entry.furnaceOutputBtuh ? Math.round(entry.furnaceOutputBtuh) : null,
    heatPump47Btuh: entry.heatPump47FBtuh ? Math.round(entry.heatPump47FBtuh) : null,
    heatPump17Btuh: entry.heatPump17FBtuh ? Math.round(entry.heatPump17FBtuh) : null,
    backupHeatBtuh: entry.backupHeatBtuh ? Math.round(entry.backupHeatBtuh) : null,
    seer2: dec(entry.seer2, 1),
    hspf2: dec(entry.hspf2, 1),
    afuePct: dec(entry.afuePct, 1),
    priceUsd: dec(entry.priceUsd, 2),
  };
}

/** The account's sizing limits, or the defaults (from memory and common practice). */
export async function sizingLimitsOf(db: Database | Tx, accountId: number): Promise<SizingLimits> {
  const [account] = await db
    .select({ limits: accounts.sizingLimits })
    .from(accounts)
    .where(eq(accounts.id, accountId));
  const parsed = sizingLimitsSchema.safeParse(account?.limits ?? {});
  return parsed.success ? parsed.data : { ...DEFAULT_SIZING_LIMITS };
}

/** What a lot keeps of its equipment selection. */
export interface LotSelection {
  computedAt: string;
  bestFit: {
    systemId: number;
    systemCode: string;
    coolingPctOfLoad: number | null;
    heatingPctOfLoad: number | null;
  } | null;
  fittingCodes: string[];
  /** When nothing fits: the nearest system's reasons, in words (too big, too small, latent short…). */
  noFitReason: string | null;
  /** The chosen system (override or best fit) against the loads. */
  chosen: {
    systemId: number;
    systemCode: string;
    fits: boolean;
    reasons: string[];
    coolingPctOfLoad: number | null;
    heatingPctOfLoad: number | null;
  } | null;
  limitsUsed: SizingLimits;
}

/** Selects equipment for lots of one account: the catalog is read once, adjusted per community. */
export class LotEquipmentSelector {
  private perSite = new Map<number, CatalogSystem[]>();
  private idByCode: Map<string, number>;
  private codeById: Map<number, string>;

  constructor(
    private readonly rows: EquipmentSystem[],
    private readonly limits: SizingLimits,
  ) {
    this.idByCode = new Map(rows.map((r) => [r.systemCode, r.id]));
    this.codeById = new Map(rows.map((r) => [r.id, r.systemCode]));
  }

  static async forAccount(db: Database | Tx, accountId: number) {
    const rows = await db.select().from(equipmentSystems).where(eq(equipmentSystems.accountId, accountId));
    return new LotEquipmentSelector(rows, await sizingLimitsOf(db, accountId));
  }

  get empty() {
    return this.rows.length === 0;
  }

  select(
    { communityId, heatingOutdoorDbF }: { communityId: number; heatingOutdoorDbF: number },
    loads: {
      heatingBtuh: number;
      coolingSensibleBtuh: number;
      coolingLatentBtuh: number;
      coolingTotalBtuh: number;
    },
    overrideSystemId: number | null,
  ): { selection: LotSelection; systemId: number | null } {
    let catalog = this.perSite.get(communityId);
    if (!catalog) {
      // Parsed once per community (heat pumps rated at its heating design temperature), not per lot.
      catalog = parseCatalog(catalogForHeatingDesign(this.rows.map(catalogEntryFromRow), heatingOutdoorDbF));
      this.perSite.set(communityId, catalog);
    }
    const result = selectFromParsed({
      loads: { ...loads, coolingRequired: true },
      catalog,
      limits: this.limits,
    });
    const evaluations = [...result.fitting, ...result.notFitting];
    const best = result.bestFit;
    const chosenCode = overrideSystemId ? this.codeById.get(overrideSystemId) : best?.system.id;
    const chosen = chosenCode ? evaluations.find((e) => e.system.id === chosenCode) : undefined;
    // The nearest misfit: the one with the fewest reasons, then closest cooling ratio to 100 %.
    const nearest = [...result.notFitting].sort(
      (a, b) =>
        a.reasons.length - b.reasons.length ||
        Math.abs((a.coolingPctOfLoad ?? 999) - 100) - Math.abs((b.coolingPctOfLoad ?? 999) - 100),
    )[0];
    const selection: LotSelection = {
      computedAt: new Date().toISOString(),
      bestFit: best
        ? {
            systemId: this.idByCode.get(best.system.id)!,
            systemCode: best.system.id,
            coolingPctOfLoad: best.coolingPctOfLoad,
            heatingPctOfLoad: best.heatingPctOfLoad,
          }
        : null,
      fittingCodes: result.fitting.map((e) => e.system.id),
      noFitReason: best
        ? null
        : this.rows.length === 0
          ? "the catalog is empty"
          : nearest
            ? `nearest is ${nearest.system.id}: ${nearest.reasons.map((r) => r.message).join("; ")}`
            : "no system fits",
      chosen: chosen
        ? {
            systemId: this.idByCode.get(chosen.system.id)!,
            systemCode: chosen.system.id,
            fits: chosen.fits,
            reasons: chosen.reasons.map((r) => r.message),
            coolingPctOfLoad: chosen.coolingPctOfLoad,
            heatingPctOfLoad: chosen.heatingPctOfLoad,
          }
        : null,
      limitsUsed: result.limitsUsed,
    };
    return { selection, systemId: overrideSystemId ?? selection.bestFit?.systemId ?? null };
  }
}

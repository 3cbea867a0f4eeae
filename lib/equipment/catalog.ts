/**
 * The builder's equipment catalog and the account's sizing limits (zod schemas + types).
 * Capacities are at the design conditions the builder's data sheets give (Btu/h).
 */
import { z } from "zod";

export const SYSTEM_TYPES = ["ac-furnace", "heat-pump", "heat-pump-backup", "furnace"] as const;
export type SystemType = (typeof SYSTEM_TYPES)[number];

const btuh = (what: string) =>
  z
    .number({
      error: (i) =>
        i.input === undefined ? `required: ${what} in Btu/h` : `${what} must be a number of Btu/h`,
    })
    .min(0, { error: `${what} must be 0 or more Btu/h` })
    .max(1_000_000, { error: `${what} must be at most 1,000,000 Btu/h` });

export const catalogSystemSchema = z
  .object({
    id: z.string().min(1, { error: "required: a system id" }),
    /** Outdoor + indoor model numbers as the builder lists them. */
    modelNumber: z.string().min(1, { error: "required: a model number" }),
    type: z.enum(SYSTEM_TYPES, { error: `type must be one of ${SYSTEM_TYPES.join(", ")}` }),
    nominalTons: z.number().min(0).max(50).optional(),
    /** Total cooling capacity at design conditions (0 for a furnace alone). */
    coolingTotalBtuh: btuh("cooling total capacity").default(0),
    /** Sensible cooling capacity at design conditions. */
    coolingSensibleBtuh: btuh("cooling sensible capacity").default(0),
    /** Furnace output, or the heat pump's heating capacity at the heating design temperature. */
    heatingOutputBtuh: btuh("heating output").default(0),
    /** Backup (strip or furnace) heat of a heat pump with backup. */
    backupHeatBtuh: btuh("backup heat").default(0),
    efficiency: z.string().max(80).optional(),
    priceUsd: z.number().min(0).optional(),
  })
  .superRefine((s, ctx) => {
    if (s.coolingSensibleBtuh > s.coolingTotalBtuh) {
      ctx.addIssue({
        code: "custom",
        path: ["coolingSensibleBtuh"],
        message: "sensible capacity exceeds total capacity",
      });
    }
    if (s.type !== "furnace" && s.coolingTotalBtuh <= 0) {
      ctx.addIssue({
        code: "custom",
        path: ["coolingTotalBtuh"],
        message: `a ${s.type} system needs a cooling capacity`,
      });
    }
    if ((s.type === "furnace" || s.type === "ac-furnace") && s.heatingOutputBtuh <= 0) {
      ctx.addIssue({
        code: "custom",
        path: ["heatingOutputBtuh"],
        message: `a ${s.type} system needs a heating output`,
      });
    }
  });
export type CatalogSystemInput = z.input<typeof catalogSystemSchema>;
export type CatalogSystem = z.output<typeof catalogSystemSchema>;

export const equipmentCatalogSchema = z.array(catalogSystemSchema);

const pct = (what: string) =>
  z
    .number({ error: `${what} must be a percentage` })
    .min(50, { error: `${what} must be at least 50 %` })
    .max(300, { error: `${what} must be at most 300 %` });

/**
 * Sizing limits (percent of the design load). Defaults from memory and common practice
 * (lib/equipment): cooling 95–115 % for air conditioners, up to 125 % for heat
 * pumps where the heating load exceeds the cooling load; furnace output 100–140 % of the heating
 * load. The account can change them, and reports state the ones used.
 */
export const sizingLimitsSchema = z
  .object({
    coolingMinPct: pct("coolingMinPct").default(95),
    coolingMaxPct: pct("coolingMaxPct").default(115),
    heatPumpCoolingMaxPct: pct("heatPumpCoolingMaxPct").default(125),
    heatingMinPct: pct("heatingMinPct").default(100),
    heatingMaxPct: pct("heatingMaxPct").default(140),
  })
  .superRefine((l, ctx) => {
    if (l.coolingMinPct > l.coolingMaxPct) {
      ctx.addIssue({
        code: "custom",
        path: ["coolingMinPct"],
        message: "coolingMinPct is above coolingMaxPct",
      });
    }
    if (l.heatingMinPct > l.heatingMaxPct) {
      ctx.addIssue({
        code: "custom",
        path: ["heatingMinPct"],
        message: "heatingMinPct is above heatingMaxPct",
      });
    }
  });
export type SizingLimits = z.output<typeof sizingLimitsSchema>;
export type SizingLimitsInput = z.input<typeof sizingLimitsSchema>;

export const DEFAULT_SIZING_LIMITS: Readonly<SizingLimits> = Object.freeze(sizingLimitsSchema.parse({}));

/** The loads a selection needs (from the load engine's result). */
export const selectionLoadsSchema = z.object({
  heatingBtuh: btuh("heating load"),
  coolingSensibleBtuh: btuh("cooling sensible load"),
  coolingLatentBtuh: btuh("cooling latent load"),
  coolingTotalBtuh: btuh("cooling total load"),
  /** False for a heating-only house (then a furnace alone can fit). */
  coolingRequired: z.boolean().default(true),
});
export type SelectionLoads = z.output<typeof selectionLoadsSchema>;
export type SelectionLoadsInput = z.input<typeof selectionLoadsSchema>;

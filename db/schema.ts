// The Platload database: one builder account owns everything below it; every query takes the
// account id (see db/queries). Tables first, then relations, then row types.
import { relations } from "drizzle-orm";
import {
  bigint,
  boolean,
  date,
  datetime,
  decimal,
  index,
  int,
  json,
  mysqlEnum,
  mysqlTable,
  text,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";
import { ROLES, type Role } from "@/lib/auth/roles";
import { DEFAULT_LOAD_PROCEDURE, LOAD_PROCEDURES } from "@/lib/load/results";
import { IMPORT_KINDS } from "@/lib/imports/import-kinds";

/** MariaDB rejects drizzle's serial(): an unsigned auto-increment bigint instead (DEVELOPERS.md, MariaDB notes). */
const id = () => bigint("id", { mode: "number", unsigned: true }).autoincrement().primaryKey();
const ref = (name: string) => bigint(name, { mode: "number", unsigned: true });
const createdAt = () =>
  datetime("created_at", { mode: "date", fsp: 3 })
    .notNull()
    .$defaultFn(() => new Date());

export { ROLES, type Role };

export const LOT_STATUSES = ["planned", "permit_submitted", "permitted", "built"] as const;
export type LotStatus = (typeof LOT_STATUSES)[number];

export { IMPORT_KINDS };
export const IMPORT_STATES = [
  "received",
  "validating",
  "computing",
  "saving",
  "succeeded",
  "failed",
] as const;

export const SYSTEM_TYPES = ["ac-furnace", "heat-pump", "heat-pump-backup", "furnace"] as const;

/** A packet is asked for (queued), made by a worker (rendering, then sending when e-mailed), then ready or failed. */
export const PACKET_STATES = ["queued", "rendering", "sending", "ready", "failed"] as const;
export type PacketState = (typeof PACKET_STATES)[number];

export const accounts = mysqlTable("accounts", {
  id: id(),
  name: varchar("name", { length: 160 }).notNull(),
  slug: varchar("slug", { length: 80 }).notNull().unique(),
  /** Equipment sizing limits chosen by the account's admin; null means the engine's defaults. */
  sizingLimits: json("sizing_limits"),
  /** The procedure that sizes equipment and goes on the permit papers, chosen by the account's admin. */
  loadProcedure: mysqlEnum("load_procedure", LOAD_PROCEDURES).notNull().default(DEFAULT_LOAD_PROCEDURE),
  createdAt: createdAt(),
});

export const users = mysqlTable("users", {
  id: id(),
  email: varchar("email", { length: 254 }).notNull().unique(),
  name: varchar("name", { length: 160 }).notNull(),
  /** bcrypt hash; null until an invited person sets a password. */
  passwordHash: varchar("password_hash", { length: 100 }),
  createdAt: createdAt(),
});

export const memberships = mysqlTable(
  "memberships",
  {
    id: id(),
    userId: ref("user_id")
      .notNull()
      .references(() => users.id),
    accountId: ref("account_id")
      .notNull()
      .references(() => accounts.id),
    role: mysqlEnum("role", ROLES).notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("memberships_user_account").on(t.userId, t.accountId),
    index("memberships_account").on(t.accountId),
  ],
);

export const invitations = mysqlTable(
  "invitations",
  {
    id: id(),
    accountId: ref("account_id")
      .notNull()
      .references(() => accounts.id),
    email: varchar("email", { length: 254 }).notNull(),
    name: varchar("name", { length: 160 }).notNull(),
    role: mysqlEnum("role", ROLES).notNull(),
    /** SHA-256 of the token sent by e-mail; the token itself is never stored. */
    tokenHash: varchar("token_hash", { length: 64 }).notNull().unique(),
    invitedByUserId: ref("invited_by_user_id")
      .notNull()
      .references(() => users.id),
    expiresAt: datetime("expires_at", { mode: "date" }).notNull(),
    acceptedAt: datetime("accepted_at", { mode: "date" }),
    revokedAt: datetime("revoked_at", { mode: "date" }),
    createdAt: createdAt(),
  },
  (t) => [index("invitations_account").on(t.accountId)],
);

/**
 * Counters of the sign-in limits (lib/auth/rate-limit.ts), kept by rate-limiter-flexible's MySQL
 * store so every app instance shares them. The library writes `INSERT … VALUES (key, points,
 * expire)`: the three columns, in this order, are its layout. Keys are hashes, never an e-mail or
 * an address.
 */
export const rateLimits = mysqlTable("rate_limits", {
  key: varchar("key", { length: 255 }).primaryKey(),
  points: int("points").notNull().default(0),
  /** Milliseconds since 1970 when the counter resets; null never. */
  expire: bigint("expire", { mode: "number", unsigned: true }),
});

export const plans = mysqlTable(
  "plans",
  {
    id: id(),
    accountId: ref("account_id")
      .notNull()
      .references(() => accounts.id),
    planCode: varchar("plan_code", { length: 40 }).notNull(),
    name: varchar("name", { length: 160 }).notNull(),
    /** The revision shown and edited now (the newest). */
    currentRevisionId: ref("current_revision_id"),
    /** Bumped on every save; a save carrying an older version is refused. */
    version: int("version").notNull().default(1),
    createdAt: createdAt(),
    updatedAt: datetime("updated_at", { mode: "date", fsp: 3 })
      .notNull()
      .$defaultFn(() => new Date()),
  },
  (t) => [uniqueIndex("plans_account_code").on(t.accountId, t.planCode)],
);

export const planRevisions = mysqlTable(
  "plan_revisions",
  {
    id: id(),
    accountId: ref("account_id")
      .notNull()
      .references(() => accounts.id),
    planId: ref("plan_id")
      .notNull()
      .references(() => plans.id),
    number: int("number").notNull(),
    /** The plan library row as entered, by column key (lib/workbook/plan-columns.ts): text, formulas kept. */
    cells: json("cells"),
    /** The engine's PlanInput (lib/load/input.ts) read from the cells, as validated. */
    input: json("input").notNull(),
    /** The engine's four-facing result for this input, or null when not yet computed. */
    results: json("results"),
    engineVersion: varchar("engine_version", { length: 20 }),
    status: mysqlEnum("status", ["draft", "approved"]).notNull().default("draft"),
    approvedByUserId: ref("approved_by_user_id").references(() => users.id),
    approverName: varchar("approver_name", { length: 160 }),
    approverCredential: varchar("approver_credential", { length: 160 }),
    approvedOn: date("approved_on", { mode: "string" }),
    createdByUserId: ref("created_by_user_id").references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("plan_revisions_plan_number").on(t.planId, t.number),
    index("plan_revisions_account").on(t.accountId),
  ],
);

export const communities = mysqlTable(
  "communities",
  {
    id: id(),
    accountId: ref("account_id")
      .notNull()
      .references(() => accounts.id),
    name: varchar("name", { length: 160 }).notNull(),
    locality: varchar("locality", { length: 160 }).notNull().default(""),
    /** The engine's SiteConditions (location and design conditions). */
    conditions: json("conditions").notNull(),
    version: int("version").notNull().default(1),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("communities_account_name").on(t.accountId, t.name)],
);

export const equipmentSystems = mysqlTable(
  "equipment_systems",
  {
    id: id(),
    accountId: ref("account_id")
      .notNull()
      .references(() => accounts.id),
    systemCode: varchar("system_code", { length: 60 }).notNull(),
    systemType: mysqlEnum("system_type", SYSTEM_TYPES).notNull(),
    outdoorModel: varchar("outdoor_model", { length: 80 }).notNull().default(""),
    indoorModel: varchar("indoor_model", { length: 80 }).notNull().default(""),
    furnaceModel: varchar("furnace_model", { length: 80 }).notNull().default(""),
    nominalTons: decimal("nominal_tons", { precision: 4, scale: 2 }),
    coolingTotalBtuh: int("cooling_total_btuh"),
    coolingSensibleBtuh: int("cooling_sensible_btuh"),
    heatingOutputBtuh: int("heating_output_btuh"),
    heatPump47Btuh: int("heat_pump_47_btuh"),
    heatPump17Btuh: int("heat_pump_17_btuh"),
    backupHeatBtuh: int("backup_heat_btuh"),
    seer2: decimal("seer2", { precision: 4, scale: 1 }),
    hspf2: decimal("hspf2", { precision: 4, scale: 1 }),
    afuePct: decimal("afue_pct", { precision: 4, scale: 1 }),
    priceUsd: decimal("price_usd", { precision: 10, scale: 2 }),
    version: int("version").notNull().default(1),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("equipment_account_code").on(t.accountId, t.systemCode)],
);

export const lots = mysqlTable(
  "lots",
  {
    id: id(),
    accountId: ref("account_id")
      .notNull()
      .references(() => accounts.id),
    communityId: ref("community_id")
      .notNull()
      .references(() => communities.id),
    lotNumber: varchar("lot_number", { length: 40 }).notNull(),
    address: varchar("address", { length: 200 }).notNull().default(""),
    planId: ref("plan_id").references(() => plans.id),
    /** Azimuth the front door faces, degrees clockwise from north. */
    facingDeg: decimal("facing_deg", { precision: 5, scale: 1 }).notNull().default("0"),
    optionsNote: varchar("options_note", { length: 300 }).notNull().default(""),
    status: mysqlEnum("status", LOT_STATUSES).notNull().default("planned"),
    plannedStart: date("planned_start", { mode: "string" }),
    /** Loads computed from the current plan revision and community conditions. */
    results: json("results"),
    resultsRevisionId: ref("results_revision_id"),
    resultsComputedAt: datetime("results_computed_at", { mode: "date", fsp: 3 }),
    /** Frozen copy of inputs, results and engine version taken at permit submission. */
    permitSnapshot: json("permit_snapshot"),
    permitSnapshotAt: datetime("permit_snapshot_at", { mode: "date" }),
    equipmentSystemId: ref("equipment_system_id").references(() => equipmentSystems.id),
    equipmentOverride: boolean("equipment_override").notNull().default(false),
    /** The last equipment selection for this lot: best fit, fitting systems, reasons, ratios, limits used. */
    selection: json("selection"),
    version: int("version").notNull().default(1),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("lots_community_number").on(t.communityId, t.lotNumber),
    index("lots_account").on(t.accountId),
    index("lots_plan").on(t.planId),
  ],
);

export const imports = mysqlTable(
  "imports",
  {
    id: id(),
    accountId: ref("account_id")
      .notNull()
      .references(() => accounts.id),
    userId: ref("user_id")
      .notNull()
      .references(() => users.id),
    kind: mysqlEnum("kind", IMPORT_KINDS).notNull(),
    communityId: ref("community_id").references(() => communities.id),
    fileName: varchar("file_name", { length: 255 }).notNull(),
    fileSizeBytes: int("file_size_bytes").notNull(),
    /** Key of the original file in object storage. */
    fileKey: varchar("file_key", { length: 300 }),
    state: mysqlEnum("state", IMPORT_STATES).notNull().default("received"),
    progressPct: int("progress_pct").notNull().default(0),
    createdCount: int("created_count").notNull().default(0),
    updatedCount: int("updated_count").notNull().default(0),
    /** Row-level errors: [{ row, column, reason }], the first 200 of them. */
    errors: json("errors"),
    /** How many problems the file had in all (errors keeps the first 200). */
    errorCount: int("error_count").notNull().default(0),
    createdAt: createdAt(),
    finishedAt: datetime("finished_at", { mode: "date", fsp: 3 }),
  },
  (t) => [index("imports_account_time").on(t.accountId, t.createdAt)],
);

/**
 * Generated files (permit packets, schedules) kept in object storage, with who made them and when.
 * The row is made when the file is asked for and a worker fills it in (state), so the request
 * itself (which lots, whom to send it to) is kept here and the job carries only the id.
 */
export const packets = mysqlTable(
  "packets",
  {
    id: id(),
    accountId: ref("account_id")
      .notNull()
      .references(() => accounts.id),
    communityId: ref("community_id").references(() => communities.id),
    kind: mysqlEnum("kind", ["permit-packet", "equipment-schedule", "permit-schedule"]).notNull(),
    state: mysqlEnum("state", PACKET_STATES).notNull().default("ready"),
    /** What was asked: { lotIds, senderName, accountName } (lot ids resolved when asked). */
    request: json("request"),
    fileName: varchar("file_name", { length: 255 }).notNull().default(""),
    /** Key in object storage; null until the file is made. */
    fileKey: varchar("file_key", { length: 300 }),
    contentType: varchar("content_type", { length: 120 }).notNull().default(""),
    sizeBytes: int("size_bytes").notNull().default(0),
    lotCount: int("lot_count").notNull().default(0),
    /** Addresses it was (or is to be) e-mailed to, if any. */
    sentTo: json("sent_to"),
    /** When the message left; a retried job does not send it again. */
    sentAt: datetime("sent_at", { mode: "date", fsp: 3 }),
    /** Why it failed, in words for the user. */
    error: text("error"),
    createdByUserId: ref("created_by_user_id")
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
    finishedAt: datetime("finished_at", { mode: "date", fsp: 3 }),
  },
  (t) => [index("packets_account_time").on(t.accountId, t.createdAt)],
);

export const auditLog = mysqlTable(
  "audit_log",
  {
    id: id(),
    accountId: ref("account_id")
      .notNull()
      .references(() => accounts.id),
    userId: ref("user_id").references(() => users.id),
    action: varchar("action", { length: 60 }).notNull(),
    entityType: varchar("entity_type", { length: 40 }).notNull(),
    entityId: ref("entity_id"),
    summary: text("summary").notNull(),
    before: json("before"),
    after: json("after"),
    createdAt: createdAt(),
  },
  (t) => [
    index("audit_account_time").on(t.accountId, t.createdAt),
    index("audit_entity").on(t.entityType, t.entityId),
  ],
);

export const accountsRelations = relations(accounts, ({ many }) => ({
  memberships: many(memberships),
  plans: many(plans),
  communities: many(communities),
}));

export const usersRelations = relations(users, ({ many }) => ({ memberships: many(memberships) }));

export const membershipsRelations = relations(memberships, ({ one }) => ({
  user: one(users, { fields: [memberships.userId], references: [users.id] }),
  account: one(accounts, { fields: [memberships.accountId], references: [accounts.id] }),
}));

export const plansRelations = relations(plans, ({ many, one }) => ({
  revisions: many(planRevisions),
  account: one(accounts, { fields: [plans.accountId], references: [accounts.id] }),
}));

export const planRevisionsRelations = relations(planRevisions, ({ one }) => ({
  plan: one(plans, { fields: [planRevisions.planId], references: [plans.id] }),
}));

export const communitiesRelations = relations(communities, ({ many }) => ({ lots: many(lots) }));

export const lotsRelations = relations(lots, ({ one }) => ({
  community: one(communities, { fields: [lots.communityId], references: [communities.id] }),
  plan: one(plans, { fields: [lots.planId], references: [plans.id] }),
}));

export type Account = typeof accounts.$inferSelect;
export type User = typeof users.$inferSelect;
export type Membership = typeof memberships.$inferSelect;
export type Invitation = typeof invitations.$inferSelect;
export type Plan = typeof plans.$inferSelect;
export type PlanRevision = typeof planRevisions.$inferSelect;
export type Community = typeof communities.$inferSelect;
export type Lot = typeof lots.$inferSelect;
export type EquipmentSystem = typeof equipmentSystems.$inferSelect;
export type ImportRecord = typeof imports.$inferSelect;
export type AuditEntry = typeof auditLog.$inferSelect;
export type Packet = typeof packets.$inferSelect;

import "server-only";
import { and, asc, desc, eq, inArray, lt } from "drizzle-orm";
import type { Database } from "@/db";
import { catalogEntryFromRow, sizingLimitsOf, type LotSelection } from "@/db/equipment";
import {
  accounts,
  communities,
  equipmentSystems,
  lots,
  packets,
  planRevisions,
  plans,
  users,
  type LotStatus,
  type PacketState,
} from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { AppError, notFound } from "@/lib/errors";
import {
  computeFacingLoads,
  LOAD_PROCEDURE_LABELS,
  LoadInputError,
  parseSiteConditions,
  type FacingLoads,
  type LoadProcedure,
  type PlanInput,
  type SiteConditions,
} from "@/lib/load";
import { workJobId } from "@/lib/jobs/types";
import { sendMail } from "@/lib/mail/send";
import {
  lotReportFromResults,
  renderLotReportsPdf,
  type LotReport,
  type LotSystemChoice,
} from "@/lib/reports";
import { getObject, putObject } from "@/lib/storage/object-store";
import { catalogForHeatingDesign } from "@/lib/workbook/equipment-columns";
import { writeXlsx } from "@/lib/workbook/table-io";
import { loadProcedureOf } from "../load-procedure";
import { procedureOfStored, type PermitSnapshot } from "../recompute";
import {
  equipmentScheduleFile,
  lotEquipment,
  NOT_SELECTED_YET,
  safeFilePart,
  XLSX_TYPE,
  type GeneratedFile,
} from "./equipment-schedule";
import { permitScheduleRows } from "./permit-schedule";

export const PACKET_KINDS = ["permit-packet", "equipment-schedule", "permit-schedule"] as const;
export type PacketKind = (typeof PACKET_KINDS)[number];

export const PACKET_KIND_LABELS: Record<PacketKind, string> = {
  "permit-packet": "Permit packet (PDF, one load report per lot)",
  "equipment-schedule": "Equipment schedule (XLSX)",
  "permit-schedule": "Permit schedule (XLSX)",
};

/** Statuses whose lots have been handed in for permit (and so have a frozen snapshot). */
export const PERMIT_STATUSES: readonly LotStatus[] = ["permit_submitted", "permitted", "built"];

const PDF_TYPE = "application/pdf";

// ---------------------------------------------------------------------------------------------
// Lot reports from the database.

type LotRow = typeof lots.$inferSelect;

/**
 * The load reports of some lots of one account, in lot-number order. A lot frozen for permit
 * reports its permit snapshot (input, site, full result, approval, revision as submitted); any
 * other lot is computed now from its plan's current revision and the community's conditions.
 *
 * @throws AppError not_found when a lot is not of this account; conflict when a lot has no plan.
 */
export async function lotReportsFor({
  db,
  accountId,
  lotIds,
}: {
  db: Database;
  accountId: number;
  lotIds: number[];
}): Promise<{ reports: LotReport[]; lots: LotRow[] }> {
  if (lotIds.length === 0) return { reports: [], lots: [] };
  const rows = await db
    .select({ lot: lots, plan: plans, revision: planRevisions, community: communities })
    .from(lots)
    .innerJoin(communities, eq(communities.id, lots.communityId))
    .leftJoin(plans, eq(plans.id, lots.planId))
    .leftJoin(planRevisions, eq(planRevisions.id, plans.currentRevisionId))
    .where(and(eq(lots.accountId, accountId), inArray(lots.id, lotIds)))
    .orderBy(asc(communities.name), asc(lots.lotNumber));
  if (rows.length !== new Set(lotIds).size) throw notFound("That lot");

  const [account] = await db.select({ name: accounts.name }).from(accounts).where(eq(accounts.id, accountId));
  const accountLimits = await sizingLimitsOf(db, accountId);
  const procedure = await loadProcedureOf(db, accountId);
  const systemRows = await db
    .select()
    .from(equipmentSystems)
    .where(eq(equipmentSystems.accountId, accountId));
  const systemById = new Map(systemRows.map((row) => [row.id, row]));
  const sites = new Map<number, SiteConditions>();
  const generatedAt = new Date().toISOString();

  const noPlan = rows
    .filter((r) => !r.lot.permitSnapshot && (!r.plan || !r.revision))
    .map((r) => r.lot.lotNumber);
  if (noPlan.length > 0) {
    throw new AppError(
      "conflict",
      `Lot${noPlan.length > 1 ? "s" : ""} ${noPlan.join(", ")} ha${noPlan.length > 1 ? "ve" : "s"} no plan model, so no load report can be made. Nothing was generated; choose a plan for ${noPlan.length > 1 ? "them" : "it"} or leave ${noPlan.length > 1 ? "them" : "it"} out.`,
    );
  }

  const reports: LotReport[] = [];
  for (const [index, { lot, plan, revision, community }] of rows.entries()) {
    // Computing many lots is long work for a job worker: let it renew its claim between lots.
    if (index % 25 === 24) await new Promise((resolve) => setImmediate(resolve));
    const snapshot = lot.permitSnapshot as PermitSnapshot | null;
    let site: SiteConditions;
    let input: PlanInput;
    let loads: FacingLoads;
    let planInfo: { code: string; name: string; revisionNumber: number; status: string };
    let approval: { name: string | null; credential: string | null; date: string | null };
    if (snapshot) {
      site = snapshot.site;
      input = snapshot.input;
      // A snapshot taken before procedures were named was made by the hourly method.
      loads = { ...snapshot.result, procedure: procedureOfStored(snapshot) };
      planInfo = {
        code: snapshot.planCode,
        name: snapshot.planName,
        revisionNumber: snapshot.revisionNumber,
        status: `${snapshot.revisionStatus}, permit snapshot of ${snapshot.frozenAt.slice(0, 10)}`,
      };
      approval = snapshot.approval;
    } else {
      site = sites.get(community.id) ?? parseSiteConditions(community.conditions);
      sites.set(community.id, site);
      input = revision!.input as PlanInput;
      loads = computeLotLoads(input, site, Number(lot.facingDeg), procedure, lot.lotNumber);
      planInfo = {
        code: plan!.planCode,
        name: plan!.name,
        revisionNumber: revision!.number,
        status: revision!.status,
      };
      approval = {
        name: revision!.approverName,
        credential: revision!.approverCredential,
        date: revision!.approvedOn,
      };
    }
    const { systemId, selection } = lotEquipment(lot);
    reports.push(
      lotReportFromResults({
        builderAccountName: account?.name ?? "Builder",
        communityName: community.name,
        lot: { lotNumber: lot.lotNumber, address: lot.address || null },
        plan: { ...planInfo, input },
        site,
        loads,
        selection: systemChoiceOf(
          { systemId, overridden: lot.equipmentOverride },
          selection,
          systemById,
          site,
        ),
        sizingLimits: selection?.limitsUsed ?? accountLimits,
        approval:
          approval.name && approval.date
            ? {
                reviewerName: approval.name,
                credential: approval.credential ?? "",
                approvedOn: approval.date,
              }
            : null,
        generatedAt,
      }),
    );
  }
  return { reports, lots: rows.map((r) => r.lot) };
}

/** A lot's loads by the account's procedure; an engine refusal is the one error shape, naming the lot and the procedure. */
function computeLotLoads(
  input: PlanInput,
  site: SiteConditions,
  facingDeg: number,
  procedure: LoadProcedure,
  lotNumber: string,
): FacingLoads {
  try {
    return computeFacingLoads(input, site, facingDeg, { validated: true, procedure });
  } catch (error) {
    if (error instanceof LoadInputError)
      throw new AppError(
        "conflict",
        `Lot ${lotNumber}: its loads cannot be computed by ${LOAD_PROCEDURE_LABELS[procedure]}: ${error.message}. Nothing was generated.`,
      );
    throw error;
  }
}

function systemChoiceOf(
  lot: { systemId: number | null; overridden: boolean },
  selection: LotSelection | null,
  systemById: Map<number, typeof equipmentSystems.$inferSelect>,
  site: SiteConditions,
): LotSystemChoice {
  const row = lot.systemId === null ? undefined : systemById.get(lot.systemId);
  if (row) {
    // The heat pump's output at this community's heating design temperature, as the selection saw it.
    const [entry] = catalogForHeatingDesign([catalogEntryFromRow(row)], site.heatingOutdoorDbF);
    const overridden = lot.overridden && selection?.bestFit?.systemId !== row.id;
    return {
      system: entry,
      overridden,
      overrideNote: overridden ? "chosen by purchasing in place of the selection's best fit" : null,
    };
  }
  if (!selection) return { system: null, reason: `No system: ${NOT_SELECTED_YET}.` };
  return {
    system: null,
    reason: `No catalog system fits within the sizing limits: ${selection.noFitReason ?? "no system fits"}.`,
  };
}

/** One lot's report as PDF bytes (the per-lot report link). */
export async function lotReportPdf({
  db,
  accountId,
  lotId,
}: {
  db: Database;
  accountId: number;
  lotId: number;
}): Promise<GeneratedFile> {
  const { reports, lots: rows } = await lotReportsFor({ db, accountId, lotIds: [lotId] });
  const body = await renderLotReportsPdf(reports, { title: `Load report: lot ${rows[0].lotNumber}` });
  return { fileName: `load-report-lot-${safeFilePart(rows[0].lotNumber)}.pdf`, contentType: PDF_TYPE, body };
}

// ---------------------------------------------------------------------------------------------
// Packets: generated files kept in object storage with who made them and when.

/** The community of this account, or not found (checked before a request body is read). */
export async function communityOf(db: Database, accountId: number, communityId: number) {
  const [community] = await db
    .select()
    .from(communities)
    .where(and(eq(communities.id, communityId), eq(communities.accountId, accountId)));
  if (!community) throw notFound("That community");
  return community;
}

/**
 * Which lots of a community a packet holds: the listed lots (each must be of this community),
 * or the lots with one of the statuses, or every lot. None is a clear error.
 */
export async function packetLotIds({
  db,
  accountId,
  communityId,
  lotIds,
  statuses,
}: {
  db: Database;
  accountId: number;
  communityId: number;
  lotIds?: number[];
  statuses?: LotStatus[];
}): Promise<number[]> {
  const filters = [eq(lots.accountId, accountId), eq(lots.communityId, communityId)];
  if (statuses && statuses.length > 0) filters.push(inArray(lots.status, statuses));
  if (lotIds && lotIds.length > 0) filters.push(inArray(lots.id, lotIds));
  const found = await db
    .select({ id: lots.id })
    .from(lots)
    .where(and(...filters));
  if (lotIds && lotIds.length > 0) {
    const inCommunity = new Set(found.map((r) => r.id));
    const missing = [...new Set(lotIds)].filter((id) => !inCommunity.has(id));
    if (missing.length > 0) {
      throw new AppError(
        "invalid_input",
        "Some lots are not lots of this community (or not of the chosen statuses). Nothing was generated.",
        [
          {
            field: "lotIds",
            message: `lot ids ${missing.join(", ")} are not lots of this community${statuses?.length ? ` with status ${statuses.join(" or ")}` : ""}`,
          },
        ],
      );
    }
  }
  if (found.length === 0) {
    throw new AppError(
      "invalid_input",
      "No lots match, so there is nothing to put in a packet. Nothing was generated.",
      [
        {
          field: statuses?.length ? "statuses" : "lotIds",
          message: statuses?.length
            ? `no lot of this community has status ${statuses.join(" or ")}`
            : "this community has no lots",
        },
      ],
    );
  }
  return found.map((r) => r.id);
}

/** A permit packet: one PDF of the lots' load reports, with a cover page listing them. */
async function permitPacketFile({
  db,
  accountId,
  communityId,
  lotIds,
  statuses,
}: {
  db: Database;
  accountId: number;
  communityId: number;
  lotIds?: number[];
  statuses?: LotStatus[];
}): Promise<GeneratedFile & { lotCount: number; lotNumbers: string[] }> {
  const community = await communityOf(db, accountId, communityId);
  const ids = await packetLotIds({ db, accountId, communityId, lotIds, statuses });
  const { reports, lots: rows } = await lotReportsFor({ db, accountId, lotIds: ids });
  const body = await renderLotReportsPdf(reports, { title: `Permit packet: ${community.name}`, cover: true });
  return {
    fileName: `permit-packet-${safeFilePart(community.name)}-${new Date().toISOString().slice(0, 10)}.pdf`,
    contentType: PDF_TYPE,
    body,
    lotCount: rows.length,
    lotNumbers: rows.map((r) => r.lotNumber),
  };
}

async function permitScheduleFile({
  db,
  accountId,
  communityId,
}: {
  db: Database;
  accountId: number;
  communityId: number;
}): Promise<GeneratedFile & { lotCount: number }> {
  const { community, headers, rows } = await permitScheduleRows({ db, accountId, communityId });
  return {
    fileName: `permit-schedule-${safeFilePart(community.name)}-${new Date().toISOString().slice(0, 10)}.xlsx`,
    contentType: XLSX_TYPE,
    body: await writeXlsx(headers, rows, { sheetName: "Permit schedule" }),
    lotCount: rows.length,
  };
}

/** Generates one of the files a community can send. */
async function generateFile({
  db,
  accountId,
  communityId,
  kind,
  lotIds,
  statuses,
}: {
  db: Database;
  accountId: number;
  communityId: number;
  kind: PacketKind;
  lotIds?: number[];
  statuses?: LotStatus[];
}): Promise<GeneratedFile & { lotCount: number }> {
  if (kind === "permit-packet") return permitPacketFile({ db, accountId, communityId, lotIds, statuses });
  if (kind === "permit-schedule") return permitScheduleFile({ db, accountId, communityId });
  const file = await equipmentScheduleFile({ db, accountId, communityId, format: "xlsx" });
  return { ...file, lotCount: file.result.schedule.totals.lotCount };
}

/** What a packet row keeps of the request, for the worker that makes it. */
interface PacketRequest {
  lotIds?: number[];
  senderName?: string;
  accountName?: string;
}

/** Lots of these ids that have neither a plan nor a permit snapshot: no report can be made for them. */
async function lotsWithoutPlan(db: Database, accountId: number, lotIds: number[]): Promise<string[]> {
  const rows = await db
    .select({ lotNumber: lots.lotNumber, planId: lots.planId, snapshotAt: lots.permitSnapshotAt })
    .from(lots)
    .where(and(eq(lots.accountId, accountId), inArray(lots.id, lotIds)))
    .orderBy(asc(lots.lotNumber));
  return rows.filter((r) => r.planId === null && r.snapshotAt === null).map((r) => r.lotNumber);
}

/**
 * Asks for a file: checks what is cheap to check now (the lots, and that each has a plan; the
 * route checked the addresses) and records the packet as queued. A worker makes it (the `packet`
 * job); the packet row shows how far it got. A refusal writes nothing.
 */
export async function requestPacket({
  db,
  accountId,
  userId,
  communityId,
  kind,
  lotIds,
  statuses,
  to,
  senderName,
  accountName,
}: {
  db: Database;
  accountId: number;
  userId: number;
  communityId: number;
  kind: PacketKind;
  lotIds?: number[];
  statuses?: LotStatus[];
  to?: string[];
  senderName?: string;
  accountName?: string;
}) {
  await communityOf(db, accountId, communityId);
  let ids: number[] | undefined;
  if (kind === "permit-packet") {
    ids = await packetLotIds({ db, accountId, communityId, lotIds, statuses });
    const noPlan = await lotsWithoutPlan(db, accountId, ids);
    if (noPlan.length > 0) {
      throw new AppError(
        "conflict",
        `Lot${noPlan.length > 1 ? "s" : ""} ${noPlan.join(", ")} ha${noPlan.length > 1 ? "ve" : "s"} no plan model, so no load report can be made. Nothing was generated; choose a plan for ${noPlan.length > 1 ? "them" : "it"} or leave ${noPlan.length > 1 ? "them" : "it"} out.`,
      );
    }
  }
  const request: PacketRequest = { lotIds: ids, senderName, accountName };
  const createdAt = new Date();
  const [{ id }] = await db
    .insert(packets)
    .values({
      accountId,
      communityId,
      kind,
      state: "queued",
      request,
      sentTo: to ?? null,
      lotCount: ids?.length ?? 0,
      createdByUserId: userId,
      createdAt,
    })
    .$returningId();
  return { packetId: id, lotCount: ids?.length ?? 0, jobId: workJobId("packet", { id, createdAt }) };
}

const FINISHED_PACKET: readonly PacketState[] = ["ready", "failed"];

/** A packet that cannot be made (a lot lost its plan, the job used its last attempt), with the reason. */
export async function failPacket(db: Database, packetId: number, reason: string): Promise<void> {
  await db
    .update(packets)
    .set({ state: "failed", error: reason.slice(0, 2000), finishedAt: new Date() })
    .where(and(eq(packets.id, packetId), inArray(packets.state, ["queued", "rendering", "sending"])));
}

/**
 * The `packet` job: renders the file, keeps it in object storage under a key of its own (a
 * retry writes the same object again, never a second one), e-mails it when asked, then marks
 * the packet ready with its history entry in one transaction that first checks it is not
 * finished already. sentAt is written as soon as the mail server takes the message, so a retry
 * after that does not send again; only a worker dying between the server's acceptance and that
 * write can send twice, and the message id is the same both times so a mail program can tell.
 */
export async function runPacketJob({
  db,
  packetId,
}: {
  db: Database;
  packetId: number;
}): Promise<{ state: "ready" | "failed" | "already-finished" }> {
  const [packet] = await db.select().from(packets).where(eq(packets.id, packetId));
  if (!packet) throw notFound("That packet");
  if (FINISHED_PACKET.includes(packet.state)) return { state: "already-finished" };
  const request = (packet.request ?? {}) as PacketRequest;
  const { accountId } = packet;
  const communityId = packet.communityId!;
  await db
    .update(packets)
    .set({ state: "rendering" })
    .where(and(eq(packets.id, packetId), inArray(packets.state, ["queued", "rendering", "sending"])));
  let file: GeneratedFile & { lotCount: number };
  let community: typeof communities.$inferSelect;
  try {
    community = await communityOf(db, accountId, communityId);
    file = await generateFile({ db, accountId, communityId, kind: packet.kind, lotIds: request.lotIds });
  } catch (error) {
    // A request that became impossible (a lot lost its plan, the community went) is not retried.
    if (error instanceof AppError) {
      await failPacket(db, packetId, error.message);
      return { state: "failed" };
    }
    throw error;
  }
  const extension = file.fileName.slice(file.fileName.lastIndexOf("."));
  const fileKey = `accounts/${accountId}/packets/${packetId}${extension}`;
  await putObject({ key: fileKey, body: file.body, contentType: file.contentType });
  const sentTo = (packet.sentTo as string[] | null) ?? null;
  if (sentTo && !packet.sentAt) {
    await db.update(packets).set({ state: "sending" }).where(eq(packets.id, packetId));
    const message = packetMessage({
      accountName: request.accountName ?? "Your builder",
      senderName: request.senderName ?? "Someone",
      communityName: community.name,
      kind: packet.kind,
      fileName: file.fileName,
      lotCount: file.lotCount,
    });
    await sendMail({
      accountId,
      to: sentTo,
      subject: message.subject,
      text: message.text,
      messageId: `<packet-${packetId}.${accountId}@platload.local>`,
      attachments: [
        { filename: file.fileName, content: Buffer.from(file.body), contentType: file.contentType },
      ],
    });
    await db.update(packets).set({ sentAt: new Date() }).where(eq(packets.id, packetId));
  }
  const summary = sentTo
    ? `Sent ${PACKET_KIND_LABELS[packet.kind].toLowerCase()} of ${community.name} (${file.lotCount} lots) to ${sentTo.join(", ")}`
    : `Permit packet of ${community.name}: ${file.lotCount} lot${file.lotCount === 1 ? "" : "s"} (${file.fileName})`;
  const finished = await db.transaction(async (tx) => {
    const [row] = await tx
      .select({ state: packets.state })
      .from(packets)
      .where(eq(packets.id, packetId))
      .for("update");
    if (!row || FINISHED_PACKET.includes(row.state)) return false;
    await tx
      .update(packets)
      .set({
        state: "ready",
        fileName: file.fileName,
        fileKey,
        contentType: file.contentType,
        sizeBytes: file.body.byteLength,
        lotCount: file.lotCount,
        error: null,
        finishedAt: new Date(),
      })
      .where(eq(packets.id, packetId));
    await recordAudit(tx, {
      accountId,
      userId: packet.createdByUserId,
      action: sentTo ? "packet_send" : "packet_generate",
      entityType: "packet",
      entityId: packetId,
      summary,
      after: {
        kind: packet.kind,
        fileName: file.fileName,
        sizeBytes: file.body.byteLength,
        lotCount: file.lotCount,
        sentTo,
        communityId,
      },
    });
    return true;
  });
  return { state: finished ? "ready" : "already-finished" };
}

/** How far a packet has got, for the page that asked for it. */
export async function getPacketStatus({
  db,
  accountId,
  packetId,
}: {
  db: Database;
  accountId: number;
  packetId: number;
}) {
  const [packet] = await db
    .select()
    .from(packets)
    .where(and(eq(packets.id, packetId), eq(packets.accountId, accountId)));
  if (!packet) throw notFound("That packet");
  return {
    id: packet.id,
    kind: packet.kind,
    state: packet.state,
    fileName: packet.fileName,
    lotCount: packet.lotCount,
    sizeBytes: packet.sizeBytes,
    sentTo: (packet.sentTo as string[] | null) ?? null,
    error: packet.error,
  };
}

/** Packets not finished that were asked for before `before` (their job may have been lost). */
export async function unfinishedPackets(db: Database, before: Date) {
  return db
    .select({ id: packets.id, createdAt: packets.createdAt })
    .from(packets)
    .where(and(inArray(packets.state, ["queued", "rendering", "sending"]), lt(packets.createdAt, before)));
}

/** The stored files of a community, newest first, with who made them and when. */
export async function listPackets({
  db,
  accountId,
  communityId,
}: {
  db: Database;
  accountId: number;
  communityId: number;
}) {
  await communityOf(db, accountId, communityId);
  const rows = await db
    .select({
      id: packets.id,
      kind: packets.kind,
      fileName: packets.fileName,
      contentType: packets.contentType,
      sizeBytes: packets.sizeBytes,
      lotCount: packets.lotCount,
      sentTo: packets.sentTo,
      state: packets.state,
      error: packets.error,
      createdAt: packets.createdAt,
      createdByName: users.name,
    })
    .from(packets)
    .innerJoin(users, eq(users.id, packets.createdByUserId))
    .where(and(eq(packets.accountId, accountId), eq(packets.communityId, communityId)))
    .orderBy(desc(packets.createdAt), desc(packets.id));
  return rows.map((row) => ({
    ...row,
    sentTo: (row.sentTo as string[] | null) ?? null,
    createdAt: row.createdAt.toISOString(),
  }));
}

/** A stored file's bytes; a packet of another account is not found. */
export async function getPacketFile({
  db,
  accountId,
  packetId,
}: {
  db: Database;
  accountId: number;
  packetId: number;
}) {
  const [packet] = await db
    .select()
    .from(packets)
    .where(and(eq(packets.id, packetId), eq(packets.accountId, accountId)));
  if (!packet) throw notFound("That packet");
  if (packet.state !== "ready" || !packet.fileKey) {
    throw new AppError(
      "conflict",
      packet.state === "failed"
        ? `This file could not be made: ${packet.error ?? "see the list of kept files"}.`
        : "This file is still being made; it opens here when it is ready.",
    );
  }
  return { packet, body: await getObject(packet.fileKey) };
}

// ---------------------------------------------------------------------------------------------
// Sending by e-mail.

/** The message sent with a file: our own wording, the community, what is attached, the caution. */
export function packetMessage({
  accountName,
  senderName,
  communityName,
  kind,
  fileName,
  lotCount,
}: {
  accountName: string;
  senderName: string;
  communityName: string;
  kind: PacketKind;
  fileName: string;
  lotCount: number;
}) {
  const what = PACKET_KIND_LABELS[kind];
  return {
    subject: `${accountName}: ${what.replace(/ \(.*\)$/, "").toLowerCase()} for ${communityName}`,
    text: [
      "Hello,",
      "",
      `${senderName} of ${accountName} sent you the ${what.replace(/ \(.*\)$/, "").toLowerCase()} for the community ${communityName}.`,
      "",
      `Attached: ${fileName} — ${what}, ${lotCount} lot${lotCount === 1 ? "" : "s"}.`,
      "",
      "Caution: the loads and equipment sizes in this file are design estimates, by the handbook's published residential load-factor procedure as implemented in Platload or by Platload's own hourly method (the file names which); neither is a certified implementation or any standard's approved procedure. Local codes and a licensed professional's review govern.",
      "",
      "Sent from Platload.",
    ].join("\n"),
  };
}

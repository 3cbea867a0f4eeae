import "server-only";
import { and, count, eq, isNotNull } from "drizzle-orm";
import type { Database } from "@/db";
import { accounts, lots } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { AppError, notFound } from "@/lib/errors";
import { LOAD_PROCEDURE_LABELS, LOAD_PROCEDURES, type LoadProcedure } from "@/lib/load";
import { recomputeLots } from "../recompute";

/** The account's load procedure, the choices with their labels, and how many lots are frozen with a procedure of their own. */
export async function getLoadProcedure({ db, accountId }: { db: Database; accountId: number }) {
  const [account] = await db
    .select({ procedure: accounts.loadProcedure })
    .from(accounts)
    .where(eq(accounts.id, accountId));
  if (!account) throw notFound("That account");
  const [{ frozen }] = await db
    .select({ frozen: count() })
    .from(lots)
    .where(and(eq(lots.accountId, accountId), isNotNull(lots.permitSnapshot)));
  return {
    procedure: account.procedure,
    choices: LOAD_PROCEDURES.map((procedure) => ({ procedure, label: LOAD_PROCEDURE_LABELS[procedure] })),
    frozenLots: frozen,
  };
}

/**
 * An admin picks the procedure that sizes equipment and goes on the permit papers. Every lot of
 * the account is recomputed by it in the same transaction, with its equipment reselected; lots
 * frozen for permit keep their snapshot (its procedure included). One history entry. `from` is
 * the procedure the admin saw: when another admin changed it since, nothing is written.
 */
export async function setLoadProcedure({
  db,
  accountId,
  userId,
  procedure,
  from,
}: {
  db: Database;
  accountId: number;
  userId: number;
  procedure: LoadProcedure;
  from: LoadProcedure;
}) {
  return db.transaction(async (tx) => {
    const [account] = await tx
      .select({ procedure: accounts.loadProcedure })
      .from(accounts)
      .where(eq(accounts.id, accountId))
      .for("update");
    if (!account) throw notFound("That account");
    if (account.procedure !== from) {
      throw new AppError(
        "conflict",
        `The load procedure was changed by someone else since you loaded it (it is now ${LOAD_PROCEDURE_LABELS[account.procedure]}). Nothing was saved; reload to see it.`,
      );
    }
    if (account.procedure === procedure)
      return { procedure, changed: false, lotsRecomputed: 0, lotsChanged: 0 };
    await tx.update(accounts).set({ loadProcedure: procedure }).where(eq(accounts.id, accountId));
    const recomputed = await recomputeLots(tx, { accountId });
    await recordAudit(tx, {
      accountId,
      userId,
      action: "load_procedure",
      entityType: "account",
      entityId: accountId,
      summary: `Load procedure changed from ${LOAD_PROCEDURE_LABELS[account.procedure]} to ${LOAD_PROCEDURE_LABELS[procedure]}; ${recomputed.recomputed} lots recomputed (lots frozen for permit keep their snapshot)`,
      before: { procedure: account.procedure },
      after: { procedure, lotsRecomputed: recomputed.recomputed, lotsChanged: recomputed.changed },
    });
    return {
      procedure,
      changed: true,
      lotsRecomputed: recomputed.recomputed,
      lotsChanged: recomputed.changed,
    };
  });
}

import "server-only";
import { randomUUID } from "node:crypto";
import { and, asc, eq, lte, sql } from "drizzle-orm";
import { getDb, type Tx } from "@/db/client";
import { orders, refunds, type OrderRow, type RefundRow } from "@/db/schema";
import { enqueueEmail, withOutbox, type OutboxMessage } from "@/lib/mail/commands/outbox";
import { recordOrderEvent, SYSTEM_ACTOR } from "@/lib/orders/commands";
import { formatUsd } from "../money";
import { formatOrderNumber } from "../order-number";
import { getPayments } from "../payments";
import { classifyRefundError, nextRefundAttemptAt, REFUND_CLAIM_LEASE_MS, type RefundErrorVerdict } from "../refund-rules";

// Money going back, in three steps, so the payment service is never called inside a database
// transaction and a crash anywhere neither loses a refund nor makes it twice:
// 1. requestRefund writes the refund as "requested", with its idempotency key, in the
//    transaction that decides it (an admin's cancel, a late payment);
// 2. after that commits, settleRefund claims the row (a lease, so only one caller at a time),
//    calls the service with the key, and
// 3. records the answer in a follow-up that changes only a still-requested row, so repeating it
//    is harmless; the buyer's message is queued there, once the money has moved.
// A crash after 1 leaves a requested row; a crash after 2 leaves one the service already acted
// on. Either way retryRequestedRefunds, run every minute by the background jobs, calls again
// once the lease is over, and the service answers a repeated key with the refund it already
// made (idempotent requests keep their answer for 24 hours).

export type RefundCause = RefundRow["cause"];

export type RefundIntent = {
  order: Pick<OrderRow, "id">;
  paymentIntentId: string;
  amountCents: number;
  cause: RefundCause;
  reason: string;
  actorId?: string | null;
  restocked?: boolean;
  /** One key per refund decision; given when the cause has its own (one automatic refund per order). */
  idempotencyKey?: string;
};

/** Step 1, in the caller's transaction. A second request under the same key returns the first. */
export async function requestRefund(tx: Tx, intent: RefundIntent): Promise<RefundRow> {
  const id = randomUUID();
  const idempotencyKey = intent.idempotencyKey ?? `refund-${id}`;
  const [row] = await tx
    .insert(refunds)
    .values({
      id,
      orderId: intent.order.id,
      paymentIntentId: intent.paymentIntentId,
      amountCents: intent.amountCents,
      cause: intent.cause,
      reason: intent.reason,
      actorId: intent.actorId ?? null,
      restocked: intent.restocked ?? false,
      status: "requested",
      idempotencyKey,
      // The app's clock, which settleRefund's claim compares with, not the database's.
      nextAttemptAt: new Date(),
    })
    .onConflictDoNothing({ target: refunds.idempotencyKey })
    .returning();
  if (row) return row;
  const [existing] = await tx.select().from(refunds).where(eq(refunds.idempotencyKey, idempotencyKey));
  if (!existing) throw new Error(`refund ${idempotencyKey} vanished`);
  return existing;
}

/** Step 2a: takes a requested refund for one call, or null when it is settled or someone else holds it. */
export async function claimRefund({ id, now = new Date() }: { id: string; now?: Date }): Promise<RefundRow | null> {
  const db = await getDb();
  const [row] = await db
    .update(refunds)
    .set({ attempts: sql`${refunds.attempts} + 1`, nextAttemptAt: new Date(now.getTime() + REFUND_CLAIM_LEASE_MS) })
    .where(and(eq(refunds.id, id), eq(refunds.status, "requested"), lte(refunds.nextAttemptAt, now)))
    .returning();
  return row ?? null;
}

export type RefundAnswer = { ok: true; providerRefundId: string } | { ok: false; verdict: RefundErrorVerdict; message: string };

function describe(error: unknown): string {
  if (error instanceof Error) {
    const code = (error as { code?: unknown }).code;
    return `${error.name}${typeof code === "string" ? ` (${code})` : ""}: ${error.message}`;
  }
  return String(error);
}

/** Step 2b: the call, outside any transaction, under the refund's own idempotency key. */
export async function submitRefund(row: RefundRow): Promise<RefundAnswer> {
  if (!row.paymentIntentId) return { ok: false, verdict: "give-up", message: "There is no payment on record to refund." };
  try {
    const refund = await getPayments().refunds.create(
      {
        payment_intent: row.paymentIntentId,
        amount: row.amountCents,
        ...(row.cause === "automatic" ? { reason: "requested_by_customer" as const } : {}),
        metadata: { orderId: row.orderId, refundId: row.id },
      },
      { idempotencyKey: row.idempotencyKey },
    );
    return { ok: true, providerRefundId: refund.id };
  } catch (error) {
    return { ok: false, verdict: classifyRefundError(error), message: describe(error) };
  }
}

function refundMessage(order: OrderRow, refund: RefundRow & { providerRefundId: string }): OutboxMessage {
  const number = formatOrderNumber(order.number);
  if (refund.cause === "automatic") {
    return {
      dedupeKey: `payment-refunded:${order.id}`,
      kind: "payment-refunded",
      to: order.email,
      subject: `We refunded your payment for order ${number}`,
      payload: { orderId: order.id, why: refund.reason, amountCents: refund.amountCents },
    };
  }
  return {
    dedupeKey: `refund:${refund.providerRefundId}`,
    kind: "refund",
    to: order.email,
    subject: `A refund for order ${number}`,
    payload: { orderId: order.id, amountCents: refund.amountCents, cancelled: refund.cause === "cancel" },
  };
}

export type RefundOutcome = "succeeded" | "retrying" | "failed" | "already-recorded";

/** Step 3: records the service's answer. Only a still-requested row changes, so a repeat does nothing. */
export async function recordRefundOutcome({ row, answer, now = new Date() }: { row: RefundRow; answer: RefundAnswer; now?: Date }): Promise<RefundOutcome> {
  if (answer.ok) {
    return withOutbox(async (tx) => {
      const [done] = await tx
        .update(refunds)
        .set({ status: "succeeded", providerRefundId: answer.providerRefundId, confirmedAt: now, lastError: null })
        .where(and(eq(refunds.id, row.id), eq(refunds.status, "requested")))
        .returning();
      if (!done) return "already-recorded";
      const [order] = await tx.select().from(orders).where(eq(orders.id, done.orderId));
      if (order) await enqueueEmail(tx, refundMessage(order, { ...done, providerRefundId: answer.providerRefundId }));
      return "succeeded";
    });
  }
  const db = await getDb();
  if (answer.verdict === "retry") {
    await db
      .update(refunds)
      .set({ lastError: answer.message, nextAttemptAt: nextRefundAttemptAt({ attempts: row.attempts, now }) })
      .where(and(eq(refunds.id, row.id), eq(refunds.status, "requested"), eq(refunds.attempts, row.attempts)));
    console.warn(`refunds: the payment service did not take refund ${row.id} (attempt ${row.attempts}); trying again later`, answer.message);
    return "retrying";
  }
  return db.transaction(async (tx) => {
    const [failed] = await tx
      .update(refunds)
      .set({ status: "failed", lastError: answer.message })
      .where(and(eq(refunds.id, row.id), eq(refunds.status, "requested")))
      .returning();
    if (!failed) return "already-recorded";
    const [order] = await tx.select().from(orders).where(eq(orders.id, failed.orderId));
    if (order) {
      // The amount was counted as refunded when the refund was decided; it did not go back.
      const set = failed.cause === "automatic" ? undefined : { refundedCents: Math.max(0, order.refundedCents - failed.amountCents) };
      const note = `The payment service refused the refund of ${formatUsd(failed.amountCents)} (${answer.message}); nothing went back. Refund it from the payment service's dashboard.`;
      await recordOrderEvent(tx, { order, actor: SYSTEM_ACTOR, note, set });
    }
    console.error(`refunds: the payment service refused refund ${row.id}`, answer.message);
    return "failed";
  });
}

/** Steps 2 and 3 for one refund: right after the deciding transaction commits, and from the sweeper. */
export async function settleRefund({ id, now = new Date() }: { id: string; now?: Date }): Promise<RefundOutcome | "skipped"> {
  const row = await claimRefund({ id, now });
  if (!row) return "skipped";
  return recordRefundOutcome({ row, answer: await submitRefund(row), now });
}

export type RefundSweep = Record<RefundOutcome | "skipped", number>;

/**
 * The sweeper: every requested refund whose lease or backoff is over is called for again. Safe
 * from several app instances at once (the claim) and after any crash (the idempotency key).
 */
export async function retryRequestedRefunds({ now = new Date(), limit = 25 }: { now?: Date; limit?: number } = {}): Promise<RefundSweep> {
  const db = await getDb();
  const due = await db
    .select({ id: refunds.id })
    .from(refunds)
    .where(and(eq(refunds.status, "requested"), lte(refunds.nextAttemptAt, now)))
    .orderBy(asc(refunds.nextAttemptAt))
    .limit(limit);
  const report: RefundSweep = { succeeded: 0, retrying: 0, failed: 0, "already-recorded": 0, skipped: 0 };
  for (const { id } of due) report[await settleRefund({ id, now })] += 1;
  return report;
}

import "server-only";
import { and, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { orderEvents, orders, refunds } from "@/db/schema";
import { AppError } from "@/lib/http/errors";
import { enqueueEmail } from "@/lib/mail/outbox";
import { formatOrderNumber } from "./order-number";
import { releaseLines } from "./orders";
import { getPayments } from "./payments";

// States whose houses have not left the building: their stock may go back on the shelf.
const UNSHIPPED = new Set(["paid", "packing", "packed", "ready_for_pickup"]);

/**
 * Refunds all or part of a paid order through the payments SDK, records it, and optionally puts
 * the houses back in stock (only while they have not shipped). A full refund of an unshipped
 * order ends it as "refunded"; a shipped order keeps its state and shows the refund.
 */
export async function refundOrder({
  orderId,
  amountCents,
  restock,
  reason,
  actorId,
  cancel = false,
}: {
  orderId: string;
  /** Omit for the whole remaining amount. */
  amountCents?: number;
  restock: boolean;
  reason: string;
  actorId: string;
  /** Cancelling an unshipped order: full refund, stock back, state "cancelled". */
  cancel?: boolean;
}) {
  const db = await getDb();
  const [order] = await db.select().from(orders).where(eq(orders.id, orderId));
  if (!order) throw new AppError("not_found", "No order has that id.");
  if (!order.paymentIntentId || order.status === "pending_payment" || order.status === "expired") {
    throw new AppError("conflict", "This order was never paid, so there is nothing to refund.");
  }
  const remaining = order.totalCents - order.refundedCents;
  const amount = cancel ? remaining : (amountCents ?? remaining);
  if (remaining <= 0) throw new AppError("conflict", "This order has already been refunded in full.");
  if (!Number.isInteger(amount) || amount < 1 || amount > remaining) {
    throw new AppError("bad_request", `Refund between $0.01 and ${(remaining / 100).toFixed(2)}.`, { amountCents: "Out of range." });
  }
  const unshipped = UNSHIPPED.has(order.status);
  if (cancel && !unshipped) throw new AppError("conflict", "Only an order that has not shipped or been picked up can be cancelled.");
  if (restock && !unshipped) throw new AppError("conflict", "The houses have left the building; refund without returning stock.");

  const refund = await getPayments().refunds.create(
    { payment_intent: order.paymentIntentId, amount, metadata: { orderId: order.id } },
    // One key per refund step: a retried click cannot refund twice.
    { idempotencyKey: `refund-${order.id}-${order.refundedCents}-${amount}` },
  );
  const full = amount === remaining;
  const nextStatus = cancel ? "cancelled" : full && unshipped ? "refunded" : order.status;
  return db.transaction(async (tx) => {
    const [updated] = await tx
      .update(orders)
      .set({ refundedCents: order.refundedCents + amount, status: nextStatus, version: order.version + 1 })
      .where(and(eq(orders.id, order.id), eq(orders.refundedCents, order.refundedCents)))
      .returning();
    if (!updated) throw new AppError("conflict", "Someone else changed this order at the same moment; reload and try again.");
    await tx.insert(refunds).values({ orderId: order.id, providerRefundId: refund.id, amountCents: amount, reason, restocked: restock || cancel, actorId }).onConflictDoNothing();
    if (restock || cancel) await releaseLines(tx, order.id, cancel ? "Order cancelled" : "Refunded and returned to stock", actorId);
    await tx.insert(orderEvents).values({
      orderId: order.id,
      fromStatus: order.status,
      toStatus: nextStatus,
      actorId,
      note: `${cancel ? "Cancelled and refunded" : "Refunded"} $${(amount / 100).toFixed(2)}${reason ? `: ${reason}` : ""}`,
    });
    await enqueueEmail(tx, {
      dedupeKey: `refund:${refund.id}`,
      kind: "refund",
      to: order.email,
      subject: `A refund for order ${formatOrderNumber(order.number)}`,
      payload: { orderId: order.id, amountCents: amount, cancelled: cancel },
    });
    return updated;
  });
}

import "server-only";
import { eq, or } from "drizzle-orm";
import type Stripe from "stripe";
import type { Tx } from "@/db/client";
import { gifts, orderLines, orders, webhookEvents, type OrderRow } from "@/db/schema";
import { onInvoicePaid, onInvoicePaymentFailed, onSubscriptionDeleted } from "@/lib/giving/commands/invoice-events";
import { queueTributeNotice } from "@/lib/giving/commands/once";
import { isMonthlyGiftCustomer } from "@/lib/giving/queries";
import { AppError } from "@/lib/http/errors";
import { withOutbox } from "@/lib/mail/commands/outbox";
import { changeOrderStatus, recordOrderEvent, SYSTEM_ACTOR } from "@/lib/orders/commands";
import { TransitionRefused } from "@/lib/orders/refusals";
import { moveStock } from "@/lib/stock/commands";
import { formatOrderNumber } from "../order-number";
import { releaseLines } from "./orders";
import { requestRefund, settleRefund } from "./refunds";

// The payment service's events. Each is processed exactly once: the event id is recorded in the
// same transaction as its effects, so a repeated or concurrent delivery finds it and does
// nothing. The order becomes paid only through changeOrderStatus, so the state machine decides:
// an order whose checkout expired, or that is already paid, cancelled or refunded, is not paid
// again. Such an event is still answered 2xx (the service stops retrying) and recorded with its
// outcome; a payment for an order that never took one is refunded, after the commit.

/** The order a payment event is about is not visible yet: answer non-2xx so the sender retries. */
export class RetryLater extends Error {
  override name = "RetryLater";
}

type Effects = { outcome: string; refundIds: string[] };

async function findOrder(tx: Tx, intent: Stripe.PaymentIntent): Promise<OrderRow | undefined> {
  const orderId = intent.metadata?.orderId;
  const byId = orderId && /^[0-9a-f-]{36}$/i.test(orderId) ? eq(orders.id, orderId) : undefined;
  const [row] = await tx
    .select()
    .from(orders)
    .where(byId ? or(eq(orders.paymentIntentId, intent.id), byId) : eq(orders.paymentIntentId, intent.id))
    .limit(1);
  return row;
}

/**
 * Money arrived for an order that will not be paid. If the order never took a payment (its
 * checkout expired, or it was closed for a wrong amount), the payment goes back: the refund is
 * written here and made after the commit. One automatic refund per order (its idempotency key).
 */
async function returnPayment(tx: Tx, order: OrderRow, intent: Stripe.PaymentIntent, why: string): Promise<Effects | null> {
  if (order.paidAt) return null;
  const refund = await requestRefund(tx, {
    order,
    paymentIntentId: intent.id,
    amountCents: intent.amount,
    cause: "automatic",
    reason: why,
    idempotencyKey: `auto-refund-${order.id}`,
  });
  await recordOrderEvent(tx, { order, actor: SYSTEM_ACTOR, note: `Payment of $${(intent.amount / 100).toFixed(2)} refunded automatically: ${why}` });
  return { outcome: "refunded-late-payment", refundIds: [refund.id] };
}

/** Closes a checkout whose payment cannot be kept (wrong amount, houses gone) and returns the money. */
async function closeAndReturn(tx: Tx, order: OrderRow, intent: Stripe.PaymentIntent, why: string): Promise<Effects> {
  const { order: cancelled } = await changeOrderStatus(tx, {
    order,
    to: "cancelled",
    actor: SYSTEM_ACTOR,
    note: `Closed: ${why}`,
    set: { stockHeld: false },
  });
  if (order.stockHeld) await releaseLines(tx, order.id, "Checkout closed: the payment could not be kept");
  const returned = await returnPayment(tx, cancelled, intent, why);
  return returned ?? { outcome: "cancelled", refundIds: [] };
}

function whyRefused(order: OrderRow): string {
  return order.status === "expired"
    ? "the payment arrived after the 30-minute hold ran out"
    : `the order was already ${order.status.replace(/_/g, " ")} when the payment arrived`;
}

/** A monthly gift's invoice payment: its gift is recorded on invoice.paid, not on the intent. */
async function isInvoicePayment(tx: Tx, intent: Stripe.PaymentIntent): Promise<boolean> {
  const customer = typeof intent.customer === "string" ? intent.customer : intent.customer?.id;
  return Boolean(customer && !intent.metadata?.orderId && (await isMonthlyGiftCustomer(customer, tx)));
}

async function onSucceeded(tx: Tx, intent: Stripe.PaymentIntent): Promise<Effects> {
  if (await isInvoicePayment(tx, intent)) return { outcome: "ignored: a monthly gift's invoice payment (recorded on invoice.paid)", refundIds: [] };
  const order = await findOrder(tx, intent);
  if (!order) throw new RetryLater(`no order for ${intent.id} yet`);
  if (order.status === "pending_payment" && intent.amount !== order.totalCents) {
    return closeAndReturn(tx, order, intent, "the amount paid did not match the order");
  }
  const lines = await tx.select().from(orderLines).where(eq(orderLines.orderId, order.id));
  const paidAt = new Date();
  try {
    // One savepoint for the status and the stock: if the houses are gone, neither happened.
    await tx.transaction(async (sp) => {
      await changeOrderStatus(sp, {
        order,
        to: "paid",
        actor: SYSTEM_ACTOR,
        note: "Payment received",
        set: { paidAt, stockHeld: false, paymentIntentId: intent.id },
      });
      // A failed attempt gave the stock back: take it again, or refund.
      if (!order.stockHeld) {
        for (const line of lines) {
          await moveStock(sp, { modelId: line.modelId, kind: "reserved", delta: -line.quantity, orderId: order.id, reason: "Held again when the payment arrived" });
        }
      }
    });
  } catch (error) {
    if (error instanceof TransitionRefused) {
      // The state machine says no: an expired checkout, or an order already paid, cancelled or
      // refunded. Nothing about the order changes; money it never took goes back.
      const returned = await returnPayment(tx, order, intent, whyRefused(order));
      return returned ?? { outcome: `refused: order is ${order.status} (${error.refusal})`, refundIds: [] };
    }
    if (error instanceof AppError && error.code === "out_of_stock") {
      return closeAndReturn(tx, order, intent, "the houses sold out before the payment arrived");
    }
    throw error;
  }
  for (const line of lines) {
    await moveStock(tx, { modelId: line.modelId, kind: "sold", delta: 0, orderId: order.id, reason: `Sold with order ${formatOrderNumber(order.number)}` });
  }
  if (order.giftCents > 0) {
    await tx
      .insert(gifts)
      .values({ orderId: order.id, userId: order.userId, email: order.email, amountCents: order.giftCents, receivedAt: paidAt })
      .onConflictDoNothing();
    await queueTributeNotice(tx, order);
  }
  return { outcome: "paid", refundIds: [] };
}

async function onFailed(tx: Tx, intent: Stripe.PaymentIntent): Promise<Effects> {
  if (await isInvoicePayment(tx, intent)) return { outcome: "ignored: a monthly gift's invoice payment (handled on invoice.payment_failed)", refundIds: [] };
  const order = await findOrder(tx, intent);
  if (!order) throw new RetryLater(`no order for ${intent.id} yet`);
  if (order.status !== "pending_payment") return { outcome: `ignored: order is ${order.status}`, refundIds: [] };
  const message = intent.last_payment_error?.message ?? "The payment did not go through.";
  // The version bump in recordOrderEvent is the claim: a sweeper or a second delivery that read
  // the order before this loses, so the stock goes back once.
  await recordOrderEvent(tx, { order, actor: SYSTEM_ACTOR, note: `Payment attempt failed: ${message}`, set: { stockHeld: false } });
  if (order.stockHeld) await releaseLines(tx, order.id, "Payment attempt failed");
  return { outcome: order.stockHeld ? "stock-released" : "nothing-held", refundIds: [] };
}

/**
 * Processes one verified event exactly once, then makes any refund it decided (after the commit,
 * never inside it; a refund the service does not take now is retried by the sweeper).
 */
export async function processPaymentEvent(event: Stripe.Event): Promise<{ outcome: string; duplicate: boolean }> {
  const result = await withOutbox(async (tx) => {
    const [fresh] = await tx.insert(webhookEvents).values({ id: event.id, type: event.type }).onConflictDoNothing().returning();
    if (!fresh) return { outcome: "duplicate", duplicate: true, refundIds: [] as string[] };
    let effects: Effects = { outcome: "recorded", refundIds: [] };
    if (event.type === "payment_intent.succeeded") effects = await onSucceeded(tx, event.data.object);
    else if (event.type === "payment_intent.payment_failed") effects = await onFailed(tx, event.data.object);
    // Monthly gifts (lib/giving): each paid invoice is a gift; a failed renewal asks for a new card.
    else if (event.type === "invoice.paid") effects = { outcome: await onInvoicePaid(tx, event.data.object), refundIds: [] };
    else if (event.type === "invoice.payment_failed") effects = { outcome: await onInvoicePaymentFailed(tx, event.data.object), refundIds: [] };
    else if (event.type === "customer.subscription.deleted") effects = { outcome: await onSubscriptionDeleted(tx, event.data.object), refundIds: [] };
    await tx
      .update(webhookEvents)
      .set({ processedAt: new Date(), outcome: effects.outcome })
      .where(eq(webhookEvents.id, event.id));
    return { ...effects, duplicate: false };
  });
  for (const id of result.refundIds) {
    try {
      await settleRefund({ id });
    } catch (error) {
      console.error(`refunds: settling ${id} after the webhook failed; the sweeper retries it`, error);
    }
  }
  return { outcome: result.outcome, duplicate: result.duplicate };
}

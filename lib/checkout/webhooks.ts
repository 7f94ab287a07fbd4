import "server-only";
import { eq, or, sql } from "drizzle-orm";
import type Stripe from "stripe";
import { getDb, type Tx } from "@/db/client";
import { gifts, orderEvents, orderLines, orders, refunds, webhookEvents, type OrderRow } from "@/db/schema";
import { AppError } from "@/lib/http/errors";
import { enqueueEmail } from "@/lib/mail/outbox";
import { moveStock } from "@/lib/stock/ledger";
import { formatOrderNumber } from "./order-number";
import { releaseLines } from "./orders";
import { getPayments } from "./payments";

/** The order a payment event is about is not visible yet: answer non-2xx so the sender retries. */
export class RetryLater extends Error {
  override name = "RetryLater";
}

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

function queuePaidMessages(tx: Tx, order: OrderRow, hasItems: boolean) {
  const number = formatOrderNumber(order.number);
  const messages = [
    enqueueEmail(tx, {
      dedupeKey: `order-confirmation:${order.id}`,
      kind: "order-confirmation",
      to: order.email,
      subject: hasItems ? `Your order ${number} is confirmed` : `Thank you for your gift (${number})`,
      payload: { orderId: order.id },
    }),
  ];
  if (hasItems) {
    messages.push(
      enqueueEmail(tx, {
        dedupeKey: `install-guide:paid:${order.id}`,
        kind: "install-guide",
        to: order.email,
        subject: `Your install guide for order ${number}`,
        payload: { orderId: order.id, occasion: "paid" },
      }),
    );
  }
  if (order.giftCents > 0) {
    messages.push(
      enqueueEmail(tx, {
        dedupeKey: `gift-receipt:${order.id}`,
        kind: "gift-receipt",
        to: order.email,
        subject: `Your gift receipt from Cedar Hollow Wildlife Rescue (${number})`,
        payload: { orderId: order.id },
      }),
    );
  }
  return Promise.all(messages);
}

async function refundLatePayment(tx: Tx, order: OrderRow, intent: Stripe.PaymentIntent, why: string): Promise<string> {
  const refund = await getPayments().refunds.create(
    { payment_intent: intent.id, reason: "requested_by_customer", metadata: { orderId: order.id, why } },
    { idempotencyKey: `auto-refund-${order.id}` },
  );
  await tx
    .update(orders)
    .set({ status: "refunded", refundedCents: intent.amount <= order.totalCents ? intent.amount : order.totalCents, stockHeld: false })
    .where(eq(orders.id, order.id));
  await tx.insert(refunds).values({ orderId: order.id, providerRefundId: refund.id, amountCents: Math.min(intent.amount, order.totalCents), reason: why }).onConflictDoNothing();
  await tx.insert(orderEvents).values({ orderId: order.id, fromStatus: order.status, toStatus: "refunded", note: `Refunded automatically: ${why}` });
  await enqueueEmail(tx, {
    dedupeKey: `payment-refunded:${order.id}`,
    kind: "payment-refunded",
    to: order.email,
    subject: `We refunded your payment for order ${formatOrderNumber(order.number)}`,
    payload: { orderId: order.id, why },
  });
  return "refunded-late-payment";
}

async function onSucceeded(tx: Tx, intent: Stripe.PaymentIntent): Promise<string> {
  const order = await findOrder(tx, intent);
  if (!order) throw new RetryLater(`no order for ${intent.id} yet`);
  if (order.status !== "pending_payment" && order.status !== "expired") return `ignored: order is ${order.status}`;
  if (intent.amount !== order.totalCents) {
    return refundLatePayment(tx, order, intent, "the amount paid did not match the order");
  }
  const lines = await tx.select().from(orderLines).where(eq(orderLines.orderId, order.id));
  if (!order.stockHeld && lines.length > 0) {
    // A failed attempt or the 30-minute expiry gave the stock back: take it again, or refund.
    try {
      await tx.transaction(async (sp) => {
        for (const line of lines) {
          await moveStock(sp, { modelId: line.modelId, kind: "reserved", delta: -line.quantity, orderId: order.id, reason: "Held again when the payment arrived" });
        }
      });
    } catch (error) {
      if (error instanceof AppError && error.code === "out_of_stock") {
        return refundLatePayment(tx, order, intent, "the houses sold out before the payment arrived");
      }
      throw error;
    }
  }
  const paidAt = new Date();
  await tx.update(orders).set({ status: "paid", paidAt, stockHeld: false, paymentIntentId: intent.id }).where(eq(orders.id, order.id));
  for (const line of lines) {
    await moveStock(tx, { modelId: line.modelId, kind: "sold", delta: 0, orderId: order.id, reason: `Sold with order ${formatOrderNumber(order.number)}` });
  }
  if (order.giftCents > 0) {
    await tx
      .insert(gifts)
      .values({ orderId: order.id, userId: order.userId, email: order.email, amountCents: order.giftCents, receivedAt: paidAt })
      .onConflictDoNothing();
  }
  await tx.insert(orderEvents).values({ orderId: order.id, fromStatus: order.status, toStatus: "paid", note: "Payment received" });
  await queuePaidMessages(tx, order, lines.length > 0);
  return "paid";
}

async function onFailed(tx: Tx, intent: Stripe.PaymentIntent): Promise<string> {
  const order = await findOrder(tx, intent);
  if (!order) throw new RetryLater(`no order for ${intent.id} yet`);
  if (order.status !== "pending_payment") return `ignored: order is ${order.status}`;
  const [claimed] = await tx
    .update(orders)
    .set({ stockHeld: false })
    .where(sql`${orders.id} = ${order.id} and ${orders.stockHeld} = true and ${orders.status} = 'pending_payment'`)
    .returning({ id: orders.id });
  if (claimed) await releaseLines(tx, order.id, "Payment attempt failed");
  const message = intent.last_payment_error?.message ?? "The payment did not go through.";
  await tx.insert(orderEvents).values({ orderId: order.id, fromStatus: "pending_payment", toStatus: "pending_payment", note: `Payment attempt failed: ${message}` });
  return claimed ? "stock-released" : "nothing-held";
}

/**
 * Processes one verified event exactly once: the event id is recorded in the same transaction as
 * its effects, so a repeated or concurrent delivery finds it and does nothing.
 */
export async function processPaymentEvent(event: Stripe.Event): Promise<{ outcome: string; duplicate: boolean }> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [fresh] = await tx.insert(webhookEvents).values({ id: event.id, type: event.type }).onConflictDoNothing().returning();
    if (!fresh) return { outcome: "duplicate", duplicate: true };
    let outcome = "recorded";
    if (event.type === "payment_intent.succeeded") outcome = await onSucceeded(tx, event.data.object);
    else if (event.type === "payment_intent.payment_failed") outcome = await onFailed(tx, event.data.object);
    await tx.update(webhookEvents).set({ processedAt: new Date(), outcome }).where(eq(webhookEvents.id, event.id));
    return { outcome, duplicate: false };
  });
}

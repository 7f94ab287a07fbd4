import "server-only";
import { randomBytes } from "node:crypto";
import { and, eq, ne } from "drizzle-orm";
import type Stripe from "stripe";
import type { Tx } from "@/db/client";
import { gifts, monthlyGifts } from "@/db/schema";
import { env } from "@/lib/config/env";
import { enqueueEmail } from "@/lib/mail/commands/outbox";
import { changeOrderStatus, openOrder, SYSTEM_ACTOR } from "@/lib/orders/commands";
import { managePath } from "../manage-link";
import { findMonthlyGiftBySubscription } from "../queries";
import { monthlyChangedMessage } from "./monthly";

// The payment service's invoice and subscription events for monthly gifts, run inside the
// webhook's transaction (lib/checkout/commands/webhooks.ts), which has already recorded the
// event id: a repeated delivery never gets here. Each paid invoice becomes its own paid order
// (no goods) and gift, so it has its own receipt (PRODUCT.md §6, each payment is its own
// contribution); gifts.invoice_id is unique, a second guard should two events name one invoice.

function subscriptionOf(invoice: Stripe.Invoice): string | null {
  const sub = invoice.parent?.subscription_details?.subscription;
  if (!sub) return null;
  return typeof sub === "string" ? sub : sub.id;
}

function intentOf(invoice: Stripe.Invoice): string | null {
  const payment = invoice.payments?.data.find((p) => p.payment.type === "payment_intent")?.payment.payment_intent;
  if (!payment) return null;
  return typeof payment === "string" ? payment : payment.id;
}

export async function onInvoicePaid(tx: Tx, invoice: Stripe.Invoice): Promise<string> {
  const subscriptionId = subscriptionOf(invoice);
  const gift = subscriptionId ? await findMonthlyGiftBySubscription(subscriptionId, tx) : null;
  if (!gift) return "ignored: not a monthly gift's invoice";
  const [already] = await tx.select({ id: gifts.id }).from(gifts).where(eq(gifts.invoiceId, invoice.id));
  if (already) return "ignored: invoice already recorded";
  if (invoice.amount_paid <= 0) return "ignored: nothing paid";
  const paidAt = invoice.status_transitions?.paid_at ? new Date(invoice.status_transitions.paid_at * 1000) : new Date();
  const order = await openOrder(tx, {
    values: {
      userId: gift.userId,
      email: gift.email,
      name: gift.name,
      accessToken: randomBytes(24).toString("base64url"),
      method: "none",
      subtotalCents: 0,
      shippingCents: 0,
      taxCents: 0,
      giftCents: invoice.amount_paid,
      totalCents: invoice.amount_paid,
      paymentIntentId: intentOf(invoice),
    },
    actor: SYSTEM_ACTOR,
    note: `Monthly gift payment (invoice ${invoice.id})`,
  });
  await changeOrderStatus(tx, { order, to: "paid", actor: SYSTEM_ACTOR, note: "Monthly gift received", set: { paidAt } });
  await tx.insert(gifts).values({
    orderId: order.id,
    userId: gift.userId,
    email: gift.email,
    amountCents: invoice.amount_paid,
    receivedAt: paidAt,
    invoiceId: invoice.id,
    monthlyGiftId: gift.id,
  });
  await tx.update(monthlyGifts).set({ status: "active" }).where(and(eq(monthlyGifts.id, gift.id), ne(monthlyGifts.status, "stopped")));
  return `monthly gift recorded (order ${order.number})`;
}

export async function onInvoicePaymentFailed(tx: Tx, invoice: Stripe.Invoice): Promise<string> {
  const subscriptionId = subscriptionOf(invoice);
  const gift = subscriptionId ? await findMonthlyGiftBySubscription(subscriptionId, tx) : null;
  if (!gift) return "ignored: not a monthly gift's invoice";
  // A first payment that fails is seen by the donor in the browser, who tries another card there.
  if (invoice.billing_reason === "subscription_create") return "first payment failed (shown in the browser)";
  if (gift.status === "stopped") return "ignored: the monthly gift is stopped";
  await tx.update(monthlyGifts).set({ status: "past_due" }).where(eq(monthlyGifts.id, gift.id));
  await enqueueEmail(tx, {
    dedupeKey: `monthly-gift-failed:${invoice.id}:${invoice.attempt_count}`,
    kind: "monthly-gift-failed",
    to: gift.email,
    subject: "Your monthly gift did not go through: please update your card",
    payload: { monthlyGiftId: gift.id, amountCents: invoice.amount_due, managePath: managePath({ monthlyGiftId: gift.id, secret: env().NEXTAUTH_SECRET }) },
  });
  return "renewal failed: donor asked to update the card";
}

export async function onSubscriptionDeleted(tx: Tx, subscription: Stripe.Subscription): Promise<string> {
  const gift = await findMonthlyGiftBySubscription(subscription.id, tx);
  if (!gift) return "ignored: not a monthly gift";
  if (gift.status !== "stopped") {
    await tx.update(monthlyGifts).set({ status: "stopped", stoppedAt: new Date() }).where(eq(monthlyGifts.id, gift.id));
  }
  await enqueueEmail(tx, monthlyChangedMessage(gift, "stopped", `monthly-gift-stopped:${gift.id}`));
  return "monthly gift stopped";
}

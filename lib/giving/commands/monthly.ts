import "server-only";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import type Stripe from "stripe";
import { getDb } from "@/db/client";
import { giftDedications, monthlyGifts, type MonthlyGiftRow } from "@/db/schema";
import type { SessionUser } from "@/lib/auth/session";
import { getPayments } from "@/lib/checkout/payments";
import { env } from "@/lib/config/env";
import { AppError } from "@/lib/http/errors";
import { enqueueEmail, withOutbox } from "@/lib/mail/commands/outbox";
import { feeToCover } from "../fee";
import { isManageToken, managePath } from "../manage-link";
import type { z } from "zod";
import type { startMonthlySchema } from "../monthly-schemas";
import { paymentsAreLocal } from "../payments-mode";
import { findMonthlyGift, getGivingSettings } from "../queries";

// Monthly gifts through the payment service's subscriptions: a customer, a monthly price, and
// a subscription whose first invoice the donor pays in the browser with the same card form as a
// one-time gift. Each paid invoice is recorded by the webhook (./invoice-events.ts), never here.

export type MonthlyStarted = { monthlyGiftId: string; managePath: string; clientSecret: string; amountCents: number; feeCoveredCents: number };

const PRODUCT_NAME = "Monthly gift to the rescue";

function monthlyPrice(payments: Stripe, amountCents: number, monthlyGiftId: string) {
  return payments.prices.create({
    currency: "usd",
    unit_amount: amountCents,
    recurring: { interval: "month" },
    product_data: { name: PRODUCT_NAME },
    metadata: { monthlyGiftId },
  });
}

/** The secret the browser confirms to pay the subscription's open invoice (the first, or one that failed). */
export async function openInvoiceSecret(gift: MonthlyGiftRow): Promise<{ clientSecret: string; amountCents: number } | null> {
  const subscription = await getPayments().subscriptions.retrieve(gift.subscriptionId, { expand: ["latest_invoice.confirmation_secret"] });
  const invoice = subscription.latest_invoice;
  if (!invoice || typeof invoice === "string" || invoice.status !== "open") return null;
  const clientSecret = invoice.confirmation_secret?.client_secret;
  return clientSecret ? { clientSecret, amountCents: invoice.amount_due } : null;
}

export async function startMonthlyGift(input: z.infer<typeof startMonthlySchema>, user: SessionUser | null): Promise<MonthlyStarted> {
  const settings = await getGivingSettings();
  const feeCoveredCents = input.coverFee ? feeToCover({ giftCents: input.amountCents, basisPoints: settings.feeBasisPoints, fixedCents: settings.feeFixedCents }) : 0;
  const amountCents = input.amountCents + feeCoveredCents;
  const monthlyGiftId = randomUUID();
  const payments = getPayments();
  const idempotency = (step: string) => ({ idempotencyKey: `monthly-gift:${monthlyGiftId}:${step}` });
  const clock = paymentsAreLocal()
    ? await payments.testHelpers.testClocks.create({ frozen_time: Math.floor(Date.now() / 1000), name: `monthly gift ${monthlyGiftId}` }, idempotency("clock"))
    : null;
  const customer = await payments.customers.create(
    { email: input.contact.email, name: input.contact.name, metadata: { monthlyGiftId }, ...(clock ? { test_clock: clock.id } : {}) },
    idempotency("customer"),
  );
  const price = await monthlyPrice(payments, amountCents, monthlyGiftId);
  const subscription = await payments.subscriptions.create(
    {
      customer: customer.id,
      items: [{ price: price.id }],
      payment_behavior: "default_incomplete",
      payment_settings: { save_default_payment_method: "on_subscription" },
      metadata: { monthlyGiftId },
      expand: ["latest_invoice.confirmation_secret"],
    },
    idempotency("subscription"),
  );
  const invoice = subscription.latest_invoice;
  const clientSecret = invoice && typeof invoice !== "string" ? invoice.confirmation_secret?.client_secret : undefined;
  if (!clientSecret) throw new AppError("payment_failed", "The payment service did not open the first payment; please try again.");
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx.insert(monthlyGifts).values({
      id: monthlyGiftId,
      userId: user?.id ?? null,
      email: input.contact.email,
      name: input.contact.name,
      amountCents,
      customerId: customer.id,
      subscriptionId: subscription.id,
    });
    if (feeCoveredCents > 0) await tx.insert(giftDedications).values({ monthlyGiftId, feeCoveredCents });
  });
  return { monthlyGiftId, managePath: managePath({ monthlyGiftId, secret: env().NEXTAUTH_SECRET }), clientSecret, amountCents, feeCoveredCents };
}

/** The donor's own monthly gift: signed in as its donor, or holding its private link. Anyone else: not found. */
export async function monthlyGiftForDonor({ id, token, user }: { id: string; token?: string | null; user: SessionUser | null }): Promise<MonthlyGiftRow> {
  const gift = /^[0-9a-f-]{36}$/i.test(id) ? await findMonthlyGift(id) : null;
  const owns = gift && ((user && gift.userId === user.id) || isManageToken({ monthlyGiftId: gift.id, token, secret: env().NEXTAUTH_SECRET }));
  if (!gift || !owns) throw new AppError("not_found", "We could not find that monthly gift.");
  return gift;
}

function changedMessage(gift: MonthlyGiftRow, change: "amount" | "stopped", key: string) {
  return {
    dedupeKey: key,
    kind: "monthly-gift-changed" as const,
    to: gift.email,
    subject: change === "stopped" ? "Your monthly gift is stopped" : "Your monthly gift's new amount",
    payload: { monthlyGiftId: gift.id, change },
  };
}

/** A new monthly amount from the next payment on (no part-month charge). */
export async function changeMonthlyAmount({ gift, amountCents }: { gift: MonthlyGiftRow; amountCents: number }): Promise<MonthlyGiftRow> {
  if (gift.status === "stopped") throw new AppError("conflict", "This monthly gift is stopped; start a new one instead.");
  if (gift.status === "pending") throw new AppError("conflict", "The first payment has not gone through yet.");
  if (amountCents === gift.amountCents) return gift;
  const payments = getPayments();
  const subscription = await payments.subscriptions.retrieve(gift.subscriptionId);
  const item = subscription.items.data[0];
  if (!item) throw new AppError("conflict", "The payment service has no item for this monthly gift.");
  const price = await monthlyPrice(payments, amountCents, gift.id);
  await payments.subscriptions.update(gift.subscriptionId, { items: [{ id: item.id, price: price.id }], proration_behavior: "none" });
  return withOutbox(async (tx) => {
    const [updated] = await tx.update(monthlyGifts).set({ amountCents }).where(eq(monthlyGifts.id, gift.id)).returning();
    await enqueueEmail(tx, changedMessage(updated!, "amount", `monthly-gift-amount:${gift.id}:${amountCents}:${Date.now()}`));
    return updated!;
  });
}

/** Stops the monthly gift now: no further payment. The confirmation e-mail goes when the service confirms the end. */
export async function stopMonthlyGift({ gift }: { gift: MonthlyGiftRow }): Promise<MonthlyGiftRow> {
  if (gift.status === "stopped") return gift;
  const payments = getPayments();
  const subscription = await payments.subscriptions.retrieve(gift.subscriptionId);
  if (subscription.status !== "canceled") await payments.subscriptions.cancel(gift.subscriptionId, {}, { idempotencyKey: `monthly-gift:${gift.id}:stop` });
  return withOutbox(async (tx) => {
    const [updated] = await tx.update(monthlyGifts).set({ status: "stopped", stoppedAt: new Date() }).where(eq(monthlyGifts.id, gift.id)).returning();
    await enqueueEmail(tx, changedMessage(updated!, "stopped", `monthly-gift-stopped:${gift.id}`));
    return updated!;
  });
}

export { changedMessage as monthlyChangedMessage };

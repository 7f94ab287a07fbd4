import { and, count, eq, isNotNull } from "drizzle-orm";
import type Stripe from "stripe";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { gifts, monthlyGifts, orders, outbox, webhookEvents } from "@/db/schema";
import { getPayments } from "@/lib/checkout/payments";
import { seedDemo } from "@/lib/demo/commands";
import { changeMonthlyAmount, monthlyGiftForDonor, startMonthlyGift, stopMonthlyGift } from "@/lib/giving/commands/monthly";
import { manageToken } from "@/lib/giving/manage-link";
import { findMonthlyGift } from "@/lib/giving/queries";
import { resetDb } from "../../support/db";
import { deliver, signPayload, startTestPayments } from "../../support/payments";

let payments: Awaited<ReturnType<typeof startTestPayments>>;
beforeAll(async () => {
  payments = await startTestPayments();
});
afterAll(async () => payments.close());
beforeEach(async () => {
  await seedDemo(await resetDb());
});

const donor = { name: "Dana Quill", email: "dana@example.org" };
const DAY = 86_400;

async function startAndPay(amountCents = 2_500, card = "pm_card_visa") {
  const started = await startMonthlyGift({ amountCents, contact: donor, coverFee: false }, null);
  const intentId = started.clientSecret.split("_secret_")[0]!;
  // What the browser's payment form does with the first invoice's secret.
  await getPayments().paymentIntents.confirm(intentId, { payment_method: card });
  await payments.standIn.webhooksIdle();
  return started;
}

async function clockOf(monthlyGiftId: string) {
  const gift = (await findMonthlyGift(monthlyGiftId))!;
  const customer = (await getPayments().customers.retrieve(gift.customerId)) as Stripe.Customer;
  const clockId = customer.test_clock as string;
  const clock = await getPayments().testHelpers.testClocks.retrieve(clockId);
  return {
    gift,
    advanceDays: async (days: number) => {
      const now = (await getPayments().testHelpers.testClocks.retrieve(clockId)).frozen_time;
      await getPayments().testHelpers.testClocks.advance(clockId, { frozen_time: now + days * DAY });
      await payments.standIn.webhooksIdle();
    },
    startedAt: clock.frozen_time,
  };
}

async function giftCount(monthlyGiftId: string) {
  const db = await getDb();
  const [row] = await db.select({ n: count() }).from(gifts).where(eq(gifts.monthlyGiftId, monthlyGiftId));
  return row!.n;
}

describe("monthly gifts", () => {
  it("the first payment records one gift; each renewal at the clock's advance records one more, each with its own paid order and receipt", async () => {
    const started = await startAndPay();
    expect((await findMonthlyGift(started.monthlyGiftId))!.status).toBe("active");
    expect(await giftCount(started.monthlyGiftId)).toBe(1);
    const { advanceDays } = await clockOf(started.monthlyGiftId);
    await advanceDays(31);
    expect(await giftCount(started.monthlyGiftId)).toBe(2);
    await advanceDays(31);
    expect(await giftCount(started.monthlyGiftId)).toBe(3);
    const db = await getDb();
    const rows = await db.select().from(gifts).where(eq(gifts.monthlyGiftId, started.monthlyGiftId));
    expect(new Set(rows.map((r) => r.invoiceId)).size).toBe(3);
    for (const row of rows) {
      const [order] = await db.select().from(orders).where(eq(orders.id, row.orderId));
      expect(order).toMatchObject({ status: "paid", method: "none", giftCents: 2_500, totalCents: 2_500, subtotalCents: 0 });
      const receipts = await db.select({ n: count() }).from(outbox).where(eq(outbox.dedupeKey, `gift-receipt:${row.orderId}`));
      expect(receipts[0]!.n).toBe(1);
    }
  });

  it("every webhook kind has one effect, 5 times in a row and 5 times at once", async () => {
    const firstEvent = payments.standIn.events().length;
    const mine = () => payments.standIn.events().slice(firstEvent);
    const started = await startAndPay();
    const { advanceDays } = await clockOf(started.monthlyGiftId);
    await getPayments().subscriptions.update((await findMonthlyGift(started.monthlyGiftId))!.subscriptionId, { default_payment_method: "pm_card_chargeDeclined" });
    await advanceDays(31);
    await stopMonthlyGift({ gift: (await findMonthlyGift(started.monthlyGiftId))! });
    await payments.standIn.webhooksIdle();
    const db = await getDb();
    const snapshot = async () => ({
      gifts: await giftCount(started.monthlyGiftId),
      orders: (await db.select({ n: count() }).from(orders))[0]!.n,
      outbox: (await db.select({ n: count() }).from(outbox))[0]!.n,
      status: (await findMonthlyGift(started.monthlyGiftId))!.status,
    });
    const before = await snapshot();
    expect(before).toMatchObject({ gifts: 1, status: "stopped" });
    const kinds = ["invoice.paid", "invoice.payment_failed", "customer.subscription.deleted", "payment_intent.succeeded", "payment_intent.payment_failed"];
    for (const type of kinds) {
      const event = mine().find((e) => e.type === type);
      expect(event, type).toBeDefined();
      const body = JSON.stringify(event);
      const sig = signPayload(body);
      const inRow: Response[] = [];
      for (let i = 0; i < 5; i++) inRow.push(await deliver(body, sig));
      const atOnce = await Promise.all(Array.from({ length: 5 }, () => deliver(body, sig)));
      const outcomes = await Promise.all([...inRow, ...atOnce].map((r) => r.json()));
      expect([...inRow, ...atOnce].map((r) => r.status)).toEqual(Array(10).fill(200));
      expect(outcomes.every((o) => o.duplicate === true || o.outcome === "duplicate"), type).toBe(true);
    }
    expect(await snapshot()).toEqual(before);
    const recorded = await db.select({ n: count() }).from(webhookEvents).where(isNotNull(webhookEvents.processedAt));
    expect(recorded[0]!.n).toBe(mine().length);
  });

  it("a failed renewal e-mails the donor a private link; paying there with another card records the month and reactivates it", async () => {
    const started = await startAndPay();
    const { gift, advanceDays } = await clockOf(started.monthlyGiftId);
    await getPayments().subscriptions.update(gift.subscriptionId, { default_payment_method: "pm_card_chargeDeclined" });
    await advanceDays(31);
    expect((await findMonthlyGift(gift.id))!.status).toBe("past_due");
    expect(await giftCount(gift.id)).toBe(1);
    const db = await getDb();
    const [mail] = await db.select().from(outbox).where(and(eq(outbox.kind, "monthly-gift-failed"), eq(outbox.toAddress, donor.email)));
    expect(mail).toBeDefined();
    const link = (mail!.payload as { managePath: string }).managePath;
    expect(link).toBe(`/give/monthly/${gift.id}?s=${manageToken({ monthlyGiftId: gift.id, secret: process.env.NEXTAUTH_SECRET! })}`);
    // The link alone opens the gift; a wrong token does not.
    const token = new URL(link, "http://x").searchParams.get("s");
    expect((await monthlyGiftForDonor({ id: gift.id, token, user: null })).id).toBe(gift.id);
    await expect(monthlyGiftForDonor({ id: gift.id, token: "nope", user: null })).rejects.toMatchObject({ code: "not_found" });

    const subscription = await getPayments().subscriptions.retrieve(gift.subscriptionId, { expand: ["latest_invoice.confirmation_secret"] });
    const secret = (subscription.latest_invoice as Stripe.Invoice).confirmation_secret!.client_secret;
    await getPayments().paymentIntents.confirm(secret.split("_secret_")[0]!, { payment_method: "pm_card_mastercard" });
    await payments.standIn.webhooksIdle();
    expect((await findMonthlyGift(gift.id))!.status).toBe("active");
    expect(await giftCount(gift.id)).toBe(2);
  });

  it("changing the amount bills the new amount from the next month; stopping ends the payments; starting again opens a new monthly gift", async () => {
    const started = await startAndPay();
    const { gift, advanceDays } = await clockOf(started.monthlyGiftId);
    const changed = await changeMonthlyAmount({ gift, amountCents: 4_000 });
    expect(changed.amountCents).toBe(4_000);
    await advanceDays(31);
    const db = await getDb();
    const amounts = (await db.select({ a: gifts.amountCents }).from(gifts).where(eq(gifts.monthlyGiftId, gift.id))).map((r) => r.a).sort();
    expect(amounts).toEqual([2_500, 4_000]);

    await stopMonthlyGift({ gift: (await findMonthlyGift(gift.id))! });
    await payments.standIn.webhooksIdle();
    expect((await findMonthlyGift(gift.id))!.status).toBe("stopped");
    await advanceDays(95);
    expect(await giftCount(gift.id)).toBe(2);
    const stops = await db.select({ n: count() }).from(outbox).where(eq(outbox.dedupeKey, `monthly-gift-stopped:${gift.id}`));
    expect(stops[0]!.n).toBe(1);
    await expect(changeMonthlyAmount({ gift: (await findMonthlyGift(gift.id))!, amountCents: 1_000 })).rejects.toMatchObject({ code: "conflict" });

    const again = await startAndPay(1_500);
    expect(again.monthlyGiftId).not.toBe(gift.id);
    await (await clockOf(again.monthlyGiftId)).advanceDays(31);
    expect(await giftCount(again.monthlyGiftId)).toBe(2);
    expect(await giftCount(gift.id)).toBe(2);
    const rows = await db.select().from(monthlyGifts);
    expect(rows.map((r) => r.status).sort()).toEqual(["active", "stopped"]);
  });

  it("covering the fee adds the center's rate to the monthly amount and says how much", async () => {
    const started = await startMonthlyGift({ amountCents: 2_500, contact: donor, coverFee: true }, null);
    expect(started.feeCoveredCents).toBe(106);
    expect(started.amountCents).toBe(2_606);
    const gift = (await findMonthlyGift(started.monthlyGiftId))!;
    const subscription = await getPayments().subscriptions.retrieve(gift.subscriptionId);
    expect(subscription.items.data[0]!.price.unit_amount).toBe(2_606);
  });
});

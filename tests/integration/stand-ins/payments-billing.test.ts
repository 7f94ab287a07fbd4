import type Stripe from "stripe";
import { afterEach, describe, expect, it } from "vitest";
import { addMonths } from "@/stand-ins/payments/billing";
import { startPaymentsStandIn } from "@/stand-ins/payments/server";
import { TEST_WEBHOOK_SECRET, createStripeClient, startWebhookReceiver, waitFor } from "./helpers";

const cleanups: Array<() => Promise<void>> = [];
afterEach(async () => {
  await Promise.all(cleanups.splice(0).map((close) => close()));
});

async function setUp() {
  const receiver = await startWebhookReceiver();
  const standIn = await startPaymentsStandIn({ port: 0, webhookUrl: receiver.url, webhookSecret: TEST_WEBHOOK_SECRET, webhookRetryDelaysMs: [40, 80] });
  cleanups.push(() => standIn.close(), () => receiver.close());
  const stripe = createStripeClient({ url: standIn.url });
  const events = () => receiver.received.map((d) => stripe.webhooks.constructEvent(d.rawBody, d.signature, TEST_WEBHOOK_SECRET));
  return { stripe, standIn, receiver, events };
}

const JAN_15 = Math.floor(Date.UTC(2027, 0, 15, 12) / 1000);

async function monthlyOn(stripe: Stripe, { amount = 2_500, clock }: { amount?: number; clock?: string } = {}) {
  const customer = await stripe.customers.create({ email: "dana@example.org", name: "Dana Quill", ...(clock ? { test_clock: clock } : {}) });
  const price = await stripe.prices.create({ currency: "usd", unit_amount: amount, recurring: { interval: "month" }, product_data: { name: "Monthly gift" } });
  const subscription = await stripe.subscriptions.create({
    customer: customer.id,
    items: [{ price: price.id }],
    payment_behavior: "default_incomplete",
    payment_settings: { save_default_payment_method: "on_subscription" },
    metadata: { monthlyGiftId: "mg_1" },
    expand: ["latest_invoice.confirmation_secret"],
  });
  return { customer, price, subscription };
}

function intentOf(invoice: Stripe.Invoice): string {
  const payment = invoice.payments?.data[0]?.payment.payment_intent;
  return typeof payment === "string" ? payment : payment!.id;
}

describe("payments stand-in: monthly billing", () => {
  it("keeps the day of the month and clamps to a short month's last day", () => {
    const jan31 = Math.floor(Date.UTC(2027, 0, 31, 9) / 1000);
    expect(new Date(addMonths(jan31, 1) * 1000).toISOString()).toBe("2027-02-28T09:00:00.000Z");
    expect(new Date(addMonths(jan31, 2) * 1000).toISOString()).toBe("2027-03-31T09:00:00.000Z");
    expect(new Date(addMonths(jan31, 13) * 1000).toISOString()).toBe("2028-02-29T09:00:00.000Z");
  });

  it("creates products and prices, and a subscription waiting on its first invoice's payment", async () => {
    const { stripe } = await setUp();
    const product = await stripe.products.create({ name: "Monthly gift" });
    expect(await stripe.products.retrieve(product.id)).toMatchObject({ id: product.id, name: "Monthly gift" });
    const price = await stripe.prices.create({ currency: "usd", unit_amount: 1_000, recurring: { interval: "month" }, product: product.id });
    expect(await stripe.prices.retrieve(price.id)).toMatchObject({ unit_amount: 1_000, recurring: { interval: "month" }, product: product.id });
    const { subscription } = await monthlyOn(stripe);
    expect(subscription.status).toBe("incomplete");
    const invoice = subscription.latest_invoice as Stripe.Invoice;
    expect(invoice.status).toBe("open");
    expect(invoice.amount_due).toBe(2_500);
    expect(invoice.billing_reason).toBe("subscription_create");
    expect(invoice.confirmation_secret?.client_secret).toMatch(/^pi_.+_secret_/);
    expect(invoice.parent?.subscription_details?.subscription).toBe(subscription.id);
    await expect(stripe.prices.create({ currency: "usd", unit_amount: 10, recurring: { interval: "month" }, product: product.id })).rejects.toThrow();
  });

  it("paying the first invoice activates the subscription and keeps the card; the clock's advance bills one renewal per month", async () => {
    const { stripe, standIn, events } = await setUp();
    const clock = await stripe.testHelpers.testClocks.create({ frozen_time: JAN_15 });
    const { subscription } = await monthlyOn(stripe, { clock: clock.id });
    const first = subscription.latest_invoice as Stripe.Invoice;
    await stripe.paymentIntents.confirm(intentOf(first), { payment_method: "pm_card_visa" });
    const active = await stripe.subscriptions.retrieve(subscription.id);
    expect(active.status).toBe("active");
    expect(active.default_payment_method).toMatch(/^pm_/);
    expect((await stripe.invoices.retrieve(first.id)).status).toBe("paid");

    const advanced = await stripe.testHelpers.testClocks.advance(clock.id, { frozen_time: JAN_15 + 70 * 86_400 });
    expect(advanced.frozen_time).toBe(JAN_15 + 70 * 86_400);
    const invoices = await stripe.invoices.list({ subscription: subscription.id });
    expect(invoices.data.map((i) => [i.billing_reason, i.status, i.amount_paid])).toEqual([
      ["subscription_cycle", "paid", 2_500],
      ["subscription_cycle", "paid", 2_500],
      ["subscription_create", "paid", 2_500],
    ]);
    const renewals = invoices.data.filter((i) => i.billing_reason === "subscription_cycle").map((i) => new Date(i.period_start * 1000).toISOString().slice(0, 10));
    expect(renewals.sort()).toEqual(["2027-02-15", "2027-03-15"]);
    await standIn.webhooksIdle();
    const paid = events().filter((e) => e.type === "invoice.paid");
    expect(paid).toHaveLength(3);
    expect(new Set(paid.map((e) => (e.data.object as Stripe.Invoice).id)).size).toBe(3);
  });

  it("a renewal on a declining card fails, leaves the invoice open and the subscription past due; paying with a new card recovers it", async () => {
    const { stripe, standIn, events } = await setUp();
    const clock = await stripe.testHelpers.testClocks.create({ frozen_time: JAN_15 });
    const { subscription } = await monthlyOn(stripe, { clock: clock.id });
    await stripe.paymentIntents.confirm(intentOf(subscription.latest_invoice as Stripe.Invoice), { payment_method: "pm_card_visa" });
    await stripe.subscriptions.update(subscription.id, { default_payment_method: "pm_card_chargeDeclined" });
    await stripe.testHelpers.testClocks.advance(clock.id, { frozen_time: JAN_15 + 32 * 86_400 });
    const pastDue = await stripe.subscriptions.retrieve(subscription.id, { expand: ["latest_invoice"] });
    expect(pastDue.status).toBe("past_due");
    const open = pastDue.latest_invoice as Stripe.Invoice;
    expect(open.status).toBe("open");
    expect(open.attempt_count).toBe(1);
    await standIn.webhooksIdle();
    expect(events().filter((e) => e.type === "invoice.payment_failed")).toHaveLength(1);

    await stripe.paymentIntents.confirm(intentOf(open), { payment_method: "pm_card_mastercard" });
    expect((await stripe.subscriptions.retrieve(subscription.id)).status).toBe("active");
    expect((await stripe.invoices.retrieve(open.id)).status).toBe("paid");
  });

  it("changes the amount from the next invoice and stops on cancel, with customer.subscription.deleted", async () => {
    const { stripe, standIn, events } = await setUp();
    const clock = await stripe.testHelpers.testClocks.create({ frozen_time: JAN_15 });
    const { subscription } = await monthlyOn(stripe, { clock: clock.id });
    await stripe.paymentIntents.confirm(intentOf(subscription.latest_invoice as Stripe.Invoice), { payment_method: "pm_card_visa" });
    const bigger = await stripe.prices.create({ currency: "usd", unit_amount: 4_000, recurring: { interval: "month" }, product_data: { name: "Monthly gift" } });
    await stripe.subscriptions.update(subscription.id, { items: [{ id: subscription.items.data[0]!.id, price: bigger.id }], proration_behavior: "none" });
    await stripe.testHelpers.testClocks.advance(clock.id, { frozen_time: JAN_15 + 32 * 86_400 });
    const latest = await stripe.subscriptions.retrieve(subscription.id, { expand: ["latest_invoice"] });
    expect((latest.latest_invoice as Stripe.Invoice).amount_paid).toBe(4_000);

    const cancelled = await stripe.subscriptions.cancel(subscription.id);
    expect(cancelled.status).toBe("canceled");
    await stripe.testHelpers.testClocks.advance(clock.id, { frozen_time: JAN_15 + 100 * 86_400 });
    expect((await stripe.invoices.list({ subscription: subscription.id })).data).toHaveLength(2);
    await expect(stripe.subscriptions.cancel(subscription.id)).rejects.toThrow();
    await standIn.webhooksIdle();
    expect(events().filter((e) => e.type === "customer.subscription.deleted")).toHaveLength(1);
  });

  it("replays an invoice event with a fresh signature, as many times as asked", async () => {
    const { stripe, standIn, receiver } = await setUp();
    const { subscription } = await monthlyOn(stripe);
    await stripe.paymentIntents.confirm(intentOf(subscription.latest_invoice as Stripe.Invoice), { payment_method: "pm_card_visa" });
    await standIn.webhooksIdle();
    const paid = standIn.events().find((e) => e.type === "invoice.paid")!;
    const before = receiver.received.length;
    const res = await fetch(`${standIn.url}/_stand-in/events/${paid.id}/resend`, { method: "POST", body: JSON.stringify({ times: 5, parallel: true }) });
    expect(res.status).toBe(200);
    await waitFor(() => (receiver.received.length >= before + 5 ? true : undefined));
    const replays = receiver.received.slice(before);
    for (const delivery of replays) {
      expect(stripe.webhooks.constructEvent(delivery.rawBody, delivery.signature, TEST_WEBHOOK_SECRET).id).toBe(paid.id);
    }
  });
});

describe("payments stand-in: test clock controls", () => {
  it("lists the clocks and advances one by days without an API key, billing the renewal", async () => {
    const { stripe, standIn } = await setUp();
    const clock = await stripe.testHelpers.testClocks.create({ frozen_time: JAN_15, name: "monthly gift x" });
    const { subscription } = await monthlyOn(stripe, { clock: clock.id });
    await stripe.paymentIntents.confirm(intentOf(subscription.latest_invoice as Stripe.Invoice), { payment_method: "pm_card_visa" });
    const listed = (await (await fetch(`${standIn.url}/_stand-in/test-clocks`)).json()) as { data: { id: string; name: string }[] };
    expect(listed.data.map((c) => c.name)).toEqual(["monthly gift x"]);
    const res = await fetch(`${standIn.url}/_stand-in/test-clocks/${clock.id}/advance`, { method: "POST", body: JSON.stringify({ days: 32 }) });
    expect(res.status).toBe(200);
    expect((await stripe.invoices.list({ subscription: subscription.id })).data).toHaveLength(2);
    const back = await fetch(`${standIn.url}/_stand-in/test-clocks/${clock.id}/advance`, { method: "POST", body: JSON.stringify({ days: -1 }) });
    expect(back.status).toBe(400);
  });
});

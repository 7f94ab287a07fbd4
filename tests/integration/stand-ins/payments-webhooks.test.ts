import Stripe from "stripe";
import { afterEach, describe, expect, it } from "vitest";
import { startPaymentsStandIn, type PaymentsStandIn } from "@/stand-ins/payments/server";
import { signWebhookPayload } from "@/stand-ins/payments/webhook-signature";
import { TEST_WEBHOOK_SECRET, createStripeClient, startWebhookReceiver, waitFor } from "./helpers";

type Receiver = Awaited<ReturnType<typeof startWebhookReceiver>>;
const cleanups: Array<() => Promise<void>> = [];
afterEach(async () => {
  await Promise.all(cleanups.splice(0).map((close) => close()));
});

async function setUp({
  respond,
  retryDelays = [40, 80, 160],
}: { respond?: (count: number) => number; retryDelays?: number[] } = {}) {
  const receiver: Receiver = await startWebhookReceiver({ respond });
  const standIn: PaymentsStandIn = await startPaymentsStandIn({
    port: 0,
    webhookUrl: receiver.url,
    webhookSecret: TEST_WEBHOOK_SECRET,
    webhookRetryDelaysMs: retryDelays,
  });
  cleanups.push(
    () => standIn.close(),
    () => receiver.close(),
  );
  return { receiver, standIn, stripe: createStripeClient({ url: standIn.url }) };
}

function verify(stripe: Stripe, delivery: { rawBody: string; signature: string }) {
  return stripe.webhooks.constructEvent(delivery.rawBody, delivery.signature, TEST_WEBHOOK_SECRET);
}

describe("webhook signatures", () => {
  it("signs exactly as the SDK's own test-header helper does (same payload, secret, time)", () => {
    const stripe = new Stripe("sk_test_x", { telemetry: false });
    const payload = JSON.stringify({ id: "evt_1", object: "event" }, null, 2);
    const timestamp = 1_767_225_600;
    const ours = signWebhookPayload({ payload, secret: TEST_WEBHOOK_SECRET, timestamp });
    const sdk = stripe.webhooks.generateTestHeaderString({
      payload,
      secret: TEST_WEBHOOK_SECRET,
      timestamp,
    });
    expect(ours).toBe(sdk);
    expect(ours).toMatch(/^t=1767225600,v1=[0-9a-f]{64}$/);
  });

  it("delivers payment_intent.succeeded that constructEvent accepts, and rejects a tampered body", async () => {
    const { receiver, stripe } = await setUp();
    const intent = await stripe.paymentIntents.create({
      amount: 12_900,
      currency: "usd",
      metadata: { orderId: "ord_1" },
    });
    await stripe.paymentIntents.confirm(intent.id, { payment_method: "pm_card_visa" });
    const delivery = await waitFor(() => receiver.received[0]);
    const event = verify(stripe, delivery);
    expect(event.type).toBe("payment_intent.succeeded");
    expect(event.id).toMatch(/^evt_/);
    expect(event.livemode).toBe(false);
    expect(event.api_version).toBe(stripe.getApiField("version"));
    expect(event.request?.idempotency_key).toMatch(/^stripe-node-retry-/);
    const object = event.data.object as Stripe.PaymentIntent;
    expect(object).toMatchObject({
      id: intent.id,
      status: "succeeded",
      metadata: { orderId: "ord_1" },
    });

    const tampered = delivery.rawBody.replace("12900", "1");
    expect(() => verify(stripe, { ...delivery, rawBody: tampered })).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );
    expect(() =>
      stripe.webhooks.constructEvent(delivery.rawBody, delivery.signature, "whsec_other"),
    ).toThrow(Stripe.errors.StripeSignatureVerificationError);
  });

  it("emits payment_failed, canceled and charge.refunded (with the intent's id) as the state changes", async () => {
    const { receiver, standIn, stripe } = await setUp();
    const declined = await stripe.paymentIntents.create({ amount: 2_000, currency: "usd" });
    await stripe.paymentIntents
      .confirm(declined.id, { payment_method: "pm_card_chargeDeclined" })
      .catch(() => undefined);
    await stripe.paymentIntents.cancel(declined.id);
    const paid = await stripe.paymentIntents.create({
      amount: 5_000,
      currency: "usd",
      payment_method: "pm_card_visa",
      confirm: true,
    });
    await stripe.refunds.create({ payment_intent: paid.id, amount: 1_000 });
    await standIn.webhooksIdle();
    const events = receiver.received.map((delivery) => verify(stripe, delivery));
    expect(events.map((event) => event.type).sort()).toEqual([
      "charge.refunded",
      "payment_intent.canceled",
      "payment_intent.payment_failed",
      "payment_intent.succeeded",
    ]);
    const failed = events.find((event) => event.type === "payment_intent.payment_failed");
    expect((failed?.data.object as Stripe.PaymentIntent).last_payment_error?.decline_code).toBe(
      "generic_decline",
    );
    const refunded = events.find((event) => event.type === "charge.refunded");
    expect(refunded?.data.object).toMatchObject({
      object: "charge",
      payment_intent: paid.id,
      amount_refunded: 1_000,
      refunded: false,
    });
  });
});

describe("webhook retries", () => {
  it("retries after the endpoint answers 500, with growing delays, until it answers 200", async () => {
    const { receiver, standIn, stripe } = await setUp({
      respond: (count) => (count <= 2 ? 500 : 200),
    });
    await stripe.paymentIntents.create({
      amount: 1_000,
      currency: "usd",
      payment_method: "pm_card_visa",
      confirm: true,
    });
    await standIn.webhooksIdle();
    expect(receiver.received).toHaveLength(3);
    expect(
      standIn.deliveries().map((attempt) => [attempt.attempt, attempt.status, attempt.succeeded]),
    ).toEqual([
      [1, 500, false],
      [2, 500, false],
      [3, 200, true],
    ]);
    const [first, second, third] = receiver.received.map((delivery) => delivery.receivedAt);
    expect(second! - first!).toBeGreaterThanOrEqual(35);
    expect(third! - second!).toBeGreaterThanOrEqual(75);
    // Each attempt is signed afresh and verifies on its own.
    receiver.received.forEach((delivery) =>
      expect(verify(stripe, delivery).type).toBe("payment_intent.succeeded"),
    );
  });

  it("retries refused connections and gives up after the last delay", async () => {
    const receiver = await startWebhookReceiver();
    await receiver.close();
    const standIn = await startPaymentsStandIn({
      port: 0,
      webhookUrl: receiver.url,
      webhookSecret: TEST_WEBHOOK_SECRET,
      webhookRetryDelaysMs: [10, 10],
    });
    cleanups.push(() => standIn.close());
    const stripe = createStripeClient({ url: standIn.url });
    await stripe.paymentIntents.create({
      amount: 1_000,
      currency: "usd",
      payment_method: "pm_card_visa",
      confirm: true,
    });
    await standIn.webhooksIdle();
    const attempts = standIn.deliveries();
    expect(attempts).toHaveLength(3);
    attempts.forEach((attempt) =>
      expect(attempt).toMatchObject({ status: null, succeeded: false }),
    );
    expect(attempts[0]?.error).toMatch(/fetch failed|ECONNREFUSED/);
  });
});

describe("test controls", () => {
  it("holds deliveries while paused and sends them on resume", async () => {
    const { receiver, standIn, stripe } = await setUp();
    const pause = await fetch(`${standIn.url}/_stand-in/webhooks/pause`, { method: "POST" });
    expect(await pause.json()).toMatchObject({ paused: true });
    await stripe.paymentIntents.create({
      amount: 1_000,
      currency: "usd",
      payment_method: "pm_card_visa",
      confirm: true,
    });
    await new Promise((resolve) => setTimeout(resolve, 100));
    expect(receiver.received).toHaveLength(0);
    const status = (await (await fetch(`${standIn.url}/_stand-in/webhooks`)).json()) as {
      held: number;
    };
    expect(status.held).toBe(1);
    await fetch(`${standIn.url}/_stand-in/webhooks/resume`, { method: "POST" });
    await waitFor(() => receiver.received[0]);
  });

  it("lists events with their attempts and re-sends one event N times (duplicate deliveries)", async () => {
    const { receiver, standIn, stripe } = await setUp();
    await stripe.paymentIntents.create({
      amount: 1_000,
      currency: "usd",
      payment_method: "pm_card_visa",
      confirm: true,
    });
    await standIn.webhooksIdle();
    const listed = (await (
      await fetch(`${standIn.url}/_stand-in/events?type=payment_intent.succeeded`)
    ).json()) as {
      data: Array<{ event: { id: string }; deliveries: Array<{ status: number }> }>;
    };
    expect(listed.data).toHaveLength(1);
    const eventId = listed.data[0]!.event.id;
    expect(listed.data[0]!.deliveries.map((attempt) => attempt.status)).toEqual([200]);

    const resend = await fetch(`${standIn.url}/_stand-in/events/${eventId}/resend`, {
      method: "POST",
      body: JSON.stringify({ times: 3, parallel: true }),
    });
    expect(((await resend.json()) as { data: unknown[] }).data).toHaveLength(3);
    expect(receiver.received).toHaveLength(4);
    const ids = receiver.received.map((delivery) => verify(stripe, delivery).id);
    expect(new Set(ids)).toEqual(new Set([eventId]));
    const missing = await fetch(`${standIn.url}/_stand-in/events/evt_nope/resend`, {
      method: "POST",
    });
    expect(missing.status).toBe(404);
  });
});

import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startPaymentsStandIn, type PaymentsStandIn } from "@/stand-ins/payments/server";
import {
  TEST_PUBLISHABLE_KEY,
  TEST_SECRET_KEY,
  TEST_WEBHOOK_SECRET,
  createStripeClient,
} from "./helpers";

// Drives the payments stand-in with the real `stripe` SDK (v23), as the app will.
let standIn: PaymentsStandIn;
let stripe: Stripe;

beforeAll(async () => {
  standIn = await startPaymentsStandIn({
    port: 0,
    webhookSecret: TEST_WEBHOOK_SECRET,
    secretKey: TEST_SECRET_KEY,
    publishableKey: TEST_PUBLISHABLE_KEY,
  });
  stripe = createStripeClient({ url: standIn.url });
});
afterAll(() => standIn.close());

async function createOrderIntent(amount = 12_900) {
  return stripe.paymentIntents.create({
    amount,
    currency: "usd",
    automatic_payment_methods: { enabled: true },
    metadata: { orderId: "ord_1001", giftCents: "2500" },
    receipt_email: "buyer@example.test",
    description: "Order 1001",
  });
}

async function expectStripeError(promise: Promise<unknown>) {
  const error = await promise.then(
    () => null,
    (caught: unknown) => caught,
  );
  expect(error).toBeInstanceOf(Stripe.errors.StripeError);
  return error as InstanceType<typeof Stripe.errors.StripeError>;
}

describe("payment intents", () => {
  it("creates an intent shaped like the API's, with bracket-encoded metadata intact", async () => {
    const intent = await createOrderIntent();
    expect(intent.object).toBe("payment_intent");
    expect(intent.id).toMatch(/^pi_[A-Za-z0-9]{24}$/);
    expect(intent.client_secret).toMatch(new RegExp(`^${intent.id}_secret_[A-Za-z0-9]+$`));
    expect(intent.status).toBe("requires_payment_method");
    expect(intent.amount).toBe(12_900);
    expect(intent.metadata).toEqual({ orderId: "ord_1001", giftCents: "2500" });
    expect(intent.automatic_payment_methods).toEqual({ enabled: true });
    expect(intent.livemode).toBe(false);
    const again = await stripe.paymentIntents.retrieve(intent.id);
    expect(again).toMatchObject({
      id: intent.id,
      amount: 12_900,
      receipt_email: "buyer@example.test",
    });
  });

  it("accepts allowed_payment_method_types and rejects it together with automatic_payment_methods", async () => {
    const intent = await stripe.paymentIntents.create({
      amount: 5_000,
      currency: "usd",
      allowed_payment_method_types: ["card"],
    });
    expect(intent.payment_method_types).toEqual(["card"]);
    const error = await expectStripeError(
      stripe.paymentIntents.create({
        amount: 5_000,
        currency: "usd",
        allowed_payment_method_types: ["card"],
        automatic_payment_methods: { enabled: true },
      }),
    );
    expect(error.statusCode).toBe(400);
  });

  it("updates amount and merges metadata (an empty value deletes a key)", async () => {
    const intent = await createOrderIntent();
    const updated = await stripe.paymentIntents.update(intent.id, {
      amount: 15_400,
      metadata: { giftCents: "", shippingCents: "1450" },
    });
    expect(updated.amount).toBe(15_400);
    expect(updated.metadata).toEqual({ orderId: "ord_1001", shippingCents: "1450" });
  });

  it("confirms with pm_card_visa: succeeded, charge recorded, amount received", async () => {
    const intent = await createOrderIntent();
    const confirmed = await stripe.paymentIntents.confirm(intent.id, {
      payment_method: "pm_card_visa",
      expand: ["latest_charge"],
    });
    expect(confirmed.status).toBe("succeeded");
    expect(confirmed.amount_received).toBe(12_900);
    expect(confirmed.payment_method).toMatch(/^pm_/);
    const charge = confirmed.latest_charge as Stripe.Charge;
    expect(charge).toMatchObject({
      object: "charge",
      paid: true,
      amount_captured: 12_900,
      payment_intent: intent.id,
    });
    expect(charge.metadata).toEqual({ orderId: "ord_1001", giftCents: "2500" });
  });

  it("declines as a StripeCardError, keeps the intent payable, then succeeds with a good card", async () => {
    const intent = await createOrderIntent();
    const generic = await expectStripeError(
      stripe.paymentIntents.confirm(intent.id, { payment_method: "pm_card_chargeDeclined" }),
    );
    expect(generic).toBeInstanceOf(Stripe.errors.StripeCardError);
    expect(generic.statusCode).toBe(402);
    expect(generic.code).toBe("card_declined");
    expect(generic.decline_code).toBe("generic_decline");
    expect(generic.message).toBe("Your card was declined.");
    expect(generic.payment_intent?.id).toBe(intent.id);
    expect(generic.payment_intent?.status).toBe("requires_payment_method");

    const poor = await expectStripeError(
      stripe.paymentIntents.confirm(intent.id, {
        payment_method: "pm_card_chargeDeclinedInsufficientFunds",
      }),
    );
    expect(poor).toBeInstanceOf(Stripe.errors.StripeCardError);
    expect(poor.decline_code).toBe("insufficient_funds");

    const afterDecline = await stripe.paymentIntents.retrieve(intent.id);
    expect(afterDecline.status).toBe("requires_payment_method");
    expect(afterDecline.last_payment_error).toMatchObject({
      type: "card_error",
      decline_code: "insufficient_funds",
    });
    expect(afterDecline.payment_method).toBeNull();

    const paid = await stripe.paymentIntents.confirm(intent.id, { payment_method: "pm_card_visa" });
    expect(paid.status).toBe("succeeded");
    expect(paid.last_payment_error).toBeNull();
  });

  it("refuses to confirm or cancel a succeeded intent, and cancels an open one", async () => {
    const paid = await stripe.paymentIntents.create({
      amount: 4_000,
      currency: "usd",
      payment_method: "pm_card_visa",
      confirm: true,
    });
    expect(paid.status).toBe("succeeded");
    const again = await expectStripeError(
      stripe.paymentIntents.confirm(paid.id, { payment_method: "pm_card_visa" }),
    );
    expect(again.code).toBe("payment_intent_unexpected_state");
    const cancelPaid = await expectStripeError(stripe.paymentIntents.cancel(paid.id));
    expect(cancelPaid).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(cancelPaid.code).toBe("payment_intent_unexpected_state");

    const open = await createOrderIntent();
    const canceled = await stripe.paymentIntents.cancel(open.id, {
      cancellation_reason: "abandoned",
    });
    expect(canceled).toMatchObject({ status: "canceled", cancellation_reason: "abandoned" });
    expect(canceled.canceled_at).toBeGreaterThan(0);
  });
});

describe("refunds", () => {
  it("refunds in parts, then the rest, and refuses more than what is left", async () => {
    const paid = await stripe.paymentIntents.create({
      amount: 10_000,
      currency: "usd",
      payment_method: "pm_card_visa",
      confirm: true,
    });
    const part = await stripe.refunds.create({
      payment_intent: paid.id,
      amount: 2_500,
      reason: "requested_by_customer",
    });
    expect(part).toMatchObject({
      object: "refund",
      amount: 2_500,
      status: "succeeded",
      payment_intent: paid.id,
    });
    expect(part.id).toMatch(/^re_/);

    const tooMuch = await expectStripeError(
      stripe.refunds.create({ payment_intent: paid.id, amount: 7_501 }),
    );
    expect(tooMuch.code).toBe("amount_too_large");
    expect(tooMuch.param).toBe("amount");
    expect(tooMuch.message).toContain("$75.00");

    const rest = await stripe.refunds.create({ payment_intent: paid.id });
    expect(rest.amount).toBe(7_500);
    const charge = await stripe.charges.retrieve(String(paid.latest_charge));
    expect(charge).toMatchObject({ amount_refunded: 10_000, refunded: true });
    expect((await stripe.refunds.retrieve(part.id)).amount).toBe(2_500);

    const none = await expectStripeError(stripe.refunds.create({ payment_intent: paid.id }));
    expect(none.code).toBe("charge_already_refunded");
  });

  it("refuses to refund an unpaid intent", async () => {
    const open = await createOrderIntent();
    const error = await expectStripeError(stripe.refunds.create({ payment_intent: open.id }));
    expect(error.statusCode).toBe(400);
  });
});

describe("customers and errors", () => {
  it("creates and retrieves a customer, and links it to an intent", async () => {
    const customer = await stripe.customers.create({
      email: "donor@example.test",
      name: "Ada Birch",
      metadata: { userId: "u_7" },
    });
    expect(customer.id).toMatch(/^cus_/);
    expect(await stripe.customers.retrieve(customer.id)).toMatchObject({
      email: "donor@example.test",
      name: "Ada Birch",
    });
    const intent = await stripe.paymentIntents.create({
      amount: 2_000,
      currency: "usd",
      customer: customer.id,
    });
    expect(intent.customer).toBe(customer.id);
  });

  it("answers unknown ids with 404 resource_missing", async () => {
    const error = await expectStripeError(stripe.paymentIntents.retrieve("pi_doesnotexist"));
    expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(error.statusCode).toBe(404);
    expect(error.code).toBe("resource_missing");
    const customer = await expectStripeError(stripe.customers.retrieve("cus_missing"));
    expect(customer.code).toBe("resource_missing");
  });

  it("answers bad parameters with 400 and the parameter's name", async () => {
    const missing = await expectStripeError(
      stripe.paymentIntents.create({ currency: "usd" } as Stripe.PaymentIntentCreateParams),
    );
    expect(missing).toMatchObject({ statusCode: 400, param: "amount", code: "parameter_missing" });
    // USD minimum charge is $0.50: 49 cents fails, 50 passes.
    const small = await expectStripeError(
      stripe.paymentIntents.create({ amount: 49, currency: "usd" }),
    );
    expect(small).toMatchObject({ code: "amount_too_small", param: "amount" });
    await expect(
      stripe.paymentIntents.create({ amount: 50, currency: "usd" }),
    ).resolves.toMatchObject({ amount: 50 });
    const unknown = await expectStripeError(
      stripe.paymentIntents.create({
        amount: 900,
        currency: "usd",
        colour: "red",
      } as Stripe.PaymentIntentCreateParams),
    );
    expect(unknown).toMatchObject({ param: "colour", code: "parameter_unknown" });
  });

  it("answers a wrong or live key with 401 (StripeAuthenticationError)", async () => {
    const wrong = createStripeClient({ url: standIn.url, key: "sk_test_someone_else" });
    const error = await expectStripeError(
      wrong.paymentIntents.create({ amount: 900, currency: "usd" }),
    );
    expect(error).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    expect(error.statusCode).toBe(401);
    const live = createStripeClient({ url: standIn.url, key: "sk_live_never_here" });
    await expect(live.customers.create({})).rejects.toBeInstanceOf(
      Stripe.errors.StripeAuthenticationError,
    );
  });

  it("lets a publishable key confirm only with the client secret, as the browser does", async () => {
    const intent = await createOrderIntent();
    const confirmWith = (body: Record<string, string>) =>
      fetch(`${standIn.url}/v1/payment_intents/${intent.id}/confirm`, {
        method: "POST",
        headers: { "Content-Type": "application/x-www-form-urlencoded" },
        body: new URLSearchParams({ key: TEST_PUBLISHABLE_KEY, ...body }),
      });
    const card = {
      "payment_method_data[type]": "card",
      "payment_method_data[card][number]": "4242424242424242",
      "payment_method_data[card][exp_month]": "12",
      "payment_method_data[card][exp_year]": String(new Date().getUTCFullYear() + 2),
      "payment_method_data[card][cvc]": "123",
    };
    const noSecret = await confirmWith(card);
    expect(noSecret.status).toBe(400);
    const badNumber = await confirmWith({
      ...card,
      client_secret: intent.client_secret ?? "",
      "payment_method_data[card][number]": "4242424242424241",
    });
    expect(badNumber.status).toBe(402);
    expect(((await badNumber.json()) as { error: { code: string } }).error.code).toBe(
      "incorrect_number",
    );
    const ok = await confirmWith({ ...card, client_secret: intent.client_secret ?? "" });
    expect(ok.status).toBe(200);
    expect(ok.headers.get("access-control-allow-origin")).toBe("*");
    const body = (await ok.json()) as Record<string, unknown>;
    expect(body.status).toBe("succeeded");
    // A publishable key never sees the order's metadata.
    expect(body.metadata).toBeUndefined();
    const refundWithPk = await fetch(`${standIn.url}/v1/refunds`, {
      method: "POST",
      headers: { Authorization: `Bearer ${TEST_PUBLISHABLE_KEY}` },
      body: new URLSearchParams({ payment_intent: intent.id }),
    });
    expect(refundWithPk.status).toBe(401);
    const preflight = await fetch(`${standIn.url}/v1/payment_intents/${intent.id}/confirm`, {
      method: "OPTIONS",
    });
    expect(preflight.status).toBe(204);
  });
});

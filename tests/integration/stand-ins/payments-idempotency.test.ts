import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startPaymentsStandIn, type PaymentsStandIn } from "@/stand-ins/payments/server";
import { TEST_SECRET_KEY, TEST_WEBHOOK_SECRET, createStripeClient } from "./helpers";

let standIn: PaymentsStandIn;
let stripe: Stripe;

beforeAll(async () => {
  standIn = await startPaymentsStandIn({
    port: 0,
    webhookSecret: TEST_WEBHOOK_SECRET,
    secretKey: TEST_SECRET_KEY,
  });
  stripe = createStripeClient({ url: standIn.url });
});
afterAll(() => standIn.close());

describe("Idempotency-Key", () => {
  it("replays the stored answer for the same key and parameters, with Idempotent-Replayed", async () => {
    const params = { amount: 8_800, currency: "usd", metadata: { orderId: "ord_2002" } };
    const first = await stripe.paymentIntents.create(params, {
      idempotencyKey: "order-2002-create",
    });
    // Key order in the body must not matter.
    const second = await stripe.paymentIntents.create(
      { metadata: { orderId: "ord_2002" }, currency: "usd", amount: 8_800 },
      { idempotencyKey: "order-2002-create" },
    );
    expect(second.id).toBe(first.id);
    expect(second.lastResponse.headers["idempotent-replayed"]).toBe("true");
    expect(first.lastResponse.headers["idempotent-replayed"]).toBeUndefined();
  });

  it("answers the same key with other parameters with an idempotency_error", async () => {
    await stripe.paymentIntents.create(
      { amount: 1_000, currency: "usd" },
      { idempotencyKey: "order-2003" },
    );
    const error = await stripe.paymentIntents
      .create({ amount: 1_100, currency: "usd" }, { idempotencyKey: "order-2003" })
      .catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
    expect((error as Stripe.errors.StripeError).statusCode).toBe(400);
  });

  it("replays a decline without charging again or emitting a second event", async () => {
    const intent = await stripe.paymentIntents.create({ amount: 3_000, currency: "usd" });
    const confirm = () =>
      stripe.paymentIntents
        .confirm(
          intent.id,
          { payment_method: "pm_card_chargeDeclined" },
          { idempotencyKey: `confirm-${intent.id}` },
        )
        .catch((caught: unknown) => caught as Stripe.errors.StripeError);
    const first = await confirm();
    const second = await confirm();
    expect(first).toBeInstanceOf(Stripe.errors.StripeCardError);
    expect(second).toBeInstanceOf(Stripe.errors.StripeCardError);
    expect((second as Stripe.errors.StripeError).headers?.["idempotent-replayed"]).toBe("true");
    const failures = standIn
      .events()
      .filter(
        (event) =>
          event.type === "payment_intent.payment_failed" && event.data.object.id === intent.id,
      );
    expect(failures).toHaveLength(1);
  });

  it("does not keep answers to rejected parameters, so a fixed retry with the same key works", async () => {
    const bad = await stripe.paymentIntents
      .create({ amount: 10, currency: "usd" }, { idempotencyKey: "order-2004" })
      .catch((caught: unknown) => caught);
    expect(bad).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    const retried = stripe.paymentIntents.create(
      { amount: 1_000, currency: "usd" },
      { idempotencyKey: "order-2004" },
    );
    await expect(retried).resolves.toMatchObject({ amount: 1_000 });
  });
});

import { and, count, eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import { orders, outbox, refunds, stockMovements } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { POST as quotePost } from "@/app/api/cart/quote/route";
import { POST as checkoutPost } from "@/app/api/checkout/route";
import { expireStaleReservations, RESERVATION_MS } from "@/lib/checkout/commands/orders";
import { getPayments } from "@/lib/checkout/payments";
import { resetDb } from "../../support/db";
import { startTestPayments } from "../../support/payments";
import { address, checkoutInput, guest, orderRow, pay, setStock, startCheckout, stockOf } from "./helpers";

// Guest checkout: no session.
vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => null }));

let payments: Awaited<ReturnType<typeof startTestPayments>>;
beforeAll(async () => {
  payments = await startTestPayments();
});
afterAll(async () => payments.close());

const noParams = { params: Promise.resolve({}) };
const post = (handler: typeof quotePost, body: unknown) =>
  handler(new Request("http://localhost/api", { method: "POST", body: JSON.stringify(body), headers: { "content-type": "application/json" } }), noParams);

describe("quote and checkout", () => {
  beforeEach(async () => {
    const db = await resetDb();
    await seedDemo(db);
  });

  it("prices from the database and ignores prices or totals sent by the client", async () => {
    const res = await post(quotePost, {
      items: [{ slug: "hollow-four", quantity: 2, priceCents: 1, unitPriceCents: 1 }],
      shipTo: { state: "AZ", zip: "85281" },
      method: "parcel",
      giftCents: 2500,
      totalCents: 100,
      subtotalCents: 1,
    });
    expect(res.status).toBe(200);
    const quote = await res.json();
    // Hollow Four: $149.00 each; carton 32×22×8.5 in → 32×22×9 = 6336 in³ / 139 = 45.6 → 46 lb billable (actual 19 lb) → the ≤50 lb tier ($38).
    expect(quote.subtotalCents).toBe(29800);
    expect(quote.shipping.parcels).toEqual([
      { slug: "hollow-four", billableLb: 46, cents: 3800 },
      { slug: "hollow-four", billableLb: 46, cents: 3800 },
    ]);
    // Arizona 5.6% on goods only: 29800 × 0.056 = 1668.8 → 1669.
    expect(quote.taxCents).toBe(1669);
    expect(quote.totalCents).toBe(29800 + 7600 + 1669 + 2500);
  });

  it("pickup ships nothing and a gift is never taxed", async () => {
    const res = await post(quotePost, { items: [{ slug: "twin-ridge", quantity: 1 }], method: "pickup", giftCents: 5000 });
    const quote = await res.json();
    expect(quote.shipping.cents).toBe(0);
    expect(quote.taxCents).toBe(0); // the center's own state (OR) has no sales tax
    expect(quote.totalCents).toBe(8900 + 5000);
  });

  for (const quantity of [0, -1, 11, 10 ** 9, 1.5]) {
    it(`refuses quantity ${quantity} with 400 and the field, and changes nothing`, async () => {
      const before = await stockOf("hollow-four");
      for (const handler of [quotePost, checkoutPost]) {
        const res = await post(handler, { items: [{ slug: "hollow-four", quantity }], method: "parcel", shipTo: { state: "AZ", zip: "85281" }, contact: guest, address });
        expect(res.status).toBe(400);
        const body = await res.json();
        expect(body.error.code).toBe("bad_request");
        expect(Object.keys(body.error.fields)).toContain("items.0.quantity");
      }
      expect(await stockOf("hollow-four")).toBe(before);
      const db = await getDb();
      expect((await db.select({ n: count() }).from(orders))[0]!.n).toBe(0);
    });
  }

  it("refuses a bad ZIP, an unknown state, a gift out of range and an unknown house", async () => {
    const cases: [unknown, string][] = [
      [{ items: [{ slug: "hollow-four", quantity: 1 }], method: "parcel", shipTo: { state: "AZ", zip: "8528" } }, "shipTo.zip"],
      [{ items: [{ slug: "hollow-four", quantity: 1 }], method: "parcel", shipTo: { state: "ZZ", zip: "85281" } }, "shipTo.state"],
      [{ items: [], method: "pickup", giftCents: 50 }, "giftCents"],
      [{ items: [], method: "pickup", giftCents: 1_000_001 }, "giftCents"],
      [{ items: [{ slug: "no-such-house", quantity: 1 }], method: "pickup" }, "items.0.slug"],
      [{ items: [{ slug: "wide-gap-prototype", quantity: 1 }], method: "pickup" }, "items.0.slug"],
    ];
    for (const [body, field] of cases) {
      const res = await post(quotePost, body);
      expect(res.status, field).toBe(400);
      expect(Object.keys((await res.json()).error.fields)).toContain(field);
    }
  });

  it("charges the amount computed from the database, with one PaymentIntent per order", async () => {
    const res = await post(checkoutPost, { ...checkoutInput({ items: [{ slug: "twin-ridge", quantity: 1 }], method: "pickup" }), totalCents: 1 });
    expect(res.status).toBe(200);
    const started = await res.json();
    expect(started.totalCents).toBe(8900);
    const order = await orderRow(started.orderId);
    const intent = await getPayments().paymentIntents.retrieve(order.paymentIntentId!);
    expect(intent.amount).toBe(8900);
    expect(intent.metadata.orderId).toBe(order.id);
    expect(started.clientSecret).toMatch(/^pi_.+_secret_/);
  });

  it("a declined card leaves the order payable; a good card then pays the same order", async () => {
    const { orderId } = await startCheckout(checkoutInput(), null);
    await expect(pay(orderId, "pm_card_chargeDeclined")).rejects.toMatchObject({ type: "StripeCardError", decline_code: "generic_decline" });
    await expect(pay(orderId, "pm_card_chargeDeclinedInsufficientFunds")).rejects.toMatchObject({ decline_code: "insufficient_funds" });
    await payments.standIn.webhooksIdle();
    expect((await orderRow(orderId)).status).toBe("pending_payment");
    const intent = await pay(orderId, "pm_card_visa");
    expect(intent.status).toBe("succeeded");
    await payments.standIn.webhooksIdle();
    expect((await orderRow(orderId)).status).toBe("paid");
  });

  it("an unpaid reservation expires after 30 minutes: stock back exactly once, PaymentIntent cancelled", async () => {
    const before = await stockOf("hollow-four");
    const now = new Date();
    const { orderId } = await startCheckout(checkoutInput({ items: [{ slug: "hollow-four", quantity: 3 }] }), null, now);
    expect(await stockOf("hollow-four")).toBe(before - 3);
    expect(await expireStaleReservations(new Date(now.getTime() + RESERVATION_MS - 1000))).toBe(0);
    const later = new Date(now.getTime() + RESERVATION_MS + 1000);
    const [a, b] = await Promise.all([expireStaleReservations(later), expireStaleReservations(later)]);
    expect(a + b).toBe(1);
    expect(await expireStaleReservations(later)).toBe(0);
    expect(await stockOf("hollow-four")).toBe(before);
    const order = await orderRow(orderId);
    expect(order.status).toBe("expired");
    expect((await getPayments().paymentIntents.retrieve(order.paymentIntentId!)).status).toBe("canceled");
    const db = await getDb();
    const released = await db.select({ n: count() }).from(stockMovements).where(and(eq(stockMovements.orderId, orderId), eq(stockMovements.kind, "released")));
    expect(released[0]!.n).toBe(1);
  });

  it("a payment for an expired reservation is refunded, never taken: the order stays expired and nothing is oversold", async () => {
    const now = new Date();
    const { orderId } = await startCheckout(checkoutInput({ items: [{ slug: "ember-five", quantity: 2 }] }), null, now);
    const order = await orderRow(orderId);
    // The reservation lapses (stock comes back) without cancelling the intent, then another buyer takes the stock.
    const { expireOrder } = await import("@/lib/checkout/commands/orders");
    await expireOrder(orderId, "test: lapsed");
    await setStock("ember-five", 0);
    await getPayments().paymentIntents.confirm(order.paymentIntentId!, { payment_method: "pm_card_visa" });
    await payments.standIn.webhooksIdle();
    const after = await orderRow(orderId);
    expect(after).toMatchObject({ status: "expired", paidAt: null, refundedCents: 0 });
    expect(await stockOf("ember-five")).toBe(0);
    const db = await getDb();
    const recorded = await db.select().from(refunds).where(eq(refunds.orderId, orderId));
    expect(recorded).toHaveLength(1);
    expect(recorded[0]).toMatchObject({ status: "succeeded", cause: "automatic", amountCents: order.totalCents });
    // The money is back with the buyer, once, and the buyer is told.
    const intent = await getPayments().paymentIntents.retrieve(order.paymentIntentId!);
    const charge = await getPayments().charges.retrieve(intent.latest_charge as string);
    expect(charge.amount_refunded).toBe(order.totalCents);
    const [mail] = await db.select().from(outbox).where(eq(outbox.dedupeKey, `payment-refunded:${orderId}`));
    expect(mail).toMatchObject({ kind: "payment-refunded", payload: { orderId, amountCents: order.totalCents } });
  });
});

import { and, count, eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { gifts, orders, outbox, refunds, stockMovements, webhookEvents } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { expireOrder } from "@/lib/checkout/commands/orders";
import { getPayments } from "@/lib/checkout/payments";
import { resetDb } from "../../support/db";
import { deliver, signPayload, startTestPayments } from "../../support/payments";
import { checkoutInput, orderRow, pay, startCheckout, stockOf } from "./helpers";

let payments: Awaited<ReturnType<typeof startTestPayments>>;
beforeAll(async () => {
  payments = await startTestPayments();
});
afterAll(async () => payments.close());

async function countRows(table: typeof webhookEvents | typeof outbox | typeof gifts) {
  const db = await resetDbless();
  const [row] = await db.select({ n: count() }).from(table);
  return row!.n;
}
async function resetDbless() {
  const { getDb } = await import("@/db/client");
  return getDb();
}

/** A signed event as the payment service would send it, for a PaymentIntent in a given state. */
async function eventFor(orderId: string, type: "payment_intent.succeeded" | "payment_intent.payment_failed", id: string) {
  const order = await orderRow(orderId);
  const intent = await getPayments().paymentIntents.retrieve(order.paymentIntentId!);
  const body = JSON.stringify({
    id,
    object: "event",
    type,
    api_version: "2024-06-20",
    created: Math.floor(Date.now() / 1000),
    livemode: false,
    data: { object: { ...intent, status: type.endsWith("succeeded") ? "succeeded" : "requires_payment_method" } },
  });
  return body;
}

describe("payment webhooks", () => {
  beforeEach(async () => {
    const db = await resetDb();
    await seedDemo(db);
  });

  it("a real delivery marks the order paid, sells the stock, records the gift and queues the messages once", async () => {
    const before = await stockOf("hollow-four");
    const { orderId, totalCents } = await startCheckout(checkoutInput({ items: [{ slug: "hollow-four", quantity: 2 }], giftCents: 2500 }), null);
    expect(await stockOf("hollow-four")).toBe(before - 2);
    const intent = await pay(orderId);
    expect(intent.status).toBe("succeeded");
    expect(intent.amount).toBe(totalCents);
    await payments.standIn.webhooksIdle();
    const order = await orderRow(orderId);
    expect(order.status).toBe("paid");
    expect(await stockOf("hollow-four")).toBe(before - 2);
    const db = await resetDbless();
    const [gift] = await db.select().from(gifts).where(eq(gifts.orderId, orderId));
    expect(gift?.amountCents).toBe(2500);
    const kinds = (await db.select({ kind: outbox.kind }).from(outbox)).map((r) => r.kind).sort();
    expect(kinds).toEqual(["gift-receipt", "install-guide", "order-confirmation"]);
  });

  it("refuses unsigned, tampered and 301-second-old deliveries with 400 and writes nothing", async () => {
    const { orderId } = await startCheckout(checkoutInput(), null);
    await pay(orderId);
    await payments.standIn.webhooksIdle();
    const before = await countRows(webhookEvents);
    const body = await eventFor(orderId, "payment_intent.succeeded", "evt_manual_1");
    expect((await deliver(body, null)).status).toBe(400);
    expect((await deliver(body.replace('"livemode":false', '"livemode":true'), signPayload(body))).status).toBe(400);
    expect((await deliver(body, signPayload(body, { secret: "whsec_someone_else" }))).status).toBe(400);
    const old = Math.floor(Date.now() / 1000) - 301;
    const stale = await deliver(body, signPayload(body, { at: old }));
    expect(stale.status).toBe(400);
    expect((await stale.json()).error.code).toBe("bad_request");
    expect(await countRows(webhookEvents)).toBe(before);
    // 299 s old is still inside the tolerance.
    expect((await deliver(body, signPayload(body, { at: Math.floor(Date.now() / 1000) - 299 }))).status).toBe(200);
  });

  it("the same event 5 times in a row and 5 times at once has one effect", async () => {
    for (const mode of ["sequential", "concurrent"] as const) {
      const { orderId } = await startCheckout(checkoutInput({ giftCents: 1000 }), null);
      await getPayments().paymentIntents.update((await orderRow(orderId)).paymentIntentId!, { metadata: { orderId } });
      const body = await eventFor(orderId, "payment_intent.succeeded", `evt_repeat_${mode}`);
      const sig = signPayload(body);
      const responses =
        mode === "sequential"
          ? await (async () => {
              const out: Response[] = [];
              for (let i = 0; i < 5; i++) out.push(await deliver(body, sig));
              return out;
            })()
          : await Promise.all(Array.from({ length: 5 }, () => deliver(body, sig)));
      expect(responses.map((r) => r.status)).toEqual([200, 200, 200, 200, 200]);
      const outcomes = await Promise.all(responses.map((r) => r.json()));
      expect(outcomes.filter((o) => o.outcome === "paid")).toHaveLength(1);
      const db = await resetDbless();
      const sold = await db.select({ n: count() }).from(stockMovements).where(and(eq(stockMovements.orderId, orderId), eq(stockMovements.kind, "sold")));
      expect(sold[0]!.n).toBe(1);
      const mails = await db.select({ n: count() }).from(outbox).where(eq(outbox.dedupeKey, `order-confirmation:${orderId}`));
      expect(mails[0]!.n).toBe(1);
      const giftRows = await db.select({ n: count() }).from(gifts).where(eq(gifts.orderId, orderId));
      expect(giftRows[0]!.n).toBe(1);
    }
  });

  it("failure then success: the stock is released, then held again, and the order is paid", async () => {
    const before = await stockOf("twin-ridge");
    const { orderId } = await startCheckout(checkoutInput({ items: [{ slug: "twin-ridge", quantity: 1 }] }), null);
    const failed = await eventFor(orderId, "payment_intent.payment_failed", "evt_fail_first");
    expect((await deliver(failed, signPayload(failed))).status).toBe(200);
    expect(await stockOf("twin-ridge")).toBe(before);
    const ok = await eventFor(orderId, "payment_intent.succeeded", "evt_success_second");
    expect((await deliver(ok, signPayload(ok))).status).toBe(200);
    expect((await orderRow(orderId)).status).toBe("paid");
    expect(await stockOf("twin-ridge")).toBe(before - 1);
  });

  it("success then failure: the late failure changes nothing", async () => {
    const before = await stockOf("twin-ridge");
    const { orderId } = await startCheckout(checkoutInput({ items: [{ slug: "twin-ridge", quantity: 1 }] }), null);
    const ok = await eventFor(orderId, "payment_intent.succeeded", "evt_success_first");
    await deliver(ok, signPayload(ok));
    const failed = await eventFor(orderId, "payment_intent.payment_failed", "evt_fail_second");
    const res = await deliver(failed, signPayload(failed));
    expect((await res.json()).outcome).toMatch(/ignored/);
    expect((await orderRow(orderId)).status).toBe("paid");
    expect(await stockOf("twin-ridge")).toBe(before - 1);
  });

  it("an event for an order not visible yet is answered 503 so the sender retries, and nothing is recorded", async () => {
    const body = JSON.stringify({
      id: "evt_orphan",
      object: "event",
      type: "payment_intent.succeeded",
      created: Math.floor(Date.now() / 1000),
      data: { object: { id: "pi_not_ours", object: "payment_intent", amount: 100, metadata: {} } },
    });
    const res = await deliver(body, signPayload(body));
    expect(res.status).toBe(503);
    expect(await countRows(webhookEvents)).toBe(0);
  });

  it("a payment for an expired checkout is refused by the state machine, answered 200, and refunded once", async () => {
    const before = await stockOf("twin-ridge");
    const { orderId } = await startCheckout(checkoutInput({ items: [{ slug: "twin-ridge", quantity: 1 }] }), null);
    expect(await expireOrder(orderId, "test: the 30 minutes ran out")).toBe(true);
    const expired = await orderRow(orderId);
    expect(await stockOf("twin-ridge")).toBe(before);
    // The buyer's card goes through after all (the houses are still on the shelf).
    await getPayments().paymentIntents.confirm(expired.paymentIntentId!, { payment_method: "pm_card_visa" });
    await payments.standIn.webhooksIdle();
    const after = await orderRow(orderId);
    expect(after).toMatchObject({ status: "expired", paidAt: null, refundedCents: 0, stockHeld: false });
    expect(await stockOf("twin-ridge")).toBe(before);
    const db = await resetDbless();
    const events = await db.select().from(webhookEvents).where(eq(webhookEvents.type, "payment_intent.succeeded"));
    expect(events.map((e) => e.outcome)).toEqual(["refunded-late-payment"]);
    // A second delivery of a success for the same payment (another event id) refunds nothing more.
    const again = await eventFor(orderId, "payment_intent.succeeded", "evt_late_again");
    const res = await deliver(again, signPayload(again));
    expect(res.status).toBe(200);
    const rows = await db.select().from(refunds).where(eq(refunds.orderId, orderId));
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: "succeeded", cause: "automatic", amountCents: expired.totalCents, idempotencyKey: `auto-refund-${orderId}` });
    const intent = await getPayments().paymentIntents.retrieve(expired.paymentIntentId!);
    const charge = await getPayments().charges.retrieve(intent.latest_charge as string);
    expect(charge.amount_refunded).toBe(expired.totalCents);
    expect(charge.refunds?.data).toHaveLength(1);
    const mail = (await db.select().from(outbox)).filter((m) => (m.payload as { orderId?: string }).orderId === orderId);
    expect(mail.map((m) => m.kind)).toEqual(["payment-refunded"]);
    expect(await db.select().from(gifts).where(eq(gifts.orderId, orderId))).toEqual([]);
  });

  it("a payment event for a refunded order is refused, answered 200, and changes nothing but the event's record", async () => {
    const { orderId } = await startCheckout(checkoutInput({ giftCents: 1000 }), null);
    await pay(orderId);
    await payments.standIn.webhooksIdle();
    const db = await resetDbless();
    // The order has since been refunded in full (set here directly: the test is about the webhook).
    await db.update(orders).set({ status: "refunded" }).where(eq(orders.id, orderId));
    const refunded = await orderRow(orderId);
    const mailBefore = await countRows(outbox);
    const body = await eventFor(orderId, "payment_intent.succeeded", "evt_for_refunded");
    const res = await deliver(body, signPayload(body));
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ received: true, duplicate: false, outcome: "refused: order is refunded (final_state)" });
    expect(await orderRow(orderId)).toEqual(refunded);
    const [recorded] = await db.select().from(webhookEvents).where(eq(webhookEvents.id, "evt_for_refunded"));
    expect(recorded?.processedAt).toBeInstanceOf(Date);
    expect(await countRows(outbox)).toBe(mailBefore);
    expect(await db.select().from(refunds).where(eq(refunds.orderId, orderId))).toEqual([]);
    const intent = await getPayments().paymentIntents.retrieve(refunded.paymentIntentId!);
    expect((await getPayments().charges.retrieve(intent.latest_charge as string)).amount_refunded).toBe(0);
    // The provider's retry of the same event finds it recorded and does nothing.
    expect(await (await deliver(body, signPayload(body))).json()).toMatchObject({ duplicate: true });
  });
});

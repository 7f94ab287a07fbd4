import { eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import { outbox, refunds } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { getPayments } from "@/lib/checkout/payments";
import { claimRefund, requestRefund, retryRequestedRefunds, submitRefund } from "@/lib/checkout/commands/refunds";
import { REFUND_CLAIM_LEASE_MS } from "@/lib/checkout/refund-rules";
import { resetDb } from "../../support/db";
import { startTestPayments } from "../../support/payments";
import { checkoutPaidOrder } from "../fulfillment/support";

// A refund is decided in a database transaction and sent to the payment service only after that
// commits (lib/checkout/commands/refunds.ts). The process may die at either gap; these tests cut
// it there and check that the sweeper neither loses the refund nor makes it twice.
vi.hoisted(() => {
  // The suite's payments port plus 37, so a run on other ports moves it too.
  const base = new URL(process.env.STRIPE_API_BASE ?? "http://localhost:12311");
  process.env.STRIPE_API_BASE = `http://localhost:${Number(base.port) + 37}`;
  const g = globalThis as Record<string, unknown>;
  delete g.__roostwrightEnv;
  delete g.__roostwrightStripe;
});
vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => null }));

let payments: Awaited<ReturnType<typeof startTestPayments>>;
beforeAll(async () => {
  payments = await startTestPayments();
});
afterAll(async () => payments.close());
beforeEach(async () => {
  await seedDemo(await resetDb());
});

const idle = () => payments.standIn.webhooksIdle();

async function paidOrder() {
  const order = await checkoutPaidOrder({ items: [{ slug: "twin-ridge", quantity: 1 }], method: "pickup", idle });
  expect(order.status).toBe("paid");
  return order;
}

/** Step 1 alone: the refund decided and committed, as an admin's cancel or a late payment does. */
async function decideRefund(order: Awaited<ReturnType<typeof paidOrder>>, amountCents: number) {
  const db = await getDb();
  return db.transaction((tx) =>
    requestRefund(tx, { order, paymentIntentId: order.paymentIntentId!, amountCents, cause: "refund", reason: "A test refund" }),
  );
}

async function refundedAtService(paymentIntentId: string) {
  const stripe = getPayments();
  const intent = await stripe.paymentIntents.retrieve(paymentIntentId);
  const charge = await stripe.charges.retrieve(String(intent.latest_charge));
  // Twice the amount here would be the second refund this guards against.
  return { amountRefunded: charge.amount_refunded };
}

async function refundMessages(orderId: string) {
  const db = await getDb();
  const rows = await db.select().from(outbox);
  return rows.filter((m) => m.kind === "refund" && JSON.stringify(m.payload).includes(orderId));
}

describe("a refund survives a crash", () => {
  it("between the commit and the call: the sweeper makes it once, and again changes nothing", async () => {
    const order = await paidOrder();
    const row = await decideRefund(order, 1500);
    // The process dies here: the row is requested, the service has not heard of it.
    expect(await refundedAtService(order.paymentIntentId!)).toEqual({ amountRefunded: 0 });

    const first = await retryRequestedRefunds({ now: new Date() });
    expect(first.succeeded).toBe(1);
    const second = await retryRequestedRefunds({ now: new Date(Date.now() + 10 * REFUND_CLAIM_LEASE_MS) });
    expect(second.succeeded + second.retrying + second.failed).toBe(0);

    expect(await refundedAtService(order.paymentIntentId!)).toEqual({ amountRefunded: 1500 });
    const db = await getDb();
    const [settled] = await db.select().from(refunds).where(eq(refunds.id, row.id));
    expect(settled).toMatchObject({ status: "succeeded", amountCents: 1500 });
    expect(settled!.providerRefundId).toMatch(/^re_/);
    expect(await refundMessages(order.id)).toHaveLength(1);
  });

  it("between the call and its record: the repeat under the same key is the same refund, not a second", async () => {
    const order = await paidOrder();
    const row = await decideRefund(order, 2000);
    const now = new Date();
    const claimed = await claimRefund({ id: row.id, now });
    expect(claimed).not.toBeNull();
    const answer = await submitRefund(claimed!);
    expect(answer.ok).toBe(true);
    // The process dies here: the money went back, the row still says requested.
    const db = await getDb();
    const [stuck] = await db.select().from(refunds).where(eq(refunds.id, row.id));
    expect(stuck!.status).toBe("requested");

    // While the lease holds, a second instance's sweep leaves it alone.
    const during = await retryRequestedRefunds({ now: new Date(now.getTime() + 1000) });
    expect(during.succeeded).toBe(0);
    // After it runs out, the sweep calls again with the same idempotency key and records it.
    const after = await retryRequestedRefunds({ now: new Date(now.getTime() + REFUND_CLAIM_LEASE_MS + 1000) });
    expect(after.succeeded).toBe(1);

    expect(await refundedAtService(order.paymentIntentId!)).toEqual({ amountRefunded: 2000 });
    const [settled] = await db.select().from(refunds).where(eq(refunds.id, row.id));
    expect(settled).toMatchObject({ status: "succeeded", providerRefundId: answer.ok ? answer.providerRefundId : "" });
    expect(await refundMessages(order.id)).toHaveLength(1);
  });
});

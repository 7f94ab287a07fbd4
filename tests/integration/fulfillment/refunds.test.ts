import { count, eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import { houseModels, refunds } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import type { SessionUser } from "@/lib/auth/session";
import { POST as cancelPost } from "@/app/api/fulfillment/orders/[id]/cancel/route";
import { POST as refundPost } from "@/app/api/fulfillment/orders/[id]/refund/route";
import { getPayments } from "@/lib/checkout/payments";
import { packOrder, shipBox, transitionOrder } from "@/lib/fulfillment/commands/transitions";
import { resetDb } from "../../support/db";
import { startTestPayments } from "../../support/payments";
import { boxesOf, checkoutPaidOrder, demoUser, orderById, outboxFor, UPS_NUMBER } from "./support";

// Admin money buttons: cancel an unshipped order (refund in full through the payments SDK, stock
// back through the ledger) and refund a shipped one without taking stock back.
vi.hoisted(() => {
  // The suite's payments port plus 31 (12342 by default), so a run on other ports moves it too.
  const base = new URL(process.env.STRIPE_API_BASE ?? "http://localhost:12311");
  process.env.STRIPE_API_BASE = `http://localhost:${Number(base.port) + 31}`;
  const g = globalThis as Record<string, unknown>;
  delete g.__roostwrightEnv;
  delete g.__roostwrightStripe;
});
const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => session.user }));

let payments: Awaited<ReturnType<typeof startTestPayments>>;
beforeAll(async () => {
  payments = await startTestPayments();
});
afterAll(async () => payments.close());
beforeEach(async () => {
  await seedDemo(await resetDb());
  session.user = await demoUser("admin");
});

const json = (body: unknown): RequestInit => ({ method: "POST", body: JSON.stringify(body), headers: { "content-type": "application/json" } });
const id = (orderId: string) => ({ params: Promise.resolve({ id: orderId }) });
const idle = () => payments.standIn.webhooksIdle();

async function stockOf(slug: string) {
  const db = await getDb();
  const [row] = await db.select({ stock: houseModels.stock }).from(houseModels).where(eq(houseModels.slug, slug));
  return row!.stock;
}

describe("cancel", () => {
  it("refunds an order on the packing bench in full and puts its houses back", async () => {
    const before = await stockOf("twin-ridge");
    const order = await checkoutPaidOrder({ items: [{ slug: "twin-ridge", quantity: 2 }], method: "pickup", idle });
    expect(await stockOf("twin-ridge")).toBe(before - 2);
    await transitionOrder({ orderId: order.id, version: order.version, to: "packing", actor: session.user! });

    const res = await cancelPost(new Request("http://localhost/x", json({ version: order.version + 1, reason: "Buyer moved away" })), id(order.id));
    expect(res.status).toBe(200);
    const after = await orderById(order.id);
    expect(after).toMatchObject({ status: "cancelled", refundedCents: order.totalCents });
    expect(await stockOf("twin-ridge")).toBe(before);
    // The payment service holds the refund too, not just our table.
    const db = await getDb();
    const recorded = await db.select().from(refunds).where(eq(refunds.orderId, order.id));
    expect(recorded).toHaveLength(1);
    const held = await getPayments().refunds.retrieve(recorded[0]!.providerRefundId!);
    expect(held).toMatchObject({ amount: order.totalCents, payment_intent: order.paymentIntentId, status: "succeeded" });
    expect((await outboxFor(order.id)).some((m) => m.kind === "refund")).toBe(true);
  });

  it("is refused to a shipping volunteer, for a stale screen, and once the order has shipped", async () => {
    const order = await checkoutPaidOrder({ items: [{ slug: "twin-ridge", quantity: 1 }], method: "parcel", idle });
    const admin = session.user!;
    session.user = await demoUser("fulfillment");
    expect((await cancelPost(new Request("http://localhost/x", json({ version: order.version, reason: "Not mine to do" })), id(order.id))).status).toBe(403);
    session.user = admin;
    const stale = await cancelPost(new Request("http://localhost/x", json({ version: order.version + 7, reason: "Old tab" })), id(order.id));
    expect(stale.status).toBe(409);

    await transitionOrder({ orderId: order.id, version: order.version, to: "packing", actor: admin });
    await packOrder({ orderId: order.id, version: order.version + 1, boxes: [{ description: "Twin Ridge", lengthIn: 27, widthIn: 18, heightIn: 7, weightLb: 12 }], actor: admin });
    const [box] = await boxesOf(order.id);
    await shipBox({ orderId: order.id, parcelId: box!.id, version: order.version + 2, carrier: "ups", service: "Ground", trackingNumber: UPS_NUMBER, actor: admin });
    const late = await cancelPost(new Request("http://localhost/x", json({ version: order.version + 3, reason: "Too late" })), id(order.id));
    expect(late.status).toBe(409);
    expect((await late.json()).error.message).toMatch(/can't go to "Cancelled"/);
  });
});

describe("refund after shipping", () => {
  it("refunds part of a shipped order, keeps its state and takes no stock back", async () => {
    const order = await checkoutPaidOrder({ items: [{ slug: "twin-ridge", quantity: 1 }], method: "parcel", idle });
    const admin = session.user!;
    await transitionOrder({ orderId: order.id, version: order.version, to: "packing", actor: admin });
    await packOrder({ orderId: order.id, version: order.version + 1, boxes: [{ description: "Twin Ridge", lengthIn: 27, widthIn: 18, heightIn: 7, weightLb: 12 }], actor: admin });
    const [box] = await boxesOf(order.id);
    await shipBox({ orderId: order.id, parcelId: box!.id, version: order.version + 2, carrier: "ups", service: "Ground", trackingNumber: UPS_NUMBER, actor: admin });
    const stock = await stockOf("twin-ridge");

    const noReason = await refundPost(new Request("http://localhost/x", json({ version: order.version + 3, amount: "10", reason: "" })), id(order.id));
    expect(noReason.status).toBe(400);
    const res = await refundPost(new Request("http://localhost/x", json({ version: order.version + 3, amount: "12.50", reason: "Box arrived dented" })), id(order.id));
    expect(res.status).toBe(200);
    expect(await orderById(order.id)).toMatchObject({ status: "shipped", refundedCents: 1250 });
    expect(await stockOf("twin-ridge")).toBe(stock);
    const db = await getDb();
    const [row] = await db.select({ n: count() }).from(refunds).where(eq(refunds.orderId, order.id));
    expect(row!.n).toBe(1);
  });

  it("sends an unshipped order to cancel instead", async () => {
    const order = await checkoutPaidOrder({ items: [{ slug: "twin-ridge", quantity: 1 }], method: "pickup", idle });
    const res = await refundPost(new Request("http://localhost/x", json({ version: order.version, reason: "Wrong button" })), id(order.id));
    expect(res.status).toBe(409);
    expect((await res.json()).error.message).toMatch(/Cancel it instead/);
  });
});

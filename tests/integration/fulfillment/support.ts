import { eq, inArray } from "drizzle-orm";
import { getDb } from "@/db/client";
import { houseModels, orderEvents, orderLines, orders, outbox, parcels, users } from "@/db/schema";
import type { SessionUser } from "@/lib/auth/session";
import { billableWeightLb } from "@/lib/checkout/billable-weight";
import { startCheckout } from "@/lib/checkout/commands/orders";
import { getPayments } from "@/lib/checkout/payments";

// Orders for the fulfillment tests. `insertPaidOrder` writes a paid order straight to the
// database (fast; no money moves); `checkoutPaidOrder` goes through checkout, the payments
// stand-in and the signed webhook, for tests that refund.

export type Item = { slug: string; quantity: number };

export async function demoUser(role: SessionUser["role"]): Promise<SessionUser> {
  const db = await getDb();
  const [row] = await db.select().from(users).where(eq(users.role, role)).limit(1);
  if (!row) throw new Error(`no demo ${role}`);
  return { id: row.id, name: row.name, email: row.email, role: row.role };
}

let counter = 0;

export async function insertPaidOrder({
  items = [{ slug: "hollow-four", quantity: 1 }],
  method = "parcel",
  name = "Wren Alcott",
  status = "paid",
  paidAt = new Date(),
}: {
  items?: Item[];
  method?: "parcel" | "pickup" | "none";
  name?: string;
  status?: (typeof orders.$inferInsert)["status"];
  paidAt?: Date;
} = {}) {
  const db = await getDb();
  const models = items.length
    ? await db.select().from(houseModels).where(inArray(houseModels.slug, items.map((i) => i.slug)))
    : [];
  const subtotal = items.reduce((sum, i) => sum + i.quantity * (models.find((m) => m.slug === i.slug)?.priceCents ?? 0), 0);
  counter += 1;
  const [order] = await db
    .insert(orders)
    .values({
      email: `buyer${counter}@example.org`,
      name,
      accessToken: `token-${counter}-${Date.now()}`,
      status,
      method,
      shipTo: method === "parcel" ? { name, line1: "4 Quarry Lane", line2: "", city: "Fernbrook", state: "WI", zip: "53703" } : null,
      subtotalCents: subtotal,
      shippingCents: 0,
      taxCents: 0,
      giftCents: method === "none" ? 2500 : 0,
      totalCents: subtotal + (method === "none" ? 2500 : 0),
      paidAt,
    })
    .returning();
  for (const item of items) {
    const model = models.find((m) => m.slug === item.slug)!;
    const carton = { lengthIn: model.cartonLengthIn, widthIn: model.cartonWidthIn, heightIn: model.cartonHeightIn, weightLb: model.cartonWeightLb };
    await db.insert(orderLines).values({
      orderId: order!.id,
      modelId: model.id,
      slug: model.slug,
      name: model.name,
      unitPriceCents: model.priceCents,
      quantity: item.quantity,
      billableLb: billableWeightLb(carton).billableLb,
    });
  }
  await db.insert(orderEvents).values({ orderId: order!.id, fromStatus: "pending_payment", toStatus: "paid", note: "Payment received" });
  return order!;
}

export async function orderById(id: string) {
  const db = await getDb();
  const [row] = await db.select().from(orders).where(eq(orders.id, id));
  return row!;
}

export async function boxesOf(orderId: string) {
  const db = await getDb();
  return db.select().from(parcels).where(eq(parcels.orderId, orderId)).orderBy(parcels.createdAt);
}

export async function outboxFor(orderId: string) {
  const db = await getDb();
  const rows = await db.select().from(outbox);
  return rows.filter((r) => (r.payload as { orderId?: string }).orderId === orderId);
}

export async function eventsOf(orderId: string) {
  const db = await getDb();
  return db.select().from(orderEvents).where(eq(orderEvents.orderId, orderId)).orderBy(orderEvents.id);
}

/** A paid order made the way a buyer makes one: checkout, card payment, signed webhook. */
export async function checkoutPaidOrder({
  items,
  method,
  idle,
}: {
  items: Item[];
  method: "parcel" | "pickup";
  idle: () => Promise<void>;
}) {
  const contact = { name: "Odile Brannock", email: "odile@example.org" };
  const address = { name: contact.name, line1: "88 Millrace Road", line2: "", city: "Tempe", state: "AZ" as const, zip: "85281" };
  const started = await startCheckout({ items, method, giftCents: 0, contact, address: method === "parcel" ? address : undefined }, null);
  const order = await orderById(started.orderId);
  await getPayments().paymentIntents.confirm(order.paymentIntentId!, { payment_method: "pm_card_visa" });
  await idle();
  return orderById(started.orderId);
}

// Valid tracking numbers with correct check digits (see tests/unit/fulfillment/tracking.test.ts
// for their sources).
export const UPS_NUMBER = "1Z5R89390357567127";
export const USPS_NUMBER = "9400111201080805483016";

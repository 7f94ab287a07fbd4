import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { houseModels, orders } from "@/db/schema";
import { getPayments } from "@/lib/checkout/payments";
import { startCheckout } from "@/lib/checkout/commands/orders";
import type { CheckoutRequest } from "@/lib/checkout/schemas";

export const guest = { name: "Marisol Fenwick", email: "marisol@example.org" };
export const address = { name: "Marisol Fenwick", line1: "12 Heron Way", line2: "", city: "Tempe", state: "AZ" as const, zip: "85281" };

export function checkoutInput(partial: Partial<CheckoutRequest> = {}): CheckoutRequest {
  return { items: [{ slug: "hollow-four", quantity: 1 }], method: "parcel", giftCents: 0, contact: guest, address, ...partial };
}

export async function stockOf(slug: string): Promise<number> {
  const db = await getDb();
  const [row] = await db.select({ stock: houseModels.stock }).from(houseModels).where(eq(houseModels.slug, slug));
  return row!.stock;
}

export async function setStock(slug: string, stock: number) {
  const db = await getDb();
  await db.update(houseModels).set({ stock }).where(eq(houseModels.slug, slug));
}

export async function orderRow(id: string) {
  const db = await getDb();
  const [row] = await db.select().from(orders).where(eq(orders.id, id));
  return row!;
}

/** Pays an order's PaymentIntent with a test payment method through the SDK, as the browser would. */
export async function pay(orderId: string, paymentMethod = "pm_card_visa") {
  const order = await orderRow(orderId);
  return getPayments().paymentIntents.confirm(order.paymentIntentId!, { payment_method: paymentMethod });
}

export { startCheckout };

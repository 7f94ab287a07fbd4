import "server-only";
import { asc, desc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { orderEvents, orderLines, orders, refunds } from "@/db/schema";

export async function getOrderLines({ orderId }: { orderId: string }) {
  const db = await getDb();
  return db.select().from(orderLines).where(eq(orderLines.orderId, orderId)).orderBy(asc(orderLines.name));
}

export async function getOrderHistory({ orderId }: { orderId: string }) {
  const db = await getDb();
  return db.select().from(orderEvents).where(eq(orderEvents.orderId, orderId)).orderBy(asc(orderEvents.createdAt), asc(orderEvents.id));
}

export async function getOrderRefunds({ orderId }: { orderId: string }) {
  const db = await getDb();
  return db.select().from(refunds).where(eq(refunds.orderId, orderId)).orderBy(asc(refunds.createdAt));
}

/** A signed-in buyer's own orders, newest first (never anyone else's). */
export async function listOrdersForUser({ userId }: { userId: string }) {
  const db = await getDb();
  return db
    .select({ id: orders.id, number: orders.number, status: orders.status, totalCents: orders.totalCents, giftCents: orders.giftCents, createdAt: orders.createdAt, method: orders.method })
    .from(orders)
    .where(eq(orders.userId, userId))
    .orderBy(desc(orders.createdAt))
    .limit(100);
}

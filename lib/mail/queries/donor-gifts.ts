import "server-only";
import { desc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { gifts, orders } from "@/db/schema";
import { formatOrderNumber } from "@/lib/checkout/order-number";

// A signed-in donor's own gifts. Only gifts made while signed in count (gifts.userId): a guest
// gift under the same e-mail address is not shown, since an address typed at checkout proves
// nothing about who typed it.

export type DonorGift = { orderId: string; orderNumber: string; date: Date; amountCents: number };

export async function listGiftsForUser({ userId }: { userId: string }): Promise<DonorGift[]> {
  const db = await getDb();
  const rows = await db
    .select({
      orderId: gifts.orderId,
      number: orders.number,
      date: gifts.receivedAt,
      amountCents: gifts.amountCents,
    })
    .from(gifts)
    .innerJoin(orders, eq(orders.id, gifts.orderId))
    .where(eq(gifts.userId, userId))
    .orderBy(desc(gifts.receivedAt));
  return rows.map((row) => ({
    orderId: row.orderId,
    orderNumber: formatOrderNumber(row.number),
    date: row.date,
    amountCents: row.amountCents,
  }));
}

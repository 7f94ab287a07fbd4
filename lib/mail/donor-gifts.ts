import "server-only";
import { desc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { gifts, orders, outbox } from "@/db/schema";
import { formatOrderNumber } from "@/lib/checkout/order-number";
import { kickMailSender } from "./kick";
import { enqueueEmail } from "./outbox";

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

/**
 * Queues a year-end statement e-mail. Asking again the same day sends nothing new (one per
 * person, year and day), so an impatient double click does not send two.
 */
export async function requestYearEndStatement({
  userId,
  email,
  year,
  now = new Date(),
}: {
  userId: string;
  email: string;
  year: number;
  now?: Date;
}): Promise<{ queued: boolean }> {
  const db = await getDb();
  const dedupeKey = `year-end-statement:${userId}:${year}:${now.toISOString().slice(0, 10)}`;
  const queued = await db.transaction(async (tx) => {
    const [existing] = await tx
      .select({ id: outbox.id })
      .from(outbox)
      .where(eq(outbox.dedupeKey, dedupeKey));
    if (existing) return false;
    await enqueueEmail(tx, {
      dedupeKey,
      kind: "year-end-statement",
      to: email,
      subject: `Your gifts in ${year}: year-end statement`,
      payload: { userId, year, issuedOn: now.toISOString() },
    });
    return true;
  });
  if (queued) kickMailSender();
  return { queued };
}

import "server-only";
import { asc, desc, eq } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db/client";
import { giftDedications, gifts, givingSettings, monthlyGifts, orders, type GiftDedicationRow, type MonthlyGiftRow } from "@/db/schema";
import { DEFAULT_CENTER_TIME_ZONE } from "./center-time";
import type { GivingSettings } from "./settings-schema";

export const DEFAULT_GIVING_SETTINGS: GivingSettings = {
  timeZone: DEFAULT_CENTER_TIME_ZONE,
  feeBasisPoints: 290,
  feeFixedCents: 30,
  leadTimeWeeks: 6,
};

/** The center's giving settings, or the defaults when the admin has not saved any. */
export async function getGivingSettings(tx?: DbOrTx): Promise<GivingSettings> {
  const db = tx ?? (await getDb());
  const [row] = await db.select().from(givingSettings).where(eq(givingSettings.id, 1));
  if (!row) return { ...DEFAULT_GIVING_SETTINGS };
  return {
    timeZone: row.timeZone,
    feeBasisPoints: row.feeBasisPoints,
    feeFixedCents: row.feeFixedCents,
    leadTimeWeeks: row.leadTimeWeeks,
  };
}

/** The IANA zone whose calendar gives every gift its date and year. */
export async function getCenterTimeZone(tx?: DbOrTx): Promise<string> {
  return (await getGivingSettings(tx)).timeZone;
}

export async function findMonthlyGift(id: string, tx?: DbOrTx): Promise<MonthlyGiftRow | null> {
  const db = tx ?? (await getDb());
  const [row] = await db.select().from(monthlyGifts).where(eq(monthlyGifts.id, id));
  return row ?? null;
}

export async function findMonthlyGiftBySubscription(subscriptionId: string, tx?: DbOrTx): Promise<MonthlyGiftRow | null> {
  const db = tx ?? (await getDb());
  const [row] = await db.select().from(monthlyGifts).where(eq(monthlyGifts.subscriptionId, subscriptionId));
  return row ?? null;
}

/** True when a payment service customer is one of the monthly gifts' (their invoices' payments are recorded on invoice events). */
export async function isMonthlyGiftCustomer(customerId: string, tx?: DbOrTx): Promise<boolean> {
  const db = tx ?? (await getDb());
  const [row] = await db.select({ id: monthlyGifts.id }).from(monthlyGifts).where(eq(monthlyGifts.customerId, customerId)).limit(1);
  return Boolean(row);
}

export async function listMonthlyGiftsForUser(userId: string): Promise<MonthlyGiftRow[]> {
  const db = await getDb();
  return db.select().from(monthlyGifts).where(eq(monthlyGifts.userId, userId)).orderBy(desc(monthlyGifts.createdAt));
}

export async function findDedicationForMonthly(monthlyGiftId: string, tx?: DbOrTx): Promise<GiftDedicationRow | null> {
  const db = tx ?? (await getDb());
  const [row] = await db.select().from(giftDedications).where(eq(giftDedications.monthlyGiftId, monthlyGiftId));
  return row ?? null;
}

export async function findDedicationForOrder(orderId: string, tx?: DbOrTx): Promise<GiftDedicationRow | null> {
  const db = tx ?? (await getDb());
  const [row] = await db.select().from(giftDedications).where(eq(giftDedications.orderId, orderId));
  return row ?? null;
}

/** The gifts one monthly gift has recorded, one per paid invoice, oldest first. */
export async function listMonthlyGiftPayments(monthlyGiftId: string): Promise<{ orderId: string; accessToken: string; invoiceId: string | null; amountCents: number; receivedAt: Date }[]> {
  const db = await getDb();
  return db
    .select({ orderId: gifts.orderId, accessToken: orders.accessToken, invoiceId: gifts.invoiceId, amountCents: gifts.amountCents, receivedAt: gifts.receivedAt })
    .from(gifts)
    .innerJoin(orders, eq(orders.id, gifts.orderId))
    .where(eq(gifts.monthlyGiftId, monthlyGiftId))
    .orderBy(asc(gifts.receivedAt));
}

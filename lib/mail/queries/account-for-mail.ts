import "server-only";
import { and, asc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { emailPreferences, gifts, houseModels, orders, users } from "@/db/schema";
import { PermanentMailError } from "../payloads";

// What the account messages read at send time (lib/mail/compose-account.ts): the person, their
// gifts, their reminder choice, the model an alert is about. A record gone since the message was
// queued is a PermanentMailError: no retry brings it back.

export async function loadUser(db: DbOrTx, userId: string) {
  const [user] = await db
    .select({ id: users.id, name: users.name, email: users.email })
    .from(users)
    .where(eq(users.id, userId));
  if (!user) throw new PermanentMailError(`User ${userId} no longer exists.`);
  return user;
}

/** Every gift made while signed in, oldest first, for the year-end statement. */
export async function listGiftsForStatement({ db, userId }: { db: DbOrTx; userId: string }) {
  return db
    .select({
      date: gifts.receivedAt,
      amountCents: gifts.amountCents,
      orderId: gifts.orderId,
      number: orders.number,
    })
    .from(gifts)
    .innerJoin(orders, eq(orders.id, gifts.orderId))
    .where(eq(gifts.userId, userId))
    .orderBy(asc(gifts.receivedAt));
}

/** The person's reminder choice, or null when they turned reminders off. */
export async function findReminderSubscription({ db, userId }: { db: DbOrTx; userId: string }) {
  const [preferences] = await db
    .select()
    .from(emailPreferences)
    .where(and(eq(emailPreferences.userId, userId), eq(emailPreferences.seasonalReminders, true)));
  return preferences ?? null;
}

export async function findModelForAlert({ db, modelId }: { db: DbOrTx; modelId: string }) {
  const [model] = await db
    .select({ name: houseModels.name, slug: houseModels.slug })
    .from(houseModels)
    .where(eq(houseModels.id, modelId));
  return model ?? null;
}

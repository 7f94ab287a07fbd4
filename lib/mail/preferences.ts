import "server-only";
import { randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db/client";
import { emailPreferences } from "@/db/schema";

// A customer's e-mail choices. Seasonal reminders are off until the customer turns them on
// (opt-in). Each row carries an unguessable token for the one-click unsubscribe link, which must
// work without signing in (RFC 8058), so the token alone names the subscription.

function newUnsubscribeToken(): string {
  return randomBytes(24).toString("base64url");
}

export async function getEmailPreferences({
  userId,
}: {
  userId: string;
}): Promise<{ seasonalReminders: boolean }> {
  const db = await getDb();
  const [row] = await db
    .select({ seasonalReminders: emailPreferences.seasonalReminders })
    .from(emailPreferences)
    .where(eq(emailPreferences.userId, userId));
  return { seasonalReminders: row?.seasonalReminders ?? false };
}

export async function setSeasonalReminders({
  db,
  userId,
  on,
}: {
  db?: DbOrTx;
  userId: string;
  on: boolean;
}): Promise<void> {
  const handle = db ?? (await getDb());
  await handle
    .insert(emailPreferences)
    .values({ userId, seasonalReminders: on, unsubscribeToken: newUnsubscribeToken() })
    .onConflictDoUpdate({ target: emailPreferences.userId, set: { seasonalReminders: on } });
}

/** Looks a token up without changing anything: the unsubscribe page shows whom it is for first. */
export async function findSubscriptionByToken({
  token,
}: {
  token: string;
}): Promise<{ seasonalReminders: boolean } | null> {
  if (token.length < 16 || token.length > 100) return null;
  const db = await getDb();
  const [row] = await db
    .select({ seasonalReminders: emailPreferences.seasonalReminders })
    .from(emailPreferences)
    .where(eq(emailPreferences.unsubscribeToken, token));
  return row ?? null;
}

/** One click, no sign-in: turns seasonal reminders off for the token's owner. Repeating it is harmless. */
export async function unsubscribeByToken({
  token,
}: {
  token: string;
}): Promise<"unsubscribed" | "unknown"> {
  if (token.length < 16 || token.length > 100) return "unknown";
  const db = await getDb();
  const [row] = await db
    .update(emailPreferences)
    .set({ seasonalReminders: false })
    .where(eq(emailPreferences.unsubscribeToken, token))
    .returning({ userId: emailPreferences.userId });
  return row ? "unsubscribed" : "unknown";
}

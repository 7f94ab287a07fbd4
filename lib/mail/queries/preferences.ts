import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { emailPreferences } from "@/db/schema";

// A customer's e-mail choices. Seasonal reminders are off until the customer turns them on
// (opt-in). Each row carries an unguessable token for the one-click unsubscribe link, which must
// work without signing in (RFC 8058), so the token alone names the subscription.

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

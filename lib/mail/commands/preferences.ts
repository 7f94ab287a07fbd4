import "server-only";
import { randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db/client";
import { emailPreferences } from "@/db/schema";

// Changing a customer's e-mail choices (reads: lib/mail/queries/preferences.ts). Seasonal
// reminders are opt-in; each row carries the unguessable token of its one-click unsubscribe link.

function newUnsubscribeToken(): string {
  return randomBytes(24).toString("base64url");
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

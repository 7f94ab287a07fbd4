import "server-only";
import { count, eq, like } from "drizzle-orm";
import { getDb } from "@/db/client";
import { emailPreferences, outbox, users } from "@/db/schema";
import { getUpkeepSeason } from "../upkeep-calendar";
import { enqueueEmail } from "./outbox";
import { findDueReminder, type DueReminder } from "../seasons";

/**
 * Queues the seasonal reminder that is due on `now` for every customer who asked for reminders.
 * Run once a day (instrumentation.ts); the dedupe key `seasonal:<season>:<user>` makes every
 * later run in the same window, and every other app instance, a no-op for that person.
 */
export async function queueSeasonalReminders({ now = new Date() }: { now?: Date } = {}): Promise<{
  reminder: DueReminder | null;
  queued: number;
}> {
  const reminder = findDueReminder({ date: now });
  if (!reminder) return { reminder: null, queued: 0 };
  const season = getUpkeepSeason({ id: reminder.season });
  const db = await getDb();
  const prefix = `seasonal:${reminder.seasonKey}:`;
  return db.transaction(async (tx) => {
    const countQueued = async () =>
      (
        await tx
          .select({ n: count() })
          .from(outbox)
          .where(like(outbox.dedupeKey, `${prefix}%`))
      )[0]?.n ?? 0;
    const before = await countQueued();
    const subscribers = await tx
      .select({ id: users.id, email: users.email })
      .from(emailPreferences)
      .innerJoin(users, eq(users.id, emailPreferences.userId))
      .where(eq(emailPreferences.seasonalReminders, true));
    for (const user of subscribers) {
      await enqueueEmail(tx, {
        dedupeKey: `${prefix}${user.id}`,
        kind: "seasonal-reminder",
        to: user.email,
        subject: `${season.title} for your bat house (${season.months})`,
        payload: { userId: user.id, reminderId: reminder.id, seasonKey: reminder.seasonKey },
      });
    }
    return { reminder, queued: (await countQueued()) - before };
  });
}

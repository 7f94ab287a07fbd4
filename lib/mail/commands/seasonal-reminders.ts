import "server-only";
import { count, eq, like, lt, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { emailPreferences, outbox, sites, users } from "@/db/schema";
import type { Hemisphere } from "@/lib/climate/warmest-month";
import { getUpkeepSeason } from "../upkeep-calendar";
import { enqueueEmail } from "./outbox";
import { findDueReminder, type DueReminder } from "../seasons";

/**
 * Queues the seasonal reminder that is due on `now` for every customer who asked for reminders,
 * by the hemisphere of their saved sites (south of the equator when any saved site lies there;
 * PRODUCT.md §7: seasons follow the site). Run once a day (instrumentation.ts); the dedupe key
 * `seasonal:<season>:<user>` makes every later run in the same window, and every other app
 * instance, a no-op for that person.
 */
export async function queueSeasonalReminders({ now = new Date() }: { now?: Date } = {}): Promise<{
  reminder: DueReminder | null;
  queued: number;
}> {
  const due = (["north", "south"] as const).map((hemisphere) => findDueReminder({ date: now, hemisphere }));
  if (due.every((d) => d === null)) return { reminder: null, queued: 0 };
  const db = await getDb();
  return db.transaction(async (tx) => {
    const southern = new Set(
      (
        await tx
          .selectDistinct({ userId: sites.userId })
          .from(sites)
          .where(lt(sql`(${sites.input}->>'lat')::double precision`, 0))
      ).flatMap((r) => (r.userId ? [r.userId] : [])),
    );
    const subscribers = await tx
      .select({ id: users.id, email: users.email })
      .from(emailPreferences)
      .innerJoin(users, eq(users.id, emailPreferences.userId))
      .where(eq(emailPreferences.seasonalReminders, true));
    let queued = 0;
    let first: DueReminder | null = null;
    for (const reminder of due) {
      if (!reminder) continue;
      first ??= reminder;
      const hemisphere: Hemisphere = reminder.hemisphere;
      const season = getUpkeepSeason({ id: reminder.season, hemisphere });
      const prefix = `seasonal:${reminder.seasonKey}:`;
      const countQueued = async () =>
        (
          await tx
            .select({ n: count() })
            .from(outbox)
            .where(like(outbox.dedupeKey, `${prefix}%`))
        )[0]?.n ?? 0;
      const before = await countQueued();
      for (const user of subscribers) {
        if ((southern.has(user.id) ? "south" : "north") !== hemisphere) continue;
        await enqueueEmail(tx, {
          dedupeKey: `${prefix}${user.id}`,
          kind: "seasonal-reminder",
          to: user.email,
          subject: `${season.title} for your bat house (${season.months})`,
          payload: { userId: user.id, reminderId: reminder.id, seasonKey: reminder.seasonKey, hemisphere },
        });
      }
      queued += (await countQueued()) - before;
    }
    return { reminder: first, queued };
  });
}

import type { UpkeepSeasonId } from "./upkeep-calendar";

// When the seasonal upkeep reminders go out. A reminder is worth sending only while there is
// still time to act on it, so each has a window at the start of its season (dates in UTC, the
// clock the scheduler keeps; both ends included). The seasons follow PRODUCT.md §7: upkeep in
// winter while the house is empty, finished before the bats return, and quiet in the maternity
// season, roughly April to mid-August. The window lengths are common practice, no source.
// U.S. store: northern-hemisphere seasons only.

export const REMINDER_IDS = ["winter-check", "spring-return", "quiet-time"] as const;
export type ReminderId = (typeof REMINDER_IDS)[number];

type MonthDay = { month: number; day: number };
type Window = { id: ReminderId; season: UpkeepSeasonId; from: MonthDay; to: MonthDay };

export const REMINDER_WINDOWS: readonly Window[] = [
  // Crosses the new year: December 1 to January 31; February is left for the work itself.
  { id: "winter-check", season: "winter", from: { month: 12, day: 1 }, to: { month: 1, day: 31 } },
  { id: "spring-return", season: "spring", from: { month: 3, day: 1 }, to: { month: 3, day: 20 } },
  { id: "quiet-time", season: "maternity", from: { month: 4, day: 1 }, to: { month: 4, day: 30 } },
];

export type DueReminder = {
  id: ReminderId;
  season: UpkeepSeasonId;
  /** One per season and year, e.g. "winter-check-2026" for December 2026 to January 2027. */
  seasonKey: string;
};

function ordinal({ month, day }: MonthDay): number {
  return month * 100 + day;
}

/** The reminder due on a date, or null between windows. */
export function findDueReminder({ date }: { date: Date }): DueReminder | null {
  if (Number.isNaN(date.getTime())) throw new RangeError("findDueReminder needs a valid date.");
  const today = { month: date.getUTCMonth() + 1, day: date.getUTCDate() };
  const year = date.getUTCFullYear();
  for (const window of REMINDER_WINDOWS) {
    const wraps = ordinal(window.from) > ordinal(window.to);
    const inside = wraps
      ? ordinal(today) >= ordinal(window.from) || ordinal(today) <= ordinal(window.to)
      : ordinal(today) >= ordinal(window.from) && ordinal(today) <= ordinal(window.to);
    if (!inside) continue;
    // A window that crosses the new year is named for the year it starts in.
    const startYear = wraps && ordinal(today) <= ordinal(window.to) ? year - 1 : year;
    return { id: window.id, season: window.season, seasonKey: `${window.id}-${startYear}` };
  }
  return null;
}

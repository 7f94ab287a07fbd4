import type { Hemisphere } from "@/lib/climate/warmest-month";
import type { UpkeepSeasonId } from "./upkeep-calendar";

// When the seasonal upkeep reminders go out. A reminder is worth sending only while there is
// still time to act on it, so each has a window at the start of its season (dates in UTC, the
// clock the scheduler keeps; both ends included). The seasons follow PRODUCT.md §7: upkeep in
// winter while the house is empty, finished before the bats return, and quiet in the maternity
// season, roughly April to mid-August. The window lengths are common practice, no source.
// South of the equator each window falls six months later (PRODUCT.md §7: seasons follow the site).

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
  hemisphere: Hemisphere;
  /** One per season, year and hemisphere, e.g. "winter-check-2026" for December 2026 to January 2027 (north), "winter-check-south-2026" for June–July 2026. */
  seasonKey: string;
};

/** The same month-day six months on (south of the equator); days past a month's end clamp to its last day. */
function shiftSixMonths({ month, day }: MonthDay): MonthDay {
  const shifted = ((month + 5) % 12) + 1;
  const last = [31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31][shifted - 1] ?? 31;
  return { month: shifted, day: Math.min(day, last) };
}

/** The reminder windows for a hemisphere. */
export function reminderWindowsFor(hemisphere: Hemisphere): readonly Window[] {
  if (hemisphere === "north") return REMINDER_WINDOWS;
  return REMINDER_WINDOWS.map((w) => ({ ...w, from: shiftSixMonths(w.from), to: shiftSixMonths(w.to) }));
}

function ordinal({ month, day }: MonthDay): number {
  return month * 100 + day;
}

/** The reminder due on a date for a hemisphere, or null between windows. */
export function findDueReminder({ date, hemisphere = "north" }: { date: Date; hemisphere?: Hemisphere }): DueReminder | null {
  if (Number.isNaN(date.getTime())) throw new RangeError("findDueReminder needs a valid date.");
  const today = { month: date.getUTCMonth() + 1, day: date.getUTCDate() };
  const year = date.getUTCFullYear();
  for (const window of reminderWindowsFor(hemisphere)) {
    const wraps = ordinal(window.from) > ordinal(window.to);
    const inside = wraps
      ? ordinal(today) >= ordinal(window.from) || ordinal(today) <= ordinal(window.to)
      : ordinal(today) >= ordinal(window.from) && ordinal(today) <= ordinal(window.to);
    if (!inside) continue;
    // A window that crosses the new year is named for the year it starts in.
    const startYear = wraps && ordinal(today) <= ordinal(window.to) ? year - 1 : year;
    const key = hemisphere === "north" ? window.id : `${window.id}-south`;
    return { id: window.id, season: window.season, hemisphere, seasonKey: `${key}-${startYear}` };
  }
  return null;
}

// Dates on the shipping desk are the center's calendar days, not UTC ones: an order paid at
// 5 p.m. in Oregon belongs to that day's pile, though UTC has already turned the page.

/** The demo center is in Oregon. From memory: the IANA zone for U.S. Pacific time. */
export const STORE_TIME_ZONE = "America/Los_Angeles";

const DAY_MS = 24 * 60 * 60 * 1000;

function zoneParts(instant: Date, timeZone: string): Record<string, number> {
  const parts = new Intl.DateTimeFormat("en-US", {
    timeZone,
    hourCycle: "h23",
    year: "numeric",
    month: "2-digit",
    day: "2-digit",
    hour: "2-digit",
    minute: "2-digit",
    second: "2-digit",
  }).formatToParts(instant);
  return Object.fromEntries(parts.filter((p) => p.type !== "literal").map((p) => [p.type, Number(p.value)]));
}

/** Minutes the zone's wall clock is ahead of UTC at this instant (−420 for Pacific daylight time). */
export function zoneOffsetMinutes({ instant, timeZone }: { instant: Date; timeZone: string }): number {
  const p = zoneParts(instant, timeZone);
  const wall = Date.UTC(p.year ?? 0, (p.month ?? 1) - 1, p.day ?? 1, p.hour ?? 0, p.minute ?? 0, p.second ?? 0);
  return Math.round((wall - Math.floor(instant.getTime() / 1000) * 1000) / 60_000);
}

/** The instant a calendar day (YYYY-MM-DD) begins in the zone. */
export function startOfDayInZone({ day, timeZone }: { day: string; timeZone: string }): Date {
  const [y = NaN, m = NaN, d = NaN] = day.split("-").map(Number);
  const midnightUtc = Date.UTC(y, m - 1, d);
  if (!Number.isFinite(midnightUtc)) throw new RangeError(`Not a calendar day: "${day}".`);
  // Two passes: the offset at UTC midnight can differ from the one at local midnight on the day
  // the clocks change.
  let instant = midnightUtc - zoneOffsetMinutes({ instant: new Date(midnightUtc), timeZone }) * 60_000;
  instant = midnightUtc - zoneOffsetMinutes({ instant: new Date(instant), timeZone }) * 60_000;
  return new Date(instant);
}

/** A from/to pair of calendar days (both included) as a half-open range of instants. */
export function dayRangeInZone({
  from,
  to,
  timeZone = STORE_TIME_ZONE,
}: {
  from?: string;
  to?: string;
  timeZone?: string;
}): { start?: Date; end?: Date } {
  const range: { start?: Date; end?: Date } = {};
  if (from) range.start = startOfDayInZone({ day: from, timeZone });
  if (to) {
    const next = new Date(Date.parse(`${to}T00:00:00Z`) + DAY_MS).toISOString().slice(0, 10);
    range.end = startOfDayInZone({ day: next, timeZone });
  }
  return range;
}

const dateFormat = new Intl.DateTimeFormat("en-US", { timeZone: STORE_TIME_ZONE, dateStyle: "medium" });
const dateTimeFormat = new Intl.DateTimeFormat("en-US", {
  timeZone: STORE_TIME_ZONE,
  dateStyle: "medium",
  timeStyle: "short",
});

/** "Mar 3, 2026" on the center's calendar. */
export function formatStoreDate(date: Date | string): string {
  return dateFormat.format(new Date(date));
}

/** "Mar 3, 2026, 4:05 PM" on the center's clock. */
export function formatStoreDateTime(date: Date | string): string {
  return dateTimeFormat.format(new Date(date));
}

/** How long an order has waited, in the one unit a volunteer reads at a glance. */
export function formatWaiting({ since, now }: { since: Date | string; now: Date }): string {
  const minutes = Math.max(0, Math.floor((now.getTime() - new Date(since).getTime()) / 60_000));
  if (minutes < 60) return minutes <= 1 ? "just now" : `${minutes} min`;
  const hours = Math.floor(minutes / 60);
  if (hours < 48) return `${hours} h`;
  return `${Math.floor(hours / 24)} days`;
}

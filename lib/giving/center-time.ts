// The center's calendar (PRODUCT.md §6): a gift's date and year are the ones on the wall
// clock where the center is, not UTC's. A gift at 23:30 on December 31 in Oregon is already
// 07:30 on January 1 in UTC, and still belongs to the year it was made in.
// The zone arithmetic is the IANA time zone database as the runtime's Intl carries it.

/** The demo center is in Oregon: the IANA zone for U.S. Pacific time (from memory). */
export const DEFAULT_CENTER_TIME_ZONE = "America/Los_Angeles";

export type CenterDate = { year: number; month: number; day: number };

/** True when the runtime knows the IANA zone name. */
export function isTimeZone(name: string): boolean {
  if (!/^[A-Za-z_]+(\/[A-Za-z0-9_+-]+)*$/.test(name)) return false;
  try {
    new Intl.DateTimeFormat("en-US", { timeZone: name });
    return true;
  } catch {
    return false;
  }
}

/** The calendar date an instant falls on in the zone. */
export function centerDate(instant: Date, timeZone: string): CenterDate {
  if (Number.isNaN(instant.getTime())) throw new RangeError("Not a valid instant.");
  const parts = new Intl.DateTimeFormat("en-US", {
    timeZone,
    year: "numeric",
    month: "2-digit",
    day: "2-digit",
  }).formatToParts(instant);
  const read = (type: string) => Number(parts.find((p) => p.type === type)?.value);
  return { year: read("year"), month: read("month"), day: read("day") };
}

/** The calendar year an instant falls in, in the zone. */
export function centerYear(instant: Date, timeZone: string): number {
  return centerDate(instant, timeZone).year;
}

/** "2026-12-31" for the instant in the zone. */
export function centerDay(instant: Date, timeZone: string): string {
  const { year, month, day } = centerDate(instant, timeZone);
  return `${year}-${String(month).padStart(2, "0")}-${String(day).padStart(2, "0")}`;
}

/** "December 31, 2026": the date as a receipt prints it, in the zone. */
export function formatCenterDate(instant: Date, timeZone: string): string {
  return new Intl.DateTimeFormat("en-US", { dateStyle: "long", timeZone }).format(instant);
}

/** "2026-12" for the instant in the zone: the month a report counts it in. */
export function centerMonth(instant: Date, timeZone: string): string {
  return centerDay(instant, timeZone).slice(0, 7);
}

// The calendar side of the sun figures (PRODUCT.md §4): which days make the maternity season,
// which hemisphere a site is in, and when local solar noon falls. Pure; ./sun counts the minutes.
import { getTimes } from "suncalc";

/**
 * Season dates are fixed to one reference year so results never drift with "today". The sun's
 * declination on a given calendar date shifts by under 0.2° across the leap-year cycle, which
 * moves the daily total by a minute or two at most.
 */
export const SEASON_REFERENCE_YEAR = 2026;

export type Hemisphere = "north" | "south";

export type CalendarDate = { year: number; month: number; day: number };

/** Reads "YYYY-MM-DD" and refuses dates that do not exist (2026-02-30). */
export function parseCalendarDate(date: string): CalendarDate {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(date);
  if (!match) throw new RangeError(`Expected a date as YYYY-MM-DD, got "${date}"`);
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const probe = new Date(Date.UTC(year, month - 1, day));
  if (probe.getUTCMonth() !== month - 1 || probe.getUTCDate() !== day) {
    throw new RangeError(`${date} is not a real calendar date`);
  }
  return { year, month, day };
}

/** True for a "YYYY-MM-DD" string naming a day that exists. */
export function isCalendarDate(date: string): boolean {
  try {
    parseCalendarDate(date);
    return true;
  } catch {
    return false;
  }
}

export function formatCalendarDate({ year, month, day }: CalendarDate): string {
  return `${year}-${String(month).padStart(2, "0")}-${String(day).padStart(2, "0")}`;
}

/** The equator counts as north: its season choice is arbitrary either way. */
export function getHemisphere(lat: number): Hemisphere {
  return lat < 0 ? "south" : "north";
}

/** Local solar noon of a local calendar date, as epoch milliseconds (suncalc 2.x). */
export function findSolarNoonMs({
  lat,
  lon,
  date,
}: {
  lat: number;
  lon: number;
  date: CalendarDate;
}): number {
  // suncalc returns the transit nearest to the instant given; start from 12:00 local mean time
  // (UTC noon shifted by the longitude) so a site far east or west gets its own day's noon.
  const localMeanNoon = Date.UTC(date.year, date.month - 1, date.day, 12) - (lon / 15) * 3_600_000;
  return getTimes(new Date(localMeanNoon), lat, lon).solarNoon.getTime();
}

/**
 * The 8 season days: the 1st and 15th of May–August in the north (PRODUCT.md §4, the maternity
 * season). MIRRORED in the south to November–February (the same months shifted half a year),
 * running November of the year before through February of `year`, so the season is one summer.
 */
export function listSeasonDates({
  lat,
  year = SEASON_REFERENCE_YEAR,
}: {
  lat: number;
  year?: number;
}): string[] {
  const months: Array<[number, number]> =
    getHemisphere(lat) === "north"
      ? [
          [year, 5],
          [year, 6],
          [year, 7],
          [year, 8],
        ]
      : [
          [year - 1, 11],
          [year - 1, 12],
          [year, 1],
          [year, 2],
        ];
  return months.flatMap(([y, month]) =>
    [1, 15].map((day) => formatCalendarDate({ year: y, month, day })),
  );
}

/** Midsummer at the site: June 21 in the north, December 21 (of the season's first year) in the south. */
export function findSolsticeDate({
  lat,
  year = SEASON_REFERENCE_YEAR,
}: {
  lat: number;
  year?: number;
}): string {
  return getHemisphere(lat) === "north" ? `${year}-06-21` : `${year - 1}-12-21`;
}

/** Words for the season months, for the UI. */
export function describeSeason(hemisphere: Hemisphere): string {
  return hemisphere === "north" ? "May to August" : "November to February";
}

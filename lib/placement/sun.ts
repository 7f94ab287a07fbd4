// Direct sun on a house face, open sky: trees, buildings and terrain are NOT modelled, so the
// figure is the most sun the face could get at that spot, never a promise of it.
//
// Method (PRODUCT.md §4): step minute by minute over the 24 hours centred on local solar noon and
// count the minutes when the sun is above the horizon and in front of the face, i.e.
// cos(altitude)·cos(azimuth − bearing) > 0. Local solar noon comes from `suncalc` 2.x; the sun
// for each minute comes from ./sun-position (the same Meeus series as suncalc, right ascension
// and declination per day, hour angle per minute) because calling suncalc's getPosition 11,520
// times took about 5 ms warm and 13–22 ms cold on a busy 2-core machine, too close to the 20 ms
// budget; this way a season takes under 1 ms warm. Checked in tests against suncalc minute by
// minute, against the closed form cos h = tan δ / tan φ, and against `astronomy-engine`.
import { getTimes } from "suncalc";
import { SIN_VISIBLE_ALTITUDE, traceSunMinutes } from "./sun-position";

const MINUTES_PER_DAY = 1440;
const HALF_DAY_MINUTES = 720;
const MINUTE_MS = 60_000;
const RAD = Math.PI / 180;

/**
 * Season dates are fixed to one reference year so results never drift with "today". The sun's
 * declination on a given calendar date shifts by under 0.2° across the leap-year cycle, which
 * moves the daily total by a minute or two at most.
 */
export const SEASON_REFERENCE_YEAR = 2026;

export type Hemisphere = "north" | "south";

export type SunDay = {
  /** The local calendar date, YYYY-MM-DD. */
  date: string;
  /** Hours of direct sun on the face, open sky. */
  hours: number;
  /** The part of `hours` before local solar noon. */
  morningHours: number;
  /** morningHours / hours, 0 when the face gets no sun. */
  morningShare: number;
  /**
   * Minutes of direct sun in each LOCAL SOLAR hour (24 entries; index 12 is the hour that starts
   * at solar noon). Solar hours, not clock hours, because the site's time zone and daylight-saving
   * rules are not known here; add the zone offset when showing clock times.
   */
  byHour: number[];
  /** Local solar noon (the sun's highest point) as an ISO 8601 UTC instant. */
  solarNoon: string;
};

export type SeasonDay = Pick<SunDay, "date" | "hours" | "morningHours">;

export type SeasonSun = {
  hemisphere: Hemisphere;
  /** Words for the season months, for the UI: "May to August" or "November to February". */
  seasonLabel: string;
  /** Mean daily hours over the 8 season days. */
  hours: number;
  morningHours: number;
  morningShare: number;
  byDate: SeasonDay[];
  /**
   * Mean minutes of direct sun in each local solar hour over the 8 season days (24 entries, as
   * SunDay.byHour): the season's hour-by-hour shape for a chart. Sums to hours × 60.
   */
  meanByHour: number[];
  /** Midsummer at the site: June 21 in the north, December 21 in the south. */
  solstice: SunDay;
};

type CalendarDate = { year: number; month: number; day: number };

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

function formatCalendarDate({ year, month, day }: CalendarDate): string {
  return `${year}-${String(month).padStart(2, "0")}-${String(day).padStart(2, "0")}`;
}

/** The equator counts as north: its season choice is arbitrary either way. */
export function getHemisphere(lat: number): Hemisphere {
  return lat < 0 ? "south" : "north";
}

/** Local solar noon of a local calendar date, as epoch milliseconds. */
function findSolarNoonMs({ lat, lon, date }: { lat: number; lon: number; date: CalendarDate }) {
  // suncalc returns the transit nearest to the instant given; start from 12:00 local mean time
  // (UTC noon shifted by the longitude) so a site far east or west gets its own day's noon.
  const localMeanNoon = Date.UTC(date.year, date.month - 1, date.day, 12) - (lon / 15) * 3_600_000;
  return getTimes(new Date(localMeanNoon), lat, lon).solarNoon.getTime();
}

export function sunHoursOnFace({
  lat,
  lon,
  facingDeg,
  date,
}: {
  lat: number;
  lon: number;
  facingDeg: number;
  date: string;
}): SunDay {
  const calendarDate = parseCalendarDate(date);
  const noonMs = findSolarNoonMs({ lat, lon, date: calendarDate });
  const facing = facingDeg * RAD;
  const [sinFacing, cosFacing] = [Math.sin(facing), Math.cos(facing)];
  // Samples sit at the middle of each minute (midpoint rule), symmetric about solar noon.
  const sun = traceSunMinutes({ lat, lon, startMs: noonMs - HALF_DAY_MINUTES * MINUTE_MS });
  const byHour = new Array<number>(24).fill(0);
  let total = 0;
  let morning = 0;

  for (let i = 0; i < MINUTES_PER_DAY; i++) {
    if (!((sun.sinAltitude[i] ?? -1) > SIN_VISIBLE_ALTITUDE)) continue;
    // cos(alt)·cos(az − b) written with the sun's horizontal components: north·cos b + east·sin b.
    if ((sun.north[i] ?? 0) * cosFacing + (sun.east[i] ?? 0) * sinFacing <= 0) continue;
    total++;
    if (i < HALF_DAY_MINUTES) morning++;
    const hour = Math.floor(i / 60);
    byHour[hour] = (byHour[hour] ?? 0) + 1;
  }

  return {
    date: formatCalendarDate(calendarDate),
    hours: total / 60,
    morningHours: morning / 60,
    morningShare: total === 0 ? 0 : morning / total,
    byHour,
    solarNoon: new Date(noonMs).toISOString(),
  };
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

export function seasonSunHours({
  lat,
  lon,
  facingDeg,
  year = SEASON_REFERENCE_YEAR,
}: {
  lat: number;
  lon: number;
  facingDeg: number;
  year?: number;
}): SeasonSun {
  const hemisphere = getHemisphere(lat);
  const days = listSeasonDates({ lat, year }).map((date) =>
    sunHoursOnFace({ lat, lon, facingDeg, date }),
  );
  const hours = days.reduce((sum, d) => sum + d.hours, 0) / days.length;
  const morningHours = days.reduce((sum, d) => sum + d.morningHours, 0) / days.length;
  // Mirrored with the season: the southern midsummer day falls inside its Nov–Feb season.
  const solsticeDate = hemisphere === "north" ? `${year}-06-21` : `${year - 1}-12-21`;

  return {
    hemisphere,
    seasonLabel: hemisphere === "north" ? "May to August" : "November to February",
    hours,
    morningHours,
    morningShare: hours === 0 ? 0 : morningHours / hours,
    byDate: days.map(({ date, hours: h, morningHours: m }) => ({
      date,
      hours: h,
      morningHours: m,
    })),
    meanByHour: Array.from(
      { length: 24 },
      (_, hour) => days.reduce((sum, d) => sum + (d.byHour[hour] ?? 0), 0) / days.length,
    ),
    solstice: sunHoursOnFace({ lat, lon, facingDeg, date: solsticeDate }),
  };
}

// The sun's path across the sky on one day, for the skyline chart: apparent altitude and azimuth
// every few minutes of local solar time, from the same Meeus series as the minute counts
// (./sun-position). Pure.
import { findSolarNoonMs, parseCalendarDate } from "./sun-calendar";
import { apparentAltitude, traceSunMinutes } from "./sun-position";

export type SunPathPoint = {
  /** Minutes after local solar midnight (720 is solar noon). */
  minute: number;
  /** Degrees clockwise from north, 0–360. */
  azimuth: number;
  /** Apparent altitude in degrees (negative below the horizon). */
  altitude: number;
};

export type SunPath = { date: string; points: SunPathPoint[] };

const RAD = Math.PI / 180;
const round1 = (n: number) => Math.round(n * 10) / 10;

/**
 * Every `stepMinutes` from solar midnight, keeping the points from the last one below `minAlt`
 * before sunrise to the first one below it after sunset, so a line drawn through them reaches
 * the horizon at both ends.
 */
export function traceSunPath({
  lat,
  lon,
  date,
  stepMinutes = 10,
  minAltitude = -2,
}: {
  lat: number;
  lon: number;
  date: string;
  stepMinutes?: number;
  minAltitude?: number;
}): SunPath {
  const noonMs = findSolarNoonMs({ lat, lon, date: parseCalendarDate(date) });
  // traceSunMinutes samples mid-minute; shift by half a minute so point i sits at minute i.
  const sun = traceSunMinutes({ lat, lon, startMs: noonMs - 720.5 * 60_000 });
  const all: SunPathPoint[] = [];
  for (let minute = 0; minute <= 1439; minute += stepMinutes) {
    const east = sun.east[minute] ?? 0;
    const north = sun.north[minute] ?? 0;
    const azimuth = (((Math.atan2(east, north) / RAD) % 360) + 360) % 360;
    const altitude = apparentAltitude(sun.sinAltitude[minute] ?? -1) / RAD;
    all.push({ minute, azimuth: round1(azimuth), altitude: round1(altitude) });
  }
  const up = all.map((p) => p.altitude > minAltitude);
  const first = up.indexOf(true);
  const last = up.lastIndexOf(true);
  if (first < 0) return { date, points: [] };
  return { date, points: all.slice(Math.max(0, first - 1), Math.min(all.length, last + 2)) };
}

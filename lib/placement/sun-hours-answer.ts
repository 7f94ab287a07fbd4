// The answer of `GET /api/sun-hours`: one day's hours of direct sun on a face, or the season
// mean when no date is given. Pure; the figures are exact minutes over 60.
import type { SunHoursQuery } from "./schema";
import { seasonSunHours, sunHoursOnFace } from "./sun";

export type SunHoursAnswer = {
  hours: number;
  morningHours: number;
  /** The day, or for a season answer the season's words ("May to August"). */
  date?: string;
  season?: string;
  /** Minutes of sun in each local solar hour (24 entries; a season answer gives the mean). */
  byHour: number[];
};

export function describeSunHours({ lat, lon, facingDeg, date }: SunHoursQuery): SunHoursAnswer {
  if (date) {
    const day = sunHoursOnFace({ lat, lon, facingDeg, date });
    return { hours: day.hours, morningHours: day.morningHours, date: day.date, byHour: day.byHour };
  }
  const season = seasonSunHours({ lat, lon, facingDeg });
  return {
    hours: season.hours,
    morningHours: season.morningHours,
    season: season.seasonLabel,
    byHour: season.meanByHour,
  };
}

// The answer of `GET /api/sun-hours`: one day's hours of direct sun on a face (or the season
// mean when no date is given), under the skyline when one is given; with a mount, also the sun
// on the house by mount (PRODUCT.md §4). Pure; the figures are exact minutes over 60.
import type { SunHoursQuery } from "./schema";
import { describeSkylineEffect } from "./skyline-words";
import { seasonSunOnHouse, sunOnHouseForDay } from "./sun";
import type { Mount } from "./types";

type Figure = { hours: number; morningHours: number; byHour: number[] };

export type SunHoursAnswer = Figure & {
  /** The day, or for a season answer the season's words ("May to August"). */
  date?: string;
  season?: string;
  /** With `mount`: the sun on the house, by mount; the top-level figures stay the face's. */
  house?: Figure & { mount: Mount };
  /** The 16 angles given, or null when none was (an open sky was assumed). */
  skyline: number[] | null;
  /** Plain words: open sky assumed, or what the skyline takes from the house (or the face). */
  skylineNote: string;
};

const figure = ({ hours, morningHours, byHour }: Figure): Figure => ({
  hours,
  morningHours,
  byHour,
});

export function describeSunHours({
  lat,
  lon,
  facingDeg,
  date,
  mount,
  skyline,
}: SunHoursQuery): SunHoursAnswer {
  const profile = skyline ?? null;
  const site = { lat, lon, facingDeg, mount: mount ?? "building", skyline: profile };
  const result = date ? sunOnHouseForDay({ ...site, date }) : seasonSunOnHouse(site);
  const note = describeSkylineEffect({
    described: profile !== null,
    lostMorning: result.lostMorning,
    lostAfternoon: result.lostAfternoon,
    openSkyHours: result.openSky.houseHours,
    hours: result.house.hours,
  });
  return {
    ...figure(result.face),
    ...("seasonLabel" in result ? { season: result.seasonLabel } : { date: result.date }),
    ...(mount ? { house: { ...figure(result.house), mount } } : {}),
    skyline: profile ? [...profile] : null,
    skylineNote: [note.summary, ...note.parts].join(" "),
  };
}

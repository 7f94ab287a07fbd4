// Direct sun on a bat house, minute by minute, under the site's skyline (PRODUCT.md §4).
//
// Two figures per day:
// - on the HOUSE, by mount: a house on a building wall is lit only while the sun is above the
//   horizon and in front of the wall, cos(altitude)·cos(azimuth − bearing) > 0 (the wall shades
//   it otherwise); a house on a pole (and a back-to-back pair on a pole) is lit from the front,
//   the sides or the back whenever the sun is up. A house on a tree is counted like a pole under
//   the skyline the buyer gives (the trunk and crown are part of that skyline; P1 already marks
//   tree mounts poor). This is this store's reading of "direct sun on the house" in the
//   published guidance (PRODUCT.md §4), not a published formula.
// - on the FRONT FACE: the wall test above, for every mount, shown beside the house figure.
// Both count only while the sun's apparent altitude is above the skyline toward its azimuth
// (./skyline: linear between 16 directions, wrapping at north). With no skyline (or an all-zero
// one) the sky is open down to the horizon, and the figure is the most sun the spot could get.
//
// Method: step minute by minute over the 24 hours centred on local solar noon (samples at the
// middle of each minute, symmetric about noon). The sun for each minute comes from
// ./sun-position (the Meeus series suncalc uses, right ascension and declination per day, hour
// angle per minute); local solar noon from suncalc 2.x. Checked in tests against suncalc minute
// by minute, against the closed form cos h = tan δ / tan φ, and against `astronomy-engine` with
// and without a skyline.
import {
  describeSeason,
  findSolarNoonMs,
  findSolsticeDate,
  formatCalendarDate,
  getHemisphere,
  listSeasonDates,
  parseCalendarDate,
  SEASON_REFERENCE_YEAR,
  type Hemisphere,
} from "./sun-calendar";
import { apparentAltitude, SIN_VISIBLE_ALTITUDE, traceSunMinutes } from "./sun-position";
import {
  isOpenSky,
  nearestSkylineIndex,
  SKYLINE_DIRECTIONS,
  SKYLINE_STEP_DEG,
  type Skyline,
} from "./skyline";
import type { Mount } from "./types";

export {
  findSolsticeDate,
  getHemisphere,
  isCalendarDate,
  listSeasonDates,
  parseCalendarDate,
  SEASON_REFERENCE_YEAR,
  type Hemisphere,
} from "./sun-calendar";

const MINUTES_PER_DAY = 1440;
const HALF_DAY_MINUTES = 720;
const MINUTE_MS = 60_000;
const RAD = Math.PI / 180;
const DEG = 180 / Math.PI;

/** How the house catches the sun: only from the front (a wall) or from every side. */
export type SunExposure = "front" | "all-round";

/** A building wall shades the house behind its plane; a pole or a tree does not (see above). */
export function exposureForMount(mount: Mount): SunExposure {
  return mount === "building" ? "front" : "all-round";
}

/** One figure of one day, or the mean of the season days. */
export type SunTally = {
  hours: number;
  /** The part of `hours` before local solar noon. */
  morningHours: number;
  /** morningHours / hours, 0 when there is no sun. */
  morningShare: number;
  /**
   * Minutes of sun in each LOCAL SOLAR hour (24 entries; index 12 is the hour that starts at
   * solar noon). Solar hours, not clock hours, because the site's time zone is not known here.
   */
  byHour: number[];
};

/** The same figures with nothing blocking the sky, to show what the skyline takes. */
export type OpenSkyFigures = {
  /** Hours the sun is above the horizon at all: what a pole in the open would get. */
  allRoundHours: number;
  houseHours: number;
  houseMorningHours: number;
  faceHours: number;
  faceMorningHours: number;
};

export type SunDayOnHouse = {
  date: string;
  /** Local solar noon (the sun's highest point) as an ISO 8601 UTC instant. */
  solarNoon: string;
  exposure: SunExposure;
  /** By mount, under the skyline: what P4 rates. */
  house: SunTally;
  /** The front face, under the skyline. */
  face: SunTally;
  openSky: OpenSkyFigures;
  /**
   * Minutes the skyline takes from the house figure, by the direction the sun stood in (16
   * entries, nearest direction, north first), before and after solar noon.
   */
  lostMorning: number[];
  lostAfternoon: number[];
  /** Minutes the sun is up and above the skyline, by whole degree of azimuth (360 entries). */
  visibleByAzimuth: Float64Array;
};

type TraceInput = {
  lat: number;
  lon: number;
  facingDeg: number;
  mount: Mount;
  skyline?: Skyline | null;
};

const tally = (minutes: number, morning: number, byHour: number[]): SunTally => ({
  hours: minutes / 60,
  morningHours: morning / 60,
  morningShare: minutes === 0 ? 0 : morning / minutes,
  byHour,
});

/** One day, minute by minute: the house and face figures, open and under the skyline. */
export function sunOnHouseForDay({
  lat,
  lon,
  facingDeg,
  mount,
  skyline,
  date,
}: TraceInput & { date: string }): SunDayOnHouse {
  const calendarDate = parseCalendarDate(date);
  const noonMs = findSolarNoonMs({ lat, lon, date: calendarDate });
  const exposure = exposureForMount(mount);
  const allRound = exposure === "all-round";
  const facing = facingDeg * RAD;
  const sinFacing = Math.sin(facing);
  const cosFacing = Math.cos(facing);
  // The profile in radians, or null for open sky (then the horizon test alone decides).
  const profile = isOpenSky(skyline) ? null : (skyline as Skyline).map((deg) => deg * RAD);
  // Above the skyline's highest point the sun clears it in every direction: no lookup needed
  // (the true altitude is compared, which only errs toward doing the lookup).
  const sinClearsAll = profile ? Math.sin(Math.max(...profile)) : -1;
  const sun = traceSunMinutes({ lat, lon, startMs: noonMs - HALF_DAY_MINUTES * MINUTE_MS });

  const houseByHour = new Array<number>(24).fill(0);
  const faceByHour = new Array<number>(24).fill(0);
  const lostMorning = new Array<number>(SKYLINE_DIRECTIONS).fill(0);
  const lostAfternoon = new Array<number>(SKYLINE_DIRECTIONS).fill(0);
  const visibleByAzimuth = new Float64Array(360);
  let [house, houseMorning, face, faceMorning] = [0, 0, 0, 0];
  let [openHouse, openHouseMorning, openFace, openFaceMorning, openUp] = [0, 0, 0, 0, 0];

  for (let i = 0; i < MINUTES_PER_DAY; i++) {
    const sinAltitude = sun.sinAltitude[i] ?? -1;
    if (!(sinAltitude > SIN_VISIBLE_ALTITUDE)) continue;
    openUp++;
    const east = sun.east[i] ?? 0;
    const north = sun.north[i] ?? 0;
    // cos(alt)·cos(az − b) written with the sun's horizontal components: north·cos b + east·sin b.
    const front = north * cosFacing + east * sinFacing > 0;
    const lit = allRound || front;
    const morning = i < HALF_DAY_MINUTES;
    const hour = Math.floor(i / 60);
    let azimuth = Math.atan2(east, north) * DEG;
    if (azimuth < 0) azimuth += 360;

    let visible = true;
    if (profile && sinAltitude <= sinClearsAll) {
      const x = azimuth / SKYLINE_STEP_DEG;
      const k = Math.floor(x) % SKYLINE_DIRECTIONS;
      const a = profile[k] ?? 0;
      const elevation =
        a + ((profile[(k + 1) % SKYLINE_DIRECTIONS] ?? 0) - a) * (x - Math.floor(x));
      visible = elevation <= 0 || apparentAltitude(sinAltitude) > elevation;
    }

    if (lit) {
      openHouse++;
      if (morning) openHouseMorning++;
    }
    if (front) {
      openFace++;
      if (morning) openFaceMorning++;
    }
    if (!visible) {
      if (lit) {
        const lost = morning ? lostMorning : lostAfternoon;
        const k = nearestSkylineIndex(azimuth);
        lost[k] = (lost[k] ?? 0) + 1;
      }
      continue;
    }
    const bin = Math.min(359, Math.floor(azimuth));
    visibleByAzimuth[bin] = (visibleByAzimuth[bin] ?? 0) + 1;
    if (lit) {
      house++;
      if (morning) houseMorning++;
      houseByHour[hour] = (houseByHour[hour] ?? 0) + 1;
    }
    if (front) {
      face++;
      if (morning) faceMorning++;
      faceByHour[hour] = (faceByHour[hour] ?? 0) + 1;
    }
  }

  return {
    date: formatCalendarDate(calendarDate),
    solarNoon: new Date(noonMs).toISOString(),
    exposure,
    house: tally(house, houseMorning, houseByHour),
    face: tally(face, faceMorning, faceByHour),
    openSky: {
      allRoundHours: openUp / 60,
      houseHours: openHouse / 60,
      houseMorningHours: openHouseMorning / 60,
      faceHours: openFace / 60,
      faceMorningHours: openFaceMorning / 60,
    },
    lostMorning,
    lostAfternoon,
    visibleByAzimuth,
  };
}

export type SeasonDayOnHouse = {
  date: string;
  houseHours: number;
  houseMorningHours: number;
  faceHours: number;
  faceMorningHours: number;
};

export type SeasonOnHouse = {
  hemisphere: Hemisphere;
  /** "May to August" or "November to February". */
  seasonLabel: string;
  exposure: SunExposure;
  /** Means over the 8 season days (byHour: mean minutes per solar hour, summing to hours × 60). */
  house: SunTally;
  face: SunTally;
  openSky: OpenSkyFigures;
  lostMorning: number[];
  lostAfternoon: number[];
  /** Mean hours a day the sun is up and above the skyline: what a pole here would get. */
  allRoundHours: number;
  /** The wall bearing (whole degrees) with the most sun under this skyline, and its hours. */
  bestWall: { deg: number; hours: number };
  byDate: SeasonDayOnHouse[];
  /** Midsummer at the site: June 21 in the north, December 21 in the south. */
  solstice: Omit<SunDayOnHouse, "visibleByAzimuth">;
};

const mean = (values: number[]) => values.reduce((sum, v) => sum + v, 0) / values.length;

function meanTally(tallies: SunTally[]): SunTally {
  const hours = mean(tallies.map((t) => t.hours));
  const morningHours = mean(tallies.map((t) => t.morningHours));
  return {
    hours,
    morningHours,
    morningShare: hours === 0 ? 0 : morningHours / hours,
    byHour: Array.from({ length: 24 }, (_, h) => mean(tallies.map((t) => t.byHour[h] ?? 0))),
  };
}

const meanEach = (rows: number[][], length: number) =>
  Array.from({ length }, (_, k) => mean(rows.map((row) => row[k] ?? 0)));

// Middle of P3's good band (south-southeast; north-northeast in the south): a tie between two
// equally sunny walls goes to the bearing nearer it.
const IDEAL_WALL = { north: 157.5, south: 22.5 } as const;

/**
 * The sunniest wall: for a whole-degree bearing b, a minute counts on the wall exactly when the
 * sun's azimuth lies in [b − 90°, b + 90°), i.e. in the 180 whole-degree bins from b − 90, so
 * every bearing's total is one window sum over the azimuth histogram (exact for whole degrees).
 */
export function findBestWall({
  visibleByAzimuth,
  hemisphere,
}: {
  visibleByAzimuth: ArrayLike<number>;
  hemisphere: Hemisphere;
}): { deg: number; hours: number } {
  const ideal = IDEAL_WALL[hemisphere];
  const distance = (b: number) => Math.min(Math.abs(b - ideal), 360 - Math.abs(b - ideal));
  let window = 0;
  for (let k = 270; k < 450; k++) window += visibleByAzimuth[k % 360] ?? 0; // b = 0: bins 270–89
  let best = { deg: 0, minutes: window };
  for (let b = 1; b < 360; b++) {
    window += (visibleByAzimuth[(b + 89) % 360] ?? 0) - (visibleByAzimuth[(b + 269) % 360] ?? 0);
    const better = window > best.minutes + 1e-9;
    const tie = Math.abs(window - best.minutes) <= 1e-9 && distance(b) < distance(best.deg);
    if (better || tie) best = { deg: b, minutes: window };
  }
  return { deg: best.deg, hours: best.minutes / 60 };
}

/** The season (PRODUCT.md §4): the mean of the 1st and 15th of each maternity-season month. */
export function seasonSunOnHouse({
  year = SEASON_REFERENCE_YEAR,
  ...site
}: TraceInput & { year?: number }): SeasonOnHouse {
  const hemisphere = getHemisphere(site.lat);
  const days = listSeasonDates({ lat: site.lat, year }).map((date) =>
    sunOnHouseForDay({ ...site, date }),
  );
  const visibleByAzimuth = new Float64Array(360);
  for (const day of days) {
    for (let k = 0; k < 360; k++) {
      visibleByAzimuth[k] =
        (visibleByAzimuth[k] ?? 0) + (day.visibleByAzimuth[k] ?? 0) / days.length;
    }
  }
  const { visibleByAzimuth: _solsticeHistogram, ...solstice } = sunOnHouseForDay({
    ...site,
    date: findSolsticeDate({ lat: site.lat, year }),
  });

  return {
    hemisphere,
    seasonLabel: describeSeason(hemisphere),
    exposure: exposureForMount(site.mount),
    house: meanTally(days.map((d) => d.house)),
    face: meanTally(days.map((d) => d.face)),
    openSky: {
      allRoundHours: mean(days.map((d) => d.openSky.allRoundHours)),
      houseHours: mean(days.map((d) => d.openSky.houseHours)),
      houseMorningHours: mean(days.map((d) => d.openSky.houseMorningHours)),
      faceHours: mean(days.map((d) => d.openSky.faceHours)),
      faceMorningHours: mean(days.map((d) => d.openSky.faceMorningHours)),
    },
    lostMorning: meanEach(
      days.map((d) => d.lostMorning),
      SKYLINE_DIRECTIONS,
    ),
    lostAfternoon: meanEach(
      days.map((d) => d.lostAfternoon),
      SKYLINE_DIRECTIONS,
    ),
    allRoundHours: visibleByAzimuth.reduce((sum, m) => sum + m, 0) / 60,
    bestWall: findBestWall({ visibleByAzimuth, hemisphere }),
    byDate: days.map((d) => ({
      date: d.date,
      houseHours: d.house.hours,
      houseMorningHours: d.house.morningHours,
      faceHours: d.face.hours,
      faceMorningHours: d.face.morningHours,
    })),
    solstice,
  };
}

// ---- The front face alone (GET /api/sun-hours without a mount, and the older callers) ----

export type SunDay = SunTally & { date: string; solarNoon: string };

export type SeasonDay = { date: string; hours: number; morningHours: number };

export type SeasonSun = {
  hemisphere: Hemisphere;
  seasonLabel: string;
  hours: number;
  morningHours: number;
  morningShare: number;
  byDate: SeasonDay[];
  /** Mean minutes per local solar hour over the 8 season days (24 entries). */
  meanByHour: number[];
  solstice: SunDay;
};

/** Hours of direct sun on a face (a wall) on one day, under the skyline when one is given. */
export function sunHoursOnFace({
  lat,
  lon,
  facingDeg,
  date,
  skyline,
}: {
  lat: number;
  lon: number;
  facingDeg: number;
  date: string;
  skyline?: Skyline | null;
}): SunDay {
  const day = sunOnHouseForDay({ lat, lon, facingDeg, mount: "building", skyline, date });
  return { ...day.face, date: day.date, solarNoon: day.solarNoon };
}

/** The season of a face (a wall), under the skyline when one is given. */
export function seasonSunHours({
  lat,
  lon,
  facingDeg,
  year = SEASON_REFERENCE_YEAR,
  skyline,
}: {
  lat: number;
  lon: number;
  facingDeg: number;
  year?: number;
  skyline?: Skyline | null;
}): SeasonSun {
  const season = seasonSunOnHouse({ lat, lon, facingDeg, mount: "building", skyline, year });
  return {
    hemisphere: season.hemisphere,
    seasonLabel: season.seasonLabel,
    hours: season.face.hours,
    morningHours: season.face.morningHours,
    morningShare: season.face.morningShare,
    byDate: season.byDate.map((d) => ({
      date: d.date,
      hours: d.faceHours,
      morningHours: d.faceMorningHours,
    })),
    meanByHour: season.face.byHour,
    solstice: {
      ...season.solstice.face,
      date: season.solstice.date,
      solarNoon: season.solstice.solarNoon,
    },
  };
}

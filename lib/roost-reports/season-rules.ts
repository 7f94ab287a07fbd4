// Roost-report seasons, following the site's hemisphere (PRODUCT.md §7: the maternity season is
// roughly April to mid-August in much of the U.S.; south of the equator roughly October to
// mid-February). Dates are UTC calendar days, the clock the scheduler keeps.
//
// - A season is named by the year its maternity months START in: the northern season 2026 is
//   April–August 2026; the southern season 2026 is October 2026 to February 2027 (shown
//   "2026–27"). The same convention as the seasonal reminders' keys (lib/mail/seasons.ts).
// - The end-of-season question goes out after the maternity season: from September 1 in the
//   north (through October 31), from March 1 of the following year in the south (through
//   April 30). Two months leave room for a late delivery of the mail; common practice, no source.
// - A house "has had a summer up" in a season when it was delivered (or picked up) by July 1 in
//   the north or January 1 in the south: about the middle of the maternity months, so it stood
//   through at least half of them. Common practice, no source.
// - The advice for a house still empty after two summers (move it to a sunnier spot, darken it)
//   is sent from the question's start until the next maternity season begins, so the work can be
//   done while the house is empty (PRODUCT.md §7).

export type Hemisphere = "north" | "south";

type MonthDay = { month: number; day: number };

type SeasonCalendar = {
  maternityStart: MonthDay;
  maternityEnd: MonthDay;
  /** Delivered on or before this day: the house stood through this season's summer. */
  summerCutoff: MonthDay;
  askFrom: MonthDay;
  askTo: MonthDay;
  /** Years after the season's start year in which each date falls. */
  offsets: { maternityEnd: number; summerCutoff: number; ask: number };
};

export const SEASON_CALENDARS: Record<Hemisphere, SeasonCalendar> = {
  north: {
    maternityStart: { month: 4, day: 1 },
    maternityEnd: { month: 8, day: 15 },
    summerCutoff: { month: 7, day: 1 },
    askFrom: { month: 9, day: 1 },
    askTo: { month: 10, day: 31 },
    offsets: { maternityEnd: 0, summerCutoff: 0, ask: 0 },
  },
  south: {
    maternityStart: { month: 10, day: 1 },
    maternityEnd: { month: 2, day: 15 },
    summerCutoff: { month: 1, day: 1 },
    askFrom: { month: 3, day: 1 },
    askTo: { month: 4, day: 30 },
    offsets: { maternityEnd: 1, summerCutoff: 1, ask: 1 },
  },
};

function utcDay(year: number, { month, day }: MonthDay): Date {
  return new Date(Date.UTC(year, month - 1, day));
}

/** Midnight UTC at the start of the given instant's day. */
function startOfDay(date: Date): Date {
  return new Date(Date.UTC(date.getUTCFullYear(), date.getUTCMonth(), date.getUTCDate()));
}

function assertDate(date: Date, what: string): void {
  if (Number.isNaN(date.getTime())) throw new RangeError(`${what} must be a valid date.`);
}

export type SeasonDates = {
  season: number;
  hemisphere: Hemisphere;
  maternityStart: Date;
  maternityEnd: Date;
  summerCutoff: Date;
  askFrom: Date;
  askTo: Date;
  /** The next season's maternity start: the advice window closes the day before. */
  nextMaternityStart: Date;
};

export function seasonDates({ season, hemisphere }: { season: number; hemisphere: Hemisphere }): SeasonDates {
  if (!Number.isInteger(season)) throw new RangeError("A season is a whole year.");
  const c = SEASON_CALENDARS[hemisphere];
  return {
    season,
    hemisphere,
    maternityStart: utcDay(season, c.maternityStart),
    maternityEnd: utcDay(season + c.offsets.maternityEnd, c.maternityEnd),
    summerCutoff: utcDay(season + c.offsets.summerCutoff, c.summerCutoff),
    askFrom: utcDay(season + c.offsets.ask, c.askFrom),
    askTo: utcDay(season + c.offsets.ask, c.askTo),
    nextMaternityStart: utcDay(season + 1, c.maternityStart),
  };
}

/** "2026" in the north, "2026–27" in the south (a southern summer spans the new year). */
export function seasonLabel({ season, hemisphere }: { season: number; hemisphere: Hemisphere }): string {
  if (hemisphere === "north") return String(season);
  return `${season}–${String((season + 1) % 100).padStart(2, "0")}`;
}

/** The latest season whose maternity months have begun on `date`: the one a report is about. */
export function currentSeason({ date, hemisphere }: { date: Date; hemisphere: Hemisphere }): number {
  assertDate(date, "The date");
  const year = date.getUTCFullYear();
  const day = startOfDay(date);
  return day >= seasonDates({ season: year, hemisphere }).maternityStart ? year : year - 1;
}

/** The season whose end-of-season question is due on `date`, or null outside the windows. */
export function seasonToAsk({ date, hemisphere }: { date: Date; hemisphere: Hemisphere }): number | null {
  assertDate(date, "The date");
  const day = startOfDay(date);
  const year = date.getUTCFullYear();
  for (const season of [year, year - 1]) {
    const d = seasonDates({ season, hemisphere });
    if (day >= d.askFrom && day <= d.askTo) return season;
  }
  return null;
}

/** The season whose two-summers advice may go out on `date` (question start to next maternity start). */
export function seasonToAdvise({ date, hemisphere }: { date: Date; hemisphere: Hemisphere }): number | null {
  assertDate(date, "The date");
  const day = startOfDay(date);
  const year = date.getUTCFullYear();
  for (const season of [year, year - 1, year - 2]) {
    const d = seasonDates({ season, hemisphere });
    if (day >= d.askFrom && day < d.nextMaternityStart) return season;
  }
  return null;
}

/** The first season whose summer the house stood through, from its delivery or pickup date. */
export function firstSummerSeason({ deliveredAt, hemisphere }: { deliveredAt: Date; hemisphere: Hemisphere }): number {
  assertDate(deliveredAt, "The delivery date");
  const day = startOfDay(deliveredAt);
  // The cutoff of season s falls in year s (north) or s + 1 (south).
  const offset = SEASON_CALENDARS[hemisphere].offsets.summerCutoff;
  let season = day.getUTCFullYear() - offset;
  if (day > seasonDates({ season, hemisphere }).summerCutoff) season += 1;
  return season;
}

/**
 * Which summer of the house a season is: 1 for its first full summer, 2 for the next, …; 0 for
 * the season it arrived in too late to count; null for a season that ended before it arrived.
 */
export function summerNumber({
  season,
  deliveredAt,
  hemisphere,
}: {
  season: number;
  deliveredAt: Date;
  hemisphere: Hemisphere;
}): number | null {
  const first = firstSummerSeason({ deliveredAt, hemisphere });
  if (season >= first) return season - first + 1;
  // The arrival season itself, if the house came before that season's maternity months ended.
  if (season === first - 1 && startOfDay(deliveredAt) <= seasonDates({ season, hemisphere }).maternityEnd) return 0;
  return null;
}

/**
 * The hemisphere of a house: its saved site's when there is one (a site south of the equator,
 * say in American Samoa), else the north, where every state the store ships to lies.
 */
export function hemisphereOf({ siteLat }: { siteLat: number | null | undefined }): Hemisphere {
  return typeof siteLat === "number" && siteLat < 0 ? "south" : "north";
}

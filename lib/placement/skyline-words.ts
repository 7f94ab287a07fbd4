// What the site's skyline does to the sun on the house, in plain words ("the trees or buildings
// to the east take about 1 h 40 min of morning sun a day"), for the planner, the saved site and
// the install guide. Pure. The minutes come from ./sun (season means, by the direction the sun
// stood in when it was hidden); the wording and its rounding are this store's own.
import { z } from "zod";
import { SKYLINE_DIRECTIONS, skylineBearing } from "./skyline";

/** What ./sun measured for a saved site's skyline, as the placement answer keeps it. */
export type SkylineEffect = {
  /** False when the buyer gave no skyline (an open sky was assumed). */
  described: boolean;
  /** Mean minutes a day taken from the house, by the sun's direction (16, north first). */
  lostMorning: number[];
  lostAfternoon: number[];
  /** Mean hours a day on the house under an open sky, and under the skyline. */
  openSkyHours: number;
  hours: number;
};

/** Read leniently from stored JSON (a saved site's result), so older shapes never break a guide. */
export const skylineEffectSchema = z.object({
  described: z.boolean(),
  lostMorning: z.array(z.number()).length(SKYLINE_DIRECTIONS),
  lostAfternoon: z.array(z.number()).length(SKYLINE_DIRECTIONS),
  openSkyHours: z.number(),
  hours: z.number(),
});

export const OPEN_SKY_ASSUMED =
  "An open sky was assumed: trees and buildings around the site are not counted, so the house can only get less sun than this.";

/** Below this many minutes a day, a loss is "hardly any". */
const NOTICEABLE_MIN = 5;
/** A direction joins a stretch of skyline when it takes at least this much. */
const DIRECTION_MIN = 0.5;
/** A second stretch taking at least this share of the first is named with it. */
const COMPARABLE_SHARE = 0.6;
/** A stretch that hides the sun over more than this arc of compass reads as "all round". */
const ALL_ROUND_DEG = 180;

const EIGHT_POINTS = [
  "north",
  "northeast",
  "east",
  "southeast",
  "south",
  "southwest",
  "west",
  "northwest",
] as const;

/**
 * "about" figures: to the nearest 10 min from an hour up, the nearest 5 min below, so the
 * words never claim more precision than a skyline typed by eye has.
 */
export function formatAboutMinutes(minutes: number): string {
  const step = minutes >= 60 ? 10 : 5;
  const rounded = Math.max(step, Math.round(minutes / step) * step);
  const h = Math.floor(rounded / 60);
  const min = rounded % 60;
  if (h === 0) return `${min} min`;
  return min === 0 ? `${h} h` : `${h} h ${min} min`;
}

type Stretch = { first: number; count: number; morning: number; afternoon: number };

/** Runs of neighbouring directions (wrapping at north) that take sun, largest first. */
function findStretches(morning: number[], afternoon: number[]): Stretch[] {
  const lost = (k: number) => (morning[k] ?? 0) + (afternoon[k] ?? 0);
  const takes = (k: number) => lost(((k % 16) + 16) % 16) >= DIRECTION_MIN;
  if (Array.from({ length: SKYLINE_DIRECTIONS }, (_, k) => k).every(takes)) {
    return [{ first: 0, count: 16, morning: sum(morning), afternoon: sum(afternoon) }];
  }
  // Start just after a direction that takes nothing, so no run is split at north.
  const start = Array.from({ length: SKYLINE_DIRECTIONS }, (_, k) => k).find((k) => !takes(k)) ?? 0;
  const stretches: Stretch[] = [];
  let current: Stretch | null = null;
  for (let step = 1; step <= SKYLINE_DIRECTIONS; step++) {
    const k = (start + step) % SKYLINE_DIRECTIONS;
    if (takes(k)) {
      current ??= { first: k, count: 0, morning: 0, afternoon: 0 };
      current.count++;
      current.morning += morning[k] ?? 0;
      current.afternoon += afternoon[k] ?? 0;
    } else if (current) {
      stretches.push(current);
      current = null;
    }
  }
  if (current) stretches.push(current);
  return stretches.sort((a, b) => b.morning + b.afternoon - (a.morning + a.afternoon));
}

const sum = (values: number[]) => values.reduce((total, v) => total + v, 0);

/** The stretch's middle, weighted by what each direction takes, as one of 8 compass points. */
function describeDirection(stretch: Stretch, morning: number[], afternoon: number[]): string {
  let [x, y] = [0, 0];
  for (let j = 0; j < stretch.count; j++) {
    const k = (stretch.first + j) % SKYLINE_DIRECTIONS;
    const weight = (morning[k] ?? 0) + (afternoon[k] ?? 0);
    const bearing = (skylineBearing(k) * Math.PI) / 180;
    x += weight * Math.sin(bearing);
    y += weight * Math.cos(bearing);
  }
  const deg = ((Math.atan2(x, y) * 180) / Math.PI + 360) % 360;
  return EIGHT_POINTS[Math.round(deg / 45) % 8] ?? "south";
}

/** "morning sun", "afternoon sun", or plain "sun" with the split when it is both. */
function describeTimeOfDay({ morning, afternoon }: Stretch): string {
  const total = morning + afternoon;
  if (morning >= 0.8 * total) return "of morning sun";
  if (afternoon >= 0.8 * total) return "of afternoon sun";
  return `of sun (${formatAboutMinutes(morning)} in the morning, ${formatAboutMinutes(afternoon)} in the afternoon)`;
}

/**
 * Where most of the skyline's loss lies, for advice: "to the east", "all round", or null when
 * it takes hardly anything.
 */
export function findMainLoss(
  effect: Pick<SkylineEffect, "lostMorning" | "lostAfternoon">,
): string | null {
  const { lostMorning, lostAfternoon } = effect;
  if (sum(lostMorning) + sum(lostAfternoon) < NOTICEABLE_MIN) return null;
  const [main, next] = findStretches(lostMorning, lostAfternoon);
  if (!main) return null;
  if (main.count * 22.5 > ALL_ROUND_DEG) return "all round";
  const first = describeDirection(main, lostMorning, lostAfternoon);
  // Two stretches of about the same weight (a clearing hides the low sun at both ends of the
  // day): name both rather than pick one at random.
  const weight = (s: Stretch) => s.morning + s.afternoon;
  if (next && weight(next) >= COMPARABLE_SHARE * weight(main)) {
    const second = describeDirection(next, lostMorning, lostAfternoon);
    if (second !== first) return `to the ${first} and the ${second}`;
  }
  return `to the ${first}`;
}

export type SkylineWords = {
  /** One sentence: what the figures assume, or what the skyline takes in all. */
  summary: string;
  /** Up to three sentences, one per stretch of skyline that takes sun, largest first. */
  parts: string[];
};

/**
 * The skyline's effect in plain words. `null` (a site checked before skylines were kept, or
 * none given) says plainly that an open sky was assumed.
 */
export function describeSkylineEffect(effect: SkylineEffect | null | undefined): SkylineWords {
  if (!effect || !effect.described) return { summary: OPEN_SKY_ASSUMED, parts: [] };
  const { lostMorning, lostAfternoon } = effect;
  const total = sum(lostMorning) + sum(lostAfternoon);
  if (total < NOTICEABLE_MIN) {
    return {
      summary:
        "The skyline you described takes hardly any sun from the house (under 5 min a day over the season).",
      parts: [],
    };
  }
  const summary = `The skyline you described takes about ${formatAboutMinutes(total)} of sun a day from the house over the season.`;
  const parts = findStretches(lostMorning, lostAfternoon)
    .filter((s) => s.morning + s.afternoon >= NOTICEABLE_MIN)
    .slice(0, 3)
    .map((stretch) => {
      const minutes = formatAboutMinutes(stretch.morning + stretch.afternoon);
      const when = describeTimeOfDay(stretch);
      if (stretch.count * 22.5 > ALL_ROUND_DEG) {
        // A stretch this wide hides the low sun wherever it rises or sets: no one side to name.
        return `Trees or buildings all round take about ${minutes} ${when} a day.`;
      }
      const toward = describeDirection(stretch, lostMorning, lostAfternoon);
      return `The trees or buildings to the ${toward} take about ${minutes} ${when} a day.`;
    });
  return { summary, parts };
}

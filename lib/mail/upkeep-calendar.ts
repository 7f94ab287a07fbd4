// The season-by-season upkeep of a bat house, for install guides and seasonal reminders.
// Sources: PRODUCT.md §7 (maternity season roughly April to mid-August in much of the U.S.;
// upkeep in winter while the house is empty; south of the equator the maternity season is roughly
// October to mid-February and upkeep falls in June–August: the seasons shift by six months; in the
// warmest areas some colonies stay all year, so the winter check starts by looking from the ground at
// dusk for bats leaving, and an occupied house is left alone whatever the month); re-caulking the seams, above all at the roof,
// from the design criteria's sources (Bat Conservation of Wisconsin, "Attracting Bats");
// clearing wasp nests and repainting every few years: common practice, no source.

import type { Hemisphere } from "@/lib/climate/warmest-month";

export const UPKEEP_SEASON_IDS = ["winter", "spring", "maternity", "autumn"] as const;
export type UpkeepSeasonId = (typeof UPKEEP_SEASON_IDS)[number];

export type UpkeepSeason = {
  id: UpkeepSeasonId;
  title: string;
  months: string;
  summary: string;
  tasks: readonly string[];
};

export const UPKEEP_CALENDAR: readonly UpkeepSeason[] = [
  {
    id: "winter",
    title: "Winter check",
    months: "December to February",
    summary: "The house should be empty now: this is the time for inspection and repairs, once you have made sure it is.",
    tasks: [
      "First make sure the house is empty: at dusk, watch it from the ground for 30 minutes for bats leaving, and in daylight look from below (with binoculars, never a ladder) for bats packed in the chambers, fresh droppings below or dark stains at the entrance. In the warmest areas some colonies stay all year: if you see any bats, the house is occupied, so leave it alone, whatever the month, and look again in a few weeks.",
      "Check for rot, cracked boards, loose screws and a wobbly pole or bracket, and repair them.",
      "Re-caulk any seam where the old caulk has cracked or pulled away, above all along the roof.",
      "Scrape out old wasp and mud-dauber nests from the chambers with a long thin stick, wearing gloves.",
      "Every few years (about every three to five), repaint the outside in a shade that suits your summers; keep paint off the inside grooves.",
    ],
  },
  {
    id: "spring",
    title: "Spring return",
    months: "March",
    summary: "Finish every job before the bats come back.",
    tasks: [
      "Finish repairs and painting by the end of March; in the warmest states bats can return earlier.",
      "Knock down any wasp nest just starting at the entrance on a cool morning, when wasps are slow.",
      "Clear branches or vines that have grown into the flight path below the house.",
    ],
  },
  {
    id: "maternity",
    title: "Maternity-season quiet time",
    months: "April to mid-August",
    summary: "Mothers are raising their pups: leave the house completely alone.",
    tasks: [
      "Do not open, move, knock on or spray near the house, and do not shine lights at it.",
      "Watch from a distance at dusk and count the bats as they leave: a yearly count is a fine record.",
      "Keep pets indoors at dusk, when pups start to fly and may land on the ground.",
    ],
  },
  {
    id: "autumn",
    title: "Autumn",
    months: "Mid-August to November",
    summary: "Bats leave gradually, some only with the first hard frosts.",
    tasks: [
      "Keep leaving the house alone until it is empty.",
      "Note what you saw this summer, and plan the winter's repairs.",
      "If the house stayed empty for two summers, plan to move it in winter to a sunnier spot, or darken its outside.",
    ],
  },
];

// South of the equator every season falls six months later in the calendar year (PRODUCT.md §7).
const SOUTHERN_MONTHS: Record<UpkeepSeasonId, string> = {
  winter: "June to August",
  spring: "September",
  maternity: "October to mid-February",
  autumn: "Mid-February to May",
};
const SOUTHERN_TASKS: Partial<Record<UpkeepSeasonId, (tasks: readonly string[]) => readonly string[]>> = {
  spring: (tasks) => tasks.map((t) => t.replace("by the end of March", "by the end of September")),
};

/** The calendar for a site's hemisphere: the northern one as written, the southern one shifted six months. */
export function upkeepCalendarFor(hemisphere: Hemisphere): readonly UpkeepSeason[] {
  if (hemisphere === "north") return UPKEEP_CALENDAR;
  return UPKEEP_CALENDAR.map((season) => ({
    ...season,
    months: SOUTHERN_MONTHS[season.id],
    tasks: SOUTHERN_TASKS[season.id]?.(season.tasks) ?? season.tasks,
  }));
}

export function getUpkeepSeason({ id, hemisphere = "north" }: { id: UpkeepSeasonId; hemisphere?: Hemisphere }): UpkeepSeason {
  const season = upkeepCalendarFor(hemisphere).find((s) => s.id === id);
  if (!season) throw new RangeError(`No upkeep season has the id ${id}.`);
  return season;
}

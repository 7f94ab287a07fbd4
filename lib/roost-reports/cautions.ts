import type { Hemisphere } from "./season-rules";

// The one wording of the cautions (lib/safety/cautions.ts), with the maternity months of the
// house's own hemisphere (PRODUCT.md §7: south of the equator roughly October to mid-February,
// upkeep in June–August).

export { cautionsFor } from "@/lib/safety/cautions";

/** What to do with a house still empty after two summers (PRODUCT.md §7), and when. */
export function emptyHouseAdvice({ hemisphere }: { hemisphere: Hemisphere }): string[] {
  const winter = hemisphere === "north" ? "this winter, before April" : "this winter (June to August), before October";
  return [
    `Move it to a sunnier spot ${winter}: most empty houses get too little sun. On a pole or a building wall, facing south to southeast, it warms in the morning.`,
    "Or darken its outside by one shade (for example medium to dark), which keeps the chambers warmer; keep paint off the inside grooves.",
    "Check the basics while you are there: at least 12 ft (3.7 m) up, nothing in the flight path below, no bright light on it, and water within about a mile.",
  ];
}

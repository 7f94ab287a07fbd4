// The cautions the store shows wherever a page or e-mail tells someone to climb, dig, mount,
// inspect or handle anything (PRODUCT.md §7). One wording, shared by pages and e-mails, so a
// caution is never dropped from one place and kept in another.
// Sources, per caution:
// - bats and rabies: CDC, "Rabies and bats" pages (from memory) — do not touch bats with bare
//   hands; wash any bite or scratch with soap and water, see a doctor, call the health department.
// - power lines: the 10 ft approach distance for unqualified people near overhead lines up to
//   50 kV, 29 CFR 1910.333(c)(3)(i) (from memory); two people: common practice, no source.
// - 811: the U.S. "call before you dig" number (FCC, Report and Order 05-134, 2005).
// - maternity season: PRODUCT.md §7 (roughly April to mid-August in much of the U.S.; state rules differ).
// - local codes first: common practice, no source.

export const CAUTION_IDS = [
  "bats-bare-hands",
  "ladders-and-lines",
  "call-before-digging",
  "maternity-season",
  "local-rules-first",
] as const;
export type CautionId = (typeof CAUTION_IDS)[number];

export type Caution = { id: CautionId; title: string; text: string };

export const CAUTIONS: readonly Caution[] = [
  {
    id: "bats-bare-hands",
    title: "Never touch a bat with bare hands",
    text:
      "Bats can carry rabies. Wear thick gloves if you ever must move one, and better still call a wildlife rehabilitator. " +
      "After any bite or scratch, wash it well with soap and water, see a doctor, and call your local health department.",
  },
  {
    id: "ladders-and-lines",
    title: "Two people for ladders and poles, away from power lines",
    text:
      "Never work on a ladder or raise a pole alone: one person climbs or lifts, the other steadies and watches. " +
      "Keep ladders, poles and the house at least 10 ft (3 m) from overhead power lines, and farther if you can.",
  },
  {
    id: "call-before-digging",
    title: "Call 811 before you dig a pole hole",
    text: "In the U.S., call 811 (or use your state's 811 website) a few working days before digging, so buried power, gas and water lines are marked first.",
  },
  {
    id: "maternity-season",
    title: "Leave an occupied house alone in the maternity season",
    text:
      "Do not open, move or knock on a house with bats in it during the maternity season, roughly April to mid-August in much of the U.S. " +
      "(dates differ by state, and some states protect roosting bats by law). Do upkeep in winter, when the house is empty.",
  },
  {
    id: "local-rules-first",
    title: "Local rules and licensed help come first",
    text:
      "Local building codes, permits, homeowners' association rules and the advice of licensed professionals (electricians, pole setters, wildlife officers) " +
      "come before this guide. Where they differ from it, follow them.",
  },
];

/** What to expect after mounting (PRODUCT.md §7); the figures are those of the product brief. */
export const MOVE_IN_PATIENCE = {
  title: "Give the bats time",
  text:
    "Bats may take a few months, and sometimes up to two years, to find and move into a new house. " +
    "If it is still empty after two summers, move it to a sunnier spot or darken its outside.",
} as const;

export function getCaution({ id }: { id: CautionId }): Caution {
  const caution = CAUTIONS.find((c) => c.id === id);
  if (!caution) throw new RangeError(`No caution has the id ${id}.`);
  return caution;
}

// South of the equator the maternity season is roughly October to mid-February and upkeep falls in
// June–August (PRODUCT.md §7: every caution uses the site's hemisphere).
const SOUTHERN_MATERNITY =
  "Do not open, move or knock on a house with bats in it during the maternity season, roughly October to mid-February south of the equator " +
  "(local rules differ, and some places protect roosting bats by law). Do upkeep in winter, June to August, when the house is empty.";

/** The cautions with the maternity months of the site's hemisphere. */
export function cautionsFor({ hemisphere }: { hemisphere: "north" | "south" }): readonly Caution[] {
  if (hemisphere === "north") return CAUTIONS;
  return CAUTIONS.map((c) => (c.id === "maternity-season" ? { ...c, text: SOUTHERN_MATERNITY } : c));
}

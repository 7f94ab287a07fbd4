// The questions of a roost report (PRODUCT.md §8) and the store's own words for each answer.
// "Occupied" means signs or bats seen (PRODUCT.md §8). The count bands are the product's own;
// the signs (droppings below the house, dark stains at the entrance) are the ones agency guides
// tell owners to look for from the ground (common practice, no source).

export const ROOST_ANSWERS = ["no_sign", "signs", "bats_seen", "gone"] as const;
export type RoostAnswer = (typeof ROOST_ANSWERS)[number];

export const COUNT_BANDS = ["1-10", "11-50", "51-200", "over-200"] as const;
export type CountBand = (typeof COUNT_BANDS)[number];

export const ANSWER_WORDS: Record<RoostAnswer, { label: string; detail: string }> = {
  no_sign: { label: "No sign yet", detail: "Nothing below the house or at the entrance so far." },
  signs: {
    label: "Signs of bats",
    detail: "Droppings on the ground below, or dark stains at the entrance.",
  },
  bats_seen: { label: "Bats seen", detail: "Bats flying out at dusk, or seen in the chambers." },
  gone: { label: "House gone or moved", detail: "Taken down, moved elsewhere, or lost." },
};

export const COUNT_BAND_WORDS: Record<CountBand, string> = {
  "1-10": "1 to 10 bats",
  "11-50": "11 to 50 bats",
  "51-200": "51 to 200 bats",
  "over-200": "More than 200 bats",
};

export function isOccupiedAnswer(answer: RoostAnswer): boolean {
  return answer === "signs" || answer === "bats_seen";
}

/** "<orderLineId>:<unit>": one house, whichever way its answers arrive. */
export function houseKeyFor({ orderLineId, unit }: { orderLineId: string; unit: number }): string {
  return `${orderLineId}:${unit}`;
}

/** The refusal for an answer link presented a second time (each link records one answer, once). */
export function usedLinkWords(current: { answer: RoostAnswer; countBand: CountBand | null } | null): string {
  const stands = current
    ? ` Your answer stands as “${ANSWER_WORDS[current.answer].label}”${current.countBand ? ` (${COUNT_BAND_WORDS[current.countBand].toLowerCase()})` : ""}.`
    : "";
  return `This link has already been used.${stands} To change it, use another answer link from the e-mail, or your order page.`;
}

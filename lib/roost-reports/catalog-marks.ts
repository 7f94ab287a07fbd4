import "server-only";
import type { HouseCard } from "@/lib/catalog/house-card";
import { listOccupancyMarks, type PublicStat } from "./queries";

/** Adds each model's small occupancy mark to catalog cards (n, and the share only where n ≥ 5). */
export function addOccupancyMarks(cards: HouseCard[], marks: ReadonlyMap<string, PublicStat>): HouseCard[] {
  return cards.map((card) => {
    const mark = marks.get(card.slug);
    if (!mark) return card;
    const { n, shown, k, rate, demo } = mark;
    return { ...card, occupancy: { n, shown, demo, ...(shown ? { k, rate } : {}) } };
  });
}

/** The same, reading the marks now (scripts and tests; pages and routes use the cached marks). */
export async function withOccupancyMarks(cards: HouseCard[]): Promise<HouseCard[]> {
  return addOccupancyMarks(cards, await listOccupancyMarks());
}

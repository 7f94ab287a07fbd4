import "server-only";
import type { HouseCard } from "@/lib/catalog/house-card";
import { listOccupancyMarks } from "./queries";

/** Adds each model's small occupancy mark to catalog cards (n, and the share only where n ≥ 5). */
export async function withOccupancyMarks(cards: HouseCard[]): Promise<HouseCard[]> {
  const marks = await listOccupancyMarks();
  return cards.map((card) => {
    const mark = marks.get(card.slug);
    if (!mark) return card;
    const { n, shown, k, rate, demo } = mark;
    return { ...card, occupancy: { n, shown, demo, ...(shown ? { k, rate } : {}) } };
  });
}

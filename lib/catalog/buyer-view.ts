import "server-only";
import { addOccupancyMarks } from "@/lib/roost-reports/catalog-marks";
import { cachedHouse, cachedOccupancyMarks, cachedPublishedHouses } from "./cached";
import type { BandId } from "./climate-bands";
import { fitForBand } from "./fit";
import { toHouseCard, type HouseCard } from "./house-card";
import type { CatalogFilters, HouseDetail } from "./queries";
import { selectHouses } from "./select-houses";

// The catalog as a buyer sees it, from the cached reads (lib/catalog/cached.ts): the page, the
// JSON API and the model page all answer from here, so they cannot disagree.

/** The catalog's cards for these filters (and band), with each model's occupancy mark. */
export async function catalogCards(filters: CatalogFilters): Promise<{ items: HouseCard[]; total: number }> {
  const [published, marks] = await Promise.all([cachedPublishedHouses(), cachedOccupancyMarks()]);
  const items = selectHouses(published, filters);
  return { items: addOccupancyMarks(items.map(toHouseCard), new Map(marks)), total: items.length };
}

/** A published model's page data, with its fit for the band when one is chosen; null when not on sale. */
export async function houseForBuyer(slug: string, band?: BandId): Promise<HouseDetail | null> {
  const house = await cachedHouse(slug);
  if (!house) return null;
  return band ? { ...house, fit: fitForBand(house.spec, band) } : house;
}

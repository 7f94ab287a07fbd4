import type { CatalogFilters, HouseSummary } from "./house-types";
import { fitForBand } from "./fit";

// The catalog's filters and order, applied to the published models in memory, so one cached read of
// the catalog (lib/catalog/cached.ts) answers every combination of filters and bands. The same
// meaning as the filters' words on the page: at least N chambers, this mount, at most this price,
// in stock. Common practice, no source.

const FIT_ORDER = { good: 0, fair: 1, poor: 2 } as const;

function byPriceThenName(a: HouseSummary, b: HouseSummary): number {
  if (a.priceCents !== b.priceCents) return a.priceCents - b.priceCents;
  return a.name < b.name ? -1 : a.name > b.name ? 1 : 0;
}

/** The published models that pass `filters`, cheapest first; with a band, fit labels and best fits first. */
export function selectHouses(published: readonly HouseSummary[], filters: CatalogFilters): HouseSummary[] {
  const items = published
    .filter((h) => !filters.chambers || h.spec.chamberCount >= filters.chambers)
    .filter((h) => !filters.mount || h.mounts.includes(filters.mount))
    .filter((h) => filters.maxPriceCents === undefined || h.priceCents <= filters.maxPriceCents)
    .filter((h) => !filters.inStock || h.stock >= 1)
    .sort(byPriceThenName)
    .map((h) => (filters.band ? { ...h, fit: fitForBand(h.spec, filters.band) } : h));
  // Array.prototype.sort is stable: within a fit label the price order stays.
  if (filters.band) items.sort((a, b) => FIT_ORDER[a.fit!.label] - FIT_ORDER[b.fit!.label]);
  return items;
}

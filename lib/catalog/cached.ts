import "server-only";
import { cacheLife, cacheTag } from "next/cache";
import { getCenterProfile } from "@/lib/admin/queries";
import type { CenterProfile } from "@/lib/admin/center-profile";
import { getModelOccupancy, listOccupancyMarks, type ModelOccupancy, type PublicStat } from "@/lib/roost-reports/queries";
import { houseDrawingSvg } from "./drawing";
import { CATALOG_TAG, CENTER_TAG, modelTag, OCCUPANCY_TAG } from "./cache-tags";
import { getHouseBySlug, listPublishedHouses, type HouseDetail, type HouseSummary } from "./queries";

// What every buyer sees, read once and kept (Next.js Cache Components, "use cache"), so browsing
// the catalog never waits on the database. Each read carries the tags of lib/catalog/cache-tags.ts;
// staff changes expire exactly the ones they touch (lib/catalog/expire.ts), so the next request reads
// the change. Without a change an entry is read again after a minute: stock also moves with sales,
// which expire nothing, and checkout's conditional update stays the guard against overselling.
// Call these only at request time (after cookies, params or `connection()`): the build never reads
// the database, and a prerendered catalog would be the build machine's.

const BUYER_VIEW = { stale: 30, revalidate: 60, expire: 3600 } as const;

/** Every published model, cheapest first, without a band (lib/catalog/select-houses.ts filters them). */
export async function cachedPublishedHouses(): Promise<HouseSummary[]> {
  "use cache";
  cacheLife(BUYER_VIEW);
  cacheTag(CATALOG_TAG);
  const houses = await listPublishedHouses();
  cacheTag(...houses.map((h) => modelTag(h.id)));
  return houses;
}

/** One published model's page data without a band, or null (tagged with the catalog, so publishing it shows). */
export async function cachedHouse(slug: string): Promise<HouseDetail | null> {
  "use cache";
  cacheLife(BUYER_VIEW);
  const house = await getHouseBySlug({ slug });
  cacheTag(house ? modelTag(house.id) : CATALOG_TAG);
  return house;
}

/** The generated drawing of a published model, or null. */
export async function cachedDrawing(slug: string): Promise<string | null> {
  "use cache";
  cacheLife(BUYER_VIEW);
  const house = await getHouseBySlug({ slug });
  cacheTag(house ? modelTag(house.id) : CATALOG_TAG);
  return house ? houseDrawingSvg({ name: house.name, spec: house.spec }) : null;
}

/** Each model's small occupancy mark for the catalog, by slug, as plain entries (a Map does not cache). */
export async function cachedOccupancyMarks(): Promise<[slug: string, mark: PublicStat][]> {
  "use cache";
  cacheLife(BUYER_VIEW);
  cacheTag(OCCUPANCY_TAG);
  return [...(await listOccupancyMarks())];
}

/** A model's roost-report figures for its page and its API answer. */
export async function cachedModelOccupancy(modelId: string): Promise<ModelOccupancy> {
  "use cache";
  cacheLife(BUYER_VIEW);
  cacheTag(OCCUPANCY_TAG);
  return getModelOccupancy({ modelId });
}

/** The center's public name and address from its settings. */
export async function cachedCenterProfile(): Promise<CenterProfile> {
  "use cache";
  cacheLife(BUYER_VIEW);
  cacheTag(CENTER_TAG);
  return getCenterProfile();
}

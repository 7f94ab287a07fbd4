import "server-only";
import { revalidateTag, updateTag } from "next/cache";
import { CENTER_TAG, OCCUPANCY_TAG, tagsForModelChange, type ModelChange } from "./cache-tags";
import { isModelOnSale } from "./queries";

// Expiring the buyer-facing cache (lib/catalog/cached.ts) after a change, so the next request reads
// it. From a server action `updateTag` (the staff member's own next view is fresh too); from a route
// handler, where updateTag is not allowed, `revalidateTag` with `expire: 0`, which serves nothing
// stale either. With several app instances the cache handler (lib/cache/) carries the expiry to the
// others.

/** Where the change was made: a server action or a route handler. */
export type ChangeSite = "action" | "route";

function expire(tags: string[], site: ChangeSite): void {
  for (const tag of tags) {
    if (site === "action") updateTag(tag);
    else revalidateTag(tag, { expire: 0 });
  }
}

/** After a staff change to one model: its own tag, and the catalog's when buyers see it there. */
export async function expireModel(modelId: string, change: ModelChange, site: ChangeSite): Promise<string[]> {
  const tags = tagsForModelChange(modelId, change, { onSale: change === "listing" || (await isModelOnSale(modelId)) });
  expire(tags, site);
  return tags;
}

/** After a roost report is recorded, changed or reviewed: the figures on model pages and the catalog's marks. */
export function expireOccupancy(site: ChangeSite): void {
  expire([OCCUPANCY_TAG], site);
}

/** After the center's settings change: its name and address on every page. */
export function expireCenter(site: ChangeSite): void {
  expire([CENTER_TAG], site);
}

// The cache tags of what a buyer sees (lib/catalog/cached.ts tags its reads with them; the staff
// actions and routes expire exactly the ones a change touches, lib/catalog/expire.ts).
// Common practice, no source: one tag for the list, one per model, one per kind of shared figure.

/** The published catalog: which models are on sale, and each card's price, stock, photo and badge. */
export const CATALOG_TAG = "catalog";
/** Everything of the roost-report figures (the model page's occupancy and the catalog's marks). */
export const OCCUPANCY_TAG = "occupancy";
/** The center's public name and address (footer, home page, receipts' headers on pages). */
export const CENTER_TAG = "center";

/** One model's page, its drawing and its API answer, by the model's id (slugs may be renamed). */
export function modelTag(modelId: string): string {
  return `model:${modelId}`;
}

export type ModelChange =
  /** Publish, retire, back to drafts: the model enters or leaves the catalog. */
  | "listing"
  /** Price, words, measurements, photos, an inspection, stock: the model's own data. */
  | "details";

/**
 * The tags a staff change to one model touches. A model's own tag always; the catalog's when the
 * model enters or leaves it, or when it is on sale (its card shows the change). A draft's edits
 * reach no buyer, so they leave the catalog's cache alone.
 */
export function tagsForModelChange(modelId: string, change: ModelChange, { onSale }: { onSale: boolean }): string[] {
  const tags = [modelTag(modelId)];
  if (change === "listing" || onSale) tags.push(CATALOG_TAG);
  return tags;
}

import type { CatalogQuery } from "./catalog-query";

// Apart from the schema (lib/catalog/catalog-query.ts): the catalog's browser script builds its
// links with this and must not carry zod with it.

/** The same filters back to URL parameters, dropping empty ones (keeps links and the API in step). */
export function catalogQueryToParams(query: Partial<CatalogQuery>): URLSearchParams {
  const params = new URLSearchParams();
  if (query.band) params.set("band", query.band);
  if (query.chambers) params.set("chambers", String(query.chambers));
  if (query.mount) params.set("mount", query.mount);
  if (query.maxPriceCents !== undefined) params.set("maxPriceCents", String(query.maxPriceCents));
  if (query.inStock) params.set("inStock", "true");
  return params;
}

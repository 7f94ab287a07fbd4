// The three-word verdict the store gives wherever it judges a fit: a house for a climate band
// (lib/catalog/fit.ts), a placement rule for a site (lib/placement/rules.ts), and the e-mails and
// badges that repeat them. One list, so a fourth word would be added in one place.
// Common practice, no source.

export const RATINGS = ["good", "fair", "poor"] as const;
export type Rating = (typeof RATINGS)[number];

export function isRating(value: unknown): value is Rating {
  return typeof value === "string" && (RATINGS as readonly string[]).includes(value);
}

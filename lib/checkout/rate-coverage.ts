// Does the parcel rate table price every house on sale? Checkout bills a carton at the first
// tier whose limit is at or above its billable weight (lib/checkout/pricing.ts), so the table
// covers every weight from 1 lb up to its heaviest tier's limit, and nothing above it. A carton
// of a published model heavier than that, or any carton when the table is empty, is refused at
// checkout; staff are told so ahead of time. Common practice, no source.

export type HeaviestParcel = { name: string; billableLb: number };

export type RateCoverage =
  | { covered: true; heaviestTierLb: number | null; heaviest: HeaviestParcel | null }
  | {
      covered: false;
      /** Lightest billable weight (whole lb) no tier covers. */
      fromLb: number;
      /** Heaviest billable weight of a house on sale; null when none is on sale. */
      toLb: number | null;
      /** The heaviest tier's limit; null for an empty table. */
      heaviestTierLb: number | null;
      heaviest: HeaviestParcel | null;
    };

export function rateCoverage(
  tiers: readonly { maxBillableLb: number }[],
  heaviest: HeaviestParcel | null,
): RateCoverage {
  const limits = tiers.map((t) => t.maxBillableLb).filter((lb) => Number.isFinite(lb) && lb > 0);
  if (limits.length === 0) {
    return { covered: false, fromLb: 1, toLb: heaviest?.billableLb ?? null, heaviestTierLb: null, heaviest };
  }
  const heaviestTierLb = Math.max(...limits);
  if (heaviest && heaviest.billableLb > heaviestTierLb) {
    return { covered: false, fromLb: Math.floor(heaviestTierLb) + 1, toLb: heaviest.billableLb, heaviestTierLb, heaviest };
  }
  return { covered: true, heaviestTierLb, heaviest };
}

/** The weights no tier covers, in words: "21–24 lb", "24 lb", "every weight". */
export function uncoveredWeights(coverage: Extract<RateCoverage, { covered: false }>): string {
  if (coverage.toLb === null) return coverage.heaviestTierLb === null ? "every weight" : `above ${coverage.heaviestTierLb} lb`;
  return coverage.fromLb >= coverage.toLb ? `${coverage.toLb} lb` : `${coverage.fromLb}–${coverage.toLb} lb`;
}

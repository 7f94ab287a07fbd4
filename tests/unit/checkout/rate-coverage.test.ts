import { describe, expect, it } from "vitest";
import { rateCoverage, uncoveredWeights } from "@/lib/checkout/rate-coverage";
import { parcelRateCents } from "@/lib/checkout/pricing";

// Coverage matches what checkout does: a tier's limit includes its own weight (pricing.ts).
const TIERS = [
  { maxBillableLb: 10, cents: 1200 },
  { maxBillableLb: 20, cents: 1800 },
];
const house = (billableLb: number) => ({ name: "Test House", billableLb });

describe("rateCoverage", () => {
  it("an empty table covers nothing, with or without houses on sale", () => {
    const withHouse = rateCoverage([], house(24));
    expect(withHouse).toMatchObject({ covered: false, fromLb: 1, toLb: 24, heaviestTierLb: null });
    if (withHouse.covered) throw new Error("covered");
    expect(uncoveredWeights(withHouse)).toBe("1–24 lb");
    const none = rateCoverage([], null);
    expect(none).toMatchObject({ covered: false, fromLb: 1, toLb: null });
    if (none.covered) throw new Error("covered");
    expect(uncoveredWeights(none)).toBe("every weight");
  });

  it("a house billing exactly at the heaviest tier's limit is covered; one pound more is not", () => {
    expect(rateCoverage(TIERS, house(20))).toMatchObject({ covered: true, heaviestTierLb: 20 });
    expect(parcelRateCents({ billableLb: 20, rateTiers: TIERS })).toBe(1800);
    const over = rateCoverage(TIERS, house(21));
    expect(over).toMatchObject({ covered: false, fromLb: 21, toLb: 21, heaviestTierLb: 20 });
    if (over.covered) throw new Error("covered");
    expect(uncoveredWeights(over)).toBe("21 lb");
    expect(parcelRateCents({ billableLb: 21, rateTiers: TIERS })).toBeNull();
  });

  it("names the whole uncovered range up to the heaviest house, tiers in any order", () => {
    const gap = rateCoverage([...TIERS].reverse(), house(34));
    expect(gap).toMatchObject({ covered: false, fromLb: 21, toLb: 34, heaviest: { name: "Test House", billableLb: 34 } });
    if (gap.covered) throw new Error("covered");
    expect(uncoveredWeights(gap)).toBe("21–34 lb");
  });

  it("a table with tiers and no house on sale is covered", () => {
    expect(rateCoverage(TIERS, null)).toMatchObject({ covered: true });
  });
});

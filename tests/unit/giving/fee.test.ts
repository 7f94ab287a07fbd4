import { describe, expect, it } from "vitest";
import { feeOn, feeToCover } from "@/lib/giving/fee";

// The gross-up rule: charged = ceil((gift + fixed) / (1 − rate)). Hand-computed at 2.9% + 30¢:
// $25 → (2500 + 30) / 0.971 = 2605.56… → 2606, so 106¢ is added; $100 → 10030 / 0.971 = 10329.55… → 10330, so 330¢.
describe("covering the card fee", () => {
  it("adds what the processor keeps, so the whole gift arrives", () => {
    expect(feeToCover({ giftCents: 2_500, basisPoints: 290, fixedCents: 30 })).toBe(106);
    expect(feeToCover({ giftCents: 10_000, basisPoints: 290, fixedCents: 30 })).toBe(330);
    for (const giftCents of [100, 999, 2_500, 12_345, 1_000_000]) {
      const added = feeToCover({ giftCents, basisPoints: 290, fixedCents: 30 });
      const charged = giftCents + added;
      expect(charged - feeOn({ chargedCents: charged, basisPoints: 290, fixedCents: 30 })).toBeGreaterThanOrEqual(giftCents);
      // One cent less would not be enough (or the rounding of the kept fee ties).
      expect(charged - 1 - (((charged - 1) * 290) / 10_000 + 30)).toBeLessThan(giftCents);
    }
  });

  it("adds nothing when the center sets no fee, and refuses nonsense", () => {
    expect(feeToCover({ giftCents: 2_500, basisPoints: 0, fixedCents: 0 })).toBe(0);
    expect(feeToCover({ giftCents: 2_500, basisPoints: 0, fixedCents: 30 })).toBe(30);
    expect(() => feeToCover({ giftCents: 0, basisPoints: 290, fixedCents: 30 })).toThrow(RangeError);
    expect(() => feeToCover({ giftCents: 2_500, basisPoints: 10_000, fixedCents: 30 })).toThrow(RangeError);
    expect(() => feeToCover({ giftCents: 25.5, basisPoints: 290, fixedCents: 30 })).toThrow(RangeError);
  });
});

import { describe, expect, it } from "vitest";
import { billableWeightLb, DIM_DIVISOR_CUBIC_IN_PER_LB } from "@/lib/checkout/billable-weight";

// Source: UPS and FedEx dimensional-weight rules for U.S. daily rates (divisor 139, fractions of a
// pound up, each dimension up to the next whole inch since 2025-08-18), PRODUCT.md §5.

describe("billableWeightLb", () => {
  it("uses the carriers' divisor of 139", () => {
    expect(DIM_DIVISOR_CUBIC_IN_PER_LB).toBe(139);
  });

  it("bills a 26 × 16 × 6 in carton at 18 lb (the published check: 2,496 / 139 = 17.96)", () => {
    const result = billableWeightLb({ lengthIn: 26, widthIn: 16, heightIn: 6, weightLb: 9 });
    expect(result).toEqual({
      actualLb: 9,
      dimLb: 18,
      billableLb: 18,
      roundedDims: { lengthIn: 26, widthIn: 16, heightIn: 6 },
    });
  });

  it("matches a third-party worked example: 25 × 6 × 43 / 139 = 46.40, charged 47 lb", () => {
    // GoPostal FAQ, "What is dimensional weight?" (divisor 139).
    expect(
      billableWeightLb({ lengthIn: 25, widthIn: 6, heightIn: 43, weightLb: 20 }).billableLb,
    ).toBe(47);
  });

  it("rounds each fractional dimension up before multiplying (26.1 → 27)", () => {
    const result = billableWeightLb({ lengthIn: 26.1, widthIn: 16, heightIn: 6, weightLb: 9 });
    expect(result.roundedDims).toEqual({ lengthIn: 27, widthIn: 16, heightIn: 6 });
    expect(result.dimLb).toBe(19); // 27 × 16 × 6 = 2,592 / 139 = 18.65
  });

  it("rounds before multiplying: 20.2 × 10.2 × 10.2 bills 19 lb, not the 16 lb of the raw volume", () => {
    // Raw: 2,101.6 in³ / 139 = 15.1 → 16 lb. Rounded first: 21 × 11 × 11 = 2,541 / 139 = 18.3 → 19 lb.
    expect(
      billableWeightLb({ lengthIn: 20.2, widthIn: 10.2, heightIn: 10.2, weightLb: 5 }).dimLb,
    ).toBe(19);
  });

  it("rounds up, never to nearest: 26.4 in is 27 in (the pre-2025 rule gave 26)", () => {
    expect(
      billableWeightLb({ lengthIn: 26.4, widthIn: 1, heightIn: 1, weightLb: 1 }).roundedDims
        .lengthIn,
    ).toBe(27);
  });

  it("leaves exact integers alone, even with float noise from unit conversion", () => {
    const noisy = billableWeightLb({
      lengthIn: 26.000000000000004,
      widthIn: 16,
      heightIn: 6,
      weightLb: 9,
    });
    expect(noisy.roundedDims.lengthIn).toBe(26);
    expect(noisy.dimLb).toBe(18);
    // 66.04 cm is exactly 26 in; the division leaves float residue.
    expect(
      billableWeightLb({ lengthIn: 66.04 / 2.54, widthIn: 16, heightIn: 6, weightLb: 9 })
        .roundedDims.lengthIn,
    ).toBe(26);
  });

  it("bills a heavy small box on its actual weight, rounded up", () => {
    const result = billableWeightLb({ lengthIn: 12, widthIn: 12, heightIn: 12, weightLb: 30.2 });
    expect(result.dimLb).toBe(13); // 1,728 / 139 = 12.43
    expect(result.actualLb).toBe(31);
    expect(result.billableLb).toBe(31);
  });

  it("treats dimensional weight at exact multiples of 139 without rounding up", () => {
    expect(billableWeightLb({ lengthIn: 139, widthIn: 1, heightIn: 1, weightLb: 0.5 }).dimLb).toBe(
      1,
    );
    expect(billableWeightLb({ lengthIn: 139, widthIn: 2, heightIn: 1, weightLb: 0.5 }).dimLb).toBe(
      2,
    );
    expect(billableWeightLb({ lengthIn: 140, widthIn: 2, heightIn: 1, weightLb: 0.5 }).dimLb).toBe(
      3,
    );
  });

  it("rounds weight up at the pound boundary", () => {
    const at = (weightLb: number) =>
      billableWeightLb({ lengthIn: 1, widthIn: 1, heightIn: 1, weightLb }).actualLb;
    expect(at(17)).toBe(17);
    expect(at(17.01)).toBe(18);
    expect(at(0.2)).toBe(1);
  });

  it.each([0, -1, Number.NaN, Number.POSITIVE_INFINITY])(
    "refuses a dimension or weight of %s",
    (bad) => {
      expect(() =>
        billableWeightLb({ lengthIn: bad, widthIn: 1, heightIn: 1, weightLb: 1 }),
      ).toThrow(RangeError);
      expect(() =>
        billableWeightLb({ lengthIn: 1, widthIn: 1, heightIn: 1, weightLb: bad }),
      ).toThrow(RangeError);
    },
  );
});

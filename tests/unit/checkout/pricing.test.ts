import { describe, expect, it } from "vitest";
import {
  parcelRateCents,
  PricingError,
  quoteOrder,
  type OrderLineInput,
  type QuoteInput,
} from "@/lib/checkout/pricing";

// A 26 × 16 × 6 in carton bills at 18 lb (PRODUCT.md §5's published check); the rest are invented
// demo models and the admin's rate table, deliberately out of order.
const STANDARD_CARTON = { lengthIn: 26, widthIn: 16, heightIn: 6, weightLb: 9 };
const nursery: OrderLineInput = {
  slug: "ridgeline-four",
  name: "Ridgeline Four",
  unitPriceCents: 8_900,
  quantity: 2,
  carton: STANDARD_CARTON,
};
const cottage: OrderLineInput = {
  slug: "creekside-two",
  name: "Creekside Two",
  unitPriceCents: 5_450,
  quantity: 1,
  carton: { lengthIn: 20, widthIn: 14, heightIn: 5, weightLb: 6.5 }, // 1,400 / 139 = 10.07 → 11 lb
};
const RATE_TIERS = [
  { maxBillableLb: 40, cents: 2_900 },
  { maxBillableLb: 10, cents: 1_200 },
  { maxBillableLb: 20, cents: 1_850 },
];

function quote(overrides: Partial<QuoteInput> = {}) {
  return quoteOrder({
    lines: [nursery],
    method: "parcel",
    rateTiers: RATE_TIERS,
    taxRateBasisPoints: 725,
    giftCents: 0,
    ...overrides,
  });
}

function pricingError(run: () => unknown): PricingError {
  try {
    run();
  } catch (error) {
    if (error instanceof PricingError) return error;
    throw error;
  }
  throw new Error("expected a PricingError");
}

describe("quoteOrder", () => {
  it("prices two houses as two parcels, with tax on goods only", () => {
    const result = quote({ lines: [nursery, cottage], giftCents: 2_500 });
    expect(result.lines).toEqual([
      {
        slug: "ridgeline-four",
        name: "Ridgeline Four",
        quantity: 2,
        unitPriceCents: 8_900,
        lineCents: 17_800,
      },
      {
        slug: "creekside-two",
        name: "Creekside Two",
        quantity: 1,
        unitPriceCents: 5_450,
        lineCents: 5_450,
      },
    ]);
    expect(result.subtotalCents).toBe(23_250);
    expect(result.shipping).toEqual({
      method: "parcel",
      parcels: [
        { slug: "ridgeline-four", billableLb: 18, cents: 1_850 },
        { slug: "ridgeline-four", billableLb: 18, cents: 1_850 },
        { slug: "creekside-two", billableLb: 11, cents: 1_850 },
      ],
      cents: 5_550,
    });
    expect(result.taxCents).toBe(1_686); // 23,250 × 7.25% = 1,685.625 → 1,686
    expect(result.giftCents).toBe(2_500);
    expect(result.totalCents).toBe(23_250 + 5_550 + 1_686 + 2_500);
  });

  it("ships nothing for local pickup", () => {
    const result = quote({ method: "pickup", rateTiers: [] });
    expect(result.shipping).toEqual({ method: "pickup", parcels: [], cents: 0 });
    expect(result.totalCents).toBe(17_800 + 1_291);
  });

  it("rounds tax half up on the goods subtotal: 17,800 × 7.25% = 1,290.5 → 1,291", () => {
    expect(quote().taxCents).toBe(1_291);
    expect(quote({ taxRateBasisPoints: 724 }).taxCents).toBe(1_289); // 1,288.72
  });

  it("never taxes shipping or the gift", () => {
    const base = quote({ method: "pickup" }).taxCents;
    expect(quote({ method: "parcel" }).taxCents).toBe(base);
    expect(quote({ giftCents: 100_000 }).taxCents).toBe(base);
  });

  it("uses inclusive tier limits: 18 lb takes the 20 lb tier, 20 lb too, 21 lb the next", () => {
    expect(parcelRateCents({ billableLb: 18, rateTiers: RATE_TIERS })).toBe(1_850);
    expect(parcelRateCents({ billableLb: 20, rateTiers: RATE_TIERS })).toBe(1_850);
    expect(parcelRateCents({ billableLb: 21, rateTiers: RATE_TIERS })).toBe(2_900);
    expect(parcelRateCents({ billableLb: 10, rateTiers: RATE_TIERS })).toBe(1_200);
    expect(parcelRateCents({ billableLb: 41, rateTiers: RATE_TIERS })).toBeNull();
  });

  it("refuses a parcel heavier than the heaviest tier, naming the house and both weights", () => {
    const heavy = { ...nursery, carton: { lengthIn: 30, widthIn: 24, heightIn: 10, weightLb: 22 } }; // 7,200 / 139 → 52 lb
    const error = pricingError(() => quote({ lines: [cottage, heavy] }));
    expect(error.code).toBe("parcel_over_heaviest_tier");
    expect(error.field).toBe("lines.1.carton");
    expect(error.message).toContain("Ridgeline Four");
    expect(error.message).toContain("52 lb");
    expect(error.message).toContain("40 lb");
    // The same order is fine for pickup.
    expect(quote({ lines: [cottage, heavy], method: "pickup" }).shipping.cents).toBe(0);
  });

  it("accepts gifts of 0 and $1 to $10,000 and refuses the rest", () => {
    for (const giftCents of [0, 100, 1_000_000])
      expect(quote({ giftCents }).giftCents).toBe(giftCents);
    for (const giftCents of [1, 99, 1_000_001, 150.5, -100]) {
      const error = pricingError(() => quote({ giftCents }));
      expect(error).toMatchObject({ code: "bad_gift", field: "giftCents" });
      expect(error.message).toBe("A gift can be from $1.00 to $10,000.00, or none.");
    }
  });

  it("accepts quantities 1 to 10 and refuses the rest", () => {
    for (const quantity of [1, 10])
      expect(quote({ lines: [{ ...nursery, quantity }] }).shipping.parcels).toHaveLength(quantity);
    for (const quantity of [0, 11, 1.5, -1, Number.NaN]) {
      expect(pricingError(() => quote({ lines: [{ ...nursery, quantity }] }))).toMatchObject({
        code: "bad_quantity",
        field: "lines.0.quantity",
      });
    }
  });

  it("takes a gift on its own: nothing shipped, nothing taxed", () => {
    const result = quote({ lines: [], giftCents: 30_000 });
    expect(result).toMatchObject({
      subtotalCents: 0,
      taxCents: 0,
      giftCents: 30_000,
      totalCents: 30_000,
    });
    expect(result.shipping.parcels).toEqual([]);
  });

  it("refuses an empty order, a house twice, and broken prices or cartons", () => {
    expect(pricingError(() => quote({ lines: [] })).code).toBe("no_items");
    expect(pricingError(() => quote({ lines: [nursery, nursery] }))).toMatchObject({
      code: "duplicate_item",
      field: "lines.1.slug",
    });
    expect(pricingError(() => quote({ lines: [{ ...nursery, unitPriceCents: 0 }] })).code).toBe(
      "bad_price",
    );
    expect(pricingError(() => quote({ lines: [{ ...nursery, unitPriceCents: 89.5 }] })).code).toBe(
      "bad_price",
    );
    expect(
      pricingError(() =>
        quote({ lines: [{ ...nursery, carton: { ...STANDARD_CARTON, weightLb: 0 } }] }),
      ),
    ).toMatchObject({ code: "bad_carton", field: "lines.0.carton.weightLb" });
  });

  it("refuses tax rates that are not whole basis points from 0 to 2,000", () => {
    expect(quote({ taxRateBasisPoints: 0 }).taxCents).toBe(0);
    expect(quote({ taxRateBasisPoints: 2_000 }).taxCents).toBe(3_560);
    for (const taxRateBasisPoints of [-1, 2_001, 7.25, 7_250]) {
      expect(pricingError(() => quote({ taxRateBasisPoints })).code).toBe("bad_tax_rate");
    }
  });

  it("refuses a missing or broken rate table for parcels, but not for pickup", () => {
    expect(pricingError(() => quote({ rateTiers: [] })).code).toBe("no_rate_tiers");
    const duplicate = [...RATE_TIERS, { maxBillableLb: 20, cents: 999 }];
    expect(pricingError(() => quote({ rateTiers: duplicate }))).toMatchObject({
      code: "bad_rate_tier",
      field: "rateTiers.3",
    });
    expect(pricingError(() => quote({ rateTiers: [{ maxBillableLb: 0, cents: 100 }] })).code).toBe(
      "bad_rate_tier",
    );
    expect(pricingError(() => quote({ rateTiers: [{ maxBillableLb: 10, cents: -1 }] })).code).toBe(
      "bad_rate_tier",
    );
    expect(quote({ method: "pickup", rateTiers: duplicate }).shipping.cents).toBe(0);
  });

  it("refuses an unknown method", () => {
    // @ts-expect-error: a value from outside TypeScript's reach (a form post)
    expect(pricingError(() => quote({ method: "drone" })).code).toBe("bad_method");
  });
});

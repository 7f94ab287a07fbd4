import { describe, expect, it } from "vitest";
import { billableForBox, boxesForLines } from "@/lib/fulfillment/packing";
import { dollarsToCents, packSchema, shipBoxSchema } from "@/lib/fulfillment/schemas";

// PRODUCT.md §5: each house in its own carton; billable weight by the UPS/FedEx rule (divisor
// 139, dimensions and weight rounded up). Published check: 26 × 16 × 6 in bills at 18 lb.

describe("boxes for an order", () => {
  it("starts one box per house, numbered when a model comes twice", () => {
    const carton = { lengthIn: 32, widthIn: 22, heightIn: 8.5, weightLb: 19 };
    expect(boxesForLines([{ name: "Hollow Four", quantity: 2, carton }, { name: "Twin Ridge", quantity: 1, carton }]).map((b) => b.description)).toEqual([
      "Hollow Four (1 of 2)",
      "Hollow Four (2 of 2)",
      "Twin Ridge",
    ]);
  });

  it("bills the published example carton at 18 lb, and a heavy small box by its weight", () => {
    expect(billableForBox({ lengthIn: 26, widthIn: 16, heightIn: 6, weightLb: 9 })?.billableLb).toBe(18);
    expect(billableForBox({ lengthIn: 10, widthIn: 10, heightIn: 10, weightLb: 20.2 })).toMatchObject({ actualLb: 21, dimLb: 8, billableLb: 21 });
  });

  it("waits for all four measurements", () => {
    expect(billableForBox({ lengthIn: 26, widthIn: 16, heightIn: 6 })).toBeNull();
    expect(billableForBox({ lengthIn: 26, widthIn: Number.NaN, heightIn: 6, weightLb: 9 })).toBeNull();
    expect(billableForBox({ lengthIn: 26, widthIn: 0, heightIn: 6, weightLb: 9 })).toBeNull();
  });
});

describe("the packing and shipping forms' schemas", () => {
  it("needs a box, with measurements in range", () => {
    expect(packSchema.safeParse({ version: 1, boxes: [] }).error?.issues[0]?.message).toBe("Record at least one box.");
    const bad = packSchema.safeParse({ version: 1, boxes: [{ description: "", lengthIn: Number.NaN, widthIn: 0, heightIn: 200, weightLb: 151 }] });
    expect(Object.fromEntries(bad.error!.issues.map((i) => [i.path.at(-1), i.message]))).toEqual({
      description: "Say what is in the box.",
      lengthIn: "Enter the length in inches.",
      widthIn: "The width must be more than 0 in.",
      heightIn: "The height can be at most 108 in.",
      weightLb: "A box can weigh at most 150 lb.",
    });
  });

  it("checks the tracking number for the chosen carrier, as the server does", () => {
    const base = { version: 2, carrier: "ups" as const, service: "Ground" };
    expect(shipBoxSchema.safeParse({ ...base, trackingNumber: "1Z5R89390357567127" }).success).toBe(true);
    const typo = shipBoxSchema.safeParse({ ...base, trackingNumber: "1Z5R89390357567128" });
    expect(typo.error?.issues[0]).toMatchObject({ path: ["trackingNumber"], message: expect.stringMatching(/check for a typo/) });
    expect(shipBoxSchema.safeParse({ ...base, carrier: "other", trackingNumber: "LOCAL-42" }).success).toBe(true);
  });

  it("reads refund amounts as dollars and cents", () => {
    expect(dollarsToCents("12.5")).toBe(1250);
    expect(dollarsToCents("12.05")).toBe(1205);
    expect(dollarsToCents("7")).toBe(700);
    expect(dollarsToCents("")).toBeUndefined();
    expect(dollarsToCents(undefined)).toBeUndefined();
  });
});

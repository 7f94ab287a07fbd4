import { describe, expect, it } from "vitest";
import type { OrderRow } from "@/db/schema";
import { receiptForOrder } from "@/lib/checkout/queries/receipt";

function order(partial: Partial<OrderRow>): OrderRow {
  return {
    subtotalCents: 0,
    shippingCents: 0,
    taxCents: 0,
    giftCents: 0,
    totalCents: 0,
    refundedCents: 0,
    ...partial,
  } as OrderRow;
}

// PRODUCT.md §6 vectors, through the order's stored amounts (IRS Publication 1771 examples of the
// quid pro quo rule: deductible = paid − value of goods and services).
describe("receipt for a stored order", () => {
  it("$100 paid for a $40 house: $60 deductible, disclosure required", () => {
    const r = receiptForOrder(order({ subtotalCents: 4000, giftCents: 6000, totalCents: 10000 }));
    expect(r).toMatchObject({ kind: "mixed", deductibleCents: 6000, disclosureRequired: true });
  });
  it("$70 paid for a $20 house: $50 deductible, no disclosure", () => {
    const r = receiptForOrder(order({ subtotalCents: 2000, giftCents: 5000, totalCents: 7000 }));
    expect(r).toMatchObject({ kind: "mixed", deductibleCents: 5000, disclosureRequired: false });
  });
  it("a $300 gift alone: written acknowledgment with the no-goods statement", () => {
    const r = receiptForOrder(order({ giftCents: 30000, totalCents: 30000 }));
    expect(r).toMatchObject({ kind: "gift", deductibleCents: 30000, acknowledgmentRequired: true });
    expect(r.statements.join(" ")).toMatch(/No goods or services were provided/);
  });
  it("shipping counts as goods and services; tax is neither goods nor gift", () => {
    const r = receiptForOrder(order({ subtotalCents: 14900, shippingCents: 3800, taxCents: 834, giftCents: 2500, totalCents: 22034 }));
    expect(r).toMatchObject({ kind: "mixed", goodsValueCents: 18700, salesTaxCents: 834, deductibleCents: 2500 });
  });
  it("a refund comes off the goods first, then the gift", () => {
    const partial = receiptForOrder(order({ subtotalCents: 4000, giftCents: 6000, totalCents: 10000, refundedCents: 4000 }));
    expect(partial).toMatchObject({ kind: "gift", amountPaidCents: 6000, deductibleCents: 6000 });
    const deeper = receiptForOrder(order({ subtotalCents: 4000, giftCents: 6000, totalCents: 10000, refundedCents: 5000 }));
    expect(deeper).toMatchObject({ amountPaidCents: 5000, deductibleCents: 5000 });
  });
  it("a full refund leaves nothing paid or deductible", () => {
    const r = receiptForOrder(order({ subtotalCents: 4000, giftCents: 6000, totalCents: 10000, refundedCents: 10000 }));
    expect(r).toMatchObject({ amountPaidCents: 0, deductibleCents: 0, disclosureRequired: false });
  });
  it("a plain purchase is not a contribution", () => {
    const r = receiptForOrder(order({ subtotalCents: 8900, shippingCents: 1900, totalCents: 10800 }));
    expect(r.kind).toBe("purchase");
    expect(r.statements.join(" ")).toMatch(/not a charitable contribution/);
  });
});

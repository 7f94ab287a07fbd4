import { describe, expect, it } from "vitest";
import { goodsOfOrder, receiptFor } from "@/lib/checkout/receipts";

// 26 U.S.C. §170(f)(8)(B) and IRS Publication 1771: the written acknowledgment describes the
// goods or services provided in return and gives a good-faith estimate of their value.
describe("the written acknowledgment lists the goods", () => {
  const goods = goodsOfOrder({
    lines: [
      { name: "Hollow Four", quantity: 2, unitPriceCents: 8_900 },
      { name: "Saltbush White", quantity: 1, unitPriceCents: 6_400 },
    ],
    shippingCents: 2_400,
  });

  it("lists each house at list price and the shipping", () => {
    expect(goods).toEqual([
      { description: "2 × Hollow Four bat house", valueCents: 17_800 },
      { description: "1 × Saltbush White bat house", valueCents: 6_400 },
      { description: "shipping", valueCents: 2_400 },
    ]);
    expect(goodsOfOrder({ lines: [], shippingCents: 0 })).toEqual([]);
  });

  it("prints them on a mixed payment that is the §170(f)(8) acknowledgment", () => {
    // $266 of goods + a $300 gift: deductible $300, acknowledgment required.
    const receipt = receiptFor({ amountPaidCents: 56_600, goodsValueCents: 26_600, giftCents: 30_000, goods });
    expect(receipt.acknowledgmentRequired).toBe(true);
    expect(receipt.statements).toContain(
      "Goods and services provided in return for your payment: 2 × Hollow Four bat house, $178.00; 1 × Saltbush White bat house, $64.00; shipping, $24.00.",
    );
    const estimate = receipt.statements.findIndex((s) => s.startsWith("Our good-faith estimate"));
    const list = receipt.statements.findIndex((s) => s.startsWith("Goods and services provided"));
    expect(list).toBe(estimate + 1);
  });

  it("lists nothing for a gift alone (it says no goods or services) or a purchase", () => {
    const gift = receiptFor({ amountPaidCents: 30_000, goodsValueCents: 0, giftCents: 30_000, goods });
    expect(gift.goods).toEqual([]);
    expect(gift.statements).toContain("No goods or services were provided in exchange for this gift.");
    const purchase = receiptFor({ amountPaidCents: 26_600, goodsValueCents: 26_600, giftCents: 0, goods });
    expect(purchase.statements.some((s) => s.startsWith("Goods and services"))).toBe(false);
  });
});

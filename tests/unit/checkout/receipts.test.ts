import { describe, expect, it } from "vitest";
import { quoteOrder } from "@/lib/checkout/pricing";
import { receiptFor, ReceiptError, type ReceiptInput } from "@/lib/checkout/receipts";

// Sources: 26 U.S.C. §6115 (disclosure for a quid pro quo payment over $75), 26 U.S.C.
// §170(f)(8) (written acknowledgment for a contribution of $250 or more) and IRS Publication 1771.
// The first three vectors are PRODUCT.md §6's checks; the first matches, from memory, Publication
// 1771's own example of a $100 payment for a $40 concert ticket leaving $60 deductible.

const NO_GOODS = "No goods or services were provided in exchange for this gift.";

describe("receiptFor: the published vectors", () => {
  it("$100 paid for a $40 house: $60 deductible, disclosure required", () => {
    const receipt = receiptFor({
      amountPaidCents: 10_000,
      goodsValueCents: 4_000,
      giftCents: 6_000,
    });
    expect(receipt).toMatchObject({
      kind: "mixed",
      amountPaidCents: 10_000,
      goodsValueCents: 4_000,
      deductibleCents: 6_000,
      disclosureRequired: true,
      acknowledgmentRequired: false,
    });
    expect(receipt.statements).toEqual([
      "Amount paid: $100.00.",
      "Our good-faith estimate of the value of the goods and services you received (items at list price plus shipping) is $40.00.",
      "For federal income tax purposes, your deductible contribution is limited to the amount you paid above the value of those goods and services: $60.00.",
    ]);
  });

  it("$70 paid for a $20 house: $50 deductible, no disclosure required", () => {
    const receipt = receiptFor({
      amountPaidCents: 7_000,
      goodsValueCents: 2_000,
      giftCents: 5_000,
    });
    expect(receipt).toMatchObject({
      kind: "mixed",
      deductibleCents: 5_000,
      disclosureRequired: false,
    });
    // The amounts are still printed: the donor needs them either way.
    expect(receipt.statements.join(" ")).toContain("$50.00");
  });

  it("a $300 gift alone: the written acknowledgment with the no-goods-or-services statement", () => {
    const receipt = receiptFor({ amountPaidCents: 30_000, goodsValueCents: 0, giftCents: 30_000 });
    expect(receipt).toMatchObject({
      kind: "gift",
      deductibleCents: 30_000,
      disclosureRequired: false,
      acknowledgmentRequired: true,
    });
    expect(receipt.statements).toEqual([
      "Amount of your gift: $300.00.",
      NO_GOODS,
      "Please keep this receipt: it is the written acknowledgment of your contribution for your tax records.",
    ]);
  });
});

describe("receiptFor: thresholds", () => {
  it("discloses a mixed payment above $75.00, not at it", () => {
    const at = receiptFor({ amountPaidCents: 7_500, goodsValueCents: 2_500, giftCents: 5_000 });
    const above = receiptFor({ amountPaidCents: 7_501, goodsValueCents: 2_501, giftCents: 5_000 });
    expect(at.disclosureRequired).toBe(false);
    expect(above.disclosureRequired).toBe(true);
  });

  it("never calls a gift alone or a purchase a disclosure case, however large", () => {
    expect(
      receiptFor({ amountPaidCents: 50_000, goodsValueCents: 0, giftCents: 50_000 })
        .disclosureRequired,
    ).toBe(false);
    expect(
      receiptFor({ amountPaidCents: 50_000, goodsValueCents: 50_000, giftCents: 0 })
        .disclosureRequired,
    ).toBe(false);
  });

  it("needs the written acknowledgment from $250.00 of contribution, not $249.99", () => {
    const gift = (cents: number) =>
      receiptFor({ amountPaidCents: cents, goodsValueCents: 0, giftCents: cents });
    expect(gift(24_999).acknowledgmentRequired).toBe(false);
    expect(gift(25_000).acknowledgmentRequired).toBe(true);
    expect(gift(24_999).statements).toEqual(["Amount of your gift: $249.99.", NO_GOODS]);
  });

  it("counts the deductible part of a mixed payment toward $250, not the amount paid", () => {
    const mixed = (giftCents: number) =>
      receiptFor({ amountPaidCents: 5_000 + giftCents, goodsValueCents: 5_000, giftCents });
    expect(mixed(24_999).acknowledgmentRequired).toBe(false);
    expect(mixed(25_000).acknowledgmentRequired).toBe(true);
    expect(mixed(25_000).statements.at(-1)).toContain("written acknowledgment");
  });
});

describe("receiptFor: purchases, tax and bad input", () => {
  it("says a plain purchase is not a contribution", () => {
    const receipt = receiptFor({ amountPaidCents: 8_900, goodsValueCents: 8_900, giftCents: 0 });
    expect(receipt).toMatchObject({
      kind: "purchase",
      deductibleCents: 0,
      acknowledgmentRequired: false,
    });
    expect(receipt.statements).toEqual([
      "Amount paid: $89.00.",
      "This was a purchase, not a charitable contribution, so no part of it is tax-deductible.",
    ]);
  });

  it("keeps sales tax out of the deductible amount and says so", () => {
    const receipt = receiptFor({
      amountPaidCents: 10_290,
      goodsValueCents: 4_000,
      salesTaxCents: 290,
      giftCents: 6_000,
    });
    expect(receipt.deductibleCents).toBe(6_000);
    expect(receipt.statements[0]).toBe(
      "Amount paid: $102.90, including $2.90 sales tax, which is not part of your contribution.",
    );
  });

  it("receipts a priced order so that exactly the gift is deductible", () => {
    const quote = quoteOrder({
      lines: [
        {
          slug: "ridgeline-four",
          name: "Ridgeline Four",
          unitPriceCents: 8_900,
          quantity: 1,
          carton: { lengthIn: 26, widthIn: 16, heightIn: 6, weightLb: 9 },
        },
      ],
      method: "parcel",
      rateTiers: [{ maxBillableLb: 20, cents: 1_850 }],
      taxRateBasisPoints: 725,
      giftCents: 4_000,
    });
    const receipt = receiptFor({
      amountPaidCents: quote.totalCents,
      goodsValueCents: quote.subtotalCents + quote.shipping.cents,
      salesTaxCents: quote.taxCents,
      giftCents: quote.giftCents,
    });
    expect(receipt).toMatchObject({
      kind: "mixed",
      amountPaidCents: 15_395,
      deductibleCents: 4_000,
      disclosureRequired: true,
    });
  });

  it.each<[string, ReceiptInput, string]>([
    [
      "amounts that do not add up",
      { amountPaidCents: 10_000, goodsValueCents: 4_000, giftCents: 5_000 },
      "amounts_do_not_add_up",
    ],
    [
      "a negative amount",
      { amountPaidCents: 1_000, goodsValueCents: -1_000, giftCents: 2_000 },
      "bad_amount",
    ],
    [
      "a fraction of a cent",
      { amountPaidCents: 1_000.5, goodsValueCents: 1_000.5, giftCents: 0 },
      "bad_amount",
    ],
    ["nothing paid", { amountPaidCents: 0, goodsValueCents: 0, giftCents: 0 }, "nothing_paid"],
  ])("refuses %s", (_what, input, code) => {
    expect(() => receiptFor(input)).toThrow(ReceiptError);
    expect(() => receiptFor(input)).toThrow(expect.objectContaining({ code }));
  });
});

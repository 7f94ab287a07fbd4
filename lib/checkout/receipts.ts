import { centerYear } from "@/lib/giving/center-time";
import { formatUsd, isCents, sumCents } from "./money";

// What a receipt says about gifts (PRODUCT.md §6), for U.S. federal income tax.
//
// Sales tax: it is neither a contribution nor goods, so it is passed on its own
// (`salesTaxCents`) and taken out of the amount paid before anything is called deductible.
// The result is the same as counting tax inside the goods value (deductible = the gift), but the
// printed good-faith estimate stays what §6 says it is: items at list price plus shipping.

/** A payment over $75 that is partly a gift must carry the disclosure: 26 U.S.C. §6115(a); IRS Publication 1771. */
export const DISCLOSURE_THRESHOLD_CENTS = 7_500;
/** A contribution of $250 or more needs a written acknowledgment: 26 U.S.C. §170(f)(8)(A), contents in (B); IRS Publication 1771. */
export const ACKNOWLEDGMENT_THRESHOLD_CENTS = 25_000;

export type ReceiptKind = "gift" | "mixed" | "purchase";

/** One of the goods or services provided in return, at its good-faith value. */
export type GoodsItem = { description: string; valueCents: number };

export type ReceiptInput = {
  /**
   * What was provided in return, listed by the written acknowledgment: 26 U.S.C. §170(f)(8)(B)(ii)
   * and (iii) ask for a description and a good-faith estimate of the value of any goods or
   * services (IRS Publication 1771); PRODUCT.md §6 says: list the houses.
   */
  goods?: readonly GoodsItem[];
  /** Everything the payer paid, sales tax included. */
  amountPaidCents: number;
  /** Good-faith estimate of goods and services: items at list price plus shipping charged. */
  goodsValueCents: number;
  /** Sales tax inside the amount paid; 0 when none. */
  salesTaxCents?: number;
  giftCents: number;
};

export type Receipt = {
  kind: ReceiptKind;
  amountPaidCents: number;
  goodsValueCents: number;
  salesTaxCents: number;
  deductibleCents: number;
  /** Mixed payment over $75: the §6115 disclosure must be printed. */
  disclosureRequired: boolean;
  /** Deductible contribution of $250 or more: the receipt is the §170(f)(8) written acknowledgment. */
  acknowledgmentRequired: boolean;
  goods: GoodsItem[];
  /** The sentences the receipt prints, in order (the organization's name and the date go in its heading). */
  statements: string[];
};

export type ReceiptErrorCode = "bad_amount" | "nothing_paid" | "amounts_do_not_add_up";

export class ReceiptError extends Error {
  override name = "ReceiptError";
  constructor(
    readonly code: ReceiptErrorCode,
    message: string,
  ) {
    super(message);
  }
}

function paidSentence(amountPaidCents: number, salesTaxCents: number, taxNote: string): string {
  if (salesTaxCents === 0) return `Amount paid: ${formatUsd(amountPaidCents)}.`;
  return `Amount paid: ${formatUsd(amountPaidCents)}, including ${formatUsd(salesTaxCents)} sales tax${taxNote}.`;
}

const ACKNOWLEDGMENT_SENTENCE =
  "Please keep this receipt: it is the written acknowledgment of your contribution for your tax records.";

function statementsFor(receipt: Omit<Receipt, "statements">): string[] {
  const { kind, amountPaidCents, goodsValueCents, salesTaxCents, deductibleCents } = receipt;
  const lines: string[] = [];
  if (kind === "purchase") {
    lines.push(paidSentence(amountPaidCents, salesTaxCents, ""));
    lines.push(
      "This was a purchase, not a charitable contribution, so no part of it is tax-deductible.",
    );
    return lines;
  }
  if (kind === "gift") {
    lines.push(`Amount of your gift: ${formatUsd(deductibleCents)}.`);
    lines.push("No goods or services were provided in exchange for this gift.");
  } else {
    lines.push(
      paidSentence(amountPaidCents, salesTaxCents, ", which is not part of your contribution"),
    );
    lines.push(
      "Our good-faith estimate of the value of the goods and services you received " +
        `(items at list price plus shipping) is ${formatUsd(goodsValueCents)}.`,
    );
    if (receipt.goods.length > 0) {
      lines.push(
        "Goods and services provided in return for your payment: " +
          receipt.goods.map((g) => `${g.description}, ${formatUsd(g.valueCents)}`).join("; ") +
          ".",
      );
    }
    lines.push(
      "For federal income tax purposes, your deductible contribution is limited to the amount you paid " +
        `above the value of those goods and services: ${formatUsd(deductibleCents)}.`,
    );
  }
  if (receipt.acknowledgmentRequired) lines.push(ACKNOWLEDGMENT_SENTENCE);
  return lines;
}

/**
 * The receipt for one payment. Deductible = max(0, paid − sales tax − goods value): IRS
 * Publication 1771, a quid pro quo contribution is deductible only above the value received.
 * The three amounts must add up to the amount paid; anything else is a bug upstream, and a
 * receipt that misstates a gift is worse than none, so it throws.
 */
export function receiptFor(input: ReceiptInput): Receipt {
  const { amountPaidCents, goodsValueCents, giftCents } = input;
  const salesTaxCents = input.salesTaxCents ?? 0;
  for (const [name, value] of Object.entries({
    amountPaidCents,
    goodsValueCents,
    salesTaxCents,
    giftCents,
  })) {
    if (!isCents(value) || value < 0) {
      throw new ReceiptError(
        "bad_amount",
        `${name} must be a whole, non-negative number of cents; got ${value}.`,
      );
    }
  }
  if (amountPaidCents === 0)
    throw new ReceiptError("nothing_paid", "Nothing was paid, so there is nothing to receipt.");
  const parts = sumCents([goodsValueCents, salesTaxCents, giftCents]);
  if (parts !== amountPaidCents) {
    throw new ReceiptError(
      "amounts_do_not_add_up",
      `Goods ${formatUsd(goodsValueCents)} + tax ${formatUsd(salesTaxCents)} + gift ${formatUsd(giftCents)} ` +
        `make ${formatUsd(parts)}, not the ${formatUsd(amountPaidCents)} paid.`,
    );
  }
  const deductibleCents = Math.max(0, amountPaidCents - salesTaxCents - goodsValueCents);
  const kind: ReceiptKind =
    deductibleCents === 0 ? "purchase" : goodsValueCents === 0 ? "gift" : "mixed";
  const receipt = {
    kind,
    amountPaidCents,
    goodsValueCents,
    salesTaxCents,
    deductibleCents,
    // §6115 speaks of the payment received, so the threshold is on the amount paid, not the gift;
    // sales tax stays in it, which can only add a disclosure, never drop a required one.
    disclosureRequired: kind === "mixed" && amountPaidCents > DISCLOSURE_THRESHOLD_CENTS,
    acknowledgmentRequired:
      kind !== "purchase" && deductibleCents >= ACKNOWLEDGMENT_THRESHOLD_CENTS,
    // A gift alone received nothing (its statement says so); a purchase is no contribution.
    goods: kind === "mixed" ? [...(input.goods ?? [])] : [],
  };
  return { ...receipt, statements: statementsFor(receipt) };
}

/** The goods of an order as the acknowledgment lists them: each house at list price, then shipping. */
export function goodsOfOrder({
  lines,
  shippingCents,
}: {
  lines: readonly { name: string; quantity: number; unitPriceCents: number }[];
  shippingCents: number;
}): GoodsItem[] {
  const goods: GoodsItem[] = lines.map((l) => ({
    description: `${l.quantity} × ${l.name} bat house`,
    valueCents: l.quantity * l.unitPriceCents,
  }));
  if (shippingCents > 0) goods.push({ description: "shipping", valueCents: shippingCents });
  return goods;
}

export type GiftRecord = { date: Date | string; amountCents: number; orderId: string };

export type YearEndStatement = {
  year: number;
  timeZone: string;
  gifts: { date: Date; amountCents: number; orderId: string }[];
  count: number;
  totalCents: number;
  statements: string[];
};

/**
 * A donor's gifts in one calendar year, totalled, oldest first.
 * The year is the center's own (PRODUCT.md §6): pass its `timeZone` (the giving settings,
 * lib/giving/queries.ts). A gift made on the evening of December 31 in the Americas is already
 * January 1 in UTC and still counts in December's year. Without a zone the year is UTC's.
 */
export function yearEndStatement({
  gifts,
  year,
  timeZone = "UTC",
}: {
  gifts: readonly GiftRecord[];
  year: number;
  timeZone?: string;
}): YearEndStatement {
  if (!Number.isInteger(year) || year < 1900 || year > 9999)
    throw new RangeError(`Not a calendar year: ${year}.`);
  const inYear = gifts
    .map((gift) => {
      const date = gift.date instanceof Date ? gift.date : new Date(gift.date);
      if (Number.isNaN(date.getTime()))
        throw new RangeError(`Gift ${gift.orderId} has no valid date.`);
      if (!isCents(gift.amountCents) || gift.amountCents <= 0) {
        throw new RangeError(`Gift ${gift.orderId} must be a positive whole number of cents.`);
      }
      return { date, amountCents: gift.amountCents, orderId: gift.orderId };
    })
    .filter((gift) => centerYear(gift.date, timeZone) === year)
    .sort((a, b) => a.date.getTime() - b.date.getTime());
  const totalCents = sumCents(inYear.map((gift) => gift.amountCents));
  const count = inYear.length;
  const statements =
    count === 0
      ? [`We have no gifts from you on record for ${year}.`]
      : [
          `Your gifts in ${year}: ${count} ${count === 1 ? "gift" : "gifts"}, ${formatUsd(totalCents)} in all.`,
          "Each gift's own receipt states the value of any goods or services you received with it.",
        ];
  return { year, timeZone, gifts: inYear, count, totalCents, statements };
}

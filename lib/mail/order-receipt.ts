import { goodsOfOrder, receiptFor, type Receipt } from "@/lib/checkout/receipts";

export type OrderAmounts = {
  subtotalCents: number;
  shippingCents: number;
  taxCents: number;
  giftCents: number;
  totalCents: number;
};

/**
 * The §6 receipt of one paid order: the amount paid is the order total, the good-faith estimate
 * of goods and services is the items at list price plus shipping charged, sales tax is passed
 * on its own, and the gift is the rest (PRODUCT.md §6; lib/checkout/receipts.ts).
 */
export function receiptForOrder(
  order: OrderAmounts,
  lines: readonly { name: string; quantity: number; unitPriceCents: number }[] = [],
): Receipt {
  return receiptFor({
    goods: goodsOfOrder({ lines, shippingCents: order.shippingCents }),
    amountPaidCents: order.totalCents,
    goodsValueCents: order.subtotalCents + order.shippingCents,
    salesTaxCents: order.taxCents,
    giftCents: order.giftCents,
  });
}

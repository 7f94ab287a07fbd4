import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { orderLines, organization, type OrderRow } from "@/db/schema";
import { getCenterTimeZone } from "@/lib/giving/queries";
import { goodsOfOrder, receiptFor, type Receipt } from "../receipts";

export type OrderReceipt = Receipt & {
  refundedCents: number;
  organization: { legalName: string; street: string; city: string; state: string; zip: string; taxId: string } | null;
  date: string | null;
  /** The center's time zone: the receipt's date is its calendar day there. */
  timeZone: string;
};

/**
 * The receipt for a paid order (PRODUCT.md §6). A refund comes off the goods first (houses
 * returned or never sent), then off the gift; what remains is what the receipt states.
 */
export function receiptForOrder(
  order: OrderRow,
  lines: readonly { name: string; quantity: number; unitPriceCents: number }[] = [],
): Receipt & { refundedCents: number } {
  const goods = order.subtotalCents + order.shippingCents;
  const tax = order.taxCents;
  let refund = order.refundedCents;
  const fromGoodsAndTax = Math.min(refund, goods + tax);
  refund -= fromGoodsAndTax;
  const goodsAndTaxLeft = goods + tax - fromGoodsAndTax;
  const taxLeft = goods + tax === 0 ? 0 : Math.round((tax * goodsAndTaxLeft) / (goods + tax));
  const goodsLeft = goodsAndTaxLeft - taxLeft;
  const giftLeft = Math.max(0, order.giftCents - refund);
  const paid = goodsLeft + taxLeft + giftLeft;
  if (paid === 0) {
    return {
      kind: order.giftCents > 0 && goods === 0 ? "gift" : "purchase",
      amountPaidCents: 0,
      goodsValueCents: 0,
      salesTaxCents: 0,
      deductibleCents: 0,
      disclosureRequired: false,
      acknowledgmentRequired: false,
      goods: [],
      statements: ["This payment was refunded in full; nothing remains paid or deductible."],
      refundedCents: order.refundedCents,
    };
  }
  return {
    ...receiptFor({
      amountPaidCents: paid,
      goodsValueCents: goodsLeft,
      salesTaxCents: taxLeft,
      giftCents: giftLeft,
      // After a refund the houses kept are not known line by line: the estimate above stands alone.
      goods: order.refundedCents === 0 ? goodsOfOrder({ lines, shippingCents: order.shippingCents }) : [],
    }),
    refundedCents: order.refundedCents,
  };
}

export async function getOrderReceipt(order: OrderRow): Promise<OrderReceipt> {
  const db = await getDb();
  const [org] = await db.select().from(organization).where(eq(organization.id, 1));
  const lines = await db
    .select({ name: orderLines.name, quantity: orderLines.quantity, unitPriceCents: orderLines.unitPriceCents })
    .from(orderLines)
    .where(eq(orderLines.orderId, order.id));
  return {
    ...receiptForOrder(order, lines),
    organization: org
      ? { legalName: org.legalName, street: org.street, city: org.city, state: org.state, zip: org.zip, taxId: org.taxId }
      : null,
    date: order.paidAt ? order.paidAt.toISOString() : null,
    timeZone: await getCenterTimeZone(db),
  };
}

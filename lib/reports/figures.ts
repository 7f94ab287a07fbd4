import { sumCents } from "@/lib/checkout/money";
import { centerMonth } from "@/lib/giving/center-time";

// The center's figures by month, from rows read as they are stored (integer cents), so every
// total is a plain sum of database values: nothing is rounded or estimated. Months are the
// center's calendar months (its time zone). Amounts are as paid, before any later refund.

export type PaidOrderRow = { paidAt: Date; goodsCents: number; shippingCents: number; taxCents: number; hasGoods: boolean };
export type GiftRow = { receivedAt: Date; amountCents: number; monthly: boolean };

export type MonthFigures = { month: string; orders: number; salesCents: number; oneTimeGiftCents: number; monthlyGiftCents: number };

export type Figures = {
  months: MonthFigures[];
  totals: Omit<MonthFigures, "month"> & { averageOrderCents: number | null };
};

export function figuresByMonth({ orders, gifts, timeZone }: { orders: readonly PaidOrderRow[]; gifts: readonly GiftRow[]; timeZone: string }): Figures {
  const byMonth = new Map<string, MonthFigures>();
  const at = (month: string) => {
    let row = byMonth.get(month);
    if (!row) byMonth.set(month, (row = { month, orders: 0, salesCents: 0, oneTimeGiftCents: 0, monthlyGiftCents: 0 }));
    return row;
  };
  for (const order of orders) {
    if (!order.hasGoods) continue;
    const row = at(centerMonth(order.paidAt, timeZone));
    row.orders += 1;
    row.salesCents += order.goodsCents + order.shippingCents + order.taxCents;
  }
  for (const gift of gifts) {
    const row = at(centerMonth(gift.receivedAt, timeZone));
    if (gift.monthly) row.monthlyGiftCents += gift.amountCents;
    else row.oneTimeGiftCents += gift.amountCents;
  }
  const months = [...byMonth.values()].sort((a, b) => a.month.localeCompare(b.month));
  const orderCount = months.reduce((n, m) => n + m.orders, 0);
  const salesCents = sumCents(months.map((m) => m.salesCents));
  return {
    months,
    totals: {
      orders: orderCount,
      salesCents,
      oneTimeGiftCents: sumCents(months.map((m) => m.oneTimeGiftCents)),
      monthlyGiftCents: sumCents(months.map((m) => m.monthlyGiftCents)),
      // Average order: sales (goods, shipping and tax) over orders with goods, to the nearest cent.
      averageOrderCents: orderCount === 0 ? null : Math.round(salesCents / orderCount),
    },
  };
}

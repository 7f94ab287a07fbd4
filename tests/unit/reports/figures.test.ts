import { describe, expect, it } from "vitest";
import { figuresByMonth } from "@/lib/reports/figures";

describe("the center's figures by month", () => {
  it("sums sales, one-time and monthly gifts by the center's month, and averages orders with goods", () => {
    const figures = figuresByMonth({
      timeZone: "America/Los_Angeles",
      orders: [
        // 23:30 on January 31 in Oregon: January's.
        { paidAt: new Date("2027-02-01T07:30:00Z"), goodsCents: 14_900, shippingCents: 1_500, taxCents: 0, hasGoods: true },
        { paidAt: new Date("2027-02-10T18:00:00Z"), goodsCents: 8_900, shippingCents: 1_200, taxCents: 498, hasGoods: true },
        { paidAt: new Date("2027-02-11T18:00:00Z"), goodsCents: 0, shippingCents: 0, taxCents: 0, hasGoods: false },
      ],
      gifts: [
        { receivedAt: new Date("2027-02-01T07:30:00Z"), amountCents: 2_500, monthly: false },
        { receivedAt: new Date("2027-02-11T18:00:00Z"), amountCents: 5_000, monthly: false },
        { receivedAt: new Date("2027-02-15T18:00:00Z"), amountCents: 2_606, monthly: true },
      ],
    });
    expect(figures.months).toEqual([
      { month: "2027-01", orders: 1, salesCents: 16_400, oneTimeGiftCents: 2_500, monthlyGiftCents: 0 },
      { month: "2027-02", orders: 1, salesCents: 10_598, oneTimeGiftCents: 5_000, monthlyGiftCents: 2_606 },
    ]);
    // (16400 + 10598) / 2 = 13499.
    expect(figures.totals).toEqual({ orders: 2, salesCents: 26_998, oneTimeGiftCents: 7_500, monthlyGiftCents: 2_606, averageOrderCents: 13_499 });
  });

  it("has no average without orders", () => {
    expect(figuresByMonth({ timeZone: "UTC", orders: [], gifts: [] }).totals.averageOrderCents).toBeNull();
  });
});

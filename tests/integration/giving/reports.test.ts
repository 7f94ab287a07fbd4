import { sql } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { gifts, monthlyGifts, orders } from "@/db/schema";
import { loadFigures, loadMonthlyDonors } from "@/lib/reports/queries";
import { resetDb } from "../../support/db";

async function paidOrder(paidAt: string, { goods = 0, shipping = 0, tax = 0, gift = 0 }: { goods?: number; shipping?: number; tax?: number; gift?: number }) {
  const db = await getDb();
  const [order] = await db
    .insert(orders)
    .values({ email: "d@example.org", name: "D", accessToken: "t", status: "paid", method: goods > 0 ? "parcel" : "none", subtotalCents: goods, shippingCents: shipping, taxCents: tax, giftCents: gift, totalCents: goods + shipping + tax + gift, paidAt: new Date(paidAt) })
    .returning();
  return order!;
}

describe("the reports' figures", () => {
  beforeEach(async () => {
    await resetDb();
  });

  it("match hand-computed sums and the database to the cent", async () => {
    const db = await getDb();
    // January (Oregon): $149 + $15 shipping; $89 + $12 + $4.98 tax with a $25 gift; a $50 gift alone. February: a $26.06 monthly payment.
    await paidOrder("2027-01-10T18:00:00Z", { goods: 14_900, shipping: 1_500 });
    const mixed = await paidOrder("2027-01-20T18:00:00Z", { goods: 8_900, shipping: 1_200, tax: 498, gift: 2_500 });
    const alone = await paidOrder("2027-02-01T07:30:00Z", { gift: 5_000 }); // 23:30 on January 31 in Oregon
    const monthlyOrder = await paidOrder("2027-02-15T18:00:00Z", { gift: 2_606 });
    const [mg] = await db.insert(monthlyGifts).values({ email: "d@example.org", name: "D", amountCents: 2_606, customerId: "cus_1", subscriptionId: "sub_1", status: "active" }).returning();
    await db.insert(gifts).values([
      { orderId: mixed.id, email: "d@example.org", amountCents: 2_500, receivedAt: mixed.paidAt! },
      { orderId: alone.id, email: "d@example.org", amountCents: 5_000, receivedAt: alone.paidAt! },
      { orderId: monthlyOrder.id, email: "d@example.org", amountCents: 2_606, receivedAt: monthlyOrder.paidAt!, invoiceId: "in_1", monthlyGiftId: mg!.id },
    ]);
    const figures = await loadFigures({ from: "2027-01-01", to: "2027-02-28" }, "America/Los_Angeles");
    expect(figures.months).toEqual([
      { month: "2027-01", orders: 2, salesCents: 26_998, oneTimeGiftCents: 7_500, monthlyGiftCents: 0 },
      { month: "2027-02", orders: 0, salesCents: 0, oneTimeGiftCents: 0, monthlyGiftCents: 2_606 },
    ]);
    expect(figures.totals.averageOrderCents).toBe(13_499);
    // Both drivers answer execute() with { rows }.
    const one = async (q: ReturnType<typeof sql>) => ((await db.execute(q)) as unknown as { rows: { s: number }[] }).rows[0];
    const db1 = await one(sql`select coalesce(sum(subtotal_cents + shipping_cents + tax_cents), 0)::int as s from orders where method <> 'none'`);
    const db2 = await one(sql`select coalesce(sum(amount_cents), 0)::int as s from gifts`);
    expect(figures.totals.salesCents).toBe(db1!.s);
    expect(figures.totals.oneTimeGiftCents + figures.totals.monthlyGiftCents).toBe(db2!.s);
    expect(await loadMonthlyDonors()).toEqual({ donors: 1, monthlyCents: 2_606 });
    // The range's edge is the center's day: from February 1 leaves out the 23:30 January 31 gift.
    expect((await loadFigures({ from: "2027-02-01", to: "2027-02-28" }, "America/Los_Angeles")).totals.oneTimeGiftCents).toBe(0);
  });
});

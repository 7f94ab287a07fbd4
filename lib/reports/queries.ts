import "server-only";
import { and, eq, gte, isNotNull, lt, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { gifts, houseModels, monthlyGifts, orderLines, orders } from "@/db/schema";
import { startOfDayInZone } from "@/lib/fulfillment/store-time";
import { centerDate, centerDay, centerMonth } from "@/lib/giving/center-time";
import { getGivingSettings } from "@/lib/giving/queries";
import { buildPlan, type BuildPlan } from "./build-plan";
import { figuresByMonth, type Figures } from "./figures";
import { reportRange } from "./range";

/** A from/to pair of center calendar days (both included). */
export type ReportRange = { from: string; to: string };

function instants(range: ReportRange, timeZone: string) {
  const next = new Date(Date.parse(`${range.to}T00:00:00Z`) + 86_400_000).toISOString().slice(0, 10);
  return { start: startOfDayInZone({ day: range.from, timeZone }), end: startOfDayInZone({ day: next, timeZone }) };
}

/** Sales and gifts by month in the range: every paid order and every recorded gift. */
export async function loadFigures(range: ReportRange, timeZone: string): Promise<Figures> {
  const db = await getDb();
  const { start, end } = instants(range, timeZone);
  const orderRows = await db
    .select({ paidAt: orders.paidAt, goodsCents: orders.subtotalCents, shippingCents: orders.shippingCents, taxCents: orders.taxCents, method: orders.method })
    .from(orders)
    .where(and(isNotNull(orders.paidAt), gte(orders.paidAt, start), lt(orders.paidAt, end)));
  const giftRows = await db
    .select({ receivedAt: gifts.receivedAt, amountCents: gifts.amountCents, monthlyGiftId: gifts.monthlyGiftId })
    .from(gifts)
    .where(and(gte(gifts.receivedAt, start), lt(gifts.receivedAt, end)));
  return figuresByMonth({
    timeZone,
    orders: orderRows.map((o) => ({ paidAt: o.paidAt!, goodsCents: o.goodsCents, shippingCents: o.shippingCents, taxCents: o.taxCents, hasGoods: o.method !== "none" })),
    gifts: giftRows.map((g) => ({ receivedAt: g.receivedAt, amountCents: g.amountCents, monthly: g.monthlyGiftId !== null })),
  });
}

/** Monthly donors now: how many give each month (active or with a payment to retry) and what they give together. */
export async function loadMonthlyDonors(): Promise<{ donors: number; monthlyCents: number }> {
  const db = await getDb();
  const [row] = await db
    .select({ donors: sql<number>`count(*)::int`, monthlyCents: sql<number>`coalesce(sum(${monthlyGifts.amountCents}), 0)::int` })
    .from(monthlyGifts)
    .where(sql`${monthlyGifts.status} in ('active', 'past_due')`);
  return { donors: row?.donors ?? 0, monthlyCents: row?.monthlyCents ?? 0 };
}

/** Stock on hand per model and its value at list price. */
export async function loadStock(): Promise<{ slug: string; name: string; stock: number; priceCents: number; valueCents: number }[]> {
  const db = await getDb();
  const rows = await db.select({ slug: houseModels.slug, name: houseModels.name, stock: houseModels.stock, priceCents: houseModels.priceCents }).from(houseModels).orderBy(houseModels.name);
  return rows.map((r) => ({ ...r, valueCents: r.stock * r.priceCents }));
}

/** Units sold per model and center month since `since` (paid orders). */
export async function loadUnitsByMonth(since: Date, timeZone: string): Promise<Map<string, Record<string, number>>> {
  const db = await getDb();
  const rows = await db
    .select({ slug: orderLines.slug, quantity: orderLines.quantity, paidAt: orders.paidAt })
    .from(orderLines)
    .innerJoin(orders, eq(orders.id, orderLines.orderId))
    .where(and(isNotNull(orders.paidAt), gte(orders.paidAt, since)));
  const out = new Map<string, Record<string, number>>();
  for (const row of rows) {
    const month = centerMonth(row.paidAt!, timeZone);
    const sales = out.get(row.slug) ?? {};
    sales[month] = (sales[month] ?? 0) + row.quantity;
    out.set(row.slug, sales);
  }
  return out;
}

/** The range asked for in the address, read against today in the center's zone. */
export async function loadReportRange(asked: Record<string, unknown>, now = new Date()): Promise<ReportRange & { timeZone: string }> {
  const { timeZone } = await getGivingSettings();
  return { ...reportRange(asked, centerDay(now, timeZone)), timeZone };
}

export type StockReport = {
  timeZone: string;
  leadTimeWeeks: number;
  stock: Awaited<ReturnType<typeof loadStock>>;
  stockValueCents: number;
  plan: BuildPlan;
};

/** The stock part of the reports (the workshop's): stock, its value and the build plan. */
export async function loadStockReport(now = new Date()): Promise<StockReport> {
  const settings = await getGivingSettings();
  const lastYear = new Date(now.getTime() - 400 * 86_400_000);
  const [stock, units] = await Promise.all([loadStock(), loadUnitsByMonth(lastYear, settings.timeZone)]);
  const plan = buildPlan({
    today: centerDate(now, settings.timeZone),
    leadTimeWeeks: settings.leadTimeWeeks,
    models: stock.map((m) => ({ slug: m.slug, name: m.name, stock: m.stock, sales: units.get(m.slug) ?? {} })),
  });
  return { timeZone: settings.timeZone, leadTimeWeeks: settings.leadTimeWeeks, stock, stockValueCents: stock.reduce((sum, m) => sum + m.valueCents, 0), plan };
}

// The reports' tables as CSV files, one per table on the reports page. Cents are written as
// dollar numbers (26.06, 15), no currency sign, so a spreadsheet reads them as numbers.
// Escaping and the spreadsheet-formula guard: lib/fulfillment/csv.ts (RFC 4180, 2005; OWASP
// "CSV Injection").
import { toCsv } from "@/lib/fulfillment/csv";
import type { BuildPlan } from "./build-plan";
import type { Figures } from "./figures";

export type StockRow = { slug: string; name: string; stock: number; priceCents: number; valueCents: number };

/** Integer cents as a dollar number (26.06); a number, so a negative one is not taken for a formula. */
function dollars(cents: number): number {
  return cents / 100;
}

export const SALES_CSV_HEADER = ["month", "orders", "sales_usd", "one_time_gifts_usd", "monthly_gifts_usd"] as const;
export const STOCK_CSV_HEADER = ["model", "slug", "in_stock", "list_price_usd", "stock_value_usd"] as const;
export const BUILD_PLAN_CSV_HEADER = ["model", "slug", "in_stock", "sold_same_months_last_year", "build"] as const;

/** Sales and gifts by month, then a total row (numbers as numbers, so no guard applies). */
export function salesCsv(figures: Figures): string {
  const rows: (string | number)[][] = figures.months.map((m) => [m.month, m.orders, dollars(m.salesCents), dollars(m.oneTimeGiftCents), dollars(m.monthlyGiftCents)]);
  const t = figures.totals;
  rows.push(["total", t.orders, dollars(t.salesCents), dollars(t.oneTimeGiftCents), dollars(t.monthlyGiftCents)]);
  return toCsv({ header: SALES_CSV_HEADER, rows });
}

/** Stock on hand and its value at list price, then a total row. Model names are staff text: guarded. */
export function stockCsv(stock: readonly StockRow[]): string {
  const rows: (string | number)[][] = stock.map((m) => [m.name, m.slug, m.stock, dollars(m.priceCents), dollars(m.valueCents)]);
  rows.push(["total", "", stock.reduce((s, m) => s + m.stock, 0), "", dollars(stock.reduce((s, m) => s + m.valueCents, 0))]);
  return toCsv({ header: STOCK_CSV_HEADER, rows });
}

export function buildPlanCsv(plan: BuildPlan): string {
  return toCsv({ header: BUILD_PLAN_CSV_HEADER, rows: plan.lines.map((l) => [l.name, l.slug, l.stock, l.expected, l.build]) });
}

/** The download response: a CSV file named after the table. */
export function csvResponse(body: string, filename: string): Response {
  return new Response(body, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${filename}"`,
      "cache-control": "no-store",
    },
  });
}

import type { Metadata } from "next";
import { PageHeader, PageShell } from "@/components/page-header";
import { Card } from "@/components/ui/card";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { requirePageUser } from "@/lib/auth/guard";
import { formatUsd } from "@/lib/checkout/money";
import { centerDate, centerDay } from "@/lib/giving/center-time";
import { getGivingSettings } from "@/lib/giving/queries";
import { buildPlan } from "@/lib/reports/build-plan";
import { loadFigures, loadMonthlyDonors, loadStock, loadUnitsByMonth } from "@/lib/reports/queries";

export const metadata: Metadata = { title: "Reports" };

const DAY = /^\d{4}-\d{2}-\d{2}$/;

export default async function ReportsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageUser("admin:settings", "/admin/reports");
  const [asked, settings] = await Promise.all([searchParams, getGivingSettings()]);
  const now = new Date();
  const today = centerDay(now, settings.timeZone);
  const from = typeof asked.from === "string" && DAY.test(asked.from) ? asked.from : `${today.slice(0, 4)}-01-01`;
  const to = typeof asked.to === "string" && DAY.test(asked.to) && asked.to >= from ? asked.to : today;
  const lastYear = new Date(now.getTime() - 400 * 86_400_000);
  const [figures, donors, stock, units] = await Promise.all([
    loadFigures({ from, to }, settings.timeZone),
    loadMonthlyDonors(),
    loadStock(),
    loadUnitsByMonth(lastYear, settings.timeZone),
  ]);
  const plan = buildPlan({
    today: centerDate(now, settings.timeZone),
    leadTimeWeeks: settings.leadTimeWeeks,
    models: stock.map((m) => ({ slug: m.slug, name: m.name, stock: m.stock, sales: units.get(m.slug) ?? {} })),
  });
  const stockValue = stock.reduce((sum, m) => sum + m.valueCents, 0);
  return (
    <PageShell>
      <PageHeader title="Reports" lead={`Sales, gifts and stock, by the center's calendar months (${settings.timeZone}). Amounts as paid, before later refunds.`} />
      <form method="get" className="mb-8 flex flex-wrap items-end gap-4" aria-label="Date range">
        <label className="flex flex-col gap-1 font-bold">
          From
          <input type="date" name="from" defaultValue={from} className="min-h-11 rounded-lg border border-paper-300 px-3 font-normal" />
        </label>
        <label className="flex flex-col gap-1 font-bold">
          To
          <input type="date" name="to" defaultValue={to} className="min-h-11 rounded-lg border border-paper-300 px-3 font-normal" />
        </label>
        <button type="submit" className="min-h-11 rounded-lg bg-moss-700 px-4 font-bold text-paper-50">
          Show
        </button>
      </form>
      <div className="flex flex-col gap-8">
        <Table caption={`Sales and gifts by month, ${from} to ${to}`}>
          <THead>
            <tr>
              <Th>Month</Th>
              <Th numeric>Orders</Th>
              <Th numeric>Sales</Th>
              <Th numeric>One-time gifts</Th>
              <Th numeric>Monthly gifts</Th>
            </tr>
          </THead>
          <TBody>
            {figures.months.map((m) => (
              <Tr key={m.month}>
                <Td>{m.month}</Td>
                <Td numeric>{m.orders}</Td>
                <Td numeric>{formatUsd(m.salesCents)}</Td>
                <Td numeric>{formatUsd(m.oneTimeGiftCents)}</Td>
                <Td numeric>{formatUsd(m.monthlyGiftCents)}</Td>
              </Tr>
            ))}
            <Tr>
              <Td>
                <strong>Total</strong>
              </Td>
              <Td numeric>{figures.totals.orders}</Td>
              <Td numeric data-testid="total-sales">{formatUsd(figures.totals.salesCents)}</Td>
              <Td numeric data-testid="total-one-time">{formatUsd(figures.totals.oneTimeGiftCents)}</Td>
              <Td numeric data-testid="total-monthly">{formatUsd(figures.totals.monthlyGiftCents)}</Td>
            </Tr>
          </TBody>
        </Table>
        <Card className="grid gap-2 sm:grid-cols-3">
          <p>
            Average order: <strong>{figures.totals.averageOrderCents === null ? "none yet" : formatUsd(figures.totals.averageOrderCents)}</strong>
          </p>
          <p>
            Monthly donors now: <strong>{donors.donors}</strong>, giving <strong>{formatUsd(donors.monthlyCents)}</strong> a month
          </p>
          <p>
            Stock value at list price: <strong>{formatUsd(stockValue)}</strong>
          </p>
        </Card>
        <Table caption="Build plan: houses to build before next spring">
          <THead>
            <tr>
              <Th>Model</Th>
              <Th numeric>In stock</Th>
              <Th numeric>Sold in the same months last year</Th>
              <Th numeric>Build</Th>
            </tr>
          </THead>
          <TBody>
            {plan.lines.map((l) => (
              <Tr key={l.slug}>
                <Td>{l.name}</Td>
                <Td numeric>{l.stock}</Td>
                <Td numeric>{l.expected}</Td>
                <Td numeric>{l.build}</Td>
              </Tr>
            ))}
          </TBody>
        </Table>
        <p className="text-ink-soft">
          How it is computed: for each model, the houses sold in {plan.basis[0]} to {plan.basis.at(-1)} (the same calendar months one year before this
          month through the end of next spring, in May), less the stock on hand; never below zero. Spring starts {plan.springStarts}; with the workshop&apos;s
          lead time of {settings.leadTimeWeeks} weeks, start building by {plan.startBy}.
        </p>
      </div>
    </PageShell>
  );
}

import type { Metadata } from "next";
import { PageHeader, PageShell } from "@/components/page-header";
import { MoneyByMonthChart } from "@/components/reports/money-by-month-chart";
import { StockReportSection } from "@/components/reports/stock-report";
import { Card } from "@/components/ui/card";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { requirePageUser } from "@/lib/auth/guard";
import { formatUsd } from "@/lib/checkout/money";
import { loadFigures, loadMonthlyDonors, loadReportRange, loadStockReport } from "@/lib/reports/queries";

export const metadata: Metadata = { title: "Reports" };

export default async function ReportsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageUser("admin:settings", "/admin/reports");
  const range = await loadReportRange(await searchParams);
  const { from, to, timeZone } = range;
  const [figures, donors, stock] = await Promise.all([loadFigures(range, timeZone), loadMonthlyDonors(), loadStockReport()]);
  const csvHref = `/api/admin/reports/sales.csv?${new URLSearchParams({ from, to }).toString()}`;
  return (
    <PageShell>
      <PageHeader title="Reports" lead={`Sales, gifts and stock, by the center's calendar months (${timeZone}). Amounts as paid, before later refunds.`} />
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
        <section aria-labelledby="money-heading" className="flex flex-col gap-4">
          <h2 id="money-heading" className="font-display text-2xl font-semibold text-moss-900">
            Sales and gifts
          </h2>
          <MoneyByMonthChart months={figures.months} tableId="money-table" />
          <div id="money-table">
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
                  <Td numeric data-testid="total-sales">
                    {formatUsd(figures.totals.salesCents)}
                  </Td>
                  <Td numeric data-testid="total-one-time">
                    {formatUsd(figures.totals.oneTimeGiftCents)}
                  </Td>
                  <Td numeric data-testid="total-monthly">
                    {formatUsd(figures.totals.monthlyGiftCents)}
                  </Td>
                </Tr>
              </TBody>
            </Table>
          </div>
          <a href={csvHref} download className="inline-flex min-h-11 items-center font-bold text-moss-800 underline">
            Download sales and gifts by month (CSV)
          </a>
          <Card className="grid gap-2 sm:grid-cols-2">
            <p>
              Average order: <strong>{figures.totals.averageOrderCents === null ? "none yet" : formatUsd(figures.totals.averageOrderCents)}</strong>
            </p>
            <p>
              Monthly donors now: <strong>{donors.donors}</strong>, giving <strong>{formatUsd(donors.monthlyCents)}</strong> a month
            </p>
          </Card>
        </section>
        <StockReportSection report={stock} />
      </div>
    </PageShell>
  );
}

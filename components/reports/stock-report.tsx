import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { formatUsd } from "@/lib/checkout/money";
import type { StockReport } from "@/lib/reports/queries";
import { StockValueChart } from "./stock-value-chart";

function CsvLink({ href, children }: { href: string; children: string }) {
  return (
    <a href={href} download className="inline-flex min-h-11 items-center font-bold text-moss-800 underline">
      {children}
    </a>
  );
}

/** The workshop's part of the reports: stock on hand, its value and the build plan. */
export function StockReportSection({ report }: { report: StockReport }) {
  const { stock, plan } = report;
  return (
    <section aria-labelledby="stock-heading" className="flex flex-col gap-4">
      <h2 id="stock-heading" className="font-display text-2xl font-semibold text-moss-900">
        Stock and the build plan
      </h2>
      <p>
        Stock value at list price: <strong data-testid="stock-value">{formatUsd(report.stockValueCents)}</strong>
      </p>
      <StockValueChart rows={stock} tableId="stock-table" />
      <div id="stock-table">
        <Table caption="Stock on hand and its value at list price">
          <THead>
            <tr>
              <Th>Model</Th>
              <Th numeric>In stock</Th>
              <Th numeric>List price</Th>
              <Th numeric>Value</Th>
            </tr>
          </THead>
          <TBody>
            {stock.map((m) => (
              <Tr key={m.slug}>
                <Td>{m.name}</Td>
                <Td numeric>{m.stock}</Td>
                <Td numeric>{formatUsd(m.priceCents)}</Td>
                <Td numeric>{formatUsd(m.valueCents)}</Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      </div>
      <CsvLink href="/api/admin/reports/stock.csv">Download the stock table (CSV)</CsvLink>
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
      <CsvLink href="/api/admin/reports/build-plan.csv">Download the build plan (CSV)</CsvLink>
      <p className="max-w-prose text-ink-soft">
        How it is computed: for each model, the houses sold in {plan.basis[0]} to {plan.basis.at(-1)} (the same calendar months one year before this month
        through the end of next spring, in May), less the stock on hand; never below zero. Spring starts {plan.springStarts}; with the workshop&apos;s lead time
        of {report.leadTimeWeeks} weeks, start building by {plan.startBy}.
      </p>
    </section>
  );
}

import type { Metadata } from "next";
import { PageHeader, PageShell } from "@/components/page-header";
import { StockReportSection } from "@/components/reports/stock-report";
import { requirePageUser } from "@/lib/auth/guard";
import { loadStockReport } from "@/lib/reports/queries";

export const metadata: Metadata = { title: "Stock report" };

export default async function StaffReportsPage() {
  await requirePageUser("staff:stock", "/staff/reports");
  const report = await loadStockReport();
  return (
    <PageShell>
      <PageHeader title="Stock report" lead="Houses on hand, their value at list price, and how many to build before next spring." />
      <StockReportSection report={report} />
    </PageShell>
  );
}

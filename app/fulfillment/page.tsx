import type { Metadata } from "next";
import { QueueBrowser } from "@/components/fulfillment/queue-browser";
import { PageHeader, PageShell } from "@/components/page-header";
import { requirePageUser } from "@/lib/auth/guard";
import { listQueueOrders, summarizeQueue } from "@/lib/fulfillment/queries/queue";
import { queueParamsFromSearch } from "@/lib/fulfillment/queue-params";

export const metadata: Metadata = { title: "Shipping desk" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

// The queue of paid orders. The first page arrives rendered; filters, sorting and paging then
// ask the JSON route (app/api/fulfillment/orders) without reloading the page.
export default async function ShippingDeskPage({ searchParams }: Props) {
  await requirePageUser("fulfillment:orders", "/fulfillment");
  const params = queueParamsFromSearch(await searchParams);
  const [summary, firstPage] = await Promise.all([summarizeQueue(), listQueueOrders({ params })]);
  return (
    <PageShell>
      <PageHeader
        title="Shipping desk"
        lead="Paid orders waiting to be packed, shipped or collected. Start with the one waiting longest."
      />
      <QueueBrowser initialParams={params} initialPage={firstPage} summary={summary} now={new Date().toISOString()} />
    </PageShell>
  );
}

import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AdminPanel } from "@/components/fulfillment/admin-panel";
import { BoxesTable } from "@/components/fulfillment/boxes-table";
import { HistoryList } from "@/components/fulfillment/history-list";
import { ItemsTable } from "@/components/fulfillment/items-table";
import { NextStep } from "@/components/fulfillment/next-step";
import { OrderFacts } from "@/components/fulfillment/order-facts";
import { StateBadge } from "@/components/fulfillment/state-badge";
import { PageShell } from "@/components/page-header";
import { ButtonLink } from "@/components/ui/button";
import { requirePageUser } from "@/lib/auth/guard";
import { can } from "@/lib/auth/roles";
import { formatOrderNumber } from "@/lib/checkout/order-number";
import { getFulfillmentOrder } from "@/lib/fulfillment/queries/order-detail";
import { boxesForLines } from "@/lib/fulfillment/packing";
import { allowedTransitions } from "@/lib/orders/state-machine";
import { isFulfillmentState } from "@/lib/orders/statuses";

export const metadata: Metadata = { title: "Order at the shipping desk" };

type Props = { params: Promise<{ id: string }> };

export default async function FulfillmentOrderPage({ params }: Props) {
  const { id } = await params;
  const user = await requirePageUser("fulfillment:orders", `/fulfillment/orders/${id}`);
  const detail = await getFulfillmentOrder({ orderId: id });
  if (!detail) notFound();
  const { order, lines, boxes, events } = detail;
  const open = allowedTransitions({ from: order.status, method: order.method, role: user.role });
  const isAdmin = can(user.role, "admin:refunds");
  const number = formatOrderNumber(order.number);

  return (
    <PageShell>
      <nav aria-label="Breadcrumb" className="mb-4 text-sm">
        <Link href="/fulfillment">Shipping desk</Link> <span aria-hidden="true">/</span> {number}
      </nav>
      <header className="mb-8 flex flex-wrap items-center justify-between gap-4">
        <div className="flex flex-wrap items-center gap-3">
          <h1 className="font-display text-3xl font-semibold text-moss-900 sm:text-4xl">Order {number}</h1>
          <StateBadge status={order.status} />
        </div>
        <ButtonLink href={`/fulfillment/orders/${order.id}/slip`} variant="secondary">
          Packing slip
        </ButtonLink>
      </header>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <div className="flex min-w-0 flex-col gap-6">
          <NextStep
            key={order.version}
            orderId={order.id}
            status={order.status}
            method={order.method}
            version={order.version}
            boxes={boxes.map((b) => ({ id: b.id, description: b.description, tracked: Boolean(b.trackingNumber) }))}
            defaultBoxes={boxesForLines(lines)}
          />
          <ItemsTable lines={lines} />
          {boxes.length > 0 ? <BoxesTable boxes={boxes} /> : null}
          {isAdmin ? (
            <AdminPanel
              key={`admin-${order.version}`}
              orderId={order.id}
              version={order.version}
              corrections={open.filter((t) => t.kind === "correction").map((t) => t.to).filter(isFulfillmentState)}
              canCancel={open.some((t) => t.kind === "cancel" && t.to === "cancelled")}
              canRefund={["shipped", "delivered", "picked_up"].includes(order.status)}
              remainingCents={order.totalCents - order.refundedCents}
            />
          ) : null}
        </div>
        <div className="flex min-w-0 flex-col gap-6">
          <OrderFacts order={order} />
          <HistoryList events={events} />
        </div>
      </div>
    </PageShell>
  );
}

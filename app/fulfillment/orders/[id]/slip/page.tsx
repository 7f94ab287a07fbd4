import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { PackingSlip } from "@/components/fulfillment/packing-slip";
import { PrintButton } from "@/components/fulfillment/print-button";
import { requirePageUser } from "@/lib/auth/guard";
import { formatOrderNumber } from "@/lib/checkout/order-number";
import { getCenterDetails } from "@/lib/fulfillment/queries/center";
import { getFulfillmentOrder } from "@/lib/fulfillment/queries/order-detail";

export const metadata: Metadata = { title: "Packing slip" };

// On paper only the slip prints: the store's header, footer and toasts are hidden.
const PRINT_CSS = `@media print {
  body > header, body > footer, body > [aria-live] { display: none !important; }
  body { background: white; }
  @page { margin: 14mm; }
}`;

type Props = { params: Promise<{ id: string }> };

export default async function PackingSlipPage({ params }: Props) {
  const { id } = await params;
  await requirePageUser("fulfillment:orders", `/fulfillment/orders/${id}/slip`);
  const [detail, center] = await Promise.all([getFulfillmentOrder({ orderId: id }), getCenterDetails()]);
  if (!detail) notFound();
  return (
    <div className="mx-auto w-full max-w-4xl px-4 py-8 print:p-0">
      <style>{PRINT_CSS}</style>
      <div className="mb-6 flex flex-wrap items-center justify-between gap-3 print:hidden">
        <Link href={`/fulfillment/orders/${detail.order.id}`}>Back to order {formatOrderNumber(detail.order.number)}</Link>
        <PrintButton />
      </div>
      <PackingSlip detail={detail} center={center} />
    </div>
  );
}

import type { Metadata } from "next";
import Link from "next/link";
import { OrderSummary } from "@/components/checkout/order-summary";
import { PaymentPendingRefresh } from "@/components/orders/payment-pending-refresh";
import { PageHeader, PageShell } from "@/components/page-header";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { getOrganization } from "@/lib/admin/queries";
import { getSessionUser } from "@/lib/auth/session";
import { getOrderForViewer } from "@/lib/checkout/queries/order-access";
import { formatOrderNumber } from "@/lib/checkout/order-number";
import { getOrderLines } from "@/lib/orders/queries";
import { statusTone, statusWords } from "@/lib/orders/statuses";
import { formatUsd } from "@/lib/checkout/money";
import { AppError } from "@/lib/http/errors";
import { OrderParcels } from "@/components/orders/order-parcels";
import { OrderTimeline } from "@/components/orders/order-timeline";
import { HouseReportPanel } from "@/components/roost-reports/house-report-panel";
import { listReportQuestionsForViewer } from "@/lib/roost-reports/order-reports";

// A private page, opened by its own link or token: rendered per request, and it may wait for its data.
export const instant = false;

export const metadata: Metadata = { title: "Your order" };

type Props = { params: Promise<{ id: string }>; searchParams: Promise<{ t?: string }> };

export default async function OrderPage({ params, searchParams }: Props) {
  const [{ id }, { t }] = await Promise.all([params, searchParams]);
  let order;
  try {
    order = await getOrderForViewer({ orderId: id, token: t, user: await getSessionUser() });
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") {
      return (
        <PageShell narrow>
          <PageHeader title="We could not find that order" lead="Use the link in your confirmation e-mail, or sign in to see your orders." />
          <Link href="/sign-in" className="font-bold underline">
            Sign in
          </Link>
        </PageShell>
      );
    }
    throw error;
  }
  const lines = await getOrderLines({ orderId: order.id });
  const reportQuestions = await listReportQuestionsForViewer({ order, token: t, user: await getSessionUser() });
  const words = statusWords(order.status);
  const linkSuffix = `?t=${encodeURIComponent(order.accessToken)}`;
  const giftOnly = lines.length === 0;

  return (
    <PageShell>
      <PageHeader title={giftOnly ? `Gift ${formatOrderNumber(order.number)}` : `Order ${formatOrderNumber(order.number)}`}>
        <div className="flex flex-wrap items-center gap-3">
          <Badge tone={statusTone(order.status)}>{words.label}</Badge>
          <span className="text-ink-soft">{words.buyerNote}</span>
        </div>
      </PageHeader>
      {order.status === "pending_payment" ? (
        <div className="mb-8 flex flex-col gap-3">
          <Alert tone="info" title="Waiting for your payment">
            If you just paid, the confirmation follows in a moment; this page updates by itself.{" "}
            <Link href={`/checkout/${order.id}${linkSuffix}`} className="font-bold underline">
              Go to the payment page
            </Link>
          </Alert>
          <PaymentPendingRefresh />
        </div>
      ) : null}
      {order.paidAt ? (
        <Alert tone="good" title={giftOnly ? "Thank you for your gift" : "Thank you: your order is paid"}>
          A confirmation {giftOnly ? "and your gift receipt are" : "and your install guide are"} on the way to {order.email}. Keep this page&apos;s link to follow your
          order.{" "}
          <Link href={`/orders/${order.id}/receipt${linkSuffix}`} className="font-bold underline">
            View your receipt
          </Link>
        </Alert>
      ) : null}
      <div className="mt-8 grid gap-10 lg:grid-cols-[1.4fr_1fr]">
        <div className="flex flex-col gap-8">
          {lines.length > 0 ? (
            <section aria-labelledby="items">
              <h2 id="items" className="font-display text-2xl font-semibold text-moss-900">
                Houses
              </h2>
              <Table caption="Houses in this order" hideCaption wrapperClassName="mt-3">
                <THead>
                  <Tr>
                    <Th>House</Th>
                    <Th numeric>Quantity</Th>
                    <Th numeric>Price</Th>
                  </Tr>
                </THead>
                <TBody>
                  {lines.map((l) => (
                    <Tr key={l.id}>
                      <Td>
                        <Link href={`/houses/${l.slug}`} className="underline">
                          {l.name}
                        </Link>
                      </Td>
                      <Td numeric>{l.quantity}</Td>
                      <Td numeric>{formatUsd(l.unitPriceCents * l.quantity)}</Td>
                    </Tr>
                  ))}
                </TBody>
              </Table>
            </section>
          ) : null}
          {lines.length > 0 && order.paidAt ? <OrderParcels orderId={order.id} /> : null}
          <HouseReportPanel questions={reportQuestions} accessToken={t} />
          <OrderTimeline orderId={order.id} />
        </div>
        <aside aria-labelledby="amounts" className="flex flex-col gap-4 self-start rounded-xl border border-paper-200 bg-white p-5">
          <h2 id="amounts" className="font-display text-2xl font-semibold text-moss-900">
            Amounts
          </h2>
          <OrderSummary method={order.method} amounts={order} />
          {order.method === "parcel" && order.shipTo ? (
            <div>
              <h3 className="font-bold">Shipping to</h3>
              <ShipTo address={order.shipTo as Record<string, string>} />
            </div>
          ) : order.method === "pickup" ? (
            <PickupLine />
          ) : null}
        </aside>
      </div>
    </PageShell>
  );
}

function ShipTo({ address }: { address: Record<string, string> }) {
  return (
    <address className="not-italic">
      {address.name}
      <br />
      {address.line1}
      {address.line2 ? (
        <>
          <br />
          {address.line2}
        </>
      ) : null}
      <br />
      {address.city}, {address.state} {address.zip}
    </address>
  );
}

// The center's name and town as its settings give them (admin, Settings).
async function PickupLine() {
  const org = await getOrganization();
  const where = org ? `${org.displayName}, ${org.city}` : "the center";
  return <p>Pickup at {where}. We e-mail you when it is ready.</p>;
}

import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { OrderSummary } from "@/components/checkout/order-summary";
import { PayForm } from "@/components/checkout/pay-form";
import { PageHeader, PageShell } from "@/components/page-header";
import { Alert } from "@/components/ui/alert";
import { getSessionUser } from "@/lib/auth/session";
import { getOrderForViewer } from "@/lib/checkout/queries/order-access";
import { formatOrderNumber } from "@/lib/checkout/order-number";
import { getOrderLines } from "@/lib/orders/queries";
import { getPayments, standInBrowserScript } from "@/lib/checkout/payments";
import { OrderLineList } from "@/components/orders/order-line-list";
import { env } from "@/lib/config/env";
import { AppError } from "@/lib/http/errors";

// A private page, opened by its own link or token: rendered per request, and it may wait for its data.
export const instant = false;

export const metadata: Metadata = { title: "Payment" };

type Props = { params: Promise<{ orderId: string }>; searchParams: Promise<{ t?: string }> };

export default async function CheckoutPage({ params, searchParams }: Props) {
  const [{ orderId }, { t }] = await Promise.all([params, searchParams]);
  let order;
  try {
    order = await getOrderForViewer({ orderId, token: t, user: await getSessionUser() });
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") {
      return (
        <PageShell narrow>
          <PageHeader title="We could not find that checkout" lead="Check the link, or start again from your cart." />
          <Link href="/cart" className="font-bold underline">
            Back to the cart
          </Link>
        </PageShell>
      );
    }
    throw error;
  }
  const orderUrl = `/orders/${order.id}?t=${encodeURIComponent(order.accessToken)}`;
  if (order.status !== "pending_payment" && order.status !== "expired") redirect(orderUrl);
  const lines = await getOrderLines({ orderId: order.id });

  if (order.status === "expired" || !order.paymentIntentId) {
    return (
      <PageShell narrow>
        <PageHeader title="The hold on these houses ran out" lead="We hold houses for 30 minutes while you pay; the time passed and nothing was charged." />
        <Link href="/cart" className="font-bold underline">
          Back to your cart to try again
        </Link>
      </PageShell>
    );
  }
  const intent = await getPayments().paymentIntents.retrieve(order.paymentIntentId);
  const settings = env();
  return (
    <PageShell>
      <PageHeader title="Payment" lead={`Order ${formatOrderNumber(order.number)} for ${order.name}.`} />
      <div className="grid gap-10 lg:grid-cols-[1.3fr_1fr]">
        <section aria-labelledby="card" className="flex flex-col gap-4 rounded-xl border border-paper-200 bg-white p-5 shadow-card">
          <h2 id="card" className="font-display text-2xl font-semibold text-moss-900">
            Card
          </h2>
          {order.reservedUntil ? (
            <p className="text-sm text-ink-soft">
              We are holding your houses until {order.reservedUntil.toLocaleTimeString("en-US", { hour: "numeric", minute: "2-digit", timeZone: "UTC", timeZoneName: "short" })}.
            </p>
          ) : null}
          <PayForm
            orderId={order.id}
            token={order.accessToken}
            clientSecret={intent.client_secret ?? ""}
            publishableKey={settings.STRIPE_PUBLISHABLE_KEY}
                standInScript={standInBrowserScript()}
            totalCents={order.totalCents}
            returnUrl={`${settings.APP_URL}${orderUrl}`}
          />
        </section>
        <aside aria-labelledby="order-summary" className="flex flex-col gap-4 rounded-xl border border-paper-200 bg-white p-5">
          <h2 id="order-summary" className="font-display text-2xl font-semibold text-moss-900">
            Your order
          </h2>
          <OrderLineList lines={lines} />
          <OrderSummary method={order.method} amounts={order} />
          {order.giftCents > 0 ? (
            <Alert tone="info" title="About your gift">
              Your receipt will state the part of this payment that is a tax-deductible gift.
            </Alert>
          ) : null}
        </aside>
      </div>
    </PageShell>
  );
}

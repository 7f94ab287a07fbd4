import type { Metadata } from "next";
import Link from "next/link";
import { PageShell } from "@/components/page-header";
import { PrintButton } from "@/components/orders/print-button";
import { getSessionUser } from "@/lib/auth/session";
import { getOrderForViewer } from "@/lib/checkout/queries/order-access";
import { formatOrderNumber } from "@/lib/checkout/order-number";
import { getOrderLines } from "@/lib/orders/queries";
import { getOrderReceipt } from "@/lib/checkout/queries/receipt";
import { formatUsd } from "@/lib/checkout/money";
import { OrderLineList } from "@/components/orders/order-line-list";
import { AppError } from "@/lib/http/errors";
import { formatCenterDate } from "@/lib/giving/center-time";
import { dedicationLines } from "@/lib/giving/dedication-words";
import { findDedicationForOrder } from "@/lib/giving/queries";

// A private page, opened by its own link or token: rendered per request, and it may wait for its data.
export const instant = false;

export const metadata: Metadata = { title: "Receipt" };

type Props = { params: Promise<{ id: string }>; searchParams: Promise<{ t?: string }> };
const TITLES = {
  gift: "Gift receipt",
  mixed: "Receipt for your purchase and gift",
  purchase: "Purchase confirmation",
} as const;

export default async function ReceiptPage({ params, searchParams }: Props) {
  const [{ id }, { t }] = await Promise.all([params, searchParams]);
  let order;
  try {
    order = await getOrderForViewer({ orderId: id, token: t, user: await getSessionUser() });
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") {
      return (
        <PageShell narrow>
          <h1 className="font-display text-3xl font-semibold">We could not find that receipt</h1>
        </PageShell>
      );
    }
    throw error;
  }
  if (!order.paidAt) {
    return (
      <PageShell narrow>
        <h1 className="font-display text-3xl font-semibold">No receipt yet</h1>
        <p className="mt-3">This order is not paid yet.</p>
      </PageShell>
    );
  }
  const [receipt, lines, dedication] = await Promise.all([getOrderReceipt(order), getOrderLines({ orderId: order.id }), findDedicationForOrder(order.id)]);
  const extras = dedicationLines(dedication);
  const org = receipt.organization;
  return (
    <PageShell>
      <article className="mx-auto max-w-2xl rounded-xl border border-paper-200 bg-white p-8 shadow-card print:border-0 print:shadow-none" data-testid="receipt" data-kind={receipt.kind}>
        <header className="flex flex-col gap-1 border-b border-paper-300 pb-4">
          {org ? (
            <>
              <p className="font-display text-xl font-semibold text-moss-900">{org.legalName}</p>
              <p className="text-sm text-ink-soft">
                {org.street}, {org.city}, {org.state} {org.zip} · Tax id {org.taxId}
              </p>
            </>
          ) : null}
          <h1 className="mt-4 font-display text-3xl font-semibold text-moss-900">{TITLES[receipt.kind]}</h1>
          <p>
            {formatOrderNumber(order.number)} · {order.name} · {receipt.date ? formatCenterDate(new Date(receipt.date), receipt.timeZone) : ""}
          </p>
        </header>
        <OrderLineList lines={lines} className="mt-4" />
        <dl className="mt-4 grid grid-cols-[1fr_auto] gap-x-6 gap-y-1">
          <dt>Amount paid</dt>
          <dd className="text-right font-bold">{formatUsd(receipt.amountPaidCents)}</dd>
          {receipt.kind !== "gift" ? (
            <>
              <dt>Value of goods and services received (houses at list price plus shipping)</dt>
              <dd className="text-right">{formatUsd(receipt.goodsValueCents)}</dd>
            </>
          ) : null}
          {receipt.salesTaxCents > 0 ? (
            <>
              <dt>Sales tax</dt>
              <dd className="text-right">{formatUsd(receipt.salesTaxCents)}</dd>
            </>
          ) : null}
          <dt>Tax-deductible gift</dt>
          <dd className="text-right font-bold" data-testid="deductible">
            {formatUsd(receipt.deductibleCents)}
          </dd>
          {receipt.refundedCents > 0 ? (
            <>
              <dt>Refunded (already taken off the amounts above)</dt>
              <dd className="text-right">{formatUsd(receipt.refundedCents)}</dd>
            </>
          ) : null}
        </dl>
        {extras.length > 0 ? (
          <section className="mt-6 flex flex-col gap-1" aria-label="About this gift" data-testid="gift-extras">
            {extras.map((line) => (
              <p key={line}>{line}</p>
            ))}
          </section>
        ) : null}
        <section className="mt-6 flex flex-col gap-2 rounded-lg bg-paper-100 p-4" aria-label="Statements for tax purposes">
          {receipt.statements.map((s) => (
            <p key={s}>{s}</p>
          ))}
          {receipt.disclosureRequired ? (
            <p className="text-sm text-ink-soft">This disclosure is given because the payment was more than $75 and partly for goods (26 U.S.C. §6115).</p>
          ) : null}
          {receipt.acknowledgmentRequired ? (
            <p className="text-sm text-ink-soft">This receipt is our written acknowledgment of a contribution of $250 or more (26 U.S.C. §170(f)(8)).</p>
          ) : null}
        </section>
        <footer className="mt-6 flex flex-wrap items-center justify-between gap-3 print:hidden">
          <Link href={`/orders/${order.id}?t=${encodeURIComponent(order.accessToken)}`} className="underline">
            Back to the order
          </Link>
          <PrintButton />
        </footer>
      </article>
    </PageShell>
  );
}

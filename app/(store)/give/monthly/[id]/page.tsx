import type { Metadata } from "next";
import Link from "next/link";
import { MonthlyManage } from "@/components/giving/monthly-manage";
import { MonthlyPayForm } from "@/components/giving/monthly-pay-form";
import { PageHeader, PageShell } from "@/components/page-header";
import { ButtonLink } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { getSessionUser } from "@/lib/auth/session";
import { formatUsd } from "@/lib/checkout/money";
import { standInBrowserScript } from "@/lib/checkout/payments";
import { env } from "@/lib/config/env";
import { formatCenterDate } from "@/lib/giving/center-time";
import { monthlyGiftForDonor, openInvoiceSecret } from "@/lib/giving/commands/monthly";
import { managePath } from "@/lib/giving/manage-link";
import { findDedicationForMonthly, getCenterTimeZone, listMonthlyGiftPayments } from "@/lib/giving/queries";
import { AppError } from "@/lib/http/errors";

// A private page, opened by its own link or token: rendered per request, and it may wait for its data.
export const instant = false;

export const metadata: Metadata = { title: "Your monthly gift", robots: { index: false } };

type Props = { params: Promise<{ id: string }>; searchParams: Promise<{ s?: string }> };

const STATUS_WORDS = {
  pending: "Waiting for the first payment",
  active: "Active",
  past_due: "This month's payment did not go through",
  stopped: "Stopped",
} as const;

export default async function MonthlyGiftPage({ params, searchParams }: Props) {
  const [{ id }, { s }] = await Promise.all([params, searchParams]);
  let gift;
  try {
    gift = await monthlyGiftForDonor({ id, token: s, user: await getSessionUser() });
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") {
      return (
        <PageShell narrow>
          <h1 className="font-display text-3xl font-semibold">We could not find that monthly gift</h1>
          <p className="mt-3">Use the link in the e-mail we sent you, or sign in with the account you gave from.</p>
        </PageShell>
      );
    }
    throw error;
  }
  const settings = env();
  const selfPath = managePath({ monthlyGiftId: gift.id, secret: settings.NEXTAUTH_SECRET });
  const [payments, timeZone, dedication, open] = await Promise.all([
    listMonthlyGiftPayments(gift.id),
    getCenterTimeZone(),
    findDedicationForMonthly(gift.id),
    gift.status === "pending" || gift.status === "past_due" ? openInvoiceSecret(gift) : Promise.resolve(null),
  ]);
  const fee = dedication?.feeCoveredCents ?? 0;
  return (
    <PageShell>
      <PageHeader title="Your monthly gift" lead={`Thank you, ${gift.name}. Keep this page's address private: it lets you manage this gift without signing in.`} />
      <div className="grid gap-8 lg:grid-cols-[1fr_1.1fr]">
        <Card as="section" aria-labelledby="summary-heading" className="flex flex-col gap-3">
          <h2 id="summary-heading" className="font-display text-2xl font-semibold text-moss-900">
            {formatUsd(gift.amountCents)} a month
          </h2>
          <p data-testid="monthly-status" data-status={gift.status}>
            <strong>{STATUS_WORDS[gift.status]}</strong>
          </p>
          {fee > 0 ? <p className="text-ink-soft">Includes {formatUsd(fee)} you added to cover the card fee; all of it is part of your gift.</p> : null}
          <h3 className="mt-2 font-bold">Payments received</h3>
          {payments.length === 0 ? (
            <p className="text-ink-soft">None yet.</p>
          ) : (
            <ul className="flex flex-col gap-1" data-testid="monthly-payments">
              {payments.map((p) => (
                <li key={p.orderId}>
                  {formatCenterDate(p.receivedAt, timeZone)} · {formatUsd(p.amountCents)} ·{" "}
                  <Link className="underline" href={`/orders/${p.orderId}/receipt?t=${encodeURIComponent(p.accessToken)}`}>
                    receipt
                  </Link>
                </li>
              ))}
            </ul>
          )}
        </Card>
        <Card as="section" aria-label="Pay or manage" className="flex flex-col gap-6">
          {open ? (
            <div className="flex flex-col gap-3">
              <h2 className="font-display text-2xl font-semibold text-moss-900">{gift.status === "pending" ? "The first payment" : "Pay this month with another card"}</h2>
              <MonthlyPayForm
                clientSecret={open.clientSecret}
                publishableKey={settings.STRIPE_PUBLISHABLE_KEY}
                standInScript={standInBrowserScript()}
                amountCents={open.amountCents}
                returnUrl={`${settings.APP_URL}${selfPath}`}
                label={gift.status === "pending" ? "Give" : "Pay"}
              />
              {gift.status === "past_due" ? <p className="text-sm text-ink-soft">The card you give here is used for the following months too.</p> : null}
            </div>
          ) : gift.status === "pending" ? (
            <p role="status">We are confirming your first payment; this takes a moment. Reload the page to see it.</p>
          ) : null}
          {gift.status === "active" || gift.status === "past_due" ? <MonthlyManage id={gift.id} token={s ?? null} amountCents={gift.amountCents} /> : null}
          {gift.status === "stopped" ? (
            <div className="flex flex-col gap-3">
              <p>This monthly gift is stopped; no further payment will be taken.</p>
              <ButtonLink href="/give" variant="secondary">
                Start a new monthly gift
              </ButtonLink>
            </div>
          ) : null}
        </Card>
      </div>
    </PageShell>
  );
}

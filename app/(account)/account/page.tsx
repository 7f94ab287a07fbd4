import type { Metadata } from "next";
import Link from "next/link";
import { SignOutButton } from "@/components/auth/sign-out-button";
import { PageHeader, PageShell } from "@/components/page-header";
import { Badge } from "@/components/ui/badge";
import { Card } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { ButtonLink } from "@/components/ui/button";
import { requirePageUser } from "@/lib/auth/guard";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { formatOrderNumber } from "@/lib/checkout/order-number";
import { listOrdersForUser } from "@/lib/orders/queries";
import { statusTone, statusWords } from "@/lib/orders/statuses";
import { formatUsd } from "@/lib/checkout/money";
import { HouseReportPanel } from "@/components/roost-reports/house-report-panel";
import { listHouseQuestions } from "@/lib/roost-reports/queries";

export const metadata: Metadata = { title: "My account" };

const day = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeZone: "UTC" });
const LINKS = [
  { href: "/account/gifts", label: "Gifts and year-end statements" },
  { href: "/account/sites", label: "Saved sites" },
  { href: "/account/preferences", label: "E-mail preferences" },
];

export default async function AccountPage() {
  const user = await requirePageUser("account", "/account");
  const orders = (await listOrdersForUser({ userId: user.id })).filter((o) => o.status !== "expired");
  const reportQuestions = await listHouseQuestions({ orderIds: orders.map((o) => o.id) });
  return (
    <PageShell>
      <PageHeader title={`Hello, ${user.name}`} lead="Your orders, gifts and saved sites live here." />
      <div className="grid gap-8 lg:grid-cols-[1.5fr_1fr]">
        <section aria-labelledby="orders">
          <h2 id="orders" className="font-display text-2xl font-semibold text-moss-900">
            Your orders
          </h2>
          {orders.length === 0 ? (
            <EmptyState title="No orders yet" action={<ButtonLink href="/houses">Browse the houses</ButtonLink>}>
              When you buy a house or give a gift while signed in, it appears here.
            </EmptyState>
          ) : (
            <ul className="mt-3 divide-y divide-paper-200 rounded-xl border border-paper-200 bg-white">
              {orders.map((o) => (
                <li key={o.id} className="flex flex-wrap items-center justify-between gap-3 p-4">
                  <div>
                    <Link href={`/orders/${o.id}`} className="font-bold text-moss-800 underline">
                      {formatOrderNumber(o.number)}
                    </Link>
                    <p className="text-sm text-ink-soft">
                      {day.format(o.createdAt)} · {o.method === "none" ? "Gift" : formatUsd(o.totalCents)}
                    </p>
                  </div>
                  <Badge tone={statusTone(o.status)}>{statusWords(o.status).label}</Badge>
                </li>
              ))}
            </ul>
          )}
          <div className="mt-10">
            <HouseReportPanel questions={reportQuestions} />
          </div>
        </section>
        <div className="flex flex-col gap-6">
          <Card>
            <h2 className="font-display text-xl font-semibold text-moss-900">Your details</h2>
            <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
              <dt className="text-ink-soft">Name</dt>
              <dd>{user.name}</dd>
              <dt className="text-ink-soft">E-mail</dt>
              <dd className="break-all">{user.email}</dd>
              <dt className="text-ink-soft">Account</dt>
              <dd>{ROLE_LABELS[user.role]}</dd>
            </dl>
            <ul className="mt-4 flex flex-col gap-2">
              {LINKS.map((l) => (
                <li key={l.href}>
                  <Link href={l.href} className="font-bold text-moss-800 underline">
                    {l.label}
                  </Link>
                </li>
              ))}
            </ul>
            <div className="mt-5">
              <SignOutButton />
            </div>
          </Card>
        </div>
      </div>
    </PageShell>
  );
}

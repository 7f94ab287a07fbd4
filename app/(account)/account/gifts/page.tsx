import type { Metadata } from "next";
import Link from "next/link";
import { YearEndButton } from "@/components/account/year-end-button";
import { PageHeader, PageShell } from "@/components/page-header";
import { ButtonLink } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { requirePageUser } from "@/lib/auth/guard";
import { formatUsd } from "@/lib/checkout/money";
import { yearEndStatement } from "@/lib/checkout/receipts";
import { listGiftsForUser } from "@/lib/mail/queries/donor-gifts";
import { formatMailDate } from "@/lib/mail/format";
import { centerYear } from "@/lib/giving/center-time";
import { getCenterTimeZone, listMonthlyGiftsForUser } from "@/lib/giving/queries";

export const metadata: Metadata = { title: "Your gifts" };

function pickYear(raw: string | string[] | undefined, years: number[]): number {
  const asked = typeof raw === "string" && /^\d{4}$/.test(raw) ? Number(raw) : NaN;
  return years.includes(asked) ? asked : (years[0] ?? asked);
}

export default async function GiftsPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const user = await requirePageUser("account", "/account/gifts");
  const [gifts, timeZone, monthly] = await Promise.all([listGiftsForUser({ userId: user.id }), getCenterTimeZone(), listMonthlyGiftsForUser(user.id)]);
  const thisYear = centerYear(new Date(), timeZone);
  const years = [...new Set([thisYear, ...gifts.map((g) => centerYear(g.date, timeZone))])].sort(
    (a, b) => b - a,
  );
  const year = pickYear((await searchParams).year, years);
  const statement = yearEndStatement({
    gifts: gifts.map((g) => ({ date: g.date, amountCents: g.amountCents, orderId: g.orderId })),
    year,
    timeZone,
  });
  const numbers = new Map(gifts.map((g) => [g.orderId, g.orderNumber]));

  return (
    <PageShell>
      <PageHeader
        title="Your gifts"
        lead="Every conservation gift you made while signed in, and a statement for any year for your tax records."
      />
      {monthly.length > 0 ? (
        <Card as="section" aria-labelledby="monthly-heading" className="mb-8 flex flex-col gap-2">
          <h2 id="monthly-heading" className="font-display text-2xl font-semibold text-moss-900">
            Your monthly gifts
          </h2>
          <ul className="flex flex-col gap-1">
            {monthly.map((m) => (
              <li key={m.id}>
                {formatUsd(m.amountCents)} a month · {m.status === "stopped" ? "stopped" : m.status === "past_due" ? "payment did not go through" : m.status === "pending" ? "waiting for the first payment" : "active"} ·{" "}
                <Link className="underline" href={`/give/monthly/${m.id}`}>
                  {m.status === "stopped" ? "see it" : "change or stop it"}
                </Link>
              </li>
            ))}
          </ul>
        </Card>
      ) : null}
      {gifts.length === 0 ? (
        <EmptyState
          title="No gifts yet"
          description="Gifts you add at checkout while signed in appear here, each with its receipt."
          action={<ButtonLink href="/houses">Browse the houses</ButtonLink>}
        />
      ) : (
        <div className="grid gap-8 lg:grid-cols-[1.4fr_1fr]">
          <Table caption="All your gifts, newest first">
            <THead>
              <tr>
                <Th>Date</Th>
                <Th>Order</Th>
                <Th numeric>Gift</Th>
              </tr>
            </THead>
            <TBody>
              {gifts.map((gift) => (
                <Tr key={gift.orderId}>
                  <Td>{formatMailDate(gift.date, timeZone)}</Td>
                  <Td>{gift.orderNumber}</Td>
                  <Td numeric>{formatUsd(gift.amountCents)}</Td>
                </Tr>
              ))}
            </TBody>
          </Table>
          <Card as="section" aria-labelledby="statement-heading" className="flex flex-col gap-4">
            <h2
              id="statement-heading"
              className="font-display text-2xl font-semibold text-moss-900"
            >
              Year-end statement
            </h2>
            <nav aria-label="Statement year">
              <ul className="flex flex-wrap gap-2">
                {years.map((y) => (
                  <li key={y}>
                    <Link
                      href={`/account/gifts?year=${y}`}
                      aria-current={y === year ? "page" : undefined}
                      className={`inline-flex min-h-11 items-center rounded-lg border px-3 font-bold ${y === year ? "border-moss-700 bg-moss-700 text-paper-50" : "border-moss-600 text-moss-800 underline"}`}
                    >
                      {y}
                    </Link>
                  </li>
                ))}
              </ul>
            </nav>
            <p className="text-3xl font-bold text-moss-900">{formatUsd(statement.totalCents)}</p>
            {statement.gifts.length > 0 ? (
              <ul className="flex flex-col gap-1 text-ink-soft">
                {statement.gifts.map((gift) => (
                  <li key={gift.orderId}>
                    {formatMailDate(gift.date, timeZone)} · {numbers.get(gift.orderId)} ·{" "}
                    {formatUsd(gift.amountCents)}
                  </li>
                ))}
              </ul>
            ) : null}
            {statement.statements.map((line) => (
              <p key={line}>{line}</p>
            ))}
            <p className="text-sm text-ink-soft">
              Dates and years are the center&apos;s own ({timeZone}), as on each gift&apos;s receipt.
            </p>
            {statement.count > 0 ? <YearEndButton year={year} email={user.email} /> : null}
          </Card>
        </div>
      )}
    </PageShell>
  );
}

import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader, PageShell } from "@/components/page-header";
import { ResendStatement } from "@/components/giving/resend-statement";
import { Card } from "@/components/ui/card";
import { requirePageUser } from "@/lib/auth/guard";
import { centerYear } from "@/lib/giving/center-time";
import { listStatementDonors } from "@/lib/giving/commands/statements";
import { getCenterTimeZone } from "@/lib/giving/queries";
import { previewStatement } from "@/lib/mail/queries/statement-preview";

export const metadata: Metadata = { title: "Year-end statements" };

export default async function StatementsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageUser("admin:mail", "/admin/statements");
  const [asked, timeZone] = await Promise.all([searchParams, getCenterTimeZone()]);
  const lastYear = centerYear(new Date(), timeZone) - 1;
  const year = typeof asked.year === "string" && /^\d{4}$/.test(asked.year) ? Number(asked.year) : lastYear;
  const donors = await listStatementDonors(year, timeZone);
  const chosen = typeof asked.user === "string" ? donors.find((d) => d.userId === asked.user) : undefined;
  const preview = chosen ? await previewStatement({ userId: chosen.userId, year }) : null;
  return (
    <PageShell>
      <PageHeader title="Year-end statements" lead={`Each donor with an account and gifts in a year gets its statement in the first days of January (${timeZone}). Preview one and send it again.`} />
      <form method="get" className="mb-6 flex flex-wrap items-end gap-4" aria-label="Year">
        <label className="flex flex-col gap-1 font-bold">
          Year
          <input type="number" name="year" min={2000} max={2100} defaultValue={year} className="min-h-11 w-32 rounded-lg border border-paper-300 px-3 font-normal" />
        </label>
        <button type="submit" className="min-h-11 rounded-lg bg-moss-700 px-4 font-bold text-paper-50">
          Show
        </button>
      </form>
      <div className="grid gap-6 lg:grid-cols-[18rem_1fr]">
        <Card>
          <h2 className="font-display text-xl font-semibold text-moss-900">Donors in {year}</h2>
          {donors.length === 0 ? (
            <p className="mt-2 text-ink-soft">No donor with an account gave in {year}.</p>
          ) : (
            <ul className="mt-2 flex flex-col gap-1">
              {donors.map((d) => (
                <li key={d.userId}>
                  <Link href={`/admin/statements?year=${year}&user=${d.userId}`} aria-current={chosen?.userId === d.userId ? "page" : undefined} className="inline-flex min-h-11 items-center text-moss-800 underline">
                    {d.name} ({d.email})
                  </Link>
                </li>
              ))}
            </ul>
          )}
        </Card>
        {chosen && preview ? (
          <section aria-labelledby="preview-heading" className="flex flex-col gap-4">
            <h2 id="preview-heading" className="font-display text-xl font-semibold text-moss-900">
              The {year} statement for {chosen.email}
            </h2>
            <iframe title={`Preview of the ${year} statement for ${chosen.email}`} sandbox="" srcDoc={preview.html} className="h-[36rem] w-full rounded-xl border border-paper-200 bg-white" />
            <ResendStatement userId={chosen.userId} year={year} email={chosen.email} />
          </section>
        ) : (
          <p className="text-ink-soft">Choose a donor to preview the statement.</p>
        )}
      </div>
    </PageShell>
  );
}

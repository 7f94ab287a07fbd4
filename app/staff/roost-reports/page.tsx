import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader, PageShell } from "@/components/page-header";
import { ReviewCard, type ReviewCardData } from "@/components/roost-reports/review-card";
import { ButtonLink } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { requirePageUser } from "@/lib/auth/guard";
import { CLIMATE_BANDS, type BandId } from "@/lib/catalog/climate-bands";
import { countReportsByModel, listReportsForReview } from "@/lib/roost-reports/queries";
import { seasonLabel } from "@/lib/roost-reports/season-rules";

export const metadata: Metadata = { title: "Roost reports" };

const day = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeZone: "UTC" });
const REPORTER_WORDS = { account: "signed in", order_link: "from the order link", email_link: "from the e-mail link", demo: "demo data" } as const;

export default async function RoostReportsReviewPage() {
  await requirePageUser("staff:roost-reports", "/staff/roost-reports");
  const [reports, counts] = await Promise.all([listReportsForReview(), countReportsByModel()]);
  const cards: ReviewCardData[] = reports.map((r) => ({
    id: r.id,
    modelName: r.modelName,
    unit: r.unit,
    seasonLabel: seasonLabel({ season: r.season, hemisphere: r.hemisphere === "south" ? "south" : "north" }),
    summer: r.summer,
    answer: r.answer,
    countBand: r.countBand,
    note: r.note,
    photo: r.photoKeyBase ? { keyBase: r.photoKeyBase, widths: r.photoWidths ?? [] } : null,
    bandLabel: r.bandId && r.bandId in CLIMATE_BANDS ? CLIMATE_BANDS[r.bandId as BandId].label : null,
    mount: r.mount,
    state: r.state,
    reporterWords: REPORTER_WORDS[r.reporter],
    review: r.review,
    reviewReason: r.reviewReason,
    reviewerName: r.reviewerName,
    demo: r.demo,
    reportedOn: day.format(r.reportedAt),
  }));
  const waiting = cards.filter((c) => c.review === "new");
  const followUp = cards.filter((c) => c.review === "follow_up");
  const doubtful = cards.filter((c) => c.review === "doubtful");
  return (
    <PageShell>
      <PageHeader title="Roost reports" lead="What buyers tell us after each summer. Check new reports; a doubtful one is left out of every figure.">
        <ButtonLink href="/staff/roost-reports/figures">See the figures</ButtonLink>
      </PageHeader>
      <section aria-labelledby="per-model" className="mb-10">
        <h2 id="per-model" className="font-display text-2xl font-semibold text-moss-900">
          Per model
        </h2>
        {counts.length === 0 ? (
          <EmptyState className="mt-3" level={3} title="No reports yet">
            The first questions go out after the maternity season.
          </EmptyState>
        ) : (
          <Table caption="Current reports per model" wrapperClassName="mt-3">
            <THead>
              <Tr>
                <Th>Model</Th>
                <Th numeric>Houses</Th>
                <Th numeric>Reports</Th>
                <Th numeric>With signs or bats</Th>
                <Th numeric>New</Th>
                <Th numeric>Follow up</Th>
                <Th numeric>Doubtful</Th>
              </Tr>
            </THead>
            <TBody>
              {counts.map((c) => (
                <Tr key={c.slug}>
                  <Td>
                    <Link href={`/houses/${c.slug}`} className="underline">
                      {c.name}
                    </Link>
                  </Td>
                  <Td numeric>{c.houses}</Td>
                  <Td numeric>{c.reports}</Td>
                  <Td numeric>{c.occupied}</Td>
                  <Td numeric>{c.waiting}</Td>
                  <Td numeric>{c.followUp}</Td>
                  <Td numeric>{c.doubtful}</Td>
                </Tr>
              ))}
            </TBody>
          </Table>
        )}
      </section>
      {(
        [
          ["new-reports", "New reports", waiting, "Nothing new to check."],
          ["follow-up", "To follow up", followUp, "Nothing flagged for follow-up."],
          ["doubtful", "Doubtful (not counted)", doubtful, "No report is marked doubtful."],
        ] as const
      ).map(([id, title, list, empty]) => (
        <section key={id} aria-labelledby={id} className="mb-10">
          <h2 id={id} className="font-display text-2xl font-semibold text-moss-900">
            {title} <span className="text-lg font-normal text-ink-soft">({list.length})</span>
          </h2>
          {list.length === 0 ? (
            <p className="mt-2 text-ink-soft">{empty}</p>
          ) : (
            <div className="mt-3 grid gap-4 lg:grid-cols-2">
              {list.map((c) => (
                <ReviewCard key={c.id} report={c} />
              ))}
            </div>
          )}
        </section>
      ))}
    </PageShell>
  );
}

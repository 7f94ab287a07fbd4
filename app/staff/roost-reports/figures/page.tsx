import type { Metadata } from "next";
import { PageHeader, PageShell } from "@/components/page-header";
import { OccupancyChart } from "@/components/roost-reports/occupancy-chart";
import { ReportsOverTimeChart, type SeasonCounts } from "@/components/roost-reports/reports-over-time-chart";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";
import { requirePageUser } from "@/lib/auth/guard";
import { ROOST_ANSWERS } from "@/lib/roost-reports/answers";
import { DEMO_NOTE, getOccupancyPicture, VOLUNTARY_CAVEAT } from "@/lib/roost-reports/queries";

export const metadata: Metadata = { title: "Roost report figures" };

export default async function RoostReportFiguresPage() {
  await requirePageUser("staff:roost-reports", "/staff/roost-reports/figures");
  const picture = await getOccupancyPicture();
  const seasons = new Map<string, SeasonCounts>();
  for (const row of picture.overTime) {
    const entry = seasons.get(row.label) ?? { label: row.label, ...Object.fromEntries(ROOST_ANSWERS.map((a) => [a, 0])) } as SeasonCounts;
    entry[row.answer] += row.n;
    seasons.set(row.label, entry);
  }
  const first = picture.firstOccupancy;
  return (
    <PageShell>
      <PageHeader title="Roost report figures" lead="Occupancy within two summers, with 95% Wilson intervals; groups with fewer than 5 houses known show no rate.">
        <ButtonLink href="/staff/roost-reports" variant="secondary">
          Back to the reports
        </ButtonLink>
      </PageHeader>
      {picture.demo ? (
        <Alert tone="warn" title="Demo figures" className="mb-6">
          {DEMO_NOTE}
        </Alert>
      ) : null}
      <div className="grid gap-6 xl:grid-cols-2">
        <OccupancyChart title="Occupancy by model" description="Share of houses with signs or bats within two summers, per model, with 95% intervals." rows={picture.byModel} />
        <OccupancyChart title="Occupancy by summers (climate band)" description="Share of houses with signs or bats within two summers, per climate band." rows={picture.byBand} />
        <OccupancyChart title="Occupancy by mount" description="Share of houses with signs or bats within two summers, per mount." rows={picture.byMount} />
        <ReportsOverTimeChart seasons={[...seasons.values()]} />
      </div>
      <section aria-labelledby="first-bats" className="mt-8 max-w-prose">
        <h2 id="first-bats" className="font-display text-2xl font-semibold text-moss-900">
          Time to first bats
        </h2>
        <p className="mt-2">
          {first.houses === 0
            ? "No house has been reported with signs or bats yet."
            : `${first.houses} houses have had signs or bats: ${first.bySummer.map((s) => `${s.houses} in the ${s.label}`).join(", ")}; median summer ${first.medianSummer}.`}
        </p>
        <p className="mt-4 text-sm text-ink-soft">{VOLUNTARY_CAVEAT}</p>
      </section>
    </PageShell>
  );
}

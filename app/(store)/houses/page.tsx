import type { Metadata } from "next";
import Link from "next/link";
import { CatalogBrowser } from "@/components/catalog/catalog-browser";
import { PageHeader, PageShell } from "@/components/page-header";
import { Alert } from "@/components/ui/alert";
import { getBandChoice } from "@/lib/climate/band-cookie-server";
import { catalogQuerySchema, type CatalogQuery } from "@/lib/catalog/catalog-query";
import { toHouseCard } from "@/lib/catalog/house-card";
import { listHouses } from "@/lib/catalog/queries";
import { withOccupancyMarks } from "@/lib/roost-reports/catalog-marks";

export const metadata: Metadata = { title: "Houses" };

export default async function HousesPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const raw = Object.fromEntries(Object.entries(await searchParams).filter(([, v]) => typeof v === "string")) as Record<string, string>;
  const parsed = catalogQuerySchema.safeParse(raw);
  const query: CatalogQuery = parsed.success ? parsed.data : {};
  if (!query.band && raw.band === undefined) {
    const choice = await getBandChoice();
    if (choice) query.band = choice.id;
  }
  const items = await listHouses(query);
  const cards = await withOccupancyMarks(items.map(toHouseCard));
  return (
    <PageShell>
      <PageHeader
        title="Bat houses"
        lead="Every house here carries our Roostwright Sound Build: it meets our roost-design criteria, and a built sample was measured by our workshop. Choose your summers to see which suit you."
      />
      {!parsed.success ? (
        <div className="mb-6">
          <Alert tone="warn" title="Some filters in the address were not understood">
            We showed every house instead. {parsed.error.issues[0]?.message}
          </Alert>
        </div>
      ) : null}
      {!query.band ? (
        <p className="mb-6 text-ink-soft">
          Not sure of your summers?{" "}
          <Link href="/climate" className="font-bold text-moss-800 underline">
            Find your climate band from your ZIP code
          </Link>
          .
        </p>
      ) : null}
      <CatalogBrowser initialQuery={query} initialResult={{ items: cards, total: items.length }} />
    </PageShell>
  );
}

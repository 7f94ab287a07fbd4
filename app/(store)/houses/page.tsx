import type { Metadata } from "next";
import Link from "next/link";
import { Suspense } from "react";
import { CatalogBrowser } from "@/components/catalog/catalog-browser";
import { PageHeader, PageShell } from "@/components/page-header";
import { Alert } from "@/components/ui/alert";
import { LoadingRegion, Skeleton } from "@/components/ui/skeleton";
import { getBandChoice } from "@/lib/climate/band-cookie-server";
import { catalogCards } from "@/lib/catalog/buyer-view";
import { catalogQuerySchema, type CatalogQuery } from "@/lib/catalog/catalog-query";

export const metadata: Metadata = { title: "Houses" };

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

// The heading and lead are the prerendered shell; the houses stream in (they depend on the address's
// filters and the band cookie) from the cached catalog.
export default function HousesPage({ searchParams }: { searchParams: SearchParams }) {
  return (
    <PageShell>
      <PageHeader
        title="Bat houses"
        lead="Every house here carries our Roostwright Sound Build: it meets our roost-design criteria, and a built sample was measured by our workshop. Choose your summers to see which suit you."
      />
      <Suspense fallback={<CatalogLoading />}>
        <Catalog searchParams={searchParams} />
      </Suspense>
    </PageShell>
  );
}

async function Catalog({ searchParams }: { searchParams: SearchParams }) {
  const raw = Object.fromEntries(Object.entries(await searchParams).filter(([, v]) => typeof v === "string")) as Record<string, string>;
  const parsed = catalogQuerySchema.safeParse(raw);
  const query: CatalogQuery = parsed.success ? parsed.data : {};
  const choice = await getBandChoice();
  if (!query.band && raw.band === undefined && choice) query.band = choice.id;
  const result = await catalogCards(query);
  return (
    <>
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
      <CatalogBrowser initialQuery={query} initialResult={result} bandChoice={choice} />
    </>
  );
}

function CatalogLoading() {
  return (
    <LoadingRegion label="Loading the houses…" className="flex flex-col gap-6">
      <Skeleton className="h-12 w-full max-w-xl" />
      <div className="grid gap-6 sm:grid-cols-2 lg:grid-cols-3">
        {[0, 1, 2].map((i) => (
          <Skeleton key={i} className="h-80" />
        ))}
      </div>
    </LoadingRegion>
  );
}

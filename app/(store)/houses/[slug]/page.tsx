import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Suspense } from "react";
import { CriteriaTable } from "@/components/catalog/criteria-table";
import { FitBadge } from "@/components/catalog/fit-badge";
import { SpecTable } from "@/components/catalog/spec-table";
import { PageShell } from "@/components/page-header";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { getBandChoice } from "@/lib/climate/band-cookie-server";
import { CERTIFICATION_NAME, CERTIFICATION_SUMMARY } from "@/lib/catalog/certification";
import { CLIMATE_BANDS } from "@/lib/catalog/climate-bands";
import { drawingUrl, photoSrcSet, photoUrl } from "@/lib/catalog/photo-url";
import { houseForBuyer } from "@/lib/catalog/buyer-view";
import { cachedModelOccupancy } from "@/lib/catalog/cached";
import { formatUsd } from "@/lib/checkout/money";
import { AddToCart } from "@/components/checkout/add-to-cart";
import { OccupancyFigures } from "@/components/roost-reports/occupancy-figures";
import { LoadingRegion, Skeleton } from "@/components/ui/skeleton";

type Props = { params: Promise<{ slug: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const house = await houseForBuyer((await params).slug);
  return { title: house?.name ?? "House not found" };
}

const dateFormat = new Intl.DateTimeFormat("en-US", { dateStyle: "long", timeZone: "UTC" });

// The breadcrumb is the prerendered shell; the model streams in from the cached catalog (its slug
// comes with the request, and its fit with the band cookie).
export default function HousePage({ params }: Props) {
  return (
    <PageShell>
      <nav aria-label="Breadcrumb" className="mb-4 text-sm">
        <Link href="/houses" className="text-moss-800 underline">
          All houses
        </Link>
      </nav>
      <Suspense fallback={<HouseLoading />}>
        <House params={params} />
      </Suspense>
    </PageShell>
  );
}

function HouseLoading() {
  return (
    <LoadingRegion label="Loading the house…" className="grid gap-10 lg:grid-cols-[1.1fr_1fr]">
      <Skeleton className="aspect-[4/3] w-full" />
      <div className="flex flex-col gap-4">
        <Skeleton className="h-10 w-2/3" />
        <Skeleton className="h-6 w-1/2" />
        <Skeleton className="h-12 w-40" />
        <Skeleton className="h-40 w-full" />
      </div>
    </LoadingRegion>
  );
}

async function House({ params }: Props) {
  const { slug } = await params;
  const choice = await getBandChoice();
  const house = await houseForBuyer(slug, choice?.id);
  if (!house) notFound();
  const band = choice ? CLIMATE_BANDS[choice.id] : null;
  const { certification } = house;
  const occupancy = await cachedModelOccupancy(house.id);

  return (
    <>
      <div className="grid gap-10 lg:grid-cols-[1.1fr_1fr]">
        <div className="flex flex-col gap-4">
          {house.photos.length > 0 ? (
            house.photos.map((p) => (
              // eslint-disable-next-line @next/next/no-img-element -- sizes come from our own store with srcset
              <img key={p.id} src={photoUrl(p, 960)} srcSet={photoSrcSet(p)} sizes="(min-width: 1024px) 50vw, 100vw" alt={p.altText} width={p.width} height={p.height} className="w-full rounded-xl border border-paper-200 bg-white" />
            ))
          ) : null}
          {/* eslint-disable-next-line @next/next/no-img-element -- an SVG drawing generated from the spec */}
          <img
            src={drawingUrl(house.slug)}
            alt={`Drawing of ${house.name}: front view and a cutaway of its ${house.spec.chamberCount} ${house.spec.chamberCount === 1 ? "chamber" : "chambers"} with dimensions`}
            className="w-full rounded-xl border border-paper-200 bg-white p-2"
          />
        </div>
        <div className="flex flex-col gap-5">
          <div className="flex flex-wrap gap-2">
            <Badge tone={certification.certified ? "good" : "warn"}>{certification.words}</Badge>
            {house.fit ? <FitBadge label={house.fit.label} /> : null}
          </div>
          <h1 className="font-display text-4xl font-semibold text-moss-900">{house.name}</h1>
          <p className="text-lg text-ink-soft">{house.tagline}</p>
          <p className="font-display text-3xl font-semibold text-moss-900">{formatUsd(house.priceCents)}</p>
          <AddToCart slug={house.slug} name={house.name} stock={house.stock} />
          <p>{house.description}</p>
          {house.fit && band ? (
            <section aria-labelledby="fit" className="rounded-xl border border-paper-200 bg-white p-5">
              <h2 id="fit" className="font-display text-xl font-semibold text-moss-900">
                For {band.label.toLowerCase()}
              </h2>
              <ul className="mt-2 list-disc pl-5">
                {house.fit.reasons.map((r) => (
                  <li key={r}>{r}</li>
                ))}
              </ul>
              <p className="mt-2 text-sm text-ink-soft">
                <Link href="/climate" className="underline">
                  Change your climate band
                </Link>
              </p>
            </section>
          ) : (
            <Alert tone="info" title="How does it suit your summers?">
              <Link href="/climate" className="font-bold underline">
                Find your climate band
              </Link>{" "}
              and this page will tell you whether this house suits it, or what to change.
            </Alert>
          )}
          <section aria-labelledby="cert" className="rounded-xl border border-paper-200 bg-white p-5">
            <h2 id="cert" className="font-display text-xl font-semibold text-moss-900">
              {CERTIFICATION_NAME}
            </h2>
            <p className="mt-1 text-ink-soft">{CERTIFICATION_SUMMARY}</p>
            <p className="mt-2">
              {certification.inspectedOn
                ? `Last measured on ${dateFormat.format(new Date(certification.inspectedOn))}${certification.expiresAt ? `; due again by ${dateFormat.format(new Date(certification.expiresAt))}` : ""}.`
                : "No built sample has been measured yet."}
            </p>
          </section>
        </div>
      </div>
      <div className="mt-12">
        <OccupancyFigures occupancy={occupancy} />
      </div>
      <section aria-labelledby="specs" className="mt-12">
        <h2 id="specs" className="font-display text-2xl font-semibold text-moss-900">
          Measurements
        </h2>
        <SpecTable spec={house.spec} carton={house.carton} />
      </section>
      <section aria-labelledby="criteria" className="mt-12">
        <h2 id="criteria" className="font-display text-2xl font-semibold text-moss-900">
          How it meets our design criteria
        </h2>
        <p className="mt-1 max-w-prose text-ink-soft">
          Required criteria must pass before a house can be sold; advisory ones add notes. Each rule names its source.
        </p>
        <CriteriaTable results={house.check.results} />
      </section>
    </>
  );
}

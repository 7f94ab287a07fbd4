import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { SHADE_LABELS, type Shade } from "@/lib/catalog/spec-words";
import type { HouseCard as HouseCardData } from "@/lib/catalog/house-card";
import { drawingUrl, photoSrcSet, photoUrl } from "@/lib/catalog/photo-url";
import { formatUsd } from "@/lib/checkout/money";
import { FitBadge } from "./fit-badge";
import { OccupancyMark } from "@/components/roost-reports/occupancy-mark";

export function HouseCard({ house }: { house: HouseCardData }) {
  return (
    <article className="relative flex flex-col overflow-hidden rounded-xl border border-paper-200 bg-white shadow-card" data-testid="house-card">
      <div className="aspect-[4/3] bg-paper-100">
        {house.photo ? (
          // eslint-disable-next-line @next/next/no-img-element -- sizes come from our own store with srcset
          <img
            src={photoUrl(house.photo, 480)}
            srcSet={photoSrcSet(house.photo)}
            sizes="(min-width: 1024px) 33vw, (min-width: 640px) 50vw, 100vw"
            alt={house.photo.altText}
            className="size-full object-cover"
            loading="lazy"
          />
        ) : (
          // eslint-disable-next-line @next/next/no-img-element -- an SVG drawing generated from the spec
          <img src={drawingUrl(house.slug)} alt={`Drawing of ${house.name}`} className="size-full object-contain p-2" loading="lazy" />
        )}
      </div>
      <div className="flex flex-1 flex-col gap-2 p-5">
        <div className="flex flex-wrap items-center gap-2">
          {house.fit ? (
            <FitBadge label={house.fit.label} />
          ) : (
            <>
              <Badge tone={house.certified ? "good" : "warn"}>{house.certificationWords}</Badge>
              {house.notes > 0 ? (
                <span className="text-sm text-ink-soft">
                  {house.notes} design {house.notes === 1 ? "note" : "notes"}
                </span>
              ) : null}
            </>
          )}
        </div>
        <h3 className="font-display text-xl font-semibold text-moss-900">
          <Link href={`/houses/${house.slug}`} className="after:absolute after:inset-0 hover:underline">
            {house.name}
          </Link>
        </h3>
        <p className="text-ink-soft">{house.tagline}</p>
        {house.fit && house.fit.label !== "good" ? <p className="text-sm text-ink-soft">{house.fit.reasons[0]}</p> : null}
        <p className="text-sm text-ink-soft">
          {house.chamberCount} {house.chamberCount === 1 ? "chamber" : "chambers"} · {SHADE_LABELS[house.exteriorShade as Shade]}
          {house.vented ? " · vented" : ""}
        </p>
        {house.occupancy ? <OccupancyMark occupancy={house.occupancy} /> : null}
        <div className="mt-auto flex items-baseline justify-between pt-2">
          <span className="font-display text-2xl font-semibold text-moss-900">{formatUsd(house.priceCents)}</span>
          <span className={house.stock > 0 ? "text-sm text-ink-soft" : "text-sm font-bold text-berry-700"}>
            {house.stock > 0 ? `${house.stock} in stock` : "Out of stock"}
          </span>
        </div>
      </div>
    </article>
  );
}

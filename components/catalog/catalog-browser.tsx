"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { useEffect, useRef, useState } from "react";
import { Alert } from "@/components/ui/alert";
import { getButtonClasses } from "@/components/ui/button";
import { Checkbox } from "@/components/ui/checkbox";
import { EmptyState } from "@/components/ui/empty-state";
import { Select } from "@/components/ui/select";
import { Spinner } from "@/components/ui/spinner";
import { fetchJson } from "@/lib/http/client";
import type { CatalogQuery } from "@/lib/catalog/catalog-query";
import { catalogQueryToParams } from "@/lib/catalog/catalog-query-params";
import { BAND_IDS, CLIMATE_BANDS, type BandId } from "@/lib/catalog/climate-bands";
import type { HouseCard as HouseCardData } from "@/lib/catalog/house-card";
import { bandChoiceFromList, writeBandChoice, type BandChoice } from "@/lib/climate/band-cookie";
import { HouseCard } from "./house-card";
import { withQueries } from "@/components/with-queries";

type Result = { items: HouseCardData[]; total: number };

async function fetchHouses(query: CatalogQuery): Promise<Result> {
  return fetchJson<Result>(`/api/houses?${catalogQueryToParams(query)}`, { fallbackMessage: "The catalog could not be loaded." });
}

const PRICE_LIMITS = [10000, 15000, 20000, 30000];

/** How many filters are set (the band counts: it narrows what "suits" means). */
export function activeFilterCount(query: CatalogQuery): number {
  return [query.band, query.chambers, query.mount, query.maxPriceCents, query.inStock].filter((v) => v !== undefined && v !== false).length;
}

/** The catalog's filters and results; the first page arrives rendered by the server. */
type Props = { initialQuery: CatalogQuery; initialResult: Result; bandChoice: BandChoice | null };

/** `bandChoice`: the band cookie as the server read it (the browser keeps it from there). */
function CatalogBrowserWithData({ initialQuery, initialResult, bandChoice }: Props) {
  const [query, setQuery] = useState<CatalogQuery>(initialQuery);
  const choice = useRef(bandChoice);
  const { data, isFetching, error } = useQuery({
    queryKey: ["houses", catalogQueryToParams(query).toString()],
    queryFn: () => fetchHouses(query),
    initialData: catalogQueryToParams(query).toString() === catalogQueryToParams(initialQuery).toString() ? initialResult : undefined,
    placeholderData: keepPreviousData,
  });

  // Keep the address in step so a filtered view can be shared or reloaded.
  useEffect(() => {
    const params = catalogQueryToParams(query).toString();
    window.history.replaceState(null, "", params ? `/houses?${params}` : "/houses");
    if (query.band) {
      choice.current = bandChoiceFromList(query.band, choice.current);
      writeBandChoice(choice.current);
    }
  }, [query]);

  const update = (patch: Partial<CatalogQuery>) => setQuery((q) => ({ ...q, ...patch }));
  // On a phone the filters fold behind a button so the first houses show on the first screen;
  // from the lg breakpoint up they stand beside the results and the button is hidden.
  const [filtersOpen, setFiltersOpen] = useState(false);
  const active = activeFilterCount(query);

  return (
    <div className="grid gap-4 lg:grid-cols-[16rem_1fr] lg:gap-8">
      <div className="lg:hidden">
        <button
          type="button"
          aria-expanded={filtersOpen}
          aria-controls="catalog-filters"
          onClick={() => setFiltersOpen((open) => !open)}
          className={getButtonClasses({ variant: "secondary" })}
        >
          {filtersOpen ? "Hide filters" : "Filters"}
          {active > 0 ? (
            <span className="rounded-full bg-moss-800 px-2 text-sm text-white" data-testid="active-filter-count">
              {active}
              <span className="sr-only"> {active === 1 ? "filter" : "filters"} on</span>
            </span>
          ) : null}
        </button>
      </div>
      <form
        id="catalog-filters"
        className={`${filtersOpen ? "flex" : "hidden"} flex-col gap-5 rounded-xl border border-paper-200 bg-white p-5 lg:flex lg:self-start`}
        aria-label="Filter houses"
        onSubmit={(e) => e.preventDefault()}
      >
        <div className="flex flex-col gap-1.5">
          <label htmlFor="filter-band" className="font-bold">
            Your summers
          </label>
          <Select id="filter-band" value={query.band ?? ""} onChange={(e) => update({ band: (e.target.value || undefined) as BandId | undefined })}>
            <option value="">Not chosen</option>
            {BAND_IDS.map((id) => (
              <option key={id} value={id}>
                {CLIMATE_BANDS[id].label}
              </option>
            ))}
          </Select>
        </div>
        <div className="flex flex-col gap-1.5">
          <label htmlFor="filter-chambers" className="font-bold">
            Chambers
          </label>
          <Select id="filter-chambers" value={query.chambers ?? ""} onChange={(e) => update({ chambers: e.target.value ? Number(e.target.value) : undefined })}>
            <option value="">Any number</option>
            <option value="2">2 or more</option>
            <option value="4">4 or more</option>
            <option value="6">6 or more</option>
          </Select>
        </div>
        <div className="flex flex-col gap-1.5">
          <label htmlFor="filter-mount" className="font-bold">
            Mount
          </label>
          <Select id="filter-mount" value={query.mount ?? ""} onChange={(e) => update({ mount: (e.target.value || undefined) as CatalogQuery["mount"] })}>
            <option value="">Pole or building</option>
            <option value="pole">On a pole</option>
            <option value="building">On a building wall</option>
          </Select>
        </div>
        <div className="flex flex-col gap-1.5">
          <label htmlFor="filter-price" className="font-bold">
            Price up to
          </label>
          <Select id="filter-price" value={query.maxPriceCents ?? ""} onChange={(e) => update({ maxPriceCents: e.target.value ? Number(e.target.value) : undefined })}>
            <option value="">Any price</option>
            {PRICE_LIMITS.map((c) => (
              <option key={c} value={c}>
                ${c / 100}
              </option>
            ))}
          </Select>
        </div>
        <Checkbox label="In stock only" checked={Boolean(query.inStock)} onChange={(e) => update({ inStock: e.target.checked || undefined })} />
      </form>
      <section aria-labelledby="results-heading" aria-busy={isFetching}>
        <div className="mb-4 flex items-center gap-3">
          <h2 id="results-heading" className="font-display text-xl font-semibold text-moss-900">
            {data ? `${data.total} ${data.total === 1 ? "house" : "houses"}` : "Houses"}
            {query.band ? ` for ${CLIMATE_BANDS[query.band].label.toLowerCase()}` : ""}
          </h2>
          {isFetching ? <Spinner label="Updating" /> : null}
        </div>
        {error ? <Alert tone="poor" title="The catalog could not be loaded">{(error as Error).message}</Alert> : null}
        {data && data.items.length === 0 ? (
          <EmptyState title="No house matches all of these filters">Try fewer filters, or a higher price limit.</EmptyState>
        ) : null}
        <ul className="grid gap-6 sm:grid-cols-2 xl:grid-cols-3">
          {data?.items.map((h) => (
            <li key={h.slug} className="flex">
              <HouseCard house={h} />
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}

export const CatalogBrowser = withQueries(CatalogBrowserWithData);

"use client";

import { useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/client";
import { intervalWords, percent } from "./format";
import { IntervalBar } from "./interval-bar";
import type { Rating } from "@/lib/shared/rating";
import { withQueries } from "@/components/with-queries";

type RatingFigures = {
  minimumHouses: number;
  caveat: string;
  demo: boolean;
  byRating: { rating: string; label: string; n: number; shown: boolean; k?: number; rate?: number; interval?: { lower: number; upper: number } }[];
};

async function fetchRatings(): Promise<RatingFigures> {
  return fetchJson<RatingFigures>("/api/roost-reports/ratings", { fallbackMessage: "The figures could not be loaded." });
}

const RATING_WORDS: Record<string, string> = { good: "good", fair: "fair", poor: "poor" };

/** Beside a site's rating: how houses on sites with the same rating fared, from buyers' reports. */
function RatingOutcomeWithData({ label }: { label: Rating }) {
  const { data, isError } = useQuery({ queryKey: ["roost-ratings"], queryFn: fetchRatings, staleTime: 5 * 60_000 });
  if (isError || !data) return null;
  const row = data.byRating.find((r) => r.rating === label);
  if (!row) return null;
  return (
    <div className="flex flex-col gap-1.5 border-t border-paper-200 pt-3 text-sm" data-testid="rating-outcome">
      <p className="font-bold">How houses on sites rated {RATING_WORDS[label]} fared</p>
      {row.shown && row.k !== undefined && row.rate !== undefined && row.interval ? (
        <>
          <p>
            Of {row.n} houses on such sites reported through two summers, {row.k} had bats within two summers ({percent(row.rate)};{" "}
            {intervalWords(row.interval)}){data.demo ? " (demo figures)" : ""}.
          </p>
          <IntervalBar rate={row.rate} interval={row.interval} label={`Houses with bats on sites rated ${label}`} />
        </>
      ) : (
        <p>
          {row.n} {row.n === 1 ? "house" : "houses"} on such sites reported so far: not enough reports yet for a rate.
        </p>
      )}
      <p className="text-ink-soft">{data.caveat}</p>
    </div>
  );
}

export const RatingOutcome = withQueries(RatingOutcomeWithData);

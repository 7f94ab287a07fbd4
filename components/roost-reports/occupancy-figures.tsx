import type { ModelOccupancy } from "@/lib/roost-reports/queries";
import { Badge } from "@/components/ui/badge";
import { intervalWords, percent } from "./format";
import { IntervalBar } from "./interval-bar";

type Stat = ModelOccupancy["overall"];

function StatLine({ stat, subject }: { stat: Stat; subject: string }) {
  if (!stat.shown || stat.k === undefined || stat.rate === undefined || !stat.interval) {
    return (
      <p>
        <span className="font-bold">{subject}:</span> {stat.n} {stat.n === 1 ? "house" : "houses"} reported so far. Not enough reports yet
        to give a rate.
      </p>
    );
  }
  return (
    <div className="flex flex-col gap-1.5">
      <p>
        Of the {stat.n} houses of this model reported {subject}, <span className="font-bold">{stat.k} had bats within two summers</span> (
        {percent(stat.rate)}; {intervalWords(stat.interval)}).
      </p>
      <IntervalBar rate={stat.rate} interval={stat.interval} label={`Houses with bats within two summers, ${subject}`} />
    </div>
  );
}

/** "Did bats move in?" on a model page: by band and by mount, a rate only where at least 5 houses were reported. */
export function OccupancyFigures({ occupancy }: { occupancy: ModelOccupancy }) {
  const { overall, byBand, byMount, firstOccupancy } = occupancy;
  return (
    <section aria-labelledby="occupancy" className="flex flex-col gap-4" data-testid="occupancy-figures">
      <div className="flex flex-wrap items-center gap-3">
        <h2 id="occupancy" className="font-display text-2xl font-semibold text-moss-900">
          Did bats move in? What our buyers report
        </h2>
        {occupancy.demo ? <Badge tone="warn">Demo figures</Badge> : null}
      </div>
      {overall.n === 0 ? (
        <p data-testid="occupancy-none">Not enough reports yet: no house of this model has been reported through two summers.</p>
      ) : (
        <div className="flex flex-col gap-5 rounded-xl border border-paper-200 bg-white p-5">
          <StatLine stat={overall} subject="in their first two summers" />
          {byBand.length > 0 ? (
            <div className="flex flex-col gap-3">
              <h3 className="font-bold">By summers</h3>
              {byBand.map((b) => (
                <StatLine key={b.bandId} stat={b} subject={`in ${b.label.toLowerCase()}`} />
              ))}
            </div>
          ) : null}
          {byMount.length > 0 ? (
            <div className="flex flex-col gap-3">
              <h3 className="font-bold">By mount</h3>
              {byMount.map((m) => (
                <StatLine key={m.mount} stat={m} subject={m.label.toLowerCase().replace(/^on /, "on ")} />
              ))}
            </div>
          ) : null}
          {firstOccupancy && firstOccupancy.houses > 0 ? (
            <p>
              <span className="font-bold">Time to first bats:</span>{" "}
              {firstOccupancy.bySummer
                .filter((s) => s.houses > 0)
                .map((s) => `${s.houses} in the ${s.label}`)
                .join(", ")}{" "}
              (of the {firstOccupancy.houses} houses that had bats; median: summer {firstOccupancy.medianSummer}).
            </p>
          ) : null}
          <p className="text-sm text-ink-soft">
            The bar shows the share observed (dot) and its 95% Wilson interval: with few reports the true share could lie anywhere along it.
            A rate appears once at least {occupancy.minimumHouses} houses have been reported through two summers.
          </p>
        </div>
      )}
      <p className="max-w-prose text-sm text-ink-soft">{occupancy.caveat}</p>
      {occupancy.demoNote ? <p className="max-w-prose text-sm font-bold text-ember-900">{occupancy.demoNote}</p> : null}
    </section>
  );
}

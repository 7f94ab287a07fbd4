import Link from "next/link";
import { MONTH_WORDS } from "@/lib/climate/warmest-month";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { KILOMETERS_PER_MILE } from "@/lib/placement/format";
import type { PlacementAnswer } from "@/lib/placement/placement-answer";
import type { RuleStatus } from "@/lib/placement/types";
import { RuleList, STATUS_WORDS } from "./rule-list";
import { SunOnHouse } from "./sun-on-house";
import { RatingOutcome } from "@/components/roost-reports/rating-outcome";

// Our own words for the overall rating: what it means for the buyer, in one line.
const LABEL_LINES: Record<RuleStatus, string> = {
  good: "Every rule passes: bats have a real chance here.",
  fair: "Workable, and better with the changes marked below.",
  poor: "Bats are unlikely to settle here until the points marked below change.",
};

/** The answer of a check: rating, climate, sun and the ten rules. */
export function PlacementResult({ answer }: { answer: PlacementAnswer }) {
  const { climate, band, location } = answer;
  const toChange = answer.rules.filter((r) => r.status !== "good").length;
  const place =
    location.source === "zip"
      ? `ZIP ${location.zip}`
      : `${location.lat.toFixed(3)}, ${location.lon.toFixed(3)}`;

  return (
    <div className="flex flex-col gap-8">
      <section
        aria-labelledby="site-rating"
        className="flex flex-col gap-2 rounded-2xl border border-paper-300 bg-paper-50 p-5 shadow-card"
        data-testid="site-rating"
        data-label={answer.label}
      >
        <h2
          id="site-rating"
          className="flex flex-wrap items-center gap-3 font-display text-2xl font-semibold text-moss-900"
        >
          Site rating{" "}
          <Badge tone={answer.label} className="text-base">
            {STATUS_WORDS[answer.label]}
          </Badge>
        </h2>
        <p>{LABEL_LINES[answer.label]}</p>
        <p className="text-sm text-ink-soft">
          {toChange === 0
            ? "Nothing to change."
            : `${toChange} of ${answer.rules.length} rules suggest a change.`}{" "}
          Checked for {place}.
        </p>
        <RatingOutcome label={answer.label} />
      </section>

      <section aria-labelledby="site-climate" className="flex flex-col gap-3">
        <h2 id="site-climate" className="font-display text-xl font-semibold text-moss-900">
          Summers at this site
        </h2>
        <p>
          <span className="font-bold">{band.label}</span> ({band.rangeText}). Average daily high of the
          warmest month ({MONTH_WORDS[climate.warmestMonth]} here) used: {climate.display.text},{" "}
          {climate.source === "typed"
            ? "as you typed it."
            : `from the ${climate.stations?.length ?? 3} nearest weather stations, weighted by distance.`}
        </p>
        {climate.nearEdgeNote ? (
          <Alert tone="warn" title="A close call">
            {climate.nearEdgeNote}
          </Alert>
        ) : null}
        {climate.stations ? (
          <details>
            <summary className="cursor-pointer font-bold text-moss-800 underline underline-offset-4">
              Weather stations used
            </summary>
            <Table caption="Weather stations used, nearest first" wrapperClassName="mt-3">
              <THead>
                <Tr>
                  <Th>Station</Th>
                  <Th numeric>Distance</Th>
                  <Th numeric>{MONTH_WORDS[climate.warmestMonth]} high</Th>
                </Tr>
              </THead>
              <TBody>
                {climate.stations.map((s) => (
                  <Tr key={s.id}>
                    <Td>
                      {s.name}, {s.state}
                    </Td>
                    <Td numeric>
                      {s.distanceMi.toFixed(1)} mi (
                      {(s.distanceMi * KILOMETERS_PER_MILE).toFixed(1)} km)
                    </Td>
                    <Td numeric>{s.highF.toFixed(1)} °F</Td>
                  </Tr>
                ))}
              </TBody>
            </Table>
            <p className="mt-2 text-sm text-ink-soft">
              Data: NOAA NCEI, U.S. Climate Normals 1981–2010.
            </p>
          </details>
        ) : null}
        <p>
          <Link
            href={`/houses?band=${band.id}`}
            className="font-bold text-moss-800 underline underline-offset-4"
          >
            See houses that suit this site
          </Link>
        </p>
      </section>

      <SunOnHouse answer={answer} />

      <section aria-labelledby="site-rules" className="flex flex-col gap-3">
        <h2 id="site-rules" className="font-display text-xl font-semibold text-moss-900">
          Rule by rule
        </h2>
        <RuleList rules={answer.rules} />
      </section>
    </div>
  );
}

import { Alert } from "@/components/ui/alert";
import { formatHours, formatPercent } from "@/lib/placement/format";
import type { PlacementAnswer } from "@/lib/placement/placement-answer";
import { SkylineChart } from "./skyline-chart";

const MONTHS = [
  "January",
  "February",
  "March",
  "April",
  "May",
  "June",
  "July",
  "August",
  "September",
  "October",
  "November",
  "December",
];

/** "2026-06-21" → "21 June". */
export function formatDay(date: string): string {
  const [, month, day] = date.split("-").map(Number);
  return `${day} ${MONTHS[(month ?? 1) - 1]}`;
}

const HOW_COUNTED = {
  building:
    "On a wall the house gets sun only while the sun is in front of the wall, so its sun is the front face's.",
  pole: "On a pole the house is lit from the front, the sides or the back whenever the sun is up.",
  tree: "On a tree we count the sun as for a pole, under your skyline; the tree's own trunk and leaves shade it more than that.",
} as const;

/** Sun on the house (what P4 rates) with the front face beside it, the skyline's effect and the chart. */
export function SunOnHouse({ answer }: { answer: PlacementAnswer }) {
  const { sun, location } = answer;
  const solsticeLabel = formatDay(sun.solsticeDate);
  const seasonLowLabel = formatDay(sun.paths.seasonLow.date);
  const wall = sun.exposure === "front";

  return (
    <section aria-labelledby="site-sun" className="flex flex-col gap-4">
      <h2 id="site-sun" className="font-display text-xl font-semibold text-moss-900">
        Sun on the house
      </h2>
      <dl className="grid gap-x-6 gap-y-1 sm:grid-cols-[auto_1fr]" data-testid="sun-figures">
        <dt className="font-bold">On the house, {sun.seasonLabel} mean</dt>
        <dd data-testid="house-hours">
          {formatHours(sun.house.hours)} a day, {formatPercent(sun.house.morningShare)} before solar
          noon
        </dd>
        <dt className="font-bold">On the front face</dt>
        <dd>
          {wall
            ? "the same (a wall lights the house from the front only)"
            : `${formatHours(sun.face.hours)} a day, ${formatPercent(sun.face.morningShare)} before solar noon`}
        </dd>
        <dt className="font-bold">On {solsticeLabel}</dt>
        <dd>
          {formatHours(sun.house.solsticeHours)} on the house
          {wall ? "" : `, ${formatHours(sun.face.solsticeHours)} on the front face`}
        </dd>
        <dt className="font-bold">Front faces</dt>
        <dd>
          {Math.round(sun.face.deg * 10) / 10}° ({sun.face.words})
        </dd>
      </dl>
      <p className="text-sm text-ink-soft">
        {HOW_COUNTED[sun.mount]} Morning sun on the front face (6–8 h of it) warms a roost early.
      </p>
      {sun.skyline.profile ? (
        <Alert tone="info" title="What your skyline takes">
          <span data-testid="skyline-effect">
            {sun.skyline.summary} {sun.skyline.parts.join(" ")}
          </span>{" "}
          Under an open sky the house would get {formatHours(sun.house.openSkyHours)} a day.
        </Alert>
      ) : (
        <Alert tone="info" title="Open sky assumed">
          <span data-testid="skyline-effect">{sun.skyline.summary}</span> Describe the skyline
          (above) to count the trees and buildings around the site.
        </Alert>
      )}
      <SkylineChart
        sun={sun}
        hemisphere={location.hemisphere}
        solsticeLabel={solsticeLabel}
        seasonLowLabel={seasonLowLabel}
      />
    </section>
  );
}

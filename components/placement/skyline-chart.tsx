import { useId } from "react";
import { palette } from "@/components/brand/palette";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { abbreviateBearing } from "@/lib/placement/bearing";
import { formatHours } from "@/lib/placement/format";
import type { PlacementSun } from "@/lib/placement/placement-answer";
import { skylineElevationAt } from "@/lib/placement/skyline";
import { formatAboutMinutes } from "@/lib/placement/skyline-words";
import {
  classifySun,
  layoutSkylineChart,
  SKYLINE_CHART_BOX,
  type PathRun,
} from "./skyline-chart-geometry";

type SkylineChartProps = {
  sun: PlacementSun;
  hemisphere: "north" | "south";
  /** "21 June" and "15 August": the two paths drawn. */
  solsticeLabel: string;
  seasonLowLabel: string;
};

const HATCH = `repeating-linear-gradient(45deg, ${palette.bark[700]} 0 3px, ${palette.bark[200]} 3px 8px)`;

const STATE_WORDS = {
  lit: "On the house",
  hidden: "Hidden by the skyline",
  "behind-wall": "Behind the wall",
};

function Runs({ runs, strong }: { runs: PathRun[]; strong: boolean }) {
  return runs.map((run, i) => (
    <path
      key={`${run.state}-${i}`}
      d={run.d}
      fill="none"
      strokeLinecap="round"
      strokeLinejoin="round"
      strokeWidth={run.state === "lit" ? (strong ? 4 : 3) : 2.5}
      strokeDasharray={
        run.state === "hidden" ? "7 6" : run.state === "behind-wall" ? "2 6" : undefined
      }
      className={
        run.state === "lit"
          ? strong
            ? "stroke-ember-700"
            : "stroke-ember-600"
          : run.state === "hidden"
            ? "stroke-bark-700"
            : "stroke-dusk-600"
      }
    />
  ));
}

/**
 * The sun's path across a panorama of the site's skyline: azimuth across (the equator side in
 * the middle), altitude up; the season's band of paths, the part the skyline hides hatched,
 * the house's facing marked, and for a wall the sky behind it greyed. Described in words for
 * screen readers and backed by an hour-by-hour table.
 */
export function SkylineChart({
  sun,
  hemisphere,
  solsticeLabel,
  seasonLowLabel,
}: SkylineChartProps) {
  const id = useId().replace(/:/g, "");
  const skyline = sun.skyline.profile;
  const wall = sun.exposure === "front";
  const layout = layoutSkylineChart({
    skyline,
    paths: sun.paths,
    facingDeg: sun.face.deg,
    wall,
    hemisphere,
  });
  const { plot } = layout;
  const lostMinutes = Math.max(0, (sun.house.openSkyHours - sun.house.hours) * 60);
  const middle = hemisphere === "north" ? "south" : "north";
  const description = [
    `A panorama all round the site, ${middle} in the middle, with the sun's path on ${solsticeLabel} and ${seasonLowLabel}.`,
    skyline
      ? `The skyline you described hides the sun for about ${formatAboutMinutes(lostMinutes)} a day on the house over the season.`
      : "No skyline was given, so the sky is drawn open down to the horizon.",
    `The house faces ${sun.face.words}${wall ? "; on a wall, the sun behind it does not count" : ""}.`,
    `${sun.seasonLabel}, mean: ${formatHours(sun.house.hours)} of sun on the house a day. The table below gives every hour.`,
  ].join(" ");

  // The label for the sky behind a wall goes in the wider of its two pieces.
  const widest = [...layout.behindWall].sort((a, b) => b.width - a.width)[0];
  const hours = sun.paths.solstice.points.filter((p) => p.minute % 60 === 0 && p.altitude > 0);

  return (
    <figure className="flex flex-col gap-3">
      <figcaption className="flex flex-col gap-1">
        <span className="font-display text-xl font-semibold text-moss-900">
          The sun&apos;s path over your skyline
        </span>
        <span className="text-sm text-ink-soft">
          All round the site, compass direction across and height above level up. Where the path
          dips behind the skyline, that sun is lost to the house.
        </span>
      </figcaption>
      <svg
        viewBox={`0 0 ${SKYLINE_CHART_BOX.width} ${SKYLINE_CHART_BOX.height}`}
        role="img"
        aria-labelledby={`${id}-title`}
        aria-describedby={`${id}-desc`}
        className="h-auto w-full"
      >
        <title id={`${id}-title`}>The sun&apos;s path over your skyline</title>
        <desc id={`${id}-desc`}>{description}</desc>
        <defs>
          <clipPath id={`${id}-plot`}>
            <rect
              x={plot.left}
              y={plot.top - 10}
              width={plot.right - plot.left}
              height={plot.bottom - plot.top + 10}
            />
          </clipPath>
          {layout.skylineArea ? (
            <clipPath id={`${id}-skyline`}>
              <path d={layout.skylineArea} />
            </clipPath>
          ) : null}
          <pattern
            id={`${id}-hatch`}
            width={8}
            height={8}
            patternUnits="userSpaceOnUse"
            patternTransform="rotate(45)"
          >
            <rect width={8} height={8} className="fill-bark-200" />
            <line x1={0} y1={0} x2={0} y2={8} className="stroke-bark-700" strokeWidth={3} />
          </pattern>
        </defs>
        <rect
          x={plot.left}
          y={plot.top}
          width={plot.right - plot.left}
          height={plot.bottom - plot.top}
          className="fill-dusk-50"
        />
        {layout.behindWall.map((r) => (
          <rect
            key={r.x}
            x={r.x}
            y={plot.top}
            width={r.width}
            height={plot.bottom - plot.top}
            className="fill-paper-300"
          />
        ))}
        {widest && widest.width > 120 ? (
          <text
            x={widest.x + widest.width / 2}
            y={plot.top + 30}
            textAnchor="middle"
            className="fill-ink-soft text-[20px] max-sm:text-[26px]"
          >
            behind the wall
          </text>
        ) : null}
        {layout.yTicks.map((t) => (
          <g key={t.label}>
            <line
              x1={plot.left}
              x2={plot.right}
              y1={t.y}
              y2={t.y}
              className="stroke-dusk-200"
              strokeWidth={1}
            />
            <text
              x={plot.left - 6}
              y={t.y}
              textAnchor="end"
              dominantBaseline="central"
              className="fill-ink-soft text-[20px] max-sm:text-[28px]"
            >
              {t.label}
            </text>
          </g>
        ))}
        <g clipPath={`url(#${id}-plot)`}>
          {layout.band ? <path d={layout.band} className="fill-ember-100" /> : null}
          {layout.skylineArea ? (
            <>
              <path d={layout.skylineArea} className="fill-moss-200" />
              {layout.band ? (
                <path d={layout.band} fill={`url(#${id}-hatch)`} clipPath={`url(#${id}-skyline)`} />
              ) : null}
              <path
                d={layout.skylineLine}
                fill="none"
                className="stroke-moss-700"
                strokeWidth={2.5}
                strokeLinejoin="round"
              />
            </>
          ) : null}
          <Runs runs={layout.seasonLowRuns} strong={false} />
          <Runs runs={layout.solsticeRuns} strong />
        </g>
        <line
          x1={layout.facing.x}
          x2={layout.facing.x}
          y1={plot.top}
          y2={plot.bottom}
          className="stroke-dusk-700"
          strokeWidth={2}
          strokeDasharray="4 4"
        />
        <text
          x={layout.facing.x}
          y={plot.top - 10}
          textAnchor={
            layout.facing.x < plot.left + 50
              ? "start"
              : layout.facing.x > plot.right - 50
                ? "end"
                : "middle"
          }
          className="fill-dusk-700 text-[20px] font-bold max-sm:text-[28px]"
        >
          house {layout.facing.label}
        </text>
        <line
          x1={plot.left}
          x2={plot.right}
          y1={plot.bottom}
          y2={plot.bottom}
          className="stroke-bark-600"
          strokeWidth={2}
        />
        {layout.xTicks.map((t, i) => (
          <g key={`${t.label}-${i}`}>
            <line
              x1={t.x}
              x2={t.x}
              y1={plot.bottom}
              y2={plot.bottom + 6}
              className="stroke-bark-600"
              strokeWidth={2}
            />
            <text
              x={t.x}
              y={plot.bottom + 34}
              textAnchor="middle"
              className="fill-ink text-[22px] font-bold max-sm:text-[30px]"
            >
              {t.label}
            </text>
          </g>
        ))}
      </svg>
      <ul className="grid gap-x-6 gap-y-1.5 text-sm sm:grid-cols-2" aria-label="Chart key">
        <li className="flex items-center gap-2">
          <span className="inline-block h-1 w-6 rounded bg-ember-700" aria-hidden="true" />
          Sun on {solsticeLabel}: {formatHours(sun.house.solsticeHours)} on the house
        </li>
        <li className="flex items-center gap-2">
          <span
            className="inline-block h-3.5 w-6 rounded-sm bg-ember-100 ring-1 ring-ember-600"
            aria-hidden="true"
          />
          The season&apos;s paths, down to {seasonLowLabel}
        </li>
        {skyline ? (
          <>
            <li className="flex items-center gap-2">
              <span
                className="inline-block h-3.5 w-6 rounded-sm bg-moss-200 ring-1 ring-moss-700"
                aria-hidden="true"
              />
              Your skyline
            </li>
            <li className="flex items-center gap-2">
              <span
                className="inline-block h-3.5 w-6 rounded-sm ring-1 ring-bark-700"
                style={{ background: HATCH }}
                aria-hidden="true"
              />
              Sun hidden by it: about {formatAboutMinutes(lostMinutes)} a day
            </li>
          </>
        ) : null}
        {wall ? (
          <li className="flex items-center gap-2">
            <span className="inline-block h-3.5 w-6 rounded-sm bg-paper-300" aria-hidden="true" />
            Sky behind the wall (no sun on the house)
          </li>
        ) : null}
      </ul>
      <details>
        <summary className="cursor-pointer font-bold text-moss-800 underline underline-offset-4">
          The same figures as a table
        </summary>
        <Table
          caption={`Where the sun stands each solar hour on ${solsticeLabel}, and the minutes it reaches the house`}
          wrapperClassName="mt-3"
        >
          <THead>
            <Tr>
              <Th>Solar time</Th>
              <Th>Sun</Th>
              <Th numeric>Skyline there</Th>
              <Th>Reaches the house?</Th>
              <Th numeric>On the house, {solsticeLabel}</Th>
              <Th numeric>On the house, {sun.seasonLabel} mean</Th>
            </Tr>
          </THead>
          <TBody>
            {hours.map((p) => {
              const hour = p.minute / 60;
              const state = classifySun({ point: p, skyline, facingDeg: sun.face.deg, wall });
              return (
                <Tr key={p.minute}>
                  <Td>{String(hour).padStart(2, "0")}:00</Td>
                  <Td>
                    {abbreviateBearing(p.azimuth)} ({Math.round(p.azimuth)}°),{" "}
                    {Math.round(p.altitude)}° up
                  </Td>
                  <Td numeric>
                    {skyline ? `${Math.round(skylineElevationAt(skyline, p.azimuth))}°` : "open"}
                  </Td>
                  <Td>{STATE_WORDS[state]}</Td>
                  <Td numeric>{Math.round(sun.byHour.solsticeHouse[hour] ?? 0)} min</Td>
                  <Td numeric>{Math.round(sun.byHour.seasonHouse[hour] ?? 0)} min</Td>
                </Tr>
              );
            })}
          </TBody>
        </Table>
        <p className="mt-2 text-sm text-ink-soft">
          Solar time: 12:00 is when the sun is highest, usually around 1 pm on a summer clock. The
          sun&apos;s place is given at the start of each hour.
        </p>
      </details>
    </figure>
  );
}

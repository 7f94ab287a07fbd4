import { useId } from "react";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { formatHours } from "@/lib/placement/format";
import { CHART_BOX, formatSolarHour, layoutSunChart } from "./sun-chart-geometry";

type SunChartProps = {
  /** Mean minutes of sun per solar hour over the season (24 entries). */
  season: readonly number[];
  /** Minutes of sun per solar hour on the midsummer day (24 entries). */
  solstice: readonly number[];
  seasonLabel: string;
  /** "21 June" or "21 December". */
  solsticeLabel: string;
  seasonHours: number;
  solsticeHours: number;
};

const round = (n: number) => Math.round(n);

/**
 * Direct sun on the house face hour by hour: the season mean as bars, midsummer as a step line.
 * The picture is described in words for screen readers and backed by a table of the numbers.
 */
export function SunChart({
  season,
  solstice,
  seasonLabel,
  solsticeLabel,
  seasonHours,
  solsticeHours,
}: SunChartProps) {
  const id = useId().replace(/:/g, "");
  const layout = layoutSunChart({ season, solstice });
  const { plot } = layout;
  const sunnyHours = layout.bars.filter((b) => b.minutes > 0 || (solstice[b.hour] ?? 0) > 0);
  const span =
    sunnyHours.length > 0
      ? `from about ${formatSolarHour(sunnyHours[0]?.hour ?? 0)} to ${formatSolarHour((sunnyHours.at(-1)?.hour ?? 0) + 1)} solar time`
      : "at no hour of the day";

  return (
    <figure className="flex flex-col gap-3">
      <figcaption className="flex flex-col gap-1">
        <span className="font-display text-xl font-semibold text-moss-900">
          Sun on the house face, hour by hour
        </span>
        <span className="text-sm text-ink-soft">
          Minutes of direct sun in each hour, open sky. Hours are local solar time: 12:00 is when
          the sun is highest, which is usually around 1 pm on a summer clock.
        </span>
      </figcaption>
      <svg
        viewBox={`0 0 ${CHART_BOX.width} ${CHART_BOX.height}`}
        role="img"
        aria-labelledby={`${id}-title ${id}-desc`}
        className="h-auto w-full max-w-[34rem]"
      >
        <title id={`${id}-title`}>Sun on the house face, hour by hour</title>
        <desc id={`${id}-desc`}>
          {`${seasonLabel} mean: ${formatHours(seasonHours)} a day. ${solsticeLabel}: ${formatHours(solsticeHours)}. The face gets direct sun ${span}. The table below gives every hour.`}
        </desc>
        <rect
          x={plot.left}
          y={plot.top}
          width={plot.right - plot.left}
          height={plot.bottom - plot.top}
          className="fill-paper-50"
        />
        {layout.yTicks.map((t) => (
          <g key={t.minutes}>
            <line
              x1={plot.left}
              x2={plot.right}
              y1={t.y}
              y2={t.y}
              className="stroke-paper-300"
              strokeWidth={1}
            />
            <text
              x={plot.left - 6}
              y={t.y}
              textAnchor="end"
              dominantBaseline="central"
              className="fill-ink-soft text-[15px]"
            >
              {t.minutes}
            </text>
          </g>
        ))}
        <line
          x1={layout.noonX}
          x2={layout.noonX}
          y1={plot.top}
          y2={plot.bottom}
          className="stroke-dusk-400"
          strokeDasharray="3 4"
          strokeWidth={1.5}
        />
        <text
          x={layout.noonX}
          y={plot.top - 8}
          textAnchor="middle"
          className="fill-dusk-700 text-[14px]"
        >
          solar noon
        </text>
        {layout.bars.map((b) => (
          <rect
            key={b.hour}
            x={b.x}
            y={b.y}
            width={b.width}
            height={b.height}
            rx={2}
            className="fill-moss-500"
          />
        ))}
        {/* A paper-coloured halo keeps the line readable where it runs along the bar tops. */}
        <path
          d={layout.solsticePath}
          fill="none"
          className="stroke-paper-50"
          strokeWidth={6}
          strokeLinejoin="round"
        />
        <path
          d={layout.solsticePath}
          fill="none"
          className="stroke-ember-700"
          strokeWidth={2.5}
          strokeLinejoin="round"
        />
        <line
          x1={plot.left}
          x2={plot.right}
          y1={plot.bottom}
          y2={plot.bottom}
          className="stroke-bark-600"
          strokeWidth={1.5}
        />
        {layout.xTicks.map((t) => (
          <g key={t.hour}>
            <line
              x1={t.x}
              x2={t.x}
              y1={plot.bottom}
              y2={plot.bottom + 5}
              className="stroke-bark-600"
              strokeWidth={1.5}
            />
            <text
              x={t.x}
              y={plot.bottom + 22}
              textAnchor="middle"
              className="fill-ink-soft text-[15px]"
            >
              {t.label}
            </text>
          </g>
        ))}
        <text
          x={(plot.left + plot.right) / 2}
          y={CHART_BOX.height - 12}
          textAnchor="middle"
          className="fill-ink text-[16px] font-bold"
        >
          Local solar time
        </text>
        <text
          transform={`translate(14 ${(plot.top + plot.bottom) / 2}) rotate(-90)`}
          textAnchor="middle"
          className="fill-ink text-[16px] font-bold"
        >
          Minutes of sun
        </text>
      </svg>
      <ul className="flex flex-wrap gap-x-6 gap-y-1 text-sm" aria-label="Chart key">
        <li className="flex items-center gap-2">
          <span className="inline-block h-3.5 w-5 rounded-sm bg-moss-500" aria-hidden="true" />
          {seasonLabel}, mean: {formatHours(seasonHours)} a day
        </li>
        <li className="flex items-center gap-2">
          <span className="inline-block h-0.5 w-6 bg-ember-700" aria-hidden="true" />
          {solsticeLabel}: {formatHours(solsticeHours)}
        </li>
      </ul>
      <details className="group">
        <summary className="cursor-pointer font-bold text-moss-800 underline underline-offset-4">
          The same figures as a table
        </summary>
        <Table caption="Minutes of direct sun on the face, by solar hour" wrapperClassName="mt-3">
          <THead>
            <Tr>
              <Th>Solar hour</Th>
              <Th numeric>{seasonLabel}, mean</Th>
              <Th numeric>{solsticeLabel}</Th>
            </Tr>
          </THead>
          <TBody>
            {layout.bars.map((b) => (
              <Tr key={b.hour}>
                <Td>
                  {formatSolarHour(b.hour)}–{formatSolarHour(b.hour + 1)}
                </Td>
                <Td numeric>{round(b.minutes)} min</Td>
                <Td numeric>{round(solstice[b.hour] ?? 0)} min</Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      </details>
    </figure>
  );
}

"use client";

import { AxisBottom, AxisLeft } from "@visx/axis";
import { Group } from "@visx/group";
import { scaleBand, scaleLinear } from "@visx/scale";
import { Bar, Line } from "@visx/shape";
import { useId } from "react";
import { palette } from "@/components/brand/palette";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { intervalWords, percent } from "./format";

export type ChartRow = {
  key: string;
  label: string;
  n: number;
  k: number;
  rate: number | null;
  interval: { lower: number; upper: number } | null;
  shown: boolean;
  demoHouses: number;
};

const WIDTH = 640;
const ROW = 34;
const MARGIN = { top: 8, right: 56, bottom: 36, left: 168 };

/**
 * Occupancy within two summers as horizontal bars with their 95% Wilson intervals as whiskers,
 * one per group with at least 5 houses known; the table below carries every group.
 */
export function OccupancyChart({ title, description, rows }: { title: string; description: string; rows: ChartRow[] }) {
  const id = useId().replace(/:/g, "");
  const drawn = rows.filter((r) => r.shown && r.rate !== null && r.interval);
  const height = MARGIN.top + MARGIN.bottom + Math.max(1, drawn.length) * ROW;
  const innerWidth = WIDTH - MARGIN.left - MARGIN.right;
  const x = scaleLinear<number>({ domain: [0, 1], range: [0, innerWidth] });
  const y = scaleBand<string>({ domain: drawn.map((r) => r.label), range: [0, height - MARGIN.top - MARGIN.bottom], padding: 0.3 });
  const summary = drawn.map((r) => `${r.label}: ${percent(r.rate!)} of ${r.n} (${intervalWords(r.interval!)})`).join("; ");
  return (
    <figure className="flex flex-col gap-3 rounded-xl border border-paper-200 bg-white p-4" aria-labelledby={`${id}-caption`}>
      <figcaption id={`${id}-caption`} className="font-display text-lg font-semibold text-moss-900">
        {title}
      </figcaption>
      {drawn.length === 0 ? (
        <p className="text-ink-soft">Not enough reports yet: no group has 5 houses known through two summers.</p>
      ) : (
        <svg role="img" aria-labelledby={`${id}-title ${id}-desc`} viewBox={`0 0 ${WIDTH} ${height}`} className="h-auto w-full" data-testid="occupancy-chart">
          <title id={`${id}-title`}>{title}</title>
          <desc id={`${id}-desc`}>
            {description} {summary}.
          </desc>
          <Group left={MARGIN.left} top={MARGIN.top}>
            {drawn.map((r) => {
              const top = y(r.label) ?? 0;
              const band = y.bandwidth();
              const mid = top + band / 2;
              return (
                <Group key={r.key}>
                  <Bar x={0} y={top} width={x(r.rate!)} height={band} fill={palette.moss[300]} rx={3} />
                  <Line from={{ x: x(r.interval!.lower), y: mid }} to={{ x: x(r.interval!.upper), y: mid }} stroke={palette.moss[900]} strokeWidth={2} />
                  <Line from={{ x: x(r.interval!.lower), y: mid - 6 }} to={{ x: x(r.interval!.lower), y: mid + 6 }} stroke={palette.moss[900]} strokeWidth={2} />
                  <Line from={{ x: x(r.interval!.upper), y: mid - 6 }} to={{ x: x(r.interval!.upper), y: mid + 6 }} stroke={palette.moss[900]} strokeWidth={2} />
                  <text x={innerWidth + 8} y={mid} dominantBaseline="middle" fontSize={12} fill={palette.ink.DEFAULT}>
                    {r.k}/{r.n}
                  </text>
                </Group>
              );
            })}
            <AxisLeft scale={y} hideTicks stroke={palette.bark[400]} tickLabelProps={{ fill: palette.ink.DEFAULT, fontSize: 12, textAnchor: "end", dy: "0.33em" }} />
            <AxisBottom
              top={height - MARGIN.top - MARGIN.bottom}
              scale={x}
              numTicks={5}
              tickFormat={(v) => percent(Number(v))}
              stroke={palette.bark[400]}
              tickStroke={palette.bark[400]}
              tickLabelProps={{ fill: palette.ink.soft, fontSize: 12, textAnchor: "middle" }}
            />
          </Group>
        </svg>
      )}
      <details>
        <summary className="cursor-pointer font-bold text-moss-800">The same figures as a table</summary>
        <Table caption={`${title}: every group`} hideCaption wrapperClassName="mt-2">
          <THead>
            <Tr>
              <Th>Group</Th>
              <Th numeric>Houses known</Th>
              <Th numeric>With bats</Th>
              <Th numeric>Share</Th>
              <Th>95% interval</Th>
            </Tr>
          </THead>
          <TBody>
            {rows.map((r) => (
              <Tr key={r.key}>
                <Td>
                  {r.label}
                  {r.demoHouses > 0 ? <span className="text-sm text-ink-soft"> ({r.demoHouses} demo)</span> : null}
                </Td>
                <Td numeric>{r.n}</Td>
                <Td numeric>{r.shown ? r.k : "—"}</Td>
                <Td numeric>{r.shown && r.rate !== null ? percent(r.rate) : "—"}</Td>
                <Td>{r.shown && r.interval ? `${percent(r.interval.lower)} to ${percent(r.interval.upper)}` : "Not enough reports yet"}</Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      </details>
    </figure>
  );
}

"use client";

import { AxisBottom, AxisLeft } from "@visx/axis";
import { Group } from "@visx/group";
import { scaleBand, scaleLinear, scaleOrdinal } from "@visx/scale";
import { BarStack } from "@visx/shape";
import { useId } from "react";
import { palette } from "@/components/brand/palette";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { ANSWER_WORDS, ROOST_ANSWERS, type RoostAnswer } from "@/lib/roost-reports/answers";

export type SeasonCounts = { label: string } & Record<RoostAnswer, number>;

const WIDTH = 640;
const HEIGHT = 260;
const MARGIN = { top: 12, right: 12, bottom: 40, left: 44 };
const COLORS: Record<RoostAnswer, string> = {
  no_sign: palette.bark[200],
  signs: palette.moss[300],
  bats_seen: palette.moss[600],
  gone: palette.dusk[300],
};

/** Current reports per season, stacked by answer; the table carries the same counts. */
export function ReportsOverTimeChart({ seasons }: { seasons: SeasonCounts[] }) {
  const id = useId().replace(/:/g, "");
  const total = (s: SeasonCounts) => ROOST_ANSWERS.reduce((sum, a) => sum + s[a], 0);
  const innerWidth = WIDTH - MARGIN.left - MARGIN.right;
  const innerHeight = HEIGHT - MARGIN.top - MARGIN.bottom;
  const x = scaleBand<string>({ domain: seasons.map((s) => s.label), range: [0, innerWidth], padding: 0.35 });
  const y = scaleLinear<number>({ domain: [0, Math.max(1, ...seasons.map(total))], range: [innerHeight, 0], nice: true });
  const color = scaleOrdinal<RoostAnswer, string>({ domain: [...ROOST_ANSWERS], range: ROOST_ANSWERS.map((a) => COLORS[a]) });
  const title = "Reports by season";
  const summary = seasons.map((s) => `${s.label}: ${total(s)} reports, ${s.signs + s.bats_seen} with signs or bats`).join("; ");
  return (
    <figure className="flex flex-col gap-3 rounded-xl border border-paper-200 bg-white p-4" aria-labelledby={`${id}-caption`}>
      <figcaption id={`${id}-caption`} className="font-display text-lg font-semibold text-moss-900">
        {title}
      </figcaption>
      {seasons.length === 0 ? (
        <p className="text-ink-soft">No reports yet.</p>
      ) : (
        <>
          <svg role="img" aria-labelledby={`${id}-title ${id}-desc`} viewBox={`0 0 ${WIDTH} ${HEIGHT}`} className="h-auto w-full" data-testid="reports-over-time">
            <title id={`${id}-title`}>{title}</title>
            <desc id={`${id}-desc`}>Current answers per season, stacked: no sign yet, signs, bats seen, house gone. {summary}.</desc>
            <Group left={MARGIN.left} top={MARGIN.top}>
              <BarStack<SeasonCounts, RoostAnswer> data={seasons} keys={[...ROOST_ANSWERS]} x={(d) => d.label} xScale={x} yScale={y} color={color}>
                {(stacks) =>
                  stacks.map((stack) =>
                    stack.bars.map((bar) => <rect key={`${stack.index}-${bar.index}`} x={bar.x} y={bar.y} width={bar.width} height={bar.height} fill={bar.color} />),
                  )
                }
              </BarStack>
              <AxisLeft scale={y} numTicks={5} stroke={palette.bark[400]} tickStroke={palette.bark[400]} tickLabelProps={{ fill: palette.ink.soft, fontSize: 12, textAnchor: "end", dy: "0.33em" }} />
              <AxisBottom top={innerHeight} scale={x} stroke={palette.bark[400]} tickStroke={palette.bark[400]} tickLabelProps={{ fill: palette.ink.DEFAULT, fontSize: 12, textAnchor: "middle" }} />
            </Group>
          </svg>
          <ul className="flex flex-wrap gap-4 text-sm" aria-label="Key">
            {ROOST_ANSWERS.map((a) => (
              <li key={a} className="flex items-center gap-2">
                <span aria-hidden="true" className="inline-block size-3 rounded-sm border border-bark-400" style={{ backgroundColor: COLORS[a] }} />
                {ANSWER_WORDS[a].label}
              </li>
            ))}
          </ul>
        </>
      )}
      <details>
        <summary className="cursor-pointer font-bold text-moss-800">The same counts as a table</summary>
        <Table caption="Reports by season and answer" hideCaption wrapperClassName="mt-2">
          <THead>
            <Tr>
              <Th>Season</Th>
              {ROOST_ANSWERS.map((a) => (
                <Th key={a} numeric>
                  {ANSWER_WORDS[a].label}
                </Th>
              ))}
              <Th numeric>All</Th>
            </Tr>
          </THead>
          <TBody>
            {seasons.map((s) => (
              <Tr key={s.label}>
                <Td>{s.label}</Td>
                {ROOST_ANSWERS.map((a) => (
                  <Td key={a} numeric>
                    {s[a]}
                  </Td>
                ))}
                <Td numeric>{total(s)}</Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      </details>
    </figure>
  );
}

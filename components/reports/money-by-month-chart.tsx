"use client";

import { AxisBottom, AxisLeft } from "@visx/axis";
import { Group } from "@visx/group";
import { scaleBand, scaleLinear } from "@visx/scale";
import { Bar } from "@visx/shape";
import { useId } from "react";
import { palette } from "@/components/brand/palette";
import { formatUsd } from "@/lib/checkout/money";
import type { MonthFigures } from "@/lib/reports/figures";

const WIDTH = 640;
const HEIGHT = 280;
const MARGIN = { top: 12, right: 12, bottom: 40, left: 64 };
const SERIES = [
  { key: "salesCents", label: "Sales", color: palette.moss[600] },
  { key: "oneTimeGiftCents", label: "One-time gifts", color: palette.bark[400] },
  { key: "monthlyGiftCents", label: "Monthly gifts", color: palette.dusk[400] },
] as const;

/** Sales, one-time and monthly gifts per center month as grouped bars; the table next to it carries the same figures. */
export function MoneyByMonthChart({ months, tableId }: { months: MonthFigures[]; tableId: string }) {
  const id = useId().replace(/:/g, "");
  const innerWidth = WIDTH - MARGIN.left - MARGIN.right;
  const innerHeight = HEIGHT - MARGIN.top - MARGIN.bottom;
  const x = scaleBand<string>({ domain: months.map((m) => m.month), range: [0, innerWidth], padding: 0.25 });
  const inner = scaleBand<string>({ domain: SERIES.map((s) => s.key), range: [0, x.bandwidth()], padding: 0.1 });
  const top = Math.max(100, ...months.flatMap((m) => SERIES.map((s) => m[s.key])));
  const y = scaleLinear<number>({ domain: [0, top / 100], range: [innerHeight, 0], nice: true });
  const title = "Sales and gifts by month";
  const summary = months.map((m) => `${m.month}: sales ${formatUsd(m.salesCents)}, one-time gifts ${formatUsd(m.oneTimeGiftCents)}, monthly gifts ${formatUsd(m.monthlyGiftCents)}`).join("; ");
  return (
    <figure className="flex flex-col gap-3 rounded-xl border border-paper-200 bg-white p-4" aria-labelledby={`${id}-caption`}>
      <figcaption id={`${id}-caption`} className="font-display text-lg font-semibold text-moss-900">
        {title}
      </figcaption>
      {months.length === 0 ? (
        <p className="text-ink-soft">No sales or gifts in this range.</p>
      ) : (
        <>
          <svg role="img" aria-labelledby={`${id}-title ${id}-desc`} aria-details={tableId} viewBox={`0 0 ${WIDTH} ${HEIGHT}`} className="h-auto w-full" data-testid="money-by-month-chart">
            <title id={`${id}-title`}>{title}</title>
            <desc id={`${id}-desc`}>Grouped bars per month in US dollars; the table below has the same figures. {summary}.</desc>
            <Group left={MARGIN.left} top={MARGIN.top}>
              {months.map((m) => (
                <Group key={m.month} left={x(m.month) ?? 0}>
                  {SERIES.map((s) => {
                    const h = innerHeight - y(m[s.key] / 100);
                    return <Bar key={s.key} x={inner(s.key) ?? 0} y={innerHeight - h} width={inner.bandwidth()} height={h} fill={s.color} />;
                  })}
                </Group>
              ))}
              <AxisLeft
                scale={y}
                numTicks={5}
                tickFormat={(v) => `$${Number(v).toLocaleString("en-US")}`}
                stroke={palette.bark[400]}
                tickStroke={palette.bark[400]}
                tickLabelProps={{ fill: palette.ink.soft, fontSize: 12, textAnchor: "end", dy: "0.33em" }}
              />
              <AxisBottom top={innerHeight} scale={x} stroke={palette.bark[400]} tickStroke={palette.bark[400]} tickLabelProps={{ fill: palette.ink.DEFAULT, fontSize: 12, textAnchor: "middle" }} />
            </Group>
          </svg>
          <ul className="flex flex-wrap gap-4 text-sm" aria-label="Key">
            {SERIES.map((s) => (
              <li key={s.key} className="flex items-center gap-2">
                <span aria-hidden="true" className="inline-block size-3 rounded-sm border border-bark-400" style={{ backgroundColor: s.color }} />
                {s.label}
              </li>
            ))}
          </ul>
        </>
      )}
    </figure>
  );
}

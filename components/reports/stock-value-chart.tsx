"use client";

import { AxisBottom } from "@visx/axis";
import { Group } from "@visx/group";
import { scaleBand, scaleLinear } from "@visx/scale";
import { Bar } from "@visx/shape";
import { useId } from "react";
import { palette } from "@/components/brand/palette";
import { formatUsd } from "@/lib/checkout/money";

export type StockBar = { slug: string; name: string; stock: number; valueCents: number };

const WIDTH = 640;
const ROW = 30;
const MARGIN = { top: 8, right: 96, bottom: 36, left: 160 };

/** Stock value at list price per model as horizontal bars; the stock table carries the same figures. */
export function StockValueChart({ rows, tableId }: { rows: StockBar[]; tableId: string }) {
  const id = useId().replace(/:/g, "");
  const height = MARGIN.top + MARGIN.bottom + Math.max(1, rows.length) * ROW;
  const innerWidth = WIDTH - MARGIN.left - MARGIN.right;
  const x = scaleLinear<number>({ domain: [0, Math.max(100, ...rows.map((r) => r.valueCents)) / 100], range: [0, innerWidth], nice: true });
  const y = scaleBand<string>({ domain: rows.map((r) => r.slug), range: [0, height - MARGIN.top - MARGIN.bottom], padding: 0.25 });
  const title = "Stock value by model";
  const summary = rows.map((r) => `${r.name}: ${r.stock} in stock, ${formatUsd(r.valueCents)}`).join("; ");
  return (
    <figure className="flex flex-col gap-3 rounded-xl border border-paper-200 bg-white p-4" aria-labelledby={`${id}-caption`}>
      <figcaption id={`${id}-caption`} className="font-display text-lg font-semibold text-moss-900">
        {title}
      </figcaption>
      {rows.length === 0 ? (
        <p className="text-ink-soft">No house models yet.</p>
      ) : (
        <svg role="img" aria-labelledby={`${id}-title ${id}-desc`} aria-details={tableId} viewBox={`0 0 ${WIDTH} ${height}`} className="h-auto w-full" data-testid="stock-value-chart">
          <title id={`${id}-title`}>{title}</title>
          <desc id={`${id}-desc`}>Value of the houses on hand at list price, per model, in US dollars; the table below has the same figures. {summary}.</desc>
          <Group left={MARGIN.left} top={MARGIN.top}>
            {rows.map((r) => {
              const top = y(r.slug) ?? 0;
              const w = x(r.valueCents / 100);
              return (
                <Group key={r.slug}>
                  <text x={-8} y={top + y.bandwidth() / 2} dy="0.33em" textAnchor="end" fontSize={12} fill={palette.ink.DEFAULT}>
                    {r.name}
                  </text>
                  <Bar x={0} y={top} width={w} height={y.bandwidth()} fill={palette.moss[500]} rx={3} />
                  <text x={w + 6} y={top + y.bandwidth() / 2} dy="0.33em" fontSize={12} fill={palette.ink.soft}>
                    {formatUsd(r.valueCents)}
                  </text>
                </Group>
              );
            })}
            <AxisBottom
              top={height - MARGIN.top - MARGIN.bottom}
              scale={x}
              numTicks={5}
              tickFormat={(v) => `$${Number(v).toLocaleString("en-US")}`}
              stroke={palette.bark[400]}
              tickStroke={palette.bark[400]}
              tickLabelProps={{ fill: palette.ink.soft, fontSize: 12, textAnchor: "middle" }}
            />
          </Group>
        </svg>
      )}
    </figure>
  );
}

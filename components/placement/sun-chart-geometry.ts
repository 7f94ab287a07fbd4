// Layout of the hour-by-hour sun chart: which solar hours to show, and where bars, the midsummer
// step line and the ticks go. Pure, so the numbers on the chart are tested without a browser.

// A narrow box with large type: on a phone the chart shrinks to about 0.75 of this, on a desktop
// it is capped near 1.15, so the 16-unit labels read at 12–18 px.
export const CHART_BOX = { width: 480, height: 280, left: 50, right: 12, top: 26, bottom: 60 };
const MINUTES_PER_HOUR = 60;

export type ChartBar = {
  hour: number;
  minutes: number;
  x: number;
  y: number;
  width: number;
  height: number;
};

export type SunChartLayout = {
  from: number;
  to: number;
  bars: ChartBar[];
  /** A step line: flat across each hour at that hour's minutes. */
  solsticePath: string;
  xTicks: { hour: number; x: number; label: string }[];
  yTicks: { minutes: number; y: number }[];
  noonX: number;
  plot: { left: number; right: number; top: number; bottom: number };
};

/** "06:00": solar hours as a 24-hour clock face. */
export function formatSolarHour(hour: number): string {
  return `${String(hour % 24).padStart(2, "0")}:00`;
}

/**
 * The hours worth showing: from an hour before the first sun to an hour after the last, in
 * either series; the whole day when the face gets no sun, so the empty chart still reads.
 */
export function findHourRange(series: readonly (readonly number[])[]): {
  from: number;
  to: number;
} {
  let first = 24;
  let last = -1;
  for (const values of series) {
    values.forEach((minutes, hour) => {
      if (minutes > 0) {
        first = Math.min(first, hour);
        last = Math.max(last, hour);
      }
    });
  }
  if (last < 0) return { from: 0, to: 24 };
  return { from: Math.max(0, first - 1), to: Math.min(24, last + 2) };
}

const round = (n: number) => Math.round(n * 100) / 100;

export function layoutSunChart({
  season,
  solstice,
}: {
  season: readonly number[];
  solstice: readonly number[];
}): SunChartLayout {
  const { from, to } = findHourRange([season, solstice]);
  const plot = {
    left: CHART_BOX.left,
    right: CHART_BOX.width - CHART_BOX.right,
    top: CHART_BOX.top,
    bottom: CHART_BOX.height - CHART_BOX.bottom,
  };
  const hourWidth = (plot.right - plot.left) / (to - from);
  const x = (hour: number) => round(plot.left + (hour - from) * hourWidth);
  const y = (minutes: number) =>
    round(
      plot.bottom -
        (Math.min(minutes, MINUTES_PER_HOUR) / MINUTES_PER_HOUR) * (plot.bottom - plot.top),
    );
  const hours = Array.from({ length: to - from }, (_, i) => from + i);
  // Bars fill 70% of their hour, centred, so the step line stays readable across them.
  const barWidth = round(hourWidth * 0.7);

  const bars = hours.map((hour) => {
    const minutes = season[hour] ?? 0;
    const top = y(minutes);
    return {
      hour,
      minutes,
      x: round(x(hour) + (hourWidth - barWidth) / 2),
      y: top,
      width: barWidth,
      height: round(plot.bottom - top),
    };
  });

  const steps = hours.flatMap((hour, i) => {
    const level = y(solstice[hour] ?? 0);
    const head = i === 0 ? `M${x(hour)} ${level}` : `V${level}`;
    return [head, `H${x(hour + 1)}`];
  });

  // Labels about 45 units wide need 2 h apart up to 12 h of chart, then 3 h, then 4 h.
  const tickEvery = to - from > 18 ? 4 : to - from > 12 ? 3 : 2;
  const xTicks = [];
  for (let hour = Math.ceil(from / tickEvery) * tickEvery; hour <= to; hour += tickEvery) {
    xTicks.push({ hour, x: x(hour), label: formatSolarHour(hour) });
  }
  const yTicks = [0, 15, 30, 45, 60].map((minutes) => ({ minutes, y: y(minutes) }));

  return { from, to, bars, solsticePath: steps.join(" "), xTicks, yTicks, noonX: x(12), plot };
}

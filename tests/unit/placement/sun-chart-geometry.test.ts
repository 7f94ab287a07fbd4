// Layout of the hour-by-hour sun chart (components/placement/sun-chart-geometry.ts), on a real
// day: a south wall at 40° N on the June solstice, whose sun runs between the moments the sun
// crosses due east and due west, 3.93 h either side of solar noon (closed form cos h =
// tan δ / tan φ, δ = 23.44°): so from about 08:04 to 15:56 solar time.
import { describe, expect, it } from "vitest";
import {
  CHART_BOX,
  findHourRange,
  formatSolarHour,
  layoutSunChart,
} from "@/components/placement/sun-chart-geometry";
import { seasonSunHours } from "@/lib/placement/sun";

const south40 = seasonSunHours({ lat: 40, lon: -100, facingDeg: 180 });
const plotHeight = CHART_BOX.height - CHART_BOX.top - CHART_BOX.bottom;

describe("findHourRange", () => {
  it("spans an hour either side of the sun on a south wall at midsummer", () => {
    const { byHour } = south40.solstice;
    expect(byHour[7]).toBe(0);
    expect(byHour[8]).toBeGreaterThan(50); // sun from about 08:04
    expect(byHour[15]).toBeGreaterThan(50); // to about 15:56
    expect(byHour[16]).toBe(0);
    expect(findHourRange([byHour])).toEqual({ from: 7, to: 17 });
  });

  it("shows the whole day when there is no sun at all", () => {
    expect(findHourRange([new Array(24).fill(0)])).toEqual({ from: 0, to: 24 });
  });

  it("clamps at midnight on both ends", () => {
    const allDay = new Array(24).fill(60);
    expect(findHourRange([allDay])).toEqual({ from: 0, to: 24 });
  });
});

describe("layoutSunChart", () => {
  const layout = layoutSunChart({ season: south40.meanByHour, solstice: south40.solstice.byHour });

  it("draws one bar per hour with height proportional to the minutes", () => {
    // The season reaches further: on May 1 (δ ≈ 15°) the sun crosses due east at
    // h = acos(tan 15° / tan 40°) = 71.4°, 4.76 h before noon, about 07:14.
    expect(south40.meanByHour[6]).toBe(0);
    expect(south40.meanByHour[7]).toBeGreaterThan(0);
    expect(layout.bars.map((b) => b.hour)).toEqual([6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17]);
    for (const bar of layout.bars) {
      expect(bar.height).toBeCloseTo((bar.minutes / 60) * plotHeight, 1);
      expect(bar.y + bar.height).toBeCloseTo(layout.plot.bottom, 5);
    }
  });

  it("puts noon in the middle of a symmetric day and the ticks on even hours", () => {
    expect(layout.noonX).toBeCloseTo((layout.plot.left + layout.plot.right) / 2, 1);
    expect(layout.xTicks.map((t) => t.label)).toEqual([
      "06:00",
      "08:00",
      "10:00",
      "12:00",
      "14:00",
      "16:00",
      "18:00",
    ]);
    expect(layout.yTicks.map((t) => t.minutes)).toEqual([0, 15, 30, 45, 60]);
    expect(layout.yTicks[0]?.y).toBe(layout.plot.bottom);
    expect(layout.yTicks[4]?.y).toBe(layout.plot.top);
  });

  it("steps the midsummer line flat across each hour", () => {
    expect(layout.solsticePath.startsWith(`M${layout.plot.left} ${layout.plot.bottom} H`)).toBe(
      true,
    );
    expect(layout.solsticePath.match(/H/g)).toHaveLength(12);
    expect(layout.solsticePath.endsWith(`H${layout.plot.right}`)).toBe(true);
    // Hour 12 on the solstice is a full 60 minutes: the line sits on the top of the plot there.
    expect(south40.solstice.byHour[12]).toBe(60);
    expect(layout.solsticePath).toContain(`V${layout.plot.top}`);
  });

  it("formats solar hours as a 24-hour clock", () => {
    expect(formatSolarHour(6)).toBe("06:00");
    expect(formatSolarHour(24)).toBe("00:00");
  });
});

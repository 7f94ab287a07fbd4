// Layout of the skyline chart (our own design): a 360° panorama centred on the equator side,
// the skyline drawn straight between its 16 directions (it is linear between them), the sun's
// path split where it dips behind the skyline or behind a wall.
import { describe, expect, it } from "vitest";
import {
  classifySun,
  layoutSkylineChart,
  SKYLINE_CHART_BOX,
} from "@/components/placement/skyline-chart-geometry";
import { traceSunPath } from "@/lib/placement/sun-path";

const site = { lat: 40, lon: -100 };
const paths = {
  solstice: traceSunPath({ ...site, date: "2026-06-21" }),
  seasonLow: traceSunPath({ ...site, date: "2026-08-15" }),
};
const east = [0, 0, 8, 22, 30, 22, 8, 0, 0, 0, 0, 0, 0, 0, 0, 0];
const { left } = SKYLINE_CHART_BOX;
const right = SKYLINE_CHART_BOX.width - SKYLINE_CHART_BOX.right;

describe("layoutSkylineChart", () => {
  it("runs north to north with south in the middle in the north, and the reverse in the south", () => {
    const north = layoutSkylineChart({
      skyline: null,
      paths,
      facingDeg: 180,
      wall: false,
      hemisphere: "north",
    });
    expect(north.xTicks.map((t) => t.label)).toEqual([
      "N",
      "NE",
      "E",
      "SE",
      "S",
      "SW",
      "W",
      "NW",
      "N",
    ]);
    expect(north.facing.x).toBeCloseTo((left + right) / 2, 0);
    const south = layoutSkylineChart({
      skyline: null,
      paths,
      facingDeg: 0,
      wall: false,
      hemisphere: "south",
    });
    expect(south.xTicks.map((t) => t.label)).toEqual([
      "S",
      "SW",
      "W",
      "NW",
      "N",
      "NE",
      "E",
      "SE",
      "S",
    ]);
    expect(south.facing.x).toBeCloseTo((left + right) / 2, 0);
  });

  it("scales the height to the midsummer sun (73° at 40° N → 75°)", () => {
    const layout = layoutSkylineChart({
      skyline: east,
      paths,
      facingDeg: 160,
      wall: false,
      hemisphere: "north",
    });
    expect(layout.maxAltitude).toBe(75);
    expect(layout.yTicks.map((t) => t.label)).toEqual(["0°", "15°", "30°", "45°", "60°", "75°"]);
  });

  it("draws no skyline for an open sky, and 17 corners for a given one", () => {
    expect(
      layoutSkylineChart({ skyline: null, paths, facingDeg: 160, wall: false, hemisphere: "north" })
        .skylineArea,
    ).toBe("");
    const line = layoutSkylineChart({
      skyline: east,
      paths,
      facingDeg: 160,
      wall: false,
      hemisphere: "north",
    }).skylineLine;
    expect(line.split("L")).toHaveLength(17);
  });

  it("splits the path where trees to the east hide the morning sun", () => {
    const layout = layoutSkylineChart({
      skyline: east,
      paths,
      facingDeg: 160,
      wall: false,
      hemisphere: "north",
    });
    const open = layoutSkylineChart({
      skyline: null,
      paths,
      facingDeg: 160,
      wall: false,
      hemisphere: "north",
    });
    // Below the horizon at both ends; with the trees the morning's hidden stretch is longer.
    expect(layout.solsticeRuns.map((r) => r.state)).toEqual(["hidden", "lit", "hidden"]);
    expect(open.solsticeRuns.map((r) => r.state)).toEqual(["hidden", "lit", "hidden"]);
    const points = (d: string | undefined) => (d ?? "").split("L").length;
    expect(points(layout.solsticeRuns[0]?.d)).toBeGreaterThan(points(open.solsticeRuns[0]?.d) + 8);
    expect(points(layout.solsticeRuns[2]?.d)).toBe(points(open.solsticeRuns[2]?.d));
  });

  it("greys the half of the sky behind a wall, cut where it wraps", () => {
    const wall = layoutSkylineChart({
      skyline: null,
      paths,
      facingDeg: 160,
      wall: true,
      hemisphere: "north",
    });
    // Behind a wall facing 160°: 250° round to 70°, so two pieces, 110° and 70° wide.
    const widths = wall.behindWall.map((r) => r.width).sort((a, b) => b - a);
    expect(widths[0]).toBeCloseTo(((right - left) * 110) / 360, 0);
    expect(widths[1]).toBeCloseTo(((right - left) * 70) / 360, 0);
    expect(wall.solsticeRuns.map((r) => r.state)).toContain("behind-wall");
  });
});

describe("classifySun", () => {
  it("needs the sun above the horizon, above the skyline there, and in front of a wall", () => {
    const at = (azimuth: number, altitude: number, wall = false) =>
      classifySun({ point: { azimuth, altitude }, skyline: east, facingDeg: 180, wall });
    expect(at(90, 29)).toBe("hidden");
    expect(at(90, 31)).toBe("lit");
    expect(at(270, 1)).toBe("lit");
    expect(at(270, 1, true)).toBe("lit");
    expect(at(280, 5, true)).toBe("behind-wall");
    expect(at(200, -0.5)).toBe("hidden");
  });
});

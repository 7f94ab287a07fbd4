// Layout of the skyline chart: a 360° panorama (azimuth across, altitude up) with the site's
// skyline, the sun's path at midsummer and on the season's lowest day, the band between them,
// the facing of the house and, for a wall, the half of the sky behind it. Pure, so the numbers
// on the chart are tested without a browser. The panorama is centred on the equator side
// (south in the north, north in the south), where the summer sun runs at midday.
import { abbreviateBearing } from "@/lib/placement/bearing";
import {
  SKYLINE_DIRECTIONS,
  SKYLINE_STEP_DEG,
  skylineElevationAt,
  type Skyline,
} from "@/lib/placement/skyline";
import type { SunPath, SunPathPoint } from "@/lib/placement/sun-path";

/**
 * A wide box: on a 360 px phone it shrinks to about 0.55, so the chart's labels grow to 28–30
 * units there (15–16 px) and stay at 20–22 units on wider screens.
 */
export const SKYLINE_CHART_BOX = {
  width: 640,
  height: 360,
  left: 64,
  right: 16,
  top: 40,
  bottom: 52,
};

export type SunState = "lit" | "hidden" | "behind-wall";

export type PathRun = { state: SunState; d: string };

export type SkylineChartLayout = {
  plot: { left: number; right: number; top: number; bottom: number };
  /** Azimuth at the left edge: 0 (north) in the north, 180 (south) in the south. */
  startAzimuth: number;
  maxAltitude: number;
  /** The skyline as a closed area from the ground up (empty path for an open sky). */
  skylineArea: string;
  skylineLine: string;
  /** The season's band of sun paths, from the lowest day up to midsummer. */
  band: string;
  solsticeRuns: PathRun[];
  seasonLowRuns: PathRun[];
  /** For a wall: the stretches of sky behind it (x ranges). */
  behindWall: { x: number; width: number }[];
  facing: { x: number; label: string };
  xTicks: { x: number; label: string }[];
  yTicks: { y: number; label: string }[];
};

const round = (n: number) => Math.round(n * 10) / 10;

export function isInFront({ azimuth, facingDeg }: { azimuth: number; facingDeg: number }): boolean {
  return Math.cos(((azimuth - facingDeg) * Math.PI) / 180) > 0;
}

/** Whether the sun at this point reaches the house: above the skyline, and in front of a wall. */
export function classifySun({
  point,
  skyline,
  facingDeg,
  wall,
}: {
  point: Pick<SunPathPoint, "azimuth" | "altitude">;
  skyline: Skyline | null;
  facingDeg: number;
  wall: boolean;
}): SunState {
  const blocked = skyline ? skylineElevationAt(skyline, point.azimuth) : 0;
  if (!(point.altitude > 0 && point.altitude > blocked)) return "hidden";
  if (wall && !isInFront({ azimuth: point.azimuth, facingDeg })) return "behind-wall";
  return "lit";
}

export function layoutSkylineChart({
  skyline,
  paths,
  facingDeg,
  wall,
  hemisphere,
}: {
  skyline: Skyline | null;
  paths: { solstice: SunPath; seasonLow: SunPath };
  facingDeg: number;
  wall: boolean;
  hemisphere: "north" | "south";
}): SkylineChartLayout {
  const box = SKYLINE_CHART_BOX;
  const plot = {
    left: box.left,
    right: box.width - box.right,
    top: box.top,
    bottom: box.height - box.bottom,
  };
  const startAzimuth = hemisphere === "north" ? 0 : 180;
  const peak = Math.max(0, ...paths.solstice.points.map((p) => p.altitude), ...(skyline ?? [0]));
  const maxAltitude = Math.min(90, Math.max(30, Math.ceil(peak / 15) * 15));
  const unwrap = (azimuth: number) => (((azimuth - startAzimuth) % 360) + 360) % 360;
  const x = (u: number) => round(plot.left + (u / 360) * (plot.right - plot.left));
  const y = (altitude: number) =>
    round(plot.bottom - (altitude / maxAltitude) * (plot.bottom - plot.top));

  // The skyline is linear between directions, so straight segments between them are exact.
  const startIndex = startAzimuth / SKYLINE_STEP_DEG;
  const outline = Array.from({ length: SKYLINE_DIRECTIONS + 1 }, (_, j) => {
    const k = (startIndex + j) % SKYLINE_DIRECTIONS;
    return `${x(j * SKYLINE_STEP_DEG)} ${y(skyline?.[k] ?? 0)}`;
  });
  const hasSkyline = Boolean(skyline && skyline.some((a) => a > 0));
  const skylineLine = hasSkyline ? `M${outline.join(" L")}` : "";
  const skylineArea = hasSkyline
    ? `M${x(0)} ${plot.bottom} L${outline.join(" L")} L${x(360)} ${plot.bottom} Z`
    : "";

  const toXY = (p: SunPathPoint) => `${x(unwrap(p.azimuth))} ${y(p.altitude)}`;
  const classify = (p: SunPathPoint) => classifySun({ point: p, skyline, facingDeg, wall });
  const runs = (path: SunPath) => splitRuns(path.points, { unwrap, toXY, classify });

  const up = (path: SunPath) => path.points.filter((p) => p.altitude > -1);
  const high = up(paths.solstice);
  const low = up(paths.seasonLow);
  const band =
    high.length > 1 && low.length > 1 && !wraps(high, unwrap) && !wraps(low, unwrap)
      ? `M${high.map(toXY).join(" L")} L${[...low].reverse().map(toXY).join(" L")} Z`
      : "";

  const behindWall: { x: number; width: number }[] = [];
  if (wall) {
    // The sky behind the wall runs from facing + 90° to facing + 270°, cut where it wraps.
    const from = unwrap(facingDeg + 90);
    const to = from + 180;
    for (const [a, b] of to <= 360
      ? [[from, to]]
      : [
          [from, 360],
          [0, to - 360],
        ]) {
      behindWall.push({ x: x(a ?? 0), width: round(x(b ?? 0) - x(a ?? 0)) });
    }
  }

  const xTicks = Array.from({ length: 9 }, (_, j) => ({
    x: x(j * 45),
    label: abbreviateBearing(startAzimuth + j * 45),
  }));
  const yTicks = [];
  for (let a = 0; a <= maxAltitude; a += 15) yTicks.push({ y: y(a), label: `${a}°` });

  return {
    plot,
    startAzimuth,
    maxAltitude,
    skylineArea,
    skylineLine,
    band,
    solsticeRuns: runs(paths.solstice),
    seasonLowRuns: runs(paths.seasonLow),
    behindWall,
    facing: { x: x(unwrap(facingDeg)), label: `faces ${abbreviateBearing(facingDeg)}` },
    xTicks,
    yTicks,
  };
}

/** True when the path crosses the panorama's edge (the midnight sun far north). */
function wraps(points: SunPathPoint[], unwrap: (az: number) => number): boolean {
  return points.some(
    (p, i) => i > 0 && Math.abs(unwrap(p.azimuth) - unwrap(points[i - 1]?.azimuth ?? 0)) > 180,
  );
}

/**
 * Consecutive points in the same state become one polyline; neighbouring runs share their
 * boundary point so the line has no gaps, and a jump across the panorama's edge starts afresh.
 */
function splitRuns(
  points: SunPathPoint[],
  {
    unwrap,
    toXY,
    classify,
  }: {
    unwrap: (az: number) => number;
    toXY: (p: SunPathPoint) => string;
    classify: (p: SunPathPoint) => SunState;
  },
): PathRun[] {
  const runs: { state: SunState; points: string[] }[] = [];
  let previous: SunPathPoint | null = null;
  for (const point of points) {
    const state = classify(point);
    const jump =
      previous !== null && Math.abs(unwrap(point.azimuth) - unwrap(previous.azimuth)) > 180;
    const last = runs.at(-1);
    if (last && last.state === state && !jump) {
      last.points.push(toXY(point));
    } else {
      const start = previous && !jump ? [toXY(previous)] : [];
      runs.push({ state, points: [...start, toXY(point)] });
    }
    previous = point;
  }
  return runs
    .filter((run) => run.points.length > 1)
    .map((run) => ({ state: run.state, d: `M${run.points.join(" L")}` }));
}

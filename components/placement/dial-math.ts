// Geometry and keys of the compass dial. Pure, so the arithmetic is tested without a browser.
// Bearings are degrees clockwise from north; screen y grows downward.
import { describeBearing, normalizeBearing } from "@/lib/placement/bearing";

/** Arrow keys move 5°; with Shift (or Page Up/Down) 15°. Common practice for angle sliders. */
export const DIAL_STEP = 5;
export const DIAL_BIG_STEP = 15;
export const DIAL_MAX = 359;

// A tenth of a degree is finer than any compass a buyer holds, and hides float noise (157.1 + 5).
const tenth = (deg: number) => Math.round(deg * 10) / 10;

/** The bearing after a key press, or null when the key is not the dial's. Wraps past north. */
export function stepBearing({
  bearing,
  key,
  shiftKey = false,
}: {
  bearing: number;
  key: string;
  shiftKey?: boolean;
}): number | null {
  const step = shiftKey ? DIAL_BIG_STEP : DIAL_STEP;
  switch (key) {
    case "ArrowRight":
    case "ArrowUp":
      return tenth(normalizeBearing(bearing + step));
    case "ArrowLeft":
    case "ArrowDown":
      return tenth(normalizeBearing(bearing - step));
    case "PageUp":
      return tenth(normalizeBearing(bearing + DIAL_BIG_STEP));
    case "PageDown":
      return tenth(normalizeBearing(bearing - DIAL_BIG_STEP));
    case "Home":
      return 0;
    case "End":
      return DIAL_MAX;
    default:
      return null;
  }
}

/** The whole-degree bearing of a point seen from the dial's centre (dx right, dy down). */
export function bearingFromOffset({ dx, dy }: { dx: number; dy: number }): number {
  if (dx === 0 && dy === 0) return 0;
  const deg = (Math.atan2(dx, -dy) * 180) / Math.PI;
  return normalizeBearing(Math.round(deg)) % 360;
}

/** "157°, south-southeast": what the slider says to a screen reader. */
export function describeDialValue(bearing: number): string {
  return `${tenth(normalizeBearing(bearing))}°, ${describeBearing(bearing)}`;
}

/** The point at a bearing and radius around the dial's centre (0, 0), in SVG coordinates. */
export function pointAt({ bearing, radius }: { bearing: number; radius: number }) {
  const rad = (bearing * Math.PI) / 180;
  // `+ 0` turns −0 into 0, so paths never print "-0".
  const round = (n: number) => Math.round(n * 100) / 100 + 0;
  return { x: round(radius * Math.sin(rad)), y: round(-radius * Math.cos(rad)) };
}

/** An SVG path for the ring sector between two bearings, clockwise from `from` to `to`. */
export function ringSectorPath({
  from,
  to,
  inner,
  outer,
}: {
  from: number;
  to: number;
  inner: number;
  outer: number;
}): string {
  const sweep = normalizeBearing(to - from) || 360;
  const large = sweep > 180 ? 1 : 0;
  const a = pointAt({ bearing: from, radius: outer });
  const b = pointAt({ bearing: from + sweep, radius: outer });
  const c = pointAt({ bearing: from + sweep, radius: inner });
  const d = pointAt({ bearing: from, radius: inner });
  return [
    `M${a.x} ${a.y}`,
    `A${outer} ${outer} 0 ${large} 1 ${b.x} ${b.y}`,
    `L${c.x} ${c.y}`,
    `A${inner} ${inner} 0 ${large} 0 ${d.x} ${d.y}`,
    "Z",
  ].join(" ");
}

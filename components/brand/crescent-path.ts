// SVG path of a crescent: the part of an outer disc not covered by an offset inner disc.
// Plain circle geometry (intersection of two circles), common practice, no source.

type Circle = { cx: number; cy: number; r: number };

const round = (value: number) => Math.round(value * 100) / 100;

/** Path data for the outer disc minus the inner one; throws when the circles do not cross. */
export function getCrescentPath({ outer, inner }: { outer: Circle; inner: Circle }): string {
  const dx = inner.cx - outer.cx;
  const dy = inner.cy - outer.cy;
  const d = Math.hypot(dx, dy);
  if (d === 0 || d >= outer.r + inner.r || d <= Math.abs(outer.r - inner.r)) {
    throw new Error("The two circles of a crescent must cross");
  }
  // Distance from the outer centre to the chord joining the two crossing points.
  const a = (outer.r ** 2 - inner.r ** 2 + d ** 2) / (2 * d);
  const h = Math.sqrt(outer.r ** 2 - a ** 2);
  const mx = outer.cx + (a * dx) / d;
  const my = outer.cy + (a * dy) / d;
  const p1 = { x: round(mx + (h * dy) / d), y: round(my - (h * dx) / d) };
  const p2 = { x: round(mx - (h * dy) / d), y: round(my + (h * dx) / d) };
  // The outer arc runs round the far side from the inner disc: large when the chord lies on
  // the inner disc's side of the outer centre. The inner arc is the part of the inner circle
  // inside the outer disc: large when the inner centre lies on the outer centre's side.
  const outerLarge = a > 0 ? 1 : 0;
  const innerLarge = d - a < 0 ? 1 : 0;
  return [
    `M${p1.x} ${p1.y}`,
    `A${outer.r} ${outer.r} 0 ${outerLarge} 0 ${p2.x} ${p2.y}`,
    `A${inner.r} ${inner.r} 0 ${innerLarge} 1 ${p1.x} ${p1.y}`,
    "Z",
  ].join("");
}

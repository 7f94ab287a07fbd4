import { getCrescentPath } from "./crescent-path";
import { palette as p } from "./palette";

const moon = getCrescentPath({
  outer: { cx: 146, cy: 40, r: 13 },
  inner: { cx: 152, cy: 35, r: 11 },
});

/**
 * A quiet picture for empty states: a house on its pole under a crescent, nobody home yet,
 * with a dotted flight line where the first bat will come. Our own drawing, decorative.
 */
export function EmptyRoost({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 200 150" className={className} aria-hidden="true" focusable="false">
      <ellipse cx="100" cy="132" rx="78" ry="9" fill={p.paper[300]} />
      <circle cx="100" cy="72" r="60" fill={p.dusk[50]} />
      <path d={moon} fill={p.ember[300]} />
      <path
        d="M34 96c14-30 40-52 70-60"
        fill="none"
        stroke={p.dusk[300]}
        strokeWidth="2"
        strokeLinecap="round"
        strokeDasharray="1 6"
      />
      <rect x="96" y="86" width="7" height="48" rx="1.5" fill={p.bark[600]} />
      <path d="M76 56 99.5 38 123 56l-3 3.5-20.5-15.5L79 59.5z" fill={p.moss[700]} />
      <path d="M81 58.5 99.5 45 118 58.5V94H81z" fill={p.bark[300]} />
      <path d="M86 66h27M86 73h27M86 80h27M86 87h27" stroke={p.bark[400]} strokeWidth="1.1" />
      <rect x="81" y="94" width="37" height="2" fill={p.bark[700]} />
      <path d="M81 96h37v10a1.5 1.5 0 0 1-1.5 1.5h-34A1.5 1.5 0 0 1 81 106z" fill={p.bark[200]} />
      <path d="M85 99.5h29M85 103h29" stroke={p.bark[300]} strokeWidth="0.9" />
    </svg>
  );
}

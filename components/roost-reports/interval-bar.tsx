import { intervalWords, percent } from "./format";

/** The observed share as a dot on a 0–100% track, with its 95% interval drawn as a bar. */
export function IntervalBar({ rate, interval, label }: { rate: number; interval: { lower: number; upper: number }; label: string }) {
  const x = (v: number) => `${(v * 100).toFixed(2)}%`;
  return (
    <svg
      role="img"
      aria-label={`${label}: ${percent(rate)} observed, ${intervalWords(interval)}`}
      className="h-6 w-full max-w-md overflow-visible"
      data-testid="interval-bar"
    >
      <rect x="0" y="9" width="100%" height="6" rx="3" className="fill-paper-200" />
      <rect x={x(interval.lower)} y="6" width={x(interval.upper - interval.lower)} height="12" rx="3" className="fill-moss-300" />
      <circle cx={x(rate)} cy="12" r="6" className="fill-moss-800 stroke-white" strokeWidth="2" />
      <line x1="50%" x2="50%" y1="2" y2="22" className="stroke-bark-400" strokeDasharray="2 2" />
    </svg>
  );
}

import { useId } from "react";

import { cn } from "./cn";

/** Share of `max` reached, clamped to 0–100 so a bad value never draws past the track. */
export function getProgressPercent({ value, max }: { value: number; max: number }): number {
  if (!Number.isFinite(value) || !Number.isFinite(max) || max <= 0) return 0;
  return Math.min(100, Math.max(0, (value / max) * 100));
}

type ProgressBarProps = {
  value: number;
  max?: number;
  /** Visible label, also the progress bar's accessible name. */
  label: string;
  /** Read and shown instead of the percentage, e.g. "3 of 8 orders packed". */
  valueText?: string;
  tone?: "moss" | "ember" | "dusk";
  className?: string;
};

const fillClasses = { moss: "bg-moss-600", ember: "bg-ember-500", dusk: "bg-dusk-500" } as const;

export function ProgressBar({
  value,
  max = 100,
  label,
  valueText,
  tone = "moss",
  className,
}: ProgressBarProps) {
  const labelId = useId();
  const percent = getProgressPercent({ value, max });
  const shown = valueText ?? `${Math.round(percent)}%`;
  const clamped = Math.min(max, Math.max(0, value));

  return (
    <div className={cn("flex flex-col gap-1.5", className)}>
      <div className="flex items-baseline justify-between gap-3 text-sm">
        <span id={labelId} className="font-bold text-ink">
          {label}
        </span>
        <span className="text-ink-soft tabular-nums" aria-hidden="true">
          {shown}
        </span>
      </div>
      <div
        role="progressbar"
        aria-labelledby={labelId}
        aria-valuemin={0}
        aria-valuemax={max}
        aria-valuenow={clamped}
        aria-valuetext={shown}
        className="h-2.5 overflow-hidden rounded-full bg-paper-300"
      >
        <div
          className={cn("h-full rounded-full transition-[width] duration-300", fillClasses[tone])}
          style={{ width: `${percent}%` }}
        />
      </div>
    </div>
  );
}

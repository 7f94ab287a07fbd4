import type { ReactNode } from "react";

import { cn } from "./cn";
import { ToneIcon, type Tone } from "./tone-icon";

export type BadgeTone = Tone;

// Text and ground reach 8.1–9.7:1 (see components/brand/contrast-pairs.ts).
const toneClasses: Record<BadgeTone, string> = {
  neutral: "bg-bark-100 text-bark-800",
  good: "bg-moss-100 text-moss-800",
  fair: "bg-ember-100 text-ember-900",
  poor: "bg-berry-100 text-berry-800",
  info: "bg-dusk-100 text-dusk-800",
  warn: "bg-ember-200 text-ember-900",
};

type BadgeProps = {
  tone?: BadgeTone;
  /** Shows the tone's shape before the words; on by default except for neutral. */
  icon?: boolean;
  className?: string;
  children: ReactNode;
};

/** A short status label: fit labels (good/fair/poor), order states, certification. */
export function Badge({
  tone = "neutral",
  icon = tone !== "neutral",
  className,
  children,
}: BadgeProps) {
  return (
    <span
      className={cn(
        "inline-flex items-center gap-1 rounded-full px-2.5 py-0.5 text-sm font-bold whitespace-nowrap",
        toneClasses[tone],
        className,
      )}
    >
      {icon ? <ToneIcon tone={tone} className="-ml-0.5 size-4" /> : null}
      {children}
    </span>
  );
}

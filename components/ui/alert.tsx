import type { ReactNode } from "react";

import { cn } from "./cn";
import { ToneIcon } from "./tone-icon";

export type AlertTone = "info" | "good" | "warn" | "poor";

const toneClasses: Record<AlertTone, { box: string; icon: string }> = {
  info: {
    box: "border-dusk-200 border-l-dusk-500 bg-dusk-50 text-dusk-900",
    icon: "text-dusk-600",
  },
  good: {
    box: "border-moss-200 border-l-moss-500 bg-moss-50 text-moss-900",
    icon: "text-moss-600",
  },
  warn: {
    box: "border-ember-200 border-l-ember-600 bg-ember-50 text-bark-900",
    icon: "text-ember-700",
  },
  poor: {
    box: "border-berry-200 border-l-berry-500 bg-berry-50 text-berry-900",
    icon: "text-berry-600",
  },
};

type AlertProps = {
  tone?: AlertTone;
  title?: ReactNode;
  children?: ReactNode;
  /**
   * true when the notice appears in answer to something the reader did (a saved form, a failed
   * payment): it becomes a polite role="status" region. Static notices (safety cautions, page
   * intros) stay without a role. Never role="alert": that also matches Next's route announcer
   * in tests and interrupts screen readers.
   */
  live?: boolean;
  className?: string;
};

/** A notice box: cautions, results of an action, things a buyer should know before going on. */
export function Alert({ tone = "info", title, children, live = false, className }: AlertProps) {
  const classes = toneClasses[tone];
  return (
    <div
      role={live ? "status" : undefined}
      className={cn("flex gap-3 rounded-xl border border-l-4 p-4", classes.box, className)}
    >
      <ToneIcon tone={tone} className={cn("mt-0.5 size-5", classes.icon)} />
      <div className="flex min-w-0 flex-col gap-1">
        {title ? <p className="font-bold">{title}</p> : null}
        {children ? (
          <div className="text-[0.9375rem] leading-relaxed [&_a]:text-inherit">{children}</div>
        ) : null}
      </div>
    </div>
  );
}

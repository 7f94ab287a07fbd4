import type { ReactNode } from "react";

import { EmptyRoost } from "@/components/brand/empty-roost";

import { cn } from "./cn";

type EmptyStateProps = {
  title: string;
  /** One or two sentences: why it is empty and what to do next. */
  description?: ReactNode;
  /** Anything richer than a sentence, shown under the description. */
  children?: ReactNode;
  /** A button or link that fills the emptiness (e.g. "Browse houses"). */
  action?: ReactNode;
  /** Replaces the default house-under-the-moon drawing; pass null for none. */
  illustration?: ReactNode;
  /** Heading level so the state fits the page's outline (default h2). */
  level?: 2 | 3;
  className?: string;
};

/** What a list, cart or queue shows when there is nothing in it yet. */
export function EmptyState({
  title,
  description,
  children,
  action,
  illustration,
  level = 2,
  className,
}: EmptyStateProps) {
  const Heading = level === 2 ? "h2" : "h3";
  const picture =
    illustration === undefined ? <EmptyRoost className="h-auto w-40" /> : illustration;
  return (
    <div
      className={cn(
        "flex flex-col items-center gap-3 rounded-2xl border border-dashed border-bark-200 bg-paper-50 px-6 py-10 text-center",
        className,
      )}
    >
      {picture}
      <Heading className="text-xl">{title}</Heading>
      {description ? <p className="max-w-md text-ink-soft">{description}</p> : null}
      {children ? <div className="max-w-md text-ink-soft">{children}</div> : null}
      {action ? <div className="mt-2">{action}</div> : null}
    </div>
  );
}

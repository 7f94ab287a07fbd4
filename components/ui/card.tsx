import type { HTMLAttributes, ReactNode } from "react";

import { cn } from "./cn";

type CardProps = HTMLAttributes<HTMLElement> & {
  /** The element to render: "section" or "article" when the card has its own heading. */
  as?: "div" | "section" | "article" | "li";
};

/** A sheet of paper lifted off the page: the frame for a house, an order, a form section. */
export function Card({ as: Tag = "div", className, ...rest }: CardProps) {
  return (
    <Tag
      className={cn(
        "rounded-2xl border border-paper-300 bg-paper-50 p-5 shadow-card sm:p-6",
        className,
      )}
      {...rest}
    />
  );
}

type CardHeaderProps = {
  title: ReactNode;
  description?: ReactNode;
  /** A button or link aligned to the right of the title. */
  action?: ReactNode;
  /** Heading level, so cards fit the page's outline (default h2). */
  level?: 2 | 3;
  className?: string;
};

export function CardHeader({ title, description, action, level = 2, className }: CardHeaderProps) {
  const Heading = level === 2 ? "h2" : "h3";
  return (
    <div className={cn("mb-4 flex flex-wrap items-start justify-between gap-3", className)}>
      <div className="flex min-w-0 flex-col gap-1">
        <Heading className={level === 2 ? "text-xl" : "text-lg"}>{title}</Heading>
        {description ? <p className="text-sm text-ink-soft">{description}</p> : null}
      </div>
      {action ? <div className="shrink-0">{action}</div> : null}
    </div>
  );
}

export function CardFooter({ className, ...rest }: HTMLAttributes<HTMLDivElement>) {
  return (
    <div
      className={cn(
        "mt-5 flex flex-wrap items-center justify-end gap-2 border-t border-paper-200 pt-4",
        className,
      )}
      {...rest}
    />
  );
}

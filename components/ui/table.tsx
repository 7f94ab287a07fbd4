import Link from "next/link";
import type { HTMLAttributes, ReactNode, TdHTMLAttributes, ThHTMLAttributes } from "react";

import { cn } from "./cn";

type TableProps = HTMLAttributes<HTMLTableElement> & {
  /** Names the table for screen readers and the scroll region; shown unless `hideCaption`. */
  caption: string;
  hideCaption?: boolean;
  wrapperClassName?: string;
};

/**
 * A table in a scrolling frame: on a phone wide tables scroll sideways instead of squeezing
 * columns. The frame is a named, focusable region so keyboard users can scroll it too.
 */
export function Table({
  caption,
  hideCaption = false,
  wrapperClassName,
  className,
  children,
  ...rest
}: TableProps) {
  return (
    <div
      role="region"
      aria-label={caption}
      tabIndex={0}
      className={cn(
        "overflow-x-auto rounded-xl border border-paper-300 bg-paper-50 shadow-card",
        "focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-dusk-500",
        wrapperClassName,
      )}
    >
      <table
        className={cn("w-full border-collapse text-left text-sm sm:text-base", className)}
        {...rest}
      >
        <caption
          className={
            hideCaption
              ? "sr-only"
              : "px-4 pt-4 pb-2 text-left font-display text-lg font-semibold text-moss-800"
          }
        >
          {caption}
        </caption>
        {children}
      </table>
    </div>
  );
}

export function THead({ className, ...rest }: HTMLAttributes<HTMLTableSectionElement>) {
  return <thead className={cn("border-b border-paper-300 bg-paper-200", className)} {...rest} />;
}

export function TBody({ className, ...rest }: HTMLAttributes<HTMLTableSectionElement>) {
  return <tbody className={cn("divide-y divide-paper-200", className)} {...rest} />;
}

export function Tr({ className, ...rest }: HTMLAttributes<HTMLTableRowElement>) {
  return <tr className={cn("transition-colors hover:bg-paper-100", className)} {...rest} />;
}

export type SortDirection = "ascending" | "descending" | "none";

type ThProps = ThHTMLAttributes<HTMLTableCellElement> & {
  /** Makes the header a sort control and shows the current direction ("none" = sortable, unsorted). */
  sort?: SortDirection;
  /** Client-side sorting: called when the header is pressed. */
  onSort?: () => void;
  /** Server-side sorting: a link to the same page with the sort in the query string. */
  sortHref?: string;
  numeric?: boolean;
};

/** A column header; with `sort` and `onSort` or `sortHref` it becomes a button or link. */
export function Th({
  sort,
  onSort,
  sortHref,
  numeric = false,
  scope = "col",
  className,
  children,
  ...rest
}: ThProps) {
  const label = (
    <>
      <span>{children}</span>
      {sort ? <SortIndicator direction={sort} /> : null}
    </>
  );
  const controlClasses = cn(
    "-mx-1.5 inline-flex items-center gap-1 rounded px-1.5 py-0.5 font-bold text-moss-900 no-underline",
    "hover:bg-paper-300 focus-visible:outline-3 focus-visible:outline-offset-1 focus-visible:outline-dusk-500",
    numeric && "flex-row-reverse",
  );

  let content: ReactNode = children;
  if (sort && sortHref) {
    content = (
      <Link href={sortHref} className={controlClasses}>
        {label}
      </Link>
    );
  } else if (sort && onSort) {
    content = (
      <button type="button" onClick={onSort} className={controlClasses}>
        {label}
      </button>
    );
  }

  return (
    <th
      scope={scope}
      aria-sort={sort && sort !== "none" ? sort : undefined}
      className={cn(
        "px-4 py-2.5 align-bottom text-sm font-bold whitespace-nowrap text-moss-900",
        numeric && "text-right",
        className,
      )}
      {...rest}
    >
      {content}
    </th>
  );
}

function SortIndicator({ direction }: { direction: SortDirection }) {
  // Both arrows faint when unsorted, one arrow solid when sorted: the state is also in aria-sort.
  return (
    <svg viewBox="0 0 12 16" aria-hidden="true" className="h-4 w-3 shrink-0">
      <path
        d="M6 2 10 7H2z"
        className={direction === "ascending" ? "fill-moss-800" : "fill-bark-300"}
      />
      <path
        d="M6 14 2 9h8z"
        className={direction === "descending" ? "fill-moss-800" : "fill-bark-300"}
      />
    </svg>
  );
}

type TdProps = TdHTMLAttributes<HTMLTableCellElement> & { numeric?: boolean };

export function Td({ numeric = false, className, ...rest }: TdProps) {
  return (
    <td
      className={cn(
        "px-4 py-3 align-top text-ink",
        numeric && "text-right tabular-nums",
        className,
      )}
      {...rest}
    />
  );
}

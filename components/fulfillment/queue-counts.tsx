"use client";

import Link from "next/link";
import { cn } from "@/components/ui/cn";
import { formatOrderNumber } from "@/lib/checkout/order-number";
import type { QueueSummary } from "@/lib/fulfillment/queries/queue";
import { OPEN_STATES, type QueueStateFilter } from "@/lib/fulfillment/queue-params";
import { ORDER_STATUS_LABELS } from "@/lib/orders/statuses";
import { formatStoreDate, formatWaiting } from "@/lib/fulfillment/store-time";

type Props = { summary: QueueSummary; now: Date; active: QueueStateFilter; onPick: (state: QueueStateFilter) => void };

/** How many orders wait in each open state (each a one-press filter), and the one waiting longest. */
export function QueueCounts({ summary, now, active, onPick }: Props) {
  const { oldest } = summary;
  return (
    <section aria-labelledby="queue-counts-heading" className="flex flex-col gap-4">
      <h2 id="queue-counts-heading" className="sr-only">
        Orders per state
      </h2>
      <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-5">
        {OPEN_STATES.map((state) => (
          <li key={state}>
            <button
              type="button"
              aria-pressed={active === state}
              onClick={() => onPick(active === state ? "open" : state)}
              className={cn(
                "flex h-full w-full flex-col items-start gap-1 rounded-xl border bg-paper-50 p-4 text-left shadow-card transition-colors",
                "hover:bg-moss-50 focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-dusk-500",
                active === state ? "border-moss-700 ring-2 ring-moss-700" : "border-paper-300",
              )}
            >
              <span className="font-display text-3xl font-semibold text-moss-900">{summary.counts[state]}</span>
              <span className="text-sm font-bold text-ink-soft">{ORDER_STATUS_LABELS[state].label}</span>
            </button>
          </li>
        ))}
      </ul>
      {oldest ? (
        <p className="rounded-xl border border-l-4 border-ember-200 border-l-ember-600 bg-ember-50 p-4 text-bark-900">
          <span className="font-bold">Waiting longest: </span>
          <Link href={`/fulfillment/orders/${oldest.id}`} className="font-bold">
            {formatOrderNumber(oldest.number)}
          </Link>{" "}
          for {oldest.name}, paid {formatStoreDate(oldest.paidAt)} ({formatWaiting({ since: oldest.paidAt, now })} ago),{" "}
          {ORDER_STATUS_LABELS[oldest.status].label.toLowerCase()}.
        </p>
      ) : (
        <p className="rounded-xl border border-moss-200 bg-moss-50 p-4 text-moss-900">Nothing is waiting at the packing bench.</p>
      )}
    </section>
  );
}

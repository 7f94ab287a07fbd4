import type { DetailEvent } from "@/lib/fulfillment/queries/order-detail";
import { ORDER_STATUS_LABELS, isFulfillmentState } from "@/lib/orders/statuses";
import { formatStoreDateTime } from "@/lib/fulfillment/store-time";

const label = (s: string | null) => (s && isFulfillmentState(s) ? ORDER_STATUS_LABELS[s].label : (s ?? "—"));

/** Every change to the order, newest first: who, when, from where to where, and why. */
export function HistoryList({ events }: { events: DetailEvent[] }) {
  return (
    <section aria-labelledby="history-heading" className="flex flex-col gap-3">
      <h2 id="history-heading" className="text-xl">
        History
      </h2>
      <ol className="flex flex-col gap-3 border-l-2 border-paper-300 pl-4">
        {[...events].reverse().map((e) => (
          <li key={e.id}>
            <p className="font-bold">
              {e.fromStatus === e.toStatus || !e.fromStatus ? label(e.toStatus) : `${label(e.fromStatus)} → ${label(e.toStatus)}`}
            </p>
            <p className="text-sm text-ink-soft">
              <time dateTime={e.createdAt.toISOString()}>{formatStoreDateTime(e.createdAt)}</time>
              {" · "}
              {e.actorName ?? "The store"}
            </p>
            {e.note ? <p className="text-sm [overflow-wrap:anywhere]">{e.note}</p> : null}
          </li>
        ))}
      </ol>
    </section>
  );
}

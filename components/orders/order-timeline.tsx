import { getBuyerTimeline } from "@/lib/fulfillment/queries/buyer-view";
import { formatStoreDateTime } from "@/lib/fulfillment/store-time";

/**
 * The order's story so far, in the store's words, newest last. Loads by order id only: render it
 * on a page that has already checked the visitor may see this order (getOrderForViewer).
 */
export async function OrderTimeline({ orderId }: { orderId: string }) {
  const view = await getBuyerTimeline({ orderId });
  if (!view || view.entries.length === 0) return null;
  const latest = view.entries.length - 1;
  return (
    <section aria-labelledby="timeline-heading" className="flex flex-col gap-3">
      <h2 id="timeline-heading" className="text-xl">
        Where your order is
      </h2>
      <ol className="flex flex-col gap-4 border-l-2 border-moss-200 pl-5">
        {view.entries.map((entry, index) => (
          <li key={`${entry.state}-${entry.at.toISOString()}-${index}`} className="relative" aria-current={index === latest ? "step" : undefined}>
            <span
              aria-hidden="true"
              className={`absolute top-1.5 -left-[1.72rem] size-3 rounded-full border-2 ${index === latest ? "border-moss-700 bg-moss-700" : "border-moss-400 bg-paper-50"}`}
            />
            <p className="font-bold">{entry.title}</p>
            <p className="text-sm text-ink-soft">
              <time dateTime={entry.at.toISOString()}>{formatStoreDateTime(entry.at)}</time>
            </p>
            {index === latest && entry.detail ? <p>{entry.detail}</p> : null}
          </li>
        ))}
      </ol>
    </section>
  );
}

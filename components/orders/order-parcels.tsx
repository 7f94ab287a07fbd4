import { getBuyerParcels } from "@/lib/fulfillment/queries/buyer-view";
import { formatStoreDate } from "@/lib/fulfillment/store-time";

/**
 * The buyer's boxes and their tracking links. Loads by order id only: render it on a page that
 * has already checked the visitor may see this order (getOrderForViewer). Renders nothing for a
 * gift-only order or an unknown id.
 */
export async function OrderParcels({ orderId }: { orderId: string }) {
  const view = await getBuyerParcels({ orderId });
  if (!view || view.method === "none") return null;

  if (view.method === "pickup") {
    const center = view.pickupAddress;
    return (
      <section aria-labelledby="parcels-heading" className="flex flex-col gap-2">
        <h2 id="parcels-heading" className="text-xl">
          Collecting your house
        </h2>
        <p>
          {view.status === "ready_for_pickup"
            ? "Your house is ready at the front desk."
            : view.status === "picked_up"
              ? "You have collected your house."
              : "We'll e-mail you as soon as your house is ready to collect."}
        </p>
        {center ? (
          <address className="not-italic text-ink-soft">
            {center.name}, {center.street}, {center.city}, {center.state} {center.zip} · {center.phone}
          </address>
        ) : null}
      </section>
    );
  }

  return (
    <section aria-labelledby="parcels-heading" className="flex flex-col gap-3">
      <h2 id="parcels-heading" className="text-xl">
        Boxes and tracking
      </h2>
      {view.boxes.length === 0 ? (
        <p className="text-ink-soft">
          Your houses haven&apos;t been boxed yet. Each box&apos;s tracking link appears here as soon as it leaves the center.
        </p>
      ) : (
        <ul className="flex flex-col gap-3">
          {view.boxes.map((box) => (
            <li key={box.id} className="rounded-xl border border-paper-300 bg-paper-50 p-4">
              <p className="font-bold">
                Box {box.position} of {view.boxes.length}: {box.description}
              </p>
              {box.trackingNumber ? (
                <>
                  <p className="text-sm text-ink-soft">
                    {box.carrierLabel}
                    {box.service ? ` ${box.service}` : ""}
                    {box.shippedAt ? `, sent ${formatStoreDate(box.shippedAt)}` : ""}
                  </p>
                  {box.trackingUrl ? (
                    <a href={box.trackingUrl} target="_blank" rel="noopener noreferrer" className="font-mono break-all">
                      Track {box.trackingNumber}
                      <span className="sr-only"> with {box.carrierLabel} (opens the carrier&apos;s site)</span>
                    </a>
                  ) : (
                    <p className="font-mono break-all">Tracking number {box.trackingNumber}</p>
                  )}
                </>
              ) : (
                <p className="text-sm text-ink-soft">Boxed and waiting for the carrier.</p>
              )}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

import { Card } from "@/components/ui/card";
import { formatUsd } from "@/lib/checkout/money";
import type { FulfillmentOrder } from "@/lib/fulfillment/queries/order-detail";
import { formatStoreDateTime } from "@/lib/fulfillment/store-time";

/** Who bought it, where it goes, when it was paid and what has been refunded. */
export function OrderFacts({ order }: { order: FulfillmentOrder["order"] }) {
  const ship = order.shipTo;
  return (
    <Card as="section" aria-labelledby="facts-heading">
      <h2 id="facts-heading" className="mb-3 text-xl">
        Buyer and destination
      </h2>
      <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-2">
        <div>
          <dt className="text-sm font-bold text-ink-soft">Buyer</dt>
          <dd>
            {order.name}
            <span className="block text-sm [overflow-wrap:anywhere]">{order.email}</span>
            {order.phone ? <span className="block text-sm">{order.phone}</span> : null}
          </dd>
        </div>
        <div>
          <dt className="text-sm font-bold text-ink-soft">{order.method === "pickup" ? "Collects at" : "Ship to"}</dt>
          <dd>
            {order.method === "pickup" || !ship ? (
              "The center's front desk (local pickup)"
            ) : (
              <address className="not-italic">
                {ship.name}
                <br />
                {ship.line1}
                {ship.line2 ? (
                  <>
                    <br />
                    {ship.line2}
                  </>
                ) : null}
                <br />
                {ship.city}, {ship.state} {ship.zip}
              </address>
            )}
          </dd>
        </div>
        <div>
          <dt className="text-sm font-bold text-ink-soft">Paid</dt>
          <dd>{order.paidAt ? formatStoreDateTime(order.paidAt) : "—"}</dd>
        </div>
        <div>
          <dt className="text-sm font-bold text-ink-soft">Total</dt>
          <dd>
            {formatUsd(order.totalCents)}
            {order.refundedCents > 0 ? <span className="block text-sm text-berry-800">{formatUsd(order.refundedCents)} refunded</span> : null}
          </dd>
        </div>
      </dl>
    </Card>
  );
}

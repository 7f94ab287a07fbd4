import { formatUsd } from "@/lib/checkout/money";

export type SummaryAmounts = {
  subtotalCents: number;
  shippingCents: number | null;
  taxCents: number;
  giftCents: number;
  totalCents: number;
  refundedCents?: number;
};

/** The money lines of a cart, checkout or order, all computed on the server. */
export function OrderSummary({ amounts, method }: { amounts: SummaryAmounts; method: string }) {
  const rows: [string, string][] = [];
  if (amounts.subtotalCents > 0) rows.push(["Houses", formatUsd(amounts.subtotalCents)]);
  if (amounts.subtotalCents > 0)
    rows.push([method === "pickup" ? "Local pickup" : "Shipping", amounts.shippingCents === null ? "After you enter the address" : formatUsd(amounts.shippingCents)]);
  if (amounts.subtotalCents > 0) rows.push(["Sales tax", formatUsd(amounts.taxCents)]);
  if (amounts.giftCents > 0) rows.push(["Conservation gift", formatUsd(amounts.giftCents)]);
  return (
    <dl className="flex flex-col gap-2" data-testid="order-summary">
      {rows.map(([label, value]) => (
        <div key={label} className="flex justify-between gap-4">
          <dt className="text-ink-soft">{label}</dt>
          <dd>{value}</dd>
        </div>
      ))}
      <div className="mt-2 flex justify-between gap-4 border-t border-paper-300 pt-3 text-lg font-bold">
        <dt>Total</dt>
        <dd data-testid="order-total">{formatUsd(amounts.totalCents)}</dd>
      </div>
      {amounts.refundedCents ? (
        <div className="flex justify-between gap-4 text-berry-800">
          <dt>Refunded</dt>
          <dd>−{formatUsd(amounts.refundedCents)}</dd>
        </div>
      ) : null}
    </dl>
  );
}

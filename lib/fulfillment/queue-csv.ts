import { formatOrderNumber } from "@/lib/checkout/order-number";
import { toCsv } from "./csv";
import { ORDER_STATUS_LABELS, isFulfillmentState } from "@/lib/orders/statuses";
import { formatStoreDateTime } from "./store-time";

// The queue as a spreadsheet: the columns a volunteer prints or hands to the carrier's pickup.

type ExportRow = {
  number: number;
  name: string;
  email: string;
  status: string;
  method: "parcel" | "pickup";
  paidAt: string | null;
  houses: number;
  boxes: number;
  boxesShipped: number;
  shipTo: { city: string; state: string; zip: string } | null;
};

export const QUEUE_CSV_HEADER = [
  "Order",
  "Buyer",
  "E-mail",
  "State",
  "How it goes",
  "Paid (Pacific time)",
  "Houses",
  "Boxes",
  "Boxes with tracking",
  "City",
  "State/ZIP",
] as const;

export function queueToCsv(rows: readonly ExportRow[]): string {
  return toCsv({
    header: QUEUE_CSV_HEADER,
    rows: rows.map((r) => [
      formatOrderNumber(r.number),
      r.name,
      r.email,
      isFulfillmentState(r.status) ? ORDER_STATUS_LABELS[r.status].label : r.status,
      r.method === "pickup" ? "Local pickup" : "Parcel",
      r.paidAt ? formatStoreDateTime(r.paidAt) : "",
      r.houses,
      r.boxes,
      r.boxesShipped,
      r.shipTo?.city ?? "",
      r.shipTo ? `${r.shipTo.state} ${r.shipTo.zip}` : "",
    ]),
  });
}

/** A file name that says which day's view it is. */
export function queueCsvFileName(now: Date): string {
  return `shipping-desk-${now.toISOString().slice(0, 10)}.csv`;
}

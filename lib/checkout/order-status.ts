import type { OrderRow } from "@/db/schema";
import { FULFILLMENT_STATE_LABELS, isFulfillmentState } from "@/lib/fulfillment/states";

type Status = OrderRow["status"];

/** Our words for every order status, for badges, timelines and e-mails. */
export function statusWords(status: Status): { label: string; buyerNote: string } {
  if (status === "expired") {
    return { label: "Checkout expired", buyerNote: "The 30-minute hold ran out before payment; nothing was charged." };
  }
  if (isFulfillmentState(status)) return FULFILLMENT_STATE_LABELS[status];
  return { label: status, buyerNote: "" };
}

export function statusTone(status: Status): "neutral" | "good" | "fair" | "poor" | "info" | "warn" {
  switch (status) {
    case "pending_payment":
      return "warn";
    case "expired":
    case "cancelled":
    case "refunded":
      return "neutral";
    case "delivered":
    case "picked_up":
      return "good";
    default:
      return "info";
  }
}

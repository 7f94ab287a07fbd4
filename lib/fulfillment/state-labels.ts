// The store's own words for each fulfillment state: `label` for badges and queues, `buyerNote`
// for the buyer's order page. Common practice, no source; wording is ours.

export const FULFILLMENT_STATES = [
  "pending_payment",
  "paid",
  "packing",
  "packed",
  "shipped",
  "delivered",
  "ready_for_pickup",
  "picked_up",
  "cancelled",
  "refunded",
] as const;
export type FulfillmentState = (typeof FULFILLMENT_STATES)[number];

export const FULFILLMENT_STATE_LABELS: Record<
  FulfillmentState,
  { label: string; buyerNote: string }
> = {
  pending_payment: {
    label: "Awaiting payment",
    buyerNote: "We're waiting for your payment to go through.",
  },
  paid: {
    label: "In the workshop queue",
    buyerNote: "Paid, thank you. Your house is waiting for a volunteer to pack it.",
  },
  packing: {
    label: "On the packing bench",
    buyerNote: "A volunteer is checking and packing your house now.",
  },
  packed: {
    label: "Boxed and weighed",
    buyerNote: "Your house is boxed and waiting for the carrier.",
  },
  shipped: {
    label: "With the carrier",
    buyerNote: "Every box in your order is on its way; follow it with the tracking links.",
  },
  delivered: {
    label: "Arrived",
    buyerNote: "The carrier reports your house delivered. Your install guide is ready.",
  },
  ready_for_pickup: {
    label: "Waiting at the center",
    buyerNote: "Your house is ready to collect at the center's front desk.",
  },
  picked_up: {
    label: "Collected",
    buyerNote: "You've collected your house. Your install guide is ready.",
  },
  cancelled: {
    label: "Cancelled",
    buyerNote: "This order was cancelled.",
  },
  refunded: {
    label: "Refunded",
    buyerNote: "This order was refunded to your original payment method.",
  },
};

export function isFulfillmentState(value: unknown): value is FulfillmentState {
  return typeof value === "string" && (FULFILLMENT_STATES as readonly string[]).includes(value);
}

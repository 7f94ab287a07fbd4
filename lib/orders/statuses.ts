import { ORDER_STATUSES } from "@/db/order-statuses";
import type { Rating } from "@/lib/shared/rating";

// The order statuses, their subsets and the store's own words for each. The list itself is
// db/order-statuses.ts (the database enum is built from it); everything here is derived from
// it, so adding a status is one edit there plus its words below (the Record makes it required).
// Wording is ours; common practice, no source.

export { ORDER_STATUSES };
export type OrderStatus = (typeof ORDER_STATUSES)[number];

export function isOrderStatus(value: unknown): value is OrderStatus {
  return typeof value === "string" && (ORDER_STATUSES as readonly string[]).includes(value);
}

function without<const E extends OrderStatus>(left: readonly E[]): readonly Exclude<OrderStatus, E>[] {
  return ORDER_STATUSES.filter((s): s is Exclude<OrderStatus, E> => !(left as readonly string[]).includes(s));
}

/** An order that never took a payment: still waiting for it, or closed when the 30-minute hold ran out. */
export const UNPAID_STATUSES = ["pending_payment", "expired"] as const satisfies readonly OrderStatus[];

/** Every status the state machine moves an order through once checkout has started (all but a lapsed checkout). */
export const FULFILLMENT_STATES = without(["expired"]);
export type FulfillmentState = (typeof FULFILLMENT_STATES)[number];

/** Every status a paid order can be in: what the shipping desk's queue can show. */
export const PAID_STATES = without(UNPAID_STATUSES);
export type PaidState = (typeof PAID_STATES)[number];

export function isFulfillmentState(value: unknown): value is FulfillmentState {
  return typeof value === "string" && (FULFILLMENT_STATES as readonly string[]).includes(value);
}

/** `label` for badges, queues and the buyer's timeline; `buyerNote` for the buyer's order page. */
export const ORDER_STATUS_LABELS: Record<OrderStatus, { label: string; buyerNote: string }> = {
  pending_payment: {
    label: "At the till",
    buyerNote: "Your payment is still going through; this page updates when it does.",
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
    buyerNote: "Every box in your order has left the workshop; follow it with the tracking links.",
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
    label: "Handed over",
    buyerNote: "You've taken your house home. Your install guide is ready.",
  },
  cancelled: {
    label: "Cancelled",
    buyerNote: "This order was cancelled.",
  },
  expired: {
    label: "Hold ran out",
    buyerNote: "The 30-minute hold ran out before the payment arrived, so the order was closed; a late payment is refunded.",
  },
  refunded: {
    label: "Refunded",
    buyerNote: "This order was refunded to your original payment method.",
  },
};

/** The label of any status string, or the string itself when it is not one of ours. */
export function statusLabel(status: string): string {
  return isOrderStatus(status) ? ORDER_STATUS_LABELS[status].label : status;
}

/** Our words for every order status, for badges, timelines and e-mails. */
export function statusWords(status: OrderStatus): { label: string; buyerNote: string } {
  return ORDER_STATUS_LABELS[status];
}

export type StatusTone = Rating | "neutral" | "info" | "warn";

export function statusTone(status: OrderStatus): StatusTone {
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

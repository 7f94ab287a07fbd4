// Every status an order can have, in workflow order: the database enum is built from this tuple
// (db/schema.ts), so the enum sorts in this order and the shipping queue's "status" sort relies
// on it. lib/orders/statuses.ts derives every subset and label from it; db/ imports nothing of
// lib/, so the one list lives here.
export const ORDER_STATUSES = [
  "pending_payment",
  "paid",
  "packing",
  "packed",
  "shipped",
  "delivered",
  "ready_for_pickup",
  "picked_up",
  "cancelled",
  "expired",
  "refunded",
] as const;

import { formatOrderNumber } from "@/lib/checkout/order-number";
import type { FulfillmentState } from "./state-labels";

// The e-mails a state change causes. One message per cause (the dedupe key), so an admin's
// correction followed by the same step again never mails the buyer twice. Templates: emails/.

export type FulfillmentMessage = {
  dedupeKey: string;
  kind: "shipped" | "delivered" | "install-guide" | "ready-for-pickup";
  to: string;
  subject: string;
  payload: Record<string, unknown>;
};

type OrderForMail = { id: string; number: number; email: string };

/** The messages to queue when an order reaches `to` by moving forward; corrections queue none. */
export function messagesForArrival({ order, to }: { order: OrderForMail; to: FulfillmentState }): FulfillmentMessage[] {
  const number = formatOrderNumber(order.number);
  const base = { to: order.email, payload: { orderId: order.id } };
  switch (to) {
    case "shipped":
      return [{ ...base, kind: "shipped", dedupeKey: `shipped:${order.id}`, subject: `Your order ${number} is on its way` }];
    case "delivered":
      return [
        { ...base, kind: "delivered", dedupeKey: `delivered:${order.id}`, subject: `Your order ${number} has arrived` },
        {
          ...base,
          kind: "install-guide",
          dedupeKey: `install-guide:delivered:${order.id}`,
          subject: `Time to put your house up: the install guide for ${number}`,
          payload: { orderId: order.id, occasion: "delivered" },
        },
      ];
    case "ready_for_pickup":
      return [
        {
          ...base,
          kind: "ready-for-pickup",
          dedupeKey: `ready-for-pickup:${order.id}`,
          subject: `Your order ${number} is ready to collect`,
        },
      ];
    default:
      return [];
  }
}

import { formatOrderNumber } from "@/lib/checkout/order-number";
import type { OutboxMessageInput } from "@/lib/mail/payloads";
import type { TransitionKind } from "./state-machine";
import type { OrderStatus } from "./statuses";

// The e-mails a status change causes, queued by changeOrderStatus (lib/orders/commands.ts) in the
// transaction of the change. One message per cause (the dedupe key), so an admin's correction
// followed by the same step again never mails the buyer twice. Templates: emails/. Messages about
// money going back (refund, payment-refunded) are caused by the refund, not by a status, and are
// queued when the payment service confirms it (lib/checkout/commands/refunds.ts).

export type OrderMessage = OutboxMessageInput;

type OrderForMail = { id: string; number: number; email: string; method: string; giftCents: number };

/** The center's name as its settings give it (organization.display_name); the mail says "us" without one. */
type Center = { centerName?: string | null };

function paidMessages(order: OrderForMail, { centerName }: Center = {}): OrderMessage[] {
  const number = formatOrderNumber(order.number);
  const hasItems = order.method !== "none";
  const messages: OrderMessage[] = [
    {
      dedupeKey: `order-confirmation:${order.id}`,
      kind: "order-confirmation",
      to: order.email,
      subject: hasItems ? `Order ${number} is in the workshop queue` : `Thank you for your gift (${number})`,
      payload: { orderId: order.id },
    },
  ];
  if (hasItems) {
    messages.push({
      dedupeKey: `install-guide:paid:${order.id}`,
      kind: "install-guide",
      to: order.email,
      subject: `Your install guide for order ${number}`,
      payload: { orderId: order.id, occasion: "paid" },
    });
  }
  if (order.giftCents > 0) {
    messages.push({
      dedupeKey: `gift-receipt:${order.id}`,
      kind: "gift-receipt",
      to: order.email,
      subject: centerName ? `Your gift receipt from ${centerName} (${number})` : `Your gift receipt (${number})`,
      payload: { orderId: order.id },
    });
  }
  return messages;
}

/** The messages to queue when an order reaches `to` by moving forward; corrections queue none. */
export function messagesForArrival({ order, to, centerName }: { order: OrderForMail; to: OrderStatus } & Center): OrderMessage[] {
  const number = formatOrderNumber(order.number);
  const base = { to: order.email, payload: { orderId: order.id } };
  switch (to) {
    case "paid":
      return paidMessages(order, { centerName });
    case "shipped":
      return [{ ...base, kind: "shipped", dedupeKey: `shipped:${order.id}`, subject: `Order ${number} is with the carrier` }];
    case "delivered":
      return [
        { ...base, kind: "delivered", dedupeKey: `delivered:${order.id}`, subject: `Order ${number} is at your door` },
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
          subject: `Order ${number} is waiting at the center`,
        },
      ];
    default:
      return [];
  }
}

/** The messages one change causes: only a step forward mails the buyer. */
export function messagesForChange({
  order,
  to,
  kind,
  centerName,
}: {
  order: OrderForMail;
  to: OrderStatus;
  kind: TransitionKind;
} & Center): OrderMessage[] {
  return kind === "advance" ? messagesForArrival({ order, to, centerName }) : [];
}

import "server-only";
import { eq } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { orders, type OrderRow, type RefundRow } from "@/db/schema";
import { releaseLines } from "@/lib/checkout/commands/orders";
import { requestRefund, settleRefund } from "@/lib/checkout/commands/refunds";
import { AppError } from "@/lib/http/errors";
import { withOutbox } from "@/lib/mail/commands/outbox";
import { changeOrderStatus, checkOrderVersion, recordOrderEvent } from "@/lib/orders/commands";
import { refusalError } from "@/lib/orders/refusals";
import { canTransition } from "@/lib/orders/state-machine";
import { statusLabel } from "@/lib/orders/statuses";
import { isUuid } from "../ids";
import type { Actor } from "./transitions";

// The admin's money buttons on the order page. One transaction decides: the state machine says
// whether the order may be cancelled or refunded from where it is, the status changes through
// changeOrderStatus, the houses go back through the stock ledger, and the refund is written as
// requested (lib/checkout/commands/refunds.ts). Only after that commits is the payment service
// called; if it cannot be reached, the refund stays requested and the sweeper sends it.

// States whose houses have not left the building: their stock may go back on the shelf.
const UNSHIPPED = new Set(["paid", "packing", "packed", "ready_for_pickup"]);
const SHIPPED = new Set(["shipped", "delivered", "picked_up"]);

export type RefundDecision = { order: OrderRow; refund: RefundRow };

async function loadChecked(tx: Tx, { orderId, version }: { orderId: string; version: number }): Promise<OrderRow> {
  const [order] = isUuid(orderId) ? await tx.select().from(orders).where(eq(orders.id, orderId)).limit(1) : [];
  if (!order || order.method === "none" || order.status === "expired") {
    throw new AppError("not_found", "No paid order with that id is waiting at the shipping desk.");
  }
  checkOrderVersion(order, version);
  return order;
}

function amountToRefund(order: OrderRow, amountCents: number | undefined): { amount: number; remaining: number } {
  if (!order.paymentIntentId || !order.paidAt) {
    throw new AppError("conflict", "This order was never paid, so there is nothing to refund.");
  }
  const remaining = order.totalCents - order.refundedCents;
  const amount = amountCents ?? remaining;
  if (remaining <= 0) throw new AppError("conflict", "This order has already been refunded in full.");
  if (!Number.isInteger(amount) || amount < 1 || amount > remaining) {
    throw new AppError("bad_request", `Refund between $0.01 and ${(remaining / 100).toFixed(2)}.`, { amountCents: "Out of range." });
  }
  return { amount, remaining };
}

const dollars = (cents: number) => `$${(cents / 100).toFixed(2)}`;

/** The deciding transaction of a cancel; exported so a test can stop right after it commits. */
export async function decideCancel({ orderId, version, reason, actor }: { orderId: string; version: number; reason: string; actor: Actor }): Promise<RefundDecision> {
  return withOutbox(async (tx) => {
    const order = await loadChecked(tx, { orderId, version });
    const check = canTransition({ from: order.status, to: "cancelled", method: order.method, role: actor.role, reason });
    if (!check.ok) throw refusalError(check);
    const { amount } = amountToRefund(order, undefined);
    if (!UNSHIPPED.has(order.status)) throw new AppError("conflict", "Only an order that has not shipped or been picked up can be cancelled.");
    const { order: cancelled } = await changeOrderStatus(tx, {
      order,
      to: "cancelled",
      actor,
      expectedVersion: version,
      reason,
      note: `Cancelled and refunded ${dollars(amount)}${reason ? `: ${reason}` : ""}`,
      kinds: ["cancel"],
      set: { refundedCents: order.refundedCents + amount },
    });
    await releaseLines(tx, order.id, "Order cancelled", actor.id);
    const refund = await requestRefund(tx, {
      order,
      paymentIntentId: order.paymentIntentId!,
      amountCents: amount,
      cause: "cancel",
      reason,
      actorId: actor.id,
      restocked: true,
    });
    return { order: cancelled, refund };
  });
}

/** The deciding transaction of a refund after shipping; exported so a test can stop right after it commits. */
export async function decideShippedRefund({
  orderId,
  version,
  amountCents,
  reason,
  actor,
}: {
  orderId: string;
  version: number;
  amountCents?: number;
  reason: string;
  actor: Actor;
}): Promise<RefundDecision> {
  return withOutbox(async (tx) => {
    const order = await loadChecked(tx, { orderId, version });
    if (!SHIPPED.has(order.status)) {
      throw new AppError(
        "conflict",
        `Only an order that has shipped or been collected is refunded here; this one is "${statusLabel(order.status)}". Cancel it instead.`,
      );
    }
    // The state machine decides who may refund a shipped order; the order keeps its status (the
    // houses are with the buyer), and the refund shows on it.
    const check = canTransition({ from: order.status, to: "refunded", method: order.method, role: actor.role, reason });
    if (!check.ok) throw refusalError(check);
    const { amount } = amountToRefund(order, amountCents);
    const updated = await recordOrderEvent(tx, {
      order,
      actor,
      expectedVersion: version,
      note: `Refunded ${dollars(amount)}${reason ? `: ${reason}` : ""}`,
      set: { refundedCents: order.refundedCents + amount },
    });
    const refund = await requestRefund(tx, {
      order,
      paymentIntentId: order.paymentIntentId!,
      amountCents: amount,
      cause: "refund",
      reason,
      actorId: actor.id,
    });
    return { order: updated, refund };
  });
}

/** Cancels an order that has not left the center: full refund, houses back in stock. */
export async function cancelOrder(input: { orderId: string; version: number; reason: string; actor: Actor }): Promise<OrderRow> {
  const decided = await decideCancel(input);
  await settleRefund({ id: decided.refund.id });
  return decided.order;
}

/** Refunds all or part of an order that has shipped or been collected; the houses stay with the buyer. */
export async function refundShippedOrder(input: {
  orderId: string;
  version: number;
  amountCents?: number;
  reason: string;
  actor: Actor;
}): Promise<OrderRow> {
  const decided = await decideShippedRefund(input);
  await settleRefund({ id: decided.refund.id });
  return decided.order;
}

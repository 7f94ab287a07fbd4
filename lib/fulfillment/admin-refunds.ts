import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { orders } from "@/db/schema";
import { refundOrder } from "@/lib/checkout/refunds";
import { AppError } from "@/lib/http/errors";
import { isUuid } from "./ids";
import { refusalError, staleVersionError } from "./refusals";
import { canTransition, FULFILLMENT_STATE_LABELS, isFulfillmentState } from "./states";
import type { Actor } from "./transitions";

// The admin's money buttons on the order page. The state machine says whether the order may be
// cancelled or refunded from where it is; refundOrder (lib/checkout/refunds.ts) moves the money
// through the payments SDK, the stock through the ledger, and records both.

async function loadChecked({ orderId, version }: { orderId: string; version: number }) {
  const db = await getDb();
  const [order] = isUuid(orderId) ? await db.select().from(orders).where(eq(orders.id, orderId)).limit(1) : [];
  if (!order || order.method === "none" || !isFulfillmentState(order.status)) {
    throw new AppError("not_found", "No paid order with that id is waiting at the shipping desk.");
  }
  // A first look, so a stale screen is told so before any money moves; refundOrder's own
  // conditional update catches a change in the moment between.
  if (order.version !== version) throw staleVersionError(FULFILLMENT_STATE_LABELS[order.status].label);
  return { ...order, status: order.status, method: order.method };
}

/** Cancels an order that has not left the center: full refund, houses back in stock. */
export async function cancelOrder({ orderId, version, reason, actor }: { orderId: string; version: number; reason: string; actor: Actor }) {
  const order = await loadChecked({ orderId, version });
  const check = canTransition({ from: order.status, to: "cancelled", method: order.method, role: actor.role, reason });
  if (!check.ok) throw refusalError(check);
  return refundOrder({ orderId, restock: true, reason, actorId: actor.id, cancel: true });
}

/** Refunds all or part of an order that has shipped or been collected; the houses stay with the buyer. */
export async function refundShippedOrder({
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
}) {
  const order = await loadChecked({ orderId, version });
  if (!["shipped", "delivered", "picked_up"].includes(order.status)) {
    throw new AppError(
      "conflict",
      `Only an order that has shipped or been collected is refunded here; this one is "${FULFILLMENT_STATE_LABELS[order.status].label}". Cancel it instead.`,
    );
  }
  const check = canTransition({ from: order.status, to: "refunded", method: order.method, role: actor.role, reason });
  if (!check.ok) throw refusalError(check);
  return refundOrder({ orderId, amountCents, restock: false, reason, actorId: actor.id });
}

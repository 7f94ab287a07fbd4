import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { getDb, type Tx } from "@/db/client";
import { orderEvents, orders, parcels, type OrderRow, type ParcelRow } from "@/db/schema";
import type { Role } from "@/lib/auth/roles";
import { billableWeightLb } from "@/lib/checkout/billable-weight";
import { AppError } from "@/lib/http/errors";
import { kickMailSender } from "@/lib/mail/kick";
import { enqueueEmail } from "@/lib/mail/outbox";
import { isUuid } from "./ids";
import { messagesForArrival } from "./messages";
import { refusalError, staleVersionError } from "./refusals";
import type { Box } from "./schemas";
import { canTransition, FULFILLMENT_STATE_LABELS, isFulfillmentState, type FulfillmentState } from "./states";
import { CARRIER_LABELS, validateTrackingNumber, type Carrier } from "./tracking";

// Every change the shipping desk makes to an order. Each runs in one transaction that
// 1. reads the order and compares its version with the one the volunteer saw (stale → 409),
// 2. asks the state machine (canTransition) whether this role may make this move,
// 3. bumps the version with a conditional UPDATE … WHERE version = seen, so that of two
//    volunteers acting at once exactly one wins, on PGlite (one connection, serialized) and on a
//    PostgreSQL server (the second UPDATE waits for the first and then matches no row),
// 4. records who and when in order_events and queues the buyer's e-mail in the same commit.

export type Actor = { id: string; role: Role };
type ShippableOrder = OrderRow & { status: FulfillmentState; method: "parcel" | "pickup" };

function labelOf(status: string): string {
  return isFulfillmentState(status) ? FULFILLMENT_STATE_LABELS[status].label : status;
}

async function loadForChange(tx: Tx, { orderId, version }: { orderId: string; version: number }): Promise<ShippableOrder> {
  const [order] = isUuid(orderId) ? await tx.select().from(orders).where(eq(orders.id, orderId)).limit(1) : [];
  if (!order || order.method === "none" || !isFulfillmentState(order.status) || order.status === "pending_payment") {
    throw new AppError("not_found", "No paid order with that id is waiting at the shipping desk.");
  }
  if (order.version !== version) throw staleVersionError(labelOf(order.status));
  return order as ShippableOrder;
}

async function countBoxes(tx: Tx, orderId: string): Promise<{ total: number; tracked: number }> {
  const [row] = await tx
    .select({
      total: sql<number>`count(*)::int`,
      tracked: sql<number>`count(${parcels.trackingNumber})::int`,
    })
    .from(parcels)
    .where(eq(parcels.orderId, orderId));
  return { total: Number(row?.total ?? 0), tracked: Number(row?.tracked ?? 0) };
}

/** The claim: only the writer holding the version it read gets a row back. */
async function bumpVersion(tx: Tx, order: ShippableOrder, status: FulfillmentState = order.status): Promise<OrderRow> {
  const [updated] = await tx
    .update(orders)
    .set({ status, version: order.version + 1 })
    .where(and(eq(orders.id, order.id), eq(orders.version, order.version)))
    .returning();
  if (!updated) {
    // Another writer won the row between our read and this update (on a PostgreSQL server the
    // update waited for it): say what the order is now, not what it was when we read it.
    const [current] = await tx.select({ status: orders.status }).from(orders).where(eq(orders.id, order.id));
    throw staleVersionError(labelOf(current?.status ?? order.status));
  }
  return updated;
}

async function moveTo(
  tx: Tx,
  { order, to, kind, actor, note }: { order: ShippableOrder; to: FulfillmentState; kind: string; actor: Actor; note: string },
): Promise<OrderRow> {
  const updated = await bumpVersion(tx, order, to);
  await tx.insert(orderEvents).values({ orderId: order.id, fromStatus: order.status, toStatus: to, actorId: actor.id, note });
  if (kind === "advance") {
    for (const message of messagesForArrival({ order, to })) await enqueueEmail(tx, message);
  }
  return updated;
}

async function inTransaction<T>(work: (tx: Tx) => Promise<T>): Promise<T> {
  const db = await getDb();
  const result = await db.transaction(work);
  kickMailSender();
  return result;
}

const STEP_NOTES: Partial<Record<FulfillmentState, string>> = {
  packing: "Started packing",
  packed: "Boxed and weighed",
  shipped: "Marked shipped",
  delivered: "Marked delivered",
  ready_for_pickup: "Ready at the front desk",
  picked_up: "Collected by the buyer",
};

/**
 * One step forward (start packing, ready for pickup, picked up, delivered, shipped once every box
 * has tracking) or an admin's correction one step back with a reason. Cancelling and refunding
 * move money, so they go through cancelOrder / refundShippedOrder instead.
 */
export async function transitionOrder({
  orderId,
  version,
  to,
  reason,
  actor,
}: {
  orderId: string;
  version: number;
  to: FulfillmentState;
  reason?: string;
  actor: Actor;
}): Promise<OrderRow> {
  return inTransaction(async (tx) => {
    const order = await loadForChange(tx, { orderId, version });
    const boxes = await countBoxes(tx, order.id);
    const check = canTransition({ from: order.status, to, method: order.method, role: actor.role, reason, parcels: boxes });
    if (!check.ok) throw refusalError(check);
    if (check.kind === "cancel" || check.kind === "refund") {
      throw new AppError("bad_request", "Cancelling and refunding go through the refund buttons, so the payment is returned too.");
    }
    const note = check.kind === "correction" ? `Correction: ${reason?.trim() ?? ""}` : (STEP_NOTES[to] ?? "");
    return moveTo(tx, { order, to, kind: check.kind, actor, note });
  });
}

function totalBillable(boxes: readonly Box[]): number {
  return boxes.reduce((sum, box) => sum + billableWeightLb(box).billableLb, 0);
}

/** Records the boxes (billable weight computed here, never taken from the client) and marks the order packed. */
export async function packOrder({
  orderId,
  version,
  boxes,
  actor,
}: {
  orderId: string;
  version: number;
  boxes: readonly Box[];
  actor: Actor;
}): Promise<OrderRow> {
  return inTransaction(async (tx) => {
    const order = await loadForChange(tx, { orderId, version });
    const check = canTransition({
      from: order.status,
      to: "packed",
      method: order.method,
      role: actor.role,
      parcels: { total: boxes.length, tracked: 0 },
    });
    if (!check.ok) throw refusalError(check);
    // Re-packing after a correction replaces the boxes: new boxes get new labels.
    await tx.delete(parcels).where(eq(parcels.orderId, order.id));
    const start = Date.now();
    await tx.insert(parcels).values(
      boxes.map((box, index) => ({
        orderId: order.id,
        description: box.description,
        lengthIn: box.lengthIn,
        widthIn: box.widthIn,
        heightIn: box.heightIn,
        weightLb: box.weightLb,
        billableLb: billableWeightLb(box).billableLb,
        // Distinct times keep the boxes in the order they were typed (box 1, box 2, …).
        createdAt: new Date(start + index),
      })),
    );
    const count = boxes.length === 1 ? "1 box" : `${boxes.length} boxes`;
    return moveTo(tx, { order, to: "packed", kind: check.kind, actor, note: `Packed ${count}, ${totalBillable(boxes)} lb billable in all` });
  });
}

export type ShipBoxResult = { order: OrderRow; box: ParcelRow; orderShipped: boolean };

/**
 * Hands one box to a carrier. The order becomes shipped, and the buyer is mailed, when the last
 * box gets its tracking number; until then each box's link already shows on the buyer's page.
 */
export async function shipBox({
  orderId,
  parcelId,
  version,
  carrier,
  service,
  trackingNumber,
  actor,
}: {
  orderId: string;
  parcelId: string;
  version: number;
  carrier: Carrier;
  service: string;
  trackingNumber: string;
  actor: Actor;
}): Promise<ShipBoxResult> {
  const tracking = validateTrackingNumber({ carrier, number: trackingNumber });
  if (!tracking.ok) throw new AppError("bad_request", tracking.message, { trackingNumber: tracking.message });
  return inTransaction(async (tx) => {
    const order = await loadForChange(tx, { orderId, version });
    if (order.status !== "packed") {
      throw new AppError(
        "conflict",
        `Boxes go to the carrier once the order is "${labelOf("packed")}"; this one is "${labelOf(order.status)}".`,
      );
    }
    const all = await tx.select().from(parcels).where(eq(parcels.orderId, order.id));
    const box = all.find((p) => p.id === parcelId);
    if (!box) throw new AppError("not_found", "That box is not part of this order.");
    const twin = all.find((p) => p.id !== parcelId && p.trackingNumber === tracking.normalized);
    if (twin) {
      const message = `Each box needs its own tracking number; "${twin.description}" already has this one.`;
      throw new AppError("bad_request", message, { trackingNumber: message });
    }
    const [updated] = await tx
      .update(parcels)
      .set({ carrier, service: service.trim(), trackingNumber: tracking.normalized, shippedAt: new Date() })
      .where(eq(parcels.id, parcelId))
      .returning();
    const boxes = await countBoxes(tx, order.id);
    const position = all.sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime()).findIndex((p) => p.id === parcelId) + 1;
    const note = `Box ${position} of ${boxes.total} handed to ${CARRIER_LABELS[carrier]} (${tracking.normalized})`;
    if (boxes.tracked === boxes.total) {
      const check = canTransition({ from: order.status, to: "shipped", method: order.method, role: actor.role, parcels: boxes });
      if (!check.ok) throw refusalError(check);
      const shipped = await moveTo(tx, { order, to: "shipped", kind: check.kind, actor, note: `${note}; every box is on its way` });
      return { order: shipped, box: updated!, orderShipped: true };
    }
    const stillPacked = await bumpVersion(tx, order);
    await tx.insert(orderEvents).values({ orderId: order.id, fromStatus: order.status, toStatus: order.status, actorId: actor.id, note });
    return { order: stillPacked, box: updated!, orderShipped: false };
  });
}

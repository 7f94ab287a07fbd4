import "server-only";
import { eq } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { orders, parcels, type OrderRow, type ParcelRow } from "@/db/schema";
import type { Role } from "@/lib/auth/roles";
import { billableWeightLb } from "@/lib/checkout/billable-weight";
import { AppError } from "@/lib/http/errors";
import { withOutbox } from "@/lib/mail/commands/outbox";
import { changeOrderStatus, checkOrderVersion, recordOrderEvent } from "@/lib/orders/commands";
import { statusLabel, type FulfillmentState } from "@/lib/orders/statuses";
import { isUuid } from "../ids";
import type { Box } from "../schemas";
import { CARRIER_LABELS, validateTrackingNumber, type Carrier } from "../tracking";

// Every change the shipping desk makes to an order. Each runs in one transaction that reads the
// order and hands the change to changeOrderStatus (lib/orders/commands.ts), which checks the
// version the volunteer saw and the state machine, bumps the version, records who and when, and
// queues the buyer's e-mail in the same commit.

export type Actor = { id: string; role: Role };

async function loadForChange(tx: Tx, { orderId, version }: { orderId: string; version: number }): Promise<OrderRow> {
  const [order] = isUuid(orderId) ? await tx.select().from(orders).where(eq(orders.id, orderId)).limit(1) : [];
  if (!order || order.method === "none" || order.status === "pending_payment" || order.status === "expired") {
    throw new AppError("not_found", "No paid order with that id is waiting at the shipping desk.");
  }
  checkOrderVersion(order, version);
  return order;
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
  return withOutbox(async (tx) => {
    const order = await loadForChange(tx, { orderId, version });
    const { order: updated } = await changeOrderStatus(tx, {
      order,
      to,
      actor,
      expectedVersion: version,
      reason,
      note: (kind) => (kind === "correction" ? `Correction: ${reason?.trim() ?? ""}` : (STEP_NOTES[to] ?? "")),
      kinds: ["advance", "correction"],
    });
    return updated;
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
  return withOutbox(async (tx) => {
    const order = await loadForChange(tx, { orderId, version });
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
    // The state machine counts the boxes just recorded; a refusal rolls them back with the rest.
    const count = boxes.length === 1 ? "1 box" : `${boxes.length} boxes`;
    const note = `Packed ${count}, ${totalBillable(boxes)} lb billable in all`;
    const { order: packed } = await changeOrderStatus(tx, { order, to: "packed", actor, expectedVersion: version, note, kinds: ["advance"] });
    return packed;
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
  return withOutbox(async (tx) => {
    const order = await loadForChange(tx, { orderId, version });
    if (order.status !== "packed") {
      throw new AppError(
        "conflict",
        `Boxes go to the carrier once the order is "${statusLabel("packed")}"; this one is "${statusLabel(order.status)}".`,
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
    const tracked = all.filter((p) => p.id !== parcelId && p.trackingNumber).length + 1;
    const position = all.sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime()).findIndex((p) => p.id === parcelId) + 1;
    const note = `Box ${position} of ${all.length} handed to ${CARRIER_LABELS[carrier]} (${tracking.normalized})`;
    if (tracked === all.length) {
      const { order: shipped } = await changeOrderStatus(tx, {
        order,
        to: "shipped",
        actor,
        expectedVersion: version,
        note: `${note}; every box is with the carrier`,
        kinds: ["advance"],
      });
      return { order: shipped, box: updated!, orderShipped: true };
    }
    const stillPacked = await recordOrderEvent(tx, { order, actor, note, expectedVersion: version });
    return { order: stillPacked, box: updated!, orderShipped: false };
  });
}

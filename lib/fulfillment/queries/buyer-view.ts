import "server-only";
import { isUuid } from "../ids";
import { asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { orderEvents, orders, parcels } from "@/db/schema";
import { getCenterDetails, type CenterDetails } from "./center";
import { buyerTimeline, type TimelineEntry } from "../timeline";
import { CARRIER_LABELS, isCarrier, validateTrackingNumber } from "../tracking";

// What the buyer's order page shows of fulfillment. These load by order id only: the page that
// renders them has already decided the visitor may see this order (lib/checkout/order-access.ts).

export type BuyerBox = {
  id: string;
  position: number;
  description: string;
  carrierLabel: string | null;
  service: string | null;
  trackingNumber: string | null;
  trackingUrl: string | null;
  shippedAt: Date | null;
};

export type BuyerParcels = {
  method: "parcel" | "pickup" | "none";
  status: string;
  boxes: BuyerBox[];
  pickupAddress: CenterDetails | null;
};

export async function getBuyerParcels({ orderId }: { orderId: string }): Promise<BuyerParcels | null> {
  if (!isUuid(orderId)) return null;
  const db = await getDb();
  const [order] = await db.select({ method: orders.method, status: orders.status }).from(orders).where(eq(orders.id, orderId));
  if (!order) return null;
  const rows = await db.select().from(parcels).where(eq(parcels.orderId, orderId)).orderBy(asc(parcels.createdAt), asc(parcels.id));
  const pickupAddress = order.method === "pickup" ? await getCenterDetails() : null;
  return {
    method: order.method,
    status: order.status,
    pickupAddress,
    boxes: rows.map((p, index) => {
      const carrier = p.carrier && isCarrier(p.carrier) ? p.carrier : null;
      const check = carrier && p.trackingNumber ? validateTrackingNumber({ carrier, number: p.trackingNumber }) : null;
      return {
        id: p.id,
        position: index + 1,
        description: p.description,
        carrierLabel: carrier ? CARRIER_LABELS[carrier] : null,
        service: p.service,
        trackingNumber: p.trackingNumber,
        trackingUrl: check?.ok ? check.url : null,
        shippedAt: p.shippedAt,
      };
    }),
  };
}

export type BuyerTimeline = { status: string; entries: TimelineEntry[] };

export async function getBuyerTimeline({ orderId }: { orderId: string }): Promise<BuyerTimeline | null> {
  if (!isUuid(orderId)) return null;
  const db = await getDb();
  const [order] = await db.select({ status: orders.status }).from(orders).where(eq(orders.id, orderId));
  if (!order) return null;
  const events = await db
    .select({ fromStatus: orderEvents.fromStatus, toStatus: orderEvents.toStatus, createdAt: orderEvents.createdAt })
    .from(orderEvents)
    .where(eq(orderEvents.orderId, orderId))
    .orderBy(asc(orderEvents.createdAt), asc(orderEvents.id));
  return { status: order.status, entries: buyerTimeline(events) };
}

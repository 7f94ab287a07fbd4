import "server-only";
import { isUuid } from "../ids";
import { asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { houseModels, orderEvents, orderLines, orders, parcels, users, type OrderRow, type ParcelRow } from "@/db/schema";
import { billableWeightLb, type BillableWeight } from "@/lib/checkout/billable-weight";
import type { FulfillmentState } from "@/lib/orders/statuses";

// Everything the order's fulfillment page shows: the order, its houses with their cartons and
// billable weights, its boxes, and who moved it when.

export type DetailLine = {
  id: string;
  name: string;
  slug: string;
  quantity: number;
  unitPriceCents: number;
  carton: { lengthIn: number; widthIn: number; heightIn: number; weightLb: number };
  billable: BillableWeight;
};

export type DetailEvent = {
  id: number;
  fromStatus: string | null;
  toStatus: string;
  note: string;
  createdAt: Date;
  actorName: string | null;
};

export type ShipTo = { name: string; line1: string; line2?: string; city: string; state: string; zip: string };

export type FulfillmentOrder = {
  order: OrderRow & { status: FulfillmentState; method: "parcel" | "pickup"; shipTo: ShipTo | null };
  lines: DetailLine[];
  boxes: ParcelRow[];
  events: DetailEvent[];
};

/** The order as the shipping desk sees it, or null when there is no such paid, shippable order. */
export async function getFulfillmentOrder({ orderId }: { orderId: string }): Promise<FulfillmentOrder | null> {
  if (!isUuid(orderId)) return null;
  const db = await getDb();
  const [order] = await db.select().from(orders).where(eq(orders.id, orderId)).limit(1);
  if (!order || order.method === "none" || order.status === "pending_payment" || order.status === "expired") return null;
  const [lines, boxes, events] = await Promise.all([
    db
      .select({
        id: orderLines.id,
        name: orderLines.name,
        slug: orderLines.slug,
        quantity: orderLines.quantity,
        unitPriceCents: orderLines.unitPriceCents,
        lengthIn: houseModels.cartonLengthIn,
        widthIn: houseModels.cartonWidthIn,
        heightIn: houseModels.cartonHeightIn,
        weightLb: houseModels.cartonWeightLb,
      })
      .from(orderLines)
      .innerJoin(houseModels, eq(houseModels.id, orderLines.modelId))
      .where(eq(orderLines.orderId, orderId))
      .orderBy(asc(orderLines.name)),
    db.select().from(parcels).where(eq(parcels.orderId, orderId)).orderBy(asc(parcels.createdAt), asc(parcels.id)),
    db
      .select({
        id: orderEvents.id,
        fromStatus: orderEvents.fromStatus,
        toStatus: orderEvents.toStatus,
        note: orderEvents.note,
        createdAt: orderEvents.createdAt,
        actorName: users.name,
      })
      .from(orderEvents)
      .leftJoin(users, eq(users.id, orderEvents.actorId))
      .where(eq(orderEvents.orderId, orderId))
      .orderBy(asc(orderEvents.createdAt), asc(orderEvents.id)),
  ]);
  return {
    order: order as FulfillmentOrder["order"],
    lines: lines.map(({ lengthIn, widthIn, heightIn, weightLb, ...line }) => {
      const carton = { lengthIn, widthIn, heightIn, weightLb };
      return { ...line, carton, billable: billableWeightLb(carton) };
    }),
    boxes,
    events,
  };
}

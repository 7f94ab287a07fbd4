import "server-only";
import { and, asc, eq, inArray, sql, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { houseModels, orderEvents, orderLines, orders, sites } from "@/db/schema";
import { hemisphereOf, type Hemisphere } from "./season-rules";

// Everything a roost report needs to know about the houses of an order, read in ONE query so
// the rule for each field lives in one place:
// - delivered: the latest "delivered" or "picked up" event of an order that is in that state now;
// - the band: from the saved site that went with the order. When orders carry the band the
//   buyer saw (PRODUCT.md §2, "the band travels with the order"), read it here first and fall
//   back to the site's;
// - the mount and the site's rating: from the saved site's check;
// - the hemisphere: from the saved site's latitude, else the north (lib/roost-reports/season-rules.ts);
// - the state: from the shipping address (a state is as fine as public figures go, PRODUCT.md §8).

export type HouseLine = {
  orderId: string;
  orderNumber: number;
  orderStatus: string;
  email: string;
  buyerName: string;
  userId: string | null;
  orderLineId: string;
  modelId: string;
  modelName: string;
  slug: string;
  quantity: number;
  deliveredAt: Date | null;
  siteId: string | null;
  bandId: string | null;
  mount: string | null;
  siteRating: string | null;
  state: string | null;
  hemisphere: Hemisphere;
};

const ARRIVED = ["delivered", "picked_up"] as const;

export async function loadHouseLines({
  db,
  orderIds,
  orderLineIds,
  arrivedOnly = false,
}: {
  db: DbOrTx;
  orderIds?: string[];
  orderLineIds?: string[];
  arrivedOnly?: boolean;
}): Promise<HouseLine[]> {
  const where: SQL[] = [];
  if (orderIds) where.push(orderIds.length ? inArray(orders.id, orderIds) : sql`false`);
  if (orderLineIds) where.push(orderLineIds.length ? inArray(orderLines.id, orderLineIds) : sql`false`);
  if (arrivedOnly) where.push(inArray(orders.status, [...ARRIVED]));
  const deliveredAt = sql<Date | string | null>`(
    select max(${orderEvents.createdAt}) from ${orderEvents}
    where ${orderEvents.orderId} = ${orders.id} and ${orderEvents.toStatus} in ('delivered', 'picked_up')
  )`;
  const rows = await db
    .select({
      orderId: orders.id,
      orderNumber: orders.number,
      orderStatus: orders.status,
      email: orders.email,
      buyerName: orders.name,
      userId: orders.userId,
      orderLineId: orderLines.id,
      modelId: orderLines.modelId,
      modelName: houseModels.name,
      slug: orderLines.slug,
      quantity: orderLines.quantity,
      deliveredAt,
      siteId: orders.siteId,
      bandId: sites.bandId,
      mount: sql<string | null>`${sites.input}->>'mount'`,
      siteRating: sites.label,
      siteLat: sql<number | string | null>`(${sites.result}->'location'->>'lat')`,
      state: sql<string | null>`${orders.shipTo}->>'state'`,
    })
    .from(orderLines)
    .innerJoin(orders, eq(orders.id, orderLines.orderId))
    .innerJoin(houseModels, eq(houseModels.id, orderLines.modelId))
    .leftJoin(sites, eq(sites.id, orders.siteId))
    .where(where.length ? and(...where) : undefined)
    .orderBy(asc(orders.number), asc(orderLines.name));
  return rows.map(({ siteLat, deliveredAt: at, ...row }) => {
    const lat = siteLat === null ? null : Number(siteLat);
    const arrived = (ARRIVED as readonly string[]).includes(row.orderStatus) && at !== null;
    return {
      ...row,
      deliveredAt: arrived ? new Date(at) : null,
      hemisphere: hemisphereOf({ siteLat: Number.isFinite(lat) ? lat : null }),
    };
  });
}

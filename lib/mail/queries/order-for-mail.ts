import "server-only";
import { asc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { gifts, houseModels, orderLines, orders, organization, parcels, sites } from "@/db/schema";
import { formatOrderNumber } from "@/lib/checkout/order-number";
import { env } from "@/lib/config/env";
import type { OrgFooter } from "../message-types";
import { PermanentMailError } from "../payloads";

/** The center's details for the footer and receipts; a store without them cannot send receipts. */
export async function loadOrgFooter({ db }: { db: DbOrTx }): Promise<OrgFooter> {
  const [org] = await db.select().from(organization).where(eq(organization.id, 1));
  if (!org)
    throw new PermanentMailError("The organization's details are missing (admin settings).");
  return {
    displayName: org.displayName,
    legalName: org.legalName,
    street: org.street,
    city: org.city,
    state: org.state,
    zip: org.zip,
    taxId: org.taxId,
    email: org.email,
    phone: org.phone,
  };
}

/** Everything an order message may need, read at send time. */
export async function loadOrderForMail({ db, orderId }: { db: DbOrTx; orderId: string }) {
  const [order] = await db.select().from(orders).where(eq(orders.id, orderId));
  if (!order) throw new PermanentMailError(`Order ${orderId} does not exist.`);
  const lines = await db
    .select({
      name: orderLines.name,
      slug: orderLines.slug,
      quantity: orderLines.quantity,
      unitPriceCents: orderLines.unitPriceCents,
      spec: houseModels.spec,
      mounts: houseModels.mounts,
      backToBackKit: houseModels.backToBackKit,
    })
    .from(orderLines)
    .innerJoin(houseModels, eq(houseModels.id, orderLines.modelId))
    .where(eq(orderLines.orderId, orderId))
    .orderBy(asc(orderLines.name));
  const orderParcels = await db
    .select()
    .from(parcels)
    .where(eq(parcels.orderId, orderId))
    .orderBy(asc(parcels.createdAt));
  const [site] = order.siteId
    ? await db.select().from(sites).where(eq(sites.id, order.siteId))
    : [];
  return {
    order,
    lines,
    parcels: orderParcels,
    site: site ?? null,
    org: await loadOrgFooter({ db }),
    number: formatOrderNumber(order.number),
    orderUrl: `${env().APP_URL}/orders/${order.id}?t=${encodeURIComponent(order.accessToken)}`,
  };
}

export type OrderForMail = Awaited<ReturnType<typeof loadOrderForMail>>;

/** The gift recorded with a paid order, for its gift receipt. */
export async function findGiftForOrder({ db, orderId }: { db: DbOrTx; orderId: string }) {
  const [gift] = await db.select().from(gifts).where(eq(gifts.orderId, orderId));
  return gift ?? null;
}

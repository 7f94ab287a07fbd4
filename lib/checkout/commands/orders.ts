import "server-only";
import { randomBytes } from "node:crypto";
import { and, eq, lt, sql } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db/client";
import { orderLines, orders, organization, sites, type OrderRow } from "@/db/schema";
import type { SessionUser } from "@/lib/auth/session";
import { NO_ORDER_BAND, type OrderBand } from "@/lib/climate/order-band";
import { AppError } from "@/lib/http/errors";
import { changeOrderStatus, openOrder, SYSTEM_ACTOR, type NewOrderValues } from "@/lib/orders/commands";
import { StaleOrderError } from "@/lib/orders/refusals";
import { moveStock } from "@/lib/stock/commands";
import { getPayments } from "../payments";
import { quoteFromDatabase } from "../queries/quote";
import type { CheckoutRequest } from "../schemas";

// An unpaid reservation holds stock for 30 minutes (the rule; common practice for carts).
export const RESERVATION_MS = 30 * 60 * 1000;

export type CheckoutStarted = { orderId: string; clientSecret: string; totalCents: number; accessToken: string };

async function holdLines(tx: DbOrTx, order: Pick<OrderRow, "id">, actorId: string | null, reason: string) {
  const lines = await tx.select().from(orderLines).where(eq(orderLines.orderId, order.id));
  for (const line of lines) {
    await moveStock(tx, { modelId: line.modelId, kind: "reserved", delta: -line.quantity, orderId: order.id, actorId, reason });
  }
}

export async function releaseLines(tx: DbOrTx, orderId: string, reason: string, actorId: string | null = null) {
  const lines = await tx.select().from(orderLines).where(eq(orderLines.orderId, orderId));
  for (const line of lines) {
    await moveStock(tx, { modelId: line.modelId, kind: "released", delta: line.quantity, orderId, actorId, reason });
  }
}

async function resolveSiteId(tx: DbOrTx, input: CheckoutRequest, user: SessionUser | null): Promise<string | null> {
  if (!input.siteId) return null;
  const [site] = await tx.select().from(sites).where(eq(sites.id, input.siteId));
  if (!site) return null;
  const mine = (user && site.userId === user.id) || (input.guestSiteToken && site.guestToken === input.guestSiteToken);
  return mine ? site.id : null;
}

/**
 * Creates the order (pending) and reserves its stock in one transaction — a conditional update
 * per line, so concurrent checkouts can never take stock below zero — then creates the
 * PaymentIntent for the amount computed from the database, with one idempotency key per order.
 */
export async function startCheckout(
  input: CheckoutRequest,
  user: SessionUser | null,
  now = new Date(),
  /** The band the buyer saw, from the band cookie (lib/climate/order-band.ts). */
  band: OrderBand = NO_ORDER_BAND,
): Promise<CheckoutStarted> {
  const db = await getDb();
  const order = await db.transaction(async (tx) => {
    const { quote, models } = await quoteFromDatabase(tx, {
      items: input.items,
      method: input.method,
      state: input.address?.state,
      giftCents: input.giftCents,
    });
    const siteId = await resolveSiteId(tx, input, user);
    const values: NewOrderValues = {
      userId: user?.id ?? null,
      email: input.contact.email,
      name: input.contact.name,
      accessToken: randomBytes(24).toString("base64url"),
      method: input.items.length === 0 ? "none" : input.method,
      shipTo: input.items.length > 0 && input.method === "parcel" ? input.address : null,
      subtotalCents: quote.subtotalCents,
      shippingCents: quote.shipping.cents,
      taxCents: quote.taxCents,
      giftCents: quote.giftCents,
      totalCents: quote.totalCents,
      reservedUntil: new Date(now.getTime() + RESERVATION_MS),
      stockHeld: input.items.length > 0,
      siteId,
      ...band,
    };
    const row = await openOrder(tx, { values, actor: { id: user?.id ?? null, role: user?.role ?? "customer" }, note: "Checkout started" });
    if (quote.lines.length > 0) {
      await tx.insert(orderLines).values(
        quote.lines.map((line, i) => ({
          orderId: row.id,
          modelId: models[i]!.id,
          slug: line.slug,
          name: line.name,
          unitPriceCents: line.unitPriceCents,
          quantity: line.quantity,
          billableLb: quote.shipping.parcels.find((p) => p.slug === line.slug)?.billableLb ?? 0,
        })),
      );
      await holdLines(tx, row, user?.id ?? null, "Held for checkout");
    }
    return row;
  });

  const center = await centerName();
  let intent;
  try {
    intent = await getPayments().paymentIntents.create(
      {
        amount: order.totalCents,
        currency: "usd",
        automatic_payment_methods: { enabled: true },
        receipt_email: order.email,
        description: center ? `${center} order ${order.number}` : `Order ${order.number}`,
        metadata: { orderId: order.id },
      },
      { idempotencyKey: `order-${order.id}` },
    );
  } catch (error) {
    console.error("creating the PaymentIntent failed", error);
    await expireOrder(order.id, "The payment service could not be reached");
    throw new AppError("unavailable", "Payments are not available right now. Nothing was charged; please try again in a minute.");
  }
  await db.update(orders).set({ paymentIntentId: intent.id }).where(eq(orders.id, order.id));
  return { orderId: order.id, clientSecret: intent.client_secret ?? "", totalCents: order.totalCents, accessToken: order.accessToken };
}

/** Before each payment attempt: the order's stock is held again if a failed attempt released it. */
export async function holdForPayment(order: OrderRow, now = new Date()): Promise<OrderRow> {
  if (order.status !== "pending_payment") {
    throw new AppError("conflict", order.status === "expired" ? "The 30-minute hold on these houses ran out. Please check out again." : "This order is already paid.");
  }
  const db = await getDb();
  return db.transaction(async (tx) => {
    const reservedUntil = new Date(now.getTime() + RESERVATION_MS);
    // Each write bumps the version, so a reservation sweeper that read the order before this
    // extension loses its conditional update instead of expiring an order being paid.
    const [claimed] = await tx
      .update(orders)
      .set({ stockHeld: true, reservedUntil, version: sql`${orders.version} + 1` })
      .where(and(eq(orders.id, order.id), eq(orders.status, "pending_payment"), eq(orders.stockHeld, false)))
      .returning();
    if (claimed) {
      await holdLines(tx, claimed, null, "Held again for another payment attempt");
      return claimed;
    }
    const [row] = await tx
      .update(orders)
      .set({ reservedUntil, version: sql`${orders.version} + 1` })
      .where(and(eq(orders.id, order.id), eq(orders.status, "pending_payment")))
      .returning();
    if (!row) throw new AppError("conflict", "This order can no longer be paid.");
    return row;
  });
}

/**
 * Closes one unpaid checkout (pending_payment → expired through changeOrderStatus) and gives its
 * stock back exactly once: the status change is the claim, so of two sweepers only one writes.
 */
export async function expireOrder(orderId: string, note: string, { heldBefore }: { heldBefore?: Date } = {}): Promise<boolean> {
  const db = await getDb();
  try {
    return await db.transaction(async (tx) => {
      const [order] = await tx.select().from(orders).where(eq(orders.id, orderId));
      if (!order || order.status !== "pending_payment") return false;
      // A new payment attempt may have extended the hold since the sweeper looked.
      if (heldBefore && order.reservedUntil && order.reservedUntil >= heldBefore) return false;
      await changeOrderStatus(tx, { order, to: "expired", actor: SYSTEM_ACTOR, note, set: { stockHeld: false } });
      if (order.stockHeld) await releaseLines(tx, orderId, "Reservation expired");
      return true;
    });
  } catch (error) {
    // Another writer (a second sweeper, a payment, a new attempt) changed the order first.
    if (error instanceof StaleOrderError) return false;
    throw error;
  }
}

/**
 * Expires every reservation older than 30 minutes, then, after that commit and never inside it,
 * cancels its PaymentIntent under one idempotency key per order. If the process dies between the
 * two, the intent stays open: a payment on it reaches the webhook for an expired order and is
 * refunded, so no money is kept for an order that cannot be paid.
 */
export async function expireStaleReservations(now = new Date()): Promise<number> {
  const db = await getDb();
  const stale = await db
    .select({ id: orders.id, paymentIntentId: orders.paymentIntentId })
    .from(orders)
    .where(and(eq(orders.status, "pending_payment"), lt(orders.reservedUntil, now)));
  let expired = 0;
  for (const o of stale) {
    if (!(await expireOrder(o.id, "Unpaid for 30 minutes; stock returned", { heldBefore: now }))) continue;
    expired++;
    if (o.paymentIntentId) {
      try {
        await getPayments().paymentIntents.cancel(o.paymentIntentId, {}, { idempotencyKey: `expire-${o.id}` });
      } catch (error) {
        // Already succeeded or cancelled: the webhook settles it (a late payment is refunded).
        console.warn(`cancelling PaymentIntent ${o.paymentIntentId} failed`, (error as Error).message);
      }
    }
  }
  return expired;
}

/** The center's name from its settings (organization.display_name), for the payment's description. */
async function centerName(): Promise<string | null> {
  const db = await getDb();
  const [row] = await db.select({ name: organization.displayName }).from(organization).where(eq(organization.id, 1));
  return row?.name ?? null;
}

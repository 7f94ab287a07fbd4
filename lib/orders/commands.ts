import "server-only";
import { and, eq, sql } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { orderEvents, orders, organization, parcels, type OrderRow } from "@/db/schema";
import { AppError } from "@/lib/http/errors";
import { enqueueEmail } from "@/lib/mail/commands/outbox";
import { messagesForChange } from "./messages";
import { refusalError, staleVersionError } from "./refusals";
import { canTransition, type TransitionActor, type TransitionKind } from "./state-machine";
import { statusLabel, type OrderStatus } from "./statuses";

// The one owner of an order's status. Every change (the payment webhook, the reservation
// sweeper, the shipping desk, an admin's cancel or correction) goes through changeOrderStatus,
// inside the caller's transaction:
// 1. the version the person saw must still be the order's (stale → 409),
// 2. the state machine (lib/orders/state-machine.ts) must allow this move for this actor,
// 3. the version is bumped with a conditional UPDATE … WHERE version = read, so of two writers
//    at once exactly one wins, on PGlite (one connection, serialized) and on a PostgreSQL server
//    (the second UPDATE waits for the first and then matches no row),
// 4. the order event records who, when and why, and the messages the change causes are queued
//    in the same commit (lib/orders/messages.ts).
// Nothing else updates orders.status; tests/unit/orders/status-owner.test.ts scans for it.

export type OrderActor = { id: string | null; role: TransitionActor };
/** The payment webhook, the reservation sweeper, a carrier update. */
export const SYSTEM_ACTOR: OrderActor = { id: null, role: "system" };

/** Columns that change together with a status or an event; never the status or the version. */
export type OrderChanges = Partial<Pick<OrderRow, "paidAt" | "stockHeld" | "paymentIntentId" | "refundedCents" | "reservedUntil">>;

const KIND_ELSEWHERE: Record<TransitionKind, string> = {
  advance: "This step is taken on the shipping desk.",
  correction: "Corrections are made by an admin on the order page, with a reason.",
  cancel: "Cancelling and refunding go through the refund buttons, so the payment is returned too.",
  refund: "Cancelling and refunding go through the refund buttons, so the payment is returned too.",
  expire: "Only the reservation sweeper closes an unpaid checkout.",
};

/** Throws the stale-screen conflict when the order is no longer at the version the person saw. */
export function checkOrderVersion(order: OrderRow, expectedVersion: number | undefined) {
  if (expectedVersion !== undefined && order.version !== expectedVersion) throw staleVersionError(statusLabel(order.status));
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
async function writeVersion(tx: Tx, order: OrderRow, fields: OrderChanges & { status?: OrderStatus }): Promise<OrderRow> {
  const [updated] = await tx
    .update(orders)
    .set({ ...fields, version: order.version + 1 })
    .where(and(eq(orders.id, order.id), eq(orders.version, order.version)))
    .returning();
  if (!updated) {
    // Another writer won the row between our read and this update (on a PostgreSQL server the
    // update waited for it): say what the order is now, not what it was when we read it.
    const [current] = await tx.select({ status: orders.status }).from(orders).where(eq(orders.id, order.id));
    throw staleVersionError(statusLabel(current?.status ?? order.status));
  }
  return updated;
}

/**
 * Moves one order to `to`, or throws: TransitionRefused when the state machine says no (403 for
 * the wrong role, 400 for a missing reason, 409 otherwise), StaleOrderError when someone else
 * changed the order first, AppError("bad_request") when the move is of a kind this caller does
 * not make (`kinds`). Nothing is written unless the change is made.
 */
export async function changeOrderStatus(
  tx: Tx,
  change: {
    /** The order as read in this transaction. */
    order: OrderRow;
    to: OrderStatus;
    actor: OrderActor;
    /** The version the person acting saw; omitted for the system, which acts on what it just read. */
    expectedVersion?: number;
    /** Required for an admin correction. */
    reason?: string;
    /** Kept with the order event (staff see it; the buyer's timeline shows only the status). */
    note: string | ((kind: TransitionKind) => string);
    /** The kinds of move this caller makes; any other allowed move is sent elsewhere. */
    kinds?: readonly TransitionKind[];
    set?: OrderChanges;
  },
): Promise<{ order: OrderRow; kind: TransitionKind }> {
  const { order, to, actor } = change;
  checkOrderVersion(order, change.expectedVersion);
  const boxes = to === "packed" || to === "shipped" ? await countBoxes(tx, order.id) : undefined;
  const check = canTransition({ from: order.status, to, method: order.method, role: actor.role, reason: change.reason, parcels: boxes });
  if (!check.ok) throw refusalError(check);
  if (change.kinds && !change.kinds.includes(check.kind)) throw new AppError("bad_request", KIND_ELSEWHERE[check.kind]);
  const updated = await writeVersion(tx, order, { ...change.set, status: to });
  const note = typeof change.note === "function" ? change.note(check.kind) : change.note;
  await tx.insert(orderEvents).values({ orderId: order.id, fromStatus: order.status, toStatus: to, actorId: actor.id, note });
  // The gift receipt's subject names the center as its settings do.
  const centerName = to === "paid" && updated.giftCents > 0 ? await centerDisplayName(tx) : null;
  for (const message of messagesForChange({ order: updated, to, kind: check.kind, centerName })) await enqueueEmail(tx, message);
  return { order: updated, kind: check.kind };
}

/**
 * Records something that happened to an order without changing its status (a box handed to the
 * carrier, a declined card, a partial refund): bumps the version, so a screen opened before it
 * is told, and writes the event.
 */
export async function recordOrderEvent(
  tx: Tx,
  {
    order,
    actor,
    note,
    expectedVersion,
    set,
  }: { order: OrderRow; actor: OrderActor; note: string; expectedVersion?: number; set?: OrderChanges },
): Promise<OrderRow> {
  checkOrderVersion(order, expectedVersion);
  const updated = await writeVersion(tx, order, { ...set });
  await tx.insert(orderEvents).values({ orderId: order.id, fromStatus: order.status, toStatus: order.status, actorId: actor.id, note });
  return updated;
}

export type NewOrderValues = Omit<typeof orders.$inferInsert, "id" | "number" | "status" | "version" | "createdAt" | "updatedAt">;

/** Opens an order at the start of the lifecycle (pending_payment, "At the till") with its first event. */
export async function openOrder(tx: Tx, { values, actor, note }: { values: NewOrderValues; actor: OrderActor; note: string }): Promise<OrderRow> {
  const [row] = await tx.insert(orders).values({ ...values, status: "pending_payment" }).returning();
  if (!row) throw new Error("order insert returned nothing");
  await tx.insert(orderEvents).values({ orderId: row.id, fromStatus: null, toStatus: row.status, actorId: actor.id, note });
  return row;
}

async function centerDisplayName(tx: Tx): Promise<string | null> {
  const [row] = await tx.select({ name: organization.displayName }).from(organization).where(eq(organization.id, 1));
  return row?.name ?? null;
}

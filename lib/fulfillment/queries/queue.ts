import "server-only";
import { and, asc, count, desc, eq, gte, ilike, inArray, lt, ne, or, sql, type SQL } from "drizzle-orm";
import { getDb } from "@/db/client";
import { orders } from "@/db/schema";
import { parseOrderNumber } from "@/lib/checkout/order-number";
import { BENCH_STATES, OPEN_STATES, statusesFor, type QueueParams } from "../queue-params";
import type { FulfillmentState } from "@/lib/orders/statuses";
import { dayRangeInZone } from "../store-time";

// The shipping desk's queue: paid orders with something to ship or hand over. Gift-only orders
// (method "none") never reach it: there is nothing to pack.

export type QueueRow = {
  id: string;
  number: number;
  name: string;
  email: string;
  status: FulfillmentState;
  method: "parcel" | "pickup";
  paidAt: string | null;
  houses: number;
  boxes: number;
  boxesShipped: number;
  shipTo: { city: string; state: string; zip: string } | null;
};

export type QueuePage = { items: QueueRow[]; total: number; page: number; pageSize: number; pageCount: number };

/** The most rows one CSV export carries; the desk never has this many open orders. */
export const EXPORT_LIMIT = 10_000;

// A typed % or _ in the search box means itself, not a wildcard.
function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

function whereFor(params: QueueParams): SQL | undefined {
  const { start, end } = dayRangeInZone({ from: params.from, to: params.to });
  const number = params.q ? parseOrderNumber(params.q) : null;
  const search = params.q
    ? or(
        ilike(orders.name, likePattern(params.q)),
        sql`${orders.shipTo}->>'name' ilike ${likePattern(params.q)}`,
        number !== null ? eq(orders.number, number) : undefined,
      )
    : undefined;
  return and(
    ne(orders.method, "none"),
    inArray(orders.status, statusesFor(params.state)),
    params.method === "any" ? undefined : eq(orders.method, params.method),
    start ? gte(orders.paidAt, start) : undefined,
    end ? lt(orders.paidAt, end) : undefined,
    search,
  );
}

function orderByFor(params: QueueParams): SQL[] {
  const dir = params.dir === "desc" ? desc : asc;
  const tieBreak = dir(orders.number);
  switch (params.sort) {
    case "number":
      return [dir(orders.number)];
    case "name":
      return [dir(sql`lower(${orders.name})`), tieBreak];
    case "status":
      // The enum sorts in workflow order: paid, packing, packed, shipped, …
      return [dir(orders.status), asc(orders.paidAt), tieBreak];
    default:
      return [params.dir === "desc" ? sql`${orders.paidAt} desc nulls last` : sql`${orders.paidAt} asc nulls last`, tieBreak];
  }
}

const columns = {
  id: orders.id,
  number: orders.number,
  name: orders.name,
  email: orders.email,
  status: orders.status,
  method: orders.method,
  paidAt: orders.paidAt,
  shipTo: orders.shipTo,
  // Correlated subqueries, evaluated only for the rows of the page. Written with table aliases:
  // drizzle leaves column names unqualified in a one-table select, which would make
  // "order_id = id" compare the line with itself.
  houses: sql<number>`(select coalesce(sum(ol.quantity), 0)::int from order_lines ol where ol.order_id = "orders"."id")`,
  boxes: sql<number>`(select count(*)::int from parcels p where p.order_id = "orders"."id")`,
  boxesShipped: sql<number>`(select count(p.tracking_number)::int from parcels p where p.order_id = "orders"."id")`,
};

type SelectedRow = { [K in keyof typeof columns]: unknown };

function toQueueRow(row: SelectedRow): QueueRow {
  const shipTo = row.shipTo as { city?: string; state?: string; zip?: string } | null;
  return {
    id: row.id as string,
    number: row.number as number,
    name: row.name as string,
    email: row.email as string,
    status: row.status as FulfillmentState,
    method: row.method as "parcel" | "pickup",
    paidAt: row.paidAt instanceof Date ? row.paidAt.toISOString() : null,
    houses: Number(row.houses),
    boxes: Number(row.boxes),
    boxesShipped: Number(row.boxesShipped),
    shipTo: shipTo ? { city: shipTo.city ?? "", state: shipTo.state ?? "", zip: shipTo.zip ?? "" } : null,
  };
}

/** One page of the queue, with the total that matches the filters. */
export async function listQueueOrders({ params }: { params: QueueParams }): Promise<QueuePage> {
  const db = await getDb();
  const where = whereFor(params);
  const [rows, [totalRow]] = await Promise.all([
    db
      .select(columns)
      .from(orders)
      .where(where)
      .orderBy(...orderByFor(params))
      .limit(params.pageSize)
      .offset((params.page - 1) * params.pageSize),
    db.select({ n: count() }).from(orders).where(where),
  ]);
  const total = totalRow?.n ?? 0;
  return {
    items: rows.map(toQueueRow),
    total,
    page: params.page,
    pageSize: params.pageSize,
    pageCount: Math.max(1, Math.ceil(total / params.pageSize)),
  };
}

/** Every order of the current view (filters and sort, not just the page), for the CSV export. */
export async function listQueueOrdersForExport({ params }: { params: QueueParams }): Promise<QueueRow[]> {
  const db = await getDb();
  const rows = await db.select(columns).from(orders).where(whereFor(params)).orderBy(...orderByFor(params)).limit(EXPORT_LIMIT);
  return rows.map(toQueueRow);
}

export type QueueSummary = {
  counts: Record<(typeof OPEN_STATES)[number], number>;
  oldest: { id: string; number: number; name: string; status: FulfillmentState; paidAt: string } | null;
};

/** Counts per open state, and the order that has waited longest at the bench. */
export async function summarizeQueue(): Promise<QueueSummary> {
  const db = await getDb();
  const [groups, [oldest]] = await Promise.all([
    db
      .select({ status: orders.status, n: count() })
      .from(orders)
      .where(and(ne(orders.method, "none"), inArray(orders.status, [...OPEN_STATES])))
      .groupBy(orders.status),
    db
      .select({ id: orders.id, number: orders.number, name: orders.name, status: orders.status, paidAt: orders.paidAt })
      .from(orders)
      .where(and(ne(orders.method, "none"), inArray(orders.status, [...BENCH_STATES])))
      .orderBy(sql`${orders.paidAt} asc nulls last`, asc(orders.number))
      .limit(1),
  ]);
  const counts = Object.fromEntries(OPEN_STATES.map((s) => [s, 0])) as QueueSummary["counts"];
  for (const g of groups) counts[g.status as keyof QueueSummary["counts"]] = g.n;
  return {
    counts,
    oldest: oldest
      ? {
          id: oldest.id,
          number: oldest.number,
          name: oldest.name,
          status: oldest.status as FulfillmentState,
          paidAt: (oldest.paidAt ?? new Date(0)).toISOString(),
        }
      : null,
  };
}

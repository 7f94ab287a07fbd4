import "server-only";
import { count } from "drizzle-orm";
import { getDb } from "@/db/client";
import { orders } from "@/db/schema";

export async function countOrdersByStatus(): Promise<Record<string, number>> {
  const db = await getDb();
  const rows = await db.select({ status: orders.status, n: count() }).from(orders).groupBy(orders.status);
  return Object.fromEntries(rows.map((r) => [r.status, r.n]));
}

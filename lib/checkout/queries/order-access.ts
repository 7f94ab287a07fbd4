import "server-only";
import { timingSafeEqual } from "node:crypto";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { orders, type OrderRow } from "@/db/schema";
import { can } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session";
import { AppError } from "@/lib/http/errors";

function sameToken(a: string, b: string): boolean {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
}

/**
 * An order, for someone allowed to see it: its buyer (signed in), anyone holding its unguessable
 * link (a guest), or fulfillment and admin staff. Everyone else gets "not found", so order ids
 * cannot be probed.
 */
export async function getOrderForViewer({
  orderId,
  token,
  user,
}: {
  orderId: string;
  token?: string | null;
  user: SessionUser | null;
}): Promise<OrderRow> {
  const notFound = new AppError("not_found", "No order with that link was found. Check the link in your e-mail.");
  if (!/^[0-9a-f-]{36}$/i.test(orderId)) throw notFound;
  const db = await getDb();
  const [order] = await db.select().from(orders).where(eq(orders.id, orderId)).limit(1);
  if (!order) throw notFound;
  const allowed =
    (user && order.userId === user.id) ||
    (user && can(user.role, "fulfillment:orders")) ||
    (token && sameToken(token, order.accessToken));
  if (!allowed) throw notFound;
  return order;
}

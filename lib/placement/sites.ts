import "server-only";
import { randomBytes, timingSafeEqual } from "node:crypto";
import { count, desc, eq, sql } from "drizzle-orm";
import { z } from "zod";
import { getDb } from "@/db/client";
import { orders, sites, type SiteRow } from "@/db/schema";
import type { PlacementAnswer } from "./placement-answer";
import type { PlacementInput } from "./schema";

// Saved sites: a signed-in buyer's belong to their account; a guest's carry a random token that
// the browser keeps with the cart and sends back to open, delete or attach the site to an order.

/** Who is asking: a signed-in user, a guest token from the browser, both or neither. */
export type SiteViewer = { userId: string | null; guestToken: string | null };

export type SiteSummary = Pick<SiteRow, "id" | "name" | "label" | "bandId" | "createdAt"> & {
  /** Orders this site went with; such a site is kept for their install guides. */
  orderCount: number;
  /** What the saved check found the skyline does (lib/placement/skyline-words.ts), if kept. */
  skylineEffect: unknown;
};

/** 24 random bytes (192 bits) as base64url: unguessable, and short enough for localStorage. */
export function createGuestToken(): string {
  return randomBytes(24).toString("base64url");
}

function sameToken(stored: string | null, given: string | null): boolean {
  if (!stored || !given) return false;
  const a = Buffer.from(stored);
  const b = Buffer.from(given);
  // Constant-time compare so the token cannot be found a byte at a time by timing.
  return a.length === b.length && timingSafeEqual(a, b);
}

/** The owner (by account) or the holder of the guest token may see and delete a site. */
export function canViewSite(
  site: Pick<SiteRow, "userId" | "guestToken">,
  viewer: SiteViewer,
): boolean {
  if (site.userId && viewer.userId && site.userId === viewer.userId) return true;
  return sameToken(site.guestToken, viewer.guestToken);
}

// Ids arrive from URLs; anything that is not a UUID simply is not a site (and never reaches SQL).
const isSiteId = (id: string) => z.uuid().safeParse(id).success;

export async function createSite({
  name,
  input,
  answer,
  userId,
}: {
  name: string;
  input: PlacementInput;
  answer: PlacementAnswer;
  userId: string | null;
}): Promise<{ site: SiteRow; guestToken: string | null }> {
  const db = await getDb();
  const guestToken = userId ? null : createGuestToken();
  const [site] = await db
    .insert(sites)
    .values({
      userId,
      guestToken,
      name,
      input,
      result: answer,
      label: answer.label,
      bandId: answer.band.id,
      skyline: answer.sun.skyline.profile,
    })
    .returning();
  if (!site) throw new Error("The site was not saved.");
  return { site, guestToken };
}

export async function getSiteForViewer({
  id,
  viewer,
}: {
  id: string;
  viewer: SiteViewer;
}): Promise<SiteRow | null> {
  if (!isSiteId(id)) return null;
  const db = await getDb();
  const [site] = await db.select().from(sites).where(eq(sites.id, id));
  return site && canViewSite(site, viewer) ? site : null;
}

export async function listSitesByUser({ userId }: { userId: string }): Promise<SiteSummary[]> {
  const db = await getDb();
  const rows = await db
    .select({
      id: sites.id,
      name: sites.name,
      label: sites.label,
      bandId: sites.bandId,
      createdAt: sites.createdAt,
      orderCount: count(orders.id),
      skylineEffect: sql<unknown>`${sites.result} -> 'sun' -> 'skyline' -> 'effect'`,
    })
    .from(sites)
    .leftJoin(orders, eq(orders.siteId, sites.id))
    .where(eq(sites.userId, userId))
    .groupBy(sites.id)
    .orderBy(desc(sites.createdAt));
  return rows.map((r) => ({ ...r, orderCount: Number(r.orderCount) }));
}

export type DeleteSiteOutcome = "deleted" | "not_found" | "in_use";

export async function deleteSiteForViewer({
  id,
  viewer,
}: {
  id: string;
  viewer: SiteViewer;
}): Promise<DeleteSiteOutcome> {
  const site = await getSiteForViewer({ id, viewer });
  if (!site) return "not_found";
  const db = await getDb();
  return db.transaction(async (tx) => {
    // An order's install guide reads its site, so a site that went with an order stays.
    const [used] = await tx.select({ n: count() }).from(orders).where(eq(orders.siteId, id));
    if ((used?.n ?? 0) > 0) return "in_use";
    await tx.delete(sites).where(eq(sites.id, id));
    return "deleted";
  });
}

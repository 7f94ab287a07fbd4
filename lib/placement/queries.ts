import "server-only";
import { count, desc, eq, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { orders, sites, type SiteRow } from "@/db/schema";
import { canViewSite, isSiteId, type SiteViewer } from "./sites";

export type SiteSummary = Pick<SiteRow, "id" | "name" | "label" | "bandId" | "createdAt"> & {
  /** Orders this site went with; such a site is kept for their install guides. */
  orderCount: number;
  /** What the saved check found the skyline does (lib/placement/skyline-words.ts), if kept. */
  skylineEffect: unknown;
};

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

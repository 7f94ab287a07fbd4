import "server-only";
import { count, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { orders, sites, type SiteRow } from "@/db/schema";
import type { PlacementAnswer } from "./placement-answer";
import { getSiteForViewer } from "./queries";
import type { PlacementInput } from "./schema";
import { createGuestToken, type SiteViewer } from "./sites";

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

import "server-only";
import { randomBytes, timingSafeEqual } from "node:crypto";
import { z } from "zod";
import type { SiteRow } from "@/db/schema";

// Saved sites: a signed-in buyer's belong to their account; a guest's carry a random token that
// the browser keeps with the cart and sends back to open, delete or attach the site to an order.
// Who may see a site is decided here; the reads are in queries.ts, the writes in commands.ts.

/** Who is asking: a signed-in user, a guest token from the browser, both or neither. */
export type SiteViewer = { userId: string | null; guestToken: string | null };

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
export const isSiteId = (id: string) => z.uuid().safeParse(id).success;

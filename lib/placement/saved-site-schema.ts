// Input of `POST /api/sites`: a name and the planned site. The result is never taken from the
// client: the server checks the site again before saving it.
import { z } from "zod";
import type { BandId } from "@/lib/catalog/climate-bands";
import { placementInputSchema } from "./schema";
import type { Rating } from "@/lib/shared/rating";

/** A guest proves a saved site is theirs with this header (kept out of URLs and server logs). */
export const GUEST_SITE_TOKEN_HEADER = "x-guest-site-token";

export const siteNameSchema = z
  .string({ error: "Give the site a name." })
  .trim()
  .min(1, "Give the site a name, like “Barn wall” or “Pole by the pond”.")
  .max(80, "Keep the name under 80 characters.");

export const saveSiteSchema = z.object({ name: siteNameSchema, input: placementInputSchema });
export type SaveSite = z.infer<typeof saveSiteSchema>;

/** What `POST /api/sites` answers; the guest token is shown once and kept by the browser. */
export type SavedSiteReceipt = {
  id: string;
  name: string;
  label: Rating;
  bandId: BandId;
  julyHighF: number;
  /** The 16 skyline angles saved with the site, or null when an open sky was assumed. */
  skyline: number[] | null;
  zip?: string;
  guestToken?: string;
  createdAt: string;
};

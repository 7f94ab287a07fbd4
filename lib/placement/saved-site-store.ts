"use client";

import { useSyncExternalStore } from "react";
import { z } from "zod";
import { BAND_IDS } from "@/lib/catalog/climate-bands";
import { RATINGS } from "@/lib/shared/rating";

// The buyer's chosen site lives in the browser beside the cart (lib/checkout/cart-store.ts), so
// checkout can send it with the order: `siteId`, and for a guest `guestSiteToken`. The server
// checks both again; nothing here is trusted.
export const SAVED_SITE_KEY = "roostwright.site.v1";

export const savedSiteSchema = z.object({
  id: z.uuid(),
  guestToken: z.string().min(1).max(100).optional(),
  name: z.string(),
  label: z.enum(RATINGS),
  bandId: z.enum(BAND_IDS),
});
export type SavedSite = z.infer<typeof savedSiteSchema>;

/** Reads the stored value; anything unreadable counts as no site rather than an error. */
export function parseSavedSite(raw: string | null): SavedSite | null {
  if (!raw) return null;
  try {
    const parsed = savedSiteSchema.safeParse(JSON.parse(raw));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

const listeners = new Set<() => void>();
let cached: { raw: string | null; site: SavedSite | null } = { raw: null, site: null };

/** The stored site right now (null on the server or when none is kept). */
export function readSavedSite(): SavedSite | null {
  if (typeof window === "undefined") return null;
  const raw = window.localStorage.getItem(SAVED_SITE_KEY);
  // useSyncExternalStore needs the same object back while nothing changed.
  if (raw !== cached.raw) cached = { raw, site: parseSavedSite(raw) };
  return cached.site;
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  const onStorage = (e: StorageEvent) => e.key === SAVED_SITE_KEY && listener();
  window.addEventListener("storage", onStorage);
  return () => {
    listeners.delete(listener);
    window.removeEventListener("storage", onStorage);
  };
}

export function writeSavedSite(site: SavedSite) {
  window.localStorage.setItem(SAVED_SITE_KEY, JSON.stringify(savedSiteSchema.parse(site)));
  for (const l of listeners) l();
}

export function clearSavedSite() {
  window.localStorage.removeItem(SAVED_SITE_KEY);
  for (const l of listeners) l();
}

/** The site that goes with the cart, if any, kept in step across tabs. */
export function useSavedSite(): {
  site: SavedSite | null;
  save: (site: SavedSite) => void;
  clear: () => void;
} {
  const site = useSyncExternalStore(subscribe, readSavedSite, () => null);
  return { site, save: writeSavedSite, clear: clearSavedSite };
}

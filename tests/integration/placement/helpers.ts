import { climateStations } from "@/db/schema";
import type { Db } from "@/db/client";
import { loadClimateTableIfNeeded } from "@/lib/climate/commands";
import type { z } from "zod";
import type { placementInputSchema } from "@/lib/placement/schema";

/** A site that passes every rule but the ones a test changes (Boulder, Colorado, ZIP 80302). */
export function siteInput(partial: Record<string, unknown> = {}): Record<string, unknown> {
  const base: z.input<typeof placementInputSchema> = {
    zip: "80302",
    mount: "pole",
    heightFt: 16,
    facingDeg: 160,
    pairedBackToBack: false,
    stacked: false,
    waterMi: 0.2,
    woodsEdgeFt: 30,
    clearFlightPath: true,
    brightLight: false,
    predators: false,
  };
  return { ...base, ...partial };
}

export function jsonRequest(url: string, body: unknown, init: RequestInit = {}): Request {
  return new Request(url, {
    method: "POST",
    body: typeof body === "string" ? body : JSON.stringify(body),
    ...init,
    headers: { "content-type": "application/json", ...(init.headers ?? {}) },
  });
}

// The station index is cached per process on globalThis (lib/climate/queries.ts);
// forgetting it makes the next request read the table as it is now.
export function forgetStationIndex() {
  (globalThis as { __roostwrightStations?: unknown }).__roostwrightStations = undefined;
}

/** Loads the committed NOAA table (about 7,500 stations) unless the database already holds it. */
export async function loadStations(db: Db) {
  await loadClimateTableIfNeeded(db);
  forgetStationIndex();
}

export async function dropStations(db: Db) {
  await db.delete(climateStations);
  forgetStationIndex();
}

export const noParams = { params: Promise.resolve({}) };

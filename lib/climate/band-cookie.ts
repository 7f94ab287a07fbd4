import { BAND_IDS, type BandId } from "@/lib/catalog/climate-bands";
import type { Climate } from "./resolve";

// The buyer's band follows them across the store in one cookie (not a secret; nothing personal
// beyond a ZIP they typed). This module is its only reader and writer: the band finder, the
// catalog's band filter and the placement planner write it through writeBandChoice, pages and
// checkout read it through band-cookie-server.ts and band-cookie-parse.ts (the schema is there:
// this module runs in the browser, where zod would be 23-35 kB of script). It keeps what the buyer
// gave (the ZIP, or the value and its unit, or the saved site), so the order can record where its
// band came from.
export const BAND_COOKIE = "rw_band";
const MAX_AGE_S = 31_536_000; // one year; common practice, no source

export const BAND_SOURCES = ["zip", "typed", "site", "chosen"] as const;
export type BandSource = (typeof BAND_SOURCES)[number];

/** zip: looked up from a ZIP; typed: the buyer's own figure; site: a placement check; chosen: picked from the list. */
export type BandChoice = {
  id: BandId;
  source: BandSource;
  /** The warmest-month high behind the band, °F, unrounded (absent when picked from the list). */
  valueF?: number;
  zip?: string;
  /** What the buyer typed, in their unit. */
  typed?: { value: number; unit: "F" | "C" };
  siteName?: string;
};

export function serializeBandChoice(choice: BandChoice): string {
  return `${BAND_COOKIE}=${encodeURIComponent(JSON.stringify(choice))}; path=/; max-age=${MAX_AGE_S}; samesite=lax`;
}

/** The choice a climate result makes (band finder and placement planner). */
export function bandChoiceFromClimate(climate: Climate, site?: { name: string }): BandChoice {
  const source: BandSource = site ? "site" : climate.source.kind === "typed" ? "typed" : "zip";
  const zip = climate.source.kind === "zip" ? climate.source.zip : climate.source.kind === "typed" ? climate.source.zip : undefined;
  return {
    id: climate.band.id,
    source,
    valueF: climate.valueF,
    ...(zip ? { zip } : {}),
    ...(climate.source.kind === "typed" ? { typed: { value: climate.source.value, unit: climate.source.unit } } : {}),
    ...(site ? { siteName: site.name.slice(0, 80) } : {}),
  };
}

/**
 * A band picked from the catalog's list: the same band keeps everything the buyer gave; another
 * band is the buyer's own choice, and the ZIP or value (which pointed elsewhere) is dropped.
 */
export function bandChoiceFromList(id: BandId, current: BandChoice | null): BandChoice {
  if (current && current.id === id) return current;
  return { id, source: "chosen" };
}

/** Browser only: remembers the choice for the whole store. */
export function writeBandChoice(choice: BandChoice) {
  document.cookie = serializeBandChoice(choice);
}

export function isBandId(value: unknown): value is BandId {
  return typeof value === "string" && (BAND_IDS as readonly string[]).includes(value);
}

import { z } from "zod";
import { BAND_IDS } from "@/lib/catalog/climate-bands";
import { BAND_COOKIE, BAND_SOURCES, type BandChoice } from "./band-cookie";

// Reading the band cookie back (pages, checkout, tests): what a browser sends is checked against
// this schema, and anything else counts as no choice.

export const bandChoiceSchema = z.object({
  id: z.enum(BAND_IDS),
  source: z.enum(BAND_SOURCES).default("chosen"),
  valueF: z.number().finite().optional(),
  zip: z.string().regex(/^\d{5}$/).optional(),
  typed: z.object({ value: z.number().finite(), unit: z.enum(["F", "C"]) }).optional(),
  siteName: z.string().max(80).optional(),
});

export function parseBandChoice(raw: string | undefined): BandChoice | null {
  if (!raw) return null;
  try {
    const value: unknown = JSON.parse(decodeURIComponent(raw));
    // Older cookies named the value julyHighF.
    if (value && typeof value === "object" && "julyHighF" in value && !("valueF" in value)) {
      (value as Record<string, unknown>).valueF = (value as Record<string, unknown>).julyHighF;
    }
    const parsed = bandChoiceSchema.safeParse(value);
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

/** The choice in a Cookie header (a route handler's request) or in document.cookie. */
export function bandChoiceFromCookieHeader(header: string | null | undefined): BandChoice | null {
  const raw = (header ?? "")
    .split(/;\s*/)
    .find((c) => c.startsWith(`${BAND_COOKIE}=`))
    ?.slice(BAND_COOKIE.length + 1);
  return parseBandChoice(raw);
}

